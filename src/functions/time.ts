import { siderealTime as coreSiderealTime } from "../core/sidereal";
import { timeScaleOffset as coreTimeScaleOffset } from "../core/timescales";
import { family } from "./define";
import { dut1, sheetDate } from "./groundargs";
import { choice, date, num } from "./params";

// Family "Time and rotation": Julian dates, the offsets between the time scales of the trade, and
// the Earth's rotation angle. Dates are Excel date serials (1900 date system) or ISO 8601 text, in
// UTC (README, "Dates and time scales"). Examples: the epoch of the invented Skerry-1 element set,
// 2026-05-30 12:00 UTC.

const TIME_SCALES = [
  { value: "UTC", tooltip: "Coordinated Universal Time: the sheet's dates, with leap seconds" },
  { value: "TAI", tooltip: "International Atomic Time: UTC plus the leap seconds (37 s since 2017)" },
  { value: "TT", tooltip: "Terrestrial Time: TAI + 32.184 s, the time scale of ephemerides" },
  { value: "GPS", tooltip: "GPS system time: TAI − 19 s" },
  { value: "UT1", tooltip: "Universal Time from the Earth's rotation: UTC + dut1 (give dut1)" },
];

const define = family("Time and rotation");

const JULIAN_DATE = define.scalar("JULIAN_DATE", [date("date")], (jd) => jd, {
  example: ["2026-05-30T12:00Z"],
  terms: ["JD", "Julian day", "day number", "date to Julian", "epoch"],
});
/**
 * Julian date of a date and time in UTC: days since noon of 4713 BC January 1 (proleptic Julian calendar), the continuous day count of astronomy. Exact: from 1900-03-01 on, JD = serial + 2415018.5 (one day more before it, where Excel counts a 1900-02-29 that did not exist; serial 60 itself is refused).
 * @customfunction JULIAN_DATE
 * @helpurl https://localhost:3000/reference.html#julian_date
 * @param date Date and time, UTC: an Excel date serial or ISO 8601 text such as "2026-05-30T12:00Z".
 * @returns Julian date (UTC), days.
 */
export function julianDate(date: any[][]): any[][] {
  return JULIAN_DATE(arguments);
}

const DATE_FROM_JULIAN = define.scalar("DATE_FROM_JULIAN", [num("julian_date", "days")], (jd) => sheetDate("julian_date", jd), {
  example: [2461191.0],
  terms: ["JD to date", "Julian day", "calendar date", "convert Julian"],
});
/**
 * Excel date serial (UTC) of a Julian date: the inverse of JULIAN_DATE over the dates the sheet shows (1900-01-01 to 9999-12-31). Format the cell as a date to read it. Exact to float64 rounding (about 40 microseconds).
 * @customfunction DATE_FROM_JULIAN
 * @helpurl https://localhost:3000/reference.html#date_from_julian
 * @param julian_date Julian date (UTC), days, from 2415020.5 (1900-01-01).
 * @returns Date serial, UTC.
 */
export function dateFromJulian(julian_date: any[][]): any[][] {
  return DATE_FROM_JULIAN(arguments);
}

const TIME_SCALE_OFFSET = define.scalar(
  "TIME_SCALE_OFFSET",
  [date("date"), choice("from", TIME_SCALES), choice("to", TIME_SCALES), dut1()],
  coreTimeScaleOffset,
  { example: ["2026-05-30T12:00Z", "UTC", "TT"], terms: ["leap seconds", "TAI-UTC", "delta T", "TT-UTC", "GPS time", "UT1", "time systems"] },
);
/**
 * Seconds to add to a clock reading on one time scale to get the reading on another at a given instant (UTC to TT: 69.184 s since 2017). Leap seconds from the table of IERS Bulletin C 72 (exact up to 2027-07-01; later dates take the last value, 37 s, until a new leap second is announced); TT − TAI = 32.184 s and TAI − GPS = 19 s exactly. #N/A for a conversion through UTC or UT1 before 1972, when UTC took its present form.
 * @customfunction TIME_SCALE_OFFSET
 * @helpurl https://localhost:3000/reference.html#time_scale_offset
 * @param date The instant, UTC: an Excel date serial or ISO 8601 text.
 * @param from Time scale of the reading: "UTC", "TAI", "TT", "GPS" or "UT1".
 * @param to Time scale wanted: "UTC", "TAI", "TT", "GPS" or "UT1".
 * @param [dut1] UT1 − UTC, s, from IERS Bulletin A (within ±0.9 s); required for a conversion to or from UT1.
 * @returns Offset to − from, s.
 */
export function timeScaleOffset(date: any[][], from: any[][], to: any[][], dut1?: any[][]): any[][] {
  return TIME_SCALE_OFFSET(arguments);
}

const SIDEREAL_TIME = define.scalar(
  "SIDEREAL_TIME",
  [
    date("date"),
    dut1(),
    choice(
      "kind",
      [
        { value: "GMST", tooltip: "Greenwich mean sidereal time, IAU 1982 (the default; the angle SGP4 and the TEME frame use)" },
        { value: "GAST", tooltip: "Greenwich apparent sidereal time: GMST plus the equation of the equinoxes (IAU-1980 nutation)" },
        { value: "ERA", tooltip: "Earth rotation angle, IAU 2000: the angle of the CIO-based frames" },
      ],
      "GMST",
    ),
  ],
  coreSiderealTime,
  { example: ["2026-05-30T12:00Z"], terms: ["GMST", "GAST", "Earth rotation angle", "ERA", "Greenwich hour angle", "star time"] },
);
/**
 * The Earth's rotation angle at an instant, deg (0 to 360): Greenwich mean sidereal time (IAU 1982, Vallado 4th ed. Eq. 3-47), apparent sidereal time (with the IAU-1980 equation of the equinoxes) or the Earth rotation angle (IAU 2000). Checked against Vallado's Examples 3-5 and 3-15 and SOFA's test values (1e-12 rad); leaving dut1 blank puts up to 0.9 s of rotation, 0.004°, in the answer.
 * @customfunction SIDEREAL_TIME
 * @helpurl https://localhost:3000/reference.html#sidereal_time
 * @param date The instant, UTC: an Excel date serial or ISO 8601 text.
 * @param [dut1] UT1 − UTC, s, from IERS Bulletin A (blank: 0).
 * @param [kind] "GMST" (default), "GAST" or "ERA".
 * @returns Angle, deg.
 */
export function siderealTime(date: any[][], dut1?: any[][], kind?: any[][]): any[][] {
  return SIDEREAL_TIME(arguments);
}
