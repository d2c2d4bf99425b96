/**
 * Gauss-Legendre nodes and weights on [-1, 1], by Newton's method on the three-term recurrence of
 * the Legendre polynomials (Press et al., Numerical Recipes, 3rd ed., §4.6, routine gauleg). The
 * n-point rule integrates polynomials of degree 2n - 1 exactly; nodes and weights come out within
 * a few ulp of their exact values (checked against the closed forms for n = 2, 3 and the
 * moments of x^k in test/core/quadrature.test.ts).
 */
export function gaussLegendre(n: number): { nodes: Float64Array; weights: Float64Array } {
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  for (let i = 0; i < (n + 1) >> 1; i++) {
    let z = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 1;
    for (let iter = 0; iter < 100; iter++) {
      let p1 = 1;
      let p2 = 0;
      for (let j = 1; j <= n; j++) {
        const p3 = p2;
        p2 = p1;
        p1 = ((2 * j - 1) * z * p2 - (j - 1) * p3) / j;
      }
      dp = (n * (z * p1 - p2)) / (z * z - 1);
      const step = p1 / dp;
      z -= step;
      if (Math.abs(step) < 1e-16) break;
    }
    nodes[i] = -z;
    nodes[n - 1 - i] = z;
    weights[i] = weights[n - 1 - i] = 2 / ((1 - z * z) * dp * dp);
  }
  return { nodes, weights };
}
