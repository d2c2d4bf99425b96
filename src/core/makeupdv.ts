import { checkModelAltitude, densityKernel, resolveActivity } from "./atmosphere";
import { finiteResult, firstError, isDomainError, nonNegative, positive, type Result } from "./domain";

/**
 * Delta-v (km/s) that holds a circular orbit's altitude against drag for `duration` seconds: the
 * drag deceleration (1/2) rho v^2 / B times the duration, v = sqrt(mu / r), r = R + altitude,
 * rho the named model's density at the altitude for F10.7 and its 81-day mean (sfu), Ap 15
 * (common practice), B = m / (C_D A) kg/m^2. Frequent small tangential burns return exactly the
 * energy drag takes, so the delta-v equals the drag impulse per unit mass (the same as
 * v / (2a) times the altitude the decay rate would remove). Earth only. For a multi-year
 * duration pass the mean flux expected over it; the density, and so the delta-v, is uncertain
 * by tens of percent with solar activity. A budget estimate, not an operations plan.
 */
export function dragMakeupDv(gm: number, bodyRadius: number, altitude: number, ballisticCoefficient: number, duration: number, solarFlux: number | null, solarFluxAvg: number | null, model: string | null): Result<number> {
  const bad = firstError(positive("body", gm, "km3/s2 (GM)"), positive("body_radius", bodyRadius, "km"));
  if (bad) return bad;
  const activity = resolveActivity(solarFlux, solarFluxAvg, null, model);
  if (isDomainError(activity)) return activity;
  const badInput = firstError(
    checkModelAltitude("altitude", altitude, activity.model),
    positive("ballistic_coefficient", ballisticCoefficient, "kg/m2 (mass / (drag coefficient x area))"),
    nonNegative("duration", duration, "s"),
  );
  if (badInput) return badInput;
  const rho = densityKernel(altitude, activity);
  const v2 = gm / (bodyRadius + altitude);
  // (1/2) rho v^2 / B in m/s^2 with v in km/s is 5e5 rho v^2 / B; over duration s, / 1000 for km/s
  return finiteResult("duration", (500 * rho * v2 * duration) / ballisticCoefficient);
}
