import * as Astronomy from "astronomy-engine";
import { describe, expect, it } from "vitest";
import { equationOfEquinoxes, nutation1980 } from "../../src/core/nutation1980";
import { NUTATION_1980_TERMS } from "../../src/core/nutation1980data";

const ARCSEC = Math.PI / 180 / 3600;

describe("IAU 1980 nutation (Seidelmann 1982; Vallado 4th ed. Eqs. 3-81 to 3-83)", () => {
  it("has the 106 terms, the largest -171996 - 174.2 T (0.0001 arcsec) on Omega (Seidelmann 1982, Table 1)", () => {
    expect(NUTATION_1980_TERMS.length).toBe(106);
    expect(NUTATION_1980_TERMS[0]).toEqual([0, 0, 0, 0, 1, -171996, -174.2, 92025, 8.9]);
  });

  it("matches the SOFA/ERFA test value of iauNut80(2400000.5, 53736.0) to 1e-13 rad", () => {
    // t_sofa_c: dpsi = -0.9643658353226563966e-5 rad, deps = 0.4060051006879713322e-4 rad.
    const n = nutation1980(2453736.5);
    expect(Math.abs(n.dpsi - -0.9643658353226563966e-5)).toBeLessThan(1e-13);
    expect(Math.abs(n.deps - 0.4060051006879713322e-4)).toBeLessThan(1e-13);
  });

  it("matches the SOFA/ERFA test value of iauEqeq94(2400000.5, 41234.0), 0.5357758254609256894e-4 rad", () => {
    const n = nutation1980(2441234.5);
    expect(Math.abs(equationOfEquinoxes(n.dpsi, n.meanObliquity, n.moonNode) - 0.5357758254609256894e-4)).toBeLessThan(1e-13);
  });

  it("gives the mean obliquity of SOFA's iauObl80(2400000.5, 54388.0) = 0.4090751347643816218 rad (value from memory) but for Vallado's rounded constant", () => {
    // Vallado's Eq. 3-81 starts from 23.439291 deg; the IAU 1976 value is 84381.448 arcsec =
    // 23.4392911 deg: 1.1e-7 deg (1.9e-9 rad, 0.0004 arcsec) apart; his rate -0.0130042 deg/cy rounds
    // -46.8150 arcsec/cy and leaves 5e-11 rad more at this date.
    const gapRad = nutation1980(2454388.5).meanObliquity - 0.4090751347643816218;
    expect(Math.abs(gapRad - (23.439291 - 84381.448 / 3600) * (Math.PI / 180))).toBeLessThan(1e-10);
  });

  it("stays within 0.3 arcsec of astronomy-engine 2.1.19's nutation over 1975-2075 (measured 0.25)", () => {
    // astronomy-engine sums only the five largest terms of IAU 2000B, so this is a coarse check of
    // the large terms (a slipped digit there moves the sum by arcseconds); the SOFA value above is
    // the fine one.
    let worst = 0;
    for (let jd = 2442413.5; jd < 2478938.5; jd += 13.7) {
      const t = Astronomy.MakeTime(new Date((jd - 2440587.5) * 86400000));
      const tilt = Astronomy.e_tilt(t);
      const n = nutation1980(t.tt + 2451545.0);
      worst = Math.max(worst, Math.abs(n.dpsi / ARCSEC - tilt.dpsi), Math.abs(n.deps / ARCSEC - tilt.deps));
    }
    expect(worst).toBeLessThan(0.3);
  });
});
