import { sgp4, twoline2satrec, type SatRec } from "satellite.js";
import { noAnswer, type Result } from "./domain";

/**
 * SGP4/SDP4, the analytical propagator that two-line element sets are fitted to, through
 * satellite.js 6.0.2 (MIT; a port of Vallado's 2006+ reference implementation of "Revisiting
 * Spacetrack Report #3", AIAA 2006-6753, with WGS 72 constants and the improved 'i' operation
 * mode, as the verification set uses). Output: TEME position km and velocity km/s.
 * Checked against the published verification set of that paper (SGP4-VER.TLE and the reference
 * output tcppver.out, test/core/sgp4.test.ts): 665 of 666 published vectors to the printed
 * digits (1e-8 km, 1e-9 km/s); the run of object 20413 at 3.5 years from epoch drifts to 1.2e-7 km
 * (float rounding in the long deep-space integration), still 0.1 mm.
 * SGP4 itself, fed a fresh element set, is good to about 1 km at epoch, growing 1-3 km per day
 * (Vallado et al. 2006): fine for pass planning, not for conjunction or safety work.
 * satellite.js does not check TLE checksums or columns: src/core/tle.ts does that first.
 */

const ERROR_TEXT: Record<number, string> = {
  1: "the mean eccentricity falls outside 0 to 1",
  2: "the mean motion falls below zero",
  3: "the perturbed eccentricity falls outside 0 to 1",
  4: "the semi-latus rectum falls below zero",
  6: "the orbit has decayed (the position is below the Earth's surface)",
};

/** An initialised SGP4 record and its epoch (Julian date, UTC, as SGP4 counts it). */
export interface Sgp4Record {
  satrec: SatRec;
  epoch: number;
  /** SGP4's error code from initialisation (0 = none). */
  initError: number;
}

const cache = new Map<string, Sgp4Record>();
const CACHE_SIZE = 64;

/**
 * Kernel: SGP4 initialised from two lines (already checked by parseTle; only columns 1-69 are
 * read). A small cache keeps the last 64 pairs, since a sheet propagates one pair at many dates.
 */
export function sgp4Record(line1: string, line2: string): Sgp4Record {
  const key = line1.slice(0, 69) + "\n" + line2.slice(0, 69);
  const hit = cache.get(key);
  if (hit) return hit;
  const satrec = twoline2satrec(line1.slice(0, 69), line2.slice(0, 69));
  const record = { satrec, epoch: satrec.jdsatepoch, initError: satrec.error };
  if (cache.size >= CACHE_SIZE) cache.delete(cache.keys().next().value as string);
  cache.set(key, record);
  return record;
}

/** Kernel: TEME state [x, y, z km, vx, vy, vz km/s] `minutes` after the element set's epoch, or #N/A naming `parameter` with SGP4's reason. */
export function sgp4State(record: Sgp4Record, minutes: number, parameter: string): Result<number[]> {
  const out = record.initError === 0 ? sgp4(record.satrec, minutes) : null;
  if (!out) {
    const code = record.initError || record.satrec.error;
    return noAnswer(parameter, `SGP4 cannot propagate this element set ${(minutes / 1440).toFixed(3)} days from its epoch: ${ERROR_TEXT[code] ?? `error code ${code}`}`);
  }
  const { position: p, velocity: v } = out;
  const state = [p.x, p.y, p.z, v.x, v.y, v.z];
  return state.every(Number.isFinite) ? state : noAnswer(parameter, "SGP4 gives no finite state at this date");
}
