import { earthFixedToInertial as coreEarthFixedToInertial, inertialToEarthFixed as coreInertialToEarthFixed } from "../core/fk5";
import { earthFixedToGeodetic as coreEarthFixedToGeodetic, geodeticToEarthFixed as coreGeodeticToEarthFixed } from "../core/geodetic";
import { lookAngles as coreLookAngles, subsatellitePoint as coreSubsatellitePoint } from "../core/lookangles";
import { family } from "./define";
import { dut1, frameOf, INERTIAL_FRAMES, polar, siteParams, STATE_FRAMES } from "./groundargs";
import { date, num, position, state, STATE_LABELS } from "./params";

// Family "Frames and ground sites": inertial <-> Earth-fixed states by the IAU-76/FK5 reduction,
// WGS 84 geodetic coordinates, and what a ground site sees (README, "Frames and their
// accuracy"). Examples: the invented Skerry-1 element set (test/support/skerry.ts) propagated to
// its epoch, 2026-05-30 12:00 UTC, and to a pass over the invented Skerry Ground station at
// 58.21° N, 6.39° W, 0.05 km (invented coordinates) on 2026-06-01.

/** Skerry-1's J2000 state at its element set's epoch (SGP4, rounded to metres and mm/s). */
const SKERRY_J2000: readonly (readonly number[])[] = [[-4972.121, 5027.826, -3.679, 0.773416, 0.75797, 7.43123]];
/** The same state in the Earth-fixed frame (rounded). */
const SKERRY_ITRF: readonly (readonly number[])[] = [[2762.46, 6509.192, -16.349, 1.462105, -0.61135, 7.433222]];
/** Skerry-1's J2000 state on 2026-06-01 04:00:30 UTC, near the top of a pass over Skerry Ground. */
const SKERRY_PASS: readonly (readonly number[])[] = [[3351.451, -2013.854, 5880.876, 4.172412, -4.791096, -4.009191]];
const EPOCH = "2026-05-30T12:00Z";

const define = family("Frames and ground sites");

const frameParams = [state(), date("date"), dut1(), polar("polar_x"), polar("polar_y"), frameOf(INERTIAL_FRAMES)] as const;

const INERTIAL_TO_EARTH_FIXED = define.rows("INERTIAL_TO_EARTH_FIXED", STATE_LABELS, frameParams, coreInertialToEarthFixed, {
  example: [SKERRY_J2000, EPOCH],
  terms: ["ECI to ECEF", "GCRF to ITRF", "inertial to rotating", "FK5 reduction", "TEME to ECEF", "precession nutation"],
});
/**
 * Earth-fixed (ITRF) state of an inertial state at a date, by the IAU-76/FK5 reduction (Vallado 4th ed. §3.7: IAU 1976 precession, IAU 1980 nutation, GAST, polar motion); the velocity includes the Earth's rotation. Checked against Vallado's worked FK5 reduction (4th ed. Example 3-15) to 0.1 mm with its Earth orientation data. J2000 here is FK5's mean equator and equinox, within about 1 m of the GCRF in low orbit. Accuracy rests on the Earth orientation inputs: blank dut1 (|UT1 − UTC| < 0.9 s) misplaces the result by up to about 0.5 km in low orbit, blank polar motion (under 0.6 arcsec) by up to about 20 m.
 * @customfunction INERTIAL_TO_EARTH_FIXED
 * @helpurl https://localhost:3000/reference.html#inertial_to_earth_fixed
 * @param state Inertial state: six cells x, y, z (km), vx, vy, vz (km/s); several rows for several cases.
 * @param date The instant, UTC: an Excel date serial or ISO 8601 text.
 * @param [dut1] UT1 − UTC, s, from IERS Bulletin A (blank: 0).
 * @param [polar_x] Polar motion x, arcsec, from IERS Bulletin A (blank: 0).
 * @param [polar_y] Polar motion y, arcsec, from IERS Bulletin A (blank: 0).
 * @param [frame] Frame of the state: "J2000" (default) or "TEME" (the frame of two-line element sets).
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: x, y, z (km), vx, vy, vz (km/s), Earth-fixed.
 */
export function inertialToEarthFixed(state: any[][], date: any[][], dut1?: any[][], polar_x?: any[][], polar_y?: any[][], frame?: any[][], include_header?: any[][]): any[][] {
  return INERTIAL_TO_EARTH_FIXED(arguments);
}

const EARTH_FIXED_TO_INERTIAL = define.rows("EARTH_FIXED_TO_INERTIAL", STATE_LABELS, frameParams, coreEarthFixedToInertial, {
  example: [SKERRY_ITRF, EPOCH],
  terms: ["ECEF to ECI", "ITRF to GCRF", "rotating to inertial", "FK5 reduction", "ECEF to TEME"],
});
/**
 * Inertial state (J2000 or TEME) of an Earth-fixed (ITRF) state at a date: the inverse of INERTIAL_TO_EARTH_FIXED, by the same IAU-76/FK5 reduction with the same accuracy; a round trip returns the state to 1e-9 km.
 * @customfunction EARTH_FIXED_TO_INERTIAL
 * @helpurl https://localhost:3000/reference.html#earth_fixed_to_inertial
 * @param state Earth-fixed state: six cells x, y, z (km), vx, vy, vz (km/s); several rows for several cases.
 * @param date The instant, UTC: an Excel date serial or ISO 8601 text.
 * @param [dut1] UT1 − UTC, s, from IERS Bulletin A (blank: 0).
 * @param [polar_x] Polar motion x, arcsec, from IERS Bulletin A (blank: 0).
 * @param [polar_y] Polar motion y, arcsec, from IERS Bulletin A (blank: 0).
 * @param [frame] Frame wanted: "J2000" (default) or "TEME".
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: x, y, z (km), vx, vy, vz (km/s), inertial.
 */
export function earthFixedToInertial(state: any[][], date: any[][], dut1?: any[][], polar_x?: any[][], polar_y?: any[][], frame?: any[][], include_header?: any[][]): any[][] {
  return EARTH_FIXED_TO_INERTIAL(arguments);
}

const GEODETIC_TO_EARTH_FIXED = define.rows(
  "GEODETIC_TO_EARTH_FIXED",
  ["x (km)", "y (km)", "z (km)"],
  [num("latitude", "deg"), num("longitude", "deg"), num("height", "km")],
  coreGeodeticToEarthFixed,
  { example: [58.21, -6.39, 0.05], terms: ["LLA to ECEF", "latitude longitude to XYZ", "site position", "WGS 84", "geodetic to Cartesian"] },
);
/**
 * Earth-fixed position of a point given by geodetic latitude, longitude and height on the WGS 84 ellipsoid (Vallado 4th ed. Alg. 51; checked against his Example 3-3). Exact to float64 rounding.
 * @customfunction GEODETIC_TO_EARTH_FIXED
 * @helpurl https://localhost:3000/reference.html#geodetic_to_earth_fixed
 * @param latitude Geodetic latitude, deg (−90 to 90, north positive).
 * @param longitude Longitude, deg (east positive).
 * @param height Height above the WGS 84 ellipsoid, km (not above sea level: the geoid differs by up to about 0.1 km).
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: x, y, z (km), Earth-fixed.
 */
export function geodeticToEarthFixed(latitude: any[][], longitude: any[][], height: any[][], include_header?: any[][]): any[][] {
  return GEODETIC_TO_EARTH_FIXED(arguments);
}

const EARTH_FIXED_TO_GEODETIC = define.rows("EARTH_FIXED_TO_GEODETIC", ["latitude (deg)", "longitude (deg)", "height (km)"], [position("position")], coreEarthFixedToGeodetic, {
  example: [[[3347.306, -374.869, 5398.138]]],
  terms: ["ECEF to LLA", "XYZ to latitude longitude", "WGS 84", "Cartesian to geodetic", "height above ellipsoid"],
});
/**
 * Geodetic latitude, longitude and height on the WGS 84 ellipsoid of an Earth-fixed position, by Newton's method from Bowring's start (the condition Vallado 4th ed. Alg. 12 iterates on); valid at the poles and at any height. A round trip with GEODETIC_TO_EARTH_FIXED returns the position to 1e-9 km. Positions within 100 km of the Earth's centre are refused (their geodetic coordinates are not unique).
 * @customfunction EARTH_FIXED_TO_GEODETIC
 * @helpurl https://localhost:3000/reference.html#earth_fixed_to_geodetic
 * @param position Earth-fixed position: three cells x, y, z (km); several rows for several cases.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: geodetic latitude (deg), longitude (deg, −180 to 180), height above the ellipsoid (km).
 */
export function earthFixedToGeodetic(position: any[][], include_header?: any[][]): any[][] {
  return EARTH_FIXED_TO_GEODETIC(arguments);
}

const LOOK_ANGLES = define.rows(
  "LOOK_ANGLES",
  ["azimuth (deg)", "elevation (deg)", "slant range (km)", "range rate (km/s)"],
  [...siteParams, state(), date("date"), frameOf(STATE_FRAMES)],
  coreLookAngles,
  { example: [58.21, -6.39, 0.05, SKERRY_PASS, "2026-06-01T04:00:30Z"], terms: ["azimuth elevation range", "AER", "topocentric", "antenna pointing", "site track", "range rate"] },
);
/**
 * What a ground site sees of a satellite: azimuth, elevation above the geodetic horizon, slant range and range rate (positive receding), from a WGS 84 site (Vallado 4th ed. Alg. 51 and 27; checked against his Example 4-1). Geometric: no refraction (about 0.5° at the horizon) and no light time. The inertial state is turned Earth-fixed with UT1 = UTC and no polar motion (no Earth orientation inputs: up to about 0.02° at 1000 km range); give an ITRF state for the full correction.
 * @customfunction LOOK_ANGLES
 * @helpurl https://localhost:3000/reference.html#look_angles
 * @param site_latitude Geodetic latitude of the site, deg (north positive).
 * @param site_longitude Longitude of the site, deg (east positive).
 * @param site_height Height of the site above the WGS 84 ellipsoid, km (e.g. 0.05 for 50 m).
 * @param state The satellite's state: six cells x, y, z (km), vx, vy, vz (km/s); several rows for several cases.
 * @param date The instant of the state, UTC: an Excel date serial or ISO 8601 text.
 * @param [frame] Frame of the state: "J2000" (default), "TEME" or "ITRF".
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: azimuth (deg from north through east), elevation (deg), slant range (km), range rate (km/s).
 */
export function lookAngles(site_latitude: any[][], site_longitude: any[][], site_height: any[][], state: any[][], date: any[][], frame?: any[][], include_header?: any[][]): any[][] {
  return LOOK_ANGLES(arguments);
}

const SUBSATELLITE_POINT = define.rows("SUBSATELLITE_POINT", ["latitude (deg)", "longitude (deg)", "altitude (km)"], [state(), date("date"), frameOf(STATE_FRAMES)], coreSubsatellitePoint, {
  example: [SKERRY_PASS, "2026-06-01T04:00:30Z"],
  terms: ["ground track", "nadir point", "sub-satellite point", "footprint centre", "where is the satellite"],
});
/**
 * The point on the WGS 84 ellipsoid under a satellite (along the ellipsoid's normal) and the satellite's height above it, at a date. The inertial state is turned Earth-fixed with UT1 = UTC and no polar motion (the point moves by up to about 0.4 km along the equator); give an ITRF state for the full correction.
 * @customfunction SUBSATELLITE_POINT
 * @helpurl https://localhost:3000/reference.html#subsatellite_point
 * @param state The satellite's state: six cells x, y, z (km), vx, vy, vz (km/s); several rows for several cases.
 * @param date The instant of the state, UTC: an Excel date serial or ISO 8601 text.
 * @param [frame] Frame of the state: "J2000" (default), "TEME" or "ITRF".
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: geodetic latitude (deg), longitude (deg, −180 to 180), altitude above the ellipsoid (km).
 */
export function subsatellitePoint(state: any[][], date: any[][], frame?: any[][], include_header?: any[][]): any[][] {
  return SUBSATELLITE_POINT(arguments);
}
