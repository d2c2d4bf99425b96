import { badArgument, DomainError, firstError, noAnswer, nonNegative, positive, finite, type Result } from "./domain";
import { checkPlanetAndDate, EPHEMERIS_SPAN_TEXT, planetIndex, planetStateKernel, PLANET_NAMES_ALLOWED, withinEphemerisSpan } from "./ephemeris";
import { lambertKernel, LAMBERT_OK } from "./lambert";
import { dateOutside, describeJulianDate } from "./julian";
import { SECONDS_PER_DAY } from "./time";

/**
 * Planet-to-planet transfer arcs from the approximate planet states of ephemeris.ts and Lambert's
 * problem (lambert.ts, Izzo 2015), zero complete revolutions, about the Sun.
 *
 * For each pair of dates both arcs are solved: the short way (transfer angle below 180°, moving
 * along r_from × r_to) and the long way (above 180°). The one kept is the one with the lower total
 * hyperbolic excess speed v∞ out + v∞ in, so departure and arrival weigh alike; every figure
 * (C3, v∞ out, v∞ in) then refers to that same arc, in TRANSFER_BETWEEN and in every cell of
 * TRANSFER_GRID. (A flyby that only cares about C3 may find the other arc cheaper at departure on
 * some dates; near the optimum of a window both criteria pick the same arc.)
 *
 * v∞ out = |v_from - v_planet(depart)|, v∞ in = |v_to - v_planet(arrive)|, C3 = v∞ out², km²/s²
 * and km/s. The planets' states are the Earth-Moon barycentre for "Earth" and the published mean
 * elements' accuracy (ephemeris.ts: thousands of km for the inner planets), which moves C3 by
 * roughly 0.1 km²/s² near a Mars window's optimum. Patched-conic two-body figures for preliminary
 * window scans, not trajectory design: no planet's gravity, no launch asymptote constraint, and
 * transfer angles near 180° (the ridge of a window plot) give very large values because the
 * transfer plane tilts sharply there.
 *
 * GM of the Sun: every entry point takes it first, like the other core functions take their GM;
 * the worksheet layer passes the catalogue's value (DE440), the one home of body constants.
 */

/** Largest grid TRANSFER_GRID computes (cells = depart_count × tof_count). */
export const TRANSFER_GRID_CELL_CAP = 250000;

export const TRANSFER_QUANTITIES = ["c3", "v_inf_out", "v_inf_in", "v_inf_sum"] as const;
export type TransferQuantity = (typeof TRANSFER_QUANTITIES)[number];

// Scratch buffers for the kernels (the core is single-threaded; nothing here is re-entrant).
const shortArc = [0, 0, 0, 0, 0, 0];
const longArc = [0, 0, 0, 0, 0, 0];

/**
 * Kernel, no validation: the transfer from state `dep` (km, km/s; position first) to state `arr`
 * taking `tof` seconds about GM `gm`. Writes [C3, v∞ out, v∞ in] into out[0..2] and returns true,
 * or returns false when neither arc exists (positions collinear with the Sun).
 */
export function transferKernel(gm: number, dep: ArrayLike<number>, arr: ArrayLike<number>, tof: number, out: number[] | Float64Array): boolean {
  let bestSum = Infinity;
  for (let way = 0; way < 2; way++) {
    const v = way === 0 ? shortArc : longArc;
    if (lambertKernel(gm, dep, arr, tof, 0, way === 1, false, v) !== LAMBERT_OK) continue;
    const ox = v[0] - dep[3], oy = v[1] - dep[4], oz = v[2] - dep[5];
    const ix = v[3] - arr[3], iy = v[4] - arr[4], iz = v[5] - arr[5];
    const c3 = ox * ox + oy * oy + oz * oz;
    const vOut = Math.sqrt(c3);
    const vIn = Math.sqrt(ix * ix + iy * iy + iz * iz);
    if (vOut + vIn < bestSum) {
      bestSum = vOut + vIn;
      out[0] = c3;
      out[1] = vOut;
      out[2] = vIn;
    }
  }
  return bestSum < Infinity;
}

/** A transfer needs two different planets: from a planet to itself there is nothing to cross. */
function samePlanet(iFrom: number, iTo: number, to: unknown): DomainError | undefined {
  if (iFrom < 0 || iFrom !== iTo) return undefined;
  return badArgument("to", to, "a planet other than from: a transfer from a planet to itself has no arc to solve, and its excess speeds would be rounding noise");
}

const collinearReason = (): DomainError =>
  noAnswer(
    "arrive_date",
    "the two planets are in line with the Sun on these dates (transfer angle 0° or 180°), so the transfer plane is undefined; move either date by a day",
  );

/**
 * TRANSFER_BETWEEN core. Given: gm_sun (km³/s²), from, to (two different planet names as
 * PLANET_STATE takes them), depart_date and arrive_date (Julian dates, read as TDB; arrive after
 * depart).
 * Returned: [C3 km²/s², v∞ out km/s, v∞ in km/s, flight time days] of the zero-revolution arc with
 * the lower v∞ out + v∞ in (see the module comment).
 */
export function transferBetween(gm_sun: number, from: string, to: string, depart_date: number, arrive_date: number): Result<number[]> {
  const dep = checkPlanetAndDate("from", from, "depart_date", depart_date);
  if (dep instanceof DomainError) return dep;
  const arr = checkPlanetAndDate("to", to, "arrive_date", arrive_date);
  if (arr instanceof DomainError) return arr;
  const bad = firstError(
    samePlanet(dep[0], arr[0], to),
    positive("gm_sun", gm_sun, "km3/s2"),
    arrive_date > depart_date ? undefined : badArgument("arrive_date", arrive_date, "a date after depart_date"),
  );
  if (bad) return bad;
  const sDep = [0, 0, 0, 0, 0, 0];
  const sArr = [0, 0, 0, 0, 0, 0];
  planetStateKernel(dep[0], dep[1], sDep);
  planetStateKernel(arr[0], arr[1], sArr);
  const days = arrive_date - depart_date;
  const out = [0, 0, 0];
  if (!transferKernel(gm_sun, sDep, sArr, days * SECONDS_PER_DAY, out)) return collinearReason();
  return [out[0], out[1], out[2], days];
}

function parseQuantity(quantity: unknown): TransferQuantity | undefined {
  if (quantity === null || quantity === undefined || quantity === "") return "c3";
  if (typeof quantity !== "string") return undefined;
  const q = quantity.trim().toLowerCase();
  return (TRANSFER_QUANTITIES as readonly string[]).includes(q) ? (q as TransferQuantity) : undefined;
}

const countCheck = (parameter: string, n: number): DomainError | undefined =>
  Number.isInteger(n) && n >= 1 ? undefined : badArgument(parameter, n, "a whole number of 1 or more");

/**
 * TRANSFER_GRID core. Given: gm_sun (km³/s²), from, to (two different planet names), depart_first (Julian date, TDB), depart_step
 * (days, >= 0), depart_count (columns), tof_first (days, > 0), tof_step (days, >= 0), tof_count
 * (rows), quantity ("c3" default, "v_inf_out", "v_inf_in", "v_inf_sum").
 * Returned: tof_count rows × depart_count columns; row i, column j holds the quantity for departure
 * depart_first + j·depart_step and flight time tof_first + i·tof_step days (the arc chosen as in
 * transferBetween). A cell with no arc is a DomainError in that cell only. At most
 * TRANSFER_GRID_CELL_CAP cells. Each departure state is computed once per column, each arrival
 * state once per cell.
 */
export function transferGrid(
  gm_sun: number,
  from: string,
  to: string,
  depart_first: number,
  depart_step: number,
  depart_count: number,
  tof_first: number,
  tof_step: number,
  tof_count: number,
  quantity: string | null = "c3",
): Result<(number | DomainError)[][]> {
  const iFrom = typeof from === "string" ? planetIndex(from) : -1;
  const iTo = typeof to === "string" ? planetIndex(to) : -1;
  const q = parseQuantity(quantity);
  const bad = firstError(
    iFrom < 0 ? badArgument("from", from, PLANET_NAMES_ALLOWED) : undefined,
    iTo < 0 ? badArgument("to", to, PLANET_NAMES_ALLOWED) : undefined,
    samePlanet(iFrom, iTo, to),
    finite("depart_first", depart_first, "a Julian date"),
    nonNegative("depart_step", depart_step, "days"),
    countCheck("depart_count", depart_count),
    positive("tof_first", tof_first, "days"),
    nonNegative("tof_step", tof_step, "days"),
    countCheck("tof_count", tof_count),
    q ? undefined : badArgument("quantity", quantity, `one of ${TRANSFER_QUANTITIES.map((s) => `"${s}"`).join(", ")}`),
    positive("gm_sun", gm_sun, "km3/s2"),
  );
  if (bad) return bad;
  if (depart_count * tof_count > TRANSFER_GRID_CELL_CAP)
    return badArgument(
      "tof_count",
      tof_count,
      `a grid of at most ${TRANSFER_GRID_CELL_CAP} cells: depart_count × tof_count is ${depart_count} × ${tof_count} = ${depart_count * tof_count}`,
    );
  // The grid is regular, so its corner dates bound every departure and arrival.
  const departLast = depart_first + (depart_count - 1) * depart_step;
  const tofLast = tof_first + (tof_count - 1) * tof_step;
  const badSpan = firstError(
    withinEphemerisSpan(depart_first) ? undefined : dateOutside("depart_first", depart_first, EPHEMERIS_SPAN_TEXT),
    withinEphemerisSpan(departLast)
      ? undefined
      : badArgument("depart_count", depart_count, `a count whose last departure (${describeJulianDate(departLast)}) is still ${EPHEMERIS_SPAN_TEXT}`),
    withinEphemerisSpan(departLast + tofLast)
      ? undefined
      : badArgument("tof_count", tof_count, `a count whose last arrival (${describeJulianDate(departLast + tofLast)}) is still ${EPHEMERIS_SPAN_TEXT}`),
  );
  if (badSpan) return badSpan;

  const pick = q === "c3" ? 0 : q === "v_inf_out" ? 1 : q === "v_inf_in" ? 2 : 3;
  const grid: (number | DomainError)[][] = [];
  for (let i = 0; i < tof_count; i++) grid.push(new Array(depart_count));
  const sDep = new Float64Array(6);
  const sArr = new Float64Array(6);
  const out = new Float64Array(3);
  let collinear: DomainError | undefined;
  for (let j = 0; j < depart_count; j++) {
    const departure = depart_first + j * depart_step;
    planetStateKernel(iFrom, departure, sDep);
    for (let i = 0; i < tof_count; i++) {
      const days = tof_first + i * tof_step;
      planetStateKernel(iTo, departure + days, sArr);
      if (transferKernel(gm_sun, sDep, sArr, days * SECONDS_PER_DAY, out)) grid[i][j] = pick === 3 ? out[1] + out[2] : out[pick];
      else grid[i][j] = collinear ??= collinearReason();
    }
  }
  return grid;
}
