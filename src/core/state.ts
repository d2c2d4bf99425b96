import { badArgument, noAnswer, type DomainError } from "./domain";
import { cross, norm, type Vec3 } from "./vector3";

/**
 * The sheet's state vector (DEVELOPERS.md, "Conventions"): six numbers x, y, z (km), vx, vy,
 * vz (km/s) in the body's inertial frame, parameter name "state" unless a function names it
 * otherwise (target_state, chaser_state). Shared by ELEMENTS_FROM_STATE, PROPAGATE_STATE and the
 * relative-motion conversions so all refuse the same inputs with the same words.
 */

const STATE_SHAPE = "six finite numbers x, y, z (km), vx, vy, vz (km/s) in one row or column";

/**
 * |r x v| at or below this fraction of |r| |v| counts as rectilinear: the computed r x v is then
 * within ~50 rounding errors of zero, so it defines no orbit plane.
 */
export const RECTILINEAR_TOLERANCE = 1e-14;

/**
 * `count` finite numbers, or the #VALUE! error naming `parameter` with `shape` as what is
 * allowed: the wrong count names the whole range, a bad cell names that cell's value.
 */
export function readNumbers(values: readonly number[], count: number, parameter: string, shape: string): number[] | DomainError {
  if (!Array.isArray(values) || values.length !== count) return badArgument(parameter, values, shape);
  for (const c of values) if (typeof c !== "number" || !Number.isFinite(c)) return badArgument(parameter, c, shape);
  return values.slice();
}

/** Position and velocity of a valid state, or the #VALUE! error naming `parameter`. */
export function readState(state: readonly number[], parameter = "state"): { r: Vec3; v: Vec3 } | DomainError {
  const s = readNumbers(state, 6, parameter, STATE_SHAPE);
  if (!Array.isArray(s)) return s;
  const r: Vec3 = [s[0], s[1], s[2]];
  const v: Vec3 = [s[3], s[4], s[5]];
  if (norm(r) === 0) return badArgument(parameter, 0, "a position away from the centre of the body (x, y, z not all 0)");
  return { r, v };
}

/**
 * #N/A for a state moving straight towards or away from the centre (velocity zero or parallel to
 * the position): such a path is a degenerate conic through the centre, with no orbit plane.
 */
export function rectilinearError(r: Vec3, v: Vec3, parameter = "state"): DomainError | undefined {
  const h = norm(cross(r, v));
  return h <= RECTILINEAR_TOLERANCE * norm(r) * norm(v)
    ? noAnswer(
        parameter,
        "the velocity is zero or parallel to the position, so the path is a straight line through the centre of the body: it has no orbit plane and the conic formulas do not apply",
      )
    : undefined;
}
