import Decimal from "decimal.js";
import { describe, expect, it } from "vitest";
import { stumpffC, stumpffS } from "../../src/core/stumpff";
import { rng } from "./randomOrbits";

// Reference: decimal.js 10.6.0 at 50 significant digits, evaluating the closed forms of the
// Stumpff functions (Curtis, Orbital Mechanics for Engineering Students, 3rd ed., §3.7;
// Vallado 4th ed. c2, c3 of Alg. 8) on the exact float64 argument.
const D = Decimal.clone({ precision: 50 });

function exactC(z: number): Decimal {
  const Z = new D(z);
  if (z === 0) return new D(0.5);
  if (z > 0) return new D(1).minus(Z.sqrt().cos()).div(Z);
  const x = Z.neg().sqrt();
  return x.cosh().minus(1).div(Z.neg());
}

function exactS(z: number): Decimal {
  const Z = new D(z);
  if (z === 0) return new D(1).div(6);
  const x = z > 0 ? Z.sqrt() : Z.neg().sqrt();
  return (z > 0 ? x.minus(x.sin()) : x.sinh().minus(x)).div(x.pow(3));
}

/** Spacing of float64 numbers at |x| (x normal). */
const ulp = (x: number): number => 2 ** (Math.floor(Math.log2(Math.abs(x))) - 52);
const ulpError = (got: number, exact: Decimal): number => exact.minus(got).abs().toNumber() / ulp(exact.toNumber());

describe("Stumpff functions C(z) and S(z)", () => {
  it("take their limits C(0) = 1/2 and S(0) = 1/6 at z = 0 (the series' first terms, Curtis 3rd ed. §3.7)", () => {
    expect(stumpffC(0)).toBe(0.5);
    expect(stumpffS(0)).toBe(1 / 6);
    expect(stumpffC(-0)).toBe(0.5);
    expect(stumpffS(5e-324)).toBe(1 / 6);
  });

  it("match the 50-digit closed forms within 3.5 ulp on the series branch |z| < 10", () => {
    const next = rng(20261201);
    let worst = 0;
    for (let i = 0; i < 2000; i++) {
      // half uniform over (-10, 10), half log-spread towards 0 where the closed forms cancel
      const z = i % 2 === 0 ? 20 * next() - 10 : (next() < 0.5 ? -1 : 1) * 10 ** (-12 * next());
      worst = Math.max(worst, ulpError(stumpffC(z), exactC(z)), ulpError(stumpffS(z), exactS(z)));
    }
    expect(worst).toBeLessThanOrEqual(3.5);
  });

  it("match the 50-digit values on the closed-form branch 10 <= z <= 200 (S within 4 ulp, C within 8 eps max(|C|, 1/z))", () => {
    const next = rng(7);
    for (let i = 0; i < 1500; i++) {
      const z = 10 + 190 * next();
      expect(ulpError(stumpffS(z), exactS(z))).toBeLessThanOrEqual(4);
      // C has zeros at z = (2 pi k)^2, so its error is bounded in absolute terms there.
      const c = exactC(z);
      const allowed = 8 * Number.EPSILON * Math.max(Math.abs(c.toNumber()), 1 / z);
      expect(c.minus(stumpffC(z)).abs().toNumber()).toBeLessThanOrEqual(allowed);
    }
  });

  it("stay within 2 (1 + sqrt(-z)) ulp for -716^2 <= z <= -10, the functions' own conditioning, through the overflow-safe branch", () => {
    const next = rng(11);
    for (let i = 0; i < 1500; i++) {
      const x = Math.sqrt(10) + (716 - Math.sqrt(10)) * next();
      const z = -x * x;
      const c = stumpffC(z);
      const s = stumpffS(z);
      expect(Number.isFinite(c) && Number.isFinite(s)).toBe(true);
      expect(ulpError(c, exactC(z))).toBeLessThanOrEqual(2 * (1 + x));
      expect(ulpError(s, exactS(z))).toBeLessThanOrEqual(2 * (1 + x));
    }
  });

  it("agree across the switch point |z| = 10 to within 3 ulp", () => {
    for (const edge of [10, -10]) {
      const inside = edge > 0 ? 10 - 2 * ulp(10) : -10 + 2 * ulp(10);
      // the functions themselves change by |C'| * 2 ulp(10) < 1 ulp over that step
      expect(Math.abs(stumpffC(inside) - stumpffC(edge)) / ulp(stumpffC(edge))).toBeLessThanOrEqual(3);
      expect(Math.abs(stumpffS(inside) - stumpffS(edge)) / ulp(stumpffS(edge))).toBeLessThanOrEqual(3);
    }
  });

  it("satisfy cos^2 x + sin^2 x = 1 written as (1 - zC)^2 + z (1 - zS)^2 = 1 for |z| <= 40", () => {
    // 1 - zC = cos sqrt z and 1 - zS = sin(sqrt z)/sqrt z (the c0, c1 of Vallado 4th ed. §2.2).
    const next = rng(3);
    for (let i = 0; i < 1000; i++) {
      const z = 80 * next() - 40;
      const c0 = 1 - z * stumpffC(z);
      const c1 = 1 - z * stumpffS(z);
      // for z < 0 this is cosh^2 - sinh^2, so the tolerance scales with the size of the terms
      expect(Math.abs(c0 * c0 + z * c1 * c1 - 1)).toBeLessThan(1e-14 * (c0 * c0 + Math.abs(z) * c1 * c1));
    }
  });

  it("never return NaN, and overflow to +Infinity only beyond sqrt(-z) ~ 716 where the true value exceeds float64", () => {
    for (const z of [-1e300, -1e7, -5.2e5, -4.9e5, -1e4, -1, -1e-300, 0, 1e-300, 1, 1e4, 1e7, 1e300]) {
      expect(Number.isNaN(stumpffC(z)) || Number.isNaN(stumpffS(z))).toBe(false);
    }
    expect(stumpffC(-716 * 716)).toBeLessThan(Infinity);
    expect(stumpffS(-716 * 716)).toBeLessThan(Infinity);
    expect(stumpffC(-1e7)).toBe(Infinity); // true value ~ e^3162 / 2e7
  });
});
