import { checkSolarFlux, DEFAULT_SOLAR_FLUX } from "./atmosphere";
import { CubicSpline } from "./cubicspline";
import { badArgument, type DomainError, type Result } from "./domain";
import { JD_J2000 } from "./time";

/**
 * The solar flux a lifetime integration follows: one F10.7 value held for the whole life, or a
 * forecast pasted as rows of (Julian date UTC, F10.7 sfu), dates increasing. Between its first
 * and last rows the flux follows the natural cubic spline through the rows (cubicspline.ts; two
 * rows: the straight line between them); before the first row the first value holds and after
 * the last row the last value holds. A forecast's value stands for both the daily F10.7 and its
 * 81-day mean (forecasts give smoothed monthly values).
 *
 * Why a spline and not straight lines between rows: a smoothed forecast has no corners, and a
 * smooth flux lets the integrator's step control follow its changes with steps of any length,
 * where corners at every monthly row would force a step to end on each of them (hundreds of
 * steps for a lifetime of decades; measured: about ten times the cost for eccentric orbits).
 * Between monthly rows of a smoothed forecast the two differ by far less than the forecast's own
 * uncertainty; a spline may overshoot a sharp step in the rows slightly (the density models take
 * the flux clamped to 40-500 sfu).
 */
export interface FluxSchedule {
  /** F10.7, sfu, at a Julian date. */
  at(jd: number): number;
  /** The forecast's first and last dates, where the flux has its only corners (empty for a constant flux): the integrator ends steps on them. */
  readonly dates: Float64Array;
  readonly constant: boolean;
}

export type SolarFluxArgument = number | readonly (readonly number[])[] | null;

/** Julian dates accepted: 1900-01-01 to 3000-01-01. */
export const JD_MIN = 2415020.5;
export const JD_MAX = 2816787.5;

export function checkDate(parameter: string, jd: number): DomainError | undefined {
  return Number.isFinite(jd) && jd >= JD_MIN && jd <= JD_MAX ? undefined : badArgument(parameter, jd, "a date between 1900 and 3000");
}

const ROW_SHAPE = "rows of two cells, a date and an F10.7 value in sfu, dates increasing";

/** The schedule a solar_flux argument describes, the default constant 150 sfu when omitted. */
export function resolveSolarFlux(solarFlux: SolarFluxArgument): Result<FluxSchedule> {
  if (solarFlux === null || typeof solarFlux === "number") {
    const f = solarFlux ?? DEFAULT_SOLAR_FLUX;
    const bad = checkSolarFlux("solar_flux", f);
    return bad ?? { at: () => f, dates: new Float64Array(0), constant: true };
  }
  if (!Array.isArray(solarFlux) || solarFlux.length === 0) return badArgument("solar_flux", solarFlux, `one F10.7 value in sfu, or ${ROW_SHAPE}`);
  const n = solarFlux.length;
  const dates = new Float64Array(n);
  const flux = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const row = solarFlux[i];
    if (!Array.isArray(row) || row.length !== 2 || typeof row[0] !== "number" || typeof row[1] !== "number")
      return badArgument("solar_flux", solarFlux, `${ROW_SHAPE} (row ${i + 1} is not a date and a number)`);
    const badDate = checkDate("solar_flux", row[0]);
    if (badDate) return badArgument("solar_flux", row[0], `${ROW_SHAPE}; row ${i + 1} has no date between 1900 and 3000`);
    if (i > 0 && !(row[0] > dates[i - 1])) return badArgument("solar_flux", row[0], `${ROW_SHAPE} (row ${i + 1} is not later than row ${i})`);
    const badFlux = checkSolarFlux("solar_flux", row[1]);
    if (badFlux) return badFlux;
    dates[i] = row[0];
    flux[i] = row[1];
  }
  if (n === 1) return { at: () => flux[0], dates: Float64Array.of(dates[0]), constant: true };
  const spline = new CubicSpline(dates, flux);
  const first = dates[0];
  const last = dates[n - 1];
  const at = (jd: number): number => (jd <= first ? flux[0] : jd >= last ? flux[n - 1] : spline.value(jd));
  return { at, dates: Float64Array.of(first, last), constant: false };
}

/** The start date of an integration: the given one (checked), else the forecast's first date, else J2000 (a constant flux makes the date irrelevant). */
export function resolveStartDate(startDate: number | null, schedule: FluxSchedule): Result<number> {
  if (startDate !== null) return checkDate("start_date", startDate) ?? startDate;
  return schedule.dates.length > 0 ? schedule.dates[0] : JD_J2000;
}
