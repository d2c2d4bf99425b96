import { TWO_PI, toDegrees, wrapDegrees180 } from "./angles";
import { firstError, noAnswer, positive, type Result } from "./domain";
import { finiteRow, hohmannKernel } from "./maneuvers";
import { synodicKernel } from "./spheres";
import { meanMotion } from "./twobody";

/**
 * Planet to planet by the coplanar circular Hohmann transfer about a common parent: both bodies
 * on circles of radius equal to their semi-major axes, in one plane. Sheet units: GM km^3/s^2,
 * sma km, speeds km/s, times s, angles deg. A first look at a launch opportunity (Curtis,
 * Orbital Mechanics for Engineering Students, 2nd ed., ch. 8, interplanetary Hohmann transfers
 * and rendezvous opportunities), not a trajectory: real orbits are eccentric and inclined, so
 * real excess speeds and dates differ, for Mars markedly from one opportunity to the next; a
 * Lambert arc between dated ephemeris positions is the next step.
 */

/**
 * [v_inf out (km/s), v_inf in (km/s), time of flight (s), phase angle at departure (deg),
 * synodic period (s)] for the Hohmann transfer from a body on a circle of `smaFrom` to one on a
 * circle of `smaTo` (km) about a parent of GM `gmParent`.
 *
 * The excess speeds are the Hohmann burns at each end (relative speed between the planet and the
 * transfer ellipse). The phase angle is where the target must be, ahead of the departure body
 * along the direction of motion, at departure: 180 deg - n_to t_flight, reduced to (-180, 180]
 * (negative: behind, as for a transfer inward to Venus). The synodic period is how often that
 * geometry recurs. Bodies with the same sma have no transfer: no answer. Errors name `from`
 * and `to`, the sheet's parameters (gm_parent comes from `from`'s catalogue entry).
 * Accuracy: a few ulp for the model; the model itself is the coarse part.
 */
export function planetTransfer(gmParent: number, smaFrom: number, smaTo: number): Result<number[]> {
  const bad = firstError(
    positive("from", gmParent, "km3/s2 (GM of the common parent)"),
    positive("from", smaFrom, "km (semi-major axis about the parent)"),
    positive("to", smaTo, "km (semi-major axis about the parent)"),
  );
  if (bad) return bad;
  if (smaFrom === smaTo) return noAnswer("to", "both bodies are on the same orbit radius, so there is no transfer between them");
  const [vInfOut, vInfIn, tof] = hohmannKernel(gmParent, smaFrom, smaTo);
  const phase = -wrapDegrees180(-(180 - toDegrees(meanMotion(gmParent, smaTo) * tof)));
  const synodic = synodicKernel(TWO_PI / meanMotion(gmParent, smaFrom), TWO_PI / meanMotion(gmParent, smaTo));
  return finiteRow("to", [vInfOut, vInfIn, tof, phase, synodic]);
}
