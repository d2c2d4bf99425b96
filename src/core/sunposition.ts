import { toDegrees, toRadians, wrapDegrees360 } from "./angles";
import { JD_J2000 } from "./time";

/**
 * Low-precision geocentric position of the Sun: the U.S. Naval Observatory's "Computing
 * Approximate Solar Coordinates" (aa.usno.navy.mil/faq/sun_approx), the Astronomical Almanac's
 * low-precision solar formula. With D = JD - 2451545.0 (days from J2000.0):
 *   g = 357.529 + 0.98560028 D         mean anomaly, deg
 *   q = 280.459 + 0.98564736 D         mean longitude, deg
 *   L = q + 1.915 sin g + 0.020 sin 2g apparent ecliptic longitude (aberration included), deg
 *   R = 1.00014 - 0.01671 cos g - 0.00014 cos 2g   distance, au
 *   e = 23.439 - 0.00000036 D          obliquity of the ecliptic, deg
 * ecliptic latitude taken as 0. Stated accuracy: about 1 arcminute (0.017 deg) in the Sun's
 * angular coordinates within two centuries of 2000, degrading slowly outside that window.
 * Measured against astronomy-engine 2.1.19 (apparent Sun of date, VSOP87-based): largest
 * error over 1950-2050 is 0.013 deg in longitude and right ascension, 0.005 deg in declination,
 * 9e-5 au in distance; over 1800-2200 it grows to 0.025 deg (most of the residual is nutation,
 * which the formula leaves out). See test/core/sunposition.test.ts. Time argument: JD (UT is
 * fine: the 69 s TT-UT offset moves the Sun by 0.0008 deg).
 */
export interface SunPosition {
  /** Apparent geocentric ecliptic longitude, deg in [0, 360), equinox of date. */
  longitude: number;
  /** Obliquity of the ecliptic of date, deg. */
  obliquity: number;
  /** Earth-Sun distance, au. */
  distance: number;
  /** Right ascension, deg in [0, 360), equator and equinox of date. */
  rightAscension: number;
  /** Declination, deg. */
  declination: number;
}

/** Kernel: the solar position at Julian date `jd` (no validation; any finite JD). */
export function sunPosition(jd: number): SunPosition {
  const d = jd - JD_J2000;
  const g = toRadians(wrapDegrees360(357.529 + 0.98560028 * d));
  const q = wrapDegrees360(280.459 + 0.98564736 * d);
  const longitude = wrapDegrees360(q + 1.915 * Math.sin(g) + 0.02 * Math.sin(2 * g));
  const obliquity = 23.439 - 0.00000036 * d;
  const distance = 1.00014 - 0.01671 * Math.cos(g) - 0.00014 * Math.cos(2 * g);
  const lam = toRadians(longitude);
  const eps = toRadians(obliquity);
  const rightAscension = wrapDegrees360(toDegrees(Math.atan2(Math.cos(eps) * Math.sin(lam), Math.cos(lam))));
  const declination = toDegrees(Math.asin(Math.sin(eps) * Math.sin(lam)));
  return { longitude, obliquity, distance, rightAscension, declination };
}
