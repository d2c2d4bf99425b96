import { describe, expect, it } from "vitest";
import { centralAngleAtElevation, coverageHalfAngle, groundTrackSpacing, maxPassDuration, passDuration, slantRange, swathWidth } from "../../src/core/coverage";
import { horizonRange } from "../../src/core/geodesy";
import { sunSyncInclination } from "../../src/core/j2";
import { WGS84_A, WGS84_GM, WGS84_J2, WGS84_OMEGA } from "../../src/core/wgs84";
import { expectError, expectRelative, ok } from "../support/expect";

const R = WGS84_A;
const rad = Math.PI / 180;

/**
 * Independent route for the pass closed form: a circular two-body orbit over a non-rotating
 * sphere, the site at (R, 0, 0), the ground track passing `offset` deg from it; the elevation is
 * computed from vectors and the time above `minEl` found by bisection on the orbit angle.
 */
function numericPassDuration(h: number, minEl: number, offset: number): number {
  const c = [Math.cos(offset * rad), 0, Math.sin(offset * rad)];
  const elevation = (u: number) => {
    const r = [(R + h) * Math.cos(u) * c[0], (R + h) * Math.sin(u), (R + h) * Math.cos(u) * c[2]];
    const rho = [r[0] - R, r[1], r[2]];
    return Math.asin(rho[0] / Math.hypot(rho[0], rho[1], rho[2])) / rad;
  };
  if (elevation(0) < minEl) return 0;
  let lo = 0, hi = Math.PI / 2;
  for (let k = 0; k < 200; k++) {
    const mid = (lo + hi) / 2;
    if (elevation(mid) >= minEl) lo = mid;
    else hi = mid;
  }
  const n = Math.sqrt(WGS84_GM / (R + h) ** 3);
  return (2 * lo) / n;
}

describe("circular-orbit coverage (SMAD 3rd ed. §5.2-5.3)", () => {
  it("agrees with a vector computation of the same geometry: pass durations to 1e-9 relative", () => {
    for (const h of [300, 520, 690, 1200, 20200, 35786])
      for (const minEl of [0, 5, 10, 30, 60])
        for (const offset of [0, 1, 5, 12, 20]) {
          const closed = ok(passDuration(h, minEl, offset));
          const numeric = numericPassDuration(h, minEl, offset);
          if (numeric === 0) expect(closed).toBe(0);
          else expect(Math.abs(closed - numeric)).toBeLessThanOrEqual(1e-9 * numeric + 1e-6);
        }
  });

  it("gives the longest pass straight overhead: maxPassDuration = passDuration at offset 0", () => {
    for (const h of [400, 690, 1500]) for (const e of [0, 10]) expect(ok(maxPassDuration(h, e))).toBeCloseTo(ok(passDuration(h, e, 0)), 9);
  });

  it("sees 81.3 deg of Earth central angle from geostationary height at the horizon (common practice)", () => {
    // acos(R / (R + h)) for h = 35786 km: 81.3 deg.
    expect(ok(coverageHalfAngle(35786, 0))).toBeCloseTo(81.3, 1);
    expect(ok(coverageHalfAngle(35786, 0))).toBeCloseTo(Math.acos(R / (R + 35786)) / rad, 12);
    expect(ok(coverageHalfAngle(690, 90))).toBe(0);
  });

  it("slant range: SMAD's D = R sin(lambda) / sin(eta) equals the cancellation-free form, h overhead, the tangent at the horizon", () => {
    for (const h of [200, 690, 35786])
      for (const e of [0, 5, 10, 45, 89]) {
        const lambda = centralAngleAtElevation(R, h, e);
        const eta = Math.asin(Math.cos(e * rad) * (R / (R + h)));
        expectRelative(ok(slantRange(h, e)), (R * Math.sin(lambda)) / Math.sin(eta), 1e-12);
        expect(ok(slantRange(h, e))).toBe(ok(horizonRange(R, h, e)));
      }
    expect(ok(slantRange(690, 90))).toBeCloseTo(690, 9);
    expect(ok(slantRange(690, 0))).toBeCloseTo(Math.sqrt((R + 690) ** 2 - R * R), 9);
    expect(ok(slantRange(100, 30, 1737.4))).toBe(ok(horizonRange(1737.4, 100, 30)));
  });

  it("swath width is the coverage circle's diameter along the ground", () => {
    expect(ok(swathWidth(690, 10))).toBeCloseTo(2 * R * ok(coverageHalfAngle(690, 10)) * rad, 9);
  });

  it("ground-track spacing: R w P with a fixed node; a sun-synchronous orbit shifts by a mean solar day's turn per nodal period", () => {
    const h = 690;
    const n = Math.sqrt(WGS84_GM / (R + h) ** 3);
    expect(ok(groundTrackSpacing(h))).toBeCloseTo(R * WGS84_OMEGA * ((2 * Math.PI) / n), 9);
    // On a sun-synchronous orbit the node keeps pace with the mean Sun, so the Earth turns under
    // the plane at 2 pi per 86400 s (tropical year 365.2422 d; WGS 84's rounded w gives 1e-5).
    const inc = ok(sunSyncInclination(WGS84_GM, R, WGS84_J2, R + h, 0, 365.2422 * 86400));
    const spacing = ok(groundTrackSpacing(h, inc));
    const nodalPeriod = spacing / (R * (WGS84_OMEGA - (2 * Math.PI) / (365.2422 * 86400)));
    expectRelative(spacing, (R * 2 * Math.PI * nodalPeriod) / 86400, 1e-6);
    // The nodal period against its first-order closed form P (1 - 3/2 J2 (R/a)^2 (3 - 4 sin^2 i))
    // (Vallado 4th ed. §11.4, from memory), good to second order in J2 (1e-6).
    const s2 = Math.sin(inc * rad) ** 2;
    expectRelative(nodalPeriod, ((2 * Math.PI) / n) * (1 - 1.5 * WGS84_J2 * (R / (R + h)) ** 2 * (3 - 4 * s2)), 2e-6);
  });

  it("refuses bad arguments, naming the parameter", () => {
    expectError(coverageHalfAngle(0, 10), "bad_argument", "altitude");
    expectError(maxPassDuration(500, 95), "bad_argument", "min_elevation");
    expectError(passDuration(500, 10, -1), "bad_argument", "offset");
    expectError(slantRange(500, -1), "bad_argument", "elevation");
    expectError(slantRange(500, 10, -5), "bad_argument", "body");
    expectError(groundTrackSpacing(500, 200), "bad_argument", "inc");
    expect(ok(passDuration(690, 10, 30))).toBe(0);
  });
});
