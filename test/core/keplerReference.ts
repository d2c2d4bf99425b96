import Decimal from "decimal.js";
import { exactDecimal } from "../support/exact";

/**
 * 70-digit decimal.js references for Kepler's equation, shared by the kepler, anomalies and
 * time-of-flight tests and by bench/kepler.ts. Independent of src/core: plain Newton iteration
 * in decimal arithmetic on strictly increasing functions (unique roots), run until the step is
 * below 1e-45 relative; a start point only decides how many steps that takes.
 *
 * Doubles enter through exact() (test/support/exact.ts: 40 significant digits of the binary
 * value). new Decimal(x) would go through the shortest decimal string of x, off by up to half an
 * ulp, and for e close to 1 that alone moves 1 - e (and so E near periapsis) by parts in 1e10.
 */
export const D = Decimal.clone({ precision: 70 });
export type Dec = Decimal;

const PI = D.acos(-1);
const TINY = new D("1e-45");

/** A double as a 70-digit decimal, through the shared exact conversion (40 significant digits). */
export const exact = (x: number): Decimal => new D(exactDecimal(x));

/** Residual E - e sin E - M of the elliptic equation, from the exact double inputs. */
export function ellipticResidual(E: number, e: number, M: number): number {
  const x = exact(E);
  return x.minus(exact(e).times(x.sin())).minus(exact(M)).toNumber();
}

/** Residual e sinh H - H - M of the hyperbolic equation, from the exact double inputs. */
export function hyperbolicResidual(H: number, e: number, M: number): number {
  const x = exact(H);
  return exact(e).times(x.sinh()).minus(x).minus(exact(M)).toNumber();
}

/**
 * Newton's method in 70 digits on a strictly increasing f (so the root is unique and the start
 * only sets how many steps it takes); throws unless the step falls below 1e-45 relative, so a
 * reference that did not converge fails the test instead of passing silently.
 */
function newton(f: (x: Decimal) => Decimal, fp: (x: Decimal) => Decimal, start: Decimal): Decimal {
  let x = start;
  for (let i = 0; i < 500; i++) {
    const step = f(x).div(fp(x));
    x = x.minus(step);
    if (step.abs().lte(TINY.times(x.abs())) || x.isZero()) return x;
  }
  throw new Error(`reference Newton did not converge from ${start.toString()}`);
}

/** E solving E - e sin E = M (decimal inputs, 0 <= e < 1), any M; start defaults to M + e sin M. */
export function refEccentric(M: Decimal, e: Decimal, start?: number): Decimal {
  if (M.isZero()) return M;
  const one = new D(1);
  return newton(
    (E) => E.minus(e.times(E.sin())).minus(M),
    (E) => one.minus(e.times(E.cos())),
    start === undefined ? M.plus(e.times(M.sin())) : exact(start),
  );
}

/** H solving e sinh H - H = M (decimal inputs, e > 1); start defaults to the upper bound asinh(M/(e-1)). */
export function refHyperbolic(M: Decimal, e: Decimal, start?: number): Decimal {
  if (M.isZero()) return M;
  const one = new D(1);
  const upper = D.asinh(M.abs().div(e.minus(1)));
  return newton(
    (H) => e.times(H.sinh()).minus(H).minus(M),
    (H) => e.times(H.cosh()).minus(one),
    start === undefined ? (M.isNeg() ? upper.neg() : upper) : exact(start),
  );
}

/** D = tan(nu/2) solving D + D^3/3 = Mp (Cardano, decimal). */
export function refBarker(Mp: Decimal): Decimal {
  const half = Mp.abs().times(1.5);
  const A = half.plus(half.pow(2).plus(1).sqrt()).cbrt();
  const d = A.minus(new D(1).div(A));
  return Mp.isNeg() ? d.neg() : d;
}

export const refPi = PI;

/** Degrees of a decimal angle in radians. */
export const toDeg = (rad: Decimal): Decimal => rad.times(180).div(PI);
export const fromDeg = (deg: Decimal): Decimal => deg.times(PI).div(180);

/** Relative difference |x - ref| / |ref| as a plain number. */
export const relErr = (x: number, ref: Decimal): number => exact(x).minus(ref).abs().div(ref.abs()).toNumber();

/** float64 unit roundoff spacing at 1: 2^-52. */
export const EPS = 2 ** -52;
