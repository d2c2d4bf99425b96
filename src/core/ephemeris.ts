import { RAD_PER_DEG } from "./angles";
import { badArgument, firstError, type Result } from "./domain";
import {
  AU_KM,
  STANDISH_BODIES,
  TABLE_1,
  TABLE_1_END_JD,
  TABLE_1_FIRST_JD,
  TABLE_2,
  TABLE_2_FIRST_JD,
  TABLE_2_LAST_JD,
  type ElementRow,
} from "./ephemerisdata";
import { dateOutside } from "./julian";
import { solveKeplerElliptic } from "./kepler";
import { DAYS_PER_JULIAN_CENTURY, JD_J2000, SECONDS_PER_DAY } from "./time";

/**
 * Approximate heliocentric states of the major planets from JPL's published Keplerian mean
 * elements and their rates: E. M. Standish, "Keplerian Elements for Approximate Positions of the
 * Major Planets" (JPL Solar System Dynamics). Table 1 is used from 1800-01-01 up to 2051-01-01
 * (its stated span 1800-2050), Table 2a with the extra Table 2b terms for Jupiter-Pluto elsewhere
 * in 3000 BC - 3000 AD. Positions follow the document's recipe: elements at T Julian centuries of
 * TDB from J2000, M = L - varpi (+ b T^2 + c cos fT + s sin fT), omega = varpi - Omega, Kepler's
 * equation (kepler.ts, Markley's solver, exact to a few ulp, far inside the document's 1e-6 deg
 * tolerance), rotation to the mean ecliptic and equinox of J2000.
 *
 * Frame and units: heliocentric ecliptic J2000, [x, y, z] km and [vx, vy, vz] km/s; au =
 * 149 597 870.7 km (IAU 2012 B2). "Earth" is the Earth-Moon barycentre (the tables' "EM Bary"):
 * the Earth itself is about 4 700 km from it (4 900 at most, with the Moon at apogee).
 *
 * Accuracy: the published approximate errors (arcsec, arcsec, 1000 km; the older JPL page heads
 * the columns RA, Dec, r, the current one heliocentric longitude, latitude, distance), Table 1
 * over 1800-2050 / Table 2 over 3000 BC - 3000 AD: Mercury 15, 1, 1 / 20, 15, 1; Venus 20, 1, 4 /
 * 40, 30, 8; EM barycentre 20, 8, 6 / 40, 15, 15; Mars 40, 2, 25 / 100, 40, 30; Jupiter 400, 10,
 * 600 / 600, 100, 1000; Saturn 600, 25, 1500 / 1000, 100, 4000; Uranus 50, 2, 1000 / 2000, 30,
 * 8000; Neptune 10, 1, 200 / 400, 15, 4000; Pluto 5, 2, 300 / 400, 100, 2500; the current page
 * calls them nominal errors. Measured
 * against astronomy-engine 2.1.19 over 2,500 dates in 1800-2050 (test/core/ephemeris.test.ts),
 * heliocentric position error RMS / worst, in 1000 km: Mercury 2 / 6, Venus 6 / 14, EM barycentre
 * 7 / 20, Mars 36 / 99, Jupiter 836 / 1873, Saturn 2750 / 4940, Uranus 1026 / 2371, Neptune
 * 970 / 1671, Pluto 939 / 1775: RMS within the published figures for Mercury-Uranus, the worst
 * date up to about twice them. Neptune's and Pluto's heliocentric errors are about 3x the
 * published figures; their elements track the motion about the solar-system barycentre better
 * (against barycentric positions the RMS is 0.75 of the figure for Neptune, 1.2 for Pluto), the
 * difference being the Sun's own offset from the barycentre (up to ~1.5 million km). Table 2 was checked the same
 * way over 1500-1800 and 2051-2500 (RMS within its figures); before 1500 the reference library
 * itself drifts, so the ancient part of the span is unchecked here. At the switch between the
 * tables (1800-01-01 and 2051-01-01) the position jumps by up to those errors.
 *
 * Velocity: the exact time derivative of this element model (chain rule through every element
 * rate, the Table 2b terms and Kepler's equation), so it agrees with differencing the returned
 * positions to rounding. It is still a mean-element velocity: the tables omit the planets'
 * short-period perturbations. Against astronomy-engine's heliocentric velocities at 800 dates in
 * 1800-2050 it is off by at most 18 m/s (Mercury), 4 (Venus), 3 (EM barycentre), 9 (Mars), 23
 * (Jupiter), 39 (Saturn), 19 (Uranus), 17 (Neptune), 16 (Pluto); the test allows 20, 5, 4, 10,
 * 25, 45, 20, 20, 20 m/s.
 *
 * Time: the date is a Julian date read as TDB (TDB - UTC is about 69 s today, far below these
 * errors, but reaches hours in antiquity, when the date should be given in TDB directly).
 * Preliminary analyses only: not a navigation ephemeris. */

const CENTURY_S = DAYS_PER_JULIAN_CENTURY * SECONDS_PER_DAY;

/** Index into the tables for a body name (case-insensitive), or -1. "Earth" means the EM barycentre. */
export function planetIndex(name: string): number {
  const key = name.trim().toLowerCase().replace(/[-_]/g, " ").replace(/\s+/g, " ");
  switch (key) {
    case "mercury":
      return 0;
    case "venus":
      return 1;
    case "earth":
    case "em bary":
    case "emb":
    case "earth moon barycenter":
    case "earth moon barycentre":
      return 2;
    default: {
      const i = STANDISH_BODIES.findIndex((b) => b.toLowerCase() === key);
      return i >= 3 ? i : -1;
    }
  }
}

export const PLANET_NAMES_ALLOWED =
  "one of Mercury, Venus, Earth (the Earth-Moon barycentre; also \"EM Bary\"), Mars, Jupiter, Saturn, Uranus, Neptune, Pluto";

/** True when Table 1 applies at this Julian date (TDB). */
export const usesTable1 = (jd: number): boolean => jd >= TABLE_1_FIRST_JD && jd < TABLE_1_END_JD;

/** True when a Julian date (TDB) is inside the span the tables cover. */
export const withinEphemerisSpan = (jd: number): boolean => jd >= TABLE_2_FIRST_JD && jd <= TABLE_2_LAST_JD;

/**
 * Kernel, no validation: writes the heliocentric ecliptic J2000 state (km, km/s) of table body
 * `index` (0..8, see STANDISH_BODIES) at Julian date `jd` (TDB) into out[0..5]. Picks Table 1 or 2
 * by date; allocates nothing.
 */
export function planetStateKernel(index: number, jd: number, out: number[] | Float64Array): void {
  const row: ElementRow = usesTable1(jd) ? TABLE_1[index] : TABLE_2[index];
  const t = (jd - JD_J2000) / DAYS_PER_JULIAN_CENTURY;
  const at = row.at;
  const rate = row.rate;
  const a = (at[0] + rate[0] * t) * AU_KM;
  const e = at[1] + rate[1] * t;
  const inc = (at[2] + rate[2] * t) * RAD_PER_DEG;
  const varpi = at[4] + rate[4] * t;
  const node = at[5] + rate[5] * t;
  let meanDeg = at[3] + rate[3] * t - varpi;
  let meanRateDeg = rate[3] - rate[4];
  if (row.b !== undefined) {
    meanDeg += row.b * t * t;
    meanRateDeg += 2 * row.b * t;
    if (row.f !== undefined) {
      const ft = row.f * t * RAD_PER_DEG;
      const cf = Math.cos(ft);
      const sf = Math.sin(ft);
      meanDeg += row.c! * cf + row.s! * sf;
      meanRateDeg += row.f * RAD_PER_DEG * (row.s! * cf - row.c! * sf);
    }
  }
  // Reduce M to [-180, 180) before converting, as the document prescribes.
  meanDeg -= 360 * Math.floor((meanDeg + 180) / 360);

  const argPeriapsis = (varpi - node) * RAD_PER_DEG;
  const om = node * RAD_PER_DEG;
  const eAnom = solveKeplerElliptic(meanDeg * RAD_PER_DEG, e);

  // Rates per second.
  const aDot = (rate[0] * AU_KM) / CENTURY_S;
  const eDot = rate[1] / CENTURY_S;
  const iDot = (rate[2] * RAD_PER_DEG) / CENTURY_S;
  const nodeDot = (rate[5] * RAD_PER_DEG) / CENTURY_S;
  const argPeriapsisDot = ((rate[4] - rate[5]) * RAD_PER_DEG) / CENTURY_S;
  const mDot = (meanRateDeg * RAD_PER_DEG) / CENTURY_S;

  const cosE = Math.cos(eAnom);
  const sinE = Math.sin(eAnom);
  const root = Math.sqrt(1 - e * e);
  const xp = a * (cosE - e);
  const yp = a * root * sinE;
  // Kepler's equation differentiated: (1 - e cos E) dE/dt = dM/dt + sin E de/dt.
  const eAnomDot = (mDot + sinE * eDot) / (1 - e * cosE);
  const xpDot = aDot * (cosE - e) - a * (sinE * eAnomDot + eDot);
  const ypDot = (aDot * root - (a * e * eDot) / root) * sinE + a * root * cosE * eAnomDot;

  const cw = Math.cos(argPeriapsis), sw = Math.sin(argPeriapsis);
  const cn = Math.cos(om), sn = Math.sin(om);
  const ci = Math.cos(inc), si = Math.sin(inc);
  // Perifocal unit vectors P (to perihelion) and Q in the ecliptic frame.
  const px = cw * cn - sw * sn * ci, py = cw * sn + sw * cn * ci, pz = sw * si;
  const qx = -sw * cn - cw * sn * ci, qy = -sw * sn + cw * cn * ci, qz = cw * si;
  const x = xp * px + yp * qx;
  const y = xp * py + yp * qy;
  const z = xp * pz + yp * qz;
  // d/dt of r = xp P + yp Q: in-plane rates, plus the turning of P and Q by the argument of
  // perihelion (about the orbit normal), the node (about the ecliptic pole z) and the
  // inclination (about the node line N = (cos Omega, sin Omega, 0)).
  out[0] = x;
  out[1] = y;
  out[2] = z;
  out[3] = xpDot * px + ypDot * qx + argPeriapsisDot * (xp * qx - yp * px) - nodeDot * y + iDot * (sn * z);
  out[4] = xpDot * py + ypDot * qy + argPeriapsisDot * (xp * qy - yp * py) + nodeDot * x - iDot * (cn * z);
  out[5] = xpDot * pz + ypDot * qz + argPeriapsisDot * (xp * qz - yp * pz) + iDot * (cn * y - sn * x);
}

/** What a date parameter allows, for messages. */
export const EPHEMERIS_SPAN_TEXT = `a date from 3000 BC January 1 (Julian calendar) to 3001-01-01 (Julian date ${TABLE_2_FIRST_JD} to ${TABLE_2_LAST_JD}), the span of the published tables (Table 1 for 1800-2050, Table 2 outside it); a Julian date given as a date serial reads as a year near 8600`;

/** Checks a body name and a Julian date (TDB); returns [index, jd] or the error. */
export function checkPlanetAndDate(bodyParam: string, body: unknown, dateParam: string, jd: number): Result<[number, number]> {
  const index = typeof body === "string" ? planetIndex(body) : -1;
  const bad = firstError(
    index < 0 ? badArgument(bodyParam, body, PLANET_NAMES_ALLOWED) : undefined,
    withinEphemerisSpan(jd) ? undefined : dateOutside(dateParam, jd, EPHEMERIS_SPAN_TEXT),
  );
  return bad ?? [index, jd];
}

/**
 * PLANET_STATE core. Given: body_name (Mercury ... Pluto; "Earth" = Earth-Moon barycentre), date
 * (Julian date, read as TDB). Returned: [x, y, z (km), vx, vy, vz (km/s)], heliocentric ecliptic
 * J2000, with the accuracy in the module comment.
 */
export function planetState(body_name: string, date: number): Result<number[]> {
  const checked = checkPlanetAndDate("body", body_name, "date", date);
  if (!Array.isArray(checked)) return checked;
  const out = [0, 0, 0, 0, 0, 0];
  planetStateKernel(checked[0], checked[1], out);
  return out;
}
