import { badArgument, DomainError, type Result } from "../core/domain";
import { readPassSource, type PassSource } from "../core/passes";
import { EXCEL_SERIAL_TO_JD, MAX_EXCEL_SERIAL } from "../core/time";
import { julianDateOfCell, serialOfJulianDate } from "./dates";
import { choice, list, num, optNum, type Cell, type Choice, type ListParam, type Param } from "./params";

/**
 * Readers and outputs the ground families share (time, frames and sites, passes, two-line element
 * sets): the frame words, the Earth orientation inputs, a ground site, TLE lines, a pass source,
 * and Julian dates given back to the sheet as date serials. Not a family file (no worksheet
 * function is declared here); the readers that do not exist in params.ts live here.
 */

/** The inertial frames the frame conversions take. */
export const INERTIAL_FRAMES: readonly Choice[] = [
  { value: "J2000", tooltip: "Mean equator and equinox of J2000 by the IAU-76/FK5 theories (the default); within about 1 m of the GCRF in low orbit" },
  { value: "TEME", tooltip: "True equator, mean equinox: the frame of SGP4 and two-line element sets" },
];

/** Frames a satellite state may be given in to the ground-site functions. */
export const STATE_FRAMES: readonly Choice[] = [
  ...INERTIAL_FRAMES,
  { value: "ITRF", tooltip: "Earth-fixed (ITRF), taken as given, e.g. from INERTIAL_TO_EARTH_FIXED with Earth orientation data" },
];

/** Frames TLE_STATE gives the state in. */
export const TLE_FRAMES: readonly Choice[] = [
  { value: "J2000", tooltip: "Mean equator and equinox of J2000 (FK5), the sheet's inertial frame (the default)" },
  { value: "TEME", tooltip: "True equator, mean equinox: SGP4's own output, unrotated" },
  { value: "ITRF", tooltip: "Earth-fixed, rotated with UT1 = UTC and no polar motion (up to about 0.5 km off in low orbit)" },
];

/** The optional frame of a state, blank meaning J2000. */
export const frameOf = (choices: readonly Choice[]): Param<string> => choice("frame", choices, "J2000");

/** UT1 - UTC in s (IERS Bulletin A); blank is 0. */
export const dut1 = (): Param<number | null> => optNum("dut1", "s, UT1 - UTC");

/** Polar motion coordinates in arcsec (IERS Bulletin A); blank is 0. */
export const polar = (name: "polar_x" | "polar_y"): Param<number | null> => optNum(name, "arcsec");

/** A ground site's geodetic latitude, longitude (deg) and height (km) on WGS 84, in this order. */
export const siteParams = [num("site_latitude", "deg"), num("site_longitude", "deg"), num("site_height", "km")] as const;

/** The sheet's first and last instants as Julian dates: 1900-01-01 0h (serial 1) and up to, not including, 10000-01-01 0h. */
const FIRST_SHEET_JD = 1 + EXCEL_SERIAL_TO_JD + 1;
const END_SHEET_JD = MAX_EXCEL_SERIAL + 1 + EXCEL_SERIAL_TO_JD;

/**
 * A Julian date (UTC) as an Excel date serial (src/functions/dates.ts), or a bad argument naming
 * `parameter` when it falls outside the dates the sheet shows (1900-01-01 to 9999-12-31): the
 * inverse of the date readers over their whole span.
 */
export function sheetDate(parameter: string, jd: number): Result<number> {
  return jd >= FIRST_SHEET_JD && jd < END_SHEET_JD
    ? serialOfJulianDate(jd)
    : badArgument(parameter, jd, `a Julian date from ${FIRST_SHEET_JD} (1900-01-01 0h) up to ${END_SHEET_JD} (10000-01-01 0h, not included), the span of the sheet's dates`);
}

/** One line of a two-line element set: the text as pasted (src/core/tle.ts checks every column). */
export function tleLine(name: string, which: 1 | 2): Param<string> {
  const allowed = `line ${which} of a two-line element set as text (69 characters)`;
  return {
    name,
    optional: false,
    width: 1,
    read: (c) => (typeof c === "string" && c.trim() !== "" ? c : badArgument(name, c, allowed)),
  };
}

/**
 * The `source` of the pass functions, its whole range read as one list: two texts are a TLE pair
 * (line 1 then line 2, in a column or a row); seven cells are a J2000 state (x, y, z km, vx, vy,
 * vz km/s) and its epoch as a date (an Excel serial or ISO 8601 text, read as the date readers
 * do). Anything else is the core's refusal, which says what a source is.
 */
function readSource(cells: Cell[], name: string): PassSource | DomainError {
  if (cells.length === 7) {
    const epoch = julianDateOfCell(name, cells[6]);
    if (epoch instanceof DomainError) return epoch;
    return readPassSource([...cells.slice(0, 6), epoch]);
  }
  return readPassSource(cells);
}

export const passSource = (): ListParam<PassSource> => list("source", false, readSource);
