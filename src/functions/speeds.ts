import * as twobody from "../core/twobody";
import { isDomainError, withAll, type Result } from "../core/domain";
import { gmOf, radiusOf, surfaceOf } from "./bodyargs";
import { family } from "./define";
import { body, gm, num, optNum, radius, sma, type BodyArg } from "./params";
import { orbitInside, periodInside } from "./surface";

/** Kepler's third law's sma, refused when its orbit lies inside a catalogue body (the period was probably not in seconds). */
function smaOfPeriod(b: BodyArg, period: number): Result<number> {
  const a = twobody.smaFromPeriod(gmOf(b), period);
  const s = surfaceOf(b);
  return !isDomainError(a) && s && a < s.radius ? periodInside("period", period, a, s) : a;
}

/** Specific energy, refused for a positive sma whose every orbit (apoapsis at most 2a) stays inside a catalogue body. */
function energyOf(b: BodyArg, a: number): Result<number> {
  const s = surfaceOf(b);
  return s && a > 0 && 2 * a < s.radius ? orbitInside("sma", a, 2 * a, s, "even at its most eccentric reaches at most") : twobody.specificEnergy(gmOf(b), a);
}

// Family "Sizes and speeds": two-body sizes, speeds and periods of a conic about one body (GM of
// the body alone). Each function is one unit: its declaration (parameter readers, core call,
// worked example, search terms), its JSDoc block and its one-line wrapper (DEVELOPERS.md).
// Examples: the invented Skerry-1 orbits, 520 km (radius 6898.137 km) and 690 km (7068.137 km).

const define = family("Sizes and speeds");

const ORBITAL_SPEED = define.scalar("ORBITAL_SPEED", [gm(), radius("radius"), optNum("sma", "km")], twobody.orbitalSpeed, {
  example: ["Earth", 6898.137],
  terms: ["velocity", "vis-viva", "circular speed", "orbit speed"],
});
/**
 * Speed on an orbit at a given distance from the body's centre, from vis-viva: v² = GM (2/r − 1/a). Circular speed when sma is omitted. Refuses (#VALUE!) a radius inside the body (an altitude typed as a radius).
 * @customfunction ORBITAL_SPEED
 * @helpurl https://localhost:3000/reference.html#orbital_speed
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s². A GM number has no surface to check distances against.
 * @param radius Distance from the body's centre, km.
 * @param [sma] Semi-major axis, km (negative for a hyperbola). Omit for a circular orbit.
 * @returns Speed, km/s.
 */
export function orbitalSpeed(body: any[][], radius: any[][], sma?: any[][]): any[][] {
  return ORBITAL_SPEED(arguments);
}

const ESCAPE_SPEED = define.scalar("ESCAPE_SPEED", [gm(), radius("radius")], twobody.escapeSpeed, {
  example: ["Earth", 6898.137],
  terms: ["escape velocity", "parabolic speed"],
});
/**
 * Escape speed at a distance from the body's centre: sqrt(2 GM / r). Refuses (#VALUE!) a radius inside the body (an altitude typed as a radius); the surface itself is allowed.
 * @customfunction ESCAPE_SPEED
 * @helpurl https://localhost:3000/reference.html#escape_speed
 * @param body Catalogue body name or GM in km³/s². A GM number has no surface to check distances against.
 * @param radius Distance from the body's centre, km.
 * @returns Escape speed, km/s.
 */
export function escapeSpeed(body: any[][], radius: any[][]): any[][] {
  return ESCAPE_SPEED(arguments);
}

const PERIOD_FROM_SMA = define.scalar("PERIOD_FROM_SMA", [gm(), sma()], twobody.periodFromSma, {
  example: ["Earth", 7068.137],
  terms: ["orbital period", "Kepler's third law", "revolution time"],
});
/**
 * Orbital period of an ellipse from its semi-major axis (Kepler's third law). Refuses (#VALUE!) an sma inside the body (an altitude typed as sma).
 * @customfunction PERIOD_FROM_SMA
 * @helpurl https://localhost:3000/reference.html#period_from_sma
 * @param body Catalogue body name or GM in km³/s². A GM number has no surface to check distances against.
 * @param sma Semi-major axis, km (positive).
 * @returns Period, s.
 */
export function periodFromSma(body: any[][], sma: any[][]): any[][] {
  return PERIOD_FROM_SMA(arguments);
}

const SMA_FROM_PERIOD = define.scalar("SMA_FROM_PERIOD", [body(), num("period", "s")], smaOfPeriod, {
  example: ["Earth", 5940],
  terms: ["semi-major axis", "Kepler's third law", "orbit size"],
});
/**
 * Semi-major axis of the orbit with a given period (Kepler's third law). Refuses (#VALUE!) a period whose orbit would lie inside a catalogue body (usually minutes or hours typed as seconds).
 * @customfunction SMA_FROM_PERIOD
 * @helpurl https://localhost:3000/reference.html#sma_from_period
 * @param body Catalogue body name or GM in km³/s². A GM number has no surface to check distances against.
 * @param period Orbital period, s.
 * @returns Semi-major axis, km.
 */
export function smaFromPeriod(body: any[][], period: any[][]): any[][] {
  return SMA_FROM_PERIOD(arguments);
}

const GM_FROM_ORBIT = define.scalar("GM_FROM_ORBIT", [num("sma", "km"), num("period", "s")], twobody.gmFromOrbit, {
  example: [7068.137, 5917.5],
  terms: ["gravitational parameter", "mu", "mass of the central body"],
});
/**
 * GM of the central body from one orbit's semi-major axis and period: 4π² a³ / T².
 * @customfunction GM_FROM_ORBIT
 * @helpurl https://localhost:3000/reference.html#gm_from_orbit
 * @param sma Semi-major axis, km.
 * @param period Orbital period, s.
 * @returns GM, km³/s².
 */
export function gmFromOrbit(sma: any[][], period: any[][]): any[][] {
  return GM_FROM_ORBIT(arguments);
}

const SPECIFIC_ENERGY = define.scalar("SPECIFIC_ENERGY", [body(), num("sma", "km")], energyOf, {
  example: ["Earth", 7068.137],
  terms: ["orbital energy", "vis-viva energy", "epsilon"],
});
/**
 * Specific orbital energy −GM / (2a); negative for bound orbits, positive for hyperbolas. Refuses (#VALUE!) an sma so small that even its most eccentric orbit stays inside a catalogue body (an altitude typed as sma).
 * @customfunction SPECIFIC_ENERGY
 * @helpurl https://localhost:3000/reference.html#specific_energy
 * @param body Catalogue body name or GM in km³/s². A GM number has no surface to check distances against.
 * @param sma Semi-major axis, km (negative for a hyperbola).
 * @returns Energy per unit mass, km²/s².
 */
export function specificEnergy(body: any[][], sma: any[][]): any[][] {
  return SPECIFIC_ENERGY(arguments);
}

const ALTITUDE_TO_RADIUS = define.scalar(
  "ALTITUDE_TO_RADIUS",
  [body(), num("altitude", "km"), optNum("body_radius", "km")],
  (b, h, R) => withAll([radiusOf(b, R)], (radius) => twobody.altitudeToRadius(radius, h)),
  { example: ["Earth", 690], terms: ["height", "distance from centre", "convert altitude"] },
);
/**
 * Distance from the body's centre for an altitude above its equatorial radius.
 * @customfunction ALTITUDE_TO_RADIUS
 * @helpurl https://localhost:3000/reference.html#altitude_to_radius
 * @param body Catalogue body name or GM in km³/s².
 * @param altitude Altitude above the equatorial radius, km.
 * @param [body_radius] Reference radius, km; overrides the catalogue, required when body is a GM number.
 * @returns Radius, km.
 */
export function altitudeToRadius(body: any[][], altitude: any[][], body_radius?: any[][]): any[][] {
  return ALTITUDE_TO_RADIUS(arguments);
}

const RADIUS_TO_ALTITUDE = define.scalar(
  "RADIUS_TO_ALTITUDE",
  [body(), radius("radius"), optNum("body_radius", "km")],
  (b, r, R) => withAll([radiusOf(b, R)], (bodyRadius) => twobody.radiusToAltitude(bodyRadius, r)),
  { example: ["Earth", 7068.137], terms: ["height", "height above surface", "convert radius"] },
);
/**
 * Altitude above the body's equatorial radius for a distance from its centre. Refuses (#VALUE!) a radius inside the body, where the altitude would be negative.
 * @customfunction RADIUS_TO_ALTITUDE
 * @helpurl https://localhost:3000/reference.html#radius_to_altitude
 * @param body Catalogue body name or GM in km³/s². With a GM number, distances are checked against the surface only when body_radius is given.
 * @param radius Distance from the body's centre, km.
 * @param [body_radius] Reference radius, km; overrides the catalogue, required when body is a GM number.
 * @returns Altitude, km.
 */
export function radiusToAltitude(body: any[][], radius: any[][], body_radius?: any[][]): any[][] {
  return RADIUS_TO_ALTITUDE(arguments);
}

const SHAPE_FROM_APSES = define.rows("SHAPE_FROM_APSES", ["sma (km)", "ecc"], [num("periapsis_radius", "km"), num("apoapsis_radius", "km")], twobody.shapeFromApses, {
  example: [6628.137, 7068.137, true],
  terms: ["perigee apogee", "eccentricity", "semi-major axis from apsides"],
});
/**
 * Semi-major axis and eccentricity of the ellipse through two apsis radii.
 * @customfunction SHAPE_FROM_APSES
 * @helpurl https://localhost:3000/reference.html#shape_from_apses
 * @param periapsis_radius Periapsis distance from the centre, km.
 * @param apoapsis_radius Apoapsis distance from the centre, km (at least the periapsis).
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: sma (km), ecc.
 */
export function shapeFromApses(periapsis_radius: any[][], apoapsis_radius: any[][], include_header?: any[][]): any[][] {
  return SHAPE_FROM_APSES(arguments);
}

const APSES_FROM_SHAPE = define.rows("APSES_FROM_SHAPE", ["periapsis radius (km)", "apoapsis radius (km)"], [num("sma", "km"), num("ecc")], twobody.apsesFromShape, {
  example: [6848.137, 0.0321],
  terms: ["perigee", "apogee", "apsides"],
});
/**
 * Periapsis and apoapsis radii of a conic: a(1 − e), a(1 + e). A hyperbola has no apoapsis (#N/A in that cell).
 * @customfunction APSES_FROM_SHAPE
 * @helpurl https://localhost:3000/reference.html#apses_from_shape
 * @param sma Semi-major axis, km (negative for a hyperbola).
 * @param ecc Eccentricity (not exactly 1).
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: periapsis radius (km), apoapsis radius (km).
 */
export function apsesFromShape(sma: any[][], ecc: any[][], include_header?: any[][]): any[][] {
  return APSES_FROM_SHAPE(arguments);
}

const RADIUS_AT_ANOMALY = define.scalar("RADIUS_AT_ANOMALY", [num("sma", "km"), num("ecc"), num("true_anomaly", "deg")], twobody.radiusAtAnomaly, {
  example: [6848.137, 0.0321, 90],
  terms: ["orbit equation", "conic equation", "distance at true anomaly"],
});
/**
 * Distance from the focus at a true anomaly: r = a(1 − e²) / (1 + e cos ν).
 * @customfunction RADIUS_AT_ANOMALY
 * @helpurl https://localhost:3000/reference.html#radius_at_anomaly
 * @param sma Semi-major axis, km (negative for a hyperbola).
 * @param ecc Eccentricity (not exactly 1).
 * @param true_anomaly True anomaly, deg (inside the asymptotes for a hyperbola).
 * @returns Radius, km.
 */
export function radiusAtAnomaly(sma: any[][], ecc: any[][], true_anomaly: any[][]): any[][] {
  return RADIUS_AT_ANOMALY(arguments);
}

const FLIGHT_PATH_ANGLE = define.scalar("FLIGHT_PATH_ANGLE", [num("ecc"), num("true_anomaly", "deg")], twobody.flightPathAngle, {
  example: [0.0321, 90],
  terms: ["gamma", "climb angle", "velocity angle"],
});
/**
 * Flight-path angle (velocity above the local horizontal) at a true anomaly; positive while climbing. Any conic.
 * @customfunction FLIGHT_PATH_ANGLE
 * @helpurl https://localhost:3000/reference.html#flight_path_angle
 * @param ecc Eccentricity, 0 or more.
 * @param true_anomaly True anomaly, deg.
 * @returns Flight-path angle, deg.
 */
export function flightPathAngle(ecc: any[][], true_anomaly: any[][]): any[][] {
  return FLIGHT_PATH_ANGLE(arguments);
}

const MAX_FLIGHT_PATH_ANGLE = define.rows("MAX_FLIGHT_PATH_ANGLE", ["max flight-path angle (deg)", "true anomaly (deg)"], [num("ecc")], twobody.maxFlightPathAngle, {
  example: [0.0321],
  terms: ["gamma", "largest climb angle"],
});
/**
 * Largest flight-path angle on an ellipse, asin(e), and the true anomaly where it occurs (cos ν = −e, climbing side).
 * @customfunction MAX_FLIGHT_PATH_ANGLE
 * @helpurl https://localhost:3000/reference.html#max_flight_path_angle
 * @param ecc Eccentricity, 0 ≤ ecc < 1.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: angle (deg), true anomaly (deg).
 */
export function maxFlightPathAngle(ecc: any[][], include_header?: any[][]): any[][] {
  return MAX_FLIGHT_PATH_ANGLE(arguments);
}
