import { atmosphereDensity as coreAtmosphereDensity, MODEL_ALTITUDE_MAX, SOLAR_FLUX_MAX } from "../core/atmosphere";
import { ballisticCoefficient as coreBallisticCoefficient } from "../core/ballistic";
import { decayRate as coreDecayRate } from "../core/decayrate";
import { disposalPerigee as coreDisposalPerigee } from "../core/disposal";
import { badArgumentDescribed, DomainError, formatValue, isDomainError, noAnswer, type Result } from "../core/domain";
import { orbitLifetime as coreOrbitLifetime } from "../core/lifetime";
import { dragMakeupDv as coreDragMakeupDv } from "../core/makeupdv";
import type { SolarFluxArgument } from "../core/solarflux";
import { findBody } from "../catalogue/lookup";
import { julianDateOfCell } from "./dates";
import { family, type SheetCall } from "./define";
import { choice, num, optDate, optNum, type Cell, type Choice, type Param } from "./params";

// Family "Drag and lifetime": Earth's upper-atmosphere density, the ballistic coefficient, the
// decay of a circular orbit, orbital lifetime, drag make-up delta-v and the disposal perigee.
// Earth only: GM and the equatorial radius altitudes are measured from come from the catalogue's
// Earth. First-order estimates whose real uncertainty (tens of percent, with solar activity) far
// exceeds their numerics; the README's cautions say so. Examples: the invented Skerry-1, 180 kg
// with an assumed mean drag area of 1.2 m² (B = 180 / (2.2 x 1.2) = 68.18 kg/m²), at its 690 km
// mission orbit and its 250 x 690 km disposal orbit, from 2027-01-01.

const define = family("Drag and lifetime");

/** Earth's GM (km³/s²) and equatorial radius (km), read once from the catalogue. */
const EARTH: Result<{ readonly gm: number; readonly radius: number }> = (() => {
  const earth = findBody("Earth");
  return isDomainError(earth) ? earth : { gm: earth.gm.value, radius: earth.equatorialRadius.value };
})();

/**
 * An altitude typed as a distance from the centre (6878 for a 500 km orbit) lands above the
 * density models' 0-1000 km: where the core refuses such a value, the message says what it
 * probably is.
 */
function altitudeSlip<T>(result: Result<T>, parameter: string, altitude: number): Result<T> {
  if (!isDomainError(result) || result.parameter !== parameter || isDomainError(EARTH)) return result;
  const up = altitude - EARTH.radius;
  if (!(altitude > MODEL_ALTITUDE_MAX && up >= 0 && up <= MODEL_ALTITUDE_MAX)) return result;
  return noAnswer(
    parameter,
    `${altitude} km is above the 0-${MODEL_ALTITUDE_MAX} km range of the density models; an altitude is measured above Earth's equatorial radius, not from the centre (${altitude} km from the centre is ${Number(up.toFixed(3))} km up)`,
  );
}

const MODELS: readonly Choice[] = [
  {
    value: "nrlmsise-00",
    tooltip: "NRLMSISE-00 (Picone et al. 2002) as its global, diurnal and annual mean: follows solar flux and geomagnetic activity (the default)",
  },
  { value: "exponential", tooltip: "The static exponential table of Vallado, 4th ed., Table 8-4: one moderate-activity profile, no solar dependence" },
];
const model = (): Param<string> => choice("model", MODELS, "nrlmsise-00");

// ---------------------------------------------------------------------------------------------
// solar_flux as a forecast. ORBIT_LIFETIME and DISPOSAL_PERIGEE take either one F10.7 value per
// case (lifted like any number) or a forecast: a range of (date, F10.7) rows that is ONE value,
// shared by every case of the call. The adaptor lifts every argument case by case, so the
// declared call is wrapped: a forecast range is read here, whole, and handed on as a single
// cell holding the rows, which the solar_flux reader passes to the core as they are.

/** A forecast read whole from its range (or why it could not be read), carried through the adaptor as one cell. */
class ForecastCell {
  constructor(readonly rows: number[][] | DomainError) {}
}

const isBlank = (c: Cell): boolean => c === null || c === undefined || c === "" || c === 0;

/**
 * Whether a range passed as solar_flux is a forecast: exactly two columns, whose first column's
 * first non-blank cell is a date (a number above 500, beyond any F10.7 the models accept, or
 * text, which only a date or a header can be) or which has none (a range of blanks, as a host
 * probing the result size passes). Otherwise (a number up to 500 sfu first, or any other width)
 * it is a flux per case and lifts.
 */
function isForecastRange(arg: unknown): arg is Cell[][] {
  if (!Array.isArray(arg) || arg.length === 0) return false;
  for (const r of arg) if (!Array.isArray(r) || r.length !== 2) return false;
  for (const r of arg as Cell[][]) {
    const c = r[0];
    if (isBlank(c)) continue;
    return (typeof c === "number" && c > SOLAR_FLUX_MAX) || typeof c === "string";
  }
  return true;
}

const FORECAST_ROWS = "rows of a date (an Excel date or ISO 8601 text) and an F10.7 value in sfu, dates increasing";

/**
 * The rows of a forecast range as (Julian date UTC, F10.7 sfu): trailing blank rows dropped (a
 * range selected longer than the forecast), dates read by the sheet's date rules
 * (src/functions/dates.ts); the core checks the flux values and the date range.
 */
function forecastRows(range: Cell[][]): number[][] | DomainError {
  let n = range.length;
  while (n > 0 && isBlank(range[n - 1][0]) && isBlank(range[n - 1][1])) n--;
  if (n === 0) return badArgumentDescribed("solar_flux", "a range of blank cells", `one F10.7 value in sfu, or ${FORECAST_ROWS}`);
  const rows: number[][] = new Array(n);
  for (let i = 0; i < n; i++) {
    const [d, f] = range[i];
    const where = `row ${i + 1} (${formatValue(d)}, ${formatValue(f)})`;
    const jd = julianDateOfCell("solar_flux", d);
    if (isDomainError(jd)) return badArgumentDescribed("solar_flux", where, `${FORECAST_ROWS}; select the forecast's rows without a header`);
    if (typeof f !== "number" || !Number.isFinite(f)) return badArgumentDescribed("solar_flux", where, `${FORECAST_ROWS}; the second cell is not a number`);
    if (i > 0 && !(jd > rows[i - 1][0])) return badArgumentDescribed("solar_flux", where, `${FORECAST_ROWS}; its date is not later than row ${i}'s`);
    rows[i] = [jd, f];
  }
  return rows;
}

/** Wraps a declared call so that a forecast range in argument `index` reaches the adaptor as one cell. */
function withForecast(call: SheetCall, index: number): SheetCall {
  return (args) => {
    const arg = args[index];
    if (!isForecastRange(arg)) return call(args);
    const copy = Array.prototype.slice.call(args) as unknown[];
    copy[index] = [[new ForecastCell(forecastRows(arg))]];
    return call(copy);
  };
}

/** solar_flux of the lifetime functions: one number per case (null when omitted), or the forecast rows. */
function solarFluxOrForecast(): Param<SolarFluxArgument> {
  const one = optNum("solar_flux", "sfu");
  return { ...one, read: (c) => (c instanceof ForecastCell ? c.rows : one.read(c)) };
}

// ---------------------------------------------------------------------------------------------

const ATMOSPHERE_DENSITY = define.scalar(
  "ATMOSPHERE_DENSITY",
  [num("altitude", "km"), optNum("solar_flux", "sfu"), optNum("solar_flux_avg", "sfu"), optNum("geomagnetic_ap"), model()],
  (h, f, fa, ap, m) => altitudeSlip(coreAtmosphereDensity(h, f, fa, ap, m), "altitude", h),
  { example: [690, 150, 150, 15], terms: ["air density", "thermosphere", "MSIS", "upper atmosphere", "drag density", "NRLMSISE"] },
);
/**
 * Mass density of Earth's upper atmosphere at an altitude, kg/m³, Earth only. Model "nrlmsise-00" (the default): NRLMSISE-00 (Picone et al. 2002) averaged over the globe, local time and the year, following solar and geomagnetic activity, which is what sets an orbit's decay over months (a sun-synchronous orbit keeps one local time and can see up to about twice or half this mean at 400–1000 km). Model "exponential": the static table of Vallado, 4th ed., Table 8-4, one moderate-activity profile that ignores the activity arguments. Both are published for 0–1000 km; outside, #N/A with the range. The real density scatters some 15 % about the model in quiet times, and solar activity moves it by factors: a preliminary value, not for operations or re-entry prediction.
 * @customfunction ATMOSPHERE_DENSITY
 * @helpurl https://localhost:3000/reference.html#atmosphere_density
 * @param altitude Altitude above Earth's equatorial radius, km, 0 to 1000 (an altitude, not a distance from the centre).
 * @param [solar_flux] Solar radio flux F10.7 of the previous day, sfu (10⁻²² W m⁻² Hz⁻¹, as observed at Earth), 40 to 500; omitted: 150, moderate activity (common practice). Ignored by "exponential".
 * @param [solar_flux_avg] 81-day mean of F10.7 centred on the day, sfu, 40 to 500; omitted: equal to solar_flux. Ignored by "exponential".
 * @param [geomagnetic_ap] Daily geomagnetic index Ap, 0 to 400; omitted: 15, moderate (common practice). Ignored by "exponential".
 * @param [model] "nrlmsise-00" (default) or "exponential".
 * @returns Density, kg/m³.
 */
export function atmosphereDensity(altitude: any[][], solar_flux?: any[][], solar_flux_avg?: any[][], geomagnetic_ap?: any[][], model?: any[][]): any[][] {
  return ATMOSPHERE_DENSITY(arguments);
}

const BALLISTIC_COEFFICIENT = define.scalar("BALLISTIC_COEFFICIENT", [num("mass", "kg"), num("drag_area", "m²"), optNum("drag_coefficient")], coreBallisticCoefficient, {
  example: [180, 1.2],
  terms: ["B", "m/CdA", "mass to area", "area-to-mass", "ballistic", "drag coefficient", "Cd"],
});
/**
 * Ballistic coefficient B = m / (C_D A), kg/m²: the mass over the drag coefficient times the area facing the flow. A larger B (dense and small) decays more slowly. Every drag function here takes B in this form; some texts define the inverse, C_D A / m in m²/kg, so check the unit of a quoted value. Default C_D 2.2: common practice for a tumbling or flat-plate small satellite in free molecular flow; real values run from about 2 to 2.6 with shape, attitude and the gas-surface interaction, and the mean area of a tumbling body is itself an estimate.
 * @customfunction BALLISTIC_COEFFICIENT
 * @helpurl https://localhost:3000/reference.html#ballistic_coefficient
 * @param mass Spacecraft mass, kg.
 * @param drag_area Mean area presented to the flow, m².
 * @param [drag_coefficient] Drag coefficient C_D, dimensionless; omitted: 2.2 (common practice).
 * @returns Ballistic coefficient, kg/m².
 */
export function ballisticCoefficient(mass: any[][], drag_area: any[][], drag_coefficient?: any[][]): any[][] {
  return BALLISTIC_COEFFICIENT(arguments);
}

const DECAY_RATE = define.scalar(
  "DECAY_RATE",
  [num("altitude", "km"), num("ballistic_coefficient", "kg/m²"), optNum("solar_flux", "sfu"), optNum("solar_flux_avg", "sfu"), model()],
  (h, b, f, fa, m) => (isDomainError(EARTH) ? EARTH : altitudeSlip(coreDecayRate(EARTH.gm, EARTH.radius, h, b, f, fa, m), "altitude", h)),
  { example: [690, 68.18, 150], terms: ["decay", "orbit decay", "altitude loss", "drag decay", "sink rate"] },
);
/**
 * Altitude a circular Earth orbit loses per day now under drag, km/day: (ρ/B) √(μ a), a = Earth's equatorial radius + altitude, ρ the model's density there at daily Ap 15 (common practice). The rate of this moment: it grows as the orbit sinks, so altitude ÷ rate is not the lifetime (use ORBIT_LIFETIME). Earth only; atmosphere at rest. Uncertain by tens of percent because solar activity is; a preliminary estimate.
 * @customfunction DECAY_RATE
 * @helpurl https://localhost:3000/reference.html#decay_rate
 * @param altitude Altitude of the circular orbit above Earth's equatorial radius, km, 0 to 1000 (an altitude, not a distance from the centre).
 * @param ballistic_coefficient B = m / (C_D A), kg/m² (see BALLISTIC_COEFFICIENT; not its inverse).
 * @param [solar_flux] F10.7 of the previous day, sfu (10⁻²² W m⁻² Hz⁻¹), 40 to 500; omitted: 150 (common practice). Ignored by "exponential".
 * @param [solar_flux_avg] 81-day mean of F10.7 centred on the day, sfu; omitted: equal to solar_flux.
 * @param [model] "nrlmsise-00" (default) or "exponential".
 * @returns Altitude lost per day, km/day (positive).
 */
export function decayRate(altitude: any[][], ballistic_coefficient: any[][], solar_flux?: any[][], solar_flux_avg?: any[][], model?: any[][]): any[][] {
  return DECAY_RATE(arguments);
}

const ORBIT_LIFETIME = withForecast(
  define.scalar(
    "ORBIT_LIFETIME",
    [num("perigee_altitude", "km"), num("apogee_altitude", "km"), num("ballistic_coefficient", "kg/m²"), solarFluxOrForecast(), optDate("start_date"), model(), optNum("end_altitude", "km")],
    (hp, ha, b, f, start, m, end) => (isDomainError(EARTH) ? EARTH : altitudeSlip(coreOrbitLifetime(EARTH.gm, EARTH.radius, hp, ha, b, f, start, m, end), "perigee_altitude", hp)),
    { example: [250, 690, 68.18, 150, 46388], terms: ["decay", "deorbit", "reentry", "re-entry", "orbital lifetime", "time to reentry", "natural decay"] },
  ),
  3,
);
/**
 * Orbital lifetime of an Earth orbit under drag, days: the time until the perigee falls to end_altitude. Semi-major axis and eccentricity are integrated orbit-averaged (King-Hele's form of Gauss's equations, averaged numerically over each revolution) by a Dormand–Prince 5(4) integrator whose local error is held below 1e-8 of a; density at daily Ap 15 (common practice). #N/A past the 200-year cap of the integration. Solar activity over the years ahead is uncertain, so a lifetime is good to tens of percent at best: show low, moderate and high activity side by side. A first-order estimate for budgets and trade studies, Earth only, two-body motion plus drag (no Sun, Moon or oblateness); not for re-entry prediction or licensing, where compliance is decided by the licensing authority's own analysis.
 * @customfunction ORBIT_LIFETIME
 * @helpurl https://localhost:3000/reference.html#orbit_lifetime
 * @param perigee_altitude Perigee altitude above Earth's equatorial radius, km, 0 to 1000 (an altitude, not a distance from the centre); at or below end_altitude the lifetime is 0.
 * @param apogee_altitude Apogee altitude, km, at or above the perigee altitude and at most 50,000 (equal to it for a circular orbit).
 * @param ballistic_coefficient B = m / (C_D A), kg/m² (see BALLISTIC_COEFFICIENT; not its inverse).
 * @param [solar_flux] F10.7 in sfu (10⁻²² W m⁻² Hz⁻¹), 40 to 500, held constant over the whole life (the mean expected over it, not today's value); or a two-column range of (date, F10.7) rows pasted from a forecast of smoothed monthly values, dates increasing, followed by date along the smooth curve through the rows (a natural cubic spline), the first value before its first date and the last after its last. A range of two columns with dates in the first is read as a forecast, one argument shared by every case of the formula; any other range (a row of flux levels, say) gives a flux per case. Omitted: 150 (common practice).
 * @param [start_date] Date the lifetime starts, Excel date or ISO 8601 text (UTC), read against a forecast; omitted: the forecast's first date. No effect with a constant flux.
 * @param [model] "nrlmsise-00" (default) or "exponential".
 * @param [end_altitude] Perigee altitude at which the orbit counts as decayed, km, 60 to 1000; omitted: 100, because below about 100–120 km an orbit comes down within a few revolutions, the averaged theory no longer holds, and 100 km is the customary boundary of space.
 * @returns Lifetime, days.
 */
export function orbitLifetime(
  perigee_altitude: any[][],
  apogee_altitude: any[][],
  ballistic_coefficient: any[][],
  solar_flux?: any[][],
  start_date?: any[][],
  model?: any[][],
  end_altitude?: any[][],
): any[][] {
  return ORBIT_LIFETIME(arguments);
}

const DRAG_MAKEUP_DV = define.scalar(
  "DRAG_MAKEUP_DV",
  [num("altitude", "km"), num("ballistic_coefficient", "kg/m²"), num("duration", "s"), optNum("solar_flux", "sfu"), optNum("solar_flux_avg", "sfu"), model()],
  (h, b, dt, f, fa, m) => (isDomainError(EARTH) ? EARTH : altitudeSlip(coreDragMakeupDv(EARTH.gm, EARTH.radius, h, b, dt, f, fa, m), "altitude", h)),
  { example: [690, 68.18, 157788000, 150], terms: ["station keeping", "drag makeup", "drag make-up", "orbit maintenance", "reboost", "altitude maintenance"] },
);
/**
 * Delta-v that holds a circular Earth orbit's altitude against drag for a duration, km/s: the drag deceleration ½ ρ v² / B times the duration, which is what frequent small tangential burns must return. Density at daily Ap 15 (common practice). For a duration of years pass the mean flux expected over it; the answer is uncertain by tens of percent because solar activity is, so carry a margin in a budget. Earth only; atmosphere at rest. A budget estimate, not an operations plan.
 * @customfunction DRAG_MAKEUP_DV
 * @helpurl https://localhost:3000/reference.html#drag_makeup_dv
 * @param altitude Altitude of the circular orbit above Earth's equatorial radius, km, 0 to 1000 (an altitude, not a distance from the centre).
 * @param ballistic_coefficient B = m / (C_D A), kg/m² (see BALLISTIC_COEFFICIENT; not its inverse).
 * @param duration Time the altitude is held, s (5 years of 365.25 days: 157788000).
 * @param [solar_flux] F10.7 in sfu (10⁻²² W m⁻² Hz⁻¹), 40 to 500, the mean expected over the duration; omitted: 150 (common practice). Ignored by "exponential".
 * @param [solar_flux_avg] 81-day mean of F10.7, sfu; omitted: equal to solar_flux.
 * @param [model] "nrlmsise-00" (default) or "exponential".
 * @returns Delta-v, km/s.
 */
export function dragMakeupDv(altitude: any[][], ballistic_coefficient: any[][], duration: any[][], solar_flux?: any[][], solar_flux_avg?: any[][], model?: any[][]): any[][] {
  return DRAG_MAKEUP_DV(arguments);
}

const DISPOSAL_PERIGEE = withForecast(
  define.scalar(
    "DISPOSAL_PERIGEE",
    [num("apogee_altitude", "km"), num("ballistic_coefficient", "kg/m²"), num("lifetime_limit", "days"), solarFluxOrForecast(), optDate("start_date"), model()],
    (ha, b, limit, f, start, m) => (isDomainError(EARTH) ? EARTH : coreDisposalPerigee(EARTH.gm, EARTH.radius, ha, b, limit, f, start, m)),
    { example: [690, 68.18, 9131.25, 150], terms: ["deorbit perigee", "disposal orbit", "25-year rule", "5-year rule", "end of life", "debris mitigation", "passivation orbit"] },
  ),
  3,
);
/**
 * The highest perigee altitude, km, that with the given apogee brings an Earth orbit down (perigee to 100 km) within lifetime_limit days, by a bracketed root search (Brent's method, to 0.001 km) on the orbital lifetime as ORBIT_LIFETIME computes it. The apogee itself when even the circular orbit there comes down in time; #N/A when no perigee above 100 km does. The lifetime behind it is uncertain by tens of percent because solar activity is: choose a lower perigee as margin, and check it at high and low activity. Common limits are 25 years (the debris-mitigation guideline) and 5 years (a rule some licensing authorities now apply); compliance is decided by the licensing authority's own analysis, not by this estimate. Earth only.
 * @customfunction DISPOSAL_PERIGEE
 * @helpurl https://localhost:3000/reference.html#disposal_perigee
 * @param apogee_altitude Apogee altitude of the disposal orbit above Earth's equatorial radius, km, above 100 and at most 50,000 (an altitude, not a distance from the centre); the perigee is searched up to it, or up to 1000 km, the density models' top.
 * @param ballistic_coefficient B = m / (C_D A), kg/m² (see BALLISTIC_COEFFICIENT; not its inverse).
 * @param lifetime_limit Longest lifetime allowed, days (25 years: 9131.25; 5 years: 1826.25), at most the 200-year cap.
 * @param [solar_flux] F10.7 in sfu, 40 to 500, held constant (the mean expected over the limit), or a two-column range of (date, F10.7) forecast rows shared by every case, as for ORBIT_LIFETIME. Omitted: 150 (common practice).
 * @param [start_date] Date the disposal orbit is entered, Excel date or ISO 8601 text (UTC), read against a forecast; omitted: the forecast's first date.
 * @param [model] "nrlmsise-00" (default) or "exponential".
 * @returns Perigee altitude, km.
 */
export function disposalPerigee(apogee_altitude: any[][], ballistic_coefficient: any[][], lifetime_limit: any[][], solar_flux?: any[][], start_date?: any[][], model?: any[][]): any[][] {
  return DISPOSAL_PERIGEE(arguments);
}
