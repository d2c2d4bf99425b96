import { badArgument, finite, firstError, noAnswer, within, type DomainError, type Result } from "./domain";
import { julianDateFromCalendar } from "./julian";
import { LEAP_SECOND_STEPS } from "./leapseconds";
import { SECONDS_PER_DAY } from "./time";

/**
 * Offsets between the time scales of the trade, in seconds, at an instant given as a Julian date
 * in UTC:
 *   TAI - UTC  the leap-second table (src/core/leapseconds.ts, IERS Bulletin C), from 1972
 *   TT  - TAI  32.184 s exactly (IAU 1991 Resolution A4; Vallado 4th ed. §3.5, Eq. 3-45)
 *   TAI - GPS  19 s exactly (GPS time was set equal to UTC on 1980-01-06, when TAI - UTC = 19 s)
 *   UT1 - UTC  dut1, measured and published by the IERS (Bulletin A); |dut1| < 0.9 s by the
 *              definition of UTC (ITU-R Recommendation TF.460)
 */

/** JD (UTC) of each step of the leap-second table, in order. */
const STEP_JDS: readonly number[] = LEAP_SECOND_STEPS.map(([y, m]) => julianDateFromCalendar(y, m, 1));

/** JD of 1972-01-01 0h UTC, where the table starts. */
export const LEAP_TABLE_START_JD = STEP_JDS[0];

export const TT_MINUS_TAI = 32.184;
export const TAI_MINUS_GPS = 19;

/** Kernel: TAI - UTC in s at a UTC Julian date on or after 1972-01-01 (37 s after the last step). */
export function taiMinusUtcKernel(jdUtc: number): number {
  let k = STEP_JDS.length - 1;
  while (k > 0 && jdUtc < STEP_JDS[k]) k--;
  return LEAP_SECOND_STEPS[k][2];
}

/**
 * TT - UTC in s for the arguments of precession, nutation and SGP4-frame rotations, where a few
 * seconds move nothing that matters (the nutation angles change by 1e-7 arcsec per second): before
 * 1972 it takes the 1972 value, 10 s + 32.184 s, rather than refusing the date.
 */
export const ttMinusUtcForTheories = (jdUtc: number): number => taiMinusUtcKernel(jdUtc) + TT_MINUS_TAI;

/** Kernel: TT Julian date of a UTC Julian date (via ttMinusUtcForTheories). */
export const julianDateTT = (jdUtc: number): number => jdUtc + ttMinusUtcForTheories(jdUtc) / SECONDS_PER_DAY;

export const TIME_SCALES = ["UTC", "TAI", "TT", "GPS", "UT1"] as const;
export type TimeScale = (typeof TIME_SCALES)[number];

function readScale(parameter: string, value: unknown): TimeScale | DomainError {
  const key = typeof value === "string" ? value.trim().toUpperCase() : "";
  return (TIME_SCALES as readonly string[]).includes(key)
    ? (key as TimeScale)
    : badArgument(parameter, value, `a time scale, one of "UTC", "TAI", "TT", "GPS", "UT1"`);
}

/** Checks dut1 = UT1 - UTC in s (null when not given). */
export function checkDut1(dut1: number | null | undefined): DomainError | undefined {
  if (dut1 === null || dut1 === undefined) return undefined;
  return firstError(finite("dut1", dut1, "s"), within("dut1", dut1, -1, 1, "UT1 - UTC in s, between -1 and 1 (IERS Bulletin A keeps it within 0.9 s)"));
}

/**
 * Seconds to add to a reading on the `from` scale to get the reading on the `to` scale at the
 * instant `date` (Julian date, UTC): e.g. from "UTC" to "TT" gives 69.184 s in 2026. Scales:
 * UTC, TAI, TT, GPS, UT1 (UT1 needs dut1 = UT1 - UTC in s). Exact: whole leap seconds plus the
 * defined constants, plus dut1 as given.
 * #N/A when a conversion involving UTC or UT1 is asked before 1972-01-01, where the table starts
 * (UTC then ran at an adjusted rate with fractional steps); TAI, TT and GPS convert at any date.
 * After the date the table is known valid for (src/core/leapseconds.ts) the last value, 37 s, is
 * used: a leap second announced later would change the answer by 1 s.
 */
export function timeScaleOffset(date: number, from: unknown, to: unknown, dut1?: number | null): Result<number> {
  const bad = firstError(finite("date", date, "days (a Julian date, UTC)"), checkDut1(dut1));
  if (bad) return bad;
  const source = readScale("from", from);
  if (typeof source !== "string") return source;
  const target = readScale("to", to);
  if (typeof target !== "string") return target;
  for (const [name, scale] of [["from", source], ["to", target]] as const)
    if (scale === "UT1" && (dut1 === null || dut1 === undefined))
      return badArgument("dut1", dut1, `UT1 - UTC in s (IERS Bulletin A), needed for a conversion ${name === "from" ? "from" : "to"} UT1`);
  const needsTable = [source, target].some((s) => s === "UTC" || s === "UT1");
  if (needsTable && date < LEAP_TABLE_START_JD)
    return noAnswer("date", "the leap-second table starts on 1972-01-01, when UTC took its present form; before it UTC ran at an adjusted rate with fractional steps, which this table does not hold");
  const taiMinusUtc = needsTable ? taiMinusUtcKernel(date) : 0;
  const minusTai = (scale: TimeScale): number => {
    switch (scale) {
      case "TAI":
        return 0;
      case "TT":
        return TT_MINUS_TAI;
      case "GPS":
        return -TAI_MINUS_GPS;
      case "UTC":
        return -taiMinusUtc;
      case "UT1":
        return -taiMinusUtc + (dut1 as number);
    }
  };
  return minusTai(target) - minusTai(source);
}
