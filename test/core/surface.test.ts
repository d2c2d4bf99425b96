import Decimal from "decimal.js";
import { describe, expect, it } from "vitest";
import { isDomainError } from "../../src/core/domain";
import { surfaceRotationSpeed } from "../../src/core/surface";

const num = (x: unknown): number => {
  if (isDomainError(x)) throw new Error(x.message);
  return x as number;
};
const D = Decimal.clone({ precision: 40 });

describe("surface rotation speed", () => {
  it("gives Cape Canaveral's 'free ride' of 1,471 km/h at 28.5 deg", () => {
    // Braeunig, Rocket & Space Technology, "Orbital Mechanics" (Types of Orbits): a due-east launch
    // from Cape Canaveral (28.5 deg N) gets 1,471 km/h; his constants R = 6378.14 km and the
    // sidereal day 86164.09 s.
    expect(Math.round(num(surfaceRotationSpeed(6378.14, 86164.09, 28.5)) * 3600)).toBe(1471);
  });

  it("gives 465.1 m/s at Earth's equator (common practice)", () => {
    expect((num(surfaceRotationSpeed(6378.137, 86164.0905, 0)) * 1000).toFixed(1)).toBe("465.1");
  });

  it("agrees with a 40-digit recomputation of 2 pi R cos(lat) / T", () => {
    const pi = D.acos(-1);
    for (const [R, T, lat] of [[6378.137, 86164.0905, 45], [3389.5, 88642.66, -18.4], [71492, 35730, 10], [1737.4, 2360591.5, 89.5]]) {
      const ref = pi.mul(2).mul(R).mul(D.cos(new D(lat).mul(pi).div(180))).div(T).toNumber();
      expect(Math.abs(num(surfaceRotationSpeed(R, T, lat)) - ref)).toBeLessThan(4e-16 * Math.abs(ref));
    }
  });

  it("is negative (westward) for a retrograde rotator, zero at the poles, even in latitude", () => {
    expect(num(surfaceRotationSpeed(6051.8, -243.018 * 86400, 0))).toBeLessThan(0); // Venus, JPL SSD period
    expect(num(surfaceRotationSpeed(6378.137, 86164.0905, 90))).toBe(0);
    expect(num(surfaceRotationSpeed(6378.137, 86164.0905, -90))).toBe(0);
    expect(num(surfaceRotationSpeed(6378.137, 86164.0905, -33))).toBe(num(surfaceRotationSpeed(6378.137, 86164.0905, 33)));
  });

  it("refuses a zero period, a bad radius and a latitude beyond the poles", () => {
    const t = surfaceRotationSpeed(6378, 0, 0);
    expect(isDomainError(t) && t.parameter === "rotation_period").toBe(true);
    const r = surfaceRotationSpeed(-1, 86164, 0);
    expect(isDomainError(r) && r.parameter === "body_radius").toBe(true);
    const l = surfaceRotationSpeed(6378, 86164, 90.5);
    expect(isDomainError(l) && l.parameter === "latitude").toBe(true);
  });
});
