import { describe, expect, it } from "vitest";
import { disposalPerigee } from "../../src/core/disposal";
import { orbitLifetime } from "../../src/core/lifetime";
import { BODIES } from "../../src/catalogue/bodies";
import { err, expectError, ok } from "../support/expect";

const earth = BODIES.find((b) => b.name === "Earth")!;
const GM = earth.gm.value;
const R = earth.equatorialRadius.value;
const YEAR = 365.25;

describe("disposalPerigee", () => {
  it("the orbit from the returned perigee comes down in exactly the limit (5 and 25 years, three flux levels)", () => {
    for (const years of [5, 25])
      for (const flux of [80, 150, 220]) {
        const hp = ok(disposalPerigee(GM, R, 690, 50, years * YEAR, flux, null, null));
        if (hp === 690) {
          // the circular orbit at the apogee already complies
          expect(ok(orbitLifetime(GM, R, 690, 690, 50, flux, null, null, null))).toBeLessThanOrEqual(years * YEAR);
          continue;
        }
        const t = ok(orbitLifetime(GM, R, hp, 690, 50, flux, null, null, null));
        expect(Math.abs(t / (years * YEAR) - 1), `${years} y, ${flux} sfu`).toBeLessThan(1e-3);
        // and 1 km higher stays up longer than the limit
        expect(ok(orbitLifetime(GM, R, hp + 1, 690, 50, flux, null, null, null))).toBeGreaterThan(years * YEAR);
      }
  });

  it("a longer limit or a more active Sun allows a higher perigee; a higher B needs a lower one", () => {
    const base = ok(disposalPerigee(GM, R, 690, 50, 5 * YEAR, 150, null, null));
    expect(ok(disposalPerigee(GM, R, 690, 50, 10 * YEAR, 150, null, null))).toBeGreaterThan(base);
    expect(ok(disposalPerigee(GM, R, 690, 100, 5 * YEAR, 150, null, null))).toBeLessThan(base);
    expect(ok(disposalPerigee(GM, R, 690, 50, 5 * YEAR, 220, null, null))).toBeGreaterThan(base);
  });

  it("returns the apogee itself when the circular orbit there already comes down in time", () => {
    expect(ok(disposalPerigee(GM, R, 400, 50, 25 * YEAR, 150, null, null))).toBe(400);
  });

  it("#N/A when no perigee above the 100 km end altitude works, or the apogee is not above it", () => {
    const e = err(disposalPerigee(GM, R, 690, 50, 1e-6, 150, null, null));
    expect(e.kind).toBe("no_answer");
    expect(e.parameter).toBe("lifetime_limit");
    expectError(disposalPerigee(GM, R, 90, 50, 100, 150, null, null), "no_answer", "apogee_altitude");
  });

  it("refuses bad inputs, naming them", () => {
    expectError(disposalPerigee(GM, R, 690, 50, -1, 150, null, null), "bad_argument", "lifetime_limit");
    expectError(disposalPerigee(GM, R, 690, 50, 300 * YEAR, 150, null, null), "no_answer", "lifetime_limit");
    expectError(disposalPerigee(GM, R, 690, -50, 10, 150, null, null), "bad_argument", "ballistic_coefficient");
    expectError(disposalPerigee(GM, R, 690, 50, 10, 150, null, "none"), "bad_argument", "model");
    expectError(disposalPerigee(GM, R, -5, 50, 10, 150, null, null), "bad_argument", "apogee_altitude");
  });
});
