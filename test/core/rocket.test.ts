import { describe, expect, it } from "vitest";
import { isDomainError, type DomainError, type Result } from "../../src/core/domain";
import { burnSequence, G0_KM_PER_S2, massRatio, MAX_MASS_RATIO, propellantMass, rocketDv } from "../../src/core/rocket";
import { HP as D, exactDecimal as exact } from "../support/exact";
import { expectRelative, expectError } from "../support/expect";

// Reference values: decimal.js 10.6.0 at 50 digits, from the exact binary value of each input.
const G0 = new D("0.00980665"); // 9.80665 m/s^2 exactly (CGPM 1901; BIPM SI Brochure), in km/s^2

const rowsOf = (r: Result<Result<number[]>[]>): Result<number[]>[] => {
  if (isDomainError(r)) throw new Error(r.message);
  return r;
};

describe("G0_KM_PER_S2", () => {
  it("is standard gravity 9.80665 m/s^2 in km/s^2", () => {
    expect(G0_KM_PER_S2 * 1000).toBeCloseTo(9.80665, 15);
    expect(G0_KM_PER_S2).toBe(0.00980665);
  });
});

describe("rocketDv", () => {
  it("agrees with a 50-digit recomputation of g0 Isp ln(m0/mf)", () => {
    for (const [isp, m0, mf] of [[300, 1000, 400], [450, 5192, 1839.7], [3000, 1.0000001, 1], [220, 99, 1]]) {
      const expected = G0.mul(exact(isp)).mul(exact(m0).div(exact(mf)).ln()).toNumber();
      expectRelative(rocketDv(isp, m0, mf), expected, 1e-14);
    }
  });

  it("gives g0 Isp for a mass ratio of e", () => {
    const e = D.exp(1);
    expectRelative(rocketDv(300, e.mul(1000).toNumber(), 1000), 300 * 0.00980665, 1e-15);
  });

  it("is zero when no mass is burnt", () => {
    expect(rocketDv(300, 1000, 1000)).toBe(0);
  });

  it("refuses a final mass above the initial one and non-positive inputs", () => {
    expectError(rocketDv(300, 1000, 1001), "bad_argument", "final_mass");
    expectError(rocketDv(0, 1000, 500), "bad_argument", "isp");
    expectError(rocketDv(300, -1, 500), "bad_argument", "initial_mass");
    expectError(rocketDv(300, 1000, 0), "bad_argument", "final_mass");
  });
});

describe("propellantMass / massRatio", () => {
  it("agree with a 50-digit recomputation", () => {
    for (const [dv, isp, mf] of [[3.59, 300, 1000], [1e-9, 300, 1000], [9.3, 450, 25000], [0.2, 2000, 3]]) {
      const x = exact(dv).div(G0.mul(exact(isp)));
      expectRelative(massRatio(dv, isp), D.exp(x).toNumber(), 1e-15);
      expectRelative(propellantMass(dv, isp, mf), exact(mf).mul(D.exp(x).sub(1)).toNumber(), 1e-14);
    }
  });

  it("round-trips with rocketDv", () => {
    for (const [dv, isp, mf] of [[3.59, 300, 1000], [1e-6, 300, 1000], [12, 350, 40], [0.001, 4000, 1]]) {
      const mp = propellantMass(dv, isp, mf) as number;
      // forming mf + mp rounds at the scale of mf, which a small burn's ln(1 + mp/mf) magnifies
      expectRelative(rocketDv(isp, mf + mp, mf), dv, 1e-14 + (2.3e-16 * (mf + mp)) / mp);
      expectRelative(massRatio(dv, isp), (mf + mp) / mf, 1e-14);
    }
  });

  it("are 0 and 1 for no dv", () => {
    expect(propellantMass(0, 300, 1000)).toBe(0);
    expect(massRatio(0, 300)).toBe(1);
  });

  it("refuse a burn beyond the plausibility limit (#N/A, even where float64 would overflow) and negative dv", () => {
    expectError(massRatio(2500, 300), "no_answer", "dv");
    expectError(propellantMass(2500, 300, 1), "no_answer", "dv");
    expectError(massRatio(-1, 300), "bad_argument", "dv");
    expectError(propellantMass(1, 300, -5), "bad_argument", "final_mass");
  });
});

describe("burnSequence", () => {
  it("chains the burns: each mass after is the next mass before", () => {
    const rows = rowsOf(burnSequence([2.45, 1.48, 0.05], [320], 5000)) as number[][];
    expect(rows).toHaveLength(3);
    for (let i = 0; i + 1 < rows.length; i++) expect(rows[i + 1][0]).toBe(rows[i][2]);
    for (const [before, prop, after] of rows) expectRelative(before - prop, after, 1e-15);
  });

  it("matches one burn of the summed dv when the isp is the same throughout", () => {
    const rows = rowsOf(burnSequence([2.45, 1.48, 0.05], [320], 5000)) as number[][];
    // The rocket equation composes: exp(-a) exp(-b) = exp(-(a+b)) (decimal.js 10.6.0 for the reference).
    const expected = new D(5000).mul(D.exp(exact(2.45 + 1.48 + 0.05).neg().div(G0.mul(320)))).toNumber();
    expectRelative(rows[2][2], expected, 1e-14);
    expectRelative(rocketDv(320, 5000, rows[2][2]), 2.45 + 1.48 + 0.05, 1e-13);
  });

  it("uses one isp per burn when given one per burn", () => {
    const rows = rowsOf(burnSequence([1, 2], [300, 450], 1000)) as number[][];
    expectRelative(rocketDv(300, rows[0][0], rows[0][2]), 1, 1e-14);
    expectRelative(rocketDv(450, rows[1][0], rows[1][2]), 2, 1e-14);
  });

  it("has no floor without a dry mass (the ideal equation never runs out)", () => {
    const rows = rowsOf(burnSequence([6, 6], [300], 1000));
    expect(rows.every((r) => Array.isArray(r) && r.every((x) => x > 0))).toBe(true);
    expect(burnSequence([6, 6], [300], 1000, 0)).toEqual(rows);
    expect(burnSequence([6, 6], [300], 1000, null)).toEqual(rows);
  });

  it("marks the exhausting burn and every later one #N/A, with the reason", () => {
    // 1000 kg with 600 kg dry, 1 km/s burns at 300 s: the second burn needs more than is left.
    const rows = rowsOf(burnSequence([1, 1, 0.1], [300], 1000, 600));
    expect(Array.isArray(rows[0])).toBe(true);
    expectError(rows[1], "no_answer", "dvs");
    const after1 = new D(1000).mul(D.exp(new D(-1).div(G0.mul(300)))); // decimal.js 10.6.0
    const needed = after1.mul(new D(1).sub(D.exp(new D(-1).div(G0.mul(300)))));
    const left = after1.sub(600);
    expect(needed.gt(left)).toBe(true);
    expect((rows[1] as DomainError).message).toContain(
      `burn 2 needs ${needed.toSignificantDigits(6).toString()} kg of propellant but only ${left.toSignificantDigits(6).toString()} kg remain`,
    );
    expectError(rows[2], "no_answer", "dvs");
    expect((rows[2] as DomainError).message).toContain("burn 2, which exhausts the propellant");
  });

  it("lets a burn use the propellant exactly down to the dry mass", () => {
    const dv = rocketDv(300, 1000, 600) as number;
    const rows = rowsOf(burnSequence([dv, 0], [300], 1000, 600)) as number[][];
    expect(rows[0][2]).toBeCloseTo(600, 9);
    expect(rows[1]).toEqual([rows[0][2], 0, rows[0][2]]);
    expectError(rowsOf(burnSequence([dv * (1 + 1e-9)], [300], 1000, 600))[0], "no_answer", "dvs");
  });

  it("errors a row with a negative dv or a bad isp, and leaves the later rows #N/A", () => {
    const rows = rowsOf(burnSequence([1, -0.5, 1], [300], 1000));
    expect(Array.isArray(rows[0])).toBe(true);
    expectError(rows[1], "bad_argument", "dvs");
    expectError(rows[2], "no_answer", "dvs");
    const rows2 = rowsOf(burnSequence([1, 1], [300, 0], 1000));
    expectError(rows2[1], "bad_argument", "isps");
  });

  it("refuses whole-call errors as one error", () => {
    expectError(burnSequence([], [300], 1000), "bad_argument", "dvs");
    expectError(burnSequence([1, 2, 3], [300, 320], 1000), "bad_argument", "isps");
    expectError(burnSequence([1], [300], 0), "bad_argument", "initial_mass");
    expectError(burnSequence([1], [300], 1000, 1200), "bad_argument", "dry_mass");
    expectError(burnSequence([1], [300], 1000, -1), "bad_argument", "dry_mass");
  });
});

describe("the plausibility limit on one vehicle's mass ratio (MAX_MASS_RATIO)", () => {
  // Saturn V News Reference (NASA MSFC, December 1968): first stage 4,881,000 lb loaded, 303,000 lb
  // dry, a ratio of 16.1, among the best flown; the limit is 100 (99 % propellant).
  it("lies well above the best published stage and above a single stage to orbit", () => {
    expect(4881000 / 303000).toBeCloseTo(16.1, 1);
    expect(MAX_MASS_RATIO).toBe(100);
    expectRelative(massRatio(9.4, 250), Math.exp(9.4 / (0.00980665 * 250)), 1e-15); // about 46
    expectRelative(massRatio(Math.log(99.999) * 0.00980665 * 300, 300), 99.999, 1e-13);
  });

  it("refuses a delta-v typed in m/s, with the ratio it needs and the slip", () => {
    const e = massRatio(92, 225) as DomainError;
    expectError(e, "no_answer", "dv");
    expect(e.message).toBe(
      "dv: 92 km/s at an Isp of 225 s needs a mass ratio of 1.3e18; no single stage exceeds about 16 (Saturn V's first stage), and 100 would be 99 % propellant; delta-v is in km/s — 92 m/s is 0.092.",
    );
  });

  it("refuses masses whose ratio no vehicle reaches, and a chain of burns that together exceed it", () => {
    expectError(rocketDv(225, 180000, 172.5), "no_answer", "final_mass");
    const rows = rowsOf(burnSequence([3, 3, 3, 3, 3, 0.1], [300], 180));
    expect(rows.slice(0, 4).every(Array.isArray)).toBe(true);
    expect((rows[4] as DomainError).message).toMatch(/^dvs: burns 1 to 5 together need a mass ratio of 164 from one vehicle/);
    expectError(rows[5], "no_answer", "dvs");
  });
});
