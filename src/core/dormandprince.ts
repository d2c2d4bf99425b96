/**
 * One step of the Dormand-Prince 5(4) embedded Runge-Kutta pair (Dormand and Prince, J. Comput.
 * Appl. Math. 6, 19, 1980; tableau as in Hairer, Norsett and Wanner, Solving Ordinary
 * Differential Equations I, 2nd ed., Table 5.2, quoted from memory and checked against the order
 * conditions up to order 5 in test/core/dormandprince.test.ts). The 5th-order solution is
 * propagated; the difference to the embedded 4th-order one estimates the local error. FSAL: the
 * last stage is the derivative at the new point, reused as the next step's first stage.
 */

export const DP_C = [0, 1 / 5, 3 / 10, 4 / 5, 8 / 9, 1, 1];
export const DP_A: readonly (readonly number[])[] = [
  [],
  [1 / 5],
  [3 / 40, 9 / 40],
  [44 / 45, -56 / 15, 32 / 9],
  [19372 / 6561, -25360 / 2187, 64448 / 6561, -212 / 729],
  [9017 / 3168, -355 / 33, 46732 / 5247, 49 / 176, -5103 / 18656],
  [35 / 384, 0, 500 / 1113, 125 / 192, -2187 / 6784, 11 / 84],
];
/** 5th-order weights (equal to the last row of A). */
export const DP_B = [35 / 384, 0, 500 / 1113, 125 / 192, -2187 / 6784, 11 / 84, 0];
/** Embedded 4th-order weights. */
export const DP_BSTAR = [5179 / 57600, 0, 7571 / 16695, 393 / 640, -92097 / 339200, 187 / 2100, 1 / 40];

/** Derivative of the state y at time t, written into dy. */
export type Derivative = (t: number, y: Float64Array, dy: Float64Array) => void;

/** Work arrays for states of dimension n. */
export class DormandPrinceStepper {
  readonly k: Float64Array[];
  private readonly tmp: Float64Array;
  constructor(readonly n: number) {
    this.k = Array.from({ length: 7 }, () => new Float64Array(n));
    this.tmp = new Float64Array(n);
  }

  /**
   * Steps y (at t, with this.k[0] = f(t, y) already set) by h into yNew; returns the error
   * vector's components in err (5th minus 4th order). this.k[6] is then f(t + h, yNew).
   */
  step(f: Derivative, t: number, y: Float64Array, h: number, yNew: Float64Array, err: Float64Array): void {
    const { k, tmp, n } = this;
    for (let s = 1; s < 7; s++) {
      const row = DP_A[s];
      for (let i = 0; i < n; i++) {
        let acc = 0;
        for (let j = 0; j < s; j++) acc += row[j] * k[j][i];
        tmp[i] = y[i] + h * acc;
      }
      f(t + DP_C[s] * h, tmp, k[s]);
    }
    for (let i = 0; i < n; i++) {
      yNew[i] = tmp[i];
      let e = 0;
      for (let s = 0; s < 7; s++) e += (DP_B[s] - DP_BSTAR[s]) * k[s][i];
      err[i] = h * e;
    }
  }
}
