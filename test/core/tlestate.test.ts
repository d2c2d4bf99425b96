import { describe, expect, it } from "vitest";
import { earthFixedToInertial, fk5Rotations, inertialToItrfKernel } from "../../src/core/fk5";
import { sgp4Record, sgp4State } from "../../src/core/sgp4";
import { tleState } from "../../src/core/tlestate";
import { err, expectError, ok } from "../support/expect";
import { SKERRY_1_TLE } from "../../src/scenario/story";
import { SKERRY_EPOCH_JD as EPOCH } from "../support/skerry";

const { line1: SKERRY_LINE1, line2: SKERRY_LINE2 } = SKERRY_1_TLE;

const gap = (a: readonly number[], b: readonly number[]) => Math.max(...a.map((x, i) => Math.abs(x - b[i])));

describe("TLE state (SGP4 through satellite.js, checked TLE, frames)", () => {
  it("gives SGP4's TEME state at the date, counted in minutes from the element set's epoch", () => {
    const rec = sgp4Record(SKERRY_LINE1, SKERRY_LINE2);
    expect(rec.epoch).toBeCloseTo(EPOCH, 9);
    const at = EPOCH + 0.3;
    // (The minutes come from the float64 dates: 40 microseconds of resolution, 0.3 m along the track.)
    expect(ok(tleState(SKERRY_LINE1, SKERRY_LINE2, at, "TEME"))).toEqual(ok(sgp4State(rec, (at - rec.epoch) * 1440, "date")));
    // A 690 km sun-synchronous orbit: radius about 7068 km, speed about 7.5 km/s.
    const s = ok(tleState(SKERRY_LINE1, SKERRY_LINE2, at));
    expect(Math.hypot(s[0], s[1], s[2])).toBeGreaterThan(7040);
    expect(Math.hypot(s[0], s[1], s[2])).toBeLessThan(7100);
    expect(Math.hypot(s[3], s[4], s[5])).toBeCloseTo(7.5, 1);
  });

  it("reaches the same Earth-fixed state through J2000 as straight from TEME (UT1 = UTC)", () => {
    const at = EPOCH + 1.7;
    const j2000 = ok(tleState(SKERRY_LINE1, SKERRY_LINE2, at, "J2000"));
    const itrf = ok(tleState(SKERRY_LINE1, SKERRY_LINE2, at, "ITRF"));
    const teme = ok(tleState(SKERRY_LINE1, SKERRY_LINE2, at, "TEME"));
    expect(gap(ok(earthFixedToInertial(itrf, at)), j2000)).toBeLessThan(1e-8);
    expect(gap(inertialToItrfKernel([teme[0], teme[1], teme[2]], [teme[3], teme[4], teme[5]], fk5Rotations(at, { dut1: 0, xp: 0, yp: 0 }), "TEME"), itrf)).toBeLessThan(1e-9);
  });

  it("refuses a bad line with its column, and says why SGP4 stops", () => {
    expect(err(tleState(SKERRY_LINE1.slice(0, 68) + "0", SKERRY_LINE2, EPOCH)).message).toMatch(/^line1: got "0"; expected column 69 of line 1 to hold the checksum 3/);
    expectError(tleState(SKERRY_LINE1, SKERRY_LINE2, NaN), "bad_argument", "date");
    expectError(tleState(SKERRY_LINE1, SKERRY_LINE2, EPOCH, "GCRF"), "bad_argument", "frame");
    // Verification object 28872 decays within the hour (AIAA 2006-6753: "lost in 50 minutes").
    const l1 = "1 28872U 05037B   05333.02012661  .25992681  00000-0  24476-3 0  1534";
    const l2 = "2 28872  96.4736 157.9986 0303955 244.0492 110.6523 16.46015938 10708";
    const epoch = ok(tleState(l1, l2, 2453703.52012661, "TEME"));
    expect(epoch.length).toBe(6);
    expect(err(tleState(l1, l2, 2453703.52012661 + 1, "TEME")).message).toMatch(/^date: SGP4 cannot propagate this element set 1\.000 days from its epoch: the orbit has decayed/);
  });
});
