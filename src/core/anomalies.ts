import { halfTurnRest, toDegrees, toRadians } from "./angles";
import { trueAnomalyInsideAsymptotes } from "./conic";
import { badArgument, finite, finiteResult, type DomainError, type Result } from "./domain";
import { meanFromTrue, solveKeplerElliptic, solveKeplerHyperbolic, trueFromMean } from "./kepler";

/**
 * Worksheet face of Kepler's equation (SOLVE_ECCENTRIC_ANOMALY, SOLVE_HYPERBOLIC_ANOMALY,
 * TRUE_ANOMALY_FROM_MEAN, MEAN_ANOMALY_FROM_TRUE). Sheet units: every angle in degrees; the
 * hyperbolic anomaly, the hyperbolic mean anomaly and the parabolic mean anomaly are
 * dimensionless (DEVELOPERS.md, "Conventions"). Kernels and methods: kepler.ts.
 *
 * Elliptic angles keep their revolution: an input 360 k + x degrees (|x| <= 180) gives
 * 360 k + (the answer for x), so M = 725 deg gives E = 720 deg + E(5 deg). The whole turns are
 * split off exactly in degrees before conversion to radians, so large angles lose no accuracy
 * beyond their own representation.
 */


const eccFinite = (ecc: number): DomainError | undefined =>
  ecc >= 0 && Number.isFinite(ecc) ? undefined : badArgument("ecc", ecc, "an eccentricity of 0 or more");

/** The mean anomaly of an open orbit is a plain number (no unit), so the guard says so. */
const dimensionless = (parameter: string, value: number, what: string): DomainError | undefined =>
  Number.isFinite(value) ? undefined : badArgument(parameter, value, `a finite number (${what}, dimensionless)`);


/**
 * SOLVE_ECCENTRIC_ANOMALY: eccentric anomaly E (deg) from mean anomaly M (deg) on an ellipse,
 * solving Kepler's equation M = E - e sin E (Markley's non-iterative method, see kepler.ts).
 * 0 <= ecc < 1. E stays in M's revolution: E - M lies within +-ecc rad (+-57.3 deg), so
 * M = 725 deg gives about 725 deg, not a value wrapped into [0, 360).
 * Accuracy: a few 1e-16 rad in the residual of Kepler's equation, i.e. E to ~1e-13 deg.
 */
export function eccentricAnomalyFromMean(mean_anomaly: number, ecc: number): Result<number> {
  const bad = finite("mean_anomaly", mean_anomaly, "degrees");
  if (bad) return bad;
  if (!(ecc >= 0 && ecc < 1))
    return badArgument(
      "ecc",
      ecc,
      "an eccentricity from 0 up to but not including 1 (an ellipse); for ecc > 1 solve for the hyperbolic anomaly instead, for ecc = 1 take the true anomaly from the parabolic (Barker) mean anomaly",
    );
  const rest = halfTurnRest(mean_anomaly);
  return finiteResult("mean_anomaly", mean_anomaly - rest + toDegrees(solveKeplerElliptic(toRadians(rest), ecc)));
}

/**
 * SOLVE_HYPERBOLIC_ANOMALY: hyperbolic anomaly H (dimensionless) from the hyperbolic mean
 * anomaly M = e sinh H - H (dimensionless, = n (t - T) with n = sqrt(mu/|a|^3)), ecc > 1, any
 * finite M of either sign. Accuracy: H to a few ulp relative (see solveKeplerHyperbolic).
 */
export function hyperbolicAnomalyFromMean(mean_anomaly: number, ecc: number): Result<number> {
  const bad = dimensionless("mean_anomaly", mean_anomaly, "the hyperbolic mean anomaly");
  if (bad) return bad;
  if (!(ecc > 1 && Number.isFinite(ecc)))
    return badArgument("ecc", ecc, "an eccentricity greater than 1 (a hyperbola); for 0 <= ecc < 1 solve for the eccentric anomaly instead");
  return finiteResult("mean_anomaly", solveKeplerHyperbolic(mean_anomaly, ecc));
}

/**
 * TRUE_ANOMALY_FROM_MEAN: true anomaly nu (deg) from the mean anomaly of any conic; what the
 * mean anomaly means depends on ecc:
 *   0 <= ecc < 1 (ellipse): mean anomaly M in degrees, M = E - e sin E. nu stays in M's
 *     revolution (M = 725 deg gives 720 deg + nu(5 deg)); nu and M agree at 0 and 180 deg.
 *   ecc = 1 (parabola): parabolic mean anomaly Mp, dimensionless, Mp = D + D^3/3 with
 *     D = tan(nu/2) (Barker's equation), i.e. Mp = sqrt(mu / (2 q^3)) (t - T) for periapsis
 *     radius q and time from periapsis t - T. nu lies in (-180, 180).
 *   ecc > 1 (hyperbola): hyperbolic mean anomaly M, dimensionless, M = e sinh H - H
 *     = sqrt(mu / |a|^3) (t - T). nu lies inside the asymptotes +-acos(-1/ecc).
 * Accuracy: ~1e-13 deg, except close to a hyperbola's asymptote where nu itself converges to
 * the limit angle.
 */
export function trueAnomalyFromMean(mean_anomaly: number, ecc: number): Result<number> {
  const bad =
    eccFinite(ecc) ??
    (ecc < 1
      ? finite("mean_anomaly", mean_anomaly, "degrees")
      : dimensionless("mean_anomaly", mean_anomaly, ecc === 1 ? "the parabolic mean anomaly" : "the hyperbolic mean anomaly"));
  if (bad) return bad;
  if (ecc < 1) {
    const rest = halfTurnRest(mean_anomaly);
    return finiteResult("mean_anomaly", mean_anomaly - rest + toDegrees(trueFromMean(toRadians(rest), ecc)));
  }
  return finiteResult("mean_anomaly", toDegrees(trueFromMean(mean_anomaly, ecc)));
}

/**
 * MEAN_ANOMALY_FROM_TRUE: the mean anomaly of any conic from true anomaly nu (deg); the inverse
 * of TRUE_ANOMALY_FROM_MEAN with the same three meanings (ellipse: degrees, same revolution as nu;
 * parabola: parabolic mean anomaly D + D^3/3; hyperbola: e sinh H - H, both dimensionless).
 * For ecc >= 1, nu (taken modulo 360 into [-180, 180)) must lie strictly inside the asymptotes
 * +-acos(-1/ecc) (+-180 deg for the parabola).
 * Accuracy: a few ulp relative near periapsis, ~1e-13 deg elsewhere on an ellipse; near a
 * hyperbola's asymptote the mean anomaly grows without bound and is as ill-conditioned as nu.
 */
export function meanAnomalyFromTrue(true_anomaly: number, ecc: number): Result<number> {
  const bad = eccFinite(ecc) ?? finite("true_anomaly", true_anomaly, "degrees");
  if (bad) return bad;
  if (ecc < 1) {
    const rest = halfTurnRest(true_anomaly);
    return finiteResult("true_anomaly", true_anomaly - rest + toDegrees(meanFromTrue(toRadians(rest), ecc)));
  }
  const nu = trueAnomalyInsideAsymptotes("true_anomaly", true_anomaly, ecc);
  if (typeof nu !== "number") return nu;
  return finiteResult("true_anomaly", meanFromTrue(toRadians(nu), ecc));
}
