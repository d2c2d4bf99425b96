import { badArgument, finite, isDomainError, noAnswer, type DomainError, type Result } from "./domain";
import type { AtmosphereModelName } from "./densityprofile";
import { exponentialDensity } from "./exponentialatmosphere";
import { nrlmsise00MeanDensity } from "./nrlmsise00mean";

/**
 * Earth's upper-atmosphere density for the drag functions, and the checks and defaults their
 * atmosphere arguments share. Two models:
 *   "nrlmsise-00" (default): NRLMSISE-00 (Picone et al. 2002), solar- and geomagnetic-dependent,
 *     as its global, diurnal and annual mean (nrlmsise00mean.ts). It wants F10.7 of the PREVIOUS
 *     day (solar_flux) and the 81-day mean of F10.7 centred on the day (solar_flux_avg), both in
 *     solar flux units (1 sfu = 1e-22 W m^-2 Hz^-1) as observed at the Earth, and the daily Ap.
 *   "exponential": the static table of Vallado 4th ed. Table 8-4 (exponentialatmosphere.ts); it
 *     ignores the activity arguments.
 * Both are published for 0-1000 km. Earth only.
 *
 * Defaults where an argument is omitted (common practice, not a standard): F10.7 = 150 sfu, the
 * moderate level that is also NRLMSISE-00's own reference (its flux terms are expansions about
 * 150); the 81-day mean equal to the daily value (a steady level); Ap = 15, moderate geomagnetic
 * activity (4 is quiet, 400 the scale's top).
 *
 * Density is uncertain far beyond any number printed here: the model's scatter about measured
 * densities is some 15 % in quiet times, and the flux a year ahead is uncertain by tens of
 * percent. Preliminary analysis only.
 */

export const DEFAULT_MODEL: AtmosphereModelName = "nrlmsise-00";
export const DEFAULT_SOLAR_FLUX = 150;
export const DEFAULT_AP = 15;
export const MODEL_ALTITUDE_MAX = 1000;

/**
 * F10.7 accepted, sfu. Daily F10.7 since records began in 1947 has stayed within about 50-400 sfu
 * (from memory); outside 40-500 the model's polynomial in F10.7 would be extrapolated far from
 * any data behind it, so there is no answer there.
 */
export const SOLAR_FLUX_MIN = 40;
export const SOLAR_FLUX_MAX = 500;

const MODEL_NAMES: Record<string, AtmosphereModelName> = {
  "nrlmsise-00": "nrlmsise-00",
  nrlmsise00: "nrlmsise-00",
  exponential: "exponential",
};

/** The model a `model` argument names (case-insensitive), the default when omitted. */
export function resolveModel(model: string | null | undefined): Result<AtmosphereModelName> {
  if (model === null || model === undefined || model === "") return DEFAULT_MODEL;
  const found = typeof model === "string" ? MODEL_NAMES[model.trim().toLowerCase()] : undefined;
  return found ?? badArgument("model", model, 'a density model name: "nrlmsise-00" (the default) or "exponential"');
}

/** A solar flux value (sfu): positive and finite, else #VALUE!; outside 40-500 sfu, #N/A. */
export function checkSolarFlux(parameter: string, flux: number): DomainError | undefined {
  if (!(Number.isFinite(flux) && flux > 0)) return badArgument(parameter, flux, "a positive F10.7 solar flux in sfu (1e-22 W m^-2 Hz^-1), e.g. 150");
  if (flux < SOLAR_FLUX_MIN || flux > SOLAR_FLUX_MAX) return noAnswer(parameter, `${flux} sfu is outside the ${SOLAR_FLUX_MIN}-${SOLAR_FLUX_MAX} sfu range the density model covers`);
  return undefined;
}

/** Daily Ap: 0 to 400 by the index's definition. */
export function checkAp(ap: number): DomainError | undefined {
  return Number.isFinite(ap) && ap >= 0 && ap <= 400 ? undefined : badArgument("geomagnetic_ap", ap, "a daily Ap index from 0 to 400");
}

/** An altitude inside a model's published 0-1000 km: below 0 is #VALUE!, above 1000 km #N/A. */
export function checkModelAltitude(parameter: string, altitude: number, model: AtmosphereModelName): DomainError | undefined {
  const bad = finite(parameter, altitude, "km");
  if (bad) return bad;
  if (altitude < 0) return badArgument(parameter, altitude, "an altitude of 0 km or more above the equatorial radius");
  if (altitude > MODEL_ALTITUDE_MAX) return noAnswer(parameter, `${altitude} km is above the 0-${MODEL_ALTITUDE_MAX} km range of the ${model} density model`);
  return undefined;
}

/** Activity arguments with their defaults applied, or the first error. */
export interface Activity {
  model: AtmosphereModelName;
  f107: number;
  f107A: number;
  ap: number;
}

export function resolveActivity(solarFlux: number | null, solarFluxAvg: number | null, geomagneticAp: number | null, model: string | null): Result<Activity> {
  const m = resolveModel(model);
  if (isDomainError(m)) return m;
  const f107 = solarFlux ?? DEFAULT_SOLAR_FLUX;
  const f107A = solarFluxAvg ?? f107;
  const ap = geomagneticAp ?? DEFAULT_AP;
  const bad = checkSolarFlux("solar_flux", f107) ?? checkSolarFlux("solar_flux_avg", f107A) ?? checkAp(ap);
  return bad ?? { model: m, f107, f107A, ap };
}

// The last NRLMSISE-00 mean density computed (about 1 ms each): a lifted table asks for the same
// one many times in a row (a column of altitudes against a row of ballistic coefficients).
let lastAltitude = Number.NaN;
let lastF107 = Number.NaN;
let lastF107A = Number.NaN;
let lastAp = Number.NaN;
let lastRho = 0;

/** Kernel: density (kg/m^3) of a checked model and activity at a checked altitude (km). */
export function densityKernel(altitude: number, activity: Activity): number {
  if (activity.model === "exponential") return exponentialDensity(altitude);
  const { f107, f107A, ap } = activity;
  if (altitude !== lastAltitude || f107 !== lastF107 || f107A !== lastF107A || ap !== lastAp) {
    lastRho = nrlmsise00MeanDensity(altitude, f107, f107A, ap);
    lastAltitude = altitude;
    lastF107 = f107;
    lastF107A = f107A;
    lastAp = ap;
  }
  return lastRho;
}

/**
 * Atmospheric mass density, kg/m^3, at altitude (km above the equatorial radius, 0-1000) in the
 * named model, for F10.7 (sfu, previous day), its 81-day mean (sfu) and daily Ap. NRLMSISE-00:
 * the global, diurnal and annual mean of its drag density; exponential: Vallado's static table.
 * Accuracy: the models' own (NRLMSISE-00 some 15 % against measurements in quiet conditions; the
 * static table can be off by a factor of several at solar maximum or minimum); the numerics add
 * under 0.1 %.
 */
export function atmosphereDensity(altitude: number, solarFlux: number | null, solarFluxAvg: number | null, geomagneticAp: number | null, model: string | null): Result<number> {
  const activity = resolveActivity(solarFlux, solarFluxAvg, geomagneticAp, model);
  if (isDomainError(activity)) return activity;
  return checkModelAltitude("altitude", altitude, activity.model) ?? densityKernel(altitude, activity);
}
