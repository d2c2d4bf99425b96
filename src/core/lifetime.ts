import { checkModelAltitude, DEFAULT_AP, MODEL_ALTITUDE_MAX, resolveModel } from "./atmosphere";
import { constantFluxProfile, fluxDependentDensity, PROFILE_FLOOR, type AtmosphereModelName } from "./densityprofile";
import { arithmeticFailure, badArgument, firstError, isDomainError, noAnswer, positive, type DomainError, type Result } from "./domain";
import { DormandPrinceStepper } from "./dormandprince";
import { averagedDragRates, type DragRates } from "./dragrates";
import { resolveSolarFlux, resolveStartDate, type FluxSchedule, type SolarFluxArgument } from "./solarflux";
import { SECONDS_PER_DAY } from "./time";

/**
 * Orbital lifetime under drag: days until the perigee altitude falls to end_altitude, Earth only.
 *
 * Method: the orbit-averaged equations for semi-major axis and eccentricity under drag
 * (dragrates.ts: Gauss's equations averaged numerically over one revolution, King-Hele's form)
 * integrated in time with the Dormand-Prince 5(4) pair (dormandprince.ts). Step control: the
 * local error of each step, estimated by the embedded 4th-order solution, is held below
 * 1e-8 of a (about 7 cm in low orbit) and 1e-8 (1 + e) in e, with the usual step-size update
 * 0.9 (tol / err)^(1/5) limited to a factor 0.2-5 per step, and a predictive controller that
 * follows the decay's acceleration (see the loop); with a forecast flux, steps also end on the
 * forecast's first and last dates, the only corners of the flux it follows (solarflux.ts). The
 * end is located inside the last step by cubic Hermite interpolation of a and e.
 * Density: the named model at a solar flux held constant, or following a pasted forecast
 * (solarflux.ts), at Ap = 15 (common practice); NRLMSISE-00 as its global, diurnal and annual
 * mean (nrlmsise00mean.ts), interpolated between profiles at every 10 sfu (densityprofile.ts).
 *
 * Why end at 100 km by default: below about 100-120 km an orbit decays within a few revolutions,
 * so the time left is hours at most, the averaged theory (small change per revolution) no longer
 * holds, and 100 km is the customary boundary of space.
 *
 * Accuracy: the integration reproduces a 1e-8 decimal quadrature of the circular-orbit decay
 * integral to 1e-4 (2e-5 measured) and a direct RK4 integration of the equations of motion with
 * drag to 1 % (0.1 % measured) for eccentric starts (test/core/lifetime.test.ts). That is far below the real
 * uncertainty: the atmosphere model errs by some 15 %, and the solar activity over the years of
 * a lifetime is uncertain by tens of percent, so a lifetime is an estimate good to tens of
 * percent at best. Not for re-entry prediction, licensing or any safety decision.
 */

/** Lifetimes longer than this are not integrated: 200 Julian years, in days. */
export const LIFETIME_CAP_DAYS = 200 * 365.25;
export const LIFETIME_CAP_YEARS = 200;
export const DEFAULT_END_ALTITUDE = 100;
/** Apogee altitudes above this (km) are refused: there the Sun's and Moon's pull changes the perigee more than drag does, which this drag-only estimate leaves out. */
export const APOGEE_ALTITUDE_MAX = 50000;

const RTOL = 1e-8;
const ATOL_E = 1e-8;
const MAX_STEPS = 200000;

/** The density along an integration: a function of altitude and time (s from the start). */
interface DensityAlongTime {
  density(h: number, t: number): number;
  readonly breaks: readonly number[];
  scaleHeight(h: number, t: number): number;
}

function densityAlongTime(model: AtmosphereModelName, schedule: FluxSchedule, startJd: number): DensityAlongTime {
  if (schedule.constant) {
    const p = constantFluxProfile(model, schedule.at(startJd), DEFAULT_AP);
    return { density: (h) => p.density(h), scaleHeight: (h) => p.scaleHeight(h), breaks: p.breaks };
  }
  const fam = fluxDependentDensity(model, DEFAULT_AP);
  // every density along the orbit at one instant asks for the same flux: look it up once
  let tLast = Number.NaN;
  let fLast = 0;
  const flux = (t: number): number => {
    if (t !== tLast) {
      tLast = t;
      fLast = schedule.at(startJd + t / SECONDS_PER_DAY);
    }
    return fLast;
  };
  return { density: (h, t) => fam.density(h, flux(t)), scaleHeight: (h, t) => fam.scaleHeight(h, flux(t)), breaks: fam.breaks };
}

/** Checked inputs of a lifetime run. */
export interface LifetimeSetup {
  gm: number;
  bodyRadius: number;
  ballisticCoefficient: number;
  endAltitude: number;
  atmosphere: DensityAlongTime;
  /** The forecast's corner dates as seconds from the start (steps end on them), ascending, only those after the start. */
  breakTimes: Float64Array;
}

/** Checks and defaults shared by the lifetime and disposal functions: everything but the orbit. */
export function lifetimeSetup(
  gm: number,
  bodyRadius: number,
  ballisticCoefficient: number,
  solarFlux: SolarFluxArgument,
  startDate: number | null,
  model: string | null,
  endAltitude: number | null,
): Result<LifetimeSetup> {
  const bad = firstError(positive("body", gm, "km3/s2 (GM)"), positive("body_radius", bodyRadius, "km"), positive("ballistic_coefficient", ballisticCoefficient, "kg/m2 (mass / (drag coefficient x area))"));
  if (bad) return bad;
  const m = resolveModel(model);
  if (isDomainError(m)) return m;
  const schedule = resolveSolarFlux(solarFlux);
  if (isDomainError(schedule)) return schedule;
  const startJd = resolveStartDate(startDate, schedule);
  if (isDomainError(startJd)) return startJd;
  const end = endAltitude ?? DEFAULT_END_ALTITUDE;
  if (!(Number.isFinite(end) && end >= PROFILE_FLOOR && end <= MODEL_ALTITUDE_MAX))
    return badArgument("end_altitude", end, `an altitude from ${PROFILE_FLOOR} to ${MODEL_ALTITUDE_MAX} km at which the orbit counts as decayed (default ${DEFAULT_END_ALTITUDE})`);
  const breaks: number[] = [];
  for (const d of schedule.dates) if (d > startJd) breaks.push((d - startJd) * SECONDS_PER_DAY);
  return { gm, bodyRadius, ballisticCoefficient, endAltitude: end, atmosphere: densityAlongTime(m, schedule, startJd), breakTimes: Float64Array.from(breaks) };
}

/** Checks of the orbit: perigee within the model's range, apogee at or above it. */
export function checkOrbitAltitudes(perigeeAltitude: number, apogeeAltitude: number, modelName: AtmosphereModelName): DomainError | undefined {
  const bad = checkModelAltitude("perigee_altitude", perigeeAltitude, modelName);
  if (bad) return bad;
  if (!(Number.isFinite(apogeeAltitude) && apogeeAltitude >= perigeeAltitude))
    return badArgument("apogee_altitude", apogeeAltitude, `an apogee altitude in km at or above the perigee altitude (${perigeeAltitude} km)`);
  if (apogeeAltitude > APOGEE_ALTITUDE_MAX)
    return noAnswer("apogee_altitude", `${apogeeAltitude} km is above ${APOGEE_ALTITUDE_MAX} km, where the Sun and Moon move the perigee more than drag does; this drag-only estimate does not cover such orbits`);
  return undefined;
}

/**
 * Kernel: lifetime (days) from perigee and apogee altitudes (km) with checked setup; the cap
 * (in days) is passed so the disposal search can stop early. Returns Infinity past the cap,
 * NaN if the integration fails (step count or step size exhausted).
 */
export function lifetimeKernel(setup: LifetimeSetup, perigeeAltitude: number, apogeeAltitude: number, capDays = LIFETIME_CAP_DAYS): number {
  const { gm, bodyRadius: R, ballisticCoefficient: B, endAltitude, atmosphere, breakTimes } = setup;
  if (perigeeAltitude <= endAltitude) return 0;
  const y = new Float64Array([R + (perigeeAltitude + apogeeAltitude) / 2, 0]);
  y[1] = (apogeeAltitude - perigeeAltitude) / (2 * y[0]);
  const rates: DragRates = { dadt: 0, dedt: 0 };
  let tNow = 0;
  const alongOrbit = { density: (h: number) => atmosphere.density(h, tNow), breaks: atmosphere.breaks };
  const f = (t: number, s: Float64Array, ds: Float64Array): void => {
    const a = s[0];
    const e = s[1] > 0 ? s[1] : 0;
    const hp = a * (1 - e) - R;
    tNow = t;
    averagedDragRates(gm, R, a, e, B, alongOrbit, atmosphere.scaleHeight(Math.max(hp, PROFILE_FLOOR), t), rates);
    ds[0] = rates.dadt;
    ds[1] = e > 0 ? rates.dedt : 0;
  };
  const perigeeOf = (s: Float64Array) => s[0] * (1 - Math.max(s[1], 0)) - R;
  const stepper = new DormandPrinceStepper(2);
  const yNew = new Float64Array(2);
  const err = new Float64Array(2);
  const cap = capDays * SECONDS_PER_DAY;
  let t = 0;
  f(t, y, stepper.k[0]);
  // first step: a hundredth of the time the perigee takes to fall one scale height at the starting rate
  let h = Math.min((0.01 * atmosphere.scaleHeight(perigeeAltitude, 0)) / Math.max(Math.abs(stepper.k[0][0]), 1e-30), cap);
  let nextBreak = 0;
  // the last accepted step and its error norm, for the predictive step control (0: none to go by)
  let hPrev = 0;
  let normPrev = 0;
  let rejectedLast = false;
  for (let steps = 0; steps < MAX_STEPS; steps++) {
    while (nextBreak < breakTimes.length && breakTimes[nextBreak] <= t) nextBreak++;
    const clipped = nextBreak < breakTimes.length && breakTimes[nextBreak] - t < h;
    const hStep = clipped ? breakTimes[nextBreak] - t : h;
    stepper.step(f, t, y, hStep, yNew, err);
    const ea = err[0] / (RTOL * Math.abs(y[0]));
    const ee = err[1] / (ATOL_E + RTOL * Math.abs(y[1]));
    const norm = Math.sqrt((ea * ea + ee * ee) / 2);
    if (!(norm <= 1)) {
      // too long a step can carry a trial state far below the end altitude, even inside the body: shrink it
      h = Number.isFinite(norm) ? hStep * Math.max(0.2, 0.9 * norm ** -0.2) : hStep * 0.2;
      if (h < 1e-6) return Number.NaN;
      rejectedLast = true;
      continue;
    }
    if (yNew[1] < 0) yNew[1] = 0;
    if (perigeeOf(yNew) <= endAltitude) return (t + lastStepToEnd(y, stepper.k[0], yNew, stepper.k[6], hStep, R, endAltitude)) / SECONDS_PER_DAY;
    t += hStep;
    if (t >= cap) return Number.POSITIVE_INFINITY;
    y.set(yNew);
    stepper.k[0].set(stepper.k[6]);
    // a step cut short at a forecast date says nothing about a longer one: keep h as it was
    if (!clipped) {
      let fac = norm > 0 ? 0.9 * norm ** -0.2 : 5;
      // The decay speeds up from step to step, so the error of a step of the same length grows
      // along the way and the plain controller above, which takes it as constant, proposes a
      // step that fails about every other time. Gustafsson's predictive controller extrapolates
      // that trend from the last two accepted steps; the smaller of the two proposals is taken,
      // the previous error floored at 0.01 (as in Hairer and Wanner, Solving Ordinary Differential
      // Equations II, 2nd ed., section IV.8, the step control of RADAU5; from memory).
      if (hPrev > 0 && norm > 0) fac = Math.min(fac, 0.9 * norm ** -0.2 * (hStep / hPrev) * (normPrev / norm) ** 0.2);
      fac = Math.min(5, Math.max(0.2, fac));
      // no growth right after a rejected step (Hairer, Norsett and Wanner, Solving Ordinary Differential Equations I, 2nd ed., section II.4)
      if (rejectedLast) fac = Math.min(fac, 1);
      h = hStep * fac;
      hPrev = hStep;
      normPrev = Math.max(norm, 0.01);
    } else hPrev = 0;
    rejectedLast = false;
  }
  return Number.NaN;
}

/**
 * Length of the part of the accepted step [t, t + h] (from state y with rates f0 to yEnd with
 * rates f1) before the perigee altitude reaches endAltitude: a and e interpolated by cubic Hermite
 * polynomials between the step's ends (values and rates, no new rate evaluations), the crossing
 * found by the Illinois variant of regula falsi. The interpolation error is O(h^4) of a step that
 * the step control keeps short against the decay's own time scale; the time found is within a
 * small fraction of the last step, itself a small fraction of the lifetime.
 */
function lastStepToEnd(y: Float64Array, f0: Float64Array, yEnd: Float64Array, f1: Float64Array, h: number, bodyRadius: number, endAltitude: number): number {
  const g = (s: number): number => {
    const s2 = s * s;
    const s3 = s2 * s;
    const h00 = 2 * s3 - 3 * s2 + 1;
    const h10 = (s3 - 2 * s2 + s) * h;
    const h01 = 3 * s2 - 2 * s3;
    const h11 = (s3 - s2) * h;
    const a = h00 * y[0] + h10 * f0[0] + h01 * yEnd[0] + h11 * f1[0];
    const e = h00 * y[1] + h10 * f0[1] + h01 * yEnd[1] + h11 * f1[1];
    return a * (1 - Math.max(e, 0)) - bodyRadius - endAltitude;
  };
  let lo = 0;
  let glo = g(0);
  let hi = 1;
  let ghi = g(1);
  let side = 0;
  for (let it = 0; it < 100 && hi - lo > 1e-12; it++) {
    const s = hi - (ghi * (hi - lo)) / (ghi - glo);
    const gs = g(s);
    if (gs > 0) {
      lo = s;
      glo = gs;
      if (side === -1) ghi /= 2;
      side = -1;
    } else {
      hi = s;
      ghi = gs;
      if (side === 1) glo /= 2;
      side = 1;
    }
    if (Math.abs(gs) < 1e-9) break;
  }
  return hi * h;
}

/**
 * Orbital lifetime, days: from a perigee and an apogee altitude (km above the equatorial radius
 * `bodyRadius` of the Earth, GM `gm` km^3/s^2) until the perigee falls to end_altitude (km,
 * default 100), for ballistic coefficient B = m / (C_D A) (kg/m^2), a solar flux (sfu) held
 * constant or a forecast of (Julian date, F10.7) rows, a start date (Julian date UTC; used with a
 * forecast, omitted: the forecast's first date) and a density model ("nrlmsise-00" default, or
 * "exponential"). 0 when the perigee is already at or below end_altitude. #N/A past the 200-year
 * cap. Method and accuracy: see the top of this file.
 */
export function orbitLifetime(
  gm: number,
  bodyRadius: number,
  perigeeAltitude: number,
  apogeeAltitude: number,
  ballisticCoefficient: number,
  solarFlux: SolarFluxArgument,
  startDate: number | null,
  model: string | null,
  endAltitude: number | null,
): Result<number> {
  const m = resolveModel(model);
  if (isDomainError(m)) return m;
  const badOrbit = checkOrbitAltitudes(perigeeAltitude, apogeeAltitude, m);
  if (badOrbit) return badOrbit;
  const setup = lifetimeSetup(gm, bodyRadius, ballisticCoefficient, solarFlux, startDate, model, endAltitude);
  if (isDomainError(setup)) return setup;
  const days = lifetimeKernel(setup, perigeeAltitude, apogeeAltitude);
  if (days === Number.POSITIVE_INFINITY) return noAnswer("perigee_altitude", `the orbit stays up longer than the ${LIFETIME_CAP_YEARS}-year cap of the lifetime integration`);
  if (!Number.isFinite(days)) return arithmeticFailure("", "the lifetime integration did not converge");
  return days;
}
