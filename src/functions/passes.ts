import { badArgument, isDomainError, withAll, type Result } from "../core/domain";
import * as coverage from "../core/coverage";
import { contactTime as coreContactTime, passes as corePasses, MAX_WINDOW_DAYS } from "../core/passes";
import { radiusOf } from "./bodyargs";
import { family, type SizeView } from "./define";
import { passSource, sheetDate, siteParams } from "./groundargs";
import type { CellValue } from "./lift";
import { date, num, optBody, optNum, type BodyArg } from "./params";

// Family "Passes and coverage": when a satellite is over a ground site and for how long, from a
// two-line element set or a state (PASSES, CONTACT_TIME), and the closed forms of circular-orbit
// coverage for a first look (Wertz and Larson, Space Mission Analysis and Design, 3rd ed., §5.2
// and §5.3). Examples: the invented Skerry-1 in its 690 km orbit over the invented Skerry Ground
// station at 58.21° N, 6.39° W, 0.05 km (invented coordinates), a 10° minimum elevation, the
// week from 2026-06-01 (serial 46174).

/** The invented Skerry-1 element set (test/support/skerry.ts), as a column of two cells. */
const SKERRY_TLE: readonly (readonly string[])[] = [
  ["1 99001U 26999A   26150.50000000  .00000210  00000-0  21000-4 0  9993"],
  ["2 99001  98.1900 135.0000 0001200  90.0000 270.0000 14.60983543  1057"],
];
const SKERRY_SITE = [58.21, -6.39, 0.05] as const;

const define = family("Passes and coverage");

const PASS_LABELS = ["rise (UTC)", "highest (UTC)", "maximum elevation (deg)", "set (UTC)", "duration (s)"];
const CONTACT_LABELS = ["day from (UTC)", "contact (min)", "passes"];

/** The core's pass rows [rise, peak, set (JD), max elevation, duration] in the sheet's order, dates as serials. */
function passRows(rows: Result<number[][]>): Result<CellValue[][]> {
  if (isDomainError(rows)) return rows;
  return rows.map(([rise, peak, set, maxElevation, duration]) => [sheetDate("start", rise), sheetDate("start", peak), maxElevation, sheetDate("start", set), duration]);
}

const passParams = [passSource(), ...siteParams, date("start"), date("end"), optNum("min_elevation", "deg")] as const;

const PASSES = define.table("PASSES", passParams, (source, lat, lon, h, start, end, minEl) => passRows(corePasses(source, lat, lon, h, start, end, minEl)), {
  example: [SKERRY_TLE, ...SKERRY_SITE, "2026-06-01", "2026-06-08", 10, true],
  terms: ["pass prediction", "AOS LOS", "rise and set", "visibility windows", "ground station contacts", "overflights"],
  labels: () => PASS_LABELS,
  // One row per pass: how many is known only once the passes are found.
  size: () => undefined,
});
/**
 * The passes of a satellite over a ground site between two dates, one row per pass: rise, time of the highest elevation, that elevation, set and duration. The source is a two-line element set (propagated by SGP4) or a J2000 state at an epoch (propagated with the J2 secular model: the state's semi-major axis is turned into the mean one to first order, its other osculating elements are taken as mean elements; no drag; within about 50 km of SGP4 over a week in low orbit, a few seconds in pass times: use a TLE for real predictions). Rises and sets are found by root-bracketing to 1 ms, not by sampling alone; the elevation is geometric (no refraction) with UT1 = UTC and no polar motion. A pass in progress at start or end is cut there. At most 31 days; #N/A when no pass rises above min_elevation. Planning values: SGP4 is good to about a kilometre at the element set's epoch, growing by 1–3 km a day, and each kilometre along the track moves a low-orbit rise or set by about 0.13 s; not for operations.
 * @customfunction PASSES
 * @helpurl https://localhost:3000/reference.html#passes
 * @param source A two-line element set as two cells (line 1, line 2), or seven cells: a J2000 state x, y, z (km), vx, vy, vz (km/s) and its epoch as a date.
 * @param site_latitude Geodetic latitude of the site, deg (north positive).
 * @param site_longitude Longitude of the site, deg (east positive).
 * @param site_height Height of the site above the WGS 84 ellipsoid, km.
 * @param start Start of the search, UTC: an Excel date serial or ISO 8601 text.
 * @param end End of the search, UTC, at most 31 days after start.
 * @param [min_elevation] Elevation a pass must clear, deg (default 0: the geometric horizon; −5 to 90).
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per pass: rise, highest and set as UTC date serials (format the cells as dates with time), maximum elevation (deg), duration (s).
 */
export function passes(source: any[][], site_latitude: any[][], site_longitude: any[][], site_height: any[][], start: any[][], end: any[][], min_elevation?: any[][], include_header?: any[][]): any[][] {
  return PASSES(arguments);
}

const CONTACT_TIME = define.table(
  "CONTACT_TIME",
  passParams,
  (source, lat, lon, h, start, end, minEl) =>
    withAll([coreContactTime(source, lat, lon, h, start, end, minEl)], (days) => days.map(([from, minutes, count]) => [sheetDate("start", from), minutes, count])),
  {
    // The week as date serials (46174 is 2026-06-01), so the runner knows the size beforehand.
    example: [SKERRY_TLE, ...SKERRY_SITE, 46174, 46181, 10, true],
    terms: ["daily contact", "minutes per day", "contact budget", "downlink time", "ground station time"],
    labels: () => CONTACT_LABELS,
    // One row per 24-hour span from start: known before evaluation when both dates are literal serials.
    size: (a: SizeView) => {
      const start = a.integer("start");
      const end = a.integer("end");
      if (start === undefined || end === undefined || end <= start || end - start > MAX_WINDOW_DAYS) return undefined;
      return { rows: end - start + (a.header() ? 1 : 0), cols: CONTACT_LABELS.length };
    },
  },
);
/**
 * Contact time over a ground site per day: for each 24-hour span from start (start at midnight for calendar days; the last span ends at end), the minutes the satellite spends above min_elevation and the number of passes rising in it. A pass over a span boundary counts its minutes on both sides. Same inputs, method, limits and cautions as PASSES.
 * @customfunction CONTACT_TIME
 * @helpurl https://localhost:3000/reference.html#contact_time
 * @param source A two-line element set as two cells (line 1, line 2), or seven cells: a J2000 state x, y, z (km), vx, vy, vz (km/s) and its epoch as a date.
 * @param site_latitude Geodetic latitude of the site, deg (north positive).
 * @param site_longitude Longitude of the site, deg (east positive).
 * @param site_height Height of the site above the WGS 84 ellipsoid, km.
 * @param start Start of the first day, UTC: an Excel date serial or ISO 8601 text.
 * @param end End of the last day, UTC, at most 31 days after start.
 * @param [min_elevation] Elevation a pass must clear, deg (default 0; −5 to 90).
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per day: its start (UTC date serial), contact (min), passes rising in it.
 */
export function contactTime(source: any[][], site_latitude: any[][], site_longitude: any[][], site_height: any[][], start: any[][], end: any[][], min_elevation?: any[][], include_header?: any[][]): any[][] {
  return CONTACT_TIME(arguments);
}

/** The sphere SLANT_RANGE uses: the WGS 84 equatorial radius when no body is named, else the body's radius (or the override). */
function sphereOf(b: BodyArg | null, bodyRadius: number | null): Result<number | null> {
  if (b === null) return bodyRadius === null ? null : bodyRadius > 0 ? bodyRadius : badArgument("body_radius", bodyRadius, "a positive radius in km");
  return radiusOf(b, bodyRadius);
}

const SLANT_RANGE = define.scalar(
  "SLANT_RANGE",
  [num("altitude", "km"), num("elevation", "deg"), optBody("body"), optNum("body_radius", "km")],
  (h, e, b, R) => withAll([sphereOf(b, R)], (radius) => coverage.slantRange(h, e, radius)),
  { example: [690, 10], terms: ["range to satellite", "distance to satellite", "link distance", "line of sight range"] },
);
/**
 * Distance from a ground site to a satellite at an altitude seen at an elevation, km (Wertz and Larson, SMAD 3rd ed. §5.2: D = R sin λ / sin η, evaluated without cancellation). A sphere: the Earth of WGS 84's equatorial radius, 6378.137 km, when body is omitted (as the coverage functions use), else the body's equatorial radius. Exact for a sphere; on the real Earth a site's distance from the centre differs by up to 21 km, which moves the range by up to about 1 % at low elevation. For the link budget at the minimum elevation.
 * @customfunction SLANT_RANGE
 * @helpurl https://localhost:3000/reference.html#slant_range
 * @param altitude Satellite altitude above the sphere, km (0 or more).
 * @param elevation Elevation of the satellite above the site's horizon, deg (0 to 90).
 * @param [body] Catalogue body name or GM in km³/s² (then body_radius is required); omitted: the Earth on WGS 84.
 * @param [body_radius] Radius of the sphere, km; overrides the body's.
 * @returns Slant range, km.
 */
export function slantRange(altitude: any[][], elevation: any[][], body?: any[][], body_radius?: any[][]): any[][] {
  return SLANT_RANGE(arguments);
}

const coverageParams = [num("altitude", "km"), num("min_elevation", "deg")] as const;

const COVERAGE_HALF_ANGLE = define.scalar("COVERAGE_HALF_ANGLE", coverageParams, coverage.coverageHalfAngle, {
  example: [690, 10],
  terms: ["Earth central angle", "footprint radius", "coverage circle", "lambda max", "access area"],
});
/**
 * Earth central angle from the sub-satellite point to the edge of the area that sees a satellite in a circular orbit above a minimum elevation, deg: λ = 90° − ε − η with sin η = cos ε R/(R + h) (Wertz and Larson, SMAD 3rd ed. §5.2). Spherical Earth of WGS 84's equatorial radius; exact for the sphere.
 * @customfunction COVERAGE_HALF_ANGLE
 * @helpurl https://localhost:3000/reference.html#coverage_half_angle
 * @param altitude Orbit altitude, km (circular orbit).
 * @param min_elevation Minimum elevation at the edge, deg (0 to 90).
 * @returns Earth central angle, deg.
 */
export function coverageHalfAngle(altitude: any[][], min_elevation: any[][]): any[][] {
  return COVERAGE_HALF_ANGLE(arguments);
}

const SWATH_WIDTH = define.scalar("SWATH_WIDTH", coverageParams, coverage.swathWidth, {
  example: [690, 10],
  terms: ["access swath", "coverage width", "footprint diameter", "ground strip"],
});
/**
 * Width along the ground of the strip under a circular orbit from which the satellite is seen above a minimum elevation, km: twice the coverage half-angle times the Earth's radius (SMAD 3rd ed. §5.2; spherical Earth of WGS 84's equatorial radius). The strip a ground station must lie in to see a pass, not a sensor's swath.
 * @customfunction SWATH_WIDTH
 * @helpurl https://localhost:3000/reference.html#swath_width
 * @param altitude Orbit altitude, km (circular orbit).
 * @param min_elevation Minimum elevation at the edge of the strip, deg (0 to 90).
 * @returns Width, km.
 */
export function swathWidth(altitude: any[][], min_elevation: any[][]): any[][] {
  return SWATH_WIDTH(arguments);
}

const MAX_PASS_DURATION = define.scalar("MAX_PASS_DURATION", coverageParams, coverage.maxPassDuration, {
  example: [690, 10],
  terms: ["longest pass", "overhead pass", "contact duration", "visibility time"],
});
/**
 * Longest pass of a circular orbit over a site above a minimum elevation, straight overhead, s: the two-body period times 2λ/360° (SMAD 3rd ed. §5.3; WGS 84 sphere and GM). Ignores the Earth's rotation during the pass, which lengthens or shortens a low-orbit pass by up to a few percent; PASSES gives real passes.
 * @customfunction MAX_PASS_DURATION
 * @helpurl https://localhost:3000/reference.html#max_pass_duration
 * @param altitude Orbit altitude, km (circular orbit).
 * @param min_elevation Minimum elevation, deg (0 to 90).
 * @returns Duration, s.
 */
export function maxPassDuration(altitude: any[][], min_elevation: any[][]): any[][] {
  return MAX_PASS_DURATION(arguments);
}

const PASS_DURATION = define.scalar("PASS_DURATION", [...coverageParams, num("offset", "deg")], coverage.passDuration, {
  example: [690, 10, 5],
  terms: ["pass length", "off-track pass", "contact duration", "visibility time"],
});
/**
 * Duration of a pass above a minimum elevation whose ground track misses the site by an Earth central angle, s: (P/180°) acos(cos λmax / cos λmin) (SMAD 3rd ed. §5.3; WGS 84 sphere and GM); 0 when the track passes beyond the coverage half-angle. Ignores the Earth's rotation during the pass (a few percent in low orbit).
 * @customfunction PASS_DURATION
 * @helpurl https://localhost:3000/reference.html#pass_duration
 * @param altitude Orbit altitude, km (circular orbit).
 * @param min_elevation Minimum elevation, deg (0 to 90).
 * @param offset Earth central angle between the ground track and the site at closest approach, deg (0 to 90).
 * @returns Duration, s.
 */
export function passDuration(altitude: any[][], min_elevation: any[][], offset: any[][]): any[][] {
  return PASS_DURATION(arguments);
}

const GROUND_TRACK_SPACING = define.scalar("GROUND_TRACK_SPACING", [num("altitude", "km"), optNum("inc", "deg")], coverage.groundTrackSpacing, {
  example: [690, 98.19],
  terms: ["ground track shift", "track separation", "revisit", "equator crossing spacing"],
});
/**
 * Distance along the equator between the ground tracks of successive ascending passes of a circular orbit, km: the Earth's turn under the orbit between node crossings. With inc, the J2 secular rates (WGS 84 J2) give the node drift and the nodal period; without it, the two-body period and a fixed node. A first-order value, within about 0.1 % of a full propagation.
 * @customfunction GROUND_TRACK_SPACING
 * @helpurl https://localhost:3000/reference.html#ground_track_spacing
 * @param altitude Orbit altitude, km (circular orbit).
 * @param [inc] Inclination, deg (0 to 180); omitted: no node drift.
 * @returns Spacing at the equator, km.
 */
export function groundTrackSpacing(altitude: any[][], inc?: any[][]): any[][] {
  return GROUND_TRACK_SPACING(arguments);
}
