import { badArgument, noAnswer, type DomainError } from "./domain";
import { cross, norm, type Vec3 } from "./vector3";

/**
 * The sheet's state vector (DEVELOPERS.md, "Conventions"): six numbers x, y, z (km), vx, vy, vz (km/s) in the
 * body's inertial frame, parameter name "state". Shared by ELEMENTS_FROM_STATE and
 * PROPAGATE_STATE so both refuse the same inputs with the same words.
 */

const STATE_SHAPE = "six finite numbers x, y, z (km), vx, vy, vz (km/s) in one row or column";

/**
 * |r x v| at or below this fraction of |r| |v| counts as rectilinear: the computed r x v is then
 * within ~50 rounding errors of zero, so it defines no orbit plane.
 */
export const RECTILINEAR_TOLERANCE = 1e-14;

/** Position and velocity of a valid state, or the #VALUE! error naming "state". */
export function readState(state: readonly number[]): { r: Vec3; v: Vec3 } | DomainError {
  if (!Array.isArray(state) || state.length !== 6) return badArgument("state", state, STATE_SHAPE);
  for (const c of state) if (typeof c !== "number" || !Number.isFinite(c)) return badArgument("state", c, STATE_SHAPE);
  const r: Vec3 = [state[0], state[1], state[2]];
  const v: Vec3 = [state[3], state[4], state[5]];
  if (norm(r) === 0) return badArgument("state", 0, "a position away from the centre of the body (x, y, z not all 0)");
  return { r, v };
}

/**
 * #N/A for a state moving straight towards or away from the centre (velocity zero or parallel to
 * the position): such a path is a degenerate conic through the centre, with no orbit plane.
 */
export function rectilinearError(r: Vec3, v: Vec3): DomainError | undefined {
  const h = norm(cross(r, v));
  return h <= RECTILINEAR_TOLERANCE * norm(r) * norm(v)
    ? noAnswer(
        "state",
        "the velocity is zero or parallel to the position, so the path is a straight line through the centre of the body: it has no orbit plane and the conic formulas do not apply",
      )
    : undefined;
}
