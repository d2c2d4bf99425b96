import { finite, firstError, isDomainError, positive, type Result } from "./domain";
import { readRelativeState } from "./localframe";
import { finiteRow } from "./maneuvers";
import { meanMotion } from "./twobody";
import type { Vec3 } from "./vector3";

/**
 * Relative motion near a target on a circular orbit by the Clohessy-Wiltshire (Hill) equations,
 *   x'' - 2 n y' - 3 n^2 x = 0,   y'' + 2 n x' = 0,   z'' + n^2 z = 0,
 * in the target's radial (x), along-track (y), cross-track (z) frame with rotating-frame
 * velocities (src/core/localframe.ts states the axes and signs), n the target's mean motion.
 * Their closed-form solution, the state transition matrix Phi(t) in Curtis, Orbital Mechanics
 * for Engineering Students, 3rd ed., §7.4 (eqs. 7.53; the Phi_rr, Phi_rv, Phi_vr, Phi_vv blocks),
 * the same solution as Vallado, Fundamentals of Astrodynamics and Applications, 3rd ed.,
 * Algorithm 47 (HILLSR). Equation numbers recalled, from memory.
 *
 * A first-order theory: the equations drop every term of second order in separation / radius and
 * assume the target's orbit circular and unperturbed, so over a fixed time their position error
 * grows with the square of the separation (a hundredfold per tenfold, measured in
 * test/core/relativemotion.test.ts against universal-variable propagations of both craft). For a
 * chaser at rest a distance y0 along-track, whose straight y axis leaves it y0^2 / 2a above the
 * target's circle, the error after a phase theta = n t is (y0^2 / 2a) |(3 (1 - cos theta),
 * 6 (sin theta - theta))|: 6 pi y0^2 / a per revolution, 2.7 m for 1 km and 0.27 km for 10 km at
 * 690 km. An eccentric target adds an error of order e |rho| per radian.
 */

/** Below this |x| the series of sin x - x replaces the subtraction, which would cancel. */
const SERIES_LIMIT = 1;

/**
 * sin x - x to a few ulp of itself: the Maclaurin series (terms to x^19, truncation below
 * 2e-19 relative for |x| < 1) where Math.sin(x) - x would cancel, the subtraction above (where
 * the cancellation costs at most about 1 / (1 - sin 1) = 6 ulp).
 */
export function sinMinusX(x: number): number {
  if (Math.abs(x) >= SERIES_LIMIT) return Math.sin(x) - x;
  const x2 = x * x;
  // -x^3/3! + x^5/5! - ... + x^19/19!, nested: each bracket divides by the next two factorial factors.
  let sum = 0;
  for (let k = 8; k >= 1; k--) sum = (x2 / ((2 * k + 2) * (2 * k + 3))) * (1 - sum);
  return -((x * x2) / 6) * (1 - sum);
}

/** The trigonometric terms of Phi(theta), theta = n t, each formed without cancellation. */
export interface CwTerms {
  theta: number;
  s: number;
  c: number;
  /** 1 - cos theta = 2 sin^2(theta / 2) */
  oneMinusC: number;
  /** sin theta - theta */
  sMinusTheta: number;
  /** 4 sin theta - 3 theta = theta + 4 (sin theta - theta) */
  fourSMinus3Theta: number;
}

export function cwTerms(theta: number): CwTerms {
  const half = Math.sin(theta / 2);
  const sMinusTheta = sinMinusX(theta);
  return {
    theta,
    s: Math.sin(theta),
    c: Math.cos(theta),
    oneMinusC: 2 * half * half,
    sMinusTheta,
    fourSMinus3Theta: theta + 4 * sMinusTheta,
  };
}

/**
 * Kernel: the relative state [x, y, z, vx, vy, vz] a time t after (r0, v0), Phi(t) applied:
 *   x  = (4 - 3c) x0 + (s/n) vx0 + (2/n)(1 - c) vy0
 *   y  = 6 (s - theta) x0 + y0 - (2/n)(1 - c) vx0 + ((4s - 3 theta)/n) vy0
 *   z  = c z0 + (s/n) vz0
 *   vx = 3 n s x0 + c vx0 + 2 s vy0
 *   vy = -6 n (1 - c) x0 - 2 s vx0 + (4c - 3) vy0
 *   vz = -n s z0 + c vz0
 * with theta = n t, s = sin theta, c = cos theta (Curtis 3rd ed. §7.4). Units are whatever n
 * (rad/s), r0, v0 and t agree on.
 */
export function cwPropagateKernel(n: number, k: CwTerms, r0: Vec3, v0: Vec3): number[] {
  const [x0, y0, z0] = r0;
  const [u0, w0, q0] = v0;
  const { s, c, oneMinusC } = k;
  return [
    x0 + 3 * oneMinusC * x0 + (s / n) * u0 + ((2 * oneMinusC) / n) * w0,
    6 * k.sMinusTheta * x0 + y0 - ((2 * oneMinusC) / n) * u0 + (k.fourSMinus3Theta / n) * w0,
    c * z0 + (s / n) * q0,
    3 * n * s * x0 + c * u0 + 2 * s * w0,
    -6 * n * oneMinusC * x0 - 2 * s * u0 + (1 - 4 * oneMinusC) * w0,
    -n * s * z0 + c * q0,
  ];
}

/**
 * The chaser's relative state `elapsed` seconds later, [x, y, z km, vx, vy, vz km/s], from the
 * Clohessy-Wiltshire equations about a circular target orbit of radius `targetSma` (km) about a
 * body of GM `gm` (km^3/s^2). relative_state is the chaser minus the target in the target's
 * radial, along-track, cross-track frame with rotating-frame velocities (see localframe.ts);
 * elapsed may be negative (backwards).
 * Refused (#VALUE!): GM or target_sma not positive, relative_state not six finite numbers,
 * elapsed not finite. #NUM! if the result overflows float64.
 * Accuracy: the closed form to 4e-16 of its largest term (against a 50-digit evaluation). As a
 * model of real relative motion it is a first-order estimate (module comment): a chaser 10 km
 * along-track of a 690 km target is placed 0.27 km wrong after one orbit, the error growing with
 * the square of the separation and with time; J2, drag and any eccentricity of the target orbit
 * are ignored. Not for proximity-operations planning or collision avoidance.
 */
export function relativeStateAtTime(gm: number, targetSma: number, relativeState: readonly number[], elapsed: number): Result<number[]> {
  const bad = firstError(positive("body", gm, "km3/s2 (GM)"), positive("target_sma", targetSma, "km (the radius of the target's circular orbit)"));
  if (bad) return bad;
  const rel = readRelativeState(relativeState);
  if (isDomainError(rel)) return rel;
  const badElapsed = finite("elapsed", elapsed, "seconds");
  if (badElapsed) return badElapsed;
  const n = meanMotion(gm, targetSma);
  return finiteRow("elapsed", cwPropagateKernel(n, cwTerms(n * elapsed), rel.r, rel.v));
}
