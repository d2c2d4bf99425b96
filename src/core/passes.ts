import { toRadians } from "./angles";
import { badArgument, finite, firstError, isDomainError, noAnswer, within, type DomainError, type Result } from "./domain";
import { elementsFromState, perifocalAxes } from "./elements";
import { fk5Rotations, type Fk5Rotations } from "./fk5";
import { apsidalRateKernel, j2RateFactor, meanAnomalyRateKernel, meanSmaKernel, nodalRateKernel } from "./j2";
import { trueFromMean, meanFromTrue } from "./kepler";
import { checkSite, siteFrame, type Site } from "./lookangles";
import { apply, chain, rot3, transpose } from "./rotation";
import { sgp4Record, sgp4State, type Sgp4Record } from "./sgp4";
import { gmst1982 } from "./sidereal";
import { readState } from "./state";
import { SECONDS_PER_DAY } from "./time";
import { parseTle } from "./tle";
import { meanMotion } from "./twobody";
import { combine, type Vec3 } from "./vector3";
import { WGS84_A, WGS84_GM, WGS84_J2 } from "./wgs84";

/**
 * Passes of a satellite over a ground site: rise, culmination and set above a minimum elevation.
 *
 * Source: a TLE pair (propagated by SGP4, src/core/sgp4.ts) or an inertial J2000 state at an
 * epoch, propagated with the J2 secular model (Vallado, Fundamentals of Astrodynamics and
 * Applications, 4th ed., §9.6: a, e, i fixed; RAAN, argument of periapsis and mean anomaly advance
 * at their first-order secular rates, src/core/j2.ts, WGS 84 GM, radius and J2). The state's
 * semi-major axis is turned into the mean one by its first-order short-periodic term (meanSmaKernel
 * in src/core/j2.ts: without it the mean motion is off by about 0.2 % and the track drifts by about
 * 1000 km a day); its other osculating elements are taken as mean elements, which leaves an error
 * of some kilometres. Against SGP4 from the same state the track stays within about 50 km over a
 * week in low orbit (test/core/passes.test.ts: 49 km at worst, a few seconds in pass times); no
 * drag, no higher zonals, so use a TLE for real predictions.
 *
 * Method: the elevation above the site's geodetic horizon (src/core/lookangles.ts; Earth-fixed
 * through TEME and GMST for SGP4, through the FK5 reduction for J2000, UT1 = UTC, no polar motion)
 * is sampled every 60 s; each change of sign of (elevation - min_elevation) brackets a rise or a
 * set, which bisection then pins to 1 ms (never the sample times themselves). A local maximum of
 * the samples that stays below the threshold is refined by golden-section search, so a grazing
 * pass shorter than the sampling step is found too. The time of maximum elevation is found by
 * golden-section search around the highest sample of the pass (to 0.01 s). A pass in progress at
 * the window's start or end is cut at the window edge. The search window is capped at 31 days.
 * Checked against dense one-second sampling of the elevation (test/core/passes.test.ts): rises
 * and sets agree within a second.
 */

export const MAX_WINDOW_DAYS = 31;
const STEP_S = 60;
const ROOT_TOLERANCE_S = 1e-3;
const PEAK_TOLERANCE_S = 1e-2;

/** Where the satellite is: its Earth-fixed position at a UTC Julian date, or why not. */
export type Track = (jd: number) => Vec3 | DomainError;

/** A pass source read from the sheet: a TLE pair, or a J2000 state with its epoch (Julian date, UTC). */
export type PassSource = { kind: "tle"; line1: string; line2: string } | { kind: "state"; state: number[]; epoch: number };

const SOURCE_SHAPE =
  "a TLE pair (two cells of text: line 1 and line 2), or seven numbers: a J2000 state x, y, z (km), vx, vy, vz (km/s) and its epoch as a date";

/**
 * Reads the sheet's `source` range, flattened: two texts are a TLE pair; seven numbers are a
 * state and its epoch, the epoch already converted to a Julian date (UTC) by the caller.
 */
export function readPassSource(cells: readonly unknown[]): Result<PassSource> {
  if (!Array.isArray(cells)) return badArgument("source", cells, SOURCE_SHAPE);
  if (cells.length === 2 && cells.every((c) => typeof c === "string")) return { kind: "tle", line1: cells[0] as string, line2: cells[1] as string };
  if (cells.length === 7 && cells.every((c) => typeof c === "number" && Number.isFinite(c)))
    return { kind: "state", state: (cells as number[]).slice(0, 6), epoch: cells[6] as number };
  return badArgument("source", cells.length === 1 ? cells[0] : cells, SOURCE_SHAPE);
}

/** Kernel track of an SGP4 record: TEME -> pseudo Earth-fixed by GMST (UT1 = UTC). */
export function sgp4Track(record: Sgp4Record): Track {
  return (jd) => {
    const s = sgp4State(record, (jd - record.epoch) * 1440, "source");
    if (isDomainError(s)) return s;
    return apply(rot3(gmst1982(jd)), [s[0], s[1], s[2]]);
  };
}

/**
 * Kernel track of a J2000 state at an epoch under the J2 secular model. The FK5 precession-nutation
 * matrix is evaluated once per hour of the window (it turns by under 0.006 arcsec in an hour,
 * 0.2 m at low-orbit radius); the sidereal angle at every instant.
 */
export function j2Track(state: readonly number[], epoch: number): Track | DomainError {
  const el = elementsFromState(WGS84_GM, state);
  if (isDomainError(el)) return noAnswer("source", `the state has no element set for the J2 model: ${el.message}`);
  const [osculatingSma, e, incDeg, raanDeg, argpDeg, nuDeg] = el;
  if (!(e < 1) || osculatingSma * (1 - e) <= WGS84_A) return badArgument("source", osculatingSma, "an elliptic state whose perigee clears the Earth (for the J2 secular model)");
  const inc = toRadians(incDeg);
  const a = meanSmaKernel(WGS84_A, WGS84_J2, osculatingSma, e, inc, Math.hypot(state[0], state[1], state[2]), toRadians(argpDeg + nuDeg));
  // First order in J2 holds while the short-periodic terms are small; only a grazing, extremely eccentric orbit breaks it.
  if (!(Math.abs(a - osculatingSma) < 0.01 * osculatingSma && a * (1 - e) > WGS84_A))
    return noAnswer("source", "the first-order J2 model cannot take this orbit: its perigee passes so close to the Earth that the short-periodic terms exceed 1 % of the semi-major axis");
  const f = j2RateFactor(WGS84_GM, WGS84_A, WGS84_J2, a, e);
  const n = meanMotion(WGS84_GM, a) + meanAnomalyRateKernel(f, e, inc);
  const raanRate = nodalRateKernel(f, inc);
  const argpRate = apsidalRateKernel(f, inc);
  const m0 = meanFromTrue(toRadians(nuDeg), e);
  const p = a * (1 - e * e);
  const hours = new Map<number, Fk5Rotations>();
  return (jd) => {
    const dt = (jd - epoch) * SECONDS_PER_DAY;
    const nu = trueFromMean(m0 + n * dt, e);
    const [P, Q] = perifocalAxes(inc, toRadians(raanDeg) + raanRate * dt, toRadians(argpDeg) + argpRate * dt);
    const radius = p / (1 + e * Math.cos(nu));
    const r = combine(radius * Math.cos(nu), P, radius * Math.sin(nu), Q);
    const hour = Math.round(jd * 24);
    let rot = hours.get(hour);
    if (!rot) {
      rot = fk5Rotations(hour / 24, { dut1: 0, xp: 0, yp: 0 });
      hours.set(hour, rot);
    }
    const gast = gmst1982(jd) + (rot.gast - rot.gmst);
    return apply(chain(rot3(gast), transpose(rot.pn)), r);
  };
}

/** Kernel: elevation (deg) of an Earth-fixed position seen from a site. */
export function elevationFrom(site: Site, r: Vec3): number {
  const rho: Vec3 = [r[0] - site.r[0], r[1] - site.r[1], r[2] - site.r[2]];
  const u = rho[0] * site.up[0] + rho[1] * site.up[1] + rho[2] * site.up[2];
  const e = rho[0] * site.east[0] + rho[1] * site.east[1];
  const nn = rho[0] * site.north[0] + rho[1] * site.north[1] + rho[2] * site.north[2];
  return (Math.atan2(u, Math.hypot(e, nn)) * 180) / Math.PI;
}

/** One pass: rise, time of maximum elevation and set (Julian dates, UTC), maximum elevation (deg). */
export interface Pass {
  rise: number;
  peak: number;
  maxElevation: number;
  set: number;
}

class Failure {
  constructor(readonly error: DomainError) {}
}

/** Kernel: the passes of a track over a site in [start, end] (Julian dates), above minElevation (deg). */
export function findPasses(track: Track, site: Site, start: number, end: number, minElevation: number): Pass[] | DomainError {
  const f = (jd: number): number => {
    const r = track(jd);
    if (isDomainError(r)) throw new Failure(r);
    return elevationFrom(site, r) - minElevation;
  };
  try {
    return searchPasses(f, start, end).map(([rise, set]) => {
      const [peak, height] = peakOf(f, rise, set);
      return { rise, peak, maxElevation: height + minElevation, set };
    });
  } catch (x) {
    if (x instanceof Failure) return x.error;
    throw x;
  }
}

const day = (seconds: number): number => seconds / SECONDS_PER_DAY;

/** Bisection of a sign change of f in [a, b] (f(a) < 0 <= f(b) or the reverse) to ROOT_TOLERANCE_S. */
function bisect(f: (t: number) => number, a: number, b: number, fa: number): number {
  let lo = a, hi = b;
  const rising = fa < 0;
  while (hi - lo > day(ROOT_TOLERANCE_S)) {
    const mid = lo + (hi - lo) / 2;
    if (mid <= lo || mid >= hi) break;
    if (f(mid) < 0 === rising) lo = mid;
    else hi = mid;
  }
  return lo + (hi - lo) / 2;
}

const GOLDEN = (Math.sqrt(5) - 1) / 2;

/** Golden-section search for the maximum of f in [a, b] to `tolerance` days: [t, f(t)]. */
function goldenMax(f: (t: number) => number, a: number, b: number, tolerance: number): [number, number] {
  let lo = a, hi = b;
  let x1 = hi - GOLDEN * (hi - lo), x2 = lo + GOLDEN * (hi - lo);
  let f1 = f(x1), f2 = f(x2);
  while (hi - lo > tolerance) {
    if (f1 < f2) {
      lo = x1; x1 = x2; f1 = f2; x2 = lo + GOLDEN * (hi - lo); f2 = f(x2);
    } else {
      hi = x2; x2 = x1; f2 = f1; x1 = hi - GOLDEN * (hi - lo); f1 = f(x1);
    }
  }
  return f1 > f2 ? [x1, f1] : [x2, f2];
}

/** The [rise, set] intervals where f >= 0 in [start, end]. */
function searchPasses(f: (t: number) => number, start: number, end: number): [number, number][] {
  const step = day(STEP_S);
  const count = Math.max(1, Math.ceil((end - start) / step));
  const ts: number[] = [];
  const fs: number[] = [];
  for (let k = 0; k <= count; k++) {
    const t = k === count ? end : start + k * step;
    ts.push(t);
    fs.push(f(t));
  }
  const passes: [number, number][] = [];
  let rise: number | null = fs[0] >= 0 ? start : null;
  for (let k = 1; k < ts.length; k++) {
    const a = ts[k - 1], b = ts[k], fa = fs[k - 1], fb = fs[k];
    if (fa < 0 && fb >= 0) rise = bisect(f, a, b, fa);
    else if (fa >= 0 && fb < 0) {
      passes.push([rise as number, bisect(f, a, b, fa)]);
      rise = null;
    } else if (fa < 0 && fb < 0 && k + 1 < ts.length && fs[k + 1] < 0 && fb > fa && fb > fs[k + 1]) {
      // A local maximum below the threshold: a grazing pass may hide between the samples.
      const [tp, fp] = goldenMax(f, a, ts[k + 1], day(PEAK_TOLERANCE_S));
      if (fp >= 0) passes.push([bisect(f, a, tp, fa), bisect(f, tp, ts[k + 1], fp)]);
    }
  }
  if (rise !== null) passes.push([rise, end]);
  return passes.sort((x, y) => x[0] - y[0]);
}

/** Time and height of the maximum of f over a pass, searched around its highest sample. */
function peakOf(f: (t: number) => number, rise: number, set: number): [number, number] {
  const step = day(STEP_S);
  let best = rise, bestF = f(rise);
  for (let t = rise + step / 2; t < set; t += step / 2) {
    const v = f(t);
    if (v > bestF) { best = t; bestF = v; }
  }
  if (f(set) > bestF) best = set;
  return goldenMax(f, Math.max(rise, best - step / 2), Math.min(set, best + step / 2), day(PEAK_TOLERANCE_S));
}

/** The track of a source, with its parameter checks. */
export function trackOf(source: PassSource): Track | DomainError {
  if (source.kind === "tle") {
    const parsed = parseTle(source.line1, source.line2, ["source", "source"]);
    if (isDomainError(parsed)) return parsed;
    return sgp4Track(sgp4Record(source.line1, source.line2));
  }
  const read = readState(source.state);
  if (isDomainError(read)) return badArgument("source", source.state, SOURCE_SHAPE);
  return j2Track(source.state, source.epoch);
}

function checkWindow(start: number, end: number, minElevation: number): DomainError | undefined {
  return firstError(
    finite("start", start, "days (a Julian date, UTC)"),
    finite("end", end, "days (a Julian date, UTC)"),
    end > start ? undefined : badArgument("end", end, "a date after start"),
    end - start <= MAX_WINDOW_DAYS ? undefined : badArgument("end", end, `a date at most ${MAX_WINDOW_DAYS} days after start (the pass search window is capped at ${MAX_WINDOW_DAYS} days; split a longer span)`),
    within("min_elevation", minElevation, -5, 90, "a minimum elevation from -5 to 90 deg"),
  );
}

function passesOf(
  source: PassSource,
  siteLatitude: number,
  siteLongitude: number,
  siteHeight: number,
  start: number,
  end: number,
  minElevation: number,
): Pass[] | DomainError {
  const bad = firstError(checkSite(siteLatitude, siteLongitude, siteHeight), checkWindow(start, end, minElevation));
  if (bad) return bad;
  const track = trackOf(source);
  if (isDomainError(track)) return track;
  return findPasses(track, siteFrame(siteLatitude, siteLongitude, siteHeight), start, end, minElevation);
}

/** The arguments PASSES and CONTACT_TIME share, in the sheet's order. */
type PassArguments = [source: PassSource, siteLatitude: number, siteLongitude: number, siteHeight: number, start: number, end: number, minElevation?: number | null];

/**
 * The passes over a site between start and end (Julian dates, UTC), one row per pass:
 * [rise, time of maximum elevation, set (Julian dates, UTC), maximum elevation (deg), duration (s)].
 * min_elevation defaults to 0 deg (the geometric horizon). #N/A when no pass rises above it.
 * See the file comment for the method and accuracy.
 */
export function passes(...args: PassArguments): Result<number[][]> {
  const minElevation = args[6] ?? 0;
  const found = passesOf(args[0], args[1], args[2], args[3], args[4], args[5], minElevation);
  if (isDomainError(found)) return found;
  if (found.length === 0) return noAnswer("min_elevation", `the satellite does not rise above ${minElevation} deg at this site between start and end`);
  return found.map((p) => [p.rise, p.peak, p.set, p.maxElevation, (p.set - p.rise) * SECONDS_PER_DAY]);
}

/**
 * Contact time per day: for each 24-hour span from start (the last one ends at end), one row
 * [span start (Julian date, UTC), contact minutes above min_elevation, passes rising in it].
 * Passes over midnight are split between the spans. Same inputs, method and accuracy as passes.
 */
export function contactTime(...args: PassArguments): Result<number[][]> {
  const [, , , , start, end] = args;
  const found = passesOf(args[0], args[1], args[2], args[3], start, end, args[6] ?? 0);
  if (isDomainError(found)) return found;
  const rows: number[][] = [];
  for (let d0 = start; d0 < end; d0 += 1) {
    const d1 = Math.min(end, d0 + 1);
    let minutes = 0;
    let count = 0;
    for (const p of found) {
      minutes += Math.max(0, Math.min(p.set, d1) - Math.max(p.rise, d0)) * 1440;
      if (p.rise >= d0 && p.rise < d1) count++;
    }
    rows.push([d0, minutes, count]);
  }
  return rows;
}
