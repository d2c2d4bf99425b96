import * as Astronomy from "astronomy-engine";
import { describe, expect, it } from "vitest";
import { betaAngle } from "../../src/core/betaangle";
import { isDomainError } from "../../src/core/domain";
import { seeded } from "../support/random";

const num = (x: unknown): number => {
  if (isDomainError(x)) throw new Error(x.message);
  return x as number;
};
const DEG = Math.PI / 180;
const EXCEL_TO_JD = 2415018.5; // Excel 1900 serial -> JD (from serial 61 on), as src/core/time.ts
const JD_UNIX_EPOCH = 2440587.5;

/**
 * Independent route: the Sun's apparent geocentric direction from astronomy-engine 2.1.19,
 * rotated to the true equator and equinox of date, dotted with the orbit normal
 * (sin RAAN sin i, -cos RAAN sin i, cos i).
 */
function betaByVectors(inc: number, raan: number, jd: number): number {
  const t = Astronomy.MakeTime(new Date((jd - JD_UNIX_EPOCH) * 86400000));
  const v = Astronomy.RotateVector(Astronomy.Rotation_EQJ_EQD(t), Astronomy.GeoVector(Astronomy.Body.Sun, t, true));
  const r = Math.hypot(v.x, v.y, v.z);
  const h = [Math.sin(raan * DEG) * Math.sin(inc * DEG), -Math.cos(raan * DEG) * Math.sin(inc * DEG), Math.cos(inc * DEG)];
  return Math.asin((v.x * h[0] + v.y * h[1] + v.z * h[2]) / r) / DEG;
}

describe("beta angle against an astronomy-engine vector route", () => {
  it("agrees within 0.015 deg for random orbits and dates in 1950-2050", () => {
    const rand = seeded(99);
    const first = 18264 + EXCEL_TO_JD; // 1950-01-01
    const last = 54789 + EXCEL_TO_JD; // 2050-01-01
    let worst = 0;
    for (let k = 0; k < 3000; k++) {
      const inc = 180 * rand();
      const raan = 360 * rand();
      const jd = first + (last - first) * rand();
      worst = Math.max(worst, Math.abs(num(betaAngle(inc, raan, jd)) - betaByVectors(inc, raan, jd)));
    }
    expect(worst).toBeLessThan(0.015);
  });
});

describe("beta angle geometry", () => {
  // Equinox and solstice instants from astronomy-engine 2.1.19 Seasons(2024), as Julian dates.
  const seasons = Astronomy.Seasons(2024);
  const jdOf = (t: Astronomy.AstroTime) => t.ut + 2451545;

  it("sees the Sun face-on to a dawn-dusk polar orbit at the March equinox", () => {
    // At the equinox the Sun is at RA 0, so the normal of a polar orbit with RAAN 90 deg points at it.
    const jd = jdOf(seasons.mar_equinox);
    expect(jd - EXCEL_TO_JD).toBeCloseTo(45371.13, 1); // 2024-03-20 ~03:06 UTC
    expect(num(betaAngle(90, 90, jd))).toBeGreaterThan(89.9);
    expect(Math.abs(num(betaAngle(90, 0, jd)))).toBeLessThan(0.05);
  });

  it("equals minus the Sun's declination for an equatorial retrograde orbit and plus it for a prograde one", () => {
    // At the June solstice the declination is the obliquity, +23.44 deg.
    const jd = jdOf(seasons.jun_solstice);
    expect(num(betaAngle(0, 0, jd))).toBeCloseTo(23.44, 1);
    expect(num(betaAngle(180, 0, jd))).toBeCloseTo(-23.44, 1);
  });

  it("refuses dates outside the solar formula's window 1800-2200 (USNO), a bad inclination and a non-finite RAAN", () => {
    // USNO, Computing Approximate Solar Coordinates: about 1 arcminute "within two centuries of
    // 2000", degrading "beyond its four-century window of applicability".
    expect(isDomainError(betaAngle(51.6, 0, 2378496.5))).toBe(false); // 1800-01-01 0h
    expect(isDomainError(betaAngle(51.6, 0, 2524593.4))).toBe(false);
    for (const jd of [2378496.4, 2524593.5, 2461000 + EXCEL_TO_JD, NaN]) {
      const d = betaAngle(51.6, 0, jd);
      expect(isDomainError(d) && d.parameter === "date").toBe(true);
    }
    const i = betaAngle(-1, 0, 45000 + EXCEL_TO_JD);
    expect(isDomainError(i) && i.parameter === "inc").toBe(true);
    const o = betaAngle(51.6, Infinity, 45000 + EXCEL_TO_JD);
    expect(isDomainError(o) && o.parameter === "raan").toBe(true);
  });
});
