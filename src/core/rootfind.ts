/**
 * Brent's method for a root of f in [a, b] where f(a) and f(b) differ in sign: inverse quadratic
 * interpolation and secant steps, falling back to bisection whenever they would not shrink the
 * bracket fast enough (Brent, Algorithms for Minimization without Derivatives, 1973, ch. 4;
 * as written in Press et al., Numerical Recipes, 3rd ed., §9.3, zbrent). Returns x with the root
 * inside [x - tol, x + tol], or NaN when f(a) and f(b) have the same sign or the iterations
 * (100) run out.
 */
export function brentRoot(f: (x: number) => number, a: number, b: number, tol: number, fa = f(a), fb = f(b)): number {
  if ((fa > 0 && fb > 0) || (fa < 0 && fb < 0)) return Number.NaN;
  let c = b;
  let fc = fb;
  let d = b - a;
  let e = d;
  for (let iter = 0; iter < 100; iter++) {
    if ((fb > 0 && fc > 0) || (fb < 0 && fc < 0)) {
      c = a;
      fc = fa;
      e = d = b - a;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol1 = 2 * Number.EPSILON * Math.abs(b) + 0.5 * tol;
    const xm = 0.5 * (c - b);
    if (Math.abs(xm) <= tol1 || fb === 0) return b;
    if (Math.abs(e) >= tol1 && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * xm * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * xm * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      p = Math.abs(p);
      if (2 * p < Math.min(3 * xm * q - Math.abs(tol1 * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = xm;
        e = d;
      }
    } else {
      d = xm;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol1 ? d : xm > 0 ? tol1 : -tol1;
    fb = f(b);
  }
  return Number.NaN;
}
