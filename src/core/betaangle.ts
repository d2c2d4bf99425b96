import { clampedAsin, toDegrees, toRadians } from "./angles";
import { finite, firstError, within, type Result } from "./domain";
import { dateOutside } from "./julian";
import { sunPosition } from "./sunposition";

/**
 * The solar formula's window: "about 1 arcminute within two centuries of 2000", degrading
 * beyond "its four-century window of applicability" (USNO, Computing Approximate Solar
 * Coordinates), so dates from 1800-01-01 0h (JD 2378496.5) up to 2200-01-01 0h (JD 2524593.5).
 */
export const SOLAR_WINDOW_FIRST_JD = 2378496.5;
export const SOLAR_WINDOW_END_JD = 2524593.5;

/**
 * Beta angle of an Earth orbit, deg in [-90, 90]: the Sun's elevation above the orbit plane,
 * positive on the side of the orbit normal (the side from which the orbit is seen turning
 * anticlockwise). With Gamma the Sun's ecliptic longitude and eps the obliquity of date,
 *   sin beta = cos G sin RAAN sin i - sin G cos eps cos RAAN sin i + sin G sin eps cos i
 * (the Sun unit vector (cos G, sin G cos eps, sin G sin eps) dotted with the orbit normal
 * (sin RAAN sin i, -cos RAAN sin i, cos i); the standard form, e.g. SMAD 3rd ed. ch. 5).
 * The Sun comes from the low-precision formula of sunposition.ts; `date` is a Julian date, UTC,
 * inside that formula's four-century window 1800-2200 (outside it: #VALUE!). RAAN is measured from the equinox of date: a J2000 RAAN differs from it by the
 * precession, about 0.014 deg per year from 2000, which shifts beta by up to that much times
 * sin i. Accuracy: within 0.012 deg over 1950-2050 (measured against the Sun vector of
 * astronomy-engine 2.1.19; test/core/betaangle.test.ts), about 0.025 deg by 1800 or 2200, plus
 * that frame offset.
 * The orbit plane is taken as fixed at the date given: J2 turns it (see nodalPrecession), so
 * for a date far from the elements' epoch advance the RAAN first.
 */
export function betaAngle(inc: number, raan: number, date: number): Result<number> {
  const bad = firstError(
    within("inc", inc, 0, 180, "an inclination from 0 to 180 deg"),
    finite("raan", raan, "deg"),
    date >= SOLAR_WINDOW_FIRST_JD && date < SOLAR_WINDOW_END_JD
      ? undefined
      : dateOutside(
          "date",
          date,
          "a date from 1800-01-01 up to 2200-01-01 (Julian date 2378496.5 to 2524593.5), the four-century window of the solar formula, outside which its accuracy degrades; a Julian date given as a date serial reads as a year near 8600",
        ),
  );
  if (bad) return bad;
  const sun = sunPosition(date);
  return betaAngleKernel(toRadians(inc), toRadians(raan), toRadians(sun.longitude), toRadians(sun.obliquity));
}

/** Kernel: beta angle, deg, from inclination, RAAN, solar ecliptic longitude and obliquity (all rad). */
export function betaAngleKernel(incRad: number, raanRad: number, sunLongitudeRad: number, obliquityRad: number): number {
  const sinI = Math.sin(incRad);
  const sinG = Math.sin(sunLongitudeRad);
  const s =
    Math.cos(sunLongitudeRad) * Math.sin(raanRad) * sinI -
    sinG * Math.cos(obliquityRad) * Math.cos(raanRad) * sinI +
    sinG * Math.sin(obliquityRad) * Math.cos(incRad);
  return toDegrees(clampedAsin(s));
}
