import { halfTurnRest, toDegrees } from "./angles";
import { badArgument, finite, type DomainError, type Result } from "./domain";

/**
 * Checks an element set's (sma, ecc) pair against the sign convention of DEVELOPERS.md, "Conventions":
 * ellipses (0 <= ecc < 1) have sma > 0; hyperbolas (ecc > 1) have sma < 0 (a = -mu / 2 energy);
 * ecc exactly 1 has no finite sma, so element-based functions refuse it and say what to use.
 */
export function checkConicShape(sma: number, ecc: number): DomainError | undefined {
  if (!(ecc >= 0) || !Number.isFinite(ecc)) return badArgument("ecc", ecc, "an eccentricity of 0 or more");
  if (!Number.isFinite(sma) || sma === 0) return badArgument("sma", sma, "a nonzero semi-major axis in km (negative for a hyperbola)");
  if (ecc === 1)
    return badArgument("ecc", ecc, "an eccentricity other than exactly 1: a parabola has no finite sma, so propagate a state vector instead (universal variables take every conic), or use ecc slightly above or below 1");
  if (ecc < 1 && sma < 0) return badArgument("sma", sma, "a positive sma for an ellipse (ecc < 1)");
  if (ecc > 1 && sma > 0) return badArgument("sma", sma, "a negative sma for a hyperbola (ecc > 1), since a = -mu/(2 energy)");
  return undefined;
}

/**
 * Kernel: semi-latus rectum p = a (1 - e)(1 + e), and 1 + e cos(nu) written as
 * (1 - e) + 2e cos^2(nu/2). The textbook forms a(1 - e^2) and 1 + e cos(nu) cancel near e = 1
 * (losing ~1e-16 / |1 - e| relative); these keep full precision on every conic.
 */
export function conicTerms(sma: number, ecc: number, trueAnomalyRad: number): { p: number; onePlusECosNu: number; twoCosHalf2: number } {
  const oneMinusE = 1 - ecc;
  const cosHalf = Math.cos(trueAnomalyRad / 2);
  const twoCosHalf2 = 2 * cosHalf * cosHalf;
  return { p: sma * oneMinusE * (1 + ecc), onePlusECosNu: oneMinusE + ecc * twoCosHalf2, twoCosHalf2 };
}

/** Largest true anomaly magnitude (deg) reachable on a hyperbola: the asymptote acos(-1/e). */
export const asymptoteTrueAnomaly = (ecc: number): number => toDegrees(Math.acos(-1 / ecc));

/** The bad-argument error for a true anomaly on or beyond an open orbit's asymptotes. */
export function asymptoteError(parameter: string, trueAnomaly: number, ecc: number): DomainError {
  const shown = Number((ecc === 1 ? 180 : asymptoteTrueAnomaly(ecc)).toPrecision(10));
  return badArgument(
    parameter,
    trueAnomaly,
    `a true anomaly strictly between -${shown} and ${shown} deg: the asymptotes of an orbit with ecc = ${Number(ecc.toPrecision(10))} are at acos(-1/ecc)`,
  );
}

/**
 * Checks a true anomaly (deg) against the asymptotes of an open orbit: for ecc >= 1 the angle,
 * taken modulo 360 into [-180, 180), must lie strictly inside +-acos(-1/ecc) (+-180 deg for the
 * parabola). Returns the reduced angle in degrees, or the error.
 */
export function trueAnomalyInsideAsymptotes(parameter: string, trueAnomaly: number, ecc: number): Result<number> {
  const bad = finite(parameter, trueAnomaly, "degrees");
  if (bad) return bad;
  const nu = halfTurnRest(trueAnomaly);
  const reduced = nu === 180 ? -180 : nu;
  const limit = ecc === 1 ? 180 : asymptoteTrueAnomaly(ecc);
  // Within 1e-12 of the limit counts as on it: acos and the degree conversion round either way
  // there, and the mean anomaly would be beyond 1e12 anyway.
  if (Math.abs(reduced) >= limit * (1 - 1e-12)) {
    return asymptoteError(parameter, trueAnomaly, ecc);
  }
  return reduced;
}
