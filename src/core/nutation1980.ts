import { RAD_PER_DEG } from "./angles";
import { NUTATION_1980_TERMS } from "./nutation1980data";
import { rot1, rot3, chain, type Mat3 } from "./rotation";
import { JD_J2000, DAYS_PER_JULIAN_CENTURY } from "./time";

/**
 * The 1980 IAU theory of nutation and the mean obliquity of the ecliptic of the IAU 1976 system,
 * as Vallado, Fundamentals of Astrodynamics and Applications, 4th ed., §3.7.2 uses them in the
 * IAU-76/FK5 reduction:
 *   mean obliquity  eps = 23.439291 - 0.0130042 T - 1.64e-7 T^2 + 5.04e-7 T^3 deg  (Eq. 3-81)
 *   Delaunay arguments of the Moon and Sun, deg, with r = 360 deg               (Eq. 3-82)
 *     l   = 134.96298139 + (1325 r + 198.8673981) T + 0.0086972 T^2 + 1.78e-5 T^3
 *     l'  = 357.52772333 + (  99 r + 359.0503400) T - 0.0001603 T^2 - 3.3e-6 T^3
 *     F   =  93.27191028 + (1342 r +  82.0175381) T - 0.0036825 T^2 + 3.1e-6 T^3
 *     D   = 297.85036306 + (1236 r + 307.1114800) T - 0.0019142 T^2 + 5.3e-6 T^3
 *     Om  = 125.04452222 - (   5 r + 134.1362608) T + 0.0020708 T^2 + 2.2e-6 T^3
 *   dpsi = sum (A + B T) sin(arg), deps = sum (C + D T) cos(arg) over the 106 terms    (Eq. 3-83)
 * with T in Julian centuries of TT from J2000. The IAU-1980 series differs from the observed
 * nutation by up to about 0.05 arcsec (the celestial pole offsets the IERS publishes as
 * corrections d_dpsi, d_deps); callers may add them.
 */

const ARCSEC = RAD_PER_DEG / 3600;
const UNIT = 1e-4 * ARCSEC;

export interface Nutation {
  /** Nutation in longitude, rad. */
  dpsi: number;
  /** Nutation in obliquity, rad. */
  deps: number;
  /** Mean obliquity of the ecliptic of date, rad. */
  meanObliquity: number;
  /** Longitude of the Moon's ascending node, rad (for the equation of the equinoxes). */
  moonNode: number;
}

const poly = (t: number, c0: number, c1: number, c2: number, c3: number): number => c0 + t * (c1 + t * (c2 + t * c3));

/** Kernel: the nutation angles and mean obliquity at a TT Julian date (Vallado 4th ed. Eqs. 3-81 to 3-83). */
export function nutation1980(jdTT: number): Nutation {
  const t = (jdTT - JD_J2000) / DAYS_PER_JULIAN_CENTURY;
  const r = 360;
  const meanObliquity = poly(t, 23.439291, -0.0130042, -1.64e-7, 5.04e-7) * RAD_PER_DEG;
  const l = (poly(t, 134.96298139, 1325 * r + 198.8673981, 0.0086972, 1.78e-5) % 360) * RAD_PER_DEG;
  const lp = (poly(t, 357.52772333, 99 * r + 359.05034, -0.0001603, -3.3e-6) % 360) * RAD_PER_DEG;
  const f = (poly(t, 93.27191028, 1342 * r + 82.0175381, -0.0036825, 3.1e-6) % 360) * RAD_PER_DEG;
  const d = (poly(t, 297.85036306, 1236 * r + 307.11148, -0.0019142, 5.3e-6) % 360) * RAD_PER_DEG;
  const om = (poly(t, 125.04452222, -(5 * r + 134.1362608), 0.0020708, 2.2e-6) % 360) * RAD_PER_DEG;
  let dpsi = 0;
  let deps = 0;
  // Smallest terms first, so the sum rounds no worse than the larger terms' own precision.
  for (let k = NUTATION_1980_TERMS.length - 1; k >= 0; k--) {
    const [a1, a2, a3, a4, a5, A, B, C, D] = NUTATION_1980_TERMS[k];
    const arg = a1 * l + a2 * lp + a3 * f + a4 * d + a5 * om;
    dpsi += (A + B * t) * Math.sin(arg);
    deps += (C + D * t) * Math.cos(arg);
  }
  return { dpsi: dpsi * UNIT, deps: deps * UNIT, meanObliquity, moonNode: om };
}

/**
 * Kernel: equation of the equinoxes, rad: dpsi cos(eps) + 0.00264" sin(Om) + 0.000063" sin(2 Om)
 * (Vallado 4th ed. Eq. 3-79, the form in use since 1997 February 27; IERS Conventions 1996).
 * `dpsi` may include the IERS correction.
 */
export const equationOfEquinoxes = (dpsi: number, meanObliquity: number, moonNode: number): number =>
  dpsi * Math.cos(meanObliquity) + (0.00264 * Math.sin(moonNode) + 0.000063 * Math.sin(2 * moonNode)) * ARCSEC;

/**
 * Kernel: nutation matrix N with r_MOD = N r_TOD (mean-of-date from true-of-date):
 * N = ROT1(-eps) ROT3(dpsi) ROT1(eps + deps) (Vallado 4th ed. Eq. 3-86).
 */
export const nutationMatrix = (dpsi: number, deps: number, meanObliquity: number): Mat3 =>
  chain(rot1(-meanObliquity), rot3(dpsi), rot1(meanObliquity + deps));
