import { lowThrustTime as coreLowThrustTime } from "../core/firingtime";
import { chaserState as coreChaserState, relativeState as coreRelativeState } from "../core/localframe";
import { lowThrustDv as coreLowThrustDv } from "../core/lowthrust";
import { relativeStateAtTime as coreRelativeStateAtTime } from "../core/relativemotion";
import { relativeRendezvous as coreRelativeRendezvous } from "../core/rendezvous";
import { family } from "./define";
import { gm, num, radius, state, STATE_LABELS, vec } from "./params";

// Family "Relative motion and low thrust": a chaser's motion near a target on a circular orbit
// (the Clohessy-Wiltshire equations), the two burns of a rendezvous, the conversion between
// inertial state vectors and the target's local frame, and the delta-v and firing time of a
// low-thrust spiral (Edelbaum). The frame's axes and signs are stated in src/core/localframe.ts
// and in the README's "Conventions". Relative states and aim points are offsets from the target,
// not positions from the body's centre, so they get no surface check; the target's orbit radius
// and the inertial state vectors do. Examples: the invented Skerry-1E inspection of a companion in
// the 690 km orbit (a chaser 100 m below and 2 km behind it), and Skerry-1E's 20 mN, Isp 1500 s
// electric raise from 520 km to 690 km.

const define = family("Relative motion and low thrust");

/** A relative state: six cells per case, on the target's local axes (no surface check: it is an offset from the target). */
const relative = (name: string) =>
  vec(name, 6, "x, y, z in km and vx, vy, vz in km/s: the chaser minus the target on the target's radial, along-track, cross-track axes, rates as seen in that rotating frame");

/** Header labels of a relative state's six columns. */
const RELATIVE_LABELS: readonly string[] = ["x radial (km)", "y along-track (km)", "z cross-track (km)", "vx radial (km/s)", "vy along-track (km/s)", "vz cross-track (km/s)"];

const RELATIVE_STATE_AT_TIME = define.rows(
  "RELATIVE_STATE_AT_TIME",
  RELATIVE_LABELS,
  [gm(), radius("target_sma"), relative("relative_state"), num("elapsed", "s")],
  coreRelativeStateAtTime,
  {
    example: ["Earth", 7068.1366, [[-0.1, -2, 0.05, 0, 0.000159, 0]], 2400, true],
    terms: ["Clohessy-Wiltshire", "Hill's equations", "CW propagation", "relative motion", "proximity drift", "LVLH propagation", "formation flying"],
  },
);
/**
 * A chaser's state relative to a target after an elapsed time, by the Clohessy–Wiltshire (Hill) equations for a target on a circular orbit of radius target_sma. Target's local frame, turning with it: x radial (outward from the body's centre through the target), y along-track (in the orbit plane, 90° ahead of x in the direction of motion), z cross-track (along the orbit normal r × v). A relative state is the chaser minus the target on these axes, with velocities as rates seen in the rotating frame (RELATIVE_STATE gives one from two state vectors). A chaser on its own circular orbit x km above the target's drifts at vy = −1.5 n x (n the target's mean motion): it falls behind when higher. Negative elapsed runs backwards. A first-order estimate: the position error grows with the square of the separation and with time (a chaser 10 km along-track of a 690 km target is placed about 0.27 km wrong after one orbit, 1 km along-track 2.7 m); J2, drag and any eccentricity of the target orbit are ignored. Not for proximity-operations planning, collision avoidance or any safety decision.
 * @customfunction RELATIVE_STATE_AT_TIME
 * @helpurl https://localhost:3000/reference.html#relative_state_at_time
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s².
 * @param target_sma Radius of the target's circular orbit, km (from the body's centre, not an altitude).
 * @param relative_state Six cells in a row: x, y, z (km), vx, vy, vz (km/s), the chaser minus the target on the target's radial, along-track, cross-track axes; several rows for several cases.
 * @param elapsed Elapsed time, s (negative: backwards).
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: x radial, y along-track, z cross-track (km), vx, vy, vz (km/s), in the target's local frame.
 */
export function relativeStateAtTime(body: any[][], target_sma: any[][], relative_state: any[][], elapsed: any[][], include_header?: any[][]): any[][] {
  return RELATIVE_STATE_AT_TIME(arguments);
}

const RELATIVE_RENDEZVOUS = define.rows(
  "RELATIVE_RENDEZVOUS",
  [
    "burn 1 radial (km/s)",
    "burn 1 along-track (km/s)",
    "burn 1 cross-track (km/s)",
    "burn 2 radial (km/s)",
    "burn 2 along-track (km/s)",
    "burn 2 cross-track (km/s)",
    "burn 1 size (km/s)",
    "burn 2 size (km/s)",
    "total dv (km/s)",
  ],
  [gm(), radius("target_sma"), relative("relative_state"), vec("aim_point", 3, "x, y, z in km on the target's radial, along-track, cross-track axes"), num("transfer_time", "s")],
  coreRelativeRendezvous,
  {
    example: ["Earth", 7068.1366, [[-0.1, -2, 0.05, 0, 0.000159, 0]], [[0, -0.2, 0]], 2400, true],
    terms: ["two-impulse rendezvous", "CW targeting", "Clohessy-Wiltshire", "proximity manoeuvre", "inspection approach", "delta-v"],
  },
);
/**
 * The two burns of a Clohessy–Wiltshire rendezvous near a target on a circular orbit: burn 1, at once, sends the chaser from relative_state to aim_point in transfer_time; burn 2, on arrival, stops it there in the target's frame (a point off the along-track axis takes thrust to hold). Components on the target's local axes: x radial (outward), y along-track (direction of motion), z cross-track (orbit normal r × v); relative states as in RELATIVE_STATE_AT_TIME. #N/A with the reason at a singular transfer time when the aim point is out of reach: whole orbit periods (the radial offset comes back to its start whatever the burn), about 1.407, 2.445, 3.461 … periods, and, with a cross-track offset, whole half periods; near those times the burns grow without bound. A first-order estimate: flown in exact two-body motion the chaser misses by an amount that grows with the square of the separation (the example's 2 km hop in 40 minutes at 690 km misses by about 2.8 m); J2, drag, the target's eccentricity and the finite length of real burns are ignored: each burn is an impulse, so with a low-thrust engine check its firing time (LOW_THRUST_TIME) against the transfer time. Not for proximity-operations planning, collision avoidance or any safety decision.
 * @customfunction RELATIVE_RENDEZVOUS
 * @helpurl https://localhost:3000/reference.html#relative_rendezvous
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s².
 * @param target_sma Radius of the target's circular orbit, km (from the body's centre, not an altitude).
 * @param relative_state Six cells in a row: the chaser's x, y, z (km), vx, vy, vz (km/s) relative to the target on its radial, along-track, cross-track axes before burn 1; several rows for several cases.
 * @param aim_point Three cells in a row: x, y, z (km) of the point to reach, on the same axes (0, 0, 0 is the target itself).
 * @param transfer_time Coast time from burn 1 to burn 2, s (more than 0).
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: burn 1 radial, along-track, cross-track; burn 2 radial, along-track, cross-track; burn 1 size, burn 2 size, total (all km/s).
 */
export function relativeRendezvous(body: any[][], target_sma: any[][], relative_state: any[][], aim_point: any[][], transfer_time: any[][], include_header?: any[][]): any[][] {
  return RELATIVE_RENDEZVOUS(arguments);
}

// The Skerry-1E pair at 690 km, 98.2 deg: target at argument of latitude 10 deg, chaser on a
// circle 100 m lower, 0.01621 deg (2 km) behind; STATE_FROM_ELEMENTS("Earth", 7068.1366, 0, 98.2,
// 30, 0, 10) and ("Earth", 7068.0366, 0, 98.2, 30, 0, 9.98379), to 1 mm and 1 micrometre/s.
const SKERRY_TARGET = [[6115.720454, 3328.772894, 1214.820702, -0.601914129, -1.56550853, 7.319895761]];
const SKERRY_CHASER = [[6115.793964, 3329.142533, 1212.854306, -0.600080036, -1.564518945, 7.320312412]];

const RELATIVE_STATE = define.rows("RELATIVE_STATE", RELATIVE_LABELS, [gm(), state("target_state"), state("chaser_state")], coreRelativeState, {
  example: ["Earth", SKERRY_TARGET, SKERRY_CHASER, true],
  terms: ["LVLH state", "RSW frame", "Hill frame", "inertial to local", "relative position", "relative velocity"],
});
/**
 * The chaser's state relative to the target in the target's local frame, from two inertial state vectors about the same body. Axes fixed to the target's state: x radial (outward from the body's centre through the target), y along-track (in the orbit plane, 90° ahead of x in the direction of motion; along the velocity for a circular orbit), z cross-track (along the orbit normal r × v). Position: the chaser minus the target on these axes; velocity: its rate of change as seen in the rotating frame, which is what RELATIVE_STATE_AT_TIME and RELATIVE_RENDEZVOUS take (not the inertial velocity difference). The conversion needs only the two states: body's GM does not enter it, but the body is checked like everywhere, and a catalogue body refuses a state inside it. The target may be on any orbit; the Clohessy–Wiltshire functions then assume it circular. #N/A for a target at rest or moving along its position (no orbit plane). Exact to rounding (the inverse of CHASER_STATE).
 * @customfunction RELATIVE_STATE
 * @helpurl https://localhost:3000/reference.html#relative_state
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s².
 * @param target_state The target's state vector, six cells in a row: x, y, z (km), vx, vy, vz (km/s), from the body's centre; several rows for several cases.
 * @param chaser_state The chaser's state vector in the same inertial frame, six cells in a row (km, km/s).
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: x radial, y along-track, z cross-track (km), vx, vy, vz (km/s) of the chaser relative to the target.
 */
export function relativeState(body: any[][], target_state: any[][], chaser_state: any[][], include_header?: any[][]): any[][] {
  return RELATIVE_STATE(arguments);
}

const CHASER_STATE = define.rows("CHASER_STATE", STATE_LABELS, [gm(), state("target_state"), relative("relative_state")], coreChaserState, {
  example: ["Earth", SKERRY_TARGET, [[-0.1, -2, 0.05, 0, 0.000159, 0]], true],
  terms: ["local to inertial", "LVLH to inertial", "RSW frame", "Hill frame", "chaser position", "relative to absolute"],
});
/**
 * The chaser's inertial state vector from the target's state vector and the chaser's state relative to it in the target's local frame: the inverse of RELATIVE_STATE. Axes fixed to the target's state: x radial (outward from the body's centre through the target), y along-track (in the orbit plane, 90° ahead of x in the direction of motion), z cross-track (along the orbit normal r × v); relative velocities are rates seen in that rotating frame, as RELATIVE_STATE_AT_TIME gives them. The conversion needs only the two states: body's GM does not enter it, but the body is checked like everywhere, and a catalogue body refuses a target state inside it. #N/A for a target at rest or moving along its position (no orbit plane). Exact to rounding.
 * @customfunction CHASER_STATE
 * @helpurl https://localhost:3000/reference.html#chaser_state
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s².
 * @param target_state The target's state vector, six cells in a row: x, y, z (km), vx, vy, vz (km/s), from the body's centre; several rows for several cases.
 * @param relative_state Six cells in a row: x, y, z (km), vx, vy, vz (km/s), the chaser minus the target on the target's radial, along-track, cross-track axes.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: the chaser's x, y, z (km), vx, vy, vz (km/s) in the target state's inertial frame.
 */
export function chaserState(body: any[][], target_state: any[][], relative_state: any[][], include_header?: any[][]): any[][] {
  return CHASER_STATE(arguments);
}

const LOW_THRUST_DV = define.scalar("LOW_THRUST_DV", [gm(), radius("radius_from"), radius("radius_to"), num("plane_change", "deg")], coreLowThrustDv, {
  example: ["Earth", 6898.1366, 7068.1366, 0.8],
  terms: ["Edelbaum", "electric propulsion delta-v", "spiral transfer", "continuous thrust", "ion thruster", "Hall thruster", "orbit raising"],
});
/**
 * Delta-v of a slow spiral between two circular orbits with a plane change, under continuous low thrust of constant acceleration with the optimal yaw profile: Edelbaum's analysis (1961) in the closed form given by Kechichian (1997), sqrt(v0² − 2 v0 v1 cos(π/2 · Δi) + v1²), v0 and v1 the circular speeds, Δi in radians. It does not depend on the thrust level. #N/A above 114.59° (2 rad), beyond the closed form. The idealised optimum: many revolutions, orbits circular throughout, no eclipse coasting, J2, drag or third bodies; real transfers need somewhat more. A preliminary estimate, not a trajectory design. The firing time is LOW_THRUST_TIME's; the propellant is BURN_SEQUENCE's (from the initial mass) or PROPELLANT_MASS's (from the final mass), since the rocket equation holds for low thrust as for any burn. An impulsive bi-elliptic transfer is TRANSFER_DV with via_radius.
 * @customfunction LOW_THRUST_DV
 * @helpurl https://localhost:3000/reference.html#low_thrust_dv
 * @param body Catalogue body name (e.g. "Earth") or GM in km³/s².
 * @param radius_from Radius of the starting circular orbit, km (from the body's centre, not an altitude).
 * @param radius_to Radius of the final circular orbit, km.
 * @param plane_change Angle between the two orbit planes, deg (0 to 114.59 for the closed form).
 * @returns Delta-v, km/s.
 */
export function lowThrustDv(body: any[][], radius_from: any[][], radius_to: any[][], plane_change: any[][]): any[][] {
  return LOW_THRUST_DV(arguments);
}

const LOW_THRUST_TIME = define.scalar("LOW_THRUST_TIME", [num("delta_v", "km/s"), num("thrust", "N"), num("initial_mass", "kg"), num("isp", "s")], coreLowThrustTime, {
  example: [0.1895, 0.02, 180, 1500],
  terms: ["burn duration", "thrusting time", "firing time", "electric propulsion", "transfer time", "ion thruster"],
});
/**
 * Firing time of a constant-thrust engine to give a delta-v, the vehicle lightening as it burns: t = m0 (1 − exp(−dv / (g0 Isp))) g0 Isp / F, g0 = 9.80665 m/s², a little shorter than the constant-mass m0 dv / F. Pure firing time: eclipses, duty-cycle pauses and a solar-electric thruster's thrust falling with its power make the calendar time longer. A preliminary estimate. The propellant burned is the rocket equation's, BURN_SEQUENCE(delta_v, isp, initial_mass), so no separate function gives it.
 * @customfunction LOW_THRUST_TIME
 * @helpurl https://localhost:3000/reference.html#low_thrust_time
 * @param delta_v Delta-v to give, km/s (e.g. from LOW_THRUST_DV).
 * @param thrust Engine thrust, N (e.g. 0.02 for 20 mN).
 * @param initial_mass Vehicle mass when the firing starts, kg.
 * @param isp Specific impulse, s.
 * @returns Firing time, s.
 */
export function lowThrustTime(delta_v: any[][], thrust: any[][], initial_mass: any[][], isp: any[][]): any[][] {
  return LOW_THRUST_TIME(arguments);
}
