import { clampedAsin, toDegrees, toRadians, TWO_PI } from "./angles";
import { checkConicShape, conicTerms, trueAnomalyInsideAsymptotes } from "./conic";
export { asymptoteTrueAnomaly } from "./conic";
import { badArgument, finite, finiteResult, firstError, isDomainError, noAnswer, nonNegative, positive, type DomainError, type Result } from "./domain";

/**
 * Two-body sizes and speeds in closed form. Sheet units: GM km^3/s^2, distances km, speeds km/s,
 * times s, angles deg. Each result is a few float64 operations, accurate to a few ulp (vis-viva
 * is written GM (2a - r) / (r a), so that near r = 2a, where the speed goes to zero, 2a - r is
 * exact and no digits are lost to cancellation). Results that overflow float64 are #NUM!, never
 * Infinity. Formulas: Vallado, Fundamentals of Astrodynamics and
 * Applications, 4th ed., §1.3-§2.2; Curtis, Orbital Mechanics for Engineering Students, ch. 2.
 */

const gmCheck = (gm: number): DomainError | undefined => positive("body", gm, "km3/s2 (GM)");

/** Kernel: mean motion n = sqrt(GM / |a|^3), rad/s, for ellipses and hyperbolas alike. */
export const meanMotion = (gm: number, sma: number): number => Math.sqrt(gm / Math.abs(sma * sma * sma));

/** Kernel: circular speed sqrt(GM / r), km/s. */
export const circularSpeed = (gm: number, radius: number): number => Math.sqrt(gm / radius);

/** Speed at `radius` on an orbit of semi-major axis `sma` (vis-viva); circular when sma is omitted. */
export function orbitalSpeed(gm: number, radius: number, sma?: number | null): Result<number> {
  const bad = firstError(gmCheck(gm), positive("radius", radius, "km"));
  if (bad) return bad;
  if (sma === undefined || sma === null) return finiteResult("radius", circularSpeed(gm, radius));
  if (!Number.isFinite(sma) || sma === 0)
    return badArgument("sma", sma, "a nonzero semi-major axis in km (negative for a hyperbola), or leave it out for a circular orbit");
  const v2 = (gm * ((2 * sma - radius) / radius)) / sma;
  if (v2 < 0) return noAnswer("radius", `${radius} km is beyond 2 x sma = ${2 * sma} km, which no orbit of that sma reaches`);
  return finiteResult("radius", Math.sqrt(v2));
}

/** Escape speed sqrt(2 GM / r). */
export function escapeSpeed(gm: number, radius: number): Result<number> {
  return firstError(gmCheck(gm), positive("radius", radius, "km")) ?? finiteResult("radius", Math.sqrt((2 * gm) / radius));
}

/** Orbital period 2 pi sqrt(a^3 / GM) of an ellipse (Kepler's third law). */
export function periodFromSma(gm: number, sma: number): Result<number> {
  const bad = firstError(gmCheck(gm), positive("sma", sma, "km (a hyperbola, sma < 0, has no period)"));
  return bad ?? finiteResult("sma", TWO_PI / meanMotion(gm, sma));
}

/** Semi-major axis of the ellipse with that period: cbrt(GM (T / 2 pi)^2). */
export function smaFromPeriod(gm: number, period: number): Result<number> {
  const bad = firstError(gmCheck(gm), positive("period", period, "s"));
  if (bad) return bad;
  const t = period / TWO_PI;
  return finiteResult("period", Math.cbrt(gm * t * t));
}

/** GM of the central body from one orbit's sma and period: 4 pi^2 a^3 / T^2. */
export function gmFromOrbit(sma: number, period: number): Result<number> {
  const bad = firstError(positive("sma", sma, "km"), positive("period", period, "s"));
  if (bad) return bad;
  const n = TWO_PI / period;
  return finiteResult("sma", n * n * sma * sma * sma);
}

/** Specific orbital energy -GM / (2a), km^2/s^2; positive for a hyperbola (sma < 0). */
export function specificEnergy(gm: number, sma: number): Result<number> {
  const bad = firstError(gmCheck(gm), Number.isFinite(sma) && sma !== 0 ? undefined : badArgument("sma", sma, "a nonzero semi-major axis in km (negative for a hyperbola)"));
  return bad ?? finiteResult("sma", -gm / (2 * sma));
}

/** Radius from the centre for an altitude above the body's reference radius. */
export function altitudeToRadius(bodyRadius: number, altitude: number): Result<number> {
  const bad = firstError(positive("body_radius", bodyRadius, "km"), Number.isFinite(altitude) ? undefined : badArgument("altitude", altitude, "a finite altitude in km"));
  if (bad) return bad;
  const r = bodyRadius + altitude;
  if (!Number.isFinite(r)) return finiteResult("altitude", r);
  return r > 0 ? r : badArgument("altitude", altitude, `an altitude above -${bodyRadius} km (the centre of the body)`);
}

/** Altitude above the body's reference radius for a radius from the centre. */
export function radiusToAltitude(bodyRadius: number, radius: number): Result<number> {
  return firstError(positive("body_radius", bodyRadius, "km"), positive("radius", radius, "km")) ?? finiteResult("radius", radius - bodyRadius);
}

/** [sma, ecc] of the ellipse through these apsides: a = (rp + ra)/2, e = (ra - rp)/(ra + rp). */
export function shapeFromApses(periapsisRadius: number, apoapsisRadius: number): Result<number[]> {
  const bad = firstError(positive("periapsis_radius", periapsisRadius, "km"), positive("apoapsis_radius", apoapsisRadius, "km"));
  if (bad) return bad;
  if (apoapsisRadius < periapsisRadius)
    return badArgument("apoapsis_radius", apoapsisRadius, `an apoapsis radius of at least the periapsis radius ${periapsisRadius} km`);
  // Halve before adding so that radii near the float64 limit do not overflow.
  const sma = periapsisRadius / 2 + apoapsisRadius / 2;
  return [sma, (apoapsisRadius - periapsisRadius) / 2 / sma];
}

/**
 * [periapsis radius, apoapsis radius] = [a(1 - e), a(1 + e)]. For a hyperbola (sma < 0, ecc > 1)
 * the periapsis is given and the apoapsis cell is #N/A, since the orbit has none.
 */
export function apsesFromShape(sma: number, ecc: number): Result<(number | DomainError)[]> {
  const bad = checkConicShape(sma, ecc);
  if (bad) return bad;
  const periapsis = sma * (1 - ecc);
  if (ecc > 1) return [periapsis, noAnswer("ecc", "a hyperbola (ecc > 1) has no apoapsis")];
  return [periapsis, finiteResult("sma", sma * (1 + ecc)) as number];
}

/** Any finite true anomaly on an ellipse; strictly inside the asymptotes on an open orbit. */
function checkTrueAnomalyOnConic(ecc: number, trueAnomaly: number): DomainError | undefined {
  if (ecc < 1) return finite("true_anomaly", trueAnomaly, "degrees");
  const nu = trueAnomalyInsideAsymptotes("true_anomaly", trueAnomaly, ecc);
  return isDomainError(nu) ? nu : undefined;
}

/** Conic equation r = a (1 - e^2) / (1 + e cos nu), in conicTerms' cancellation-free form. */
export function radiusAtAnomaly(sma: number, ecc: number, trueAnomaly: number): Result<number> {
  const bad = checkConicShape(sma, ecc) ?? checkTrueAnomalyOnConic(ecc, trueAnomaly);
  if (bad) return bad;
  const { p, onePlusECosNu } = conicTerms(sma, ecc, toRadians(trueAnomaly));
  return finiteResult("sma", p / onePlusECosNu);
}

/**
 * Flight-path angle gamma = atan2(e sin nu, 1 + e cos nu), deg, positive while climbing
 * (Vallado 4th ed. eq. 2-96 in its atan2 form, valid for every conic including the parabola).
 */
export function flightPathAngle(ecc: number, trueAnomaly: number): Result<number> {
  const bad = nonNegative("ecc", ecc) ?? checkTrueAnomalyOnConic(ecc, trueAnomaly);
  if (bad) return bad;
  const nu = toRadians(trueAnomaly);
  return toDegrees(Math.atan2(ecc * Math.sin(nu), 1 + ecc * Math.cos(nu)));
}

/**
 * [largest flight-path angle, true anomaly where it occurs] on an ellipse: gamma_max = asin(e)
 * at cos nu = -e (climbing branch; the descent mirrors it at -nu). Open orbits climb towards
 * the asymptote without a maximum, so ecc >= 1 has no answer.
 */
export function maxFlightPathAngle(ecc: number): Result<number[]> {
  const bad = nonNegative("ecc", ecc);
  if (bad) return bad;
  if (ecc >= 1) return noAnswer("ecc", "on a parabola or hyperbola the flight-path angle keeps growing towards the asymptote and has no maximum");
  return [toDegrees(clampedAsin(ecc)), toDegrees(Math.acos(-ecc))];
}
