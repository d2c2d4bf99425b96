import { describe, expect, it } from "vitest";
import { brentRoot } from "../../src/core/rootfind";

describe("Brent's root finder", () => {
  it("finds sqrt(2), cos x = x (0.739085133215161, the Dottie number) and a root at an end", () => {
    expect(brentRoot((x) => x * x - 2, 0, 2, 1e-14)).toBeCloseTo(Math.SQRT2, 13);
    expect(brentRoot((x) => Math.cos(x) - x, 0, 1, 1e-14)).toBeCloseTo(0.739085133215161, 13);
    expect(brentRoot((x) => x - 1, 1, 3, 1e-12)).toBe(1);
  });
  it("converges in few evaluations on a smooth function and handles a steep one", () => {
    let n = 0;
    brentRoot((x) => (n++, Math.exp(x) - 5), -10, 10, 1e-12);
    expect(n).toBeLessThan(20);
    expect(brentRoot((x) => Math.atan(1e6 * (x - 0.3)), 0, 1, 1e-12)).toBeCloseTo(0.3, 10);
  });
  it("returns NaN when the ends do not bracket a root", () => {
    expect(Number.isNaN(brentRoot((x) => x * x + 1, -1, 1, 1e-9))).toBe(true);
  });
});
