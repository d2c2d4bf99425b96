import { describe, expect, it } from "vitest";
import { decayRate } from "../../src/core/decayrate";
import { dragMakeupDv } from "../../src/core/makeupdv";
import { BODIES } from "../../src/catalogue/bodies";
import { expectError, ok } from "../support/expect";

const earth = BODIES.find((b) => b.name === "Earth")!;
const GM = earth.gm.value;
const R = earth.equatorialRadius.value;
const YEAR = 365.25 * 86400;

describe("dragMakeupDv", () => {
  it("is the drag deceleration (1/2) rho v^2 / B times the duration, by hand at 400 km in the exponential table", () => {
    const v = Math.sqrt(GM / (R + 400)) * 1000; // m/s
    const byHand = (0.5 * 3.725e-12 * v * v) / 100 * YEAR / 1000; // km/s
    expect(ok(dragMakeupDv(GM, R, 400, 100, YEAR, null, null, "exponential"))).toBeCloseTo(byHand, 15);
  });

  it("equals v / (2a) times the altitude the decay rate removes over the same time (circular vis-viva, dv = v da / 2a)", () => {
    for (const h of [350, 500, 690]) {
      const a = R + h;
      const v = Math.sqrt(GM / a);
      const days = 100;
      const dv = ok(dragMakeupDv(GM, R, h, 55, days * 86400, 120, 130, null));
      const da = ok(decayRate(GM, R, h, 55, 120, 130, null)) * days;
      expect(dv / ((v / (2 * a)) * da) - 1).toBeCloseTo(0, 12);
    }
  });

  it("is proportional to duration, zero for zero duration, larger at high flux and for smaller B", () => {
    const one = ok(dragMakeupDv(GM, R, 500, 50, YEAR, null, null, null));
    expect(ok(dragMakeupDv(GM, R, 500, 50, 5 * YEAR, null, null, null)) / one).toBeCloseTo(5, 12);
    expect(ok(dragMakeupDv(GM, R, 500, 50, 0, null, null, null))).toBe(0);
    expect(ok(dragMakeupDv(GM, R, 500, 50, YEAR, 220, null, null))).toBeGreaterThan(one);
    expect(ok(dragMakeupDv(GM, R, 500, 25, YEAR, null, null, null))).toBeGreaterThan(one);
  });

  it("has the size budgets carry: metres per second per year at 500 km for a small satellite (from memory, order of magnitude)", () => {
    const perYear = ok(dragMakeupDv(GM, R, 500, 50, YEAR, null, null, null)) * 1000;
    expect(perYear).toBeGreaterThan(0.3);
    expect(perYear).toBeLessThan(100);
  });

  it("refuses bad inputs, naming them", () => {
    expectError(dragMakeupDv(GM, R, 500, 50, -1, null, null, null), "bad_argument", "duration");
    expectError(dragMakeupDv(GM, R, 500, 0, 10, null, null, null), "bad_argument", "ballistic_coefficient");
    expectError(dragMakeupDv(GM, R, 1500, 50, 10, null, null, null), "no_answer", "altitude");
  });
});
