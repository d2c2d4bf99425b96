import { describe, expect, it } from "vitest";
import { CubicSpline } from "../../src/core/cubicspline";

describe("natural cubic spline", () => {
  it("reproduces a straight line exactly, inside and beyond the ends", () => {
    const x = [0, 1, 2.5, 4, 7];
    const s = new CubicSpline(x, x.map((v) => 3 - 2 * v));
    for (const t of [-1, 0.3, 2, 5.5, 9]) {
      expect(s.value(t)).toBeCloseTo(3 - 2 * t, 12);
      expect(s.slope(t)).toBeCloseTo(-2, 12);
    }
  });

  it("converges at fourth order inside the range for a smooth function (sin on [0, 3])", () => {
    const err = (n: number) => {
      const x = Array.from({ length: n + 1 }, (_, i) => (3 * i) / n);
      const s = new CubicSpline(x, x.map(Math.sin));
      let worst = 0;
      for (let t = 1; t <= 2; t += 0.001) worst = Math.max(worst, Math.abs(s.value(t) - Math.sin(t)));
      return worst;
    };
    const ratio = err(20) / err(40);
    expect(ratio).toBeGreaterThan(12);
    expect(err(40)).toBeLessThan(1e-6);
  });

  it("passes through its nodes", () => {
    const x = [0, 1, 3, 4];
    const y = [2, -1, 5, 0];
    const s = new CubicSpline(x, y);
    x.forEach((v, i) => expect(s.value(v)).toBeCloseTo(y[i], 13));
  });
});
