import { describe, expect, it } from "vitest";
import { atmosphereDensity, DEFAULT_AP, DEFAULT_SOLAR_FLUX, resolveModel } from "../../src/core/atmosphere";
import { nrlmsise00MeanDensity } from "../../src/core/nrlmsise00mean";
import { err, expectError, ok } from "../support/expect";

describe("atmosphereDensity", () => {
  it("exponential: the values of Vallado 4th ed. Table 8-4 at its base altitudes, whatever the activity", () => {
    expect(ok(atmosphereDensity(0, null, null, null, "exponential"))).toBe(1.225);
    expect(ok(atmosphereDensity(400, 250, 90, 80, "exponential"))).toBe(3.725e-12);
    expect(ok(atmosphereDensity(1000, null, null, null, "Exponential"))).toBe(3.019e-15);
  });

  it("defaults to NRLMSISE-00 at F10.7 = 150 sfu, the 81-day mean equal to it, Ap = 15", () => {
    expect(DEFAULT_SOLAR_FLUX).toBe(150);
    expect(DEFAULT_AP).toBe(15);
    expect(ok(atmosphereDensity(500, null, null, null, null))).toBe(nrlmsise00MeanDensity(500, 150, 150, 15));
    expect(ok(atmosphereDensity(500, 200, null, null, null))).toBe(nrlmsise00MeanDensity(500, 200, 200, 15));
    expect(ok(atmosphereDensity(500, 200, 120, 7, "NRLMSISE-00"))).toBe(nrlmsise00MeanDensity(500, 200, 120, 7));
  });

  it("#N/A above the models' published 0-1000 km, with the range in the message; #VALUE! below 0 km", () => {
    const above = err(atmosphereDensity(1000.5, null, null, null, null));
    expect(above.kind).toBe("no_answer");
    expect(above.message).toContain("0-1000 km");
    expectError(atmosphereDensity(-1, null, null, null, "exponential"), "bad_argument", "altitude");
  });

  it("names the argument in every refusal", () => {
    expectError(atmosphereDensity(400, -5, null, null, null), "bad_argument", "solar_flux");
    expectError(atmosphereDensity(400, 900, null, null, null), "no_answer", "solar_flux");
    expectError(atmosphereDensity(400, 150, 0, null, null), "bad_argument", "solar_flux_avg");
    expectError(atmosphereDensity(400, 150, 150, 401, null), "bad_argument", "geomagnetic_ap");
    expectError(atmosphereDensity(400, 150, 150, -1, null), "bad_argument", "geomagnetic_ap");
    expectError(atmosphereDensity(400, null, null, null, "jacchia"), "bad_argument", "model");
    expectError(atmosphereDensity(Number.NaN, null, null, null, null), "bad_argument", "altitude");
    expect(err(atmosphereDensity(400, 900, null, null, null)).message).toContain("40-500 sfu");
  });

  it("accepts the model names case-insensitively, with or without the hyphen", () => {
    expect(resolveModel("nrlmsise00")).toBe("nrlmsise-00");
    expect(resolveModel(" EXPONENTIAL ")).toBe("exponential");
    expect(resolveModel(null)).toBe("nrlmsise-00");
  });
});
