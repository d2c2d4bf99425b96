import { badArgument, type Result } from "./domain";

/**
 * Excel date serials (1900 date system) to Julian dates, UTC. Serial 1 is 1900-01-01; Excel
 * counts a fictitious 1900-02-29 as serial 60, so from serial 61 (1900-03-01) on,
 * JD = serial + 2415018.5 exactly; serials below 61 are refused rather than silently off by a day.
 * Dates are taken as TDB where a theory wants it: the TT-UTC offset (about 69 s in 2026) is far
 * below the accuracy of the low-precision theories that read them.
 */
export const EXCEL_SERIAL_TO_JD = 2415018.5;
export const JD_J2000 = 2451545.0;
/** Julian date of Unix time 0, 1970-01-01 0h UTC (the epoch of the language's Date). */
export const JD_UNIX_EPOCH = 2440587.5;
export const DAYS_PER_JULIAN_CENTURY = 36525;
export const SECONDS_PER_DAY = 86400;

/** Latest serial Excel shows as a date (9999-12-31). */
export const MAX_EXCEL_SERIAL = 2958465;

export function checkExcelDate(parameter: string, serial: number): Result<number> {
  if (!(serial >= 61 && serial <= MAX_EXCEL_SERIAL + 1))
    return badArgument(parameter, serial, "an Excel date serial between 61 (1900-03-01) and 2958465 (9999-12-31)");
  return serial;
}

export const excelSerialToJulianDate = (serial: number): number => serial + EXCEL_SERIAL_TO_JD;
export const julianDateToExcelSerial = (jd: number): number => jd - EXCEL_SERIAL_TO_JD;
