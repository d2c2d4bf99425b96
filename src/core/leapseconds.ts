/**
 * The leap-second table: TAI - UTC in whole seconds from each step date (0h UTC on the 1st of the
 * month) since UTC took its present form on 1972-01-01. Data, kept with its source:
 *
 *   Source: IERS Earth Orientation Centre, Bulletin C (Paris Observatory), the announcements
 *   numbered up to Bulletin C 72 (Paris, 6 July 2026), as collected in the IERS file
 *   leap-seconds.list (its NTP-second step dates and values are checked in
 *   test/core/leapseconds.test.ts). Bulletin C 72: "NO leap second will be introduced at the end of
 *   December 2026"; from 2017 January 1, 0h UTC, until further notice UTC - TAI = -37 s.
 *
 * Validity: a leap second can only fall at the end of June or December and is announced in the
 * bulletin of about six months before. Bulletin C 72 rules one out at the end of December 2026, so
 * this table is exact for every UTC instant before 2027-07-01 0h (JD 2461587.5); for later dates
 * it gives 37 s, the value "until further notice". A test fails once the clock passes that date,
 * so the table is brought up to date from the next bulletin (C 73, due January 2027).
 */

/** [year, month, TAI - UTC in s from 0h UTC on the 1st of that month]. */
export const LEAP_SECOND_STEPS: ReadonlyArray<readonly [number, number, number]> = [
  [1972, 1, 10],
  [1972, 7, 11],
  [1973, 1, 12],
  [1974, 1, 13],
  [1975, 1, 14],
  [1976, 1, 15],
  [1977, 1, 16],
  [1978, 1, 17],
  [1979, 1, 18],
  [1980, 1, 19],
  [1981, 7, 20],
  [1982, 7, 21],
  [1983, 7, 22],
  [1985, 7, 23],
  [1988, 1, 24],
  [1990, 1, 25],
  [1991, 1, 26],
  [1992, 7, 27],
  [1993, 7, 28],
  [1994, 7, 29],
  [1996, 1, 30],
  [1997, 7, 31],
  [1999, 1, 32],
  [2006, 1, 33],
  [2009, 1, 34],
  [2012, 7, 35],
  [2015, 7, 36],
  [2017, 1, 37],
];

/** The bulletin the table is complete up to. */
export const LEAP_SECONDS_BULLETIN = "IERS Bulletin C 72 (Paris, 6 July 2026)";

/** First UTC instant the table no longer decides: 2027-07-01 0h UTC, the first possible step after Bulletin C 72. */
export const LEAP_SECONDS_VALID_UNTIL_JD = 2461587.5;
