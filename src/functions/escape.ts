import * as hyperbolic from "../core/hyperbolic";
import * as spheres from "../core/spheres";
import { badArgument, withAll, type Result } from "../core/domain";
import type { Body } from "../catalogue/types";
import { gmOf, orbitOf, parentOf, sharedParentOf, systemGmOf } from "./bodyargs";
import { family } from "./define";
import { body, gm, num, optNum, radius, type BodyArg } from "./params";

// Family "Escape and capture": patched-conic departure, capture and flyby about one
// body (GM of the body alone), and the sizes of a body's neighbourhood about its catalogue parent.
// SOI and Hill radius take the body's system GM (planet with its moons, where the catalogue has
// one) over the parent's own GM, with the body's catalogue orbit. Examples: the invented Skerry-L
// cubesat's Earth departure from 300 km and capture into a 100 km lunar orbit.

/** SOI and Hill radius: the body's catalogue orbit and its parent, or why there are none. */
function aboutParent(b: BodyArg, core: (orbit: NonNullable<Body["orbit"]>, gmBody: number, gmParent: number) => Result<number>): Result<number> {
  return withAll([parentOf(b), orbitOf(b)], (parent, orbit) => core(orbit, systemGmOf(b), gmOf(parent)));
}

const define = family("Escape and capture");

const HYPERBOLIC_EXCESS_SPEED = define.scalar("HYPERBOLIC_EXCESS_SPEED", [gm(), radius("radius"), num("speed", "km/s")], hyperbolic.hyperbolicExcessSpeed, {
  example: ["Earth", 6678.137, 11.5],
  terms: ["v infinity", "v-inf", "excess velocity", "escape"],
});
/**
 * Hyperbolic excess speed (speed left at infinity) of an object at a distance from the body moving at a given speed: sqrt(v² − 2 GM / r). #N/A when the speed is below escape speed (a bound orbit). Two-body, point-mass body. Refuses (#VALUE!) a radius inside the body (an altitude typed as a radius); a GM number is not checked against any surface.
 * @customfunction HYPERBOLIC_EXCESS_SPEED
 * @helpurl https://localhost:3000/reference.html#hyperbolic_excess_speed
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s². A GM number has no surface to check distances against.
 * @param radius Distance from the body's centre, km.
 * @param speed Speed at that distance, km/s.
 * @returns Hyperbolic excess speed v∞, km/s (0 at exactly escape speed).
 */
export function hyperbolicExcessSpeed(body: any[][], radius: any[][], speed: any[][]): any[][] {
  return HYPERBOLIC_EXCESS_SPEED(arguments);
}

const C3_ENERGY = define.scalar("C3_ENERGY", [num("v_infinity", "km/s")], hyperbolic.c3Energy, {
  example: [3.2],
  terms: ["characteristic energy", "launch energy", "v infinity squared"],
});
/**
 * Characteristic energy C3 = v∞², the launch-energy figure of an escape trajectory (twice its specific energy).
 * @customfunction C3_ENERGY
 * @helpurl https://localhost:3000/reference.html#c3_energy
 * @param v_infinity Hyperbolic excess speed, km/s.
 * @returns C3, km²/s².
 */
export function c3Energy(v_infinity: any[][]): any[][] {
  return C3_ENERGY(arguments);
}

const DEPARTURE_DV = define.scalar("DEPARTURE_DV", [gm(), radius("parking_radius"), num("v_infinity", "km/s")], hyperbolic.departureDv, {
  example: ["Earth", 6678.137, 3.2],
  terms: ["escape burn", "trans-planetary injection", "injection dv", "delta-v", "dv"],
});
/**
 * Delta-v of one periapsis burn from a circular parking orbit onto an escape hyperbola with the given excess speed (patched conics, impulsive, no losses): a preliminary two-body estimate. Refuses (#VALUE!) a parking radius inside the body (an altitude typed as a parking radius); a GM number is not checked against any surface.
 * @customfunction DEPARTURE_DV
 * @helpurl https://localhost:3000/reference.html#departure_dv
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s². A GM number has no surface to check distances against.
 * @param parking_radius Radius of the circular parking orbit, km.
 * @param v_infinity Hyperbolic excess speed wanted, km/s.
 * @returns Delta-v, km/s.
 */
export function departureDv(body: any[][], parking_radius: any[][], v_infinity: any[][]): any[][] {
  return DEPARTURE_DV(arguments);
}

const CAPTURE_DV = define.scalar("CAPTURE_DV", [gm(), radius("periapsis_radius"), num("v_infinity", "km/s"), optNum("capture_ecc")], hyperbolic.captureDv, {
  example: ["Moon", 1837.4, 0.8],
  terms: ["orbit insertion", "arrival burn", "braking", "delta-v", "dv"],
});
/**
 * Delta-v of one periapsis burn from an arrival hyperbola into an orbit with that periapsis (circular unless capture_ecc is given; patched conics, impulsive, no losses): a preliminary two-body estimate. Refuses (#VALUE!) a periapsis radius inside the body (an altitude typed as a periapsis radius); a GM number is not checked against any surface.
 * @customfunction CAPTURE_DV
 * @helpurl https://localhost:3000/reference.html#capture_dv
 * @param body Catalogue body name (e.g. "Mars") or GM in km³/s². A GM number has no surface to check distances against.
 * @param periapsis_radius Periapsis radius of the arrival hyperbola and of the capture orbit, km.
 * @param v_infinity Hyperbolic excess speed on arrival, km/s.
 * @param [capture_ecc] Eccentricity of the capture orbit, 0 up to but not including 1; omit for a circular orbit.
 * @returns Delta-v, km/s.
 */
export function captureDv(body: any[][], periapsis_radius: any[][], v_infinity: any[][], capture_ecc?: any[][]): any[][] {
  return CAPTURE_DV(arguments);
}

const FLYBY_TURN_ANGLE = define.scalar("FLYBY_TURN_ANGLE", [gm(), radius("periapsis_radius"), num("v_infinity", "km/s")], hyperbolic.flybyTurnAngle, {
  example: ["Mars", 3896.2, 3],
  terms: ["gravity assist", "swing-by", "deflection angle"],
});
/**
 * Angle through which an unpowered flyby turns the excess velocity: 2 asin(1 / e), e = 1 + rp v∞² / GM. Two-body, point-mass body. Refuses (#VALUE!) a periapsis inside the body (an altitude typed as a radius); its atmosphere is not checked, nor any surface of a GM number.
 * @customfunction FLYBY_TURN_ANGLE
 * @helpurl https://localhost:3000/reference.html#flyby_turn_angle
 * @param body Catalogue body name (e.g. "Jupiter") or GM in km³/s². A GM number has no surface to check distances against.
 * @param periapsis_radius Closest-approach distance from the body's centre, km.
 * @param v_infinity Hyperbolic excess speed, km/s (more than 0).
 * @returns Turn angle, deg.
 */
export function flybyTurnAngle(body: any[][], periapsis_radius: any[][], v_infinity: any[][]): any[][] {
  return FLYBY_TURN_ANGLE(arguments);
}

const SOI_RADIUS = define.scalar("SOI_RADIUS", [body()], (b) => aboutParent(b, (o, m, M) => spheres.soiRadius(o.sma.value, m, M)), {
  example: ["Moon"],
  terms: ["sphere of influence", "Laplace sphere", "patched conic boundary"],
});
/**
 * Laplace sphere-of-influence radius of a catalogue body about its catalogue parent: a (m / M)^(2/5), with a the body's catalogue semi-major axis, m its system GM (with its moons, e.g. Earth-Moon for Earth) and M the parent's own GM. The patched-conic boundary, an order-of-magnitude figure, not a dynamical limit. #N/A for the Sun, which orbits no parent in the catalogue.
 * @customfunction SOI_RADIUS
 * @helpurl https://localhost:3000/reference.html#soi_radius
 * @param body Catalogue body name, e.g. "Mars" (a GM number has no orbit, so it is refused).
 * @returns Sphere-of-influence radius, km.
 */
export function soiRadius(body: any[][]): any[][] {
  return SOI_RADIUS(arguments);
}

const HILL_RADIUS = define.scalar("HILL_RADIUS", [body()], (b) => aboutParent(b, (o, m, M) => spheres.hillRadius(o.sma.value, o.ecc.value, m, M)), {
  example: ["Earth"],
  terms: ["Hill sphere", "stability limit", "Roche"],
});
/**
 * Hill-sphere radius of a catalogue body about its catalogue parent, at pericentre: a (1 − e) (m / 3M)^(1/3), with the catalogue a and e, m the body's system GM and M the parent's own GM. An approximate limit for stable satellite orbits, not an exact one. #N/A for the Sun, which orbits no parent in the catalogue.
 * @customfunction HILL_RADIUS
 * @helpurl https://localhost:3000/reference.html#hill_radius
 * @param body Catalogue body name, e.g. "Earth" (a GM number has no orbit, so it is refused).
 * @returns Hill radius, km.
 */
export function hillRadius(body: any[][]): any[][] {
  return HILL_RADIUS(arguments);
}

const SYNODIC_PERIOD = define.scalar(
  "SYNODIC_PERIOD",
  [body("body_a"), body("body_b")],
  (a, b) =>
    typeof a !== "number" && a === b
      ? badArgument("body_b", b.name, `a body other than body_a (${a.name}): a body is always aligned with itself, so it has no synodic period`)
      : withAll([sharedParentOf(a, b, "body_a", "body_b"), orbitOf(a, "body_a"), orbitOf(b, "body_b")], (_, orbitA, orbitB) => spheres.synodicPeriod(orbitA.period.value, orbitB.period.value)),
  { example: ["Earth", "Mars"], terms: ["launch window repeat", "conjunction period", "alignment period"] },
);
/**
 * Synodic period of two catalogue bodies about the same parent (time between repeats of the same alignment): 1 / |1/Ta − 1/Tb| from their catalogue sidereal periods. Refuses (#VALUE!) the same body twice, bodies about different parents and GM numbers (no orbit); equal periods are #N/A.
 * @customfunction SYNODIC_PERIOD
 * @helpurl https://localhost:3000/reference.html#synodic_period
 * @param body_a Catalogue body name, e.g. "Earth".
 * @param body_b Catalogue body name orbiting the same parent, e.g. "Mars".
 * @returns Synodic period, s.
 */
export function synodicPeriod(body_a: any[][], body_b: any[][]): any[][] {
  return SYNODIC_PERIOD(arguments);
}
