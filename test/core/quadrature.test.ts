import { describe, expect, it } from "vitest";
import { gaussLegendre } from "../../src/core/quadrature";

describe("Gauss-Legendre rule", () => {
  it("has the closed-form nodes and weights for n = 2 and 3 (Abramowitz and Stegun, Table 25.4)", () => {
    const two = gaussLegendre(2);
    expect(two.nodes[1]).toBeCloseTo(1 / Math.sqrt(3), 15);
    expect(two.weights[0]).toBeCloseTo(1, 15);
    const three = gaussLegendre(3);
    expect(Math.abs(three.nodes[1])).toBeLessThan(1e-15);
    expect(three.nodes[2]).toBeCloseTo(Math.sqrt(3 / 5), 15);
    expect(three.weights[1]).toBeCloseTo(8 / 9, 15);
    expect(three.weights[0]).toBeCloseTo(5 / 9, 15);
  });

  it("integrates x^k exactly for k up to 2n - 1 and not for k = 2n", () => {
    for (const n of [4, 6, 10]) {
      const { nodes, weights } = gaussLegendre(n);
      for (let k = 0; k <= 2 * n; k++) {
        let s = 0;
        for (let i = 0; i < n; i++) s += weights[i] * nodes[i] ** k;
        const exact = k % 2 ? 0 : 2 / (k + 1);
        if (k < 2 * n) expect(Math.abs(s - exact), `n ${n} k ${k}`).toBeLessThan(1e-14);
        else expect(Math.abs(s - exact)).toBeGreaterThan(1e-6);
      }
    }
  });
});
