import * as elements from "../core/elements";
import * as propagate from "../core/propagate";
import { isDomainError, type Result } from "../core/domain";
import { gmOf, surfaceOf } from "./bodyargs";
import { family } from "./define";
import { body, gm, num, state, STATE_LABELS, type BodyArg } from "./params";
import { elementsInside } from "./surface";

/** The state of the elements, refused when its position lies inside a catalogue body (often an altitude given as sma). */
function stateOf(b: BodyArg, a: number, e: number, i: number, raan: number, argp: number, nu: number): Result<number[]> {
  const out = elements.stateFromElements(gmOf(b), a, e, i, raan, argp, nu);
  const s = surfaceOf(b);
  if (isDomainError(out) || !s) return out;
  const distance = Math.hypot(out[0], out[1], out[2]);
  return distance < s.radius ? elementsInside("sma", a, distance, s) : out;
}

// Family "State": state vectors (x, y, z km, vx, vy, vz km/s in the body's inertial frame) and
// classical elements. Conventions for circular and equatorial orbits are stated in
// src/core/elements.ts. Examples: the invented Skerry-1 690 km sun-synchronous orbit.

const define = family("State");

const STATE_FROM_ELEMENTS = define.rows("STATE_FROM_ELEMENTS", STATE_LABELS, [body(), num("sma", "km"), num("ecc"), num("inc", "deg"), num("raan", "deg"), num("arg_periapsis", "deg"), num("true_anomaly", "deg")], stateOf, {
  example: ["Earth", 7068.137, 0.001, 98.2, 40, 90, 30, true],
  terms: ["position and velocity", "Cartesian", "COE2RV", "orbital elements to state"],
});
/**
 * State vector from classical elements (position and velocity in the body's inertial frame). Refuses (#VALUE!) elements that put the position inside a catalogue body (an altitude typed as sma).
 * @customfunction STATE_FROM_ELEMENTS
 * @helpurl https://localhost:3000/reference.html#state_from_elements
 * @param body Catalogue body name or GM in km³/s². A GM number has no surface to check distances against.
 * @param sma Semi-major axis, km (negative for a hyperbola).
 * @param ecc Eccentricity (not exactly 1).
 * @param inc Inclination, deg, 0 to 180.
 * @param raan Right ascension of the ascending node, deg.
 * @param arg_periapsis Argument of periapsis, deg.
 * @param true_anomaly True anomaly, deg.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: x, y, z (km), vx, vy, vz (km/s).
 */
export function stateFromElements(body: any[][], sma: any[][], ecc: any[][], inc: any[][], raan: any[][], arg_periapsis: any[][], true_anomaly: any[][], include_header?: any[][]): any[][] {
  return STATE_FROM_ELEMENTS(arguments);
}

const ELEMENTS_FROM_STATE = define.rows("ELEMENTS_FROM_STATE", ["sma (km)", "ecc", "inc (deg)", "raan (deg)", "argument of periapsis (deg)", "true anomaly (deg)"], [gm(), state()], elements.elementsFromState, {
  example: ["Earth", [[7068.137, 0, 0, 0, -1.0727, 7.4333]], true],
  terms: ["Keplerian elements", "orbital elements", "RV2COE", "osculating elements"],
});
/**
 * Classical elements of a state vector. Circular orbits: arg_periapsis = 0 and the true anomaly is the argument of latitude. Equatorial: raan = 0 and arg_periapsis is the longitude of periapsis. Both: raan = arg_periapsis = 0 and the true anomaly is the true longitude. A parabolic state is #N/A (its sma is infinite). Refuses (#VALUE!) a position inside the body.
 * @customfunction ELEMENTS_FROM_STATE
 * @helpurl https://localhost:3000/reference.html#elements_from_state
 * @param body Catalogue body name or GM in km³/s². A GM number has no surface to check distances against.
 * @param state Six cells in a row: x, y, z (km), vx, vy, vz (km/s); several rows for several states.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per state: sma (km), ecc, inc, raan, arg_periapsis, true anomaly (deg).
 */
export function elementsFromState(body: any[][], state: any[][], include_header?: any[][]): any[][] {
  return ELEMENTS_FROM_STATE(arguments);
}

const PROPAGATE_STATE = define.rows("PROPAGATE_STATE", STATE_LABELS, [gm(), state(), num("elapsed", "s")], propagate.propagateState, {
  example: ["Earth", [[7068.137, 0, 0, 0, -1.0727, 7.4333]], 3000],
  terms: ["Kepler's problem", "universal variables", "predict position", "coast"],
});
/**
 * State vector after an elapsed time on a two-body orbit, by universal variables: every conic, parabolic included; negative elapsed runs backwards. Two-body only: real orbits drift from it through J2, drag and third bodies. Refuses (#VALUE!) a starting position inside the body; whether the path later meets the surface is not checked.
 * @customfunction PROPAGATE_STATE
 * @helpurl https://localhost:3000/reference.html#propagate_state
 * @param body Catalogue body name or GM in km³/s². A GM number has no surface to check distances against.
 * @param state Six cells in a row: x, y, z (km), vx, vy, vz (km/s); several rows for several states.
 * @param elapsed Elapsed time, s.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: x, y, z (km), vx, vy, vz (km/s).
 */
export function propagateState(body: any[][], state: any[][], elapsed: any[][], include_header?: any[][]): any[][] {
  return PROPAGATE_STATE(arguments);
}
