import * as link from "../core/linkbudget";
import { family } from "./define";
import { num } from "./params";

// Family "Link budget": the geometry terms of a radio link budget. Examples: the invented Skerry-1
// S-band downlink at 2.2 GHz to the invented Skerry Ground station, at the 2133.5 km slant range of
// a 10° elevation from 690 km (SLANT_RANGE(690, 10)), and the range rate at the rise of a pass.

const define = family("Link budget");

const FREE_SPACE_PATH_LOSS = define.scalar("FREE_SPACE_PATH_LOSS", [num("distance", "km"), num("frequency", "Hz")], link.freeSpacePathLoss, {
  example: [2133.528, 2.2e9],
  terms: ["FSPL", "path loss", "spreading loss", "Friis", "link budget", "attenuation"],
});
/**
 * Free-space path loss of a radio link, dB: 20 log10(4π d f / c) (ITU-R Recommendation P.525-4), with c = 299792.458 km/s exactly. Isotropic antennas; no atmospheric, rain, pointing or polarisation losses. Exact to float64 rounding.
 * @customfunction FREE_SPACE_PATH_LOSS
 * @helpurl https://localhost:3000/reference.html#free_space_path_loss
 * @param distance Distance between the antennas, km (e.g. SLANT_RANGE at the minimum elevation).
 * @param frequency Carrier frequency, Hz (e.g. 2.2E9 for S band).
 * @returns Loss, dB (positive).
 */
export function freeSpacePathLoss(distance: any[][], frequency: any[][]): any[][] {
  return FREE_SPACE_PATH_LOSS(arguments);
}

const DOPPLER_SHIFT = define.scalar("DOPPLER_SHIFT", [num("frequency", "Hz"), num("range_rate", "km/s")], link.dopplerShift, {
  example: [2.2e9, -3.97],
  terms: ["Doppler", "frequency offset", "carrier shift", "range rate", "tuning"],
});
/**
 * One-way Doppler shift of a carrier from a source moving along the line of sight, Hz: −f ṙ / c (first order; the neglected terms are below 1e-9 of f for any Earth orbit). Positive when the source approaches (negative range rate).
 * @customfunction DOPPLER_SHIFT
 * @helpurl https://localhost:3000/reference.html#doppler_shift
 * @param frequency Transmitted frequency, Hz.
 * @param range_rate Rate of change of the distance, km/s (positive receding; the fourth column of LOOK_ANGLES).
 * @returns Received minus transmitted frequency, Hz.
 */
export function dopplerShift(frequency: any[][], range_rate: any[][]): any[][] {
  return DOPPLER_SHIFT(arguments);
}
