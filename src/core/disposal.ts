import { MODEL_ALTITUDE_MAX, resolveModel } from "./atmosphere";
import { arithmeticFailure, badArgument, isDomainError, noAnswer, type Result } from "./domain";
import { APOGEE_ALTITUDE_MAX, DEFAULT_END_ALTITUDE, LIFETIME_CAP_DAYS, LIFETIME_CAP_YEARS, lifetimeKernel, lifetimeSetup } from "./lifetime";
import { brentRoot } from "./rootfind";
import type { SolarFluxArgument } from "./solarflux";

/**
 * Disposal perigee: the highest perigee altitude (km) that, with the given apogee altitude
 * (km), brings the orbit down (perigee to 100 km, lifetime.ts) within lifetime_limit days, for
 * B = m / (C_D A) kg/m^2, a solar flux held constant or a forecast, a start date and a density
 * model, all as in orbitLifetime. Lifetime grows with perigee altitude, so the answer is the root
 * of ln(lifetime(perigee)) = ln(lifetime_limit), found by Brent's method (rootfind.ts) between
 * just above 100 km and the apogee (at most 1000 km, the model's range) to 0.001 km; the apogee
 * itself when even the circular orbit there comes down in time. #N/A when no perigee above the
 * end altitude works.
 *
 * Accuracy: the lifetime's, which is uncertain by tens of percent with solar activity; a
 * perigee chosen this way needs a margin, and a licensing analysis needs the authority's own
 * tools and assumptions. Common limits: 25 years (the debris-mitigation guideline) and 5 years
 * (a rule some licensing authorities now apply).
 */
export function disposalPerigee(
  gm: number,
  bodyRadius: number,
  apogeeAltitude: number,
  ballisticCoefficient: number,
  lifetimeLimit: number,
  solarFlux: SolarFluxArgument,
  startDate: number | null,
  model: string | null,
): Result<number> {
  const m = resolveModel(model);
  if (isDomainError(m)) return m;
  if (!Number.isFinite(apogeeAltitude) || apogeeAltitude < 0) return badArgument("apogee_altitude", apogeeAltitude, "an apogee altitude of 0 km or more");
  if (apogeeAltitude <= DEFAULT_END_ALTITUDE) return noAnswer("apogee_altitude", `${apogeeAltitude} km is not above the ${DEFAULT_END_ALTITUDE} km end altitude, so no perigee above it exists`);
  if (apogeeAltitude > APOGEE_ALTITUDE_MAX)
    return noAnswer("apogee_altitude", `${apogeeAltitude} km is above ${APOGEE_ALTITUDE_MAX} km, where the Sun and Moon move the perigee more than drag does; this drag-only estimate does not cover such orbits`);
  if (!(Number.isFinite(lifetimeLimit) && lifetimeLimit > 0)) return badArgument("lifetime_limit", lifetimeLimit, "a positive number of days (e.g. 9131.25 for 25 years)");
  if (lifetimeLimit > LIFETIME_CAP_DAYS) return noAnswer("lifetime_limit", `${lifetimeLimit} days is beyond the ${LIFETIME_CAP_YEARS}-year cap of the lifetime integration`);
  const setup = lifetimeSetup(gm, bodyRadius, ballisticCoefficient, solarFlux, startDate, model, null);
  if (isDomainError(setup)) return setup;

  // lifetimes beyond twice the limit need not be integrated to the end: the clipped log-lifetime
  // is still continuous and has the same root
  const capDays = Math.min(LIFETIME_CAP_DAYS, 2 * lifetimeLimit);
  const lnLimit = Math.log(lifetimeLimit);
  let failed = false;
  const g = (perigee: number): number => {
    const days = lifetimeKernel(setup, perigee, apogeeAltitude, capDays);
    if (Number.isNaN(days)) failed = true;
    return Math.min(Math.log(days), Math.log(capDays)) - lnLimit;
  };
  const hi = Math.min(apogeeAltitude, MODEL_ALTITUDE_MAX);
  const gHi = g(hi);
  if (failed) return arithmeticFailure("", "the lifetime integration did not converge");
  if (gHi <= 0) {
    if (hi === apogeeAltitude) return apogeeAltitude;
    return noAnswer("apogee_altitude", `even a ${MODEL_ALTITUDE_MAX} km perigee, the top of the density model's range, comes down within lifetime_limit; the answer lies above the range`);
  }
  const lo = DEFAULT_END_ALTITUDE + 1e-3;
  const gLo = g(lo);
  if (gLo > 0) return noAnswer("lifetime_limit", `no perigee above the ${DEFAULT_END_ALTITUDE} km end altitude brings this orbit down within ${lifetimeLimit} days`);
  const root = brentRoot(g, lo, hi, 1e-3, gLo, gHi);
  if (failed || Number.isNaN(root)) return arithmeticFailure("", "the disposal perigee search did not converge");
  return root;
}
