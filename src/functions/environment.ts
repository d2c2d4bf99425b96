import * as j2 from "../core/j2";
import { betaAngle as coreBetaAngle } from "../core/betaangle";
import { eclipseDuration as coreEclipseDuration } from "../core/eclipse";
import { badArgument, withAll, type Result } from "../core/domain";
import { gmOf, j2Of, j2RadiusOf, radiusOf, rotationPeriodOf, starPeriodOf } from "./bodyargs";
import { family } from "./define";
import { body, date, num, numOr, optNum, radius, sma, type BodyArg } from "./params";

// Family "J2 and environment": J2 secular drift, sun-synchronous and repeat-track orbits, eclipse
// and beta angle. Examples: the invented Skerry-1 690 km sun-synchronous orbit. A numeric body
// (a bare GM) takes its overrides after the listed parameters, in the order body_radius, j2, then
// what else the function needs; a missing one is #VALUE! naming it.

/** GM, the J2 model's reference radius and J2 (overrides win); the first one missing is the error. */
function j2Model(b: BodyArg, bodyRadius: number | null, j2Value: number | null): Result<readonly [number, number, number]> {
  return withAll([j2RadiusOf(b, bodyRadius), j2Of(b, j2Value)], (radius, zonal) => [gmOf(b), radius, zonal] as const);
}

const orbitParams = [body(), sma(), numOr("ecc", 0), num("inc", "deg"), optNum("body_radius", "km"), optNum("j2")] as const;

const define = family("J2 and environment");

const NODAL_PRECESSION = define.scalar(
  "NODAL_PRECESSION",
  orbitParams,
  (b, a, e, i, R, J) => withAll([j2Model(b, R, J)], ([gm, r, z]) => j2.nodalPrecession(gm, r, z, a, e, i)),
  { example: ["Earth", 7068.137, 0.001, 98.15], terms: ["RAAN drift", "node regression", "J2", "oblateness", "precession"] },
);
/**
 * Drift of the orbit's ascending node caused by the body's oblateness (J2 secular rate −3/2 n J2 (R/p)² cos i), deg/day (day = 86400 s); negative (westward) for prograde orbits. A preliminary first-order estimate: J2 secular rates only, mean elements; no drag, no third bodies, no higher harmonics. Refuses (#VALUE!) an orbit whose periapsis a(1 − e) is inside the body (an altitude typed as sma); with a GM number, only when body_radius is given.
 * @customfunction NODAL_PRECESSION
 * @helpurl https://localhost:3000/reference.html#nodal_precession
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s² (then body_radius and j2 are required). With a GM number, distances are checked against the surface only when body_radius is given.
 * @param sma Semi-major axis, km (from the body's centre, not an altitude; a mean element).
 * @param ecc Eccentricity, 0 ≤ ecc < 1; leave the argument empty (body, sma, , inc) for a circular orbit, 0.
 * @param inc Inclination, deg (0 to 180).
 * @param [body_radius] Reference radius of the J2 value, km; overrides the catalogue's (Earth: EGM2008's 6378.1363 km), required when body is a GM number.
 * @param [j2] Zonal harmonic J2 (unnormalised, dimensionless); overrides the catalogue, required when body is a GM number.
 * @returns Rate of the right ascension of the ascending node, deg/day.
 */
export function nodalPrecession(body: any[][], sma: any[][], ecc: any[][], inc: any[][], body_radius?: any[][], j2?: any[][]): any[][] {
  return NODAL_PRECESSION(arguments);
}

const APSIDAL_PRECESSION = define.scalar(
  "APSIDAL_PRECESSION",
  orbitParams,
  (b, a, e, i, R, J) => withAll([j2Model(b, R, J)], ([gm, r, z]) => j2.apsidalPrecession(gm, r, z, a, e, i)),
  { example: ["Earth", 7068.137, 0.001, 98.15], terms: ["perigee drift", "argument of perigee rate", "J2", "critical inclination", "frozen orbit"] },
);
/**
 * Drift of the orbit's periapsis within its plane caused by the body's oblateness (J2 secular rate 3/4 n J2 (R/p)² (5 cos² i − 1)), deg/day (day = 86400 s); zero at the critical inclinations 63.43° and 116.57°. A preliminary first-order estimate: J2 secular rates only, mean elements; no drag, no third bodies, no higher harmonics. Refuses (#VALUE!) an orbit whose periapsis a(1 − e) is inside the body (an altitude typed as sma); with a GM number, only when body_radius is given.
 * @customfunction APSIDAL_PRECESSION
 * @helpurl https://localhost:3000/reference.html#apsidal_precession
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s² (then body_radius and j2 are required). With a GM number, distances are checked against the surface only when body_radius is given.
 * @param sma Semi-major axis, km (from the body's centre, not an altitude; a mean element).
 * @param ecc Eccentricity, 0 ≤ ecc < 1; leave the argument empty (body, sma, , inc) for 0, a circular orbit (then the rate the periapsis would have once any eccentricity appears).
 * @param inc Inclination, deg (0 to 180).
 * @param [body_radius] Reference radius of the J2 value, km; overrides the catalogue's (Earth: EGM2008's 6378.1363 km), required when body is a GM number.
 * @param [j2] Zonal harmonic J2 (unnormalised, dimensionless); overrides the catalogue, required when body is a GM number.
 * @returns Rate of the argument of periapsis, deg/day.
 */
export function apsidalPrecession(body: any[][], sma: any[][], ecc: any[][], inc: any[][], body_radius?: any[][], j2?: any[][]): any[][] {
  return APSIDAL_PRECESSION(arguments);
}

const SUN_SYNC_INCLINATION = define.scalar(
  "SUN_SYNC_INCLINATION",
  [body(), sma(), optNum("ecc"), optNum("body_radius", "km"), optNum("j2"), optNum("body_orbital_period", "s")],
  (b, a, e, R, J, year) =>
    typeof b !== "number" && b.kind === "star"
      ? starPeriodOf(b, null)
      : withAll([j2Model(b, R, J), starPeriodOf(b, year)], ([gm, r, z], period) => j2.sunSyncInclination(gm, r, z, a, e ?? 0, period)),
  { example: ["Earth", 7068.137, 0.001], terms: ["sun-synchronous", "SSO", "sun synchronous orbit", "polar orbit", "J2"] },
);
/**
 * Inclination at which J2 turns the orbit's node once per the body's year, so the plane keeps its angle to the Sun, deg (between 90 and 180). The year is the catalogue's sidereal orbital period about the Sun of the body's planet (a moon takes its planet's); Earth's tropical year would differ by 4e-5 relative, about 0.0003° here. #N/A when the orbit is too high for any inclination. A preliminary first-order estimate: J2 secular rate only; no drag, no third bodies. Refuses the Sun (#VALUE!: the plane is kept to the Sun, so the body must orbit it) and an orbit whose periapsis a(1 − e) is inside the body (an altitude typed as sma); with a GM number, only when body_radius is given.
 * @customfunction SUN_SYNC_INCLINATION
 * @helpurl https://localhost:3000/reference.html#sun_sync_inclination
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s² (then body_radius, j2 and body_orbital_period are required). With a GM number, distances are checked against the surface only when body_radius is given.
 * @param sma Semi-major axis, km (from the body's centre, not an altitude; a mean element).
 * @param [ecc] Eccentricity, 0 ≤ ecc < 1; omitted: 0, a circular orbit.
 * @param [body_radius] Reference radius of the J2 value, km; overrides the catalogue's, required when body is a GM number.
 * @param [j2] Zonal harmonic J2 (unnormalised, dimensionless, positive); overrides the catalogue, required when body is a GM number.
 * @param [body_orbital_period] The body's orbital period about the Sun, s (e.g. 31556925 for Earth's tropical year); overrides the catalogue, required when body is a GM number.
 * @returns Inclination, deg.
 */
export function sunSyncInclination(body: any[][], sma: any[][], ecc?: any[][], body_radius?: any[][], j2?: any[][], body_orbital_period?: any[][]): any[][] {
  return SUN_SYNC_INCLINATION(arguments);
}

const REPEAT_TRACK_SMA = define.scalar(
  "REPEAT_TRACK_SMA",
  [body(), num("revolutions"), num("days"), numOr("ecc", 0), num("inc", "deg"), optNum("body_radius", "km"), optNum("j2"), optNum("rotation_period", "s")],
  (b, k, d, e, i, R, J, spin) => withAll([j2Model(b, R, J), rotationPeriodOf(b, spin)], ([gm, r, z], period) => j2.repeatTrackSma(gm, r, z, period, k, d, e, i)),
  { example: ["Earth", 175, 12, 0.001, 98.15], terms: ["repeat ground track", "revisit", "exact repeat orbit", "J2"] },
);
/**
 * Semi-major axis whose ground track repeats after a whole number of revolutions in a whole number of nodal days, km, with the J2 secular rates of node, periapsis and mean anomaly, solved iteratively. A nodal day is one turn of the body under the orbit plane (for a sun-synchronous Earth orbit, the mean solar day of 86400 s). A mean element. A preliminary first-order estimate: real repeat orbits, tuned with higher harmonics, lie within about a kilometre; no drag, no third bodies. #N/A when the orbit for that many revolutions per day would have its periapsis inside the body (e.g. revolutions and days swapped).
 * @customfunction REPEAT_TRACK_SMA
 * @helpurl https://localhost:3000/reference.html#repeat_track_sma
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s² (then body_radius, j2 and rotation_period are required). With a GM number, distances are checked against the surface only when body_radius is given.
 * @param revolutions Revolutions of the orbit in one repeat cycle, a whole number of 1 or more.
 * @param days Nodal days in one repeat cycle, a whole number of 1 or more.
 * @param ecc Eccentricity, 0 ≤ ecc < 1; leave the argument empty (body, revolutions, days, , inc) for 0, a circular orbit.
 * @param inc Inclination, deg (0 to 180).
 * @param [body_radius] Reference radius of the J2 value, km; overrides the catalogue's, required when body is a GM number.
 * @param [j2] Zonal harmonic J2 (unnormalised, dimensionless); overrides the catalogue, required when body is a GM number.
 * @param [rotation_period] The body's sidereal rotation period, s (negative for retrograde spin); overrides the catalogue, required when body is a GM number.
 * @returns Semi-major axis, km.
 */
export function repeatTrackSma(
  body: any[][],
  revolutions: any[][],
  days: any[][],
  ecc: any[][],
  inc: any[][],
  body_radius?: any[][],
  j2?: any[][],
  rotation_period?: any[][],
): any[][] {
  return REPEAT_TRACK_SMA(arguments);
}

const ECLIPSE_DURATION = define.scalar(
  "ECLIPSE_DURATION",
  [body(), radius("radius"), num("beta_angle", "deg"), optNum("body_radius", "km")],
  (b, r, beta, R) =>
    typeof b !== "number" && b.kind === "star"
      ? badArgument("body", b.name, `a planet or moon: ${b.name} casts no shadow on its own orbits, since the light comes from it (an eclipse is a planet's or moon's shadow of the Sun)`)
      : withAll([radiusOf(b, R)], (radius) => coreEclipseDuration(radius, gmOf(b), r, beta)),
  { example: ["Earth", 7068.137, 20], terms: ["shadow time", "umbra", "eclipse fraction", "power budget", "night"] },
);
/**
 * Time a circular orbit spends in the body's shadow per revolution, s, for the Sun at beta_angle from the orbit plane; 0 when the orbit never enters the shadow. Cylindrical shadow of a sphere of the body's equatorial radius (the Sun at infinity: no penumbra, no refraction), two-body period. A preliminary estimate for power and thermal budgets: within about a minute of the real umbra and penumbra in low orbit. Refuses (#VALUE!) the Sun as the body (the light comes from it) and a radius inside the body (an altitude typed as a radius; with a GM number, only when body_radius is given).
 * @customfunction ECLIPSE_DURATION
 * @helpurl https://localhost:3000/reference.html#eclipse_duration
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s² (then body_radius is required). With a GM number, distances are checked against the surface only when body_radius is given.
 * @param radius Orbit radius from the body's centre, km (not an altitude).
 * @param beta_angle Angle of the Sun above the orbit plane, deg (−90 to 90; see BETA_ANGLE).
 * @param [body_radius] Radius of the shadowing sphere, km; overrides the catalogue's equatorial radius, required when body is a GM number.
 * @returns Shadow time per orbit, s.
 */
export function eclipseDuration(body: any[][], radius: any[][], beta_angle: any[][], body_radius?: any[][]): any[][] {
  return ECLIPSE_DURATION(arguments);
}

const BETA_ANGLE = define.scalar("BETA_ANGLE", [num("inc", "deg"), num("raan", "deg"), date("date")], coreBetaAngle, {
  example: [98.15, 292.5, 46388.5],
  terms: ["solar beta", "sun angle", "orbit plane sun angle", "thermal"],
});
/**
 * Beta angle of an Earth orbit, deg (−90 to 90): the Sun's elevation above the orbit plane, positive on the side of the orbit normal (the side from which the orbit turns anticlockwise). The Sun from a published low-precision solar formula, within about 0.012° over 1950–2050 and about 0.025° by 1800 or 2200; dates outside 1800–2200, the formula's stated four-century window, are refused (#VALUE!). The plane is taken as fixed at that date: J2 turns it, so advance the RAAN (NODAL_PRECESSION) for a date far from the elements' epoch.
 * @customfunction BETA_ANGLE
 * @helpurl https://localhost:3000/reference.html#beta_angle
 * @param inc Inclination, deg (0 to 180).
 * @param raan Right ascension of the ascending node, deg, from the equinox of date (a J2000 value differs by about 0.014° per year since 2000).
 * @param date Date and time, UTC: an Excel date serial or ISO 8601 text such as "2027-03-20T06:00Z", 1800 to 2200.
 * @returns Beta angle, deg.
 */
export function betaAngle(inc: any[][], raan: any[][], date: any[][]): any[][] {
  return BETA_ANGLE(arguments);
}
