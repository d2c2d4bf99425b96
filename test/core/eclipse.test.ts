import { describe, expect, it } from "vitest";
import { isDomainError } from "../../src/core/domain";
import { eclipseDuration } from "../../src/core/eclipse";
import { seeded } from "../support/random";

const num = (x: unknown): number => {
  if (isDomainError(x)) throw new Error(x.message);
  return x as number;
};
const DEG = Math.PI / 180;

/**
 * Independent route: walk a circular orbit in small steps with the Sun at beta from its plane
 * and measure the arc that is both behind the body (r . s < 0) and within R of the Sun line
 * (|r - (r . s) s| < R), refining each shadow edge by bisection.
 */
function shadowFractionByGeometry(R: number, r: number, betaDeg: number): number {
  const b = betaDeg * DEG;
  const s = [Math.cos(b), 0, Math.sin(b)]; // orbit in the x-y plane, Sun tilted out of it by beta
  const inShadow = (u: number) => {
    const p = [r * Math.cos(u), r * Math.sin(u), 0];
    const along = p[0] * s[0] + p[1] * s[1] + p[2] * s[2];
    if (along >= 0) return false;
    const perp = Math.hypot(p[0] - along * s[0], p[1] - along * s[1], p[2] - along * s[2]);
    return perp < R;
  };
  const steps = 3600;
  let total = 0;
  for (let k = 0; k < steps; k++) {
    const u0 = (2 * Math.PI * k) / steps;
    const u1 = (2 * Math.PI * (k + 1)) / steps;
    const a = inShadow(u0);
    const c = inShadow(u1);
    if (a === c) {
      if (a) total += u1 - u0;
      continue;
    }
    let lo = u0;
    let hi = u1;
    for (let it = 0; it < 60; it++) {
      const mid = (lo + hi) / 2;
      if (inShadow(mid) === a) lo = mid;
      else hi = mid;
    }
    total += a ? lo - u0 : u1 - lo;
  }
  return total / (2 * Math.PI);
}

describe("eclipse duration, cylindrical shadow", () => {
  it("gives 2868 s for a 12,789 km equatorial orbit of period 17,280 s at beta 0", () => {
    // server-sky.com "Earth Eclipse of Server Sky Arrays" (K. Lofstrom): with R = 6371 km,
    // 17280 x asin(6371 / 12789) / 180 deg = 2868 s per orbit. GM chosen to give that period.
    const r = 12789;
    const T = 17280;
    const gm = (4 * Math.PI * Math.PI * r ** 3) / (T * T);
    expect(Math.round(num(eclipseDuration(6371, gm, r, 0)))).toBe(2868);
  });

  it("matches a direct geometric walk round the orbit to 1e-9 of the period", () => {
    const rand = seeded(5);
    const gm = 398600.4418;
    const R = 6378.137;
    for (let k = 0; k < 60; k++) {
      const r = R + 200 + 40000 * rand() ** 2;
      const beta = -90 + 180 * rand();
      const T = 2 * Math.PI * Math.sqrt(r ** 3 / gm);
      const expected = shadowFractionByGeometry(R, r, beta);
      expect(Math.abs(num(eclipseDuration(R, gm, r, beta)) / T - expected)).toBeLessThan(1e-9);
    }
  });

  it("is zero from beta* = asin(R / r) on, and shrinks continuously to it", () => {
    const gm = 398600.4418;
    const R = 6378.137;
    const r = R + 550;
    const betaStar = Math.asin(R / r) / DEG;
    expect(num(eclipseDuration(R, gm, r, betaStar))).toBe(0);
    expect(num(eclipseDuration(R, gm, r, -betaStar - 1))).toBe(0);
    expect(num(eclipseDuration(R, gm, r, 90))).toBe(0);
    const justInside = num(eclipseDuration(R, gm, r, betaStar - 1e-6));
    expect(justInside).toBeGreaterThan(0);
    expect(justInside).toBeLessThan(10);
  });

  it("is even in beta and longest at beta 0", () => {
    const gm = 398600.4418;
    const R = 6378.137;
    const r = R + 700;
    const zero = num(eclipseDuration(R, gm, r, 0));
    for (const b of [10, 30, 50, 60]) {
      expect(num(eclipseDuration(R, gm, r, b))).toBe(num(eclipseDuration(R, gm, r, -b)));
      expect(num(eclipseDuration(R, gm, r, b))).toBeLessThan(zero);
    }
  });

  it("refuses an orbit radius inside the body (an altitude given by mistake) and a beta beyond 90", () => {
    const inside = eclipseDuration(6378, 398600, 700, 0);
    expect(isDomainError(inside) && inside.parameter === "radius" && inside.kind === "bad_argument").toBe(true);
    const beta = eclipseDuration(6378, 398600, 7000, 91);
    expect(isDomainError(beta) && beta.parameter === "beta_angle").toBe(true);
    const gm = eclipseDuration(6378, 0, 7000, 0);
    expect(isDomainError(gm) && gm.parameter === "body").toBe(true);
  });
});
