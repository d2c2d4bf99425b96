import { toDegrees, toRadians, TWO_PI, wrapDegrees180, wrapDegrees360, wrapRadians } from "./angles";
import { trueAnomalyInsideAsymptotes } from "./conic";
import { checkConicShape } from "./conic";
import { arithmeticFailure, DomainError, finite, finiteResult, firstError, positive, type Result } from "./domain";
import { meanFromTrue, trueFromMean } from "./kepler";
import { meanMotion } from "./twobody";

/**
 * Time of flight between true anomalies, and true anomaly after a time, on a two-body ellipse
 * or hyperbola (TIME_OF_FLIGHT, TRUE_ANOMALY_AT_TIME). Sheet units: body = GM in km^3/s^2,
 * sma km (negative for a hyperbola), ecc, angles deg, times s. Method: mean anomaly grows as
 * n t with n = sqrt(GM/|a|^3) (Kepler's equation, kepler.ts); e.g. Vallado, Fundamentals of
 * Astrodynamics and Applications, 4th ed., §2.2, or Curtis, Orbital Mechanics for Engineering
 * Students, ch. 3. ecc exactly 1 has no finite sma and is refused by checkConicShape, which says
 * what to use instead. Two-body only: no perturbations, so a preliminary figure, not for operations.
 */

/** Mean motion, or #NUM! when sqrt(GM/|a|^3) leaves float64 (absurd GM or sma). */
function checkedMeanMotion(gm: number, sma: number): Result<number> {
  const n = meanMotion(gm, sma);
  return n > 0 && Number.isFinite(n) ? n : arithmeticFailure("sma", "the mean motion sqrt(GM/|sma|^3) under- or overflows float64");
}

/** Mean anomaly (rad for the ellipse, dimensionless for the hyperbola) at a sheet true anomaly, or the asymptote error. */
function meanAt(parameter: string, trueAnomaly: number, ecc: number): Result<number> {
  if (ecc < 1) return meanFromTrue(toRadians(wrapDegrees180(trueAnomaly)), ecc);
  const nu = trueAnomalyInsideAsymptotes(parameter, trueAnomaly, ecc);
  return typeof nu === "number" ? meanFromTrue(toRadians(nu), ecc) : nu;
}

/**
 * The checks both functions share (GM, the conic's shape, the first anomaly), then its mean
 * motion and the mean anomaly at that true anomaly.
 */
function startOnConic(gm: number, sma: number, ecc: number, parameter: string, trueAnomaly: number, more: DomainError | undefined): Result<{ n: number; m: number }> {
  const bad = firstError(positive("body", gm, "km3/s2 (GM)"), checkConicShape(sma, ecc), finite(parameter, trueAnomaly, "degrees"), more);
  if (bad) return bad;
  const n = checkedMeanMotion(gm, sma);
  if (typeof n !== "number") return n;
  const m = meanAt(parameter, trueAnomaly, ecc);
  return typeof m === "number" ? { n, m } : m;
}

/**
 * TIME_OF_FLIGHT (s) from true_anomaly_from to true_anomaly_to (deg).
 * Ellipse (0 <= ecc < 1, sma > 0): the forward (prograde) time, in [0, period): going from 350 to
 * 10 deg crosses periapsis, and from 10 to 350 takes most of a revolution.
 * Hyperbola (ecc > 1, sma < 0): the signed time, negative when true_anomaly_to comes before
 * true_anomaly_from; both anomalies (modulo 360, in [-180, 180)) must lie strictly inside the
 * asymptotes +-acos(-1/ecc).
 * Accuracy: a few 1e-16 of the period (ellipse) or of the larger |mean anomaly| / n (hyperbola).
 */
export function timeOfFlight(gm: number, sma: number, ecc: number, true_anomaly_from: number, true_anomaly_to: number): Result<number> {
  const start = startOnConic(gm, sma, ecc, "true_anomaly_from", true_anomaly_from, finite("true_anomaly_to", true_anomaly_to, "degrees"));
  if (start instanceof DomainError) return start;
  const { n, m: m1 } = start;
  const m2 = meanAt("true_anomaly_to", true_anomaly_to, ecc);
  if (typeof m2 !== "number") return m2;
  const dm = ecc < 1 ? wrapRadians(m2 - m1) : m2 - m1;
  return finiteResult("sma", dm / n);
}

/**
 * TRUE_ANOMALY_AT_TIME (deg) after `elapsed` seconds (any sign, any size) from true_anomaly_start.
 * Ellipse: result in [0, 360). Whole periods are removed first, as the exact float64 remainder
 * elapsed % period (period = 2 pi / n, as PERIOD_FROM_SMA gives it), and only the rest is turned
 * into mean anomaly; so whole periods return exactly to the start, and over k revolutions the
 * error grows only as the rounding of n and of elapsed themselves allow, about 1e-15 k rad of
 * mean anomaly (1e-9 rad after a million revolutions).
 * Hyperbola: true_anomaly_start strictly inside the asymptotes; result in (-nu_inf, nu_inf),
 * nu_inf = acos(-1/ecc), approached (and in float64 reached) as |elapsed| grows.
 */
export function trueAnomalyAtTime(gm: number, sma: number, ecc: number, true_anomaly_start: number, elapsed: number): Result<number> {
  const start = startOnConic(gm, sma, ecc, "true_anomaly_start", true_anomaly_start, finite("elapsed", elapsed, "s"));
  if (start instanceof DomainError) return start;
  const { n, m: m0 } = start;
  if (ecc < 1) {
    const rest = elapsed % (TWO_PI / n);
    return wrapDegrees360(toDegrees(trueFromMean(m0 + n * rest, ecc)));
  }
  const m = m0 + n * elapsed;
  if (!Number.isFinite(m)) return arithmeticFailure("elapsed", "the mean anomaly n x elapsed overflows float64");
  return finiteResult("elapsed", toDegrees(trueFromMean(m, ecc)));
}
