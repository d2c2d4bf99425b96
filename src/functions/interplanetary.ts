import { isDomainError, type DomainError, type Result } from "../core/domain";
import * as ephemeris from "../core/ephemeris";
import { solveLambert } from "../core/lambert";
import * as windows from "../core/transferwindow";
import { BODIES } from "../catalogue/bodies";
import { gmOf } from "./bodyargs";
import { lift, row, table, type CellValue } from "./lift";
import { body, flag, num, optNum, optText, text, vec } from "./params";

// Family "Interplanetary" (DESIGN.md §4): Lambert's problem (Izzo 2015), approximate planet
// positions (Standish's published mean elements) and transfer windows. Patched-conic two-body
// figures for preliminary scans, not trajectory design.

/** The Sun's GM from the catalogue (the one home of body constants), for heliocentric arcs. */
const SUN_GM = BODIES.find((b) => b.kind === "star")!.gm.value;
const STATE_LABELS = ["x (km)", "y (km)", "z (km)", "vx (km/s)", "vy (km/s)", "vz (km/s)"];
const PLANET = 'a planet name: "Mercury" ... "Pluto" ("Earth" is the Earth-Moon barycentre)';

/** With a header: the departure dates across the top and the flight times down the left. */
function gridWithHeader(
  grid: Result<(number | DomainError)[][]>,
  header: boolean,
  departFirst: number,
  departStep: number,
  tofFirst: number,
  tofStep: number,
): Result<CellValue[][]> {
  if (isDomainError(grid) || !header) return grid;
  const top: CellValue[] = ["flight days \\ departure", ...grid[0].map((_, j) => departFirst + j * departStep)];
  return [top, ...grid.map((r, i) => [tofFirst + i * tofStep, ...r])];
}

const f = {
  lambertSolve: lift(
    row("v_from x (km/s)", "v_from y (km/s)", "v_from z (km/s)", "v_to x (km/s)", "v_to y (km/s)", "v_to z (km/s)"),
    [body(), vec("r_from", 3, "x, y, z in km"), vec("r_to", 3, "x, y, z in km"), num("time_of_flight", "s"), optNum("revolutions"), flag("long_way"), flag("high_branch")],
    (b, r1, r2, t, revs, longWay, high) => solveLambert(gmOf(b), r1, r2, t, revs ?? 0, longWay, high),
  ),
  planetState: lift(row(...STATE_LABELS), [text("body", PLANET), num("date", "an Excel date serial")], ephemeris.planetState),
  transferBetween: lift(
    row("C3 (km2/s2)", "v_inf out (km/s)", "v_inf in (km/s)", "flight time (days)"),
    [text("from", PLANET), text("to", PLANET), num("depart_date", "an Excel date serial"), num("arrive_date", "an Excel date serial")],
    (from, to, d, a) => windows.transferBetween(SUN_GM, from, to, d, a),
  ),
  transferGrid: table(
    [
      text("from", PLANET),
      text("to", PLANET),
      num("depart_first", "an Excel date serial"),
      num("depart_step", "days"),
      num("depart_count"),
      num("tof_first", "days"),
      num("tof_step", "days"),
      num("tof_count"),
      optText("quantity", '"c3", "v_inf_out", "v_inf_in" or "v_inf_sum"'),
      flag("include_header"),
    ],
    (from, to, d0, dStep, dCount, t0, tStep, tCount, quantity, header) =>
      gridWithHeader(windows.transferGrid(SUN_GM, from, to, d0, dStep, dCount, t0, tStep, tCount, quantity ?? "c3"), header, d0, dStep, t0, tStep),
  ),
};

/**
 * Lambert's problem: the velocities at both ends of the two-body arc from r_from to r_to in a given time (Izzo 2015, Householder iterations). With revolutions ≥ 1 there are two arcs: high_branch TRUE gives the one with the larger sma (higher energy), FALSE the smaller. #N/A when no arc exists for that many revolutions (the message gives the minimum time) or the positions are collinear with the centre (0° or 180°: plane undefined).
 * @customfunction LAMBERT_SOLVE
 * @helpurl https://localhost:3000/reference.html#lambert_solve
 * @param body Catalogue body name or GM in km³/s² of the central body.
 * @param r_from Start position: three cells x, y, z (km); several rows for several cases.
 * @param r_to End position: three cells x, y, z (km).
 * @param time_of_flight Flight time, s.
 * @param [revolutions] Whole revolutions before arriving (default 0).
 * @param [long_way] TRUE: the transfer angle exceeds 180° (motion retrograde relative to r_from × r_to).
 * @param [high_branch] With revolutions ≥ 1: TRUE the higher-energy arc, FALSE (default) the lower.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: v_from x, y, z and v_to x, y, z (km/s).
 */
export function lambertSolve(body: any[][], r_from: any[][], r_to: any[][], time_of_flight: any[][], revolutions?: any[][], long_way?: any[][], high_branch?: any[][], include_header?: any[][]): any[][] {
  return f.lambertSolve(body, r_from, r_to, time_of_flight, revolutions, long_way, high_branch, include_header);
}

/**
 * Heliocentric state of a major planet from Standish's published approximate Keplerian elements (JPL; 1800–2050 table, long-span table outside it). Ecliptic and equinox J2000. Published accuracy 1800–2050: Mercury to Mars within a few thousand to 25,000 km; outer planets worse (up to about 1e6 km for Saturn). Not an ephemeris for navigation.
 * @customfunction PLANET_STATE
 * @helpurl https://localhost:3000/reference.html#planet_state
 * @param body Planet name: Mercury ... Neptune, Pluto; "Earth" is the Earth–Moon barycentre.
 * @param date Excel date serial (UTC, taken as TDB), 3000 BC to 3000 AD.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per date: x, y, z (km), vx, vy, vz (km/s).
 */
export function planetState(body: any[][], date: any[][], include_header?: any[][]): any[][] {
  return f.planetState(body, date, include_header);
}

/**
 * Departure C3 and arrival and departure excess speeds of the zero-revolution Lambert arc between two planets on two dates, the short or long way, whichever has the lower v∞ out + v∞ in. Patched-conic two-body estimate.
 * @customfunction TRANSFER_BETWEEN
 * @helpurl https://localhost:3000/reference.html#transfer_between
 * @param from Departure planet, e.g. "Earth".
 * @param to Arrival planet, e.g. "Mars".
 * @param depart_date Departure date, Excel serial (UTC).
 * @param arrive_date Arrival date, Excel serial (UTC), after the departure.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: C3 (km²/s²), v∞ out (km/s), v∞ in (km/s), flight time (days).
 */
export function transferBetween(from: any[][], to: any[][], depart_date: any[][], arrive_date: any[][], include_header?: any[][]): any[][] {
  return f.transferBetween(from, to, depart_date, arrive_date, include_header);
}

/**
 * A transfer-window grid: departure dates across, flight times down, each cell the chosen quantity of the TRANSFER_BETWEEN arc (ready for a surface chart or conditional formatting). At most 250,000 cells.
 * @customfunction TRANSFER_GRID
 * @helpurl https://localhost:3000/reference.html#transfer_grid
 * @param from Departure planet, e.g. "Earth".
 * @param to Arrival planet, e.g. "Mars".
 * @param depart_first First departure date, Excel serial (UTC).
 * @param depart_step Days between departure columns.
 * @param depart_count Number of departure columns.
 * @param tof_first First flight time, days.
 * @param tof_step Days between flight-time rows.
 * @param tof_count Number of flight-time rows.
 * @param [quantity] "c3" (default, km²/s²), "v_inf_out", "v_inf_in" or "v_inf_sum" (km/s).
 * @param [include_header] TRUE puts the departure dates in the first row and the flight times in the first column.
 * @returns tof_count rows by depart_count columns of the quantity.
 */
export function transferGrid(from: any[][], to: any[][], depart_first: any[][], depart_step: any[][], depart_count: any[][], tof_first: any[][], tof_step: any[][], tof_count: any[][], quantity?: any[][], include_header?: any[][]): any[][] {
  return f.transferGrid(from, to, depart_first, depart_step, depart_count, tof_first, tof_step, tof_count, quantity, include_header);
}
