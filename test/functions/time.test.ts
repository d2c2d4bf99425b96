import "../support/customFunctions";
import * as Astronomy from "astronomy-engine";
import { describe, expect, it } from "vitest";
import * as family from "../../src/functions/time";
import { code, msg, only, sheet } from "./cells";

const { dateFromJulian, julianDate, siderealTime, timeScaleOffset } = sheet(family);

// Family "Time and rotation" at the sheet level: dates as serials or ISO text, the choice words of
// time scales and sidereal kinds, published values through the sheet, and errors in the cell.

const RAD = 180 / Math.PI;

describe("JULIAN_DATE and DATE_FROM_JULIAN", () => {
  it("give the Julian dates of the calendar's fixed points", () => {
    // J2000.0 is JD 2451545.0 TT by definition (IAU 1976); as a UTC date the same number.
    expect(only(julianDate("2000-01-01T12:00Z"))).toBe(2451545.0);
    // Vallado 4th ed. Example 3-4: 1996-10-26 14:20:00 UT is JD 2450383.09722222 (from memory).
    expect(Math.abs((only(julianDate("1996-10-26T14:20:00Z")) as number) - 2450383.09722222)).toBeLessThan(5e-9);
    // Excel's 1900 system: serial 61 is 1900-03-01 (JD 2415079.5), serial 59 is 1900-02-28, serial 1 is 1900-01-01.
    expect(only(julianDate(61))).toBe(2415079.5);
    expect(only(julianDate(59))).toBe(2415078.5);
    expect(only(julianDate(1))).toBe(2415020.5);
    expect(code(only(julianDate(60)))).toBe("#VALUE!");
  });

  it("agree with astronomy-engine 2.1.19 (its UT day count from J2000 plus 2451545) to 1e-9 day over 1901-2099", () => {
    for (let year = 1901; year < 2100; year += 7) {
      const iso = `${year}-0${1 + (year % 9)}-1${year % 10}T0${year % 10}:2${year % 7}:3${year % 5}Z`;
      const reference = Astronomy.MakeTime(new Date(iso)).ut + 2451545;
      expect(Math.abs((only(julianDate(iso)) as number) - reference)).toBeLessThan(1e-9);
    }
  });

  it("are inverses: serial -> JD -> serial to 5e-10 day (float64 spacing at JD 2.5e6), JD -> serial -> JD exactly (up to JD 4830037, where JD - 2415018.5 is exact)", () => {
    const serials = [1, 59, 59.999, 61, 61.25, 36526.5, 46172.5, 46174.123456789, 2958465.999];
    const jds = julianDate(serials.map((s) => [s])) as number[][];
    const back = dateFromJulian(jds) as number[][];
    serials.forEach((s, k) => expect(Math.abs(back[k][0] - s)).toBeLessThan(5e-10));
    for (const jd of [2415020.5, 2415079.25, 2451545.0, 2461191.123, 4000000.25]) expect(only(julianDate(only(dateFromJulian(jd))))).toBe(jd);
  });

  it("refuses Julian dates outside the sheet's dates, naming julian_date", () => {
    for (const jd of [2415020.4, 5373484.5, -1, "2026-01-01", true]) {
      expect(code(only(dateFromJulian(jd)))).toBe("#VALUE!");
      expect(msg(only(dateFromJulian(jd)))).toMatch(/^julian_date: got /);
    }
    expect(msg(only(julianDate("30 May 2026")))).toMatch(/^date: got "30 May 2026"; expected an Excel date serial/);
  });
});

describe("TIME_SCALE_OFFSET", () => {
  it("gives the leap-second offsets of IERS Bulletin C and the defined constants", () => {
    expect(only(timeScaleOffset("2026-05-30T12:00Z", "UTC", "TAI"))).toBe(37); // Bulletin C 72: TAI - UTC = 37 s since 2017
    expect(only(timeScaleOffset("2026-05-30T12:00Z", "UTC", "TT"))).toBeCloseTo(69.184, 12); // + 32.184 s (IAU 1991 A4)
    expect(only(timeScaleOffset("2026-05-30T12:00Z", "UTC", "GPS"))).toBe(18); // GPS - UTC = 18 s since 2017 (from memory)
    expect(only(timeScaleOffset("2026-05-30T12:00Z", "tt", "tai"))).toBeCloseTo(-32.184, 12); // words are case-insensitive
    // The last step: 36 s through 2016-12-31 23:59:59 UTC, 37 s from 2017-01-01 0h (Bulletin C 52, number from memory).
    expect(only(timeScaleOffset("2016-12-31T23:59:59Z", "UTC", "TAI"))).toBe(36);
    expect(only(timeScaleOffset("2017-01-01T00:00Z", "UTC", "TAI"))).toBe(37);
  });

  it("gives Vallado 4th ed. Example 3-15's UT1 and TT (dAT = 32 s, dUT1 = -0.4399619 s)", () => {
    expect(only(timeScaleOffset("2004-04-06T07:51:28.386009Z", "UTC", "UT1", -0.4399619))).toBeCloseTo(-0.4399619, 12);
    expect(only(timeScaleOffset("2004-04-06T07:51:28.386009Z", "UT1", "TT", -0.4399619))).toBeCloseTo(64.184 + 0.4399619, 12);
  });

  it("is #N/A through UTC before 1972, #VALUE! for UT1 without dut1, and offers its scales as choices", () => {
    expect(code(only(timeScaleOffset("1971-12-31", "UTC", "TAI")))).toBe("#N/A");
    expect(msg(only(timeScaleOffset("1971-12-31", "UTC", "TAI")))).toMatch(/^date: the leap-second table starts on 1972-01-01/);
    expect(only(timeScaleOffset("1971-12-31", "TAI", "TT"))).toBeCloseTo(32.184, 12);
    expect(msg(only(timeScaleOffset("2026-01-01", "UTC", "UT1")))).toMatch(/^dut1: got \(blank\); expected UT1 - UTC in s/);
    expect(msg(only(timeScaleOffset("2026-01-01", "UTC", "TDB")))).toBe('to: got "TDB"; expected one of "UTC", "TAI", "TT", "GPS", "UT1".');
  });

  it("lifts over a column of dates across a leap second", () => {
    const out = timeScaleOffset([["2015-06-30T23:59:59Z"], ["2015-07-01T00:00Z"]], "UTC", "TAI") as number[][];
    expect(out).toEqual([[35], [36]]); // a leap second at the end of June 2015 (Bulletin C 49, number from memory)
  });
});

describe("SIDEREAL_TIME", () => {
  it("gives Vallado 4th ed. Example 3-5: GMST on 1992-08-20 12:14 UT1 is 152.578787810 deg", () => {
    expect(Math.abs((only(siderealTime("1992-08-20T12:14Z")) as number) - 152.57878781)).toBeLessThan(1e-8);
  });

  it("gives SOFA's iauEra00(2400000.5, 54388.0) = 0.4022837240028158102 rad as the ERA, and GAST a few arcsec from GMST", () => {
    // MJD 54388.0 (JD 2454388.5) is Excel serial 39370, 2007-10-15 0h.
    expect(Math.abs((only(siderealTime(39370, null, "ERA")) as number) - 0.4022837240028158102 * RAD)).toBeLessThan(1e-9);
    const gmst = only(siderealTime("2026-05-30T12:00Z")) as number;
    const gast = only(siderealTime("2026-05-30T12:00Z", 0, "gast")) as number;
    expect(Math.abs(gast - gmst) * 3600).toBeLessThan(18); // the equation of the equinoxes stays within about 1.2 s of time, 18 arcsec (common practice)
    expect(Math.abs(gast - gmst)).toBeGreaterThan(0);
  });

  it("turns by dut1: 0.9 s of UT1 is 0.9 x 1.0027379 s of rotation", () => {
    const a = only(siderealTime("2026-05-30T12:00Z", 0)) as number;
    const b = only(siderealTime("2026-05-30T12:00Z", 0.9)) as number;
    // 1 s of time is 1/240 deg; the float64 Julian date resolves 40 microseconds, so dut1 is good to 2e-5 s.
    expect(Math.abs((b - a) * 240 - 0.9 * 1.0027379)).toBeLessThan(2.5e-5);
  });

  it("refuses an unknown kind and a dut1 beyond a second", () => {
    expect(msg(only(siderealTime("2026-05-30", null, "LMST")))).toBe('kind: got "LMST"; expected one of "GMST", "GAST", "ERA".');
    expect(code(only(siderealTime("2026-05-30", 2)))).toBe("#VALUE!");
  });
});
