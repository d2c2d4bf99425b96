import { describe, expect, it } from "vitest";
import { calendarFromJulianDate, checkJulianDate, dateFromJulian, julianDateFromCalendar, julianDateFromDayOfYear, julianDateFromSerial } from "../../src/core/julian";
import { err, expectError, expectPrinted, ok } from "../support/expect";

describe("Julian dates (Vallado 4th ed. Alg. 14 and 22)", () => {
  it.each([
    // [year, month, day, h, min, s, JD, decimals printed, source]
    [1996, 10, 26, 14, 20, 0, 2450383.09722222, 8, "Vallado 4th ed. Example 3-4"],
    [2000, 1, 1, 12, 0, 0, 2451545.0, 9, "J2000.0 (IAU definition: 2000 January 1, 12h, JD 2451545.0)"],
    [2004, 4, 6, 7, 51, 28.386009, 2453101.827411875, 9, "Vallado 4th ed. Example 3-15: JD_UTC of 2004-04-06 07:51:28.386009"],
    [1900, 3, 1, 0, 0, 0, 2415079.5, 9, "Excel serial 61 = 1900-03-01, JD = serial + 2415018.5 (src/core/time.ts)"],
  ] as const)("%i-%i-%i %i:%i:%f is JD %f (%s)", (y, mo, d, h, mi, s, jd, decimals, _source) => {
    expectPrinted(julianDateFromCalendar(y, mo, d, h, mi, s), jd, decimals);
  });

  it("inverts a Julian date to the calendar (Vallado 4th ed. Example 3-13: JD 2449877.3458762 is 1995-06-08 20:18:03.70370 UT)", () => {
    const c = calendarFromJulianDate(2449877.3458762);
    expect([c.year, c.month, c.day, c.hour, c.minute]).toEqual([1995, 6, 8, 20, 18]);
    expect(Math.abs(c.second - 3.7037)).toBeLessThan(1e-3);
  });

  it("round-trips calendar -> JD -> calendar across leap years and month ends", () => {
    for (let jd = 2415079.5; jd < 2488069.5; jd += 37.123) {
      const c = calendarFromJulianDate(jd);
      expect(Math.abs(julianDateFromCalendar(c.year, c.month, c.day, c.hour, c.minute, c.second) - jd)).toBeLessThan(1e-8);
    }
  });

  it("counts the day of the year as TLE epochs do: day 1.5 of 2026 is 2026-01-01 12h", () => {
    expect(julianDateFromDayOfYear(2026, 1.5)).toBe(julianDateFromCalendar(2026, 1, 1, 12));
    expect(julianDateFromDayOfYear(2024, 366)).toBe(julianDateFromCalendar(2024, 12, 31));
  });

  it("converts sheet serials both ways exactly (serial 46000 = 2025-12-09)", () => {
    expect(ok(julianDateFromSerial(46000))).toBe(46000 + 2415018.5);
    expect(ok(dateFromJulian(ok(julianDateFromSerial(46000.25))))).toBe(46000.25);
    expectError(julianDateFromSerial(60), "bad_argument", "date");
    expectError(dateFromJulian(2415079), "bad_argument", "julian_date");
    expect(err(checkJulianDate("start", NaN)).message).toMatch(/^start: got NaN; expected a Julian date/);
  });
});
