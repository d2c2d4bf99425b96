import { TWO_PI, wrapRadians } from "./angles";
import { DAYS_PER_JULIAN_CENTURY, JD_J2000, SECONDS_PER_DAY } from "./time";

/**
 * Rotation angles of the Earth at a UT1 Julian date.
 *
 * Greenwich mean sidereal time, IAU 1982 (Aoki et al. 1982), Vallado, Fundamentals of
 * Astrodynamics and Applications, 4th ed., Eq. 3-47:
 *   GMST = 67310.54841 s + (876600 h + 8640184.812866 s) T + 0.093104 T^2 - 6.2e-6 T^3,
 * T in Julian centuries of UT1 from J2000. The 876600 h T term is 86400 s times the days since
 * J2000; it is evaluated as the fraction of the day only, so the result keeps full float64
 * precision (about 1e-10 rad) instead of losing digits to a term of 1e9 s.
 *
 * Earth rotation angle, IAU 2000 (IERS Conventions 2010, Eq. 5.15):
 *   ERA = 2 pi (0.7790572732640 + 1.00273781191135448 Du), Du = JD(UT1) - 2451545.0,
 * evaluated as 2 pi (frac(Du) + 0.7790572732640 + 0.00273781191135448 Du) for the same reason.
 */

/** Kernel: GMST (IAU 1982), rad in [0, 2 pi), at a UT1 Julian date. */
export function gmst1982(jdUt1: number): number {
  const d = jdUt1 - JD_J2000;
  const t = d / DAYS_PER_JULIAN_CENTURY;
  const dayFraction = d - Math.floor(d);
  const seconds = 67310.54841 + SECONDS_PER_DAY * dayFraction + t * (8640184.812866 + t * (0.093104 - t * 6.2e-6));
  return wrapRadians((seconds / SECONDS_PER_DAY) * TWO_PI);
}

/** Kernel: Earth rotation angle (IAU 2000), rad in [0, 2 pi), at a UT1 Julian date. */
export function earthRotationAngle(jdUt1: number): number {
  const d = jdUt1 - JD_J2000;
  return wrapRadians(TWO_PI * (d - Math.floor(d) + 0.779057273264 + 0.00273781191135448 * d));
}
