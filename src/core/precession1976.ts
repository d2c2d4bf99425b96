import { RAD_PER_DEG } from "./angles";
import { chain, rot2, rot3, type Mat3 } from "./rotation";
import { DAYS_PER_JULIAN_CENTURY, JD_J2000 } from "./time";

/**
 * IAU 1976 precession (Lieske et al. 1977, A&A 58, 1), from J2000 to a date, as Vallado,
 * Fundamentals of Astrodynamics and Applications, 4th ed., Eq. 3-87 gives it, T in Julian
 * centuries of TT from J2000, angles in arcsec:
 *   zeta  = 2306.2181 T + 0.30188 T^2 + 0.017998 T^3
 *   theta = 2004.3109 T - 0.42665 T^2 - 0.041833 T^3
 *   z     = 2306.2181 T + 1.09468 T^2 + 0.018203 T^3
 * and the matrix r_J2000 = P r_MOD with P = ROT3(zeta) ROT2(-theta) ROT3(z) (Eq. 3-88).
 * Accuracy of the theory: about 0.1 arcsec over several centuries from 2000 (Lieske et al.).
 */
const ARCSEC = RAD_PER_DEG / 3600;

/** Kernel: precession angles [zeta, theta, z], rad, at a TT Julian date. */
export function precessionAngles1976(jdTT: number): [number, number, number] {
  const t = (jdTT - JD_J2000) / DAYS_PER_JULIAN_CENTURY;
  return [
    t * (2306.2181 + t * (0.30188 + t * 0.017998)) * ARCSEC,
    t * (2004.3109 + t * (-0.42665 - t * 0.041833)) * ARCSEC,
    t * (2306.2181 + t * (1.09468 + t * 0.018203)) * ARCSEC,
  ];
}

/** Kernel: precession matrix P with r_J2000 = P r_MOD at a TT Julian date. */
export function precessionMatrix1976(jdTT: number): Mat3 {
  const [zeta, theta, z] = precessionAngles1976(jdTT);
  return chain(rot3(zeta), rot2(-theta), rot3(z));
}
