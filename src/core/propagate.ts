import { TWO_PI } from "./angles";
import { arithmeticFailure, finite, formatValue, isDomainError, positive, type Result } from "./domain";
import { readState, rectilinearError } from "./state";
import { stumpffC, stumpffS } from "./stumpff";
import { combine, cross, dot, norm, type Vec3 } from "./vector3";

/**
 * Two-body propagation of a state vector by universal variables: Vallado, Fundamentals of
 * Astrodynamics and Applications, 4th ed., Alg. 8 (KEPLER), the same method as Curtis, Orbital
 * Mechanics for Engineering Students, 3rd ed., Algs. 3.3-3.4. One formulation covers ellipses,
 * parabolas and hyperbolas, so near-parabolic orbits need no special case.
 *
 * The universal Kepler equation, with alpha = 1/a = 2/r0 - v0^2/GM, sigma0 = r0.v0 / sqrt(GM),
 * z = alpha chi^2 and the Stumpff functions C, S (src/core/stumpff.ts):
 *   sqrt(GM) dt = F(chi) = chi^3 S(z) + sigma0 chi^2 C(z) + r0 chi (1 - z S(z)),  F'(chi) = r(chi) > 0,
 * is solved by Newton's method inside a bracket that always contains the root (the step falls back
 * to bisection whenever Newton would leave the bracket or stall, as in the "rtsafe" safeguard), so
 * it cannot diverge. The bracket comes from r_min chi <= F(chi) for chi >= 0, with r_min the
 * periapsis radius p / (1 + e), and for an ellipse also from F(2 pi / sqrt(alpha)) = sqrt(GM) T.
 * Starting values: Vallado Alg. 8 (ellipse chi = sqrt(GM) dt alpha; hyperbola, his logarithmic
 * formula; near-parabola, Barker's equation via his cot 2s / tan^3 w construction, written odd in
 * dt). Departures from Alg. 8, each measured against decimal.js in test/core/propagate.test.ts:
 * - g = (sigma0 chi^2 C + r0 chi (1 - zS)) / sqrt(GM) rather than dt - chi^3 S / sqrt(GM): a
 *   function of chi alone, it keeps f gdot - fdot g = 1 exact and gave 2-10x smaller
 *   forward-then-back errors on ellipses in the tests (near-parabolic ellipses 1e-10, not 1e-9);
 * - on hyperbolic arcs with |sqrt(-alpha) chi| > 1 the universal functions are evaluated in an
 *   exponential form built on e e^(+-H0) (see `universal`), which removes a cancellation that
 *   cost up to 3 digits when propagating from far out back towards periapsis;
 * - Newton's step is bracketed (bisection fallback), where Alg. 8 only halves a negative step.
 *
 * Elapsed times longer than one period of an ellipse are first reduced by whole periods into
 * [-T/2, T/2] (exact float remainder, as Alg. 8 does with rem), so 1e6 revolutions cost what one
 * does; the reduction is only as good as the float64 period and energy, so the position error
 * grows like N x 1e-15 (relative) over N revolutions (measured 1.2e-9 at N = 1e6), the size of
 * the problem's own sensitivity to a one-ulp change in the state.
 */

const MAX_ITERATIONS = 200;
const OVERFLOW = "in this time the body runs out beyond the float64 range (about 1e308 km or km/s)";
/** Relative step at which the Newton iteration has reached the float64 resolution of chi. */
const CONVERGED = 4 * Number.EPSILON;
/**
 * f gdot - fdot g = 1 (the check in Vallado 4th ed. Alg. 8) is checked relative to the size of its two
 * products: on long hyperbolic arcs each grows like e^(2 dH) and the difference cancels to 1, so
 * only a relative residual above this (far above rounding) signals lost arithmetic.
 */
const WRONSKIAN_LIMIT = 1e-8;
/** Beyond this many revolutions of an ellipse the float64 period fixes the phase no better than ~1e-3 rad. */
const MAX_REVOLUTIONS = 1e12;
/** |alpha| r0 below this takes the parabolic starting value (our threshold; Alg. 8 uses a fixed small alpha). */
const PARABOLIC_GUESS_LIMIT = 1e-6;

/**
 * Kernel (no validation: positive GM and a non-rectilinear state assumed): the state
 * [x, y, z, vx, vy, vz] dt seconds after (r0, v0), or an arithmetic DomainError naming "elapsed"
 * (#NUM!) when the result overflows float64, an ellipse would run more than 1e12 revolutions, or
 * the iteration failed.
 * dt = 0 returns the state unchanged. Units are whatever GM, r0, v0 and dt agree on (km, km/s, s).
 * Accuracy, measured against a 50-digit decimal.js propagation by the classical anomalies
 * (test/core/propagate.test.ts): over random ellipses, hyperbolas and near-parabolas with arcs up
 * to 3 periods (or 300 periapsis time units when open), position and velocity relative error at
 * most 2e-13, and at most 3x the change a one-ulp nudge of one input component makes, plus
 * 1e-14 (the problem's own conditioning); over N whole revolutions add N x 1.5e-15.
 */
export function propagateKernel(gm: number, r0: Vec3, v0: Vec3, dt: number): Result<number[]> {
  if (dt === 0) return [...r0, ...v0];
  const sqrtMu = Math.sqrt(gm);
  const r0n = norm(r0);
  const sigma0 = dot(r0, v0) / sqrtMu;
  const alpha = 2 / r0n - dot(v0, v0) / gm;

  let t = dt;
  let chiLimit = Infinity; // |chi| for one full period of an ellipse
  if (alpha > 0) {
    const period = TWO_PI / (sqrtMu * alpha * Math.sqrt(alpha));
    chiLimit = TWO_PI / Math.sqrt(alpha);
    if (Math.abs(t) > period) {
      if (Math.abs(t) > MAX_REVOLUTIONS * period)
        return arithmeticFailure(
          "elapsed",
          `the elapsed time spans ${formatValue(Math.abs(t) / period)} revolutions; beyond ${MAX_REVOLUTIONS} float64 cannot place the body along its orbit (the phase error grows like revolutions x 1e-15 rad)`,
        );
      t %= period;
      if (t > period / 2) t -= period;
      else if (t < -period / 2) t += period;
      if (t === 0) return [...r0, ...v0];
    }
  }
  const target = sqrtMu * t;

  // Periapsis radius from p = h^2/GM and e^2 = 1 - p alpha: F(chi) >= r_min |chi| bounds the root.
  const hn = norm(cross(r0, v0));
  const p = (hn * hn) / gm;
  const ecc = Math.sqrt(Math.max(0, 1 - p * alpha));
  const rMin = p / (1 + ecc);
  // ecc = sqrt(1 - p alpha) cancels on near-circular orbits (error up to ~sqrt(eps) = 1.5e-8 in
  // ecc, so ~1e-8 in rMin): without a margin the bound can fall just short of the root and the
  // iteration stalls at it, leaving a time residual of ~1e-9 that becomes along-track error.
  const bound = Math.min((Math.abs(target) / rMin) * (1 + 1e-7), chiLimit);
  if (bound === 0) return [...r0, ...v0]; // |dt| so small that chi underflows: no motion to resolve
  if (!(bound > 0) || !Number.isFinite(bound)) return arithmeticFailure("elapsed", OVERFLOW);
  let lo = t > 0 ? 0 : -bound;
  let hi = t > 0 ? bound : 0;

  const orbit: Arc = { alpha, sigma0, r0n, ...hyperbolicCoefficients(alpha, sigma0, r0n, ecc) };
  let chi = startingValue(gm, r0n, alpha, sigma0 * sqrtMu, p, t);
  if (!(chi > lo && chi < hi)) chi = Math.min(Math.max(target / r0n, lo), hi);
  if (!(chi > lo && chi < hi)) chi = (lo + hi) / 2;

  let step = hi - lo;
  let previousStep = step;
  let converged = false;
  for (let i = 0; i < MAX_ITERATIONS; i++) {
    const k = universal(orbit, chi);
    const residual = k.F - target;
    if (!Number.isFinite(residual) || !Number.isFinite(k.r)) {
      // F is increasing, so an overflowing F lies beyond the root on chi's side.
      if (chi > 0) hi = chi;
      else lo = chi;
      previousStep = step;
      step = (hi - lo) / 2;
      chi = lo + step;
      continue;
    }
    if (residual === 0) {
      converged = true;
      break;
    }
    if (residual < 0) lo = chi;
    else hi = chi;
    let next = chi - residual / k.r;
    if (!(next > lo && next < hi) || Math.abs(2 * residual) > Math.abs(previousStep * k.r)) {
      previousStep = step;
      step = (hi - lo) / 2;
      next = lo + step;
    } else {
      previousStep = step;
      step = chi - next;
    }
    const done = Math.abs(next - chi) <= CONVERGED * Math.abs(next) || hi - lo <= CONVERGED * Math.max(Math.abs(lo), Math.abs(hi));
    chi = next;
    if (done) {
      converged = true;
      break;
    }
  }
  if (!converged) return arithmeticFailure("elapsed", "the universal-variable Kepler iteration did not converge for this state and elapsed time");

  // f and g functions written in chi alone (g = (sqrt(GM) dt - chi^3 S) / sqrt(GM) with the
  // time replaced by F(chi)), so f gdot - fdot g = 1 holds identically and the new state lies on
  // the same conic whatever residual the iteration left.
  const { r, G, U1, U2 } = universal(orbit, chi);
  const f = 1 - U2 / r0n;
  const g = G / sqrtMu;
  const fdot = (-sqrtMu * U1) / (r * r0n);
  const gdot = 1 - U2 / r;
  const out = [...combine(f, r0, g, v0), ...combine(fdot, r0, gdot, v0)];
  if (!out.every(Number.isFinite)) return arithmeticFailure("elapsed", OVERFLOW);
  const fg = f * gdot, gf = fdot * g;
  if (!(Math.abs(fg - gf - 1) <= WRONSKIAN_LIMIT * (Math.abs(fg) + Math.abs(gf) + 1)))
    return arithmeticFailure("elapsed", "the f and g functions lost their accuracy (f gdot - fdot g differs from 1)");
  return out;
}

/** What the universal functions need of the initial state; the A coefficients only for hyperbolas. */
interface Arc {
  alpha: number;
  sigma0: number;
  r0n: number;
  /** sqrt(-alpha), or 0 for a closed or parabolic orbit */
  beta: number;
  /** e e^(H0) and e e^(-H0), H0 the initial hyperbolic anomaly */
  aPlus: number;
  aMinus: number;
}

/**
 * On a hyperbola, with beta = sqrt(-alpha): e cosh H0 = 1 + r0 beta^2 and e sinh H0 = sigma0 beta,
 * so A+- = e e^(+-H0) = 1 + r0 beta^2 +- sigma0 beta and A+ A- = e^2 = 1 - p alpha. The larger is
 * a sum of positive terms; the smaller, which the direct form would get by cancellation, is e^2
 * divided by the larger.
 */
function hyperbolicCoefficients(alpha: number, sigma0: number, r0n: number, ecc: number): { beta: number; aPlus: number; aMinus: number } {
  if (!(alpha < 0)) return { beta: 0, aPlus: 0, aMinus: 0 };
  const beta = Math.sqrt(-alpha);
  const base = 1 - r0n * alpha;
  const sb = sigma0 * beta;
  const e2 = ecc * ecc;
  return sb >= 0 ? { beta, aPlus: base + sb, aMinus: e2 / (base + sb) } : { beta, aPlus: e2 / (base - sb), aMinus: base - sb };
}

/** Beyond this |beta chi| on a hyperbola the exponential form replaces the Stumpff form. */
const EXPONENTIAL_FORM = 1;

/**
 * Universal functions at chi: U1 = chi (1 - zS), U2 = chi^2 C, and the three combinations used,
 * F = U3 + sigma0 U2 + r0 U1 (the Kepler equation), r = dF/dchi = U2 + sigma0 U1 + r0 U0 and
 * G = sigma0 U2 + r0 U1 = sqrt(GM) g. On a long hyperbolic arc towards periapsis the Stumpff
 * terms of F, r and G grow like e^|x| (x = beta chi) and cancel: going back to periapsis from 400
 * periapsis radii lost 2.5 digits that way. There the exponential form, in the hyperbolic anomaly
 * H1 = H0 + x (r = |a| (e cosh H - 1) and Kepler's e sinh H - H = n t, with |a| = 1/beta^2), is used instead:
 *   beta^3 F = e sinh H1 - e sinh H0 - x,   beta^2 r = e cosh H1 - 1,
 *   beta^3 G = e sinh H1 - e sinh H0 - sinh x,
 * with e e^(+-H1) = A+- e^(+-x), whose terms do not cancel once |x| > 1.
 */
function universal(o: Arc, chi: number): { F: number; r: number; G: number; U1: number; U2: number } {
  const x = o.beta * chi;
  if (o.beta > 0 && Math.abs(x) > EXPONENTIAL_FORM) {
    const ex = Math.exp(x), emx = Math.exp(-x);
    const b2 = o.beta * o.beta, b3 = b2 * o.beta;
    const eSinhH1 = (ex * o.aPlus - emx * o.aMinus) / 2;
    const eCoshH1 = (ex * o.aPlus + emx * o.aMinus) / 2;
    const eSinhH0 = o.sigma0 * o.beta;
    const sinhX = (ex - emx) / 2;
    return {
      F: (eSinhH1 - eSinhH0 - x) / b3,
      r: (eCoshH1 - 1) / b2,
      G: (eSinhH1 - eSinhH0 - sinhX) / b3,
      U1: sinhX / o.beta,
      U2: ((ex + emx) / 2 - 1) / b2,
    };
  }
  const z = o.alpha * chi * chi;
  const c = stumpffC(z);
  const s = stumpffS(z);
  const U1 = chi * (1 - z * s);
  const U2 = chi * chi * c;
  const G = o.sigma0 * U2 + o.r0n * U1;
  return { F: chi * chi * chi * s + G, r: U2 + o.sigma0 * U1 + o.r0n * (1 - z * c), G, U1, U2 };
}

/** Vallado 4th ed. Alg. 8 starting values; may return a non-finite or out-of-bracket value, which the caller replaces. */
function startingValue(gm: number, r0n: number, alpha: number, rDotV: number, p: number, dt: number): number {
  const sqrtMu = Math.sqrt(gm);
  if (Math.abs(alpha) * r0n < PARABOLIC_GUESS_LIMIT) {
    // Barker: cot 2s = 3 sqrt(GM / p^3) dt, tan^3 w = tan s, chi = sqrt(p) 2 cot 2w.
    const s = Math.atan(1 / (3 * Math.sqrt(gm / (p * p * p)) * dt)) / 2;
    const w = Math.atan(Math.cbrt(Math.tan(s)));
    return Math.sqrt(p) * (2 / Math.tan(2 * w));
  }
  if (alpha > 0) return sqrtMu * dt * alpha;
  const a = 1 / alpha;
  const sign = dt > 0 ? 1 : -1;
  return sign * Math.sqrt(-a) * Math.log((-2 * gm * alpha * dt) / (rDotV + sign * Math.sqrt(-gm * a) * (1 - r0n * alpha)));
}

/**
 * The state [x, y, z km, vx, vy, vz km/s] `elapsed` seconds after `state` (negative elapsed runs
 * backwards), two-body motion about a body of GM `gm` km^3/s^2, by universal variables
 * (Vallado 4th ed. Alg. 8): every conic, parabolic included. elapsed = 0 returns the state.
 * Refused: GM not positive, a state that is not six finite numbers or sits at the centre, or a
 * non-finite elapsed (#VALUE!); a rectilinear state, velocity zero or parallel to the position
 * (#N/A); #NUM! if the result overflows float64 (a hyperbola run out beyond ~1e308 km), an
 * ellipse would turn more than 1e12 revolutions (float64 no longer fixes the phase), or the
 * iteration fails (not seen in testing).
 * Accuracy: see propagateKernel (relative 2e-13 or better over a few periods). A two-body
 * result only: real orbits drift from it through J2, drag and third bodies.
 */
export function propagateState(gm: number, state: readonly number[], elapsed: number): Result<number[]> {
  const badGm = positive("body", gm, "km3/s2 (GM)");
  if (badGm) return badGm;
  const read = readState(state);
  if (isDomainError(read)) return read;
  const badElapsed = finite("elapsed", elapsed, "seconds");
  if (badElapsed) return badElapsed;
  const rectilinear = rectilinearError(read.r, read.v);
  if (rectilinear) return rectilinear;
  return propagateKernel(gm, read.r, read.v, elapsed);
}
