import { describe, expect, it } from "vitest";
import { decayRate } from "../../src/core/decayrate";
import { orbitLifetime } from "../../src/core/lifetime";
import { nrlmsise00MeanDensity } from "../../src/core/nrlmsise00mean";
import { BODIES } from "../../src/catalogue/bodies";
import { expectError, ok } from "../support/expect";

const earth = BODIES.find((b) => b.name === "Earth")!;
const GM = earth.gm.value;
const R = earth.equatorialRadius.value;

describe("decayRate (km/day lost by a circular orbit)", () => {
  it("is (rho / B) sqrt(mu a) per day, by hand with the exponential table at 400 km (Vallado 4th ed. Table 8-4: 3.725e-12 kg/m^3)", () => {
    const byHand = ((1000 * 3.725e-12) / 100) * Math.sqrt(GM * (R + 400)) * 86400;
    expect(ok(decayRate(GM, R, 400, 100, null, null, "exponential"))).toBeCloseTo(byHand, 15);
    // about 0.08 km/day: the right size for a 400 km orbit (from memory, order of magnitude)
    expect(byHand).toBeGreaterThan(0.03);
    expect(byHand).toBeLessThan(0.3);
  });

  it("uses NRLMSISE-00's mean at the given F10.7 and 81-day mean, Ap 15", () => {
    const rho = nrlmsise00MeanDensity(500, 180, 140, 15);
    expect(ok(decayRate(GM, R, 500, 60, 180, 140, null))).toBeCloseTo(((1000 * rho) / 60) * Math.sqrt(GM * (R + 500)) * 86400, 14);
  });

  it("is consistent with the lifetime: a circular orbit loses its first kilometre in about 1 / rate days", () => {
    const rate = ok(decayRate(GM, R, 600, 50, 150, null, null));
    const t = ok(orbitLifetime(GM, R, 600, 600, 50, 150, null, null, 599));
    expect(Math.abs(t * rate - 1)).toBeLessThan(0.01);
  });

  it("grows with solar flux, shrinks with B and with altitude", () => {
    expect(ok(decayRate(GM, R, 500, 50, 200, null, null))).toBeGreaterThan(ok(decayRate(GM, R, 500, 50, 100, null, null)));
    expect(ok(decayRate(GM, R, 500, 100, null, null, null))).toBeLessThan(ok(decayRate(GM, R, 500, 50, null, null, null)));
    expect(ok(decayRate(GM, R, 600, 50, null, null, null))).toBeLessThan(ok(decayRate(GM, R, 500, 50, null, null, null)));
  });

  it("refuses bad inputs, naming them", () => {
    expectError(decayRate(GM, R, 1100, 50, null, null, null), "no_answer", "altitude");
    expectError(decayRate(GM, R, -5, 50, null, null, null), "bad_argument", "altitude");
    expectError(decayRate(GM, R, 400, -50, null, null, null), "bad_argument", "ballistic_coefficient");
    expectError(decayRate(GM, R, 400, 50, 0, null, null), "bad_argument", "solar_flux");
    expectError(decayRate(GM, R, 400, 50, 150, -1, null), "bad_argument", "solar_flux_avg");
    expectError(decayRate(GM, R, 400, 50, null, null, "x"), "bad_argument", "model");
  });
});
