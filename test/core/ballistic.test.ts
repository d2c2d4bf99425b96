import { describe, expect, it } from "vitest";
import { ballisticCoefficient, DEFAULT_DRAG_COEFFICIENT } from "../../src/core/ballistic";
import { expectError, ok } from "../support/expect";

describe("ballisticCoefficient = m / (C_D A)", () => {
  it("divides mass by drag coefficient times area (a 3U cubesat: 4 kg, 0.03 m^2, C_D 2.2 gives 60.6 kg/m^2, by hand)", () => {
    expect(ok(ballisticCoefficient(4, 0.03, 2.2))).toBeCloseTo(4 / 0.066, 12);
    expect(ok(ballisticCoefficient(180, 1.5, 2.5))).toBeCloseTo(48, 12);
  });
  it("takes C_D = 2.2 when omitted (common practice)", () => {
    expect(DEFAULT_DRAG_COEFFICIENT).toBe(2.2);
    expect(ok(ballisticCoefficient(180, 1.5, null))).toBe(180 / (2.2 * 1.5));
  });
  it("refuses non-positive inputs, naming them", () => {
    expectError(ballisticCoefficient(0, 1, null), "bad_argument", "mass");
    expectError(ballisticCoefficient(10, -1, null), "bad_argument", "drag_area");
    expectError(ballisticCoefficient(10, 1, 0), "bad_argument", "drag_coefficient");
  });
  it("overflow is #NUM!, never Infinity", () => {
    expect((ballisticCoefficient(1e308, 1e-300, 1) as { kind: string }).kind).toBe("arithmetic");
  });
});
