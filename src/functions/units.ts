import { convertUnit as coreConvertUnit, UNIT_ALLOWED, UNIT_CHOICES } from "../core/units";
import { family } from "./define";
import { num, suggesting, text } from "./params";

// Family "Units": conversion between the units of the trade (src/core/units.ts lists them).

const unit = (name: string) => suggesting(text(name, UNIT_ALLOWED), UNIT_CHOICES);

const define = family("Units");

const CONVERT_UNIT = define.scalar("CONVERT_UNIT", [num("value"), unit("from"), unit("to")], coreConvertUnit, {
  example: [690, "km", "m"],
  terms: ["unit conversion", "metres to kilometres", "degrees to radians", "au"],
});
/**
 * Converts a value between the trade's units: length km, m, au (IAU 2012: exactly 149 597 870.7 km), ft, mi, nmi (international foot, mile and nautical mile); time s, min, h, day (86400 s), yr (Julian year, 365.25 days); speed km/s, m/s, km/h; GM km3/s2, m3/s2; angle deg, rad, arcmin, arcsec; mass kg, lb (0.45359237 kg). Unit names are case-insensitive and take the usual spellings (days or d, hr or hour, km^3/s^2 or km³/s², degrees, lbs). Refuses (#VALUE!) an unknown unit, listing the units of the other one's quantity, and a pair of different quantities (km to s).
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
