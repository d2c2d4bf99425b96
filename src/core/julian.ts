import { badArgument, badArgumentDescribed, type DomainError, type Result } from "./domain";
import { checkExcelDate, excelSerialToJulianDate, julianDateToExcelSerial, JD_UNIX_EPOCH, MAX_EXCEL_SERIAL, EXCEL_SERIAL_TO_JD, SECONDS_PER_DAY } from "./time";

/**
 * Julian dates (UTC unless a name says TT or UT1) and the Gregorian calendar. The sheet's dates
 * are Excel serials (src/core/time.ts holds the exact serial <-> JD offset); these functions take
 * and give Julian dates, the continuous day count astronomy and the trade's algorithms use.
 */

/** First Julian date the sheet can show (serial 61, 1900-03-01 0h) and the last (serial 2958466, 10000-01-01 0h). */
export const MIN_SHEET_JD = 61 + EXCEL_SERIAL_TO_JD;
export const MAX_SHEET_JD = MAX_EXCEL_SERIAL + 1 + EXCEL_SERIAL_TO_JD;

/**
 * Julian date of a Gregorian calendar date and time of day: Vallado, Fundamentals of
 * Astrodynamics and Applications, 4th ed., Alg. 14 (JULIAN DATE), valid from 1900 March 1 to
 * 2100 February 28 (its formula drops the century leap-year rule); the time of day in seconds is
 * added as a fraction of 86400 s. Kernel: no validation. Exact for whole days; the fraction is
 * rounded once (float64 spacing near JD 2.45e6 is 4.7e-10 day = 40 microseconds).
 */
export function julianDateFromCalendar(year: number, month: number, day: number, hour = 0, minute = 0, second = 0): number {
  const whole =
    367 * year - Math.floor((7 * (year + Math.floor((month + 9) / 12))) / 4) + Math.floor((275 * month) / 9) + day + 1721013.5;
  return whole + (hour * 3600 + minute * 60 + second) / SECONDS_PER_DAY;
}

/**
 * Julian date of 0h on January 1 of `year` plus `dayOfYear - 1` days (day 1.5 = January 1, 12h):
 * the epoch convention of two-line element sets (Vallado 4th ed. §3.6.1, day of the year).
 * Kernel: no validation; any Gregorian year 1901-2099.
 */
export const julianDateFromDayOfYear = (year: number, dayOfYear: number): number => julianDateFromCalendar(year, 1, 1) + (dayOfYear - 1);

/**
 * Gregorian calendar date of a Julian date (Vallado 4th ed. Alg. 22, INVJDAY, via the day of
 * the year), valid 1900-2100. Kernel: no validation. Seconds carry the float64 rounding of the
 * JD, about 40 microseconds.
 */
export function calendarFromJulianDate(jd: number): { year: number; month: number; day: number; hour: number; minute: number; second: number } {
  const t1900 = (jd - 2415019.5) / 365.25;
  let year = 1900 + Math.trunc(t1900);
  const leapDays = (y: number) => Math.trunc((y - 1900 - 1) * 0.25);
  let days = jd - 2415019.5 - ((year - 1900) * 365 + leapDays(year));
  if (days < 1) {
    year -= 1;
    days = jd - 2415019.5 - ((year - 1900) * 365 + leapDays(year));
  }
  const leap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
  const lengths = [31, leap ? 29 : 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
  let dayOfYear = Math.trunc(days);
  let month = 0;
  while (month < 11 && dayOfYear > lengths[month]) dayOfYear -= lengths[month++];
  let secondsOfDay = (days - Math.trunc(days)) * SECONDS_PER_DAY;
  const hour = Math.trunc(secondsOfDay / 3600);
  secondsOfDay -= hour * 3600;
  const minute = Math.trunc(secondsOfDay / 60);
  return { year, month: month + 1, day: dayOfYear, hour, minute, second: secondsOfDay - minute * 60 };
}

/** A Julian date the sheet can show as a date: 1900-03-01 0h (JD 2415079.5) to 9999-12-31 24h. */
export function checkJulianDate(parameter: string, jd: number): Result<number> {
  return jd >= MIN_SHEET_JD && jd <= MAX_SHEET_JD
    ? jd
    : badArgument(parameter, jd, `a Julian date from ${MIN_SHEET_JD} (1900-03-01) to ${MAX_SHEET_JD} (9999-12-31 24h), the span of the sheet's dates`);
}

/** Julian date (UTC) of an Excel date serial (UTC): JD = serial + 2415018.5, exact from serial 61 (1900-03-01) on. */
export function julianDateFromSerial(date: number): Result<number> {
  const checked = checkExcelDate("date", date);
  return typeof checked === "number" ? excelSerialToJulianDate(checked) : checked;
}

/** Excel date serial (UTC) of a Julian date (UTC); the inverse of julianDateFromSerial, exact to float64 rounding. */
export function dateFromJulian(julianDate: number): Result<number> {
  const checked = checkJulianDate("julian_date", julianDate);
  return typeof checked === "number" ? julianDateToExcelSerial(checked) : checked;
}

/**
 * The proleptic Gregorian year a Julian date falls in (astronomical numbering: 0 is 1 BC), for
 * messages ("a date in the year 8637"), through the language's own calendar arithmetic, exact
 * over +-270,000 years.
 */
export const yearOfJulianDate = (jd: number): number => new Date((jd - JD_UNIX_EPOCH) * SECONDS_PER_DAY * 1000).getUTCFullYear();

/** A Julian date described for a message: "a date in the year 8637 (Julian date 4876018.5)". */
export function describeJulianDate(jd: number): string {
  if (!Number.isFinite(jd)) return "no date";
  const y = yearOfJulianDate(jd);
  return `a date in the year ${y > 0 ? y : `${1 - y} BC`} (Julian date ${Number(jd.toPrecision(12))})`;
}

/** A Julian date outside a model's span: the bad argument, with the date described in calendar words. */
export const dateOutside = (parameter: string, jd: number, allowed: string): DomainError => badArgumentDescribed(parameter, describeJulianDate(jd), allowed);
