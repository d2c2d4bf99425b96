/**
 * Natural cubic spline through (x[i], y[i]), x strictly increasing: second derivatives from the
 * tridiagonal system (Press et al., Numerical Recipes, 3rd ed., §3.3), value and first derivative
 * by the usual cubic in each interval, linear continuation beyond the ends with the end slope.
 * For a smooth function sampled at spacing h the value error is O(h^4) inside (O(h^2) in the end
 * intervals, where the natural end condition sets the curvature to zero).
 */
export class CubicSpline {
  private readonly x: Float64Array;
  private readonly y: Float64Array;
  private readonly y2: Float64Array;

  constructor(x: ArrayLike<number>, y: ArrayLike<number>) {
    const n = x.length;
    this.x = Float64Array.from(x);
    this.y = Float64Array.from(y);
    this.y2 = new Float64Array(n);
    const u = new Float64Array(n);
    for (let i = 1; i < n - 1; i++) {
      const sig = (this.x[i] - this.x[i - 1]) / (this.x[i + 1] - this.x[i - 1]);
      const p = sig * this.y2[i - 1] + 2;
      this.y2[i] = (sig - 1) / p;
      const d = (this.y[i + 1] - this.y[i]) / (this.x[i + 1] - this.x[i]) - (this.y[i] - this.y[i - 1]) / (this.x[i] - this.x[i - 1]);
      u[i] = ((6 * d) / (this.x[i + 1] - this.x[i - 1]) - sig * u[i - 1]) / p;
    }
    this.y2[n - 1] = 0;
    for (let k = n - 2; k >= 0; k--) this.y2[k] = this.y2[k] * this.y2[k + 1] + u[k];
  }

  private interval(t: number): number {
    let lo = 0;
    let hi = this.x.length - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (this.x[mid] > t) hi = mid;
      else lo = mid;
    }
    return lo;
  }

  /** Spline value at t. */
  value(t: number): number {
    const n = this.x.length;
    if (t <= this.x[0]) return this.y[0] + this.slope(this.x[0]) * (t - this.x[0]);
    if (t >= this.x[n - 1]) return this.y[n - 1] + this.slope(this.x[n - 1]) * (t - this.x[n - 1]);
    const k = this.interval(t);
    const h = this.x[k + 1] - this.x[k];
    const a = (this.x[k + 1] - t) / h;
    const b = 1 - a;
    return a * this.y[k] + b * this.y[k + 1] + ((a * a * a - a) * this.y2[k] + (b * b * b - b) * this.y2[k + 1]) * ((h * h) / 6);
  }

  /** First derivative at t (the end slope beyond the ends). */
  slope(t: number): number {
    const n = this.x.length;
    const k = t <= this.x[0] ? 0 : t >= this.x[n - 1] ? n - 2 : this.interval(t);
    const tc = Math.min(Math.max(t, this.x[0]), this.x[n - 1]);
    const h = this.x[k + 1] - this.x[k];
    const a = (this.x[k + 1] - tc) / h;
    const b = 1 - a;
    return (this.y[k + 1] - this.y[k]) / h + ((-(3 * a * a - 1) * this.y2[k] + (3 * b * b - 1) * this.y2[k + 1]) * h) / 6;
  }
}
