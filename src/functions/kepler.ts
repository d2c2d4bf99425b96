import * as anomalies from "../core/anomalies";
import * as tof from "../core/timeofflight";
import { gmOf } from "./bodyargs";
import { lift, scalar } from "./lift";
import { body, num } from "./params";

// Family "Kepler and time" (DESIGN.md §4): Kepler's equation for every conic and the times and
// anomalies along an orbit. Methods and accuracy are stated in src/core/kepler.ts, anomalies.ts
// and timeofflight.ts.

const f = {
  solveEccentricAnomaly: lift(scalar, [num("mean_anomaly", "deg"), num("ecc")], anomalies.eccentricAnomalyFromMean),
  solveHyperbolicAnomaly: lift(scalar, [num("mean_anomaly", "dimensionless"), num("ecc")], anomalies.hyperbolicAnomalyFromMean),
  trueAnomalyFromMean: lift(scalar, [num("mean_anomaly"), num("ecc")], anomalies.trueAnomalyFromMean),
  meanAnomalyFromTrue: lift(scalar, [num("true_anomaly", "deg"), num("ecc")], anomalies.meanAnomalyFromTrue),
  timeOfFlight: lift(scalar, [body(), num("sma", "km"), num("ecc"), num("true_anomaly_from", "deg"), num("true_anomaly_to", "deg")], (b, a, e, nu1, nu2) =>
    tof.timeOfFlight(gmOf(b), a, e, nu1, nu2),
  ),
  trueAnomalyAtTime: lift(scalar, [body(), num("sma", "km"), num("ecc"), num("true_anomaly_start", "deg"), num("elapsed", "s")], (b, a, e, nu, t) =>
    tof.trueAnomalyAtTime(gmOf(b), a, e, nu, t),
  ),
};

/**
 * Eccentric anomaly from mean anomaly on an ellipse: solves Kepler's equation M = E − e sin E to about 1e-13 deg for every 0 ≤ e < 1. E stays in M's revolution (M = 725° gives about 725°).
 * @customfunction SOLVE_ECCENTRIC_ANOMALY
 * @helpurl https://localhost:3000/reference.html#solve_eccentric_anomaly
 * @param mean_anomaly Mean anomaly, deg.
 * @param ecc Eccentricity, 0 ≤ ecc < 1 (use SOLVE_HYPERBOLIC_ANOMALY for ecc > 1).
 * @returns Eccentric anomaly, deg.
 */
export function solveEccentricAnomaly(mean_anomaly: any[][], ecc: any[][]): any[][] {
  return f.solveEccentricAnomaly(mean_anomaly, ecc);
}

/**
 * Hyperbolic anomaly from the hyperbolic mean anomaly: solves M = e sinh H − H for ecc > 1 (both dimensionless; M = sqrt(GM/|a|³)·(t − T)).
 * @customfunction SOLVE_HYPERBOLIC_ANOMALY
 * @helpurl https://localhost:3000/reference.html#solve_hyperbolic_anomaly
 * @param mean_anomaly Hyperbolic mean anomaly, dimensionless.
 * @param ecc Eccentricity, greater than 1.
 * @returns Hyperbolic anomaly H, dimensionless.
 */
export function solveHyperbolicAnomaly(mean_anomaly: any[][], ecc: any[][]): any[][] {
  return f.solveHyperbolicAnomaly(mean_anomaly, ecc);
}

/**
 * True anomaly from the mean anomaly of any conic. Ellipse (ecc < 1): mean anomaly in deg. Parabola (ecc = 1): Barker's mean anomaly D + D³/3 with D = tan(ν/2), dimensionless. Hyperbola (ecc > 1): e sinh H − H, dimensionless.
 * @customfunction TRUE_ANOMALY_FROM_MEAN
 * @helpurl https://localhost:3000/reference.html#true_anomaly_from_mean
 * @param mean_anomaly Mean anomaly: deg for an ellipse, dimensionless for a parabola or hyperbola.
 * @param ecc Eccentricity, 0 or more.
 * @returns True anomaly, deg (inside the asymptotes for a hyperbola).
 */
export function trueAnomalyFromMean(mean_anomaly: any[][], ecc: any[][]): any[][] {
  return f.trueAnomalyFromMean(mean_anomaly, ecc);
}

/**
 * Mean anomaly from true anomaly on any conic; the inverse of TRUE_ANOMALY_FROM_MEAN with the same meanings of the mean anomaly.
 * @customfunction MEAN_ANOMALY_FROM_TRUE
 * @helpurl https://localhost:3000/reference.html#mean_anomaly_from_true
 * @param true_anomaly True anomaly, deg (strictly inside the asymptotes for ecc ≥ 1).
 * @param ecc Eccentricity, 0 or more.
 * @returns Mean anomaly: deg for an ellipse, dimensionless for a parabola or hyperbola.
 */
export function meanAnomalyFromTrue(true_anomaly: any[][], ecc: any[][]): any[][] {
  return f.meanAnomalyFromTrue(true_anomaly, ecc);
}

/**
 * Time to fly from one true anomaly to another on a two-body orbit. Ellipse: the forward time, from 0 up to one period. Hyperbola: the signed time, negative when the second anomaly comes first.
 * @customfunction TIME_OF_FLIGHT
 * @helpurl https://localhost:3000/reference.html#time_of_flight
 * @param body Catalogue body name or GM in km³/s².
 * @param sma Semi-major axis, km (negative for a hyperbola).
 * @param ecc Eccentricity (not exactly 1).
 * @param true_anomaly_from Starting true anomaly, deg.
 * @param true_anomaly_to Final true anomaly, deg.
 * @returns Time of flight, s.
 */
export function timeOfFlight(body: any[][], sma: any[][], ecc: any[][], true_anomaly_from: any[][], true_anomaly_to: any[][]): any[][] {
  return f.timeOfFlight(body, sma, ecc, true_anomaly_from, true_anomaly_to);
}

/**
 * True anomaly after an elapsed time on a two-body orbit (negative elapsed runs backwards). Ellipse: result in [0, 360). Hyperbola: inside the asymptotes.
 * @customfunction TRUE_ANOMALY_AT_TIME
 * @helpurl https://localhost:3000/reference.html#true_anomaly_at_time
 * @param body Catalogue body name or GM in km³/s².
 * @param sma Semi-major axis, km (negative for a hyperbola).
 * @param ecc Eccentricity (not exactly 1).
 * @param true_anomaly_start True anomaly at the start, deg.
 * @param elapsed Elapsed time, s.
 * @returns True anomaly, deg.
 */
export function trueAnomalyAtTime(body: any[][], sma: any[][], ecc: any[][], true_anomaly_start: any[][], elapsed: any[][]): any[][] {
  return f.trueAnomalyAtTime(body, sma, ecc, true_anomaly_start, elapsed);
}
