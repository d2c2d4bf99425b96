import { toDegrees, TWO_PI, wrapRadians } from "./angles";
import { badArgument, finite, firstError, type Result } from "./domain";
import { equationOfEquinoxes, nutation1980 } from "./nutation1980";
import { checkDut1, julianDateTT } from "./timescales";
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

/**
 * The Earth's rotation angle at a UTC Julian date, deg in [0, 360): `kind` "GMST" (default;
 * Greenwich mean sidereal time, IAU 1982), "GAST" (apparent: GMST plus the equation of the
 * equinoxes of the IAU-1980 nutation, Vallado 4th ed. Eq. 3-79) or "ERA" (Earth rotation angle,
 * IAU 2000). dut1 = UT1 - UTC in s (blank = 0: up to 0.9 s of rotation, 0.004 deg, off).
 * Accuracy: the models' own (GMST 1982 and ERA agree with SOFA's test values to 1e-12 rad).
 */
export function siderealTime(date: number, dut1?: number | null, kind?: unknown): Result<number> {
  const bad = firstError(finite("date", date, "days (a Julian date, UTC)"), checkDut1(dut1));
  if (bad) return bad;
  const key = kind === null || kind === undefined ? "GMST" : typeof kind === "string" ? kind.trim().toUpperCase() : "";
  if (key !== "GMST" && key !== "GAST" && key !== "ERA")
    return badArgument("kind", kind, `"GMST" (mean sidereal time, the default), "GAST" (apparent sidereal time) or "ERA" (Earth rotation angle)`);
  const jdUt1 = date + (dut1 ?? 0) / SECONDS_PER_DAY;
  if (key === "ERA") return toDegrees(earthRotationAngle(jdUt1));
  const gmst = gmst1982(jdUt1);
  if (key === "GMST") return toDegrees(gmst);
  const nut = nutation1980(julianDateTT(date));
  return toDegrees(wrapRadians(gmst + equationOfEquinoxes(nut.dpsi, nut.meanObliquity, nut.moonNode)));
}
