import { readFileSync } from "node:fs";
import { resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { isDomainError } from "../../src/core/domain";
import { sgp4Record, sgp4State } from "../../src/core/sgp4";

// The published verification set of Vallado, Crawford, Hujsak, Kelso, "Revisiting Spacetrack
// Report #3", AIAA 2006-6753: SGP4-VER.TLE and the reference output tcppver.out (fixtures/sgp4,
// see its README). Every published vector is compared to its printed digits: 8 decimals in km
// (half a unit: 5e-9 km) and 9 in km/s (5e-10 km/s), with 1e-10 of slack for values that sit on
// a rounding boundary.
const dir = resolve(__dirname, "fixtures/sgp4");
const tleLines = readFileSync(resolve(dir, "SGP4-VER.TLE"), "utf8").split(/\r?\n/).filter((l) => /^[12] /.test(l));
interface Run { number: string; rows: number[][] }
const runs: Run[] = [];
for (const line of readFileSync(resolve(dir, "tcppver-rv.out"), "utf8").split(/\r?\n/)) {
  if (!line.trim()) continue;
  if (line.includes("xx")) runs.push({ number: line.trim().split(/\s+/)[0], rows: [] });
  else runs[runs.length - 1].rows.push(line.trim().split(/\s+/).map(Number));
}
const cases = runs.map((run, k) => ({ run, line1: tleLines[2 * k], line2: tleLines[2 * k + 1], k }));

const HALF_KM = 5e-9 + 1e-10;
const HALF_KMS = 5e-10 + 1e-10;
// The second run of 20413 starts 1 844 000 min (3.5 years) from epoch: the deep-space resonance
// integration steps through those years and the float rounding of JavaScript and the C++ reference
// part by up to 1.2e-7 km (measured), so that run is held to 2e-7 km (0.2 mm).
const LONG_RUN_KM = 2e-7;

describe("SGP4 (satellite.js 6.0.2) against the AIAA 2006-6753 verification set", () => {
  it("has the whole published set: 33 runs, 667 vectors", () => {
    expect(runs.length).toBe(33);
    expect(tleLines.length).toBe(66);
    expect(runs.reduce((n, r) => n + r.rows.length, 0)).toBe(667);
  });

  it.each(cases.map((c) => [c.run.number + (c.run.rows.some((r) => r[0] > 1e6) ? " (3.5-year run)" : ""), c] as const))("reproduces object %s to the published digits", (_name, c) => {
    expect(c.line1.slice(2, 7).trim().replace(/^0+/, "")).toBe(c.run.number);
    const record = sgp4Record(c.line1, c.line2);
    const posTolerance = c.run.rows.some((r) => r[0] > 1e6) ? LONG_RUN_KM : HALF_KM;
    for (const row of c.run.rows) {
      const s = sgp4State(record, row[0], "date");
      if (c.run.number === "33334") {
        // The published line at t = 0 is the driver's stale previous line: SGP4 fails here.
        expect(isDomainError(s)).toBe(true);
        continue;
      }
      if (isDomainError(s)) throw new Error(`${c.run.number} at ${row[0]} min: ${s.message}`);
      for (let i = 0; i < 3; i++) expect(Math.abs(s[i] - row[1 + i])).toBeLessThanOrEqual(posTolerance);
      for (let i = 3; i < 6; i++) expect(Math.abs(s[i] - row[1 + i])).toBeLessThanOrEqual(HALF_KMS);
    }
  });

  it("reports an SGP4 error where a published run stops before its stop time", () => {
    // The runs that the reference output ends early (decay, eccentricity or semi-latus rectum out
    // of range); python-sgp4 2.27's tests list the same seven error codes in this order.
    const codes: number[] = [];
    for (const c of cases) {
      const [start, stop, step] = c.line2.slice(69).trim().split(/\s+/).map(Number);
      const last = c.run.rows[c.run.rows.length - 1][0];
      const next = last === 0 ? (start === 0 ? step : start) : last + step;
      if (c.run.number === "33334" || (last < stop && next <= stop)) {
        const record = sgp4Record(c.line1, c.line2);
        const s = sgp4State(record, c.run.number === "33334" ? 0 : next, "date");
        expect(isDomainError(s)).toBe(true);
        codes.push(record.initError || record.satrec.error);
      }
    }
    expect(codes).toEqual([1, 1, 6, 6, 4, 3, 6]);
  });
});
