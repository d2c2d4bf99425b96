import { readFileSync } from "node:fs";
import { resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { isDomainError } from "../../src/core/domain";
import { julianDateFromCalendar } from "../../src/core/julian";
import { parseTle, tleChecksum, tleElements } from "../../src/core/tle";
import { err, expectError, ok } from "../support/expect";
import { SKERRY_1_TLE } from "../../src/scenario/story";

const { line1: SKERRY_LINE1, line2: SKERRY_LINE2 } = SKERRY_1_TLE;


const verification = readFileSync(resolve(__dirname, "fixtures/sgp4/SGP4-VER.TLE"), "utf8")
  .split(/\r?\n/)
  .filter((l) => /^[12] /.test(l))
  .map((l) => l.slice(0, 69));

/** line with column `col` (1-based) replaced by `ch` and the checksum recomputed. */
function withColumn(line: string, col: number, ch: string): string {
  const edited = line.slice(0, col - 1) + ch + line.slice(col, 68);
  return edited + tleChecksum(edited);
}

describe("two-line element sets: layout, checksum, epoch year", () => {
  it("reads the 30 well-formed element sets of the AIAA 2006-6753 verification file and refuses its three bad checksums", () => {
    const refused: string[] = [];
    for (let k = 0; k < verification.length; k += 2) {
      const t = parseTle(verification[k], verification[k + 1]);
      if (isDomainError(t)) {
        refused.push(verification[k].slice(2, 7));
        expect(t.message).toMatch(/column 69 of line [12] to hold the checksum/);
      }
    }
    // 33333, 33334 and 33335 are the paper's contrived error cases, with checksums not recomputed.
    expect(refused).toEqual(["33333", "33334", "33335"]);
  });

  it("reads the fields: object 00005 of the verification set", () => {
    // 1 00005U 58002B   00179.78495062  .00000023  00000-0  28098-4 0  4753
    // 2 00005  34.2682 348.7242 1859667 331.7664  19.3264 10.82419157413667
    const k = verification.findIndex((l) => l.startsWith("1 00005"));
    const t = ok(parseTle(verification[k], verification[k + 1]));
    expect(t.catalogueNumber).toBe("00005");
    // Epoch 2000, day 179.78495062: 2000-06-27 18:50:19.7336 UTC (tcppver.out prints the date 360 min later as 2000-06-28 00:50:19.733571).
    expect(Math.abs(t.epoch - (julianDateFromCalendar(2000, 6, 27) + 0.78495062))).toBeLessThan(1e-9);
    expect([t.inclination, t.raan, t.eccentricity, t.argp, t.meanAnomaly, t.meanMotion]).toEqual([34.2682, 348.7242, 0.1859667, 331.7664, 19.3264, 10.82419157]);
    expect(t.bstar).toBeCloseTo(0.28098e-4, 15);
    expect(t.ndot).toBeCloseTo(0.00000023, 15);
    expect(ok(tleElements(verification[k], verification[k + 1]))).toEqual([t.epoch, 34.2682, 348.7242, 0.1859667, 331.7664, 19.3264, 10.82419157, t.bstar]);
  });

  it("applies the epoch-year rule: 57-99 are 1957-1999, 00-56 are 2000-2056", () => {
    const at = (yy: string) => ok(parseTle(withColumn(withColumn(SKERRY_LINE1, 19, yy[0]), 20, yy[1]), SKERRY_LINE2)).epoch;
    expect(at("57")).toBe(julianDateFromCalendar(1957, 1, 1) + 149.5);
    expect(at("99")).toBe(julianDateFromCalendar(1999, 1, 1) + 149.5);
    expect(at("00")).toBe(julianDateFromCalendar(2000, 1, 1) + 149.5);
    expect(at("56")).toBe(julianDateFromCalendar(2056, 1, 1) + 149.5);
    expect(ok(parseTle(SKERRY_LINE1, SKERRY_LINE2)).epoch).toBe(julianDateFromCalendar(2026, 5, 30, 12));
  });

  it("names the column range and what it should hold when a field is wrong", () => {
    const shifted = SKERRY_LINE1.slice(0, 17) + SKERRY_LINE1.slice(18, 68) + " ";
    expect(err(parseTle(shifted.slice(0, 68) + tleChecksum(shifted), SKERRY_LINE2)).message).toMatch(/^line1: got .*; expected columns 10-18 of line 1 to hold the international designator/);
    expect(err(parseTle(withColumn(SKERRY_LINE1, 25, "x"), SKERRY_LINE2)).message).toMatch(/^line1: got "26150\.x0000000"; expected columns 19-32 of line 1 to hold the epoch/);
    expect(err(parseTle(SKERRY_LINE1, withColumn(SKERRY_LINE2, 12, ","))).message).toMatch(/^line2: got .*; expected columns 9-17 of line 2 to hold the inclination/);
    expect(err(parseTle(SKERRY_LINE1, SKERRY_LINE2.slice(0, 68) + "0")).message).toMatch(/^line2: got "0"; expected column 69 of line 2 to hold the checksum 7/);
    expect(err(parseTle(SKERRY_LINE1, withColumn(withColumn(SKERRY_LINE2, 5, "1"), 7, "2"))).message).toMatch(/columns 3-7 of line 2 to hold the catalogue number of line 1/);
    expect(err(parseTle(SKERRY_LINE1.slice(0, 60), SKERRY_LINE2)).message).toMatch(/^line1: got .*; expected line 1 of a two-line element set: exactly 69 characters \(this one has 60/);
    expect(err(parseTle(SKERRY_LINE2, SKERRY_LINE1)).message).toMatch(/columns 1-2 of line 1 to hold "1 "/);
    expect(err(parseTle(withColumn(withColumn(withColumn(SKERRY_LINE1, 21, "3"), 22, "6"), 23, "7"), SKERRY_LINE2)).message).toMatch(/a day of the year from 1 up to 366 \(not included\) for 2026/);
    expect(err(parseTle(SKERRY_LINE1, withColumn(SKERRY_LINE2, 9, "2"))).message).toMatch(/inclination in deg, from 0 to 180/);
    expectError(parseTle(42, SKERRY_LINE2), "bad_argument", "line1");
    expectError(parseTle(SKERRY_LINE1, null), "bad_argument", "line2");
    expectError(parseTle(SKERRY_LINE1, withColumn(SKERRY_LINE2, 60, "x"), ["source", "source"]), "bad_argument", "source");
  });

  it("accepts trailing spaces and a carriage return, and the Alpha-5 catalogue number", () => {
    expect(ok(parseTle(SKERRY_LINE1 + "  \r", SKERRY_LINE2 + " ")).catalogueNumber).toBe("99001");
    const a1 = withColumn(SKERRY_LINE1, 3, "A");
    const a2 = withColumn(SKERRY_LINE2, 3, "A");
    expect(ok(parseTle(a1, a2)).catalogueNumber).toBe("A9001");
    expectError(parseTle(SKERRY_LINE1 + " x", SKERRY_LINE2), "bad_argument", "line1");
  });
});
