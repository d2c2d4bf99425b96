import * as maneuvers from "../core/maneuvers";
import { formatValue, isDomainError, noAnswer, type Result } from "../core/domain";
import { gmOf, surfaceOf } from "./bodyargs";
import { family } from "./define";
import { body, gm, num, optRadius, radius, type BodyArg } from "./params";

/**
 * The phasing orbit, refused (#N/A) when a catalogue body's surface is in its way: a target ahead
 * needs a lower phasing orbit, whose periapsis 2a - r must clear the body's radius. The message
 * gives the fewest revolutions that clear it: a_phase >= (r + R) / 2 with a_phase = r (1 - phase
 * / (360 k))^(2/3) gives k >= phase / (360 (1 - ((r + R) / (2r))^(3/2))).
 */
function phasingClear(b: BodyArg, r: number, phase: number, revolutions: number): Result<number[]> {
  const out = maneuvers.phasingOrbit(gmOf(b), r, phase, revolutions);
  const s = surfaceOf(b);
  if (isDomainError(out) || !s) return out;
  const periapsis = 2 * out[1] - r;
  if (periapsis >= s.radius) return out;
  const fewest = Math.ceil(phase / (360 * (1 - Math.pow((r + s.radius) / (2 * r), 1.5))));
  const km = (x: number) => `${formatValue(Number(x.toPrecision(6)))} km`;
  return noAnswer(
    "revolutions",
    `catching a target ${formatValue(phase)} deg ahead in ${formatValue(revolutions)} revolution${revolutions === 1 ? "" : "s"} needs a phasing orbit whose periapsis, ${km(periapsis)} from the centre, is inside ${s.name} (radius ${km(s.radius)}); ${Number.isFinite(fewest) ? `${fewest} revolutions or more clear the surface` : "use more revolutions"} (its atmosphere is not checked)`,
  );
}

// Family "Maneuvers": impulsive burns between and on circular orbits about one body (GM of the
// body alone). Examples: the invented Skerry-1 raise from 520 km to 690 km, a 0.8° plane trim and
// phasing at 690 km.

const define = family("Maneuvers");

const TRANSFER_DV = define.scalar("TRANSFER_DV", [gm(), radius("radius_from"), radius("radius_to"), optRadius("via_radius")], maneuvers.transferDv, {
  example: ["Earth", 6898.137, 7068.137],
  terms: ["Hohmann", "bi-elliptic", "orbit raise", "orbit lowering", "dv", "delta-v"],
});
/**
 * Total delta-v of a transfer between two coplanar circular orbits: Hohmann (two tangential burns), or bi-elliptic through a far apse at via_radius (three burns). Impulsive, two-body: a preliminary budget figure without finite-burn or gravity losses. Refuses (#VALUE!) a radius inside the body (an altitude typed as a radius).
 * @customfunction TRANSFER_DV
 * @helpurl https://localhost:3000/reference.html#transfer_dv
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s². A GM number has no surface to check distances against.
 * @param radius_from Radius of the starting circular orbit, km.
 * @param radius_to Radius of the final circular orbit, km (smaller than radius_from to lower the orbit).
 * @param [via_radius] Far-apse radius of a bi-elliptic transfer, km, at least the larger of the two radii. Omit (or 0) for a Hohmann transfer.
 * @returns Total delta-v, km/s (sum of the burn magnitudes).
 */
export function transferDv(body: any[][], radius_from: any[][], radius_to: any[][], via_radius?: any[][]): any[][] {
  return TRANSFER_DV(arguments);
}

const TRANSFER_BURNS = define.rows("TRANSFER_BURNS", ["burn 1 (km/s)", "burn 2 (km/s)", "burn 3 (km/s)", "total dv (km/s)", "time of flight (s)"], [gm(), radius("radius_from"), radius("radius_to"), optRadius("via_radius")], maneuvers.transferBurns, {
  example: ["Earth", 6898.137, 7068.137, null, true],
  terms: ["Hohmann", "bi-elliptic", "burn list", "dv", "delta-v", "transfer time"],
});
/**
 * The burns of a transfer between two coplanar circular orbits, one row per case: Hohmann (burn 3 is 0), or bi-elliptic through a far apse at via_radius. Burn sizes are magnitudes, whichever way the orbit changes. Impulsive, two-body: a preliminary estimate. Refuses (#VALUE!) a radius inside the body (an altitude typed as a radius).
 * @customfunction TRANSFER_BURNS
 * @helpurl https://localhost:3000/reference.html#transfer_burns
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s². A GM number has no surface to check distances against.
 * @param radius_from Radius of the starting circular orbit, km.
 * @param radius_to Radius of the final circular orbit, km.
 * @param [via_radius] Far-apse radius of a bi-elliptic transfer, km, at least the larger of the two radii. Omit (or 0) for a Hohmann transfer.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: burn 1 (km/s), burn 2 (km/s), burn 3 (km/s), total dv (km/s), time of flight (s).
 */
export function transferBurns(body: any[][], radius_from: any[][], radius_to: any[][], via_radius?: any[][], include_header?: any[][]): any[][] {
  return TRANSFER_BURNS(arguments);
}

const PLANE_CHANGE_DV = define.scalar("PLANE_CHANGE_DV", [num("speed", "km/s"), num("angle", "deg")], maneuvers.planeChangeDv, {
  example: [7.5096, 0.8],
  terms: ["inclination change", "dv", "delta-v", "plane trim"],
});
/**
 * Delta-v to turn the orbit plane by an angle at constant speed: 2 v sin(angle / 2). Cheapest where the speed is lowest (e.g. at apoapsis).
 * @customfunction PLANE_CHANGE_DV
 * @helpurl https://localhost:3000/reference.html#plane_change_dv
 * @param speed Speed at the burn point, km/s.
 * @param angle Angle between the old and new planes, deg (0 to 180).
 * @returns Delta-v, km/s.
 */
export function planeChangeDv(speed: any[][], angle: any[][]): any[][] {
  return PLANE_CHANGE_DV(arguments);
}

const COMBINED_PLANE_CHANGE_DV = define.scalar("COMBINED_PLANE_CHANGE_DV", [num("speed_from", "km/s"), num("speed_to", "km/s"), num("angle", "deg")], maneuvers.combinedPlaneChangeDv, {
  example: [7.4638, 7.5096, 0.8],
  terms: ["inclination change", "combined burn", "dv", "delta-v"],
});
/**
 * Delta-v of one burn that changes the speed and turns the plane together (law of cosines on the two velocities, horizontal before and after). Less than doing the two separately.
 * @customfunction COMBINED_PLANE_CHANGE_DV
 * @helpurl https://localhost:3000/reference.html#combined_plane_change_dv
 * @param speed_from Speed just before the burn, km/s.
 * @param speed_to Speed just after the burn, km/s.
 * @param angle Angle between the old and new planes, deg (0 to 180).
 * @returns Delta-v, km/s.
 */
export function combinedPlaneChangeDv(speed_from: any[][], speed_to: any[][], angle: any[][]): any[][] {
  return COMBINED_PLANE_CHANGE_DV(arguments);
}

const PHASING_ORBIT = define.rows("PHASING_ORBIT", ["phasing period (s)", "phasing sma (km)", "total dv (km/s)"], [body(), radius("radius"), num("phase_angle", "deg"), num("revolutions")], phasingClear, {
  example: ["Earth", 7068.137, 20, 3, true],
  terms: ["rendezvous phasing", "drift orbit", "slot change", "dv", "delta-v"],
});
/**
 * Phasing orbit to catch a target on the same circular orbit (both moving prograde) after a whole number of revolutions. Positive phase_angle: the target is ahead, so the chaser burns retrograde onto a lower, faster orbit; negative: behind, so it burns prograde onto a higher, slower one. Two equal burns: onto the phasing orbit and back. A phasing orbit whose periapsis would be inside a catalogue body is #N/A with the fewest revolutions that clear the surface; the atmosphere is not checked. Refuses (#VALUE!) a radius inside the body. Impulsive, two-body.
 * @customfunction PHASING_ORBIT
 * @helpurl https://localhost:3000/reference.html#phasing_orbit
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s². A GM number has no surface to check distances against.
 * @param radius Radius of the shared circular orbit, km.
 * @param phase_angle How far the target is ahead of the chaser along the direction of motion, deg (−360 to 360; negative: behind).
 * @param revolutions Whole number of revolutions the chaser flies on the phasing orbit, 1 or more.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: phasing period (s), phasing sma (km), total dv of the two burns (km/s).
 */
export function phasingOrbit(body: any[][], radius: any[][], phase_angle: any[][], revolutions: any[][], include_header?: any[][]): any[][] {
  return PHASING_ORBIT(arguments);
}
