import { badArgument, type DomainError } from "./domain";

/**
 * Checks an element set's (sma, ecc) pair against the sign convention of DESIGN.md §3:
 * ellipses (0 <= ecc < 1) have sma > 0; hyperbolas (ecc > 1) have sma < 0 (a = -mu / 2 energy);
 * ecc exactly 1 has no finite sma, so element-based functions refuse it and say what to use.
 */
export function checkConicShape(sma: number, ecc: number): DomainError | undefined {
  if (!(ecc >= 0) || !Number.isFinite(ecc)) return badArgument("ecc", ecc, "an eccentricity of 0 or more");
  if (!Number.isFinite(sma) || sma === 0) return badArgument("sma", sma, "a nonzero semi-major axis in km (negative for a hyperbola)");
  if (ecc === 1)
    return badArgument("ecc", ecc, "an eccentricity other than exactly 1: a parabola has no finite sma, so give a state vector to PROPAGATE_STATE, or use ecc slightly above or below 1");
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
