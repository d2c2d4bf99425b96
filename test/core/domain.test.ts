import { describe, expect, it } from "vitest";
import { badArgument, formatValue, noAnswer, withAll } from "../../src/core/domain";

describe("the error contract's helpers", () => {
  it("withAll applies the function when no input is an error, else returns the first error in order", () => {
    expect(withAll([2, "x"], (n, s) => s.repeat(n))).toBe("xx");
    const e1 = badArgument("body_radius", null, "a radius");
    const e2 = noAnswer("j2", "none");
    expect(withAll([1, e1, e2], (a, b, c) => [a, b, c])).toBe(e1);
    expect(withAll([e2, e1], (a, b) => [a, b])).toBe(e2);
  });

  it("formats received values the same way in every message", () => {
    expect(formatValue(null)).toBe("(blank)");
    expect(formatValue(-7000)).toBe("-7000");
    expect(formatValue(1 / 3)).toBe("0.3333333333");
    expect(formatValue(true)).toBe("TRUE");
    expect(formatValue("x".repeat(50))).toBe(JSON.stringify("x".repeat(37) + "..."));
    expect(badArgument("radius", -5, "a positive number of km").message).toBe("radius: got -5; expected a positive number of km.");
  });
});
