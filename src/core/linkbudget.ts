import { finite, firstError, positive, type Result } from "./domain";

/**
 * Link-budget helpers. Speed of light c = 299792.458 km/s, exact by the definition of the metre
 * (SI Brochure, 9th ed., 2019).
 */
export const SPEED_OF_LIGHT = 299792.458;

/**
 * Free-space path loss, dB, of a link of `distance` km at `frequency` Hz: L = 20 log10(4 pi d f / c)
 * (Friis; ITU-R Recommendation P.525-4, "Calculation of free-space attenuation", whose practical
 * form is L = 32.4 + 20 log10 f(MHz) + 20 log10 d(km), the constant 32.45 rounded). Isotropic
 * antennas, no atmospheric, rain or polarisation losses. Exact to float64 rounding.
 */
export function freeSpacePathLoss(distance: number, frequency: number): Result<number> {
  const bad = firstError(positive("distance", distance, "km"), positive("frequency", frequency, "Hz (e.g. 2.2e9 for S band)"));
  if (bad) return bad;
  return 20 * Math.log10((4 * Math.PI * distance * frequency) / SPEED_OF_LIGHT);
}

/**
 * Doppler shift, Hz, of a carrier of `frequency` Hz received from a source with `range_rate`
 * km/s (positive receding): df = -f rdot / c, the first-order (non-relativistic) one-way shift;
 * the neglected terms are of order (rdot/c)^2, below 1e-9 relative for any Earth orbit.
 */
export function dopplerShift(frequency: number, rangeRate: number): Result<number> {
  const bad = firstError(positive("frequency", frequency, "Hz"), finite("range_rate", rangeRate, "km/s (positive when the range grows)"));
  if (bad) return bad;
  return (-frequency * rangeRate) / SPEED_OF_LIGHT + 0;
}
