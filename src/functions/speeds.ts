import * as twobody from "../core/twobody";
import { withAll } from "../core/domain";
import { gmOf, radiusOf } from "./bodyargs";
import { lift, row, scalar } from "./lift";
import { body, num, optNum } from "./params";

// Family "Sizes and speeds" (DESIGN.md §4). Each function below is a JSDoc block (the single
// source of its name, parameters and help) and one call through the shared adaptor.

const f = {
  orbitalSpeed: lift(scalar, [body(), num("radius", "km"), optNum("sma", "km")], (b, r, a) => twobody.orbitalSpeed(gmOf(b), r, a)),
  escapeSpeed: lift(scalar, [body(), num("radius", "km")], (b, r) => twobody.escapeSpeed(gmOf(b), r)),
  periodFromSma: lift(scalar, [body(), num("sma", "km")], (b, a) => twobody.periodFromSma(gmOf(b), a)),
  smaFromPeriod: lift(scalar, [body(), num("period", "s")], (b, t) => twobody.smaFromPeriod(gmOf(b), t)),
  gmFromOrbit: lift(scalar, [num("sma", "km"), num("period", "s")], twobody.gmFromOrbit),
  specificEnergy: lift(scalar, [body(), num("sma", "km")], (b, a) => twobody.specificEnergy(gmOf(b), a)),
  altitudeToRadius: lift(scalar, [body(), num("altitude", "km"), optNum("body_radius", "km")], (b, h, R) => withAll([radiusOf(b, R)], (radius) => twobody.altitudeToRadius(radius, h))),
  radiusToAltitude: lift(scalar, [body(), num("radius", "km"), optNum("body_radius", "km")], (b, r, R) => withAll([radiusOf(b, R)], (radius) => twobody.radiusToAltitude(radius, r))),
  shapeFromApses: lift(row("sma (km)", "ecc"), [num("periapsis_radius", "km"), num("apoapsis_radius", "km")], twobody.shapeFromApses),
  apsesFromShape: lift(row("periapsis radius (km)", "apoapsis radius (km)"), [num("sma", "km"), num("ecc")], twobody.apsesFromShape),
  radiusAtAnomaly: lift(scalar, [num("sma", "km"), num("ecc"), num("true_anomaly", "deg")], twobody.radiusAtAnomaly),
  flightPathAngle: lift(scalar, [num("ecc"), num("true_anomaly", "deg")], twobody.flightPathAngle),
  maxFlightPathAngle: lift(row("max flight-path angle (deg)", "true anomaly (deg)"), [num("ecc")], twobody.maxFlightPathAngle),
};

/**
 * Speed on an orbit at a given distance from the body's centre, from vis-viva: v² = GM (2/r − 1/a). Circular speed when sma is omitted.
 * @customfunction ORBITAL_SPEED
 * @helpurl https://localhost:3000/reference.html#orbital_speed
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s².
 * @param radius Distance from the body's centre, km.
 * @param [sma] Semi-major axis, km (negative for a hyperbola). Omit for a circular orbit.
 * @returns Speed, km/s.
 */
export function orbitalSpeed(body: any[][], radius: any[][], sma?: any[][]): any[][] {
  return f.orbitalSpeed(body, radius, sma);
}

/**
 * Escape speed at a distance from the body's centre: sqrt(2 GM / r).
 * @customfunction ESCAPE_SPEED
 * @helpurl https://localhost:3000/reference.html#escape_speed
 * @param body Catalogue body name or GM in km³/s².
 * @param radius Distance from the body's centre, km.
 * @returns Escape speed, km/s.
 */
export function escapeSpeed(body: any[][], radius: any[][]): any[][] {
  return f.escapeSpeed(body, radius);
}

/**
 * Orbital period of an ellipse from its semi-major axis (Kepler's third law).
 * @customfunction PERIOD_FROM_SMA
 * @helpurl https://localhost:3000/reference.html#period_from_sma
 * @param body Catalogue body name or GM in km³/s².
 * @param sma Semi-major axis, km (positive).
 * @returns Period, s.
 */
export function periodFromSma(body: any[][], sma: any[][]): any[][] {
  return f.periodFromSma(body, sma);
}

/**
 * Semi-major axis of the orbit with a given period (Kepler's third law).
 * @customfunction SMA_FROM_PERIOD
 * @helpurl https://localhost:3000/reference.html#sma_from_period
 * @param body Catalogue body name or GM in km³/s².
 * @param period Orbital period, s.
 * @returns Semi-major axis, km.
 */
export function smaFromPeriod(body: any[][], period: any[][]): any[][] {
  return f.smaFromPeriod(body, period);
}

/**
 * GM of the central body from one orbit's semi-major axis and period: 4π² a³ / T².
 * @customfunction GM_FROM_ORBIT
 * @helpurl https://localhost:3000/reference.html#gm_from_orbit
 * @param sma Semi-major axis, km.
 * @param period Orbital period, s.
 * @returns GM, km³/s².
 */
export function gmFromOrbit(sma: any[][], period: any[][]): any[][] {
  return f.gmFromOrbit(sma, period);
}

/**
 * Specific orbital energy −GM / (2a); negative for bound orbits, positive for hyperbolas.
 * @customfunction SPECIFIC_ENERGY
 * @helpurl https://localhost:3000/reference.html#specific_energy
 * @param body Catalogue body name or GM in km³/s².
 * @param sma Semi-major axis, km (negative for a hyperbola).
 * @returns Energy per unit mass, km²/s².
 */
export function specificEnergy(body: any[][], sma: any[][]): any[][] {
  return f.specificEnergy(body, sma);
}

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
  return f.altitudeToRadius(body, altitude, body_radius);
}

/**
 * Altitude above the body's equatorial radius for a distance from its centre.
 * @customfunction RADIUS_TO_ALTITUDE
 * @helpurl https://localhost:3000/reference.html#radius_to_altitude
 * @param body Catalogue body name or GM in km³/s².
 * @param radius Distance from the body's centre, km.
 * @param [body_radius] Reference radius, km; overrides the catalogue, required when body is a GM number.
 * @returns Altitude, km.
 */
export function radiusToAltitude(body: any[][], radius: any[][], body_radius?: any[][]): any[][] {
  return f.radiusToAltitude(body, radius, body_radius);
}

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
  return f.shapeFromApses(periapsis_radius, apoapsis_radius, include_header);
}

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
  return f.apsesFromShape(sma, ecc, include_header);
}

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
  return f.radiusAtAnomaly(sma, ecc, true_anomaly);
}

/**
 * Flight-path angle (velocity above the local horizontal) at a true anomaly; positive while climbing. Any conic.
 * @customfunction FLIGHT_PATH_ANGLE
 * @helpurl https://localhost:3000/reference.html#flight_path_angle
 * @param ecc Eccentricity, 0 or more.
 * @param true_anomaly True anomaly, deg.
 * @returns Flight-path angle, deg.
 */
export function flightPathAngle(ecc: any[][], true_anomaly: any[][]): any[][] {
  return f.flightPathAngle(ecc, true_anomaly);
}

/**
 * Largest flight-path angle on an ellipse, asin(e), and the true anomaly where it occurs (cos ν = −e, climbing side).
 * @customfunction MAX_FLIGHT_PATH_ANGLE
 * @helpurl https://localhost:3000/reference.html#max_flight_path_angle
 * @param ecc Eccentricity, 0 ≤ ecc < 1.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: angle (deg), true anomaly (deg).
 */
export function maxFlightPathAngle(ecc: any[][], include_header?: any[][]): any[][] {
  return f.maxFlightPathAngle(ecc, include_header);
}
