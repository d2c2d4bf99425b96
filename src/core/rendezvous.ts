import { TWO_PI } from "./angles";
import { arithmeticFailure, firstError, isDomainError, noAnswer, positive, type DomainError, type Result } from "./domain";
import { readRelativeState } from "./localframe";
import { finiteRow } from "./maneuvers";
import { cwPropagateKernel, cwTerms, type CwTerms } from "./relativemotion";
import { readNumbers } from "./state";
import { meanMotion } from "./twobody";
import { norm, type Vec3 } from "./vector3";

/**
 * Two-impulse rendezvous by the Clohessy-Wiltshire equations (Curtis, Orbital Mechanics for
 * Engineering Students, 3rd ed., §7.5; Vallado, Fundamentals of Astrodynamics and Applications,
 * 3rd ed., eq. 6-60 and Example 6-15, as his companion hillsv.m cites them). The first burn gives
 * the chaser the relative velocity v0+ that carries it from r0 to the aim point in the transfer
 * time t, from the position rows of Phi(t):
 *   Phi_rv(t) v0+ = aim - Phi_rr(t) r0;
 * the second burn, on arrival, cancels the relative velocity there (the chaser stops in the
 * target's frame). Frame, axes and signs: src/core/localframe.ts.
 *
 * Singular transfer times. Phi_rv splits into the in-plane 2 x 2 block
 *   (1/n) [[s, 2(1 - c)], [-2(1 - c), 4s - 3 theta]],   det = (2/n^2) sin(theta/2) (8 sin(theta/2) - 3 theta cos(theta/2)),
 * and the cross-track entry s / n (theta = n t, s = sin theta, c = cos theta). It is singular
 *   - in the orbit plane after every whole period (theta = 2 pi k): every path from r0 then
 *     returns to the same radial offset x0 whatever the burn (a radial impulse's relative ellipse
 *     closes on itself, an along-track one adds only along-track drift);
 *   - in the orbit plane where tan(theta/2) = 3 theta / 8, near 1.407, 2.445, 3.461 ... periods:
 *     one combination of x and y is then fixed whatever the burn;
 *   - cross-track after every half period (theta = pi k): z then equals cos(theta) z0, the
 *     cross-track oscillation passing through its node or its mirror image whatever the burn.
 * At such a time the aim point is usually out of reach (#N/A, saying why); when it is exactly in
 * reach (a whole-period phasing with x_aim = x0, a half-period coplanar transfer with z0 = z_aim
 * = 0) there are many burns, and the one returned is the smallest v0+ (the minimum-norm solution;
 * at whole periods and half periods it is also the limit of the unique answers at nearby times).
 * How close counts as singular: the block's smallest singular value below 1e-10 of its largest
 * (cross-track: |sin theta| below 1e-10 max(1, |theta|)). That is where float64 can no longer tell
 * the matrix from a singular one: theta = n t carries a rounding error of about 1e-16 |theta|, which
 * there moves the burns by 1e-6 of themselves or more. In time it is within about 2e-9 k rad of
 * phase of the k-th singular time, a few microseconds per revolution in low orbit; nearer times
 * than that are treated as the singular time itself. Just outside, the burns are finite but grow
 * without bound as the time approaches a singular one, and the linear theory is then no guide.
 */

/** Smallest-to-largest singular value ratio at or below which the transfer matrix counts as singular. */
export const SINGULAR_RATIO = 1e-10;
/** At a singular time, the aim point counts as in reach when it is off the reachable set by at most this fraction of the distances involved. */
export const REACH_TOLERANCE = 1e-9;

const AIM_SHAPE = "three finite numbers x, y, z (km): the aim point in the target's radial, along-track, cross-track frame";

/**
 * The two burns of a Clohessy-Wiltshire rendezvous: [dv1 x, dv1 y, dv1 z, dv2 x, dv2 y, dv2 z,
 * |dv1|, |dv2|, |dv1| + |dv2|], km/s, components on the target's radial, along-track,
 * cross-track axes. The chaser starts at `relativeState` (relative to the target on a circular
 * orbit of radius `targetSma`, km, about a body of GM `gm`), burns dv1 at once, coasts
 * `transferTime` seconds to `aimPoint` [x, y, z km] and burns dv2 to stop there in the target's
 * frame. An aim point off the along-track axis is no resting place: holding it needs thrust.
 * Refused (#VALUE!): bad GM, target_sma, relative_state (six numbers), aim_point (three numbers),
 * transfer_time not positive. #N/A at a singular transfer time when the aim point is out of reach
 * (module comment). #NUM! if the burns overflow float64.
 * Accuracy: the linear solution lands on the aim point to about 1e-13 of the distances involved
 * times the transfer matrix's amplification of rounding (1 / its relative determinant: about 1
 * away from the singular times, unbounded near them). As a plan for a real chaser it is a
 * first-order estimate, its miss growing with the square of the separation: flown in exact
 * two-body motion, a 2 km inspection hop in 40 minutes at 690 km misses by 2.8 m (0.14%), and
 * Curtis's 35 km, 8-hour example by 4.3 km. J2, drag, the target's eccentricity and the finite
 * length of real burns are ignored. Not for proximity-operations planning or any safety decision.
 */
export function relativeRendezvous(
  gm: number,
  targetSma: number,
  relativeState: readonly number[],
  aimPoint: readonly number[],
  transferTime: number,
): Result<number[]> {
  const bad = firstError(positive("body", gm, "km3/s2 (GM)"), positive("target_sma", targetSma, "km (the radius of the target's circular orbit)"));
  if (bad) return bad;
  const rel = readRelativeState(relativeState);
  if (isDomainError(rel)) return rel;
  const aimCells = readNumbers(aimPoint, 3, "aim_point", AIM_SHAPE);
  if (!Array.isArray(aimCells)) return aimCells;
  const aim: Vec3 = [aimCells[0], aimCells[1], aimCells[2]];
  const badTime = positive("transfer_time", transferTime, "seconds");
  if (badTime) return badTime;

  const n = meanMotion(gm, targetSma);
  const k = cwTerms(n * transferTime);
  // Where the chaser would be with no relative velocity, and what the burn must add.
  const drift = cwPropagateKernel(n, k, rel.r, [0, 0, 0]);
  const need: Vec3 = [aim[0] - drift[0], aim[1] - drift[1], aim[2] - drift[2]];
  const scale = norm(aim) + (4 + 6 * Math.abs(k.theta)) * norm(rel.r);
  const inPlane = solveInPlane(k, n * need[0], n * need[1], REACH_TOLERANCE * n * scale, transferTime, n);
  if (isDomainError(inPlane)) return inPlane;
  const crossTrack = solveCrossTrack(k, n * need[2], REACH_TOLERANCE * n * (Math.abs(rel.r[2]) + Math.abs(aim[2])), transferTime, n);
  if (isDomainError(crossTrack)) return crossTrack;

  const v0: Vec3 = [inPlane[0], inPlane[1], crossTrack];
  const arrival = cwPropagateKernel(n, k, rel.r, v0);
  const dv1: Vec3 = [v0[0] - rel.v[0], v0[1] - rel.v[1], v0[2] - rel.v[2]];
  const dv2: Vec3 = [-arrival[3], -arrival[4], -arrival[5]];
  const size1 = norm(dv1);
  const size2 = norm(dv2);
  return finiteRow("transfer_time", [...dv1, ...dv2, size1, size2, size1 + size2]);
}

const periods = (t: number, n: number): string => String(Number(((t * n) / TWO_PI).toPrecision(8)));

/**
 * In-plane velocity after the first burn: solves M u = b with M = n Phi_rv (in plane), b = n x the
 * needed in-plane displacement. Cramer's rule when M is regular; at a singular time the
 * minimum-norm solution M^T b / |M|_F^2 (exact for a rank-one M) when b is in M's range to
 * `tolerance`, else #N/A.
 */
function solveInPlane(k: CwTerms, bx: number, by: number, tolerance: number, t: number, n: number): [number, number] | DomainError {
  const a11 = k.s, a12 = 2 * k.oneMinusC, a21 = -2 * k.oneMinusC, a22 = k.fourSMinus3Theta;
  // det M = 8 (1 - c) - 3 theta s, factored so that each family of singular times has its own factor.
  const halfS = Math.sin(k.theta / 2);
  const otherFactor = 8 * halfS - 3 * k.theta * Math.cos(k.theta / 2);
  const det = 2 * halfS * otherFactor;
  const frobenius2 = a11 * a11 + a12 * a12 + a21 * a21 + a22 * a22;
  if (Math.abs(det) > SINGULAR_RATIO * frobenius2) return [(a22 * bx - a12 * by) / det, (a11 * by - a21 * bx) / det];
  if (!(frobenius2 > 0) || !Number.isFinite(frobenius2)) return arithmeticFailure("transfer_time", "the transfer time is too short or too long for float64 to resolve the motion");

  const u = (a11 * bx + a21 * by) / frobenius2;
  const w = (a12 * bx + a22 * by) / frobenius2;
  if (Math.hypot(bx - (a11 * u + a12 * w), by - (a21 * u + a22 * w)) <= tolerance) return [u, w];
  const where = `${t} s is ${periods(t, n)} periods of the target orbit`;
  // Which factor vanishes: sin(theta/2) at whole periods, the other (of size up to 8 + 3 theta) elsewhere.
  return Math.abs(halfS) * (8 + 3 * Math.abs(k.theta)) < Math.abs(otherFactor)
    ? noAnswer(
        "transfer_time",
        `${where}, a whole number: after whole periods the linear (Clohessy-Wiltshire) motion brings the chaser back to its starting radial offset whatever the first burn, and the aim point's radial offset differs; choose another transfer time, or aim at the starting radial offset`,
      )
    : noAnswer(
        "transfer_time",
        `${where}, one of the times (about 1.407, 2.445, 3.461 ... periods, where tan(n t / 2) = 3 n t / 8) at which the linear (Clohessy-Wiltshire) motion fixes one combination of the radial and along-track offsets whatever the first burn, and the aim point does not satisfy it; choose another transfer time`,
      );
}

/** Cross-track velocity after the first burn: s w = b, or at a singular time 0 when b is 0 to `tolerance`, else #N/A. */
function solveCrossTrack(k: CwTerms, b: number, tolerance: number, t: number, n: number): number | DomainError {
  if (Math.abs(k.s) > SINGULAR_RATIO * Math.max(1, Math.abs(k.theta))) return b / k.s;
  if (Math.abs(b) <= tolerance) return 0;
  return noAnswer(
    "transfer_time",
    `${t} s is ${periods(t, n)} periods of the target orbit, a whole number of half periods: the linear cross-track motion then passes through ${k.c > 0 ? "its starting offset z0" : "the mirror image -z0 of its starting offset"} whatever the first burn, and the aim point's cross-track offset differs; choose another transfer time`,
  );
}
