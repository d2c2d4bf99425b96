import { describe, expect, it } from "vitest";
import { EXPONENTIAL_TABLE, exponentialBand, exponentialDensity, exponentialScaleHeight } from "../../src/core/exponentialatmosphere";

// Vallado, Fundamentals of Astrodynamics and Applications, 4th ed., Table 8-4: base altitude (km),
// nominal density (kg/m^3), scale height (km); the rows printed there (read from the
// SatelliteToolboxAtmosphericModels.jl copy, agreeing with the book's values from memory).
const printed: [number, number, number][] = [
  [0, 1.225, 7.249], [25, 3.899e-2, 6.349], [30, 1.774e-2, 6.682], [40, 3.972e-3, 7.554], [50, 1.057e-3, 8.382],
  [60, 3.206e-4, 7.714], [70, 8.77e-5, 6.549], [80, 1.905e-5, 5.799], [90, 3.396e-6, 5.382], [100, 5.297e-7, 5.877],
  [110, 9.661e-8, 7.263], [120, 2.438e-8, 9.473], [130, 8.484e-9, 12.636], [140, 3.845e-9, 16.149], [150, 2.07e-9, 22.523],
  [180, 5.464e-10, 29.74], [200, 2.789e-10, 37.105], [250, 7.248e-11, 45.546], [300, 2.418e-11, 53.628], [350, 9.518e-12, 53.298],
  [400, 3.725e-12, 58.515], [450, 1.585e-12, 60.828], [500, 6.967e-13, 63.822], [600, 1.454e-13, 71.835], [700, 3.614e-14, 88.667],
  [800, 1.17e-14, 124.64], [900, 5.245e-15, 181.05], [1000, 3.019e-15, 268.0],
];

describe("exponential model: Vallado 4th ed. Table 8-4", () => {
  it("gives the table's own nominal density and scale height at each of its 28 base altitudes", () => {
    expect(EXPONENTIAL_TABLE.length).toBe(28);
    for (const [h0, rho0, H] of printed) {
      expect(exponentialDensity(h0)).toBe(rho0);
      expect(exponentialScaleHeight(h0)).toBe(H);
    }
  });

  it("falls by e over one scale height inside a band (rho0 exp(-(h - h0) / H))", () => {
    // 400-450 km band: H = 58.515 km
    expect(exponentialDensity(400 + 20) / exponentialDensity(400)).toBeCloseTo(Math.exp(-20 / 58.515), 14);
    // above 1000 km the last band continues
    expect(exponentialDensity(1268)).toBeCloseTo(3.019e-15 / Math.E, 28);
  });

  it("is continuous across band edges to 0.14 % (a check on the transcription: one wrong digit breaks two edges)", () => {
    for (let i = 0; i + 1 < printed.length; i++) {
      const [h0, rho0, H] = printed[i];
      const carried = rho0 * Math.exp(-(printed[i + 1][0] - h0) / H);
      const tol = i === 0 ? 0.0014 : 1.1e-4;
      expect(Math.abs(carried / printed[i + 1][1] - 1), `edge at ${printed[i + 1][0]} km`).toBeLessThan(tol);
    }
  });

  it("finds the band whose base is the highest at or below the altitude", () => {
    expect(exponentialBand(0)).toBe(0);
    expect(exponentialBand(24.999)).toBe(0);
    expect(exponentialBand(25)).toBe(1);
    expect(exponentialBand(449.9)).toBe(20);
    expect(exponentialBand(5000)).toBe(27);
  });
});
