import "../support/customFunctions";
import { describe, expect, it } from "vitest";
import { isDomainError } from "../../src/core/domain";
import { julianDateOfCell, julianDateOfSerial, julianDateOfText, serialOfJulianDate } from "../../src/functions/dates";

// Excel's 1900 date system: serial 1 = 1900-01-01, 59 = 1900-02-28, 60 = the fictitious 1900-02-29,
// 61 = 1900-03-01 (Microsoft support article "Excel incorrectly assumes that the year 1900 is a leap
// year", from memory). Julian dates of those days from the Gregorian calendar: JD of 1900-01-01 0h
// UTC is 2415020.5 (Meeus, Astronomical Algorithms, 2nd ed., ch. 7: JD 2415020.0 is 1899-12-31 12h).
const jd = (cell: unknown) => julianDateOfCell("date", cell);

describe("Excel date serials in the 1900 date system", () => {
  it("count serial 1 as 1900-01-01 and 61 as 1900-03-01, so serial 32 is 1900-02-01 as Excel shows it", () => {
    expect(jd(1)).toBe(2415020.5);
    expect(jd(32)).toBe(2415020.5 + 31); // 1900-02-01
    expect(jd(59)).toBe(2415020.5 + 58); // 1900-02-28
    expect(jd(61)).toBe(2415020.5 + 59); // 1900-03-01: the day after 1900-02-28
    expect(jd(46388.5)).toBe(46388.5 + 2415018.5); // 2027-01-01 12h
  });

  it("refuse serial 60, the 1900-02-29 that never was, and say why", () => {
    const e = julianDateOfSerial("date", 60.25);
    expect(isDomainError(e) && e.message).toMatch(/^date: got 60.25; expected .*not 60: Excel's 1900 date system shows serial 60 as 1900-02-29, a day that did not exist\.$/);
  });

  it("refuse a time of day without a date and a serial past 9999-12-31 (a Unix time in seconds, say)", () => {
    expect((jd(0.5) as { message: string }).message).toMatch(/a value below 1 is a time of day without a date/);
    expect((jd(1.8e9) as { message: string }).message).toMatch(/^date: got 1800000000; expected an Excel date serial from 1 \(1900-01-01\) to 2958465 \(9999-12-31\)/);
    expect(jd(2958465.5)).toBe(2958465.5 + 2415018.5);
  });

  it("turn Julian dates back into serials on both sides of the fictitious day", () => {
    for (const s of [1, 32, 59, 59.75, 61, 61.5, 46388.5, 2958465.25]) expect(serialOfJulianDate(jd(s) as number)).toBe(s);
  });
});

describe("ISO 8601 text, read as UTC", () => {
  it("reads a date, a date and time, seconds with a fraction, Z and offsets", () => {
    expect(jd("2028-11-28")).toBe(jd(47085)); // 2028-11-28 is serial 47085
    expect(jd("2028-11-28T06:00Z")).toBe(jd(47085.25));
    expect(jd("2028-11-28 06:00")).toBe(jd(47085.25));
    expect(jd("2028-11-28T08:00+02:00")).toBe(jd(47085.25));
    expect(jd("2028-11-27T22:00-0800")).toBe(jd(47085.25));
    // Within the float64 spacing of Julian dates near 2.46e6 (4.7e-10 day, 40 microseconds).
    expect(Math.abs((jd("2028-11-28T06:00:30.5Z") as number) - (jd(47085.25) as number) - 30.5 / 86400)).toBeLessThan(1e-9);
    expect(jd("2000-01-01T12:00:00Z")).toBe(2451545.0); // J2000.0 (UTC here)
  });

  it("refuses dates that do not exist and text that is not a date, naming the parameter", () => {
    for (const t of ["2027-02-29", "2028-13-01", "2028-11-31", "28-11-2028", "next Tuesday", "2028-11-28T25:00", "2028-11-28T06:00+25:00"]) {
      const e = julianDateOfText("start_date", t);
      expect(isDomainError(e), t).toBe(true);
      expect((e as { message: string }).message).toMatch(/^start_date: got ".*"; expected an Excel date serial/);
    }
    expect(jd("2028-02-29")).toBe(jd(46812)); // a real leap day
  });
});
