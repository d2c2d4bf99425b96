import { badArgument, isDomainError, withAll, type DomainError, type Result } from "../core/domain";
import * as ephemeris from "../core/ephemeris";
import { solveLambert } from "../core/lambert";
import { planetTransfer as coplanarHohmann } from "../core/planettransfer";
import * as windows from "../core/transferwindow";
import { BODIES } from "../catalogue/bodies";
import { gmOf, orbitOf, sharedParentOf } from "./bodyargs";
import { family, type SizeView } from "./define";
import type { CellValue } from "./lift";
import { serialOfJulianDate } from "./dates";
import { body, choice, date, flag, gm, num, optNum, position, STATE_LABELS, suggesting, text, type BodyArg, type Choice } from "./params";

// Family "Interplanetary": the first look at a transfer between two bodies about a common parent,
// Lambert's problem (Izzo 2015), approximate planet positions (Standish's published mean elements)
// and transfer windows. Patched-conic two-body figures for preliminary scans, not trajectory
// design. Examples: the invented Skerry-L Mars flyby variant, an Earth-to-Mars window in late
// 2028 (47082 is 2028-11-25 and 47292 is 2029-06-23 as Excel date serials).

/** The Sun's GM from the catalogue (the one home of body constants), for heliocentric arcs. */
const SUN_GM = BODIES.find((b) => b.kind === "star")!.gm.value;
const PLANET = 'a planet name: "Mercury" ... "Pluto" ("Earth" is the Earth-Moon barycentre)';

/** The planets of the published mean-element tables, offered as suggestions (the readers also take "EM Bary"). */
const PLANET_CHOICES: readonly Choice[] = [
  { value: "Mercury", tooltip: "Mercury, from the published mean elements." },
  { value: "Venus", tooltip: "Venus, from the published mean elements." },
  { value: "Earth", tooltip: "The Earth-Moon barycentre (the tables' EM Bary), about 4,700 km from Earth's centre." },
  { value: "Mars", tooltip: "Mars, from the published mean elements." },
  { value: "Jupiter", tooltip: "Jupiter, from the published mean elements." },
  { value: "Saturn", tooltip: "Saturn, from the published mean elements." },
  { value: "Uranus", tooltip: "Uranus, from the published mean elements." },
  { value: "Neptune", tooltip: "Neptune, from the published mean elements." },
  { value: "Pluto", tooltip: "Pluto, from the published mean elements." },
];
const planet = (name: string) => suggesting(text(name, PLANET), PLANET_CHOICES);

/** The grid quantities TRANSFER_GRID can show. */
const QUANTITY_CHOICES: readonly Choice[] = [
  { value: "c3", tooltip: "Departure C3, km²/s² (the default)." },
  { value: "v_inf_out", tooltip: "Departure hyperbolic excess speed, km/s." },
  { value: "v_inf_in", tooltip: "Arrival hyperbolic excess speed, km/s." },
  { value: "v_inf_sum", tooltip: "Departure plus arrival excess speed, km/s." },
];

/** Two bodies about one parent for a transfer; the same body twice is no transfer. */
function transferPair(from: BodyArg, to: BodyArg) {
  if (typeof from !== "number" && from === to)
    return badArgument("to", to.name, `a body other than from (${from.name}): a transfer from a body to itself goes nowhere`);
  return withAll([sharedParentOf(from, to, "from", "to"), orbitOf(from, "from"), orbitOf(to, "to")], (parent, a, b) => coplanarHohmann(gmOf(parent), a.sma.value, b.sma.value));
}

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
  const top: CellValue[] = ["flight days \\ departure", ...grid[0].map((_, j) => serialOfJulianDate(departFirst + j * departStep))];
  return [top, ...grid.map((r, i) => [tofFirst + i * tofStep, ...r])];
}

const define = family("Interplanetary");

const PLANET_TRANSFER = define.rows(
  "PLANET_TRANSFER",
  ["v∞ out (km/s)", "v∞ in (km/s)", "time of flight (s)", "phase angle (deg)", "synodic period (s)"],
  [body("from"), body("to")],
  transferPair,
  { example: ["Earth", "Mars", true], terms: ["interplanetary Hohmann", "interplanetary transfer", "phase angle", "v infinity", "Mars mission"] },
);

/**
 * Hohmann transfer between two catalogue bodies about a common parent (e.g. Earth to Mars about the Sun), both taken on circular orbits of their catalogue semi-major axes in one plane, with the parent's own GM (the Sun's for planets). Refuses (#VALUE!) the same body twice, bodies about different parents, and GM numbers (they have no orbit). A preliminary two-body estimate: real orbits are eccentric and inclined, so real excess speeds, dates and flight times differ, for Mars markedly from one opportunity to the next. The synodic period here is the circular model's; SYNODIC_PERIOD uses the catalogue periods.
 * @customfunction PLANET_TRANSFER
 * @helpurl https://localhost:3000/reference.html#planet_transfer
 * @param from Catalogue body the transfer leaves, e.g. "Earth".
 * @param to Catalogue body the transfer reaches, orbiting the same parent, e.g. "Mars".
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: v∞ out at departure (km/s), v∞ in at arrival (km/s), time of flight (s), phase angle of the target ahead of the departure body at departure (deg, −180 to 180; negative: behind), synodic period (s).
 */
export function planetTransfer(from: any[][], to: any[][], include_header?: any[][]): any[][] {
  return PLANET_TRANSFER(arguments);
}


const LAMBERT_SOLVE = define.rows(
  "LAMBERT_SOLVE",
  ["v_from x (km/s)", "v_from y (km/s)", "v_from z (km/s)", "v_to x (km/s)", "v_to y (km/s)", "v_to z (km/s)"],
  [gm(), position("r_from"), position("r_to"), num("time_of_flight", "s"), optNum("revolutions"), flag("long_way"), flag("high_branch")],
  (mu, r1, r2, t, revs, longWay, high) => solveLambert(mu, r1, r2, t, revs ?? 0, longWay, high),
  { example: ["Earth", [[7000, 0, 0]], [[0, 12000, 1000]], 3600], terms: ["Lambert", "two-point boundary", "transfer arc", "targeting", "Gauss problem"] },
);
/**
 * Lambert's problem: the velocities at both ends of the two-body arc from r_from to r_to in a given time (Izzo 2015, Householder iterations). With revolutions ≥ 1 there are two arcs: high_branch TRUE gives the one with the larger sma (higher energy), FALSE the smaller. #N/A when no arc exists for that many revolutions (the message gives the minimum time) or the positions are collinear with the centre (0° or 180°: plane undefined). Refuses (#VALUE!) a position inside the body; whether the arc between them clears the surface is not checked.
 * @customfunction LAMBERT_SOLVE
 * @helpurl https://localhost:3000/reference.html#lambert_solve
 * @param body Catalogue body name or GM in km³/s² of the central body. A GM number has no surface to check distances against.
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
  return LAMBERT_SOLVE(arguments);
}

const PLANET_STATE = define.rows("PLANET_STATE", STATE_LABELS, [planet("body"), date("date")], ephemeris.planetState, {
  example: ["Mars", 47082],
  terms: ["ephemeris", "planet position", "heliocentric", "where is Mars"],
});
/**
 * Heliocentric state of a major planet from Standish's published approximate Keplerian elements (JPL; 1800–2050 table, long-span table outside it). Ecliptic and equinox J2000. Published approximate errors for 1800–2050 (JPL, Keplerian Elements for Approximate Positions of the Major Planets), in heliocentric longitude, latitude and distance: Mercury 15″, 1″, 1,000 km; Venus 20″, 1″, 4,000 km; Earth–Moon barycentre 20″, 8″, 6,000 km; Mars 40″, 2″, 25,000 km (40″ is up to 48,000 km at Mars' distance); Jupiter 400″, 10″, 600,000 km; Saturn 600″, 25″, 1.5 million km (600″ is about 4 million km at Saturn); Uranus 50″, 2″, 1 million km; Neptune 10″, 1″, 200,000 km; Pluto 5″, 2″, 300,000 km; outside 1800–2050 the long-span table's errors are up to several times larger. Not an ephemeris for navigation. Refuses (#VALUE!) bodies other than the planets and dates outside 3000 BC – 3000 AD.
 * @customfunction PLANET_STATE
 * @helpurl https://localhost:3000/reference.html#planet_state
 * @param body Planet name: Mercury ... Neptune, Pluto; "Earth" is the Earth–Moon barycentre.
 * @param date Date: an Excel date serial or ISO 8601 text such as "2028-11-25" (UTC, taken as TDB), up to 3000 AD.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per date: x, y, z (km), vx, vy, vz (km/s).
 */
export function planetState(body: any[][], date: any[][], include_header?: any[][]): any[][] {
  return PLANET_STATE(arguments);
}

const TRANSFER_BETWEEN = define.rows(
  "TRANSFER_BETWEEN",
  ["C3 (km²/s²)", "v∞ out (km/s)", "v∞ in (km/s)", "flight time (days)"],
  [planet("from"), planet("to"), date("depart_date"), date("arrive_date")],
  (from, to, d, a) => windows.transferBetween(SUN_GM, from, to, d, a),
  { example: ["Earth", "Mars", 47082, 47292, true], terms: ["launch window", "C3", "v infinity", "Lambert", "departure date"] },
);
/**
 * Departure C3 and arrival and departure excess speeds of the zero-revolution Lambert arc between two planets on two dates, the short or long way, whichever has the lower v∞ out + v∞ in. Patched-conic two-body estimate. Refuses (#VALUE!) the same planet twice, an arrival not after the departure and dates outside the planet tables' span.
 * @customfunction TRANSFER_BETWEEN
 * @helpurl https://localhost:3000/reference.html#transfer_between
 * @param from Departure planet, e.g. "Earth".
 * @param to Arrival planet, e.g. "Mars".
 * @param depart_date Departure date: an Excel date serial or ISO 8601 text such as "2028-11-25" (UTC).
 * @param arrive_date Arrival date, after the departure: an Excel date serial or ISO 8601 text (UTC).
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: C3 (km²/s²), v∞ out (km/s), v∞ in (km/s), flight time (days).
 */
export function transferBetween(from: any[][], to: any[][], depart_date: any[][], arrive_date: any[][], include_header?: any[][]): any[][] {
  return TRANSFER_BETWEEN(arguments);
}

const TRANSFER_GRID = define.table(
  "TRANSFER_GRID",
  [
    planet("from"),
    planet("to"),
    date("depart_first"),
    num("depart_step", "days"),
    num("depart_count"),
    num("tof_first", "days"),
    num("tof_step", "days"),
    num("tof_count"),
    choice("quantity", QUANTITY_CHOICES, "c3"),
    flag("include_header"),
  ],
  (from, to, d0, dStep, dCount, t0, tStep, tCount, quantity, header) =>
    gridWithHeader(windows.transferGrid(SUN_GM, from, to, d0, dStep, dCount, t0, tStep, tCount, quantity), header, d0, dStep, t0, tStep),
  {
    example: ["Earth", "Mars", 47030, 10, 6, 150, 30, 5, "c3", true],
    terms: ["porkchop", "pork chop plot", "window", "window grid", "C3 contour", "departure dates"],
    // Flight times down, departure dates across; the header adds a row of dates and a column of times.
    size: (a: SizeView) => {
      const h = a.header() ? 1 : 0;
      const rows = a.integer("tof_count");
      const cols = a.integer("depart_count");
      return rows === undefined || cols === undefined ? undefined : { rows: rows + h, cols: cols + h };
    },
  },
);
/**
 * A transfer-window grid: departure dates across, flight times down, each cell the chosen quantity of the TRANSFER_BETWEEN arc (ready for a surface chart or conditional formatting). At most 250,000 cells. Refuses (#VALUE!) the same planet twice and grids reaching outside the planet tables' span.
 * @customfunction TRANSFER_GRID
 * @helpurl https://localhost:3000/reference.html#transfer_grid
 * @param from Departure planet, e.g. "Earth".
 * @param to Arrival planet, e.g. "Mars".
 * @param depart_first First departure date: an Excel date serial or ISO 8601 text such as "2028-11-25" (UTC).
 * @param depart_step Days between departure columns.
 * @param depart_count Number of departure columns.
 * @param tof_first First flight time, days.
 * @param tof_step Days between flight-time rows.
 * @param tof_count Number of flight-time rows.
 * @param [quantity] "c3" (default, km²/s²), "v_inf_out", "v_inf_in" or "v_inf_sum" (km/s).
 * @param [include_header] TRUE puts the departure dates (as date serials) in the first row and the flight times in the first column.
 * @returns tof_count rows by depart_count columns of the quantity.
 */
export function transferGrid(from: any[][], to: any[][], depart_first: any[][], depart_step: any[][], depart_count: any[][], tof_first: any[][], tof_step: any[][], tof_count: any[][], quantity?: any[][], include_header?: any[][]): any[][] {
  return TRANSFER_GRID(arguments);
}
