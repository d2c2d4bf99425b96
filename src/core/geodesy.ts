import { toDegrees, toRadians, wrapDegrees180, wrapDegrees360 } from "./angles";
import { badArgument, finite, firstError, noAnswer, positive, within, type DomainError, type Result } from "./domain";

/**
 * Navigation on a sphere of radius R (the body's mean sphere): great circles and rhumb lines,
 * and the slant range to the horizon. Latitudes in deg, north positive, in [-90, 90];
 * longitudes in deg, east positive, any finite value (reduced internally); courses in deg from
 * north, east positive, in [0, 360); distances in km. Sphere formulas: on Earth the ellipsoid
 * makes true distances differ by up to about 0.5 %, so these are planning values.
 */

function checkPoints(lat1: number, lon1: number, lat2: number, lon2: number): DomainError | undefined {
  const lat = (name: string, v: number) => within(name, v, -90, 90, "a latitude from -90 (south) to 90 (north) deg");
  return firstError(lat("lat1", lat1), finite("lon1", lon1, "deg (east positive)"), lat("lat2", lat2), finite("lon2", lon2, "deg (east positive)"));
}

/** Same point: equal latitudes and longitudes (any longitude at a pole). */
const coincident = (lat1: number, lat2: number, dLon: number): boolean => lat1 === lat2 && (dLon === 0 || Math.abs(lat1) === 90);

/** Longitude difference lon2 - lon1 reduced to [-180, 180) deg: the shorter way round. */
const longitudeDifference = (lon1: number, lon2: number): number => wrapDegrees180(lon2 - lon1);

/**
 * Kernel: central angle (rad) between two points, by the Vincenty special case for the sphere
 *   sigma = atan2( sqrt((cos p2 sin dl)^2 + (cos p1 sin p2 - sin p1 cos p2 cos dl)^2),
 *                  sin p1 sin p2 + cos p1 cos p2 cos dl )
 * which, unlike the arc-cosine (short distances) and haversine (near antipodes) forms, keeps
 * full float64 accuracy everywhere.
 */
export function centralAngle(lat1Rad: number, lat2Rad: number, dLonRad: number): number {
  const s1 = Math.sin(lat1Rad);
  const c1 = Math.cos(lat1Rad);
  const s2 = Math.sin(lat2Rad);
  const c2 = Math.cos(lat2Rad);
  const sd = Math.sin(dLonRad);
  const cd = Math.cos(dLonRad);
  const y = Math.hypot(c2 * sd, c1 * s2 - s1 * c2 * cd);
  return Math.atan2(y, s1 * s2 + c1 * c2 * cd);
}

/** Great-circle (shortest) distance between two points on a sphere of `radius` km. Accuracy: a few ulp of the central angle. */
export function greatCircleDistance(radius: number, lat1: number, lon1: number, lat2: number, lon2: number): Result<number> {
  const bad = firstError(positive("body_radius", radius, "km (the sphere's radius)"), checkPoints(lat1, lon1, lat2, lon2));
  if (bad) return bad;
  return radius * centralAngle(toRadians(lat1), toRadians(lat2), toRadians(longitudeDifference(lon1, lon2)));
}

/**
 * Initial course (deg in [0, 360), from north, east positive) of the great circle from point 1
 * to point 2: atan2(sin dl cos p2, cos p1 sin p2 - sin p1 cos p2 cos dl) (the standard
 * spherical-trigonometry result; e.g. Williams, Aviation Formulary, "Course between points").
 * From the north pole every direction is south, so the course is 180; from the south pole it is
 * 0. Coincident points, and antipodal points (joined by every great circle), have no course:
 * #N/A.
 */
export function greatCircleCourse(lat1: number, lon1: number, lat2: number, lon2: number): Result<number> {
  const bad = checkPoints(lat1, lon1, lat2, lon2);
  if (bad) return bad;
  const dLon = longitudeDifference(lon1, lon2);
  if (coincident(lat1, lat2, dLon)) return noAnswer("lat2", "the two points coincide, so there is no course between them");
  if (lat1 === 90) return 180;
  if (lat1 === -90) return 0;
  if (lat1 === -lat2 && Math.abs(dLon) === 180)
    return noAnswer("lat2", "the two points are antipodal: every great circle through point 1 reaches point 2, so no single course is defined");
  const p1 = toRadians(lat1);
  const p2 = toRadians(lat2);
  const dl = toRadians(dLon);
  const y = Math.sin(dl) * Math.cos(p2);
  const x = Math.cos(p1) * Math.sin(p2) - Math.sin(p1) * Math.cos(p2) * Math.cos(dl);
  return wrapDegrees360(toDegrees(Math.atan2(y, x))) + 0;
}

/**
 * Isometric latitude psi = asinh(tan lat) (the Mercator ordinate over R), infinite at the poles.
 * In float64 tan(pi/2) is a finite 1.6e16, so the poles are taken from the latitude in degrees:
 * the rhumb line into a pole is the limit of ever longer spirals, and that limit is the meridian
 * (course 0 or 180, length R |dlat|), not the finite-psi spiral that gave courses off by degrees.
 */
const isometricLatitude = (latDeg: number): number => (Math.abs(latDeg) === 90 ? Math.sign(latDeg) * Infinity : Math.asinh(Math.tan(toRadians(latDeg))));

/** Below this latitude difference (rad; 0.2 arcsec) the rhumb's mean cos(lat) is taken at the mid latitude, error O(dlat^2). */
const SMALL_DLAT = 1e-6;

/**
 * Kernel: [dlat, q * dlon] in rad for the rhumb line (loxodrome) from point 1 to point 2, with
 * q = dlat / dpsi the mean of cos(lat) along it (Mercator sailing); along a parallel, or nearly,
 * the limit q = cos(mid latitude). dlon is the shorter way round the antimeridian.
 */
function rhumbLegs(lat1: number, lon1: number, lat2: number, lon2: number): [number, number, number] {
  const p1 = toRadians(lat1);
  const p2 = toRadians(lat2);
  const dLat = p2 - p1;
  const dLon = toRadians(longitudeDifference(lon1, lon2));
  const dPsi = isometricLatitude(lat2) - isometricLatitude(lat1);
  // Both at one pole: the same point (cos 90 deg is 6e-17 in float64, not 0).
  const q = Math.abs(lat1) === 90 && lat1 === lat2 ? 0 : Math.abs(dLat) < SMALL_DLAT ? Math.cos((p1 + p2) / 2) : dLat / dPsi;
  return [dLat, q * dLon, dPsi];
}

/**
 * Rhumb-line (constant course) distance between two points on a sphere of `radius` km:
 * R sqrt(dlat^2 + q^2 dlon^2) (Williams, Aviation Formulary, "Rhumb Line Navigation"). Crossing
 * the antimeridian it goes the shorter way; an exact 180 deg difference goes west. A rhumb line
 * near a pole spirals round it; its length stays finite, R |dlat| / |cos course|; one that starts
 * or ends at a pole is the limit of those spirals, the meridian, R |dlat|.
 */
export function rhumbLineDistance(radius: number, lat1: number, lon1: number, lat2: number, lon2: number): Result<number> {
  const bad = firstError(positive("body_radius", radius, "km (the sphere's radius)"), checkPoints(lat1, lon1, lat2, lon2));
  if (bad) return bad;
  const [dLat, east] = rhumbLegs(lat1, lon1, lat2, lon2);
  return radius * Math.hypot(dLat, east);
}

/**
 * Constant course (deg in [0, 360), from north, east positive) of the rhumb line from point 1 to
 * point 2: atan2(dlon, dpsi) on the Mercator chart (Williams, Aviation Formulary). Along a
 * parallel it is 90 or 270; to or from a pole it is the meridian's, 0 northward and 180
 * southward (the limit of the spirals). Coincident points have no course: #N/A.
 */
export function rhumbLineCourse(lat1: number, lon1: number, lat2: number, lon2: number): Result<number> {
  const bad = checkPoints(lat1, lon1, lat2, lon2);
  if (bad) return bad;
  const dLon = longitudeDifference(lon1, lon2);
  if (coincident(lat1, lat2, dLon)) return noAnswer("lat2", "the two points coincide, so there is no course between them");
  const [, , dPsi] = rhumbLegs(lat1, lon1, lat2, lon2);
  return wrapDegrees360(toDegrees(Math.atan2(toRadians(dLon), dPsi))) + 0;
}

/**
 * Slant range (km) from a site on the surface of a sphere of radius R to a point at `altitude`
 * km when that point is at elevation `minElevation` (deg, 0 = the geometric horizon, 90 =
 * overhead) seen from the site: the law of cosines in the triangle centre-site-point gives
 *   rho = sqrt((R + h)^2 - R^2 cos^2 e) - R sin e
 * evaluated as h (2R + h) / (sqrt(h (2R + h) + R^2 sin^2 e) + R sin e), which is the same number
 * without the cancellation of the first form. No refraction; spherical body. Accurate to a few ulp.
 */
export function horizonRange(bodyRadius: number, altitude: number, minElevation: number): Result<number> {
  const bad = firstError(
    positive("body_radius", bodyRadius, "km"),
    Number.isFinite(altitude) && altitude >= 0 ? undefined : badArgument("altitude", altitude, "an altitude of 0 km or more above the surface"),
    within("min_elevation", minElevation, 0, 90, "an elevation from 0 (horizon) to 90 (overhead) deg"),
  );
  if (bad) return bad;
  return slantRangeKernel(bodyRadius, altitude, minElevation);
}

/** Kernel of horizonRange (no validation): the cancellation-free slant range, km, for elevation in deg. */
export function slantRangeKernel(bodyRadius: number, altitude: number, elevation: number): number {
  const rSinE = bodyRadius * Math.sin(toRadians(elevation));
  const k = altitude * (2 * bodyRadius + altitude);
  const denominator = Math.sqrt(k + rSinE * rSinE) + rSinE;
  return denominator === 0 ? 0 : k / denominator;
}
