import { toDegrees, toRadians } from "./angles";
import { finiteResult, firstError, noAnswer, positive, within, type Result } from "./domain";
import { velocityChange } from "./maneuvers";
import { circularSpeed } from "./twobody";

/**
 * Delta-v of a slow spiral between two circular orbits with a plane change, under continuous low
 * thrust of constant acceleration magnitude and the optimal piecewise-constant yaw (thrust out of
 * the plane at an angle beta that flips sign at the anti-nodes each revolution): Edelbaum's
 * analysis (T. N. Edelbaum, "Propulsion Requirements for Controllable Satellites", ARS Journal
 * 31, 1961) in the closed form of J. A. Kechichian, "Reformulation of Edelbaum's Low-Thrust
 * Transfer Problem Using Optimal Control Theory", Journal of Guidance, Control, and Dynamics 20(5),
 * 1997 (volume and issue from memory):
 *   dv = sqrt(v0^2 - 2 v0 v1 cos(pi/2 di) + v1^2),   v0, v1 the circular speeds, di in radians.
 * It is the law of cosines for two velocities at the angle (pi/2) di, so it is computed by
 * maneuvers.ts's velocityChange in its cancellation-free form, with v0 - v1 formed from the
 * radii so that nearly equal orbits keep their precision.
 *
 * The closed form holds while (pi/2) di <= pi, that is di <= 2 rad = 114.59 deg: the yaw profile
 * then sweeps its full half-turn, and larger plane changes need another strategy (the formula,
 * read past that point, would give a smaller dv for a larger change). Derived from the form of the
 * solution; Kechichian's paper discusses the limit (from memory).
 */

/** Largest plane change the closed form covers: 2 rad, deg. */
export const MAX_PLANE_CHANGE_DEG = toDegrees(2);

/**
 * Dv (km/s) of a circle-to-circle low-thrust transfer from radius_from to radius_to (km) with a
 * plane change of plane_change (deg), Edelbaum's closed form as Kechichian gives it (module
 * comment). The dv does not depend on the thrust level, only on the assumptions below.
 * Refused: GM or a radius not positive, plane_change outside 0-180 deg (#VALUE!); a plane change
 * above 114.59 deg, beyond the closed form (#N/A).
 * Accuracy: a few ulp of the closed form. As a budget figure it is the idealised optimum of a
 * quasi-circular spiral: thrust small against gravity (many revolutions), orbits circular
 * throughout, no eclipse coasting, no J2, drag or third bodies; real transfers need somewhat
 * more, and the time follows from the dv with a constant-thrust firing time. A preliminary
 * estimate, not a trajectory design.
 */
export function lowThrustDv(gm: number, radiusFrom: number, radiusTo: number, planeChange: number): Result<number> {
  const bad = firstError(
    positive("body", gm, "km3/s2 (GM)"),
    positive("radius_from", radiusFrom, "km"),
    positive("radius_to", radiusTo, "km"),
    within("plane_change", planeChange, 0, 180, "an angle between the two orbit planes from 0 to 180 deg"),
  );
  if (bad) return bad;
  if (planeChange > MAX_PLANE_CHANGE_DEG)
    return noAnswer(
      "plane_change",
      `Edelbaum's closed form covers plane changes up to 2 rad (${MAX_PLANE_CHANGE_DEG.toFixed(2)} deg); ${planeChange} deg needs another steering strategy, for instance a split into two transfers`,
    );
  const v0 = circularSpeed(gm, radiusFrom);
  const v1 = circularSpeed(gm, radiusTo);
  // v0 - v1 = (GM/r0 - GM/r1) / (v0 + v1), with r1 - r0 exact: no cancellation between nearly equal speeds.
  const difference = (((gm / radiusFrom) * (radiusTo - radiusFrom)) / radiusTo) / (v0 + v1);
  return finiteResult("radius_to", velocityChange(v0, v1, (Math.PI / 2) * toRadians(planeChange), difference));
}
