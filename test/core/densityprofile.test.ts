import { describe, expect, it } from "vitest";
import { constantFluxProfile, densityProfile, fluxDependentDensity } from "../../src/core/densityprofile";
import { exponentialDensity, exponentialScaleHeight } from "../../src/core/exponentialatmosphere";
import { nrlmsise00MeanDensity } from "../../src/core/nrlmsise00mean";

describe("density profiles for the lifetime integration", () => {
  it("the exponential profile is the table itself", () => {
    const p = densityProfile("exponential", 150, 150, 15);
    for (const h of [60, 100, 123.4, 450, 999, 1500]) {
      expect(p.density(h)).toBe(exponentialDensity(h));
      expect(p.scaleHeight(h)).toBe(exponentialScaleHeight(h));
    }
  });

  it("the NRLMSISE-00 spline reproduces the mean density to 0.05 % above 130 km and 0.4 % from 60 to 130 km", () => {
    for (const f of [70, 150, 250]) {
      const p = densityProfile("nrlmsise-00", f, f, 15);
      for (let h = 61.3; h <= 1000; h += 7.9) {
        const rel = Math.abs(p.density(h) / nrlmsise00MeanDensity(h, f, f, 15) - 1);
        expect(rel, `${h} km at ${f} sfu`).toBeLessThan(h > 130 ? 5e-4 : 4e-3);
      }
    }
  });

  it("its scale height is the model's -1 / (d ln rho / dh) to 0.5 %", () => {
    const p = densityProfile("nrlmsise-00", 150, 150, 15);
    for (const h of [150, 300, 500, 800]) {
      const d = 0.5;
      const numeric = (2 * d) / Math.log(nrlmsise00MeanDensity(h - d, 150, 150, 15) / nrlmsise00MeanDensity(h + d, 150, 150, 15));
      expect(Math.abs(p.scaleHeight(h) / numeric - 1)).toBeLessThan(5e-3);
    }
  });

  it("a time-varying flux interpolated between the 10-sfu profiles matches the exact profile to 0.05 %", () => {
    const fam = fluxDependentDensity("nrlmsise-00", 15);
    for (const f of [68, 133, 201])
      for (const h of [150, 400, 800]) {
        const exact = densityProfile("nrlmsise-00", f, f, 15).density(h);
        expect(Math.abs(fam.density(h, f) / exact - 1), `${h} km ${f} sfu`).toBeLessThan(5e-4);
      }
  });

  it("a constant flux off the 10-sfu nodes follows the blend of the nodes around it, to 0.05 % of its exact profile; on a node, the node's own profile", () => {
    for (const f of [68, 133, 201, 347])
      for (const h of [61, 123.4, 150, 400, 800, 999.7]) {
        const exact = densityProfile("nrlmsise-00", f, f, 15);
        const blend = constantFluxProfile("nrlmsise-00", f, 15);
        expect(Math.abs(blend.density(h) / exact.density(h) - 1), `${h} km ${f} sfu`).toBeLessThan(5e-4);
        expect(Math.abs(blend.scaleHeight(h) / exact.scaleHeight(h) - 1), `${h} km ${f} sfu`).toBeLessThan(5e-3);
      }
    expect(constantFluxProfile("nrlmsise-00", 150, 15)).toBe(densityProfile("nrlmsise-00", 150, 150, 15));
    expect(constantFluxProfile("exponential", 133, 15)).toBe(densityProfile("exponential", 133, 133, 15));
  });
});
