import { toDegrees, toRadians, wrapDegrees360 } from "./angles";
import { badArgument, firstError, noAnswer, positive, within, type Result } from "./domain";

/**
 * Launch azimuth (deg from north, east positive, in [0, 360)) that puts a vehicle launched from
 * `latitude` (deg, north positive) directly into an orbit of inclination `inc` (deg).
 *
 * Inertial azimuth, from the spherical triangle site-node-pole: sin(beta) = cos(i) / cos(lat)
 * (Vallado 4th ed. §6.4.1; Wertz and Larson, SMAD 3rd ed., p. 154, eq. 6-42). The ascending
 * pass heads north (prograde: north-east, retrograde: north-west); `descending` mirrors it about
 * east-west (azimuth 180 - beta).
 *
 * With `equatorialSpeed` (km/s, the surface's eastward speed at the equator: 2 pi R / T) and
 * `orbitalSpeed` (km/s, the inertial speed at insertion) the azimuth is corrected for the
 * rotating surface: the vehicle must fly, relative to the ground, the inertial velocity minus
 * the site's eastward velocity v_eq cos(lat):
 *   tan(beta_rot) = (v_orb sin beta - v_eq cos lat) / (v_orb cos beta)
 * (the launch velocity triangle; SMAD 3rd ed. eq. 6-42c gives a small-angle form of it), evaluated
 * with atan2 so every quadrant comes out right. The correction needs both speeds: with only
 * equatorialSpeed the inertial azimuth is returned; orbitalSpeed without it is an error.
 *
 * No answer when |lat| > inc (prograde) or |lat| > 180 - inc (retrograde): the orbit's ground
 * track never reaches that latitude. At a pole every direction is south (or north), so there is
 * no azimuth. Accuracy: the geometry is exact on a sphere; a real ascent turns while it climbs
 * and the site's geodetic latitude differs from the geocentric one by up to 0.19 deg on Earth,
 * so treat the result as a planning value.
 */
export function launchAzimuth(
  latitude: number,
  inc: number,
  equatorialSpeed?: number | null,
  orbitalSpeed?: number | null,
  descending?: boolean | null,
): Result<number> {
  const bad = firstError(
    within("latitude", latitude, -90, 90, "a latitude from -90 (south) to 90 (north) deg"),
    within("inc", inc, 0, 180, "an inclination from 0 to 180 deg"),
  );
  if (bad) return bad;
  const hasEq = equatorialSpeed !== undefined && equatorialSpeed !== null;
  const hasOrb = orbitalSpeed !== undefined && orbitalSpeed !== null;
  if (hasOrb && !hasEq) return badArgument("body", equatorialSpeed, "a body (or its radius and rotation period) to correct for the surface's rotation when orbital_speed is given");
  if (hasOrb) {
    const badSpeed = firstError(
      Number.isFinite(equatorialSpeed) ? undefined : badArgument("body", equatorialSpeed, "a finite equatorial rotation speed in km/s"),
      positive("orbital_speed", orbitalSpeed as number, "km/s (inertial speed at orbit insertion)"),
    );
    if (badSpeed) return badSpeed;
  }

  const absLat = Math.abs(latitude);
  if (absLat === 90) return noAnswer("latitude", "at a pole every direction points the same way (south or north), so no launch azimuth is defined");
  const reachable = Math.min(inc, 180 - inc);
  if (absLat > reachable)
    return noAnswer(
      "latitude",
      `an orbit inclined ${inc} deg reaches only latitudes up to ${reachable} deg, so a site at ${latitude} deg cannot launch directly into it (a plane change is needed)`,
    );

  // cos via sin of the complement gives exactly 0 at inc = 90 (so a polar orbit is due north).
  const cosInc = Math.sin(toRadians(90 - inc));
  const cosLat = Math.cos(toRadians(latitude));
  const sinBeta = Math.min(1, Math.max(-1, cosInc / cosLat));
  const cosBeta = Math.sqrt((1 - sinBeta) * (1 + sinBeta));
  const north = descending ? -cosBeta : cosBeta;
  if (!hasOrb) return azimuthOf(sinBeta, north);

  const v = orbitalSpeed as number;
  const east = v * sinBeta - (equatorialSpeed as number) * cosLat;
  return azimuthOf(east, v * north);
}

/** Azimuth in [0, 360) of a horizontal direction; + 0 turns a -0 into 0. */
const azimuthOf = (east: number, north: number): number => wrapDegrees360(toDegrees(Math.atan2(east, north))) + 0;
