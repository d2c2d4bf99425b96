import { convertUnit as coreConvertUnit, UNIT_NAMES } from "../core/units";
import { family } from "./define";
import { num, text } from "./params";

// Family "Units": conversion between the units of the trade (src/core/units.ts lists them).

const unitName = `a unit name, one of ${UNIT_NAMES}`;

const define = family("Units");

const CONVERT_UNIT = define.scalar("CONVERT_UNIT", [num("value"), text("from", unitName), text("to", unitName)], coreConvertUnit, {
  example: [690, "km", "m"],
  terms: ["unit conversion", "metres to kilometres", "degrees to radians", "au"],
});
/**
 * Converts a value between the trade's units: length km, m, au (IAU 2012: exactly 149 597 870.7 km); time s, min, h, day (86400 s), yr (Julian year, 365.25 days); speed km/s, m/s; GM km3/s2, m3/s2; angle deg, rad. Unit names are case-insensitive. An unknown unit, or a pair of different quantities (km to s), is #VALUE! listing what is accepted.
 * @customfunction CONVERT_UNIT
 * @helpurl https://localhost:3000/reference.html#convert_unit
 * @param value The number to convert, in the unit from.
 * @param from Unit of value, e.g. "au", "km/s" or "deg".
 * @param to Unit wanted, of the same quantity, e.g. "km", "m/s" or "rad".
 * @returns The value in the unit to.
 */
export function convertUnit(value: any[][], from: any[][], to: any[][]): any[][] {
  return CONVERT_UNIT(arguments);
}
