import * as Astronomy from "astronomy-engine";
import { describe, expect, it } from "vitest";
import { sunPosition } from "../../src/core/sunposition";

const JD_UNIX_EPOCH = 2440587.5;
const timeOf = (jd: number) => Astronomy.MakeTime(new Date((jd - JD_UNIX_EPOCH) * 86400000));
const angleGap = (a: number, b: number) => Math.abs(((a - b + 540) % 360) - 180);

/** Apparent geocentric Sun of date from astronomy-engine 2.1.19 (VSOP87, nutation, aberration). */
function reference(jd: number) {
  const t = timeOf(jd);
  const ecl = Astronomy.SunPosition(t);
  const v = Astronomy.RotateVector(Astronomy.Rotation_EQJ_EQD(t), Astronomy.GeoVector(Astronomy.Body.Sun, t, true));
  const r = Math.hypot(v.x, v.y, v.z);
  return {
    longitude: ecl.elon,
    rightAscension: ((Math.atan2(v.y, v.x) * 180) / Math.PI + 360) % 360,
    declination: (Math.asin(v.z / r) * 180) / Math.PI,
    distance: r,
    meanObliquity: Astronomy.e_tilt(t).mobl,
  };
}

describe("low-precision Sun (USNO / Astronomical Almanac formula) against astronomy-engine 2.1.19", () => {
  // USNO, "Computing Approximate Solar Coordinates": accuracy about 1 arcminute within two
  // centuries of 2000. Checked every 1.37 days (so every season and time of day is sampled).
  const ARCMIN = 1 / 60;
  it("stays within 1 arcminute in longitude, right ascension and declination over 1950-2050", () => {
    let worstLon = 0;
    let worstRa = 0;
    let worstDec = 0;
    let worstR = 0;
    for (let jd = 2433282.5; jd <= 2469807.5; jd += 1.37) {
      const s = sunPosition(jd);
      const ref = reference(jd);
      worstLon = Math.max(worstLon, angleGap(s.longitude, ref.longitude));
      worstRa = Math.max(worstRa, angleGap(s.rightAscension, ref.rightAscension));
      worstDec = Math.max(worstDec, Math.abs(s.declination - ref.declination));
      worstR = Math.max(worstR, Math.abs(s.distance - ref.distance));
    }
    expect(worstLon).toBeLessThan(ARCMIN);
    expect(worstRa).toBeLessThan(ARCMIN);
    expect(worstDec).toBeLessThan(ARCMIN / 2);
    expect(worstR).toBeLessThan(1.5e-4); // au; the formula's three-term distance series
    // The measured worst cases the doc comment quotes (0.013 deg, 0.005 deg, 9e-5 au):
    expect(worstLon).toBeGreaterThan(0.005);
  });

  it("degrades slowly outside the window: under 0.03 deg over 1800-2200", () => {
    let worst = 0;
    for (let jd = 2378496.5; jd <= 2524593.5; jd += 5.3) worst = Math.max(worst, angleGap(sunPosition(jd).longitude, reference(jd).longitude));
    expect(worst).toBeLessThan(0.03);
  });

  it("gives the mean obliquity of date within 0.001 deg (its constant is rounded to 23.439 deg)", () => {
    for (let jd = 2433282.5; jd <= 2469807.5; jd += 97.1) expect(Math.abs(sunPosition(jd).obliquity - reference(jd).meanObliquity)).toBeLessThan(0.001);
  });

  it("returns angles in range", () => {
    for (let jd = 2400000.5; jd < 2500000; jd += 3333.3) {
      const s = sunPosition(jd);
      expect(s.longitude).toBeGreaterThanOrEqual(0);
      expect(s.longitude).toBeLessThan(360);
      expect(s.rightAscension).toBeGreaterThanOrEqual(0);
      expect(s.rightAscension).toBeLessThan(360);
      expect(Math.abs(s.declination)).toBeLessThan(23.5);
    }
  });
});
