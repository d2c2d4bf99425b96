import { TWO_PI } from "./angles";
import { cosSmall, F2, F3, F4, F5, F6, F7, F8, F9, F10, F11, F12, F13, F14, F15, F16, F17, F18, F19, F20, F21, F22, F23, F25, F27, pickCos, pickSin, quarterRest, quarterTurns, roughCbrt, sinSmall } from "./fasttrig";

/**
 * Kepler's equation for every conic, and the anomaly conversions around it. Radian kernels: no
 * validation, plain float64 in and out (the sheet layer in anomalies.ts and timeofflight.ts checks
 * the arguments). Anomaly names:
 *   ellipse (0 <= e < 1):  M = E - e sin E                 (mean M, eccentric E, radians)
 *   hyperbola (e > 1):     M = e sinh H - H                (hyperbolic mean M, hyperbolic H, both dimensionless)
 *   parabola (e = 1):      Mp = D + D^3 / 3, D = tan(nu/2) (Barker's equation, see solveBarker)
 * Elliptic results keep the revolution of their input: M = 2 pi k + m with |m| <= pi gives
 * E = 2 pi k + (E of m), and likewise for E <-> nu.
 */

const PI_SQ = Math.PI * Math.PI;
const INV_PI_SQ_MINUS_6 = 1 / (PI_SQ - 6);
const MARKLEY_1_6_PI = 1.6 * Math.PI;

// ---------------------------------------------------------------------------------------------
// Cancellation-free pieces. Near periapsis of a near-parabolic orbit E - e sin E (or e sinh H - H)
// is the small difference of two nearly equal terms; writing it as (1 - e) E + e (E - sin E), with
// E - sin E from its Taylor series, keeps full relative accuracy there. The series are Horner
// forms in x^2 with coefficients 1/k!, truncated where the next term is below 1e-19 relative on
// the interval where they are used.

/** x - sin x, a few ulp relative for every x (Taylor series for |x| < 1). */
export function xMinusSin(x: number): number {
  if (Math.abs(x) >= 1) return x - Math.sin(x);
  const z = x * x;
  const s = F3 - z * (F5 - z * (F7 - z * (F9 - z * (F11 - z * (F13 - z * (F15 - z * (F17 - z * (F19 - z * (F21 - z * F23)))))))));
  return x * z * s;
}

/** 1 - cos x, a few ulp relative for every x (Taylor series for |x| < 1). */
export function oneMinusCos(x: number): number {
  if (Math.abs(x) >= 1) return 1 - Math.cos(x);
  const z = x * x;
  return z * (F2 - z * (F4 - z * (F6 - z * (F8 - z * (F10 - z * (F12 - z * (F14 - z * (F16 - z * (F18 - z * (F20 - z * F22))))))))));
}

/** sinh x - x, a few ulp relative for every x (Taylor series for |x| < 2). */
export function sinhMinusX(x: number): number {
  if (Math.abs(x) >= 2) return Math.sinh(x) - x;
  const z = x * x;
  const s = F3 + z * (F5 + z * (F7 + z * (F9 + z * (F11 + z * (F13 + z * (F15 + z * (F17 + z * (F19 + z * (F21 + z * (F23 + z * (F25 + z * F27)))))))))));
  return x * z * s;
}

/** cosh x - 1 = 2 sinh^2(x/2), a few ulp relative for every x (no cancellation near 0). */
export function coshMinusOne(x: number): number {
  if (Math.abs(x) >= 2) return Math.cosh(x) - 1;
  const s = Math.sinh(x / 2);
  return 2 * s * s;
}

// ---------------------------------------------------------------------------------------------
// Elliptic Kepler equation.

/** Kernel: mean anomaly M = E - e sin E (rad), a few ulp of max(|E|, 1); relative accuracy kept near E = 0. */
export function meanFromEccentric(eccAnomaly: number, ecc: number): number {
  return (1 - ecc) * eccAnomaly + ecc * xMinusSin(eccAnomaly);
}

/**
 * x reduced by whole turns of TWO_PI into [-pi, pi], exactly: one subtraction for |x| <= 3 pi
 * (Sterbenz: x - TWO_PI is exact for x in [pi, 4 pi]), beyond that the remainder x % TWO_PI,
 * which IEEE fmod computes exactly, so even |x| near 1e308 reduces without overflow or a wrong
 * quotient. The caller takes the turns as x - reduced.
 */
function reduceToPi(x: number): number {
  if (x >= -Math.PI && x <= Math.PI) return x;
  if (x > 0 && x <= 3 * Math.PI) return x - TWO_PI;
  if (x < 0 && x >= -3 * Math.PI) return x + TWO_PI;
  const r = x % TWO_PI;
  return r > Math.PI ? r - TWO_PI : r < -Math.PI ? r + TWO_PI : r;
}

/**
 * Markley's solver for 0 <= m <= pi (after reduction and symmetry): his cubic starter E1, with
 * the fitted coefficient alpha(e, M) = (3 pi^2 + 1.6 pi (pi - M)/(1 + e)) / (pi^2 - 6), and one
 * fifth-order correction from his Taylor model (see fifthOrderStep for the form used).
 * F. L. Markley, "Kepler equation solver", Celest. Mech. Dyn. Astron. 63 (1995) 101-111.
 * Where E1 < 1 and e > 0.5 the residual f0 and its derivative f1 are formed without
 * cancellation (see xMinusSin), which keeps E accurate to a few ulp relative as e -> 1, M -> 0;
 * with that, no guarded final Newton step is needed in that corner (the 70-digit sweeps in
 * test/core/kepler.test.ts find E within 4 ulp relative there). sin E1 and cos E1 come from
 * sinSmall/cosSmall (src/core/fasttrig.ts) on the quarter-turn remainder, both from one reduction.
 */
function markleyReduced(m: number, ecc: number): number {
  // The kernel is one long dependency chain, so each of Markley's fractions is written over a
  // single division (algebraically identical to his equations).
  const oneMinusE = 1 - ecc;
  const alpha = (3 * PI_SQ + (MARKLEY_1_6_PI * (Math.PI - m)) / (1 + ecc)) * INV_PI_SQ_MINUS_6;
  const d = 3 * oneMinusE + alpha * ecc;
  const q = 2 * alpha * d * oneMinusE - m * m;
  const r = 3 * alpha * d * (d - oneMinusE) * m + m * m * m;
  // w = (|r| + sqrt(q^3 + r^2))^(2/3); E1 = (2 r w / (w^2 + w q + q^2) + m) / d, the real root of
  // Markley's cubic in his form free of cancellation.
  const c = roughCbrt(Math.abs(r) + Math.sqrt(q * q * q + r * r));
  const w = c * c;
  const den = w * w + w * q + q * q;
  const e1 = (2 * r * w + m * den) / (den * d);

  const k = quarterTurns(e1);
  const rest = quarterRest(e1, k);
  const sinRest = sinSmall(rest);
  const cosRest = cosSmall(rest);
  const sinE = pickSin(k, sinRest, cosRest);
  let f0: number, f1: number, f3: number;
  if (e1 < 1 && ecc > 0.5) {
    const omc = oneMinusCos(e1);
    f0 = meanFromEccentric(e1, ecc) - m;
    f1 = oneMinusE + ecc * omc;
    f3 = ecc - ecc * omc;
  } else {
    const eCos = ecc * pickCos(k, sinRest, cosRest);
    f0 = e1 - ecc * sinE - m;
    f1 = 1 - eCos;
    f3 = eCos;
  }
  const f2 = ecc * sinE;
  return e1 + fifthOrderStep(f0, f1, f2, f3);
}

/**
 * One fifth-order correction from the Taylor model f0 + f1 d + f2 d^2/2 + f3 d^3/6 - f2 d^4/24 = 0
 * of Kepler's equation at the starter (the same model as Markley's). Markley solves it
 * by nested substitution, three divisions in a row; inverting the series instead (Lagrange
 * reversion, the Chebyshev-Schroeder form of the step) gives the same order with one division:
 *   u = -f0/f1,  a = f2/(2 f1),  b = f3/(6 f1),  c = -f2/(24 f1),
 *   d = u - a u^2 + (2a^2 - b) u^3 + (5ab - 5a^3 - c) u^4,  error O(u^5).
 * On the solver's dependency chain the three divisions in a row cost more than the polynomial
 * (about 10 ns per solve on the development machine), hence the choice.
 */
function fifthOrderStep(f0: number, f1: number, f2: number, f3: number): number {
  const g = 1 / f1;
  const u = -f0 * g;
  const a = 0.5 * f2 * g;
  const b = f3 * g * F3;
  const c = -f2 * g * F4;
  return u * (1 + u * (-a + u * (2 * a * a - b + u * (5 * a * b - 5 * a * a * a - c))));
}


/**
 * Eccentric anomaly E (rad) solving Kepler's equation M = E - e sin E, for 0 <= e < 1 and any
 * finite M (rad); E keeps M's revolution (E - M is within +-e). Method: Markley (1995), see
 * markleyReduced — non-iterative: one sqrt, one rough cube root, one sin/cos pair (polynomial,
 * see sinHalfTurn in src/core/fasttrig.ts) and three divisions. Accuracy: residual
 * |E - e sin E - M| within a few ulp of max(|M|, 1) over the whole range including e = 0.9999999
 * and M -> 0, and E itself to a few ulp relative there (checked against 70-digit decimal.js in
 * test/core/kepler.test.ts).
 */
export function solveKeplerElliptic(meanAnomaly: number, ecc: number): number {
  const m = reduceToPi(meanAnomaly);
  const turns = meanAnomaly - m;
  const e = m < 0 ? -markleyReduced(-m, ecc) : markleyReduced(m, ecc);
  return e + turns;
}

// ---------------------------------------------------------------------------------------------
// Hyperbolic Kepler equation.

/** Kernel: hyperbolic mean anomaly M = e sinh H - H (dimensionless), relative accuracy kept near H = 0. */
export function meanFromHyperbolic(hypAnomaly: number, ecc: number): number {
  return (ecc - 1) * hypAnomaly + ecc * sinhMinusX(hypAnomaly);
}

/**
 * Upper bound on the root of e sinh H - H = m (m >= 0): the smaller of the roots of the cubic
 * (e-1) H + e H^3/6 = m (since sinh H - H >= H^3/6) and of (e-1) sinh H = m (since sinh H >= H),
 * then one step of the fixed point H = asinh((m + H)/e), which maps upper bounds to closer ones.
 */
function hyperbolicUpperStart(m: number, ecc: number): number {
  const em1 = ecc - 1;
  let cubic: number;
  if (m > 1e100) cubic = Math.cbrt(6 / ecc) * Math.cbrt(m); // p H is negligible; scaled so 6m cannot overflow
  else {
    // Real root of H^3 + p H - q = 0 (p > 0) as q / (A^2 + p/3 + (p/3A)^2): Cardano without cancellation.
    const p = (6 * em1) / ecc;
    const q = (6 * m) / ecc;
    const a = Math.cbrt(q / 2 + Math.sqrt((q * q) / 4 + (p * p * p) / 27));
    const b = p / (3 * a);
    cubic = q / (a * a + p / 3 + b * b);
  }
  const linear = Math.asinh(m / em1);
  return Math.asinh((m + Math.min(cubic, linear)) / ecc);
}

/**
 * Hyperbolic anomaly H (dimensionless) solving M = e sinh H - H, for e > 1 and any finite M.
 * Newton's method from an upper bound (hyperbolicUpperStart): f is increasing and convex for
 * H > 0, so the iterates fall monotonically onto the root — no divergence for any M or any
 * e > 1, including e -> 1+ (cancellation-free f near H = 0). Typically 2-6 steps. Accuracy: H to
 * a few ulp relative; the residual is then a few ulp of max(|M|, 1) plus what the rounding of H
 * itself implies, (e cosh H - 1) ulp(H), which dominates for large |H|.
 */
export function solveKeplerHyperbolic(meanAnomaly: number, ecc: number): number {
  if (meanAnomaly === 0) return meanAnomaly;
  const m = Math.abs(meanAnomaly);
  const em1 = ecc - 1;
  let h = hyperbolicUpperStart(m, ecc);
  for (let i = 0; i < 100; i++) {
    const f = meanFromHyperbolic(h, ecc) - m;
    const fp = em1 + ecc * coshMinusOne(h);
    const step = f / fp;
    if (!Number.isFinite(step)) break;
    h -= step;
    // Quadratic convergence: once the step is 1e-10 of H, the remaining error is ~1e-20 of H.
    if (Math.abs(step) <= 1e-10 * h) break;
  }
  return meanAnomaly < 0 ? -h : h;
}

// ---------------------------------------------------------------------------------------------
// Parabola: Barker's equation.

/**
 * Barker's equation for the parabola, Mp = D + D^3/3 with D = tan(nu/2), solved for D in closed
 * form. The parabolic mean anomaly used throughout Orbit Cells is
 *   Mp = 2 sqrt(mu / p^3) (t - T) = sqrt(mu / (2 q^3)) (t - T)
 * (p semi-latus rectum = 2 q, q periapsis radius, T time of periapsis passage), which follows
 * from integrating r^2 dnu/dt = sqrt(mu p) with r = p / (1 + cos nu), Barker's equation
 * t - T = (1/2) sqrt(p^3/mu) (D + D^3/3). It is Vallado's convention (Fundamentals of
 * Astrodynamics and Applications, 4th ed., §2.2, Example 2-2: 2 sqrt(mu/p^3) dt = B + B^3/3 with
 * B = tan(nu/2)); Curtis's Mp (ch. 3) is half of it. The cubic D^3 + 3D - 3Mp = 0 has one
 * real root, D = A - 1/A with A = cbrt(3Mp/2 + sqrt(1 + (3Mp/2)^2)); for small A it is evaluated
 * as 3Mp / (A^2 + 1 + 1/A^2), free of cancellation. Accuracy: a few ulp relative, any finite Mp
 * (D overflows to Infinity only beyond |Mp| ~ 1e308).
 */
export function solveBarker(meanAnomalyParabolic: number): number {
  const mp = Math.abs(meanAnomalyParabolic);
  const half = 1.5 * mp;
  const a = Math.cbrt(half + Math.hypot(1, half));
  const d = a > 2 ? a - 1 / a : (3 * mp) / (a * a + 1 + 1 / (a * a));
  return meanAnomalyParabolic < 0 ? -d : d;
}

/** Kernel: parabolic mean anomaly Mp = D + D^3/3, D = tan(nu/2), for |nu| < pi (rad). */
export function parabolicMeanFromTrue(trueAnomaly: number): number {
  const d = Math.tan(trueAnomaly / 2);
  return d + (d * d * d) / 3;
}

/** Kernel: true anomaly nu = 2 atan(D) (rad, in (-pi, pi)) from the parabolic mean anomaly. */
export function trueFromParabolicMean(meanAnomalyParabolic: number): number {
  return 2 * Math.atan(solveBarker(meanAnomalyParabolic));
}

// ---------------------------------------------------------------------------------------------
// True <-> eccentric / hyperbolic anomaly by the half-angle relations (e.g. Curtis, Orbital
// Mechanics for Engineering Students, ch. 3): tan(E/2) = sqrt((1-e)/(1+e)) tan(nu/2) and
// tanh(H/2) = sqrt((e-1)/(e+1)) tan(nu/2). Written with atan2 of the half angles they stay exact
// at apoapsis (nu = pi) and free of the e + cos nu cancellation that the cosine forms suffer as e -> 1.


/** Kernel: eccentric anomaly E (rad) from true anomaly nu (rad), 0 <= e < 1, same revolution; a few ulp. */
export function eccentricFromTrue(trueAnomaly: number, ecc: number): number {
  const reduced = reduceToPi(trueAnomaly);
  const half = reduced / 2;
  const turns = trueAnomaly - reduced;
  return 2 * Math.atan2(Math.sqrt(1 - ecc) * Math.sin(half), Math.sqrt(1 + ecc) * Math.cos(half)) + turns;
}

/** Kernel: true anomaly nu (rad) from eccentric anomaly E (rad), 0 <= e < 1, same revolution; a few ulp. */
export function trueFromEccentric(eccAnomaly: number, ecc: number): number {
  const reduced = reduceToPi(eccAnomaly);
  const half = reduced / 2;
  const turns = eccAnomaly - reduced;
  return 2 * Math.atan2(Math.sqrt(1 + ecc) * Math.sin(half), Math.sqrt(1 - ecc) * Math.cos(half)) + turns;
}

/**
 * Kernel: hyperbolic anomaly H from true anomaly nu (rad), e > 1, |nu| < acos(-1/e). Accurate to
 * a few ulp except near the asymptote, where H = 2 atanh(x) with x -> 1 is ill-conditioned in nu
 * itself (an ulp of nu moves H by about 1/(1 - x)).
 */
export function hyperbolicFromTrue(trueAnomaly: number, ecc: number): number {
  return 2 * Math.atanh(Math.sqrt((ecc - 1) / (ecc + 1)) * Math.tan(trueAnomaly / 2));
}

/** Kernel: true anomaly nu (rad, inside the asymptotes) from hyperbolic anomaly H, e > 1; a few ulp. */
export function trueFromHyperbolic(hypAnomaly: number, ecc: number): number {
  return 2 * Math.atan2(Math.sqrt(ecc + 1) * Math.tanh(hypAnomaly / 2), Math.sqrt(ecc - 1));
}

// ---------------------------------------------------------------------------------------------
// Mean <-> true anomaly for every conic.

/**
 * Kernel: true anomaly (rad) from the mean anomaly of the conic — elliptic M (rad, any
 * revolution, result in the same revolution) for e < 1, parabolic Mp (solveBarker) for e = 1,
 * hyperbolic M (dimensionless) for e > 1, where the result lies inside the asymptotes.
 */
export function trueFromMean(meanAnomaly: number, ecc: number): number {
  if (ecc < 1) return trueFromEccentric(solveKeplerElliptic(meanAnomaly, ecc), ecc);
  if (ecc === 1) return trueFromParabolicMean(meanAnomaly);
  return trueFromHyperbolic(solveKeplerHyperbolic(meanAnomaly, ecc), ecc);
}

/** Kernel: the conic's mean anomaly (as in trueFromMean) from true anomaly nu (rad). */
export function meanFromTrue(trueAnomaly: number, ecc: number): number {
  if (ecc < 1) return meanFromEccentric(eccentricFromTrue(trueAnomaly, ecc), ecc);
  if (ecc === 1) return parabolicMeanFromTrue(trueAnomaly);
  return meanFromHyperbolic(hyperbolicFromTrue(trueAnomaly, ecc), ecc);
}
