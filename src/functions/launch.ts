import * as geodesy from "../core/geodesy";
import { launchAzimuth as coreLaunchAzimuth } from "../core/launch";
import { equatorialRotationSpeed, surfaceRotationSpeed as coreSurfaceRotationSpeed } from "../core/surface";
import { withAll, type Result } from "../core/domain";
import { findBody } from "../catalogue/lookup";
import { meanRadiusOf, radiusOf, rotationPeriodOf } from "./bodyargs";
import { family } from "./define";
import { body, flag, num, optBody, optNum, type BodyArg } from "./params";

// Family "Launch and surface": launch azimuth, surface rotation, navigation on a body's sphere and
// the horizon. Examples: an invented launch site at 34.7° N and ground station at 64.9° N.
// Latitudes are north positive, longitudes east positive, courses and azimuths from north, east
// positive. A numeric body (a bare GM) takes the radius and rotation overrides it needs.

/** Eastward surface speed at the equator, km/s, from the equatorial radius and sidereal rotation period (overrides win). */
function equatorSpeed(b: BodyArg, bodyRadius: number | null, rotationPeriod: number | null): Result<number> {
  return withAll([radiusOf(b, bodyRadius), rotationPeriodOf(b, rotationPeriod)], equatorialRotationSpeed);
}

/** LAUNCH_AZIMUTH's body: Earth when omitted (the body only matters once an orbital speed is given). */
const launchBody = (b: BodyArg | null): Result<BodyArg> => b ?? findBody("Earth");

/** A sphere-navigation distance on the body's mean sphere (or the body_radius given). */
const onMeanSphere =
  (distance: (radius: number, lat1: number, lon1: number, lat2: number, lon2: number) => Result<number>) =>
  (b: BodyArg, lat1: number, lon1: number, lat2: number, lon2: number, R: number | null): Result<number> =>
    withAll([meanRadiusOf(b, R)], (radius) => distance(radius, lat1, lon1, lat2, lon2));

const pointParams = [num("lat1", "deg"), num("lon1", "deg"), num("lat2", "deg"), num("lon2", "deg")] as const;

const define = family("Launch and surface");

const LAUNCH_AZIMUTH = define.scalar(
  "LAUNCH_AZIMUTH",
  [num("latitude", "deg"), num("inc", "deg"), optBody("body"), optNum("orbital_speed", "km/s"), flag("descending"), optNum("body_radius", "km"), optNum("rotation_period", "s")],
  (lat, i, b, v, down, R, T) => {
    if (v === null) return coreLaunchAzimuth(lat, i, null, null, down);
    const vEq = withAll([launchBody(b)], (site) => equatorSpeed(site, R, T));
    return withAll([vEq], (speed) => coreLaunchAzimuth(lat, i, speed, v, down));
  },
  { example: [34.7, 97.4, "Earth", 7.613, true], terms: ["launch direction", "heading", "inclination from site", "azimuth"] },
);
/**
 * Launch azimuth that puts a vehicle from a site at latitude directly into an orbit of inclination inc, deg from north, east positive, in [0, 360): the ascending (northbound) pass unless descending is TRUE. Latitude north positive. With orbital_speed, corrected for the surface's rotation (of body; Earth when body is omitted). #N/A with the reason when the orbit never reaches that latitude (|latitude| > inc prograde, > 180 − inc retrograde). Spherical body: a planning value, since a real ascent turns while it climbs.
 * @customfunction LAUNCH_AZIMUTH
 * @helpurl https://localhost:3000/reference.html#launch_azimuth
 * @param latitude Launch site latitude, deg, north positive (−90 to 90).
 * @param inc Target orbit inclination, deg (0 to 180; over 90 is retrograde).
 * @param [body] Body the site is on: catalogue name, or GM in km³/s² (then body_radius and rotation_period are required). Used only with orbital_speed; omitted: Earth.
 * @param [orbital_speed] Inertial speed at orbit insertion, km/s (e.g. the circular speed at the target altitude); omitted: the inertial azimuth, no rotation correction.
 * @param [descending] TRUE for the southbound (descending) pass; omitted: the northbound pass.
 * @param [body_radius] Equatorial radius, km, for the surface speed; overrides the catalogue, required when body is a GM number.
 * @param [rotation_period] Sidereal rotation period, s (negative for retrograde spin); overrides the catalogue, required when body is a GM number.
 * @returns Azimuth, deg from north (east positive).
 */
export function launchAzimuth(
  latitude: any[][],
  inc: any[][],
  body?: any[][],
  orbital_speed?: any[][],
  descending?: any[][],
  body_radius?: any[][],
  rotation_period?: any[][],
): any[][] {
  return LAUNCH_AZIMUTH(arguments);
}

const SURFACE_ROTATION_SPEED = define.scalar(
  "SURFACE_ROTATION_SPEED",
  [body(), num("latitude", "deg"), optNum("body_radius", "km"), optNum("rotation_period", "s")],
  (b, lat, R, T) => withAll([radiusOf(b, R), rotationPeriodOf(b, T)], (radius, period) => coreSurfaceRotationSpeed(radius, period, lat)),
  { example: ["Earth", 34.7], terms: ["Earth rotation boost", "launch site velocity", "eastward speed"] },
);
/**
 * Eastward speed of a point on the body's surface due to its rotation, km/s: 2π R cos(latitude) / T, with R the equatorial radius (a sphere: on Earth the real, oblate surface is 0.17 % faster at 45° and at most 0.34 %) and T the sidereal rotation period. Negative (westward) for a retrograde rotator. Latitude north positive.
 * @customfunction SURFACE_ROTATION_SPEED
 * @helpurl https://localhost:3000/reference.html#surface_rotation_speed
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s² (then body_radius and rotation_period are required).
 * @param latitude Latitude, deg, north positive (−90 to 90).
 * @param [body_radius] Equatorial radius, km; overrides the catalogue, required when body is a GM number.
 * @param [rotation_period] Sidereal rotation period, s (negative for retrograde spin); overrides the catalogue, required when body is a GM number.
 * @returns Surface speed, km/s (eastward).
 */
export function surfaceRotationSpeed(body: any[][], latitude: any[][], body_radius?: any[][], rotation_period?: any[][]): any[][] {
  return SURFACE_ROTATION_SPEED(arguments);
}

const GREAT_CIRCLE_DISTANCE = define.scalar("GREAT_CIRCLE_DISTANCE", [body(), ...pointParams, optNum("body_radius", "km")], onMeanSphere(geodesy.greatCircleDistance), {
  example: ["Earth", 34.7, -120.6, 64.9, -147.9],
  terms: ["ground distance", "haversine", "orthodrome", "surface distance"],
});
/**
 * Shortest (great-circle) distance between two points on the body's mean sphere (its mean radius), km. Latitudes north positive, longitudes east positive, deg. On Earth the ellipsoid makes true distances differ by up to about 0.5 %: a planning value.
 * @customfunction GREAT_CIRCLE_DISTANCE
 * @helpurl https://localhost:3000/reference.html#great_circle_distance
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s² (then body_radius is required).
 * @param lat1 Latitude of point 1, deg, north positive (−90 to 90).
 * @param lon1 Longitude of point 1, deg, east positive.
 * @param lat2 Latitude of point 2, deg, north positive (−90 to 90).
 * @param lon2 Longitude of point 2, deg, east positive.
 * @param [body_radius] Radius of the sphere, km; overrides the catalogue mean radius, required when body is a GM number.
 * @returns Distance, km.
 */
export function greatCircleDistance(body: any[][], lat1: any[][], lon1: any[][], lat2: any[][], lon2: any[][], body_radius?: any[][]): any[][] {
  return GREAT_CIRCLE_DISTANCE(arguments);
}

const GREAT_CIRCLE_COURSE = define.scalar("GREAT_CIRCLE_COURSE", pointParams, geodesy.greatCircleCourse, {
  example: [34.7, -120.6, 64.9, -147.9],
  terms: ["initial bearing", "heading", "azimuth between points"],
});
/**
 * Initial course of the great circle from point 1 to point 2, deg from north, east positive, in [0, 360). Latitudes north positive, longitudes east positive, deg. From the north pole the course is 180, from the south pole 0; coincident or antipodal points have none (#N/A). On a sphere.
 * @customfunction GREAT_CIRCLE_COURSE
 * @helpurl https://localhost:3000/reference.html#great_circle_course
 * @param lat1 Latitude of point 1, deg, north positive (−90 to 90).
 * @param lon1 Longitude of point 1, deg, east positive.
 * @param lat2 Latitude of point 2, deg, north positive (−90 to 90).
 * @param lon2 Longitude of point 2, deg, east positive.
 * @returns Initial course, deg from north.
 */
export function greatCircleCourse(lat1: any[][], lon1: any[][], lat2: any[][], lon2: any[][]): any[][] {
  return GREAT_CIRCLE_COURSE(arguments);
}

const RHUMB_LINE_DISTANCE = define.scalar("RHUMB_LINE_DISTANCE", [body(), ...pointParams, optNum("body_radius", "km")], onMeanSphere(geodesy.rhumbLineDistance), {
  example: ["Earth", 34.7, -120.6, 64.9, -147.9],
  terms: ["loxodrome", "Mercator", "constant heading distance"],
});
/**
 * Length of the rhumb line (constant course; a straight line on a Mercator chart) between two points on the body's mean sphere (its mean radius), km. Latitudes north positive, longitudes east positive, deg. Crosses the antimeridian the shorter way; an exactly 180° longitude difference goes west. Never shorter than the great circle. A planning value.
 * @customfunction RHUMB_LINE_DISTANCE
 * @helpurl https://localhost:3000/reference.html#rhumb_line_distance
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s² (then body_radius is required).
 * @param lat1 Latitude of point 1, deg, north positive (−90 to 90).
 * @param lon1 Longitude of point 1, deg, east positive.
 * @param lat2 Latitude of point 2, deg, north positive (−90 to 90).
 * @param lon2 Longitude of point 2, deg, east positive.
 * @param [body_radius] Radius of the sphere, km; overrides the catalogue mean radius, required when body is a GM number.
 * @returns Distance, km.
 */
export function rhumbLineDistance(body: any[][], lat1: any[][], lon1: any[][], lat2: any[][], lon2: any[][], body_radius?: any[][]): any[][] {
  return RHUMB_LINE_DISTANCE(arguments);
}

const RHUMB_LINE_COURSE = define.scalar("RHUMB_LINE_COURSE", pointParams, geodesy.rhumbLineCourse, {
  example: [34.7, -120.6, 64.9, -147.9],
  terms: ["loxodrome", "Mercator bearing", "constant heading"],
});
/**
 * Constant course of the rhumb line from point 1 to point 2, deg from north, east positive, in [0, 360); 90 or 270 along a parallel; to or from a pole the meridian's, 0 northward and 180 southward. Latitudes north positive, longitudes east positive, deg. Coincident points have none (#N/A). On a sphere.
 * @customfunction RHUMB_LINE_COURSE
 * @helpurl https://localhost:3000/reference.html#rhumb_line_course
 * @param lat1 Latitude of point 1, deg, north positive (−90 to 90).
 * @param lon1 Longitude of point 1, deg, east positive.
 * @param lat2 Latitude of point 2, deg, north positive (−90 to 90).
 * @param lon2 Longitude of point 2, deg, east positive.
 * @returns Course, deg from north.
 */
export function rhumbLineCourse(lat1: any[][], lon1: any[][], lat2: any[][], lon2: any[][]): any[][] {
  return RHUMB_LINE_COURSE(arguments);
}

const HORIZON_RANGE = define.scalar(
  "HORIZON_RANGE",
  [body(), num("altitude", "km"), num("min_elevation", "deg"), optNum("body_radius", "km")],
  (b, h, e, R) => withAll([radiusOf(b, R)], (radius) => geodesy.horizonRange(radius, h, e)),
  { example: ["Earth", 690, 10], terms: ["slant range", "line of sight", "visibility distance", "ground station"] },
);
/**
 * Slant range from a site on the body's surface to a point at altitude seen at elevation min_elevation, km; with 0 the distance to the geometric horizon. A sphere of the body's equatorial radius (the radius altitudes are measured from), site at zero altitude, no refraction.
 * @customfunction HORIZON_RANGE
 * @helpurl https://localhost:3000/reference.html#horizon_range
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s² (then body_radius is required).
 * @param altitude Altitude of the point (e.g. a satellite) above the equatorial radius, km (0 or more).
 * @param min_elevation Elevation of the point above the site's horizon, deg (0 = horizon, 90 = overhead).
 * @param [body_radius] Radius of the sphere, km; overrides the catalogue's equatorial radius, required when body is a GM number.
 * @returns Slant range, km.
 */
export function horizonRange(body: any[][], altitude: any[][], min_elevation: any[][], body_radius?: any[][]): any[][] {
  return HORIZON_RANGE(arguments);
}
