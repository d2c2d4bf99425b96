import { badArgument, finiteResult, firstError, noAnswer, positive, type DomainError, type Result } from "./domain";

/**
 * Sizes of a body's gravitational neighbourhood about its parent, and the synodic period of two
 * bodies about one parent. Sheet units: km, s. Masses enter only as the ratio GM_body / GM_parent,
 * so system GMs (planet plus moons) belong here, not the planet-only GM (JPL DE440, NAIF
 * gm_de440.tpc, lists both: e.g. Mars system 42828.3758 km^3/s^2, Mars alone 42828.3736).
 * These are order-of-magnitude boundaries for patched-conic budgets, not dynamical limits.
 *
 * Every parameter is named `body` in errors (`body_a`/`body_b` for the synodic period): on the
 * sheet these values all come from the catalogue entry of that body.
 */

const bodyValue = (parameter: string, value: number, what: string): DomainError | undefined => positive(parameter, value, what);

function checkPair(sma: number, gmBody: number, gmParent: number): DomainError | undefined {
  return firstError(
    bodyValue("body", sma, "km (semi-major axis of the body's orbit about its parent)"),
    bodyValue("body", gmBody, "km3/s2 (GM of the body)"),
    bodyValue("body", gmParent, "km3/s2 (GM of the parent)"),
    gmBody < gmParent ? undefined : badArgument("body", gmBody, `a GM smaller than the parent's (${gmParent} km3/s2): these formulas assume a small body about a large one`),
  );
}

/**
 * Laplace sphere of influence (km): r = a (m/M)^(2/5), where the ratio of perturbing to central
 * acceleration is the same whether the body or its parent is taken as the centre (Laplace;
 * Curtis 2nd ed. ch. 8, sphere of influence; Vallado 4th ed. §12.2). Accuracy: a few ulp.
 */
export function soiRadius(sma: number, gmBody: number, gmParent: number): Result<number> {
  return checkPair(sma, gmBody, gmParent) ?? finiteResult("body", sma * Math.pow(gmBody / gmParent, 0.4));
}

/**
 * Hill radius (km) at pericentre: r = a (1 - e) (m / 3M)^(1/3) (the pericentric form, as usually
 * attributed to Hamilton & Burns 1992, Icarus 96:43; for e = 0 it is the circular Hill radius of
 * Murray & Dermott, Solar System Dynamics, 1999, ch. 3: the distance to L1 and L2 to first order
 * in (m/M)^(1/3)).
 * Accuracy: a few ulp.
 */
export function hillRadius(sma: number, ecc: number, gmBody: number, gmParent: number): Result<number> {
  const bad = checkPair(sma, gmBody, gmParent) ?? (ecc >= 0 && ecc < 1 ? undefined : badArgument("body", ecc, "an orbital eccentricity from 0 up to but not including 1"));
  return bad ?? finiteResult("body", sma * (1 - ecc) * Math.cbrt(gmBody / (3 * gmParent)));
}

/** Kernel: synodic period Ta Tb / |Tb - Ta| for unequal periods, ordered to avoid overflow and to be symmetric. */
export function synodicKernel(periodA: number, periodB: number): number {
  const lo = Math.min(periodA, periodB), hi = Math.max(periodA, periodB);
  return lo * (hi / (hi - lo));
}

/**
 * Synodic period (s) of two bodies orbiting the same parent with sidereal periods `periodA` and
 * `periodB` (s): 1 / |1/Ta - 1/Tb|, the time between successive identical alignments (Curtis 2nd
 * ed. ch. 8, rendezvous opportunities). Equal periods never change alignment: no answer.
 * Accuracy: a few ulp, plus the relative error of Tb - Ta when the periods are nearly equal.
 */
export function synodicPeriod(periodA: number, periodB: number): Result<number> {
  const bad = firstError(bodyValue("body_a", periodA, "s (orbital period)"), bodyValue("body_b", periodB, "s (orbital period)"));
  if (bad) return bad;
  if (periodA === periodB)
    return noAnswer("body_b", "the two bodies have the same orbital period, so their alignment never changes and the synodic period is infinite");
  return finiteResult("body_b", synodicKernel(periodA, periodB));
}
