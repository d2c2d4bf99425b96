import { clampedAcos } from "./angles";
import { badArgument, noAnswer, arithmeticFailure, positive, firstError, type DomainError, type Result } from "./domain";

/**
 * Lambert's problem: the conic arc about a body of GM `gm` that leaves r_from and reaches r_to
 * after time_of_flight, with a given number of complete revolutions on the way.
 *
 * Method: D. Izzo, "Revisiting Lambert's problem", Celestial Mechanics and Dynamical Astronomy
 * 121 (2015) 1-15. The problem is reduced to one non-dimensional time-of-flight equation
 * T(x) in Izzo's variable x (x < 1 ellipse, x = 1 parabola, x > 1 hyperbola) and the geometry
 * parameter lambda = ±sqrt(1 - c/s) (c chord, s semi-perimeter). T(x) is evaluated with
 * Battin's hypergeometric series near the parabola (|x - 1| < 0.01), Lagrange's form for
 * 0.01 <= |x - 1| < 0.2 and Lancaster's form elsewhere, as the paper prescribes, and solved by
 * Householder iterations (fourth order) from the paper's initial guesses, here
 * guarded by a bracket so that a step that leaves the branch's interval is replaced by a bisection.
 * The minimum time for N revolutions is found with Halley iterations on dT/dx = 0, as in the paper.
 *
 * Conventions of this module (the worksheet LAMBERT_SOLVE keeps them):
 * - The transfer plane and sense of motion are set by r_from × r_to, not by any axis.
 *   long_way FALSE: the arc sweeps the transfer angle θ in (0°, 180°), moving along
 *   r_from × r_to (prograde about it). long_way TRUE: the arc sweeps 360° − θ, i.e. more than
 *   180°, moving retrograde relative to r_from × r_to. (In Izzo's terms: lambda > 0 vs < 0.)
 * - revolutions N >= 1 adds N complete turns; for each N there are two arcs when
 *   time_of_flight exceeds the minimum for N turns. high_branch TRUE gives Izzo's right
 *   branch (the larger root x, x_Tmin < x < 1), high_branch FALSE his left branch (the smaller
 *   root, -1 < x < x_Tmin). In plain words: of the two arcs with the same turns and time of
 *   flight, high_branch TRUE is the one with the larger semi-major axis, so the higher orbital
 *   energy and the longer period; FALSE the smaller. (The test suite checks this ordering over
 *   thousands of random geometries.) high_branch is ignored when revolutions = 0 (one arc).
 * - Transfer angle exactly 0° or 180° (r_from, r_to collinear to within rounding,
 *   |sin θ| < 1e-12): the plane is undefined, so there is no answer.
 *
 * Accuracy: x is iterated until a Householder step changes it by less than 1e-13 (single
 * revolution) or 1e-12 (multi-revolution), relative to max(1, |x|). Propagating r_from with the returned v_from for
 * time_of_flight lands on r_to to 1e-11 relative or better in most random geometries, and to
 * 3e-10 in the worst found: single-revolution arcs hundreds of times longer than the parabolic
 * time, nearly rectilinear ellipses whose end point is that sensitive to v_from (measured with a
 * 40-digit decimal.js propagation; test/core/lambert.test.ts checks 1e-8). Geometries close to 0°
 * or 180° lose digits in proportion to 1/sin θ, as every Lambert method does there. Two-body
 * motion only: a result is a preliminary first-order design figure, not a flight trajectory.
 */

/** Status codes of the kernel; only OK leaves meaningful velocities in `out`. */
export const LAMBERT_OK = 0;
export const LAMBERT_NO_SOLUTION = 1;
export const LAMBERT_COLLINEAR = 2;
export const LAMBERT_NO_CONVERGENCE = 3;
export type LambertStatus = 0 | 1 | 2 | 3;

/** Below this |sin θ| the transfer plane is undefined to within float64 rounding of the inputs. */
const COLLINEAR_SIN = 1e-12;
const TOL_SINGLE = 1e-13;
const TOL_MULTI = 1e-12;
const MAX_ITER = 40;
const BATTIN_BAND = 0.01;
const LAGRANGE_BAND = 0.2;

/** Battin's hypergeometric series 2F1(3, 1; 5/2; z) used near the parabola, |z| < 1. */
function hypergeometric(z: number): number {
  let sum = 1;
  let term = 1;
  for (let j = 0; j < 60; j++) {
    term = (term * (3 + j) * (1 + j)) / (2.5 + j) * (z / (j + 1));
    sum += term;
    if (Math.abs(term) < 1e-16 * Math.abs(sum)) break;
  }
  return sum;
}

/** Lagrange's time-of-flight equation in Izzo's non-dimensional form. */
function tofLagrange(x: number, lambda: number, revs: number): number {
  const a = 1 / (1 - x * x);
  if (a > 0) {
    const alpha = 2 * Math.acos(x);
    let beta = 2 * Math.asin(Math.sqrt((lambda * lambda) / a));
    if (lambda < 0) beta = -beta;
    return (a * Math.sqrt(a) * (alpha - Math.sin(alpha) - (beta - Math.sin(beta)) + 2 * Math.PI * revs)) / 2;
  }
  const alpha = 2 * Math.acosh(x);
  let beta = 2 * Math.asinh(Math.sqrt((-lambda * lambda) / a));
  if (lambda < 0) beta = -beta;
  return (-a * Math.sqrt(-a) * (beta - Math.sinh(beta) - (alpha - Math.sinh(alpha)))) / 2;
}

/** Non-dimensional time of flight T(x) for `revs` complete revolutions (Izzo 2015), T = tof sqrt(2 GM / s^3). */
export function izzoTimeOfFlight(x: number, lambda: number, revs: number): number {
  const dist = Math.abs(x - 1);
  if (dist >= BATTIN_BAND && dist < LAGRANGE_BAND) return tofLagrange(x, lambda, revs);
  const e = x * x - 1;
  const rho = Math.abs(e);
  const z = Math.sqrt(1 + lambda * lambda * e);
  if (dist < BATTIN_BAND) {
    const eta = z - lambda * x;
    const s1 = 0.5 * (1 - lambda - x * eta);
    const q = (4 / 3) * hypergeometric(s1);
    const t = (eta * eta * eta * q + 4 * lambda * eta) / 2;
    return revs > 0 ? t + (revs * Math.PI) / Math.pow(rho, 1.5) : t;
  }
  const y = Math.sqrt(rho);
  if (e < 0) return (x - lambda * z - (revs * Math.PI + clampedAcos(x * z - lambda * e)) / y) / e;
  // Hyperbola: for lambda > 0, z - lambda x and x z - lambda e cancel as x grows (fast arcs reach
  // x ~ 1e10); z^2 - lambda^2 x^2 = 1 - lambda^2 gives both without cancellation.
  const zMinusLx = lambda > 0 ? (1 - lambda * lambda) / (z + lambda * x) : z - lambda * x;
  const g = lambda > 0 ? x * zMinusLx + lambda : x * z - lambda * e;
  const d = Math.log(y * zMinusLx + g);
  return (x - lambda * z - d / y) / e;
}

// Derivatives dT/dx, d2T/dx2, d3T/dx3 (Izzo 2015, closed forms in x, T, lambda), written into a module buffer so the
// hot path allocates nothing.
const deriv = [0, 0, 0];
function tofDerivatives(x: number, t: number, lambda: number): void {
  const l2 = lambda * lambda;
  const l3 = l2 * lambda;
  const umx2 = 1 - x * x;
  const y = Math.sqrt(1 - l2 * umx2);
  const y2 = y * y;
  const y3 = y2 * y;
  const d1 = (3 * t * x - 2 + (2 * l3 * x) / y) / umx2;
  const d2 = (3 * t + 5 * x * d1 + (2 * (1 - l2) * l3) / y3) / umx2;
  const d3 = (7 * x * d2 + 8 * d1 - (6 * (1 - l2) * l2 * l3 * x) / (y3 * y2)) / umx2;
  deriv[0] = d1;
  deriv[1] = d2;
  deriv[2] = d3;
}

/** Where the derivatives are taken: off the parabola x = 1, where their formulas divide 0 by 0 (T itself is fine there). */
const offParabola = (x: number): number => (Math.abs(1 - x) < 1e-12 ? (x < 1 ? 1 - 1e-12 : 1 + 1e-12) : x);

/**
 * Householder iterations for T(x) = target inside the bracket (lo, hi) where T is monotonic
 * (`decreasing` says which way). Returns NaN when it does not converge.
 */
function householder(target: number, lambda: number, revs: number, x0: number, lo: number, hi: number, decreasing: boolean, tol: number): number {
  let x = x0;
  for (let it = 0; it < MAX_ITER; it++) {
    const t = izzoTimeOfFlight(x, lambda, revs);
    const delta = t - target;
    if (delta === 0) return x;
    // T(x) > target means the root lies where T is smaller: above x if T decreases.
    if (delta > 0 === decreasing) lo = x;
    else hi = x;
    tofDerivatives(offParabola(x), t, lambda);
    const d1 = deriv[0];
    const d2 = deriv[1];
    const d3 = deriv[2];
    const d1sq = d1 * d1;
    const step = (delta * (d1sq - (delta * d2) / 2)) / (d1 * (d1sq - delta * d2) + (d3 * delta * delta) / 6);
    // Converged steps are accepted before the bracket test: at the root, x itself is a bracket end.
    // The tolerance is relative once |x| > 1 (far hyperbolas reach x ~ 1e3 and more).
    if (Math.abs(step) < tol * Math.max(1, Math.abs(x))) return x - step;
    let next = x - step;
    // A step outside the bracket is replaced by bisection; with no upper bound yet (single
    // revolution, hyperbolic side) it doubles the distance from -1 instead.
    if (!(next > lo && next < hi)) next = hi === Infinity ? x + 1 + Math.abs(x) : (lo + hi) / 2;
    // A bracket narrowed to adjacent doubles: x is as good as float64 allows.
    if (next === x || next === lo || next === hi) return x;
    x = next;
  }
  return NaN;
}

/** x at the minimum of T(x) for `revs` >= 1 turns, by Halley iterations on dT/dx = 0 (Izzo 2015). */
function xAtMinimumTime(lambda: number, revs: number): number {
  let x = 0;
  let t = izzoTimeOfFlight(0, lambda, revs);
  let lo = -1;
  let hi = 1;
  for (let it = 0; it < MAX_ITER; it++) {
    tofDerivatives(x, t, lambda);
    const d1 = deriv[0];
    const d2 = deriv[1];
    const d3 = deriv[2];
    if (d1 === 0) return x;
    // T is convex on (-1, 1) for revs >= 1: dT/dx < 0 left of the minimum.
    if (d1 < 0) lo = x;
    else hi = x;
    let next = x - (d1 * d2) / (d2 * d2 - (d1 * d3) / 2);
    if (!(next > lo && next < hi)) next = (lo + hi) / 2;
    if (Math.abs(next - x) < 1e-14) return next;
    x = next;
    t = izzoTimeOfFlight(x, lambda, revs);
  }
  return x;
}

// Geometry shared by the kernel and the minimum-time function, in a module buffer.
const geo = { r1n: 0, r2n: 0, c: 0, s: 0, lambda: 0, sinTheta: 0 };
function geometry(r1: ArrayLike<number>, r2: ArrayLike<number>, longWay: boolean): void {
  const r1n = Math.sqrt(r1[0] * r1[0] + r1[1] * r1[1] + r1[2] * r1[2]);
  const r2n = Math.sqrt(r2[0] * r2[0] + r2[1] * r2[1] + r2[2] * r2[2]);
  const dx = r2[0] - r1[0];
  const dy = r2[1] - r1[1];
  const dz = r2[2] - r1[2];
  const c = Math.sqrt(dx * dx + dy * dy + dz * dz);
  const hx = r1[1] * r2[2] - r1[2] * r2[1];
  const hy = r1[2] * r2[0] - r1[0] * r2[2];
  const hz = r1[0] * r2[1] - r1[1] * r2[0];
  const s = (r1n + r2n + c) / 2;
  const l = Math.sqrt(Math.max(0, 1 - c / s));
  geo.r1n = r1n;
  geo.r2n = r2n;
  geo.c = c;
  geo.s = s;
  geo.lambda = longWay ? -l : l;
  geo.sinTheta = Math.sqrt(hx * hx + hy * hy + hz * hz) / (r1n * r2n);
}

/**
 * Kernel, no validation: solves Lambert's problem and writes [v_from, v_to] (km/s) into out[0..5].
 * gm km^3/s^2 > 0, r1 r2 km (nonzero 3-vectors), tof s > 0, revs a whole number >= 0.
 * Returns LAMBERT_OK, or the reason there is no answer (out is then left unspecified).
 * Allocates nothing; meant for the transfer-grid hot path.
 */
export function lambertKernel(
  gm: number,
  r1: ArrayLike<number>,
  r2: ArrayLike<number>,
  tof: number,
  revs: number,
  longWay: boolean,
  highBranch: boolean,
  out: number[] | Float64Array,
): LambertStatus {
  geometry(r1, r2, longWay);
  const { r1n, r2n, c, s, lambda } = geo;
  if (!(geo.sinTheta >= COLLINEAR_SIN)) return LAMBERT_COLLINEAR;
  const tNorm = Math.sqrt((2 * gm) / (s * s * s)) * tof;
  let x: number;
  if (revs === 0) {
    const t00 = Math.acos(lambda) + lambda * Math.sqrt(1 - lambda * lambda);
    const t1 = (2 / 3) * (1 - lambda * lambda * lambda);
    let x0: number;
    if (tNorm >= t00) x0 = Math.pow(t00 / tNorm, 2 / 3) - 1;
    else if (tNorm < t1) x0 = ((2.5 * t1) / tNorm) * ((t1 - tNorm) / (1 - Math.pow(lambda, 5))) + 1;
    // Log-log interpolation between (T00, x = 0) and (T1, x = 1); continuous at both ends.
    else x0 = Math.pow(t00 / tNorm, Math.LN2 / Math.log(t00 / t1)) - 1;
    x = householder(tNorm, lambda, 0, x0, -1, Infinity, true, TOL_SINGLE);
  } else {
    if (tNorm < revs * Math.PI) return LAMBERT_NO_SOLUTION;
    const xMin = xAtMinimumTime(lambda, revs);
    const tMin = izzoTimeOfFlight(xMin, lambda, revs);
    if (tNorm < tMin) return LAMBERT_NO_SOLUTION;
    if (!highBranch) {
      const q = Math.pow(((revs + 1) * Math.PI) / (8 * tNorm), 2 / 3);
      let x0 = (q - 1) / (q + 1);
      if (!(x0 > -1 && x0 < xMin)) x0 = (xMin - 1) / 2;
      x = householder(tNorm, lambda, revs, x0, -1, xMin, true, TOL_MULTI);
    } else {
      const q = Math.pow((8 * tNorm) / (revs * Math.PI), 2 / 3);
      let x0 = (q - 1) / (q + 1);
      if (!(x0 > xMin && x0 < 1)) x0 = (xMin + 1) / 2;
      x = householder(tNorm, lambda, revs, x0, xMin, 1, false, TOL_MULTI);
    }
  }
  if (!Number.isFinite(x)) return LAMBERT_NO_CONVERGENCE;

  // Velocities from x: radial and tangential components in the plane (Izzo 2015).
  const y = Math.sqrt(1 - lambda * lambda * (1 - x * x));
  const gamma = Math.sqrt((gm * s) / 2);
  const rho = (r1n - r2n) / c;
  const sigma = Math.sqrt(Math.max(0, 1 - rho * rho));
  const ly = lambda * y;
  const vr1 = (gamma * (ly - x - rho * (ly + x))) / r1n;
  const vr2 = (-gamma * (ly - x + rho * (ly + x))) / r2n;
  // y + lambda x cancels when lambda x < 0 (long way, hyperbolic); y^2 - lambda^2 x^2 = 1 - lambda^2
  // gives the same quantity without cancellation.
  const yPlusLx = lambda * x >= 0 ? y + lambda * x : (1 - lambda * lambda) / (y - lambda * x);
  const vt = gamma * sigma * yPlusLx;
  const vt1 = vt / r1n;
  const vt2 = vt / r2n;

  // Unit normal of the plane and tangential directions ĥ × r̂ (reversed for the long way).
  let hx = r1[1] * r2[2] - r1[2] * r2[1];
  let hy = r1[2] * r2[0] - r1[0] * r2[2];
  let hz = r1[0] * r2[1] - r1[1] * r2[0];
  const hn = Math.sqrt(hx * hx + hy * hy + hz * hz) * (longWay ? -1 : 1);
  hx /= hn;
  hy /= hn;
  hz /= hn;
  const a1x = r1[0] / r1n, a1y = r1[1] / r1n, a1z = r1[2] / r1n;
  const a2x = r2[0] / r2n, a2y = r2[1] / r2n, a2z = r2[2] / r2n;
  out[0] = vr1 * a1x + vt1 * (hy * a1z - hz * a1y);
  out[1] = vr1 * a1y + vt1 * (hz * a1x - hx * a1z);
  out[2] = vr1 * a1z + vt1 * (hx * a1y - hy * a1x);
  out[3] = vr2 * a2x + vt2 * (hy * a2z - hz * a2y);
  out[4] = vr2 * a2y + vt2 * (hz * a2x - hx * a2z);
  out[5] = vr2 * a2z + vt2 * (hx * a2y - hy * a2x);
  for (let i = 0; i < 6; i++) if (!Number.isFinite(out[i])) return LAMBERT_NO_CONVERGENCE;
  return LAMBERT_OK;
}

/**
 * Kernel: the shortest time of flight (s) of any arc with `revs` >= 1 complete turns between
 * r1 and r2 the given way round (Izzo 2015); 0 for revs = 0 (any positive time works).
 */
export function lambertMinimumTime(gm: number, r1: ArrayLike<number>, r2: ArrayLike<number>, revs: number, longWay: boolean): number {
  if (revs === 0) return 0;
  geometry(r1, r2, longWay);
  const { s, lambda } = geo;
  const tMin = izzoTimeOfFlight(xAtMinimumTime(lambda, revs), lambda, revs);
  return tMin / Math.sqrt((2 * gm) / (s * s * s));
}

function checkPosition(parameter: string, r: unknown): DomainError | undefined {
  const ok =
    Array.isArray(r) && r.length === 3 && r.every((v) => typeof v === "number" && Number.isFinite(v)) && (r[0] !== 0 || r[1] !== 0 || r[2] !== 0);
  return ok ? undefined : badArgument(parameter, r, "a position of three finite numbers x, y, z in km, not the centre of the body");
}

const REVOLUTIONS_CAP = 1000;

/**
 * Lambert's problem (Izzo 2015; see the module comment for the branch and direction conventions).
 * Given: gm (km^3/s^2, the sheet's `body`), r_from and r_to (km, three numbers each),
 * time_of_flight (s), revolutions (whole number of complete turns, 0..1000), long_way (TRUE: the
 * transfer angle exceeds 180°, motion retrograde relative to r_from × r_to), high_branch (for
 * revolutions >= 1: TRUE the arc with the larger sma, higher energy, Izzo's right branch; FALSE
 * the arc with the smaller sma, his left branch).
 * Returned: [v_from x, y, z, v_to x, y, z] in km/s, in the frame of r_from and r_to.
 * No answer (#N/A): r_from and r_to collinear (transfer angle 0° or 180°, plane undefined), or
 * time_of_flight below the minimum for that many revolutions (the message gives the minimum).
 */
export function solveLambert(
  gm: number,
  r_from: number[],
  r_to: number[],
  time_of_flight: number,
  revolutions = 0,
  long_way = false,
  high_branch = false,
): Result<number[]> {
  const bad = firstError(
    positive("body", gm, "km3/s2 (GM)"),
    checkPosition("r_from", r_from),
    checkPosition("r_to", r_to),
    positive("time_of_flight", time_of_flight, "s"),
    Number.isInteger(revolutions) && revolutions >= 0 && revolutions <= REVOLUTIONS_CAP
      ? undefined
      : badArgument("revolutions", revolutions, `a whole number of complete revolutions from 0 to ${REVOLUTIONS_CAP}`),
    typeof long_way === "boolean" ? undefined : badArgument("long_way", long_way, "TRUE or FALSE"),
    typeof high_branch === "boolean" ? undefined : badArgument("high_branch", high_branch, "TRUE or FALSE"),
  );
  if (bad) return bad;
  const out = [0, 0, 0, 0, 0, 0];
  const status = lambertKernel(gm, r_from, r_to, time_of_flight, revolutions, long_way, high_branch, out);
  if (status === LAMBERT_OK) return out;
  if (status === LAMBERT_COLLINEAR) {
    const same = r_from[0] === r_to[0] && r_from[1] === r_to[1] && r_from[2] === r_to[2];
    return noAnswer(
      "r_to",
      same
        ? "r_to is the same point as r_from, so the transfer plane is undefined"
        : "r_from and r_to are collinear with the centre (transfer angle 0° or 180°), so the transfer plane is undefined; move one point slightly off the line",
    );
  }
  if (status === LAMBERT_NO_SOLUTION) {
    const tMin = lambertMinimumTime(gm, r_from, r_to, revolutions, long_way);
    return noAnswer(
      "time_of_flight",
      `no arc with ${revolutions} complete revolution${revolutions === 1 ? "" : "s"} takes only ${formatSeconds(time_of_flight)} s; the shortest takes ${formatSeconds(tMin)} s (use fewer revolutions or a longer time)`,
    );
  }
  return arithmeticFailure("time_of_flight", "the Lambert iteration did not converge for these inputs");
}

const formatSeconds = (t: number): string => String(Number(t.toPrecision(10)));
