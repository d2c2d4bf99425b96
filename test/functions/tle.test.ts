import "../support/customFunctions";
import { readFileSync } from "node:fs";
import { resolve } from "node:path";
import { describe, expect, it } from "vitest";
import * as family from "../../src/functions/tle";
import { SKERRY_1_TLE } from "../../src/scenario/story";
import { code, msg, sheet } from "./cells";

const { line1: SKERRY_LINE1, line2: SKERRY_LINE2 } = SKERRY_1_TLE;

const { tleElements, tleState } = sheet(family);

// Family "Two-line element sets" at the sheet level: the published verification set of Vallado,
// Crawford, Hujsak, Kelso, "Revisiting Spacetrack Report #3", AIAA 2006-6753 (SGP4-VER.TLE and
// tcppver.out, test/core/fixtures/sgp4) through the worksheet functions, with dates as sheet
// serials; columns of element sets lifting; bad lines in the cell.

const dir = resolve(__dirname, "../core/fixtures/sgp4");
const lines = readFileSync(resolve(dir, "SGP4-VER.TLE"), "utf8").split(/\r?\n/).filter((l) => /^[12] /.test(l));
const pair = (number: string): [string, string] => {
  const k = lines.findIndex((l) => l.startsWith(`1 ${number}`));
  return [lines[k].slice(0, 69), lines[k + 1].slice(0, 69)];
};
/** The published TEME vectors of one object: rows of [minutes from epoch, x, y, z, vx, vy, vz]. */
function published(number: string): number[][] {
  const rows: number[][] = [];
  let inRun = false;
  for (const line of readFileSync(resolve(dir, "tcppver-rv.out"), "utf8").split(/\r?\n/)) {
    if (line.includes("xx")) inRun = line.trim().split(/\s+/)[0] === number.replace(/^0+/, "");
    else if (inRun && line.trim()) rows.push(line.trim().split(/\s+/).map(Number));
  }
  return rows;
}

describe("TLE_ELEMENTS", () => {
  it("reads object 00005 of the verification set, its epoch as a date serial (2000-06-27 18:50:19.7336 UTC)", () => {
    const [l1, l2] = pair("00005");
    const out = tleElements(l1, l2, true);
    expect(out[0]).toEqual(["epoch (UTC)", "inclination (deg)", "RAAN (deg)", "eccentricity", "argument of perigee (deg)", "mean anomaly (deg)", "mean motion (rev/day)", "B* (1/Earth radii)"]);
    // Epoch 00179.78495062: day 179 of 2000 is June 27; serial 36704 is 2000-06-27.
    expect(Math.abs((out[1][0] as number) - (36704 + 0.78495062))).toBeLessThan(1e-9);
    expect(out[1].slice(1, 7)).toEqual([34.2682, 348.7242, 0.1859667, 331.7664, 19.3264, 10.82419157]);
    expect(out[1][7]).toBeCloseTo(0.28098e-4, 15);
  });

  it("lifts over a column of pairs, a bad pair erroring its own row only", () => {
    const ids = ["00005", "06251", "28057"];
    const col1 = ids.map((n) => [pair(n)[0]]);
    const col2 = ids.map((n) => [pair(n)[1]]);
    col2[1] = [col2[1][0].slice(0, 68) + "0"]; // a mistyped checksum
    const out = tleElements(col1, col2);
    expect(out.length).toBe(3);
    expect(out[0]).toEqual(tleElements(col1[0][0], col2[0][0])[0]);
    expect(out[2][1]).toBe(98.4283);
    expect(code(out[1][0])).toBe("#VALUE!");
    expect(msg(out[1][0])).toMatch(/^line2: got "0"; expected column 69 of line 2 to hold the checksum 4/);
  });

  it("names the column and what it holds for a shifted line, and refuses numbers", () => {
    const shifted = " " + SKERRY_LINE1.slice(0, 68);
    expect(msg(tleElements(shifted, SKERRY_LINE2)[0][0])).toMatch(/^line1: got .*; expected columns 1-2 of line 1 to hold "1 "/);
    expect(msg(tleElements(SKERRY_LINE1, 2)[0][0])).toBe("line2: got 2; expected line 2 of a two-line element set as text (69 characters).");
  });
});

describe("TLE_STATE", () => {
  it.each(["00005", "06251", "28057"])("gives the published TEME vectors of object %s from a sheet date to 1 m and 1 mm/s", (number) => {
    // The sheet's dates are float64 Julian dates inside (40 microseconds apart at JD 2.45e6), so a
    // date serial pins the instant to 0.3 m along the track; SGP4 itself matches to 1e-8 km (test/core/sgp4.test.ts).
    const [l1, l2] = pair(number);
    const epoch = tleElements(l1, l2)[0][0] as number;
    const rows = published(number);
    expect(rows.length).toBeGreaterThan(10);
    const out = tleState(l1, l2, rows.map((r) => [epoch + r[0] / 1440]), "TEME") as number[][];
    rows.forEach((r, k) => {
      for (let i = 0; i < 3; i++) expect(Math.abs(out[k][i] - r[1 + i])).toBeLessThan(1e-3);
      for (let i = 3; i < 6; i++) expect(Math.abs(out[k][i] - r[1 + i])).toBeLessThan(1e-6);
    });
  });

  it("rotates TEME without changing lengths: J2000 and ITRF positions have the TEME radius", () => {
    const at = "2026-06-01T04:00:30Z";
    const [teme] = tleState(SKERRY_LINE1, SKERRY_LINE2, at, "TEME") as number[][];
    const r = Math.hypot(teme[0], teme[1], teme[2]);
    for (const frame of [null, "J2000", "itrf"]) {
      const [s] = tleState(SKERRY_LINE1, SKERRY_LINE2, at, frame) as number[][];
      expect(Math.hypot(s[0], s[1], s[2])).toBeCloseTo(r, 9);
    }
    expect(tleState(SKERRY_LINE1, SKERRY_LINE2, at, null, true)[0]).toEqual(["x (km)", "y (km)", "z (km)", "vx (km/s)", "vy (km/s)", "vz (km/s)"]);
  });

  it("is #N/A where SGP4 stops: verification object 28872 decays within the hour (AIAA 2006-6753)", () => {
    const [l1, l2] = pair("28872");
    const epoch = tleElements(l1, l2)[0][0] as number;
    expect(code(tleState(l1, l2, epoch + 1)[0][0])).toBe("#N/A");
    expect(msg(tleState(l1, l2, epoch + 1)[0][0])).toMatch(/^date: SGP4 cannot propagate this element set 1\.000 days from its epoch: the orbit has decayed/);
    expect(msg(tleState(l1, l2, epoch, "ECI")[0][0])).toBe('frame: got "ECI"; expected one of "J2000", "TEME", "ITRF".');
  });
});
