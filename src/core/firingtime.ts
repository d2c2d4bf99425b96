import { finiteResult, firstError, nonNegative, positive, type Result } from "./domain";
import { burnExponent, G0_KM_PER_S2, implausibleBurn, propellantFromInitialMass } from "./rocket";

/**
 * Firing time of a constant-thrust burn with propellant flow: the engine runs at thrust F (N) and
 * specific impulse Isp (s), so the mass flow is F / (g0 Isp) with g0 = 9.80665 m/s^2 exactly, and
 * the time to give delta_v is the propellant the rocket equation needs over that flow,
 *   t = m0 (1 - exp(-dv / (g0 Isp))) g0 Isp / F
 * (the ideal rocket equation, Curtis, Orbital Mechanics for Engineering Students, ch. 6, with the
 * mass flow of a constant-thrust engine; rocket.ts holds the equation and g0).
 */

/** Thrust in N is kg m/s^2; the core's speeds are km/s, so g0 Isp (km/s) times this gives m/s. */
const M_PER_KM = 1000;

/**
 * Seconds of constant-thrust firing that give `deltaV` (km/s) to a vehicle of `initialMass` (kg)
 * at `thrust` (N) and `isp` (s), propellant flow included: the vehicle lightens as it burns, so
 * the time is shorter than the constant-mass estimate m0 dv / F by the factor
 * (1 - exp(-x)) / x, x = dv / (g0 Isp).
 * Refused (#VALUE!): delta_v negative, thrust, initial_mass or isp not positive. #N/A with the
 * likely unit slip (delta_v in m/s) when the burn needs a mass ratio beyond rocket.ts's
 * MAX_MASS_RATIO, which no single vehicle reaches.
 * Accuracy: a few ulp (expm1 keeps small burns exact). It is pure firing time: an electric
 * transfer also coasts through eclipses and duty-cycle pauses, and a solar-electric engine's
 * thrust falls with the power available, so the calendar time is longer. A preliminary estimate.
 */
export function lowThrustTime(deltaV: number, thrust: number, initialMass: number, isp: number): Result<number> {
  const bad = firstError(
    nonNegative("delta_v", deltaV, "km/s"),
    positive("thrust", thrust, "N"),
    positive("initial_mass", initialMass, "kg"),
    positive("isp", isp, "seconds of specific impulse"),
  );
  if (bad) return bad;
  const implausible = implausibleBurn("delta_v", deltaV, isp);
  if (implausible) return implausible;
  const exhaustSpeed = G0_KM_PER_S2 * isp * M_PER_KM; // m/s
  return finiteResult("thrust", (propellantFromInitialMass(initialMass, burnExponent(deltaV, isp)) * exhaustSpeed) / thrust);
}
