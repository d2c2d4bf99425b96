import { badArgument, badArgumentDescribed, DomainError, type Result } from "../core/domain";
import { EXCEL_SERIAL_TO_JD, JD_UNIX_EPOCH, MAX_EXCEL_SERIAL } from "../core/time";

/**
 * Dates as the sheet gives them, turned into Julian dates (UTC) for the core.
 *
 * Excel date serials follow Excel's 1900 date system: serial 1 is 1900-01-01 and serial 61 is
 * 1900-03-01, but serial 60 is 1900-02-29, a day that did not exist (the system keeps a leap day
 * 1900 never had, for compatibility with early spreadsheets). So from serial 61 on,
 * JD = serial + 2415018.5 exactly; below 60 the count is one day shorter, JD = serial + 2415019.5;
 * serial 60 itself is refused. The last serial Excel shows as a date is 2958465 (9999-12-31).
 * (Microsoft, "Excel incorrectly assumes that the year 1900 is a leap year"; the 1904 date system
 * of old Mac workbooks is not read: such a workbook's serials are 1462 days smaller.)
 *
 * Text in ISO 8601's extended calendar form is read too, as UTC unless it carries an offset:
 * "2028-11-28", "2028-11-28T06:00", "2028-11-28 06:00:30.25", "2028-11-28T06:00Z",
 * "2028-11-28T08:00+02:00". Years 0001 to 9999 of the proleptic Gregorian calendar.
 */

const MS_PER_DAY = 86_400_000;

const SERIAL_RANGE = `an Excel date serial from 1 (1900-01-01) to ${MAX_EXCEL_SERIAL} (9999-12-31), or ISO 8601 text such as "2028-11-28" or "2028-11-28T06:00Z" (UTC)`;

/** The Julian date (UTC) of an Excel 1900-system date serial, or why it is not one. */
export function julianDateOfSerial(parameter: string, serial: number): Result<number> {
  if (!Number.isFinite(serial) || serial < 1 || serial >= MAX_EXCEL_SERIAL + 1)
    return badArgument(parameter, serial, serial >= 0 && serial < 1 ? `${SERIAL_RANGE}; a value below 1 is a time of day without a date` : SERIAL_RANGE);
  if (serial >= 60 && serial < 61)
    return badArgument(parameter, serial, `${SERIAL_RANGE}, not 60: Excel's 1900 date system shows serial 60 as 1900-02-29, a day that did not exist`);
  return serial + EXCEL_SERIAL_TO_JD + (serial < 60 ? 1 : 0);
}

/** The Excel date serial of a Julian date (UTC), for dates a function gives back to the sheet. */
export function serialOfJulianDate(jd: number): number {
  const serial = jd - EXCEL_SERIAL_TO_JD;
  return serial < 61 ? serial - 1 : serial;
}

const ISO = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(\.\d+)?)?)?(Z|[+-]\d{2}:?\d{2})?$/i;

/** The Julian date (UTC) of ISO 8601 date or date-time text, or why it is not one. */
export function julianDateOfText(parameter: string, text: string): Result<number> {
  const m = ISO.exec(text.trim());
  const bad = () => badArgumentDescribed(parameter, JSON.stringify(text.length > 40 ? text.slice(0, 37) + "..." : text), SERIAL_RANGE);
  if (!m) return bad();
  const [year, month, day] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const [hour, minute, second] = [Number(m[4] ?? 0), Number(m[5] ?? 0), Number(m[6] ?? 0)];
  const fraction = m[7] ? Number(m[7]) : 0;
  if (year < 1 || month < 1 || month > 12 || hour > 24 || minute > 59 || second > 60 || (hour === 24 && (minute > 0 || second > 0 || fraction > 0))) return bad();
  const d = new Date(0);
  d.setUTCFullYear(year, month - 1, day);
  if (d.getUTCMonth() !== month - 1 || d.getUTCDate() !== day) return bad();
  let offsetMinutes = 0;
  if (m[8] && m[8].toUpperCase() !== "Z") {
    const z = m[8].replace(":", "");
    const sign = z[0] === "-" ? -1 : 1;
    const oh = Number(z.slice(1, 3));
    const om = Number(z.slice(3, 5));
    if (oh > 23 || om > 59) return bad();
    offsetMinutes = sign * (oh * 60 + om);
  }
  // Whole milliseconds through Date (exact), the sub-millisecond rest added to the day fraction.
  const ms = d.getTime() + ((hour * 60 + minute - offsetMinutes) * 60 + second) * 1000;
  return JD_UNIX_EPOCH + ms / MS_PER_DAY + fraction / 86400;
}

/** A sheet date: a serial or ISO text, as a Julian date (UTC); other values are refused. */
export function julianDateOfCell(parameter: string, cell: unknown): Result<number> {
  if (typeof cell === "number") return julianDateOfSerial(parameter, cell);
  if (typeof cell === "string" && cell.trim() !== "") return julianDateOfText(parameter, cell);
  return cell instanceof DomainError ? cell : badArgument(parameter, cell, SERIAL_RANGE);
}
