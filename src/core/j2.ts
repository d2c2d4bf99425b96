import { toDegrees, toRadians, TWO_PI } from "./angles";
import { badArgument, finite, firstError, noAnswer, positive, within, type DomainError, type Result } from "./domain";
import { SECONDS_PER_DAY } from "./time";
import { meanMotion } from "./twobody";

/**
 * Secular (orbit-averaged) first-order effects of the body's oblateness J2 on an orbit, and the
 * orbit designs built on them: sun-synchronous inclination and repeat-ground-track sma.
 *
 * Rates (Vallado, Fundamentals of Astrodynamics and Applications, 4th ed., §9.6, eq. 9-41;
 * Curtis, Orbital Mechanics for Engineering Students, 2nd ed., §4.7), p = a (1 - e^2):
 *   node      dRAAN/dt = -3/2 n J2 (R/p)^2 cos i
 *   perigee   dargp/dt =  3/4 n J2 (R/p)^2 (5 cos^2 i - 1)
 *   mean anom dM/dt - n = 3/4 n J2 (R/p)^2 sqrt(1 - e^2) (3 cos^2 i - 1)
 * n is the two-body mean motion sqrt(GM / a^3), NOT corrected for J2: this is the form the
 * textbook examples use, and the difference is second order in J2 (about 1e-3 relative on
 * Earth). a, e, i are mean elements; an osculating sma differs from the mean one by up to
 * roughly 3/2 J2 R^2 / a (about 10 km in low Earth orbit), so feeding an osculating state in gives
 * rates good to about 0.1 %. The model ignores J3 and higher zonals, tesserals, drag, Sun and
 * Moon: results are preliminary design numbers, not for flight operations.
 *
 * Sheet units: GM km^3/s^2, lengths km, angles deg, rates deg/day with day = 86400 s.
 */

const DEG_PER_DAY_PER_RAD_PER_S = toDegrees(1) * SECONDS_PER_DAY;

/** Inputs every J2 function shares. */
function checkOrbit(gm: number, bodyRadius: number, j2: number, sma: number, ecc: number, inc: number): DomainError | undefined {
  const bad = firstError(
    positive("body", gm, "km3/s2 (GM)"),
    positive("body_radius", bodyRadius, "km"),
    finite("j2", j2),
    positive("sma", sma, "km (an elliptic orbit)"),
    Number.isFinite(ecc) && ecc >= 0 && ecc < 1 ? undefined : badArgument("ecc", ecc, "an eccentricity from 0 up to, but not including, 1"),
    within("inc", inc, 0, 180, "an inclination from 0 to 180 deg"),
  );
  if (bad) return bad;
  return periapsisClears(bodyRadius, sma, ecc);
}

/** The J2 series describes the field outside the body only; an orbit through it is an input slip (often an altitude given as sma). */
function periapsisClears(bodyRadius: number, sma: number, ecc: number): DomainError | undefined {
  const periapsis = sma * (1 - ecc);
  return periapsis > bodyRadius
    ? undefined
    : badArgument("sma", sma, `a semi-major axis whose periapsis a(1 - e) = ${Number(periapsis.toPrecision(10))} km clears the body radius ${bodyRadius} km (sma is measured from the centre, not an altitude)`);
}

/** Kernel: the common factor n J2 (R/p)^2, rad/s. */
export function j2RateFactor(gm: number, bodyRadius: number, j2: number, sma: number, ecc: number): number {
  const p = sma * (1 - ecc * ecc);
  const rp = bodyRadius / p;
  return meanMotion(gm, sma) * j2 * rp * rp;
}

/** Kernel: secular node rate, rad/s (inc in radians). */
export const nodalRateKernel = (factor: number, incRad: number): number => -1.5 * factor * Math.cos(incRad);

/** Kernel: secular argument-of-periapsis rate, rad/s. */
export function apsidalRateKernel(factor: number, incRad: number): number {
  const c = Math.cos(incRad);
  return 0.75 * factor * (5 * c * c - 1);
}

/** Kernel: secular J2 correction to the mean-anomaly rate (added to n), rad/s. */
export function meanAnomalyRateKernel(factor: number, ecc: number, incRad: number): number {
  const c = Math.cos(incRad);
  return 0.75 * factor * Math.sqrt(1 - ecc * ecc) * (3 * c * c - 1);
}

/**
 * Kernel: the mean semi-major axis, km, of an osculating orbit about an oblate body, to first
 * order in J2: a_mean = a - da, with the short-periodic variation of the sma (Kozai 1959, "The
 * motion of a close earth satellite", AJ 64:367; formula from memory)
 *   da = (J2 R^2 / a) [ (1 - 3/2 sin^2 i) ((a/r)^3 - (1 - e^2)^(-3/2)) + 3/2 sin^2 i (a/r)^3 cos 2u ]
 * with the osculating a, e, i, the radius r and the argument of latitude u = argp + true anomaly.
 * da reaches about 10 km in low Earth orbit; it sets the mean motion, so leaving it out drifts a
 * secular propagation by about 1000 km along the track per day. Accuracy: reproduces the
 * osculating sma of a numerically integrated J2 orbit to 0.05 km (test/core/j2.test.ts), the
 * size of the second-order terms.
 */
export function meanSmaKernel(bodyRadius: number, j2: number, sma: number, ecc: number, incRad: number, radius: number, argLatRad: number): number {
  const s2 = Math.sin(incRad) ** 2;
  const ar3 = (sma / radius) ** 3;
  return sma - ((j2 * bodyRadius * bodyRadius) / sma) * ((1 - 1.5 * s2) * (ar3 - (1 - ecc * ecc) ** -1.5) + 1.5 * s2 * ar3 * Math.cos(2 * argLatRad));
}

/**
 * Secular rate of the right ascension of the ascending node under J2, deg/day (day = 86400 s).
 * Negative (westward regression) for prograde orbits, positive for retrograde, 0 at 90 deg.
 * Accuracy: the first-order secular theory, about J2 relative (0.1 % for Earth) against a full
 * J2 propagation with mean elements; float64 rounding is far below that.
 */
export function nodalPrecession(gm: number, bodyRadius: number, j2: number, sma: number, ecc: number, inc: number): Result<number> {
  const bad = checkOrbit(gm, bodyRadius, j2, sma, ecc, inc);
  if (bad) return bad;
  return nodalRateKernel(j2RateFactor(gm, bodyRadius, j2, sma, ecc), toRadians(inc)) * DEG_PER_DAY_PER_RAD_PER_S;
}

/**
 * Secular rate of the argument of periapsis under J2, deg/day. Zero at the critical
 * inclinations 63.43 and 116.57 deg (5 cos^2 i = 1). Same accuracy as nodalPrecession. For a
 * circular orbit the periapsis is undefined; the number is then the rate the line of apsides
 * would have once any eccentricity appears.
 */
export function apsidalPrecession(gm: number, bodyRadius: number, j2: number, sma: number, ecc: number, inc: number): Result<number> {
  const bad = checkOrbit(gm, bodyRadius, j2, sma, ecc, inc);
  if (bad) return bad;
  return apsidalRateKernel(j2RateFactor(gm, bodyRadius, j2, sma, ecc), toRadians(inc)) * DEG_PER_DAY_PER_RAD_PER_S;
}

/**
 * Inclination (deg, retrograde: between 90 and 180) at which J2 turns the node eastward by 360
 * deg per `bodyOrbitalPeriod` (s), the body's orbital period about its star, so the orbit plane
 * keeps its angle to the mean Sun. cos i = -(2 pi / T) / (3/2 n J2 (R/p)^2) (Vallado 4th ed.
 * ch. 11, Example 11-2; Curtis 2nd ed. §4.7). Which year to pass is the caller's choice: the
 * node of date follows the mean Sun of date over a tropical year (Earth 365.2422 d); the
 * sidereal year (365.2564 d) differs by 4e-5 relative. No answer when |cos i| would exceed 1,
 * i.e. the orbit is too high (or J2 too small) for J2 to turn the node fast enough.
 * Accuracy: as nodalPrecession; the inclination is good to about 0.01 deg for low Earth orbits.
 */
export function sunSyncInclination(gm: number, bodyRadius: number, j2: number, sma: number, ecc: number, bodyOrbitalPeriod: number): Result<number> {
  const bad = firstError(
    checkOrbit(gm, bodyRadius, j2, sma, ecc, 90),
    positive("j2", j2, "(an oblate body: only J2 > 0 turns a retrograde node eastward)"),
    positive("body_orbital_period", bodyOrbitalPeriod, "s (the body's orbital period about its star)"),
  );
  if (bad) return bad;
  const required = TWO_PI / bodyOrbitalPeriod;
  const maxRate = 1.5 * j2RateFactor(gm, bodyRadius, j2, sma, ecc);
  const cosInc = -required / maxRate;
  if (cosInc < -1) {
    const perDay = (rate: number) => Number((rate * DEG_PER_DAY_PER_RAD_PER_S).toPrecision(4));
    return noAnswer(
      "sma",
      `the orbit is too high for a sun-synchronous plane: J2 turns its node at most ${perDay(maxRate)} deg/day (at i = 180 deg), less than the ${perDay(required)} deg/day needed`,
    );
  }
  return toDegrees(Math.acos(cosInc));
}

const MAX_REPEAT_ITERATIONS = 100;
const REPEAT_TOLERANCE = 1e-13;

/**
 * Semi-major axis (km) of the orbit whose ground track repeats after `revolutions` nodal
 * revolutions in `days` nodal days, J2 secular rates of node, periapsis and mean anomaly
 * included (Vallado 4th ed. ch. 11, repeat groundtracks, Example 11-3; Wertz et al., Space
 * Mission Engineering: The New SMAD, 2011, repeat ground tracks):
 *   revolutions / days = (n + dM/dt + dargp/dt) / |w_body - dRAAN/dt|
 * with w_body = 2 pi / rotation_period, the body's sidereal rotation period (s; negative for a
 * retrograde rotator). A nodal day is the time the body takes to turn once under the orbit
 * plane, 2 pi / |w_body - dRAAN/dt|: for a sun-synchronous Earth orbit it is the mean solar day
 * (86400 s), for other orbits it differs from it by minutes. Solved by fixed-point iteration on
 * n (the J2 terms are a small correction, so each step gains about three digits).
 * revolutions and days are whole numbers; sharing a common factor just repeats a shorter
 * cycle. No answer when the solution's periapsis lies inside the body; a bad j2 if the
 * iteration fails to settle (only for unphysically large J2). Accuracy: the neglected second-order terms
 * are of order J2^2 a, tens of metres in low Earth orbit; real repeat orbits, set with higher
 * zonals and frozen eccentricity, sit within about a kilometre of the result (the tests compare
 * Landsat and Sentinel-2). The sma is a mean element, not an osculating one.
 */
export function repeatTrackSma(
  gm: number,
  bodyRadius: number,
  j2: number,
  rotationPeriod: number,
  revolutions: number,
  days: number,
  ecc: number,
  inc: number,
): Result<number> {
  const bad = firstError(
    positive("body", gm, "km3/s2 (GM)"),
    positive("body_radius", bodyRadius, "km"),
    finite("j2", j2),
    Number.isFinite(rotationPeriod) && rotationPeriod !== 0
      ? undefined
      : badArgument("rotation_period", rotationPeriod, "the body's sidereal rotation period in s (negative for retrograde rotation)"),
    wholePositive("revolutions", revolutions, "revolutions of the orbit in one repeat cycle"),
    wholePositive("days", days, "nodal days in one repeat cycle"),
    Number.isFinite(ecc) && ecc >= 0 && ecc < 1 ? undefined : badArgument("ecc", ecc, "an eccentricity from 0 up to, but not including, 1"),
    within("inc", inc, 0, 180, "an inclination from 0 to 180 deg"),
  );
  if (bad) return bad;

  const spin = TWO_PI / rotationPeriod;
  const ratio = revolutions / days;
  const incRad = toRadians(inc);
  const smaOf = (n: number) => Math.cbrt(gm / (n * n));

  let sma = smaOf(ratio * Math.abs(spin));
  // J2 corrects the two-body sma by parts in a thousand: one whose periapsis is already deep in the
  // body (revolutions and days swapped, or a ratio no orbit reaches) has no answer, and the
  // series, which holds outside the body only, would not settle there.
  if (sma * (1 - ecc) < 0.9 * bodyRadius) return insideBody(revolutions, days, sma, bodyRadius);
  for (let k = 0; k < MAX_REPEAT_ITERATIONS; k++) {
    const f = j2RateFactor(gm, bodyRadius, j2, sma, ecc);
    const relativeSpin = Math.abs(spin - nodalRateKernel(f, incRad));
    const next = ratio * relativeSpin - meanAnomalyRateKernel(f, ecc, incRad) - apsidalRateKernel(f, incRad);
    if (!(next > 0) || !Number.isFinite(next))
      return noAnswer("revolutions", `no orbit makes ${revolutions} revolutions in ${days} nodal days: J2 drives the orbit's angular rate below zero`);
    const nextSma = smaOf(next);
    const converged = Math.abs(nextSma - sma) <= REPEAT_TOLERANCE * nextSma;
    sma = nextSma;
    if (converged) {
      if (sma * (1 - ecc) <= bodyRadius) return insideBody(revolutions, days, sma, bodyRadius);
      return sma;
    }
  }
  return badArgument("j2", j2, `a J2 small enough for the first-order theory: with ${j2} the repeat-track iteration did not settle in ${MAX_REPEAT_ITERATIONS} steps`);
}

function insideBody(revolutions: number, days: number, sma: number, bodyRadius: number): DomainError {
  return noAnswer(
    "revolutions",
    `${revolutions} revolutions in ${days} nodal day${days === 1 ? "" : "s"} needs sma ${Number(sma.toPrecision(7))} km, whose periapsis lies inside the body (radius ${bodyRadius} km); fewer revolutions per nodal day give a higher orbit (check that revolutions and days are not swapped)`,
  );
}

function wholePositive(parameter: string, value: number, what: string): DomainError | undefined {
  return Number.isInteger(value) && value >= 1 ? undefined : badArgument(parameter, value, `a whole number of 1 or more (${what})`);
}
