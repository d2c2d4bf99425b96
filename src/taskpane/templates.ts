/**
 * Sheet templates: small worked scenarios of the invented Skerry mission (DEVELOPERS.md, "The Skerry demo scenario"), written
 * as live =ORBIT.* formulas over marked input cells, so a user edits an input and the sheet
 * recalculates. Parameter orders are those of the function reference in README.md. The numbers typed here are the demo's
 * own inputs (invented), never reference values. Pure data and layout: no Office calls.
 */
import { orbitCalls } from "../formula/scan";
import { cellAddress, parseCell } from "./cells";

/** What a cell is for; the Excel side styles each role (inputs get a fill and an "input" tag). */
export type CellRole = "title" | "note" | "legend" | "section" | "header" | "label" | "input" | "tag" | "result" | "unit";

export interface TemplateCell {
  ref: string;
  content: string | number;
  role: CellRole;
  /** Excel number format, where it matters. */
  format?: string;
}

export interface SheetTemplate {
  id: string;
  /** Button and card title on the pane. */
  title: string;
  /** One or two plain sentences for the card. */
  summary: string;
  /** Base name of the new sheet (a suffix is added if it exists). */
  sheetName: string;
  cells: TemplateCell[];
  /** Column widths in points, from column A. */
  widths: number[];
  /** A block to shade as a colour scale (low values stand out), e.g. the transfer grid. */
  colourScale?: string;
}

/** Excel date serial (days since 1899-12-30, UTC) of a calendar date. */
export const excelSerial = (year: number, month: number, day: number): number => (Date.UTC(year, month - 1, day) - Date.UTC(1899, 11, 30)) / 86_400_000;

const CAUTION = "Invented demo mission. Preliminary two-body, first-order figures: not for flight operations or safety decisions.";
const LEGEND = "Cells shaded like this are inputs: edit them. Everything else is a live formula.";

/** Cells of one row from column A: null skips a column. */
type Spec = [string | number, CellRole, string?] | null;
function rowCells(row: number, specs: Spec[]): TemplateCell[] {
  const out: TemplateCell[] = [];
  specs.forEach((s, col) => {
    if (!s) return;
    const [content, role, format] = s;
    out.push(format ? { ref: cellAddress(row - 1, col), content, role, format } : { ref: cellAddress(row - 1, col), content, role });
  });
  return out;
}

/** An input row: label, value, unit, the "input" tag, and an optional comment. */
const inputRow = (row: number, label: string, value: string | number, unit: string, format?: string, comment?: string): TemplateCell[] =>
  rowCells(row, [[label, "label"], [value, "input", format], unit ? [unit, "unit"] : null, ["input", "tag"], comment ? [comment, "note"] : null]);

/** A result row: label, formula, unit. */
const resultRow = (row: number, label: string, formula: string, unit: string, format: string): TemplateCell[] =>
  rowCells(row, [[label, "label"], [formula, "result", format], [unit, "unit"]]);

const heading = (title: string): TemplateCell[] => [
  ...rowCells(1, [[title, "title"]]),
  ...rowCells(2, [[CAUTION, "note"]]),
  ...rowCells(3, [["input", "legend"], [LEGEND, "note"]]),
];

const KMS = "0.0000";
const MS = "#,##0.0";
const KM = "#,##0.000";
const KG = "#,##0.00";
const DEG = "0.0000";

/** Skerry-1: raise, plane change to sun-synchronous, station-keeping, disposal; propellant by burn. */
const budget: SheetTemplate = {
  id: "budget",
  title: "Delta-v and propellant budget",
  summary: "Skerry-1 from its 520 km rideshare orbit to 690 km sun-synchronous, five years of station-keeping and a 250 km disposal perigee, with margins and propellant burn by burn.",
  sheetName: "Skerry-1 budget",
  widths: [190, 90, 90, 90, 90, 90, 90],
  cells: [
    ...heading("Skerry-1 delta-v and propellant budget"),
    ...rowCells(5, [["Inputs", "section"], ["Value", "header"], ["Unit", "header"]]),
    ...inputRow(6, "Central body", "Earth", "", undefined, "catalogue name, or a GM in km³/s²"),
    ...inputRow(7, "Rideshare orbit altitude (circular)", 520, "km", "0"),
    ...inputRow(8, "Rideshare orbit inclination", 97.4, "deg", "0.00"),
    ...inputRow(9, "Mission orbit altitude (circular)", 690, "km", "0"),
    ...inputRow(10, "Disposal perigee altitude", 250, "km", "0"),
    ...inputRow(11, "Station-keeping allowance", 4, "m/s per year", "0.0", "assumed for the demo"),
    ...inputRow(12, "Mission duration", 5, "years", "0"),
    ...inputRow(13, "Mass at separation", 180, "kg", "0.0"),
    ...inputRow(14, "Thruster specific impulse", 225, "s", "0"),
    ...inputRow(15, "Delta-v margin", 0.1, "", "0%", "on every manoeuvre"),
    ...inputRow(16, "Propellant reserve", 0.05, "", "0%", "residuals and unusable propellant"),

    ...rowCells(18, [["Orbits", "section"]]),
    ...resultRow(19, "Rideshare orbit radius", "=ORBIT.ALTITUDE_TO_RADIUS(B6, B7)", "km", KM),
    ...resultRow(20, "Mission orbit radius", "=ORBIT.ALTITUDE_TO_RADIUS(B6, B9)", "km", KM),
    ...resultRow(21, "Disposal perigee radius", "=ORBIT.ALTITUDE_TO_RADIUS(B6, B10)", "km", KM),
    ...resultRow(22, "Sun-synchronous inclination at the mission orbit", "=ORBIT.SUN_SYNC_INCLINATION(B6, B20, 0)", "deg", DEG),
    ...resultRow(23, "Circular speed at the mission orbit", "=ORBIT.ORBITAL_SPEED(B6, B20)", "km/s", KMS),
    ...resultRow(24, "Period at the mission orbit", "=ORBIT.PERIOD_FROM_SMA(B6, B20)/60", "min", "0.00"),

    ...rowCells(26, [["Budget", "section"]]),
    ...rowCells(27, [
      ["Manoeuvre", "header"],
      ["Delta-v (m/s)", "header"],
      ["With margin (m/s)", "header"],
      ["With margin (km/s)", "header"],
      ["Mass before (kg)", "header"],
      ["Propellant (kg)", "header"],
      ["Mass after (kg)", "header"],
    ]),
    ...rowCells(28, [
      ["Raise to the mission orbit (Hohmann)", "label"],
      ["=1000*ORBIT.TRANSFER_DV(B6, B19, B20)", "result", MS],
      ["=B28*(1+$B$15)", "result", MS],
      ["=C28/1000", "result", KMS],
      // One formula gives mass before, propellant and mass after for all four burns (E28:G31).
      ["=ORBIT.BURN_SEQUENCE(D28:D31, B14, B13)", "result", KG],
    ]),
    ...rowCells(29, [["Plane change to sun-synchronous", "label"], ["=1000*ORBIT.PLANE_CHANGE_DV(B23, ABS(B22-B8))", "result", MS], ["=B29*(1+$B$15)", "result", MS], ["=C29/1000", "result", KMS]]),
    ...rowCells(30, [["Station-keeping", "label"], ["=B11*B12", "result", MS], ["=B30*(1+$B$15)", "result", MS], ["=C30/1000", "result", KMS]]),
    ...rowCells(31, [
      ["Disposal: lower perigee", "label"],
      ["=1000*(B23-ORBIT.ORBITAL_SPEED(B6, B20, (B20+B21)/2))", "result", MS],
      ["=B31*(1+$B$15)", "result", MS],
      ["=C31/1000", "result", KMS],
    ]),
    ...rowCells(32, [["Total", "header"], ["=SUM(B28:B31)", "result", MS], ["=SUM(C28:C31)", "result", MS], null, null, ["=SUM(F28:F31)", "result", KG]]),
    // Number formats for the spilled mass columns (the formula sits in E28 only).
    ...["E", "F", "G"].flatMap((c) => [28, 29, 30, 31].filter((r) => c !== "E" || r !== 28).map((r) => ({ ref: `${c}${r}`, content: "", role: "result" as const, format: KG }))),

    ...rowCells(34, [["Propellant", "section"]]),
    ...resultRow(35, "Propellant to load, with reserve", "=F32*(1+B16)", "kg", KG),
    ...resultRow(36, "Mass left once it is spent", "=B13-B35", "kg", KG),
    ...resultRow(37, "Delta-v that load allows (rocket equation)", "=1000*ORBIT.ROCKET_DV(B14, B13, B36)", "m/s", MS),
  ],
};

const ALTITUDES = Array.from({ length: 17 }, (_, i) => 400 + 50 * i);
const SWEEP_FIRST = 12;
const SWEEP_LAST = SWEEP_FIRST + ALTITUDES.length - 1;
const col = (c: string) => `${c}${SWEEP_FIRST}:${c}${SWEEP_LAST}`;

/**
 * One formula per result column, each over the whole altitude column (range lifting). Unit
 * changes go through CONVERT_UNIT rather than arithmetic on the returned column, so the sheet
 * recalculates the same in engines without array arithmetic (the headless runner).
 */
const sweep: SheetTemplate = {
  id: "sweep",
  title: "Altitude sweep",
  summary: "Circular speed, period, longest eclipse and J2 drift of the node and perigee from 400 to 1200 km: one formula per column over the whole altitude column.",
  sheetName: "Skerry altitude sweep",
  widths: [90, 90, 90, 80, 80, 95, 95, 110],
  cells: [
    ...heading("Altitude sweep: speed, period, eclipse and J2 drift"),
    ...rowCells(5, [["Inputs", "section"], ["Value", "header"], ["Unit", "header"]]),
    ...inputRow(6, "Central body", "Earth", ""),
    ...inputRow(7, "Inclination", 97.4, "deg", "0.00"),
    ...inputRow(8, "Eccentricity", 0, "", "0.0000"),
    ...inputRow(9, "Beta angle", 0, "deg", "0.0", "0 deg gives the longest eclipse"),
    ...rowCells(11, [
      ["Altitude (km)", "header"],
      ["Radius (km)", "header"],
      ["Circular speed (km/s)", "header"],
      ["Period (min)", "header"],
      ["Eclipse (min)", "header"],
      ["Node drift (deg/day)", "header"],
      ["Perigee drift (deg/day)", "header"],
      ["Sun-synchronous inclination (deg)", "header"],
    ]),
    ...ALTITUDES.map((h, i) => ({ ref: `A${SWEEP_FIRST + i}`, content: h, role: "input" as const, format: "0" })),
    ...rowCells(SWEEP_FIRST, [
      null,
      [`=ORBIT.ALTITUDE_TO_RADIUS(B6, ${col("A")})`, "result", KM],
      [`=ORBIT.ORBITAL_SPEED(B6, ${col("B")})`, "result", KMS],
      [`=ORBIT.CONVERT_UNIT(ORBIT.PERIOD_FROM_SMA(B6, ${col("B")}), "s", "min")`, "result", "0.00"],
      [`=ORBIT.CONVERT_UNIT(ORBIT.ECLIPSE_DURATION(B6, ${col("B")}, B9), "s", "min")`, "result", "0.00"],
      [`=ORBIT.NODAL_PRECESSION(B6, ${col("B")}, B8, B7)`, "result", DEG],
      [`=ORBIT.APSIDAL_PRECESSION(B6, ${col("B")}, B8, B7)`, "result", DEG],
      [`=ORBIT.SUN_SYNC_INCLINATION(B6, ${col("B")}, B8)`, "result", "0.000"],
    ]),
    // Formats for the spilled rows below each formula.
    ...["B", "C", "D", "E", "F", "G", "H"].flatMap((c) =>
      ALTITUDES.slice(1).map((_, i) => ({ ref: `${c}${SWEEP_FIRST + 1 + i}`, content: "", role: "result" as const, format: { B: KM, C: KMS, D: "0.00", E: "0.00", F: DEG, G: DEG, H: "0.000" }[c] })),
    ),
    ...rowCells(SWEEP_LAST + 2, [["Altitudes are inputs too: type any list of altitudes in column A. Skerry-1 flies at 690 km after leaving its 520 km rideshare orbit.", "note"]]),
  ],
};

const HANDOUT_BODIES = ["Mercury", "Venus", "Earth", "Moon", "Mars", "Ceres", "Jupiter", "Saturn", "Titan"];
const H_FIRST = 9;
const H_LAST = H_FIRST + HANDOUT_BODIES.length - 1;
const hcol = (c: string) => `${c}${H_FIRST}:${c}${H_LAST}`;

/** A table for teaching: one formula per column over the list of bodies. */
const handout: SheetTemplate = {
  id: "handout",
  title: "Handout: speeds and periods",
  summary: "Circular speed, escape speed and period of a low circular orbit for nine bodies, from the catalogue's GM and radius. Type any catalogue body into the list.",
  sheetName: "Speeds handout",
  widths: [90, 100, 110, 100, 100, 100, 80],
  cells: [
    ...heading("Circular speed, escape speed and period for several bodies"),
    ...rowCells(5, [["Inputs", "section"], ["Value", "header"], ["Unit", "header"]]),
    ...inputRow(6, "Altitude above each body's radius", 200, "km", "0", "the same for every body"),
    ...rowCells(8, [
      ["Body", "header"],
      ["Body radius (km)", "header"],
      ["GM (km³/s²)", "header"],
      ["Orbit radius (km)", "header"],
      ["Circular speed (km/s)", "header"],
      ["Escape speed (km/s)", "header"],
      ["Period (min)", "header"],
    ]),
    ...HANDOUT_BODIES.map((b, i) => ({ ref: `A${H_FIRST + i}`, content: b, role: "input" as const })),
    ...rowCells(H_FIRST, [
      null,
      [`=ORBIT.BODY_RADIUS(${hcol("A")})`, "result", "#,##0.0"],
      [`=ORBIT.BODY_GM(${hcol("A")})`, "result", "0.000000E+00"],
      [`=ORBIT.ALTITUDE_TO_RADIUS(${hcol("A")}, B6)`, "result", "#,##0.0"],
      [`=ORBIT.ORBITAL_SPEED(${hcol("A")}, ${hcol("D")})`, "result", "0.000"],
      [`=ORBIT.ESCAPE_SPEED(${hcol("A")}, ${hcol("D")})`, "result", "0.000"],
      [`=ORBIT.CONVERT_UNIT(ORBIT.PERIOD_FROM_SMA(${hcol("A")}, ${hcol("D")}), "s", "min")`, "result", "0.0"],
    ]),
    ...["B", "C", "D", "E", "F", "G"].flatMap((c) =>
      HANDOUT_BODIES.slice(1).map((_, i) => ({
        ref: `${c}${H_FIRST + 1 + i}`,
        content: "",
        role: "result" as const,
        format: { B: "#,##0.0", C: "0.000000E+00", D: "#,##0.0", E: "0.000", F: "0.000", G: "0.0" }[c],
      })),
    ),
    ...rowCells(H_LAST + 2, [["Two-body values for a circular orbit; escape speed at the same radius. Gas giants' radii are at the 1 bar level.", "note"]]),
  ],
};

const DEPARTURES = 28;
const FLIGHT_TIMES = 16;
const HEAD_ROW = 16; // the formula's row: departure dates across it, from column C
const G_ROW = HEAD_ROW + 1; // first grid row
const lastCol = 2 + DEPARTURES - 1;
const gridEnd = cellAddress(G_ROW - 1 + FLIGHT_TIMES - 1, lastCol);

/**
 * TRANSFER_GRID with its header: one formula at B16 spills the departure dates across row 16,
 * the flight times down column B and launch energy in each cell.
 */
const windows: SheetTemplate = {
  id: "windows",
  title: "Transfer window grid",
  summary: "Launch energy C3 for Earth to Mars over departures from mid-2028 into 2029 and flight times of 120 to 420 days, for the Skerry-L flyby variant. The low valley is the window.",
  sheetName: "Earth-Mars windows",
  widths: [150, 70, ...Array.from({ length: DEPARTURES }, () => 66)],
  colourScale: `C${G_ROW}:${gridEnd}`,
  cells: [
    ...heading("Earth to Mars transfer windows, 2028–2029: launch energy C3 (km²/s²)"),
    ...rowCells(5, [["Inputs", "section"], ["Value", "header"], ["Unit", "header"]]),
    ...inputRow(6, "From", "Earth", ""),
    ...inputRow(7, "To", "Mars", ""),
    ...inputRow(8, "First departure", excelSerial(2028, 7, 1), "date (UTC)", "yyyy-mm-dd"),
    ...inputRow(9, "Departure step", 10, "days", "0"),
    ...inputRow(10, "Number of departures", DEPARTURES, "", "0"),
    ...inputRow(11, "First flight time", 120, "days", "0"),
    ...inputRow(12, "Flight-time step", 20, "days", "0"),
    ...inputRow(13, "Number of flight times", FLIGHT_TIMES, "", "0"),
    ...rowCells(14, [["Each cell: the Lambert arc between the planets' approximate mean-element positions (lower of short and long way); the lowest values mark the window.", "note"]]),
    ...rowCells(HEAD_ROW, [["Departure (UTC) →", "header"], ['=ORBIT.TRANSFER_GRID(B6, B7, B8, B9, B10, B11, B12, B13, "c3", TRUE)', "result"]]),
    ...rowCells(G_ROW, [["Flight time (days) ↓", "header"]]),
    // Formats for the spilled header row, header column and grid.
    ...Array.from({ length: DEPARTURES }, (_, i) => ({ ref: cellAddress(HEAD_ROW - 1, 2 + i), content: "", role: "result" as const, format: "yyyy-mm-dd" })),
    ...Array.from({ length: FLIGHT_TIMES }, (_, j) => ({ ref: `B${G_ROW + j}`, content: "", role: "result" as const, format: "0" })),
    ...Array.from({ length: FLIGHT_TIMES }, (_, j) =>
      Array.from({ length: DEPARTURES }, (_, i) => ({ ref: cellAddress(G_ROW - 1 + j, 2 + i), content: "", role: "result" as const, format: "0.0" })),
    ).flat(),
  ],
};

export const TEMPLATES: readonly SheetTemplate[] = [budget, sweep, handout, windows];

/** Everything the Excel side writes for a template, as one block from A1. */
export interface TemplateLayout {
  rows: number;
  cols: number;
  /** Formulas or constants, "" for cells the template leaves empty (spill areas included). */
  formulas: (string | number)[][];
  numberFormats: string[][];
  /** A1 references of the cells of each role. */
  roles: Map<CellRole, string[]>;
}

/** Lays a template out as one rectangular block from A1. */
export function layoutTemplate(t: SheetTemplate): TemplateLayout {
  const placed = t.cells.map((c) => {
    const at = parseCell(c.ref);
    if (!at) throw new Error(`template ${t.id}: bad cell reference ${c.ref}`);
    return { ...c, ...at };
  });
  const rows = Math.max(...placed.map((c) => c.row)) + 1;
  const cols = Math.max(...placed.map((c) => c.col)) + 1;
  const formulas: (string | number)[][] = Array.from({ length: rows }, () => Array<string | number>(cols).fill(""));
  const numberFormats: string[][] = Array.from({ length: rows }, () => Array<string>(cols).fill("General"));
  const roles = new Map<CellRole, string[]>();
  for (const c of placed) {
    if (c.content !== "") formulas[c.row][c.col] = c.content;
    if (c.format) numberFormats[c.row][c.col] = c.format;
    if (c.content !== "") roles.set(c.role, [...(roles.get(c.role) ?? []), c.ref]);
  }
  return { rows, cols, formulas, numberFormats, roles };
}

export { orbitCalls };

/** ORBIT function ids a formula calls, in order of first use. */
export const functionsCalled = (formula: string): string[] => [...new Set(orbitCalls(formula).map((c) => c.id))];

/** ORBIT function ids a template calls, in order of first use. */
export const templateFunctions = (t: SheetTemplate): string[] =>
  [...new Set(t.cells.flatMap((c) => (typeof c.content === "string" ? functionsCalled(c.content) : [])))];

/** Functions a template needs that the build does not have (the pane offers it only when none). */
export const missingFunctions = (t: SheetTemplate, available: ReadonlySet<string>): string[] => templateFunctions(t).filter((id) => !available.has(id));
