import * as elements from "../core/elements";
import * as propagate from "../core/propagate";
import { gmOf } from "./bodyargs";
import { lift, row } from "./lift";
import { body, num, vec } from "./params";

// Family "State" (DESIGN.md §4): state vectors (x, y, z km, vx, vy, vz km/s in the body's
// inertial frame) and classical elements. Conventions for circular and equatorial orbits are
// stated in src/core/elements.ts.

const STATE_LABELS = ["x (km)", "y (km)", "z (km)", "vx (km/s)", "vy (km/s)", "vz (km/s)"];
const STATE = "x, y, z in km and vx, vy, vz in km/s";

const f = {
  stateFromElements: lift(
    row(...STATE_LABELS),
    [body(), num("sma", "km"), num("ecc"), num("inc", "deg"), num("raan", "deg"), num("argp", "deg"), num("true_anomaly", "deg")],
    (b, a, e, i, raan, argp, nu) => elements.stateFromElements(gmOf(b), a, e, i, raan, argp, nu),
  ),
  elementsFromState: lift(row("sma (km)", "ecc", "inc (deg)", "raan (deg)", "argp (deg)", "true anomaly (deg)"), [body(), vec("state", 6, STATE)], (b, s) =>
    elements.elementsFromState(gmOf(b), s),
  ),
  propagateState: lift(row(...STATE_LABELS), [body(), vec("state", 6, STATE), num("elapsed", "s")], (b, s, t) => propagate.propagateState(gmOf(b), s, t)),
};

/**
 * State vector from classical elements (position and velocity in the body's inertial frame).
 * @customfunction STATE_FROM_ELEMENTS
 * @helpurl https://localhost:3000/reference.html#state_from_elements
 * @param body Catalogue body name or GM in km³/s².
 * @param sma Semi-major axis, km (negative for a hyperbola).
 * @param ecc Eccentricity (not exactly 1).
 * @param inc Inclination, deg, 0 to 180.
 * @param raan Right ascension of the ascending node, deg.
 * @param argp Argument of periapsis, deg.
 * @param true_anomaly True anomaly, deg.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: x, y, z (km), vx, vy, vz (km/s).
 */
export function stateFromElements(body: any[][], sma: any[][], ecc: any[][], inc: any[][], raan: any[][], argp: any[][], true_anomaly: any[][], include_header?: any[][]): any[][] {
  return f.stateFromElements(body, sma, ecc, inc, raan, argp, true_anomaly, include_header);
}

/**
 * Classical elements of a state vector. Circular orbits: argp = 0 and the true anomaly is the argument of latitude. Equatorial: raan = 0 and argp is the longitude of periapsis. Both: raan = argp = 0 and the true anomaly is the true longitude. A parabolic state is #N/A (its sma is infinite).
 * @customfunction ELEMENTS_FROM_STATE
 * @helpurl https://localhost:3000/reference.html#elements_from_state
 * @param body Catalogue body name or GM in km³/s².
 * @param state Six cells in a row: x, y, z (km), vx, vy, vz (km/s); several rows for several states.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per state: sma (km), ecc, inc, raan, argp, true anomaly (deg).
 */
export function elementsFromState(body: any[][], state: any[][], include_header?: any[][]): any[][] {
  return f.elementsFromState(body, state, include_header);
}

/**
 * State vector after an elapsed time on a two-body orbit, by universal variables: every conic, parabolic included; negative elapsed runs backwards. Two-body only: real orbits drift from it through J2, drag and third bodies.
 * @customfunction PROPAGATE_STATE
 * @helpurl https://localhost:3000/reference.html#propagate_state
 * @param body Catalogue body name or GM in km³/s².
 * @param state Six cells in a row: x, y, z (km), vx, vy, vz (km/s); several rows for several states.
 * @param elapsed Elapsed time, s.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: x, y, z (km), vx, vy, vz (km/s).
 */
export function propagateState(body: any[][], state: any[][], elapsed: any[][], include_header?: any[][]): any[][] {
  return f.propagateState(body, state, elapsed, include_header);
}
