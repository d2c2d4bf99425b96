import { toDegrees, toRadians, wrapDegrees360 } from "./angles";
import { badArgument, finite, firstError, isDomainError, within, type DomainError, type Result } from "./domain";
import { fk5Rotations, inertialToItrfKernel, type InertialFrame } from "./fk5";
import { geodeticToItrfKernel, itrfToGeodeticKernel } from "./geodetic";
import { readState } from "./state";
import type { Vec3 } from "./vector3";

/**
 * Topocentric look angles from a ground site, and the sub-satellite point.
 *
 * The satellite's Earth-fixed (ITRF) position and velocity come from the state through the FK5
 * reduction (src/core/fk5.ts) with UT1 = UTC and no polar motion (these functions take no Earth
 * orientation parameters: the 0.9 s at most of UT1 - UTC moves a low satellite by up to 0.4 km
 * along the equator, about 0.02 deg at 1000 km range), or are taken as given for frame "ITRF".
 * The site comes from its WGS 84 geodetic coordinates (Vallado, Fundamentals of Astrodynamics and
 * Applications, 4th ed., Alg. 51 SITE). With rho = r_sat - r_site in the site's east-north-up
 * axes (the SEZ frame of Vallado's Alg. 27 RAZEL, reordered):
 *   azimuth   = atan2(rho_E, rho_N), deg from north through east, [0, 360)
 *   elevation = atan2(rho_U, sqrt(rho_E^2 + rho_N^2)), deg above the local horizontal (geodetic)
 *   range     = |rho|, km;  range rate = rho . v_ITRF / |rho|, km/s (positive receding)
 * Geometric only: no atmospheric refraction (which lifts an object at the horizon by about 0.5 deg)
 * and no light time (a few milliseconds).
 * Accuracy: the geometry is exact to float64 rounding; checked against Vallado 4th ed. Example
 * 4-1 (test/core/lookangles.test.ts). Directly overhead the azimuth is undefined: it is then 0.
 */

export type StateFrame = InertialFrame | "ITRF";

/** Reads the optional `frame` of a state given to the ground functions: J2000 (default), TEME or ITRF. */
export function readStateFrame(value: unknown): StateFrame | DomainError {
  if (value === null || value === undefined) return "J2000";
  const key = typeof value === "string" ? value.trim().toUpperCase() : "";
  return key === "J2000" || key === "TEME" || key === "ITRF"
    ? key
    : badArgument("frame", value, `the state's frame: "J2000" (inertial, the default), "TEME" (two-line element sets) or "ITRF" (Earth-fixed)`);
}

/** Kernel: the Earth-fixed state of a state in `frame` at a UTC Julian date, UT1 = UTC, no polar motion. */
export function earthFixedStateOf(r: Vec3, v: Vec3, jdUtc: number, frame: StateFrame): number[] {
  return frame === "ITRF" ? [...r, ...v] : inertialToItrfKernel(r, v, fk5Rotations(jdUtc, { dut1: 0, xp: 0, yp: 0 }), frame);
}

/** The site's checks, shared with the pass search. */
export function checkSite(latitude: number, longitude: number, height: number): DomainError | undefined {
  return firstError(
    within("site_latitude", latitude, -90, 90, "a geodetic latitude from -90 (south) to 90 (north) deg"),
    finite("site_longitude", longitude, "deg (east positive)"),
    within("site_height", height, -1, 100, "a height above the WGS 84 ellipsoid in km, from -1 to 100 (e.g. 0.12 for 120 m)"),
  );
}

/** A ground site: its ITRF position and east, north, up unit vectors. */
export interface Site {
  r: Vec3;
  east: Vec3;
  north: Vec3;
  up: Vec3;
}

/** Kernel: the site frame of a geodetic latitude, longitude (deg) and height (km). */
export function siteFrame(latitude: number, longitude: number, height: number): Site {
  const lat = toRadians(latitude);
  const lon = toRadians(longitude);
  const sl = Math.sin(lat), cl = Math.cos(lat), so = Math.sin(lon), co = Math.cos(lon);
  return { r: geodeticToItrfKernel(lat, lon, height), east: [-so, co, 0], north: [-sl * co, -sl * so, cl], up: [cl * co, cl * so, sl] };
}

/** Kernel: [azimuth deg, elevation deg, range km, range rate km/s] of an ITRF state seen from a site. */
export function lookAnglesKernel(site: Site, r: Vec3, v: Vec3): [number, number, number, number] {
  const rho: Vec3 = [r[0] - site.r[0], r[1] - site.r[1], r[2] - site.r[2]];
  const e = rho[0] * site.east[0] + rho[1] * site.east[1];
  const n = rho[0] * site.north[0] + rho[1] * site.north[1] + rho[2] * site.north[2];
  const u = rho[0] * site.up[0] + rho[1] * site.up[1] + rho[2] * site.up[2];
  const range = Math.hypot(rho[0], rho[1], rho[2]);
  const azimuth = e === 0 && n === 0 ? 0 : wrapDegrees360(toDegrees(Math.atan2(e, n))) + 0;
  const elevation = toDegrees(Math.atan2(u, Math.hypot(e, n)));
  const rangeRate = (rho[0] * v[0] + rho[1] * v[1] + rho[2] * v[2]) / range;
  return [azimuth, elevation, range, rangeRate];
}

/**
 * Azimuth (deg), elevation (deg), slant range (km) and range rate (km/s) of a satellite state
 * seen from a ground site at a UTC Julian date; see the file comment for method and accuracy.
 */
export function lookAngles(
  siteLatitude: number,
  siteLongitude: number,
  siteHeight: number,
  state: readonly number[],
  date: number,
  frame?: unknown,
): Result<number[]> {
  const badSite = checkSite(siteLatitude, siteLongitude, siteHeight);
  if (badSite) return badSite;
  const fixed = earthFixedStateArgs(state, date, frame);
  if (isDomainError(fixed)) return fixed;
  const site = siteFrame(siteLatitude, siteLongitude, siteHeight);
  const angles = lookAnglesKernel(site, [fixed[0], fixed[1], fixed[2]], [fixed[3], fixed[4], fixed[5]]);
  return angles.every(Number.isFinite) ? angles : badArgument("state", 0, "a satellite position away from the site");
}

/**
 * Sub-satellite point: geodetic latitude (deg), longitude (deg, (-180, 180]) and height above the
 * WGS 84 ellipsoid (km) of the point under the satellite, along the ellipsoid normal, at a UTC
 * Julian date (UT1 = UTC, no polar motion: see the file comment).
 */
export function subsatellitePoint(state: readonly number[], date: number, frame?: unknown): Result<number[]> {
  const fixed = earthFixedStateArgs(state, date, frame);
  if (isDomainError(fixed)) return fixed;
  if (Math.hypot(fixed[0], fixed[1], fixed[2]) < 100)
    return badArgument("state", Math.hypot(fixed[0], fixed[1], fixed[2]), "a position at least 100 km from the Earth's centre");
  const [lat, lon, h] = itrfToGeodeticKernel(fixed[0], fixed[1], fixed[2]);
  return [toDegrees(lat), toDegrees(lon) + 0, h];
}

/** The checked state, date and frame of a ground function, turned into the Earth-fixed state. */
function earthFixedStateArgs(state: readonly number[], date: number, frame: unknown): number[] | DomainError {
  const read = readState(state);
  if (isDomainError(read)) return read;
  const badDate = finite("date", date, "days (a Julian date, UTC)");
  if (badDate) return badDate;
  const f = readStateFrame(frame);
  if (isDomainError(f)) return f;
  return earthFixedStateOf(read.r, read.v, date, f);
}
