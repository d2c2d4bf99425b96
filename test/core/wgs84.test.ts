import { describe, expect, it } from "vitest";
import { WGS84_A, WGS84_B, WGS84_E2, WGS84_F, WGS84_GM, WGS84_J2, WGS84_OMEGA } from "../../src/core/wgs84";

describe("WGS 84 constants (NIMA TR8350.2, 3rd ed.)", () => {
  it("holds the defining parameters of Table 3.1", () => {
    expect(WGS84_A).toBe(6378.137);
    expect(1 / WGS84_F).toBeCloseTo(298.257223563, 9);
    expect(WGS84_GM).toBe(398600.4418);
    expect(WGS84_OMEGA).toBe(7.292115e-5);
  });

  it("derives the report's Table 3.3 values to their printed digits", () => {
    expect(Math.abs(WGS84_B * 1000 - 6356752.3142)).toBeLessThan(5e-5); // b = 6 356 752.3142 m
    expect(Math.abs(WGS84_E2 - 6.69437999014e-3)).toBeLessThan(5e-15); // e^2 = 6.694 379 990 14e-3
    expect(Math.abs(WGS84_J2 - 1.082629821e-3)).toBeLessThan(5e-13); // -sqrt(5) C20bar, C20bar = -0.484166774985e-3
  });
});
