import { describe, expect, it } from "vitest";
import { julianDateFromCalendar } from "../../src/core/julian";
import { LEAP_SECOND_STEPS, LEAP_SECONDS_BULLETIN, LEAP_SECONDS_VALID_UNTIL_JD } from "../../src/core/leapseconds";
import { julianDateTT, taiMinusUtcKernel, timeScaleOffset } from "../../src/core/timescales";
import { err, expectError, ok } from "../support/expect";

// The IERS file leap-seconds.list (distributed with the IANA time-zone database): NTP seconds
// (from 1900-01-01 0h) of each step and TAI - UTC after it, as published.
const LEAP_SECONDS_LIST: [number, number][] = [
  [2272060800, 10], [2287785600, 11], [2303683200, 12], [2335219200, 13], [2366755200, 14], [2398291200, 15],
  [2429913600, 16], [2461449600, 17], [2492985600, 18], [2524521600, 19], [2571782400, 20], [2603318400, 21],
  [2634854400, 22], [2698012800, 23], [2776982400, 24], [2840140800, 25], [2871676800, 26], [2918937600, 27],
  [2950473600, 28], [2982009600, 29], [3029443200, 30], [3076704000, 31], [3124137600, 32], [3345062400, 33],
  [3439756800, 34], [3550089600, 35], [3644697600, 36], [3692217600, 37],
];
const NTP_EPOCH_JD = 2415020.5; // 1900-01-01 0h

describe("leap-second table (IERS Bulletin C)", () => {
  it("matches the IERS leap-seconds.list step for step", () => {
    expect(LEAP_SECOND_STEPS.length).toBe(LEAP_SECONDS_LIST.length);
    LEAP_SECOND_STEPS.forEach(([y, m, value], k) => {
      expect((julianDateFromCalendar(y, m, 1) - NTP_EPOCH_JD) * 86400).toBe(LEAP_SECONDS_LIST[k][0]);
      expect(value).toBe(LEAP_SECONDS_LIST[k][1]);
    });
  });

  it(`is not older than the date its bulletin (${LEAP_SECONDS_BULLETIN}) vouches for`, () => {
    // Fails from 2027-07-01 on, the first date a leap second unannounced in Bulletin C 72 could
    // affect: update src/core/leapseconds.ts from the newest Bulletin C, then this date.
    const nowJd = Date.now() / 86400000 + 2440587.5;
    expect(nowJd, `the leap-second table is stale: read the latest IERS Bulletin C and update src/core/leapseconds.ts`).toBeLessThan(LEAP_SECONDS_VALID_UNTIL_JD);
    expect(LEAP_SECONDS_VALID_UNTIL_JD).toBe(julianDateFromCalendar(2027, 7, 1));
  });

  it("steps at 0h UTC on the step date (Bulletin C 52: 36 s until 2017-01-01 0h, then 37 s)", () => {
    const newYear2017 = julianDateFromCalendar(2017, 1, 1);
    expect(taiMinusUtcKernel(newYear2017 - 1 / 86400)).toBe(36);
    expect(taiMinusUtcKernel(newYear2017)).toBe(37);
    expect(taiMinusUtcKernel(julianDateFromCalendar(2004, 4, 6))).toBe(32); // Vallado 4th ed. Example 3-15: dAT = 32 s
  });
});

describe("time-scale offsets", () => {
  const jd2026 = julianDateFromCalendar(2026, 6, 1);
  it.each([
    ["UTC", "TT", 69.184, "TT - UTC = 37 s + 32.184 s (Bulletin C 72; IAU 1991 A4)"],
    ["TT", "UTC", -69.184, "the reverse"],
    ["UTC", "TAI", 37, "Bulletin C 72"],
    ["UTC", "GPS", 18, "GPS - UTC = 37 - 19 s (GPS time = UTC at 1980-01-06)"],
    ["TAI", "TT", 32.184, "IAU 1991 Resolution A4"],
    ["tt", " tai ", -32.184, "names are case-insensitive"],
  ] as const)("%s -> %s is %f s (%s)", (from, to, expected, _source) => {
    expect(ok(timeScaleOffset(jd2026, from, to))).toBeCloseTo(expected, 12);
  });

  it("gives UT1 from dut1 and TT of Vallado 4th ed. Example 3-15 (JD_TT 2453101.828154745)", () => {
    const jd = julianDateFromCalendar(2004, 4, 6, 7, 51, 28.386009);
    expect(ok(timeScaleOffset(jd, "UTC", "UT1", -0.4399619))).toBeCloseTo(-0.4399619, 12);
    expect(ok(timeScaleOffset(jd, "UT1", "TT", -0.4399619))).toBeCloseTo(64.6239619, 12);
    expect(Math.abs(julianDateTT(jd) - 2453101.828154745)).toBeLessThan(1e-9);
  });

  it("refuses what it cannot answer", () => {
    expectError(timeScaleOffset(julianDateFromCalendar(1971, 12, 31), "UTC", "TAI"), "no_answer", "date");
    expect(ok(timeScaleOffset(julianDateFromCalendar(1960, 1, 1), "TAI", "TT"))).toBeCloseTo(32.184, 12);
    expectError(timeScaleOffset(jd2026, "UTC", "UT1"), "bad_argument", "dut1");
    expectError(timeScaleOffset(jd2026, "UTC", "UT1", 1.5), "bad_argument", "dut1");
    expectError(timeScaleOffset(jd2026, "UTC", "TDB"), "bad_argument", "to");
    expect(err(timeScaleOffset(jd2026, 3, "TT")).message).toMatch(/^from: got 3; expected a time scale/);
    expectError(timeScaleOffset(NaN, "UTC", "TT"), "bad_argument", "date");
  });
});
