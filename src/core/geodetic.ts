import { toDegrees, toRadians } from "./angles";
import { badArgument, finite, firstError, within, type Result } from "./domain";
import { WGS84_A, WGS84_B, WGS84_E2 } from "./wgs84";

/**
 * Geodetic latitude, longitude and height on the WGS 84 ellipsoid (src/core/wgs84.ts) <->
 * Earth-fixed (ITRF) Cartesian position, km. Latitude deg north positive, longitude deg east
 * positive, height km above the ellipsoid along its normal.
 *
 * To Cartesian: Vallado, Fundamentals of Astrodynamics and Applications, 4th ed., Alg. 51 (SITE),
 *   C = a / sqrt(1 - e^2 sin^2 lat), S = C (1 - e^2),
 *   r = ((C + h) cos lat cos lon, (C + h) cos lat sin lon, (S + h) sin lat).
 * From Cartesian: the geodetic latitude solves p sin(lat) - z cos(lat) - e^2 C sin(lat) cos(lat) = 0
 * (p the distance from the axis), the condition Vallado's Alg. 12 (ECEF to LATLON) iterates on;
 * here it is solved by Newton's method from Bowring's starting value (Bowring 1976, Survey Review
 * 23:181), which converges quadratically everywhere outside the ellipsoid's evolute (a region
 * within 43 km of the centre), and the height is h = p cos(lat) + z sin(lat) - a sqrt(1 - e^2
 * sin^2 lat), exact for any latitude, poles included (where the textbook p / cos(lat) - C fails).
 * Accuracy: a round trip reproduces the position to 1e-9 km at any latitude and at heights from
 * -100 km to 1e6 km (test/core/geodetic.test.ts); Vallado 4th ed. Example 3-3 to its printed digits.
 */

/** Positions closer to the centre than this (km) have no unique geodetic coordinates (the ellipsoid's evolute reaches 43 km). */
const MIN_RADIUS = 100;

/** Kernel: ITRF position, km, of geodetic latitude and longitude (rad) and height (km). */
export function geodeticToItrfKernel(latRad: number, lonRad: number, height: number): [number, number, number] {
  const sinLat = Math.sin(latRad);
  const cosLat = Math.cos(latRad);
  const c = WGS84_A / Math.sqrt(1 - WGS84_E2 * sinLat * sinLat);
  const s = c * (1 - WGS84_E2);
  return [(c + height) * cosLat * Math.cos(lonRad), (c + height) * cosLat * Math.sin(lonRad), (s + height) * sinLat];
}

/** Kernel: geodetic [latitude rad, longitude rad, height km] of an ITRF position at least MIN_RADIUS from the centre. */
export function itrfToGeodeticKernel(x: number, y: number, z: number): [number, number, number] {
  const p = Math.hypot(x, y);
  const e2 = WGS84_E2;
  // Bowring's start: parametric latitude of the point's direction, then one closed-form step.
  const ep2 = e2 / (1 - e2);
  const beta = Math.atan2(WGS84_A * z, WGS84_B * p);
  const sb = Math.sin(beta), cb = Math.cos(beta);
  let lat = Math.atan2(z + ep2 * WGS84_B * sb * sb * sb, p - e2 * WGS84_A * cb * cb * cb);
  for (let k = 0; k < 8; k++) {
    const s = Math.sin(lat), c = Math.cos(lat);
    const w2 = 1 - e2 * s * s;
    const w = Math.sqrt(w2);
    const f = p * s - z * c - (WGS84_A * e2 * s * c) / w;
    const df = p * c + z * s - (WGS84_A * e2 * (c * c - s * s + e2 * s * s * s * s)) / (w2 * w);
    const step = f / df;
    lat -= step;
    if (!(Math.abs(step) > 1e-16)) break;
  }
  const s = Math.sin(lat);
  const height = p * Math.cos(lat) + z * s - WGS84_A * Math.sqrt(1 - e2 * s * s);
  return [lat, p === 0 ? 0 : Math.atan2(y, x), height];
}

/** Earth-fixed ITRF position [x, y, z] km of a geodetic latitude (deg), longitude (deg) and height (km) on WGS 84. */
export function geodeticToEarthFixed(latitude: number, longitude: number, height: number): Result<number[]> {
  const bad = firstError(
    within("latitude", latitude, -90, 90, "a geodetic latitude from -90 (south) to 90 (north) deg"),
    finite("longitude", longitude, "deg (east positive)"),
    Number.isFinite(height) && height > -WGS84_B + MIN_RADIUS ? undefined : badArgument("height", height, "a finite height in km above the WGS 84 ellipsoid, greater than -6256 (no deeper than 100 km from the centre)"),
  );
  if (bad) return bad;
  return geodeticToItrfKernel(toRadians(latitude), toRadians(longitude), height);
}

/**
 * Geodetic [latitude deg, longitude deg in (-180, 180], height km] on WGS 84 of an Earth-fixed
 * position: three numbers x, y, z (km), or a six-number state whose velocity is ignored.
 */
export function earthFixedToGeodetic(position: readonly number[]): Result<number[]> {
  const shape = "three numbers x, y, z (km, Earth-fixed), or a six-number state";
  if (!Array.isArray(position) || (position.length !== 3 && position.length !== 6)) return badArgument("position", position, shape);
  for (const c of position) if (typeof c !== "number" || !Number.isFinite(c)) return badArgument("position", c, shape);
  const [x, y, z] = position;
  const radius = Math.hypot(x, y, z);
  if (radius < MIN_RADIUS)
    return badArgument("position", radius, `a position at least ${MIN_RADIUS} km from the Earth's centre (nearer the centre geodetic coordinates are not unique)`);
  const [lat, lon, h] = itrfToGeodeticKernel(x, y, z);
  return [toDegrees(lat), toDegrees(lon) + 0, h];
}
