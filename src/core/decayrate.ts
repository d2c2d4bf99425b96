import { checkModelAltitude, densityKernel, resolveActivity } from "./atmosphere";
import { firstError, isDomainError, positive, type Result } from "./domain";
import { circularDecayRate } from "./dragrates";
import { SECONDS_PER_DAY } from "./time";

/**
 * Altitude lost per day by a circular orbit under drag, km/day (a positive number): |da/dt| =
 * (rho / B) sqrt(mu a), a = R + altitude (dragrates.ts), with rho the named model's density at
 * the altitude for F10.7 (sfu, previous day) and its 81-day mean (sfu), Ap 15 (common practice),
 * B = m / (C_D A) in kg/m^2. Earth only. The rate at this moment: it grows as the orbit sinks,
 * so altitude / rate is not the lifetime. Accuracy: that of the density (tens of percent with
 * the solar-activity uncertainty); the arithmetic is exact to a few ulp.
 */
export function decayRate(gm: number, bodyRadius: number, altitude: number, ballisticCoefficient: number, solarFlux: number | null, solarFluxAvg: number | null, model: string | null): Result<number> {
  const bad = firstError(positive("body", gm, "km3/s2 (GM)"), positive("body_radius", bodyRadius, "km"));
  if (bad) return bad;
  const activity = resolveActivity(solarFlux, solarFluxAvg, null, model);
  if (isDomainError(activity)) return activity;
  const badInput = checkModelAltitude("altitude", altitude, activity.model) ?? positive("ballistic_coefficient", ballisticCoefficient, "kg/m2 (mass / (drag coefficient x area))");
  if (badInput) return badInput;
  const rho = densityKernel(altitude, activity);
  return -circularDecayRate(gm, bodyRadius + altitude, rho, ballisticCoefficient) * SECONDS_PER_DAY;
}
