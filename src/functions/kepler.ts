import * as anomalies from "../core/anomalies";
import * as tof from "../core/timeofflight";
import type { Result } from "../core/domain";
import { gmOf, surfaceOf } from "./bodyargs";
import { family } from "./define";
import { body, num, type BodyArg } from "./params";
import { orbitInside } from "./surface";

/**
 * A core call on a conic about the body, refused when the ellipse lies wholly inside a catalogue
 * body (apoapsis a(1 + e) below its radius: an altitude given as sma). An ellipse that dips
 * below the surface with its apoapsis above (a ballistic arc) is answered.
 */
const onConic =
  (core: (gm: number, sma: number, ecc: number, a: number, b: number) => Result<number>) =>
  (b: BodyArg, sma: number, ecc: number, x: number, y: number): Result<number> => {
    const s = surfaceOf(b);
    if (s && sma > 0 && ecc >= 0 && ecc < 1 && sma * (1 + ecc) < s.radius) return orbitInside("sma", sma, sma * (1 + ecc), s);
    return core(gmOf(b), sma, ecc, x, y);
  };

// Family "Kepler and time": Kepler's equation for every conic and the times and anomalies along
// an orbit. Methods and accuracy are stated in src/core/kepler.ts, anomalies.ts and
// timeofflight.ts. Examples: the invented Skerry-1 disposal ellipse, 250 km x 690 km.

const define = family("Kepler and time");

const SOLVE_ECCENTRIC_ANOMALY = define.scalar("SOLVE_ECCENTRIC_ANOMALY", [num("mean_anomaly", "deg"), num("ecc")], anomalies.eccentricAnomalyFromMean, {
  example: [120, 0.0321],
  terms: ["Kepler's equation", "eccentric anomaly", "mean to eccentric"],
});
/**
 * Eccentric anomaly from mean anomaly on an ellipse: solves Kepler's equation M = E − e sin E to about 1e-13 deg for every 0 ≤ e < 1. E stays in M's revolution (M = 725° gives about 725°).
 * @customfunction SOLVE_ECCENTRIC_ANOMALY
 * @helpurl https://localhost:3000/reference.html#solve_eccentric_anomaly
 * @param mean_anomaly Mean anomaly, deg.
 * @param ecc Eccentricity, 0 ≤ ecc < 1 (use SOLVE_HYPERBOLIC_ANOMALY for ecc > 1).
 * @returns Eccentric anomaly, deg.
 */
export function solveEccentricAnomaly(mean_anomaly: any[][], ecc: any[][]): any[][] {
  return SOLVE_ECCENTRIC_ANOMALY(arguments);
}

const SOLVE_HYPERBOLIC_ANOMALY = define.scalar("SOLVE_HYPERBOLIC_ANOMALY", [num("mean_anomaly", "dimensionless"), num("ecc")], anomalies.hyperbolicAnomalyFromMean, {
  example: [2.5, 1.4],
  terms: ["Kepler's equation", "hyperbola", "hyperbolic Kepler"],
});
/**
 * Hyperbolic anomaly from the hyperbolic mean anomaly: solves M = e sinh H − H for ecc > 1 (both dimensionless; M = sqrt(GM/|a|³)·(t − T)).
 * @customfunction SOLVE_HYPERBOLIC_ANOMALY
 * @helpurl https://localhost:3000/reference.html#solve_hyperbolic_anomaly
 * @param mean_anomaly Hyperbolic mean anomaly, dimensionless.
 * @param ecc Eccentricity, greater than 1.
 * @returns Hyperbolic anomaly H, dimensionless.
 */
export function solveHyperbolicAnomaly(mean_anomaly: any[][], ecc: any[][]): any[][] {
  return SOLVE_HYPERBOLIC_ANOMALY(arguments);
}

const TRUE_ANOMALY_FROM_MEAN = define.scalar("TRUE_ANOMALY_FROM_MEAN", [num("mean_anomaly"), num("ecc")], anomalies.trueAnomalyFromMean, {
  example: [120, 0.0321],
  terms: ["Kepler's equation", "position in orbit", "mean to true"],
});
/**
 * True anomaly from the mean anomaly of any conic. Ellipse (ecc < 1): mean anomaly in deg. Parabola (ecc = 1): Barker's mean anomaly D + D³/3 with D = tan(ν/2), dimensionless. Hyperbola (ecc > 1): e sinh H − H, dimensionless.
 * @customfunction TRUE_ANOMALY_FROM_MEAN
 * @helpurl https://localhost:3000/reference.html#true_anomaly_from_mean
 * @param mean_anomaly Mean anomaly: deg for an ellipse, dimensionless for a parabola or hyperbola.
 * @param ecc Eccentricity, 0 or more.
 * @returns True anomaly, deg (inside the asymptotes for a hyperbola).
 */
export function trueAnomalyFromMean(mean_anomaly: any[][], ecc: any[][]): any[][] {
  return TRUE_ANOMALY_FROM_MEAN(arguments);
}

const MEAN_ANOMALY_FROM_TRUE = define.scalar("MEAN_ANOMALY_FROM_TRUE", [num("true_anomaly", "deg"), num("ecc")], anomalies.meanAnomalyFromTrue, {
  example: [90, 0.0321],
  terms: ["time since periapsis", "true to mean"],
});
/**
 * Mean anomaly from true anomaly on any conic; the inverse of TRUE_ANOMALY_FROM_MEAN with the same meanings of the mean anomaly.
 * @customfunction MEAN_ANOMALY_FROM_TRUE
 * @helpurl https://localhost:3000/reference.html#mean_anomaly_from_true
 * @param true_anomaly True anomaly, deg (strictly inside the asymptotes for ecc ≥ 1).
 * @param ecc Eccentricity, 0 or more.
 * @returns Mean anomaly: deg for an ellipse, dimensionless for a parabola or hyperbola.
 */
export function meanAnomalyFromTrue(true_anomaly: any[][], ecc: any[][]): any[][] {
  return MEAN_ANOMALY_FROM_TRUE(arguments);
}

const TIME_OF_FLIGHT = define.scalar("TIME_OF_FLIGHT", [body(), num("sma", "km"), num("ecc"), num("true_anomaly_from", "deg"), num("true_anomaly_to", "deg")], onConic(tof.timeOfFlight), {
  example: ["Earth", 6848.137, 0.0321, 0, 180],
  terms: ["time between anomalies", "transfer time", "flight time", "duration"],
});
/**
 * Time to fly from one true anomaly to another on a two-body orbit. Ellipse: the forward time, from 0 up to one period. Hyperbola: the signed time, negative when the second anomaly comes first. Refuses (#VALUE!) an ellipse wholly inside a catalogue body (an altitude typed as sma); a ballistic arc with its apoapsis above the surface is answered.
 * @customfunction TIME_OF_FLIGHT
 * @helpurl https://localhost:3000/reference.html#time_of_flight
 * @param body Catalogue body name or GM in km³/s². A GM number has no surface to check distances against.
 * @param sma Semi-major axis, km (negative for a hyperbola).
 * @param ecc Eccentricity (not exactly 1).
 * @param true_anomaly_from Starting true anomaly, deg.
 * @param true_anomaly_to Final true anomaly, deg.
 * @returns Time of flight, s.
 */
export function timeOfFlight(body: any[][], sma: any[][], ecc: any[][], true_anomaly_from: any[][], true_anomaly_to: any[][]): any[][] {
  return TIME_OF_FLIGHT(arguments);
}

const TRUE_ANOMALY_AT_TIME = define.scalar("TRUE_ANOMALY_AT_TIME", [body(), num("sma", "km"), num("ecc"), num("true_anomaly_start", "deg"), num("elapsed", "s")], onConic(tof.trueAnomalyAtTime), {
  example: ["Earth", 6848.137, 0.0321, 0, 1200],
  terms: ["propagate anomaly", "where after time", "Kepler's problem"],
});
/**
 * True anomaly after an elapsed time on a two-body orbit (negative elapsed runs backwards). Ellipse: result in [0, 360). Hyperbola: inside the asymptotes. Refuses (#VALUE!) an ellipse wholly inside a catalogue body (an altitude typed as sma).
 * @customfunction TRUE_ANOMALY_AT_TIME
 * @helpurl https://localhost:3000/reference.html#true_anomaly_at_time
 * @param body Catalogue body name or GM in km³/s². A GM number has no surface to check distances against.
 * @param sma Semi-major axis, km (negative for a hyperbola).
 * @param ecc Eccentricity (not exactly 1).
 * @param true_anomaly_start True anomaly at the start, deg.
 * @param elapsed Elapsed time, s.
 * @returns True anomaly, deg.
 */
export function trueAnomalyAtTime(body: any[][], sma: any[][], ecc: any[][], true_anomaly_start: any[][], elapsed: any[][]): any[][] {
  return TRUE_ANOMALY_AT_TIME(arguments);
}
