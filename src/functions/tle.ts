import { withAll } from "../core/domain";
import { tleElements as coreTleElements } from "../core/tle";
import { tleState as coreTleState } from "../core/tlestate";
import { family } from "./define";
import { frameOf, sheetDate, TLE_FRAMES, tleLine } from "./groundargs";
import { date, STATE_LABELS } from "./params";

// Family "Two-line element sets": the fields of a TLE, every column checked, and the state of the
// object by SGP4 (satellite.js 6.0.2). A column of line 1 cells beside a column of line 2 cells
// lifts like any other range. Examples: the invented Skerry-1 element set (catalogue number
// 99001, designator 26999A, both invented; test/support/skerry.ts).

const LINE1 = "1 99001U 26999A   26150.50000000  .00000210  00000-0  21000-4 0  9993";
const LINE2 = "2 99001  98.1900 135.0000 0001200  90.0000 270.0000 14.60983543  1057";

const define = family("Two-line element sets");

const TLE_ELEMENTS = define.rows(
  "TLE_ELEMENTS",
  ["epoch (UTC)", "inclination (deg)", "RAAN (deg)", "eccentricity", "argument of perigee (deg)", "mean anomaly (deg)", "mean motion (rev/day)", "B* (1/Earth radii)"],
  [tleLine("line1", 1), tleLine("line2", 2)],
  (line1, line2) => withAll([coreTleElements(line1, line2)], ([epoch, ...rest]) => withAll([sheetDate("line1", epoch)], (serial) => [serial, ...rest])),
  { example: [LINE1, LINE2, true], terms: ["TLE", "two-line elements", "NORAD elements", "mean elements", "element set", "B star"] },
);
/**
 * The fields of a two-line element set: epoch, inclination, RAAN, eccentricity, argument of perigee, mean anomaly, mean motion and the drag term B*. Every column is checked against the format (Spacetrack Report No. 3; Vallado et al., AIAA 2006-6753), with the checksum of each line and the epoch-year rule (57–99 are 1957–1999, 00–56 are 2000–2056): a bad line is #VALUE! naming the column and what it should hold. These are SGP4 mean elements, not osculating ones: they give the right orbit only through SGP4 (TLE_STATE).
 * @customfunction TLE_ELEMENTS
 * @helpurl https://localhost:3000/reference.html#tle_elements
 * @param line1 Line 1 of the element set, as text (69 characters, starting "1 ").
 * @param line2 Line 2 of the element set, as text (69 characters, starting "2 ").
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per element set: epoch (UTC date serial), inclination (deg), RAAN (deg), eccentricity, argument of perigee (deg), mean anomaly (deg), mean motion (rev/day), B* (1/Earth radii).
 */
export function tleElements(line1: any[][], line2: any[][], include_header?: any[][]): any[][] {
  return TLE_ELEMENTS(arguments);
}

const TLE_STATE = define.rows("TLE_STATE", STATE_LABELS, [tleLine("line1", 1), tleLine("line2", 2), date("date"), frameOf(TLE_FRAMES)], coreTleState, {
  example: [LINE1, LINE2, "2026-05-30T12:00Z"],
  terms: ["SGP4", "SDP4", "propagate TLE", "satellite position", "element set state", "TEME"],
});
/**
 * The state of the object of a two-line element set at a date by SGP4/SDP4 (satellite.js 6.0.2, checked against the verification set of Vallado et al., AIAA 2006-6753, to its printed digits), after every column of both lines is checked. Frame J2000 (default; TEME rotated through true of date), TEME (SGP4's own) or ITRF (UT1 = UTC, no polar motion: up to about 0.5 km off in low orbit; give the TEME state to INERTIAL_TO_EARTH_FIXED with Earth orientation data instead). SGP4 itself is good to about 1 km at the element set's epoch, growing by 1–3 km a day away from it: planning values, not for operations, conjunction or collision work. #N/A where SGP4 stops (decay, or an eccentricity driven out of range).
 * @customfunction TLE_STATE
 * @helpurl https://localhost:3000/reference.html#tle_state
 * @param line1 Line 1 of the element set, as text.
 * @param line2 Line 2 of the element set, as text.
 * @param date The instant, UTC: an Excel date serial or ISO 8601 text.
 * @param [frame] Frame of the result: "J2000" (default), "TEME" or "ITRF".
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: x, y, z (km), vx, vy, vz (km/s).
 */
export function tleState(line1: any[][], line2: any[][], date: any[][], frame?: any[][], include_header?: any[][]): any[][] {
  return TLE_STATE(arguments);
}
