import { describe, expect, it } from "vitest";
import { DP_A, DP_B, DP_BSTAR, DP_C, DormandPrinceStepper } from "../../src/core/dormandprince";

// The Runge-Kutta order conditions (Hairer, Norsett and Wanner, Solving ODEs I, 2nd ed., §II.2,
// Table 2.2): the tableau was quoted from memory, so it is checked here condition by condition.
const s = 7;
const dot = (a: number[], b: number[]) => a.reduce((acc, v, i) => acc + v * b[i], 0);
const A = (i: number, j: number) => (j < i ? (DP_A[i][j] ?? 0) : 0);
const Ac = (v: number[]) => Array.from({ length: s }, (_, i) => Array.from({ length: s }, (_, j) => A(i, j) * v[j]).reduce((a, b) => a + b, 0));
const c = DP_C;
const c2 = c.map((v) => v * v);
const c3 = c.map((v) => v * v * v);

function conditions(b: number[], order: number): [string, number, number][] {
  const list: [string, number, number][] = [
    ["sum b", dot(b, c.map(() => 1)), 1],
    ["b c", dot(b, c), 1 / 2],
    ["b c^2", dot(b, c2), 1 / 3],
    ["b A c", dot(b, Ac(c)), 1 / 6],
    ["b c^3", dot(b, c3), 1 / 4],
    ["b c A c", dot(b.map((v, i) => v * c[i]), Ac(c)), 1 / 8],
    ["b A c^2", dot(b, Ac(c2)), 1 / 12],
    ["b A A c", dot(b, Ac(Ac(c))), 1 / 24],
  ];
  if (order >= 5) {
    list.push(
      ["b c^4", dot(b, c.map((v) => v ** 4)), 1 / 5],
      ["b c^2 A c", dot(b.map((v, i) => v * c2[i]), Ac(c)), 1 / 10],
      ["b (A c)^2", dot(b, Ac(c).map((v) => v * v)), 1 / 20],
      ["b c A c^2", dot(b.map((v, i) => v * c[i]), Ac(c2)), 1 / 15],
      ["b A c^3", dot(b, Ac(c3)), 1 / 20],
      ["b c A A c", dot(b.map((v, i) => v * c[i]), Ac(Ac(c))), 1 / 30],
      ["b A (c A c)", dot(b, Ac(c.map((v, i) => v * Ac(c)[i]))), 1 / 40],
      ["b A A c^2", dot(b, Ac(Ac(c2))), 1 / 60],
      ["b A A A c", dot(b, Ac(Ac(Ac(c)))), 1 / 120],
    );
  }
  return list;
}

describe("Dormand-Prince 5(4) tableau", () => {
  it("has row sums equal to the nodes c", () => {
    for (let i = 1; i < s; i++) expect(DP_A[i].reduce((a, b) => a + b, 0)).toBeCloseTo(c[i], 15);
  });
  it("meets all 17 order conditions up to order 5 with the propagated weights", () => {
    for (const [name, got, want] of conditions(DP_B, 5)) expect(Math.abs(got - want), name).toBeLessThan(1e-15);
  });
  it("meets the 8 conditions up to order 4, but not all of order 5, with the embedded weights", () => {
    for (const [name, got, want] of conditions(DP_BSTAR, 4)) expect(Math.abs(got - want), name).toBeLessThan(1e-15);
    const fifth = conditions(DP_BSTAR, 5).slice(8);
    expect(fifth.some(([, got, want]) => Math.abs(got - want) > 1e-6)).toBe(true);
  });
  it("steps y' = y with a local error of order h^6", () => {
    const st = new DormandPrinceStepper(1);
    const f = (_t: number, y: Float64Array, dy: Float64Array) => (dy[0] = y[0]);
    const errAt = (h: number) => {
      const y = Float64Array.of(1);
      f(0, y, st.k[0]);
      const out = new Float64Array(1);
      st.step(f, 0, y, h, out, new Float64Array(1));
      return Math.abs(out[0] - Math.exp(h));
    };
    expect(errAt(0.2) / errAt(0.1)).toBeGreaterThan(50);
  });
});
