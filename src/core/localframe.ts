import { isDomainError, positive, type DomainError, type Result } from "./domain";
import { finiteRow } from "./maneuvers";
import { readNumbers, readState, rectilinearError } from "./state";
import { combine, cross, dot, norm, type Vec3 } from "./vector3";

/**
 * The target's local frame and the chaser's state relative to it, the frame and state that the
 * Clohessy-Wiltshire (Hill) equations use (Curtis, Orbital Mechanics for Engineering Students,
 * 3rd ed., §7.2 and Algorithm 7.1; Vallado, Fundamentals of Astrodynamics and Applications,
 * 3rd ed., Algorithm 47 (Hill's equations), whose frame has the same axes and signs).
 *
 * Axes, fixed to the target at the instant of its state (r, v), with h = r x v:
 *   x, radial:       r / |r|, from the centre of the body out through the target;
 *   z, cross-track:  h / |h|, along the target's orbit normal (seen from +z the target moves
 *                    anticlockwise);
 *   y, along-track:  z x x, in the orbit plane 90 deg ahead of x in the direction of motion
 *                    (along the velocity when the target orbit is circular; otherwise off it by
 *                    the flight-path angle).
 * A relative state is six numbers [x, y, z (km), vx, vy, vz (km/s)]: the chaser's position minus
 * the target's, resolved on these axes, and the rate of change of those three components, that is
 * the derivative of the relative position seen in the rotating frame,
 *   rho_dot = (v_chaser - v_target) - omega x (r_chaser - r_target),   omega = h / |r|^2,
 * omega being the frame's angular velocity (about z, at |h| / |r|^2; for a circular target orbit
 * this is its mean motion n). That rotating-frame rate is what the Clohessy-Wiltshire equations
 * propagate, so a relative state from `relativeState` feeds the CW functions directly; it is not
 * the inertial velocity difference v_chaser - v_target resolved on the axes.
 */

const RELATIVE_STATE_SHAPE =
  "six finite numbers x, y, z (km), vx, vy, vz (km/s) in one row or column: the chaser relative to the target in its radial, along-track, cross-track frame";

/** The six cells of a relative state (any finite values: the chaser may sit on the target), or the #VALUE! error naming `parameter`. */
export function readRelativeState(values: readonly number[], parameter = "relative_state"): { r: Vec3; v: Vec3 } | DomainError {
  const s = readNumbers(values, 6, parameter, RELATIVE_STATE_SHAPE);
  if (!Array.isArray(s)) return s;
  return { r: [s[0], s[1], s[2]], v: [s[3], s[4], s[5]] };
}

interface LocalFrame {
  x: Vec3;
  y: Vec3;
  z: Vec3;
  /** the frame's rotation rate about z, |h| / |r|^2, rad/s */
  rate: number;
}

/** Kernel: the local axes and rotation rate of a target state whose r x v is not zero (checked by the caller). */
function localFrame(r: Vec3, v: Vec3): LocalFrame {
  const rn = norm(r);
  const h = cross(r, v);
  const hn = norm(h);
  const x: Vec3 = [r[0] / rn, r[1] / rn, r[2] / rn];
  const z: Vec3 = [h[0] / hn, h[1] / hn, h[2] / hn];
  return { x, y: cross(z, x), z, rate: hn / rn / rn };
}

/** The target's position and velocity, or why it defines no frame (#VALUE! bad cells, #N/A no orbit plane). */
function readTarget(targetState: readonly number[]): { r: Vec3; v: Vec3 } | DomainError {
  const target = readState(targetState, "target_state");
  if (isDomainError(target)) return target;
  return rectilinearError(target.r, target.v, "target_state") ?? target;
}

const gmCheck = (gm: number): DomainError | undefined => positive("body", gm, "km3/s2 (GM)");

/**
 * The chaser's state relative to the target, [x, y, z km, vx, vy, vz km/s], in the target's
 * radial, along-track, cross-track frame with the rotating-frame velocity (module comment above):
 * Curtis 3rd ed. Algorithm 7.1 (position and velocity; its acceleration is not needed).
 * Given: gm (km^3/s^2, > 0; the conversion itself is kinematic and uses only the two states, the
 * body is checked so a sheet gets the same error for a bad body everywhere); target_state and
 * chaser_state, inertial state vectors of the same body (km, km/s). The target may be on any
 * orbit; the Clohessy-Wiltshire functions that take the result then assume it circular.
 * Refused: bad GM or cells (#VALUE!); a target whose velocity is zero or parallel to its position
 * (#N/A: it has no orbit plane, hence no cross-track axis).
 * Accuracy: exact inverse of `chaserState` to rounding. The difference of two inertial vectors
 * carries the inputs' own rounding, a few ulp of |r_target| (about 1e-12 km in low orbit), so
 * relative to the separation the result is good to about 1e-16 |r_target| / |separation|.
 */
export function relativeState(gm: number, targetState: readonly number[], chaserState: readonly number[]): Result<number[]> {
  const bad = gmCheck(gm);
  if (bad) return bad;
  const target = readTarget(targetState);
  if (isDomainError(target)) return target;
  const chaser = readState(chaserState, "chaser_state");
  if (isDomainError(chaser)) return chaser;
  const f = localFrame(target.r, target.v);
  const dr = combine(1, chaser.r, -1, target.r);
  const dv = combine(1, chaser.v, -1, target.v);
  const rho: Vec3 = [dot(dr, f.x), dot(dr, f.y), dot(dr, f.z)];
  // omega x rho with omega = rate z, resolved on the axes: (-rate rho_y, rate rho_x, 0).
  const row = [...rho, dot(dv, f.x) + f.rate * rho[1], dot(dv, f.y) - f.rate * rho[0], dot(dv, f.z)];
  return finiteRow("chaser_state", row);
}

/**
 * The chaser's inertial state [x, y, z km, vx, vy, vz km/s] from the target's inertial state and
 * the chaser's relative state in the target's local frame: the inverse of `relativeState`,
 *   r_chaser = r_target + R rho,   v_chaser = v_target + R (rho_dot + omega x rho),
 * R the matrix whose columns are the local axes (Curtis 3rd ed. §7.2, Algorithm 7.1 inverted).
 * Given and refused: as `relativeState`, with relative_state any six finite numbers.
 * Accuracy: the chaser state to a few ulp of its own size; a round trip relative -> inertial ->
 * relative returns the relative state to about 1e-16 |r_target| absolute (tested to 1e-9
 * relative for separations from 10 m to 1000 km).
 */
export function chaserState(gm: number, targetState: readonly number[], relativeStateCells: readonly number[]): Result<number[]> {
  const bad = gmCheck(gm);
  if (bad) return bad;
  const target = readTarget(targetState);
  if (isDomainError(target)) return target;
  const rel = readRelativeState(relativeStateCells);
  if (isDomainError(rel)) return rel;
  const f = localFrame(target.r, target.v);
  const [px, py, pz] = rel.r;
  const u: Vec3 = [rel.v[0] - f.rate * py, rel.v[1] + f.rate * px, rel.v[2]];
  const onAxes = (a: number, b: number, c: number): Vec3 => [
    a * f.x[0] + b * f.y[0] + c * f.z[0],
    a * f.x[1] + b * f.y[1] + c * f.z[1],
    a * f.x[2] + b * f.y[2] + c * f.z[2],
  ];
  const dr = onAxes(px, py, pz);
  const dv = onAxes(u[0], u[1], u[2]);
  return finiteRow("relative_state", [...combine(1, target.r, 1, dr), ...combine(1, target.v, 1, dv)]);
}
