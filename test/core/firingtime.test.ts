import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { lowThrustTime } from "../../src/core/firingtime";
import { lowThrustDv } from "../../src/core/lowthrust";
import { burnSequence } from "../../src/core/rocket";
import { HP, exactDecimal } from "../support/exact";
import { expectError, expectRelative, ok } from "../support/expect";

describe("lowThrustTime against worked figures", () => {
  it("Curtis 3rd ed. Solutions Manual, Problem 6.1: 125,000 kg, 50 kN, 28.548 m/s, Isp 300 s", () => {
    // Solutions Manual to Curtis, Orbital Mechanics for Engineering Students, 3rd ed., Problem 6.1:
    // (a) neglecting the propellant used, t = m dv / F = 71.371 s; (d) the propellant used is
    // 0.965353 % of the mass (computed there with g0 = 9.81 m/s^2). Propellant over mass flow
    // gives the time with flow: 0.00965353 x 125000 x 300 x 9.81 / 50000 = 71.0258 s. Ours uses
    // g0 = 9.80665, which moves the figure by 8e-6 relative.
    const t = ok(lowThrustTime(0.028548, 50000, 125000, 300));
    expectRelative(t, (0.00965353 * 125000 * 300 * 9.81) / 50000, 2e-5);
    expect(t).toBeLessThan(71.371);
    expectRelative((125000 * 28.548) / 50000, 71.371, 2e-5); // the manual's constant-mass figure (it carries dv to more digits), as a check of the reading
  });

  it("tends to the constant-acceleration time dv / f of the Edelbaum LEO-GEO case when the propellant flow vanishes", () => {
    // 28.5 deg case (test/core/lowthrust.test.ts): 191.26295 days at f = 3.5e-7 km/s^2 = 0.35 N on
    // 1000 kg. At Isp 1e9 s the mass hardly changes (dv / (g0 Isp) = 6e-7).
    const dv = ok(lowThrustDv(398600.4418, 7000, 42166, 28.5));
    expectRelative(ok(lowThrustTime(dv, 0.35, 1000, 1e9)) / 86400, 191.26295, 1e-5);
  });
});

describe("lowThrustTime: the propellant flow", () => {
  it("equals the propellant of the rocket equation (BURN_SEQUENCE's) over the mass flow F / (g0 Isp), to a few ulp (property, fast-check 4.11.0)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 4.5, noNaN: true }), // at most a mass ratio of 99 at Isp 100 s (rocket.ts, MAX_MASS_RATIO)
        fc.double({ min: 1e-3, max: 1e4, noNaN: true }),
        fc.double({ min: 1, max: 1e5, noNaN: true }),
        fc.double({ min: 100, max: 1e4, noNaN: true }),
        (dv, thrust, m0, isp) => {
          const propellant = ok(burnSequence([dv], [isp], m0))[0];
          if (!Array.isArray(propellant)) return false;
          const flow = thrust / (9.80665 * isp); // kg/s
          const t = ok(lowThrustTime(dv, thrust, m0, isp));
          return Math.abs(t - propellant[1] / flow) <= 2e-15 * t + 1e-300; // (1e-300: subnormal dv underflows both to about 0)
        },
      ),
      { numRuns: 1000, seed: 60 },
    );
  });

  it("agrees with a 50-digit evaluation of m0 (1 - exp(-dv / (g0 Isp))) g0 Isp / F (decimal.js 10.6.0), down to tiny burns", () => {
    for (const [dv, F, m0, isp] of [[1e-9, 0.01, 180, 1500], [0.05, 0.02, 180, 1600], [5.78, 0.35, 1000, 3000], [13, 1e3, 5e4, 300]]) {
      const ve = exactDecimal(9.80665).mul(exactDecimal(isp));
      const ref = exactDecimal(m0).mul(new HP(1).sub(HP.exp(exactDecimal(dv).mul(1000).div(ve).neg()))).mul(ve).div(exactDecimal(F)).toNumber();
      expectRelative(ok(lowThrustTime(dv, F, m0, isp)), ref, 1e-15);
    }
  });

  it("is zero for no delta-v and always shorter than the constant-mass estimate m0 dv / F", () => {
    expect(ok(lowThrustTime(0, 1, 100, 300))).toBe(0);
    for (const dv of [1e-6, 0.1, 1, 10]) expect(ok(lowThrustTime(dv, 0.1, 180, 1500))).toBeLessThan((180 * dv * 1000) / 0.1);
  });
});

describe("lowThrustTime: refused inputs", () => {
  it("names the bad parameter (#VALUE!)", () => {
    expectError(lowThrustTime(-1, 1, 100, 300), "bad_argument", "delta_v");
    expectError(lowThrustTime(1, 0, 100, 300), "bad_argument", "thrust");
    expectError(lowThrustTime(1, 1, -100, 300), "bad_argument", "initial_mass");
    expectError(lowThrustTime(1, 1, 100, 0), "bad_argument", "isp");
    expectError(lowThrustTime(1, 1, 100, Infinity), "bad_argument", "isp");
  });
});
