import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { lowThrustDv, MAX_PLANE_CHANGE_DEG } from "../../src/core/lowthrust";
import { planeChangeDv, transferBurns } from "../../src/core/maneuvers";
import { circularSpeed } from "../../src/core/twobody";
import { HP, exactDecimal } from "../support/exact";
import { err, expectError, expectRelative, ok } from "../support/expect";

const MU = 398600.4418; // km^3/s^2: astropy's GM_earth, the value of the tabulation below

describe("lowThrustDv against the published low-orbit-to-geostationary cases", () => {
  // Kechichian's low-Earth-orbit-to-geostationary example (a0 = 7000 km, a1 = 42166 km, constant
  // acceleration 3.5e-7 km/s^2; the case is his, from memory), as tabulated in poliastro's test
  // suite (tests/tests_twobody/test_thrust.py, test_leo_geo_time_and_delta_v, with the tolerances
  // used there): 28.5 deg -> 5.78378 km/s and 191.26295 days (rtol 1e-5); 90 deg -> 10.13 km/s,
  // 335 days (rtol 1e-3); 114.591 deg -> 10.61 km/s, 351 days (rtol 1e-2). The time there is
  // dv / f for the constant acceleration f.
  const f = 3.5e-7;
  const cases: [number, number, number, number][] = [
    [28.5, 5.78378, 191.26295, 1e-5],
    [90, 10.13, 335.0, 1e-3],
    [114.591, 10.61, 351.0, 1e-2],
  ];
  for (const [inc, dv, days, rtol] of cases)
    it(`gives ${dv} km/s and ${days} days at ${inc} deg`, () => {
      const got = ok(lowThrustDv(MU, 7000, 42166, inc));
      expectRelative(got, dv, rtol);
      expectRelative(got / f / 86400, days, rtol);
    });
});

describe("lowThrustDv: the closed form and its limits", () => {
  it("agrees with a 50-digit evaluation of sqrt(v0^2 - 2 v0 v1 cos(pi/2 di) + v1^2) (decimal.js 10.6.0) to 4e-16", () => {
    for (const [r0, r1, inc] of [[7000, 42166, 28.5], [6678, 6678.001, 0.001], [7000, 7000, 10], [6600, 1e6, 114], [42164, 7000, 60]]) {
      const v0 = HP.sqrt(exactDecimal(MU).div(exactDecimal(r0)));
      const v1 = HP.sqrt(exactDecimal(MU).div(exactDecimal(r1)));
      const angle = HP.acos(-1).div(2).mul(exactDecimal(inc)).mul(HP.acos(-1)).div(180);
      const ref = HP.sqrt(v0.pow(2).add(v1.pow(2)).sub(v0.mul(v1).mul(2).mul(HP.cos(angle)))).toNumber();
      expectRelative(ok(lowThrustDv(MU, r0, r1, inc)), ref, 4e-16);
    }
  });

  it("is the speed difference |v0 - v1| without a plane change (the slow coplanar spiral)", () => {
    expect(ok(lowThrustDv(MU, 7000, 42166, 0))).toBeCloseTo(circularSpeed(MU, 7000) - circularSpeed(MU, 42166), 15);
  });

  it("costs pi/2 times the impulsive plane change on one orbit, for small angles (Edelbaum's classic ratio)", () => {
    // Same radius: dv = 2 v sin(pi di / 4), against the impulsive 2 v sin(di / 2); the ratio tends to pi/2 (common practice).
    const v = circularSpeed(MU, 7000);
    for (const di of [1e-6, 0.01, 1]) {
      const ratio = ok(lowThrustDv(MU, 7000, 7000, di)) / ok(planeChangeDv(v, di));
      expect(Math.abs(ratio / (Math.PI / 2) - 1)).toBeLessThan(1e-4 * di);
    }
  });

  it("costs more than the Hohmann transfer between the same coplanar circles (property, fast-check 4.11.0)", () => {
    // Hohmann from TRANSFER_BURNS, checked against Vallado 4th ed. Example 6-1 in test/core/maneuvers.test.ts.
    const radius = fc.double({ min: 6600, max: 1e6, noNaN: true });
    fc.assert(
      fc.property(radius, radius, (r0, r1) => ok(lowThrustDv(MU, r0, r1, 0)) >= ok(transferBurns(MU, r0, r1))[3] * (1 - 1e-14)),
      { numRuns: 1000, seed: 28 },
    );
  });

  it("is symmetric in the two radii and grows with the plane change up to the 2-rad limit (property)", () => {
    const radius = fc.double({ min: 6600, max: 1e6, noNaN: true });
    const angle = fc.double({ min: 0, max: MAX_PLANE_CHANGE_DEG, noNaN: true });
    fc.assert(
      fc.property(radius, radius, angle, angle, (r0, r1, i, j) => {
        const a = ok(lowThrustDv(MU, r0, r1, i));
        const b = ok(lowThrustDv(MU, r1, r0, i));
        const lo = Math.min(i, j), hi = Math.max(i, j);
        const v0 = circularSpeed(MU, r0), v1 = circularSpeed(MU, r1);
        return Math.abs(a - b) <= 1e-15 * a && ok(lowThrustDv(MU, r0, r1, lo)) <= ok(lowThrustDv(MU, r0, r1, hi)) * (1 + 4e-16) && a <= (v0 + v1) * (1 + 4e-16);
      }),
      { numRuns: 1000, seed: 29 },
    );
  });

  it("reaches v0 + v1 at exactly 2 rad and refuses more (#N/A naming plane_change)", () => {
    expectRelative(ok(lowThrustDv(MU, 7000, 42166, MAX_PLANE_CHANGE_DEG)), circularSpeed(MU, 7000) + circularSpeed(MU, 42166), 1e-15);
    const e = err(lowThrustDv(MU, 7000, 42166, 120));
    expect(e.kind).toBe("no_answer");
    expect(e.parameter).toBe("plane_change");
    expect(e.message).toMatch(/up to 2 rad \(114\.59 deg\)/);
  });
});

describe("lowThrustDv: refused inputs", () => {
  it("names the bad parameter (#VALUE!)", () => {
    expectError(lowThrustDv(0, 7000, 42166, 0), "bad_argument", "body");
    expectError(lowThrustDv(MU, -1, 42166, 0), "bad_argument", "radius_from");
    expectError(lowThrustDv(MU, 7000, NaN, 0), "bad_argument", "radius_to");
    expectError(lowThrustDv(MU, 7000, 42166, -1), "bad_argument", "plane_change");
    expectError(lowThrustDv(MU, 7000, 42166, 181), "bad_argument", "plane_change");
  });
});
