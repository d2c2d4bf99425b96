/**
 * Writes the demo workbooks of the invented Skerry mission (DEVELOPERS.md, "The Skerry demo scenario") into a folder:
 *   npx tsx examples/generate.ts [folder]        (default: this folder)
 * `npm run demo` (orbit-cells demo) runs this, recalculates the files through the headless
 * runner and prints the key results.
 *
 * Everything called "assumed" or "invented" below is made up for the demo; every other number is
 * computed by the ORBIT functions in the sheet. Every ORBIT formula here is a single call whose
 * arguments are literals, cells or ranges, so the tests can repeat each call directly.
 * Preliminary two-body, impulsive estimates: not for flight operations.
 */
import { mkdirSync } from "node:fs";
import { join, resolve } from "node:path";
import type ExcelJS from "exceljs";

type Value = string | number | boolean | null;
/** A cell to write: a value, or a formula (typed form, "=ORBIT.X(...)"). */
type Content = Value | { f: string };

export type Getter = (sheet: string, cell: string) => unknown;

export interface SummaryBlock {
  readonly title: string;
  /** First row: column headings. */
  readonly rows: readonly (readonly Value[])[];
}

export interface DemoWorkbook {
  readonly file: string;
  readonly title: string;
  build(book: ExcelJS.Workbook): void;
  /** The key results, read from the recalculated workbook. */
  summary(get: Getter): SummaryBlock[];
}

const NOTE = "Invented demo mission. Preliminary two-body, impulsive estimates: not for flight operations.";
const INPUT_FILL: ExcelJS.Fill = { type: "pattern", pattern: "solid", fgColor: { argb: "FFFFF4CC" } };

class Sheet {
  constructor(readonly ws: ExcelJS.Worksheet) {}

  set(addr: string, content: Content, numFmt?: string): this {
    const cell = this.ws.getCell(addr);
    cell.value = typeof content === "object" && content !== null ? ({ formula: content.f.replace(/^=/, "") } as ExcelJS.CellFormulaValue) : content;
    if (numFmt) cell.numFmt = numFmt;
    return this;
  }

  title(text: string): this {
    this.set("A1", text);
    this.ws.getCell("A1").font = { bold: true, size: 14 };
    this.set("A2", NOTE);
    this.ws.getCell("A2").font = { italic: true, color: { argb: "FF666666" } };
    return this;
  }

  heading(row: number, labels: string[]): this {
    labels.forEach((l, j) => {
      const cell = this.ws.getCell(row, j + 1);
      cell.value = l;
      cell.font = { bold: true };
      cell.border = { bottom: { style: "thin" } };
    });
    return this;
  }

  /** A labelled row: label in A, content in B, unit in C, note in D; inputs are shaded. */
  line(row: number, label: string, content: Content, unit = "", note = "", numFmt?: string): this {
    this.set(`A${row}`, label).set(`B${row}`, content, numFmt);
    if (unit) this.set(`C${row}`, unit);
    if (note) {
      this.set(`D${row}`, note);
      this.ws.getCell(`D${row}`).font = { italic: true, color: { argb: "FF666666" } };
    }
    if (typeof content !== "object" || content === null) this.ws.getCell(`B${row}`).fill = INPUT_FILL;
    return this;
  }

  widths(...w: number[]): this {
    w.forEach((width, j) => (this.ws.getColumn(j + 1).width = width));
    return this;
  }
}

const f = (formula: string): { f: string } => ({ f: formula });

const num = (v: unknown): number => (typeof v === "number" ? v : NaN);
/** Rounded for reading; the workbook keeps full precision. */
const round = (v: unknown, digits: number): Value => (typeof v === "number" ? Number(v.toFixed(digits)) : errorText(v));
function errorText(v: unknown): string {
  if (typeof v === "object" && v !== null && "value" in v) return String((v as { value: unknown }).value);
  return v === null || v === undefined ? "" : String(v);
}

/** Excel date serial (1900 system, UTC) as YYYY-MM-DD. */
export function serialToIso(serial: number): string {
  return new Date(Math.round((serial - 25569) * 86_400_000)).toISOString().slice(0, 10);
}

// ---------------------------------------------------------------------------------------------
// Skerry-1: delta-v and propellant budget; Skerry-L: the lunar cubesat study.

const BUDGET_BURNS = [
  ["Raise 520 km to 690 km (Hohmann, two burns)", "=ORBIT.TRANSFER_DV(B5, B17, B18)"],
  ["Plane change to sun-synchronous at 690 km", "=ORBIT.PLANE_CHANGE_DV(B22, B21)"],
  ["Station keeping, 5 years", "=B11*B12"],
  ["Disposal: lower perigee to 250 km", "=B22-B24"],
] as const;

const budget: DemoWorkbook = {
  file: "skerry-budget.xlsx",
  title: "Skerry-1 delta-v and propellant budget, and the Skerry-L lunar cubesat",
  build(book) {
    const s = new Sheet(book.addWorksheet("Skerry-1 budget")).title("Skerry-1: delta-v and propellant budget").widths(52, 20, 20, 20, 18, 18, 16);
    s.heading(4, ["Inputs", "Value", "Unit", "Note"]);
    s.line(5, "Body", "Earth");
    s.line(6, "Wet mass", 180, "kg");
    s.line(7, "Specific impulse (monopropellant)", 225, "s");
    s.line(8, "Rideshare orbit altitude (circular)", 520, "km");
    s.line(9, "Rideshare orbit inclination", 97.4, "deg");
    s.line(10, "Mission orbit altitude (circular, sun-synchronous)", 690, "km");
    s.line(11, "Station keeping", 5, "years");
    s.line(12, "Station-keeping delta-v per year", 0.004, "km/s", "assumed for the demo (invented)");
    s.line(13, "Disposal perigee altitude", 250, "km");
    s.line(14, "Dry mass (all usable propellant gone)", 150, "kg", "assumed for the demo (invented)");

    s.heading(16, ["Orbits", "Value", "Unit"]);
    s.line(17, "Rideshare orbit radius", f("=ORBIT.ALTITUDE_TO_RADIUS(B5, B8)"), "km", "", "0.000");
    s.line(18, "Mission orbit radius", f("=ORBIT.ALTITUDE_TO_RADIUS(B5, B10)"), "km", "", "0.000");
    s.line(19, "Disposal perigee radius", f("=ORBIT.ALTITUDE_TO_RADIUS(B5, B13)"), "km", "", "0.000");
    s.line(20, "Sun-synchronous inclination at the mission radius", f("=ORBIT.SUN_SYNC_INCLINATION(B5, B18, 0)"), "deg", "", "0.0000");
    s.line(21, "Inclination change needed", f("=B20-B9"), "deg", "", "0.0000");
    s.line(22, "Circular speed in the mission orbit", f("=ORBIT.ORBITAL_SPEED(B5, B18)"), "km/s", "", "0.00000");
    s.line(23, "Disposal ellipse: semi-major axis, eccentricity", f("=ORBIT.SHAPE_FROM_APSES(B19, B18)"), "", "", "0.000");
    s.set("D23", "(km; the eccentricity spills into C23)");
    s.line(24, "Speed at the disposal ellipse's apogee", f("=ORBIT.ORBITAL_SPEED(B5, B18, B23)"), "km/s", "", "0.00000");
    s.line(25, "Mission orbit period", f("=ORBIT.PERIOD_FROM_SMA(B5, B18)"), "s", "", "0.0");

    s.heading(27, ["Burn", "Delta-v (km/s)", "Isp (s)", "Mass before (kg)", "Propellant (kg)", "Mass after (kg)", "Delta-v (m/s)"]);
    BUDGET_BURNS.forEach(([label, formula], i) => {
      const r = 28 + i;
      s.set(`A${r}`, label).set(`B${r}`, f(formula), "0.00000").set(`C${r}`, f("=$B$7"));
      for (const c of ["D", "E", "F"]) s.ws.getCell(`${c}${r}`).numFmt = "0.000";
      s.ws.getCell(`G${r}`).numFmt = "0.0";
    });
    s.set("D28", f("=ORBIT.BURN_SEQUENCE(B28:B31, C28:C31, B6, B14)"));
    s.set("G28", f('=ORBIT.CONVERT_UNIT(B28:B31, "km/s", "m/s")'));
    s.set("A33", "Total").set("B33", f("=SUM(B28:B31)"), "0.00000").set("E33", f("=SUM(E28:E31)"), "0.000").set("G33", f("=SUM(G28:G31)"), "0.0");
    s.ws.getRow(33).font = { bold: true };
    s.line(34, "Check: rocket equation over the whole budget (equals B33)", f("=ORBIT.ROCKET_DV(B7, B6, F31)"), "km/s", "", "0.00000");
    s.line(35, "Check: propellant for the total delta-v (equals E33)", f("=ORBIT.PROPELLANT_MASS(B33, B7, F31)"), "kg", "", "0.000");
    s.line(36, "Propellant left above the dry mass at the end", f("=F31-B14"), "kg", "", "0.000");

    s.heading(38, ["Trade: fold the plane change into the circularisation burn", "Value", "Unit"]);
    s.line(39, "Transfer burns: burn 1, burn 2, burn 3, total, time of flight", f("=ORBIT.TRANSFER_BURNS(B5, B17, B18)"), "", "", "0.00000");
    s.set("G39", "(km/s ... s, spilled across)");
    s.line(40, "Speed at the transfer's apogee", f("=B22-C39"), "km/s", "", "0.00000");
    s.line(41, "Circularise and turn the plane in one burn", f("=ORBIT.COMBINED_PLANE_CHANGE_DV(B40, B22, B21)"), "km/s", "", "0.00000");
    s.line(42, "Saving against two separate burns", f("=C39+B29-B41"), "km/s", "", "0.00000");

    const l = new Sheet(book.addWorksheet("Skerry-L")).title("Skerry-L: a 24U cubesat to a 100 km lunar orbit").widths(60, 20, 14, 20, 18, 18);
    l.heading(4, ["Inputs", "Value", "Unit", "Note"]);
    l.line(5, "Wet mass (24U cubesat)", 36, "kg", "assumed for the demo (invented)");
    l.line(6, "Specific impulse", 215, "s");
    l.line(7, "Lunar orbit altitude (circular)", 100, "km");
    l.line(8, "Parking orbit altitude of the rideshare's translunar injection", 185, "km", "assumed for the demo (invented)");
    l.line(9, "Trajectory corrections", 0.015, "km/s", "assumed for the demo (invented)");

    l.heading(11, ["Trajectory (patched conics, coplanar)", "Value", "Unit"]);
    l.line(12, "Parking orbit radius", f('=ORBIT.ALTITUDE_TO_RADIUS("Earth", B8)'), "km", "", "0.000");
    l.line(13, "Moon's distance (catalogue semi-major axis)", f('=ORBIT.BODY_VALUE("Moon", "sma")'), "km", "", "0.0");
    l.line(14, "Hohmann arc to the Moon's distance: burn 1, burn 2, burn 3, total, time of flight", f('=ORBIT.TRANSFER_BURNS("Earth", B12, B13)'), "", "", "0.00000");
    l.line(15, "Excess speed at the Moon (its circular speed minus the arc's apogee speed: burn 2)", f("=C14"), "km/s", "", "0.00000");
    l.line(16, "Flight time to the Moon", f('=ORBIT.CONVERT_UNIT(F14, "s", "day")'), "days", "", "0.00");
    l.line(17, "Lunar orbit radius", f('=ORBIT.ALTITUDE_TO_RADIUS("Moon", B7)'), "km", "", "0.000");
    l.line(18, "Lunar orbit insertion (one periapsis burn into the circular orbit)", f('=ORBIT.CAPTURE_DV("Moon", B17, B15)'), "km/s", "", "0.00000");
    l.line(19, "Lunar orbit period", f('=ORBIT.PERIOD_FROM_SMA("Moon", B17)'), "s", "", "0.0");
    l.line(20, "Moon's sphere of influence radius", f('=ORBIT.SOI_RADIUS("Moon")'), "km", "", "0");

    l.heading(22, ["Burn", "Delta-v (km/s)", "Isp (s)", "Mass before (kg)", "Propellant (kg)", "Mass after (kg)"]);
    l.set("A23", "Trajectory corrections").set("B23", f("=B9"), "0.00000").set("C23", f("=$B$6"));
    l.set("A24", "Lunar orbit insertion").set("B24", f("=B18"), "0.00000").set("C24", f("=$B$6"));
    l.set("D23", f("=ORBIT.BURN_SEQUENCE(B23:B24, C23:C24, B5)"));
    for (const r of [23, 24]) for (const c of ["D", "E", "F"]) l.ws.getCell(`${c}${r}`).numFmt = "0.000";
    l.line(26, "Propellant needed", f("=SUM(E23:E24)"), "kg", "", "0.000");
    l.line(27, "Propellant fraction of the wet mass", f("=B26/B5"), "", "", "0.0%");
  },
  summary(get) {
    const b = (c: string) => get("Skerry-1 budget", c);
    const rows: Value[][] = [["Burn", "Delta-v (m/s)", "Propellant (kg)", "Mass after (kg)"]];
    BUDGET_BURNS.forEach(([label], i) => rows.push([label, round(b(`G${28 + i}`), 1), round(b(`E${28 + i}`), 2), round(b(`F${28 + i}`), 2)]));
    rows.push(["Total", round(b("G33"), 1), round(b("E33"), 2), ""]);
    const L = (c: string) => get("Skerry-L", c);
    return [
      { title: "Skerry-1 budget (180 kg, Isp 225 s): 520 km at 97.4 deg to 690 km sun-synchronous, 5 years, disposal perigee 250 km", rows },
      {
        title: "Skerry-1 orbits and trade",
        rows: [
          ["Quantity", "Value", "Unit"],
          ["Sun-synchronous inclination at 690 km", round(b("B20"), 4), "deg"],
          ["Plane change needed from the rideshare", round(b("B21"), 4), "deg"],
          ["Propellant left above the assumed dry mass", round(b("B36"), 2), "kg"],
          ["Saving if the plane change rides on the circularisation burn", round(num(b("B42")) * 1000, 1), "m/s"],
        ],
      },
      {
        title: "Skerry-L (24U cubesat, Isp 215 s) to a 100 km lunar orbit",
        rows: [
          ["Quantity", "Value", "Unit"],
          ["Excess speed arriving at the Moon", round(L("B15"), 4), "km/s"],
          ["Flight time on the Hohmann arc", round(L("B16"), 2), "days"],
          ["Lunar orbit insertion", round(num(L("B18")) * 1000, 1), "m/s"],
          ["Propellant needed (with corrections)", round(L("B26"), 2), "kg"],
          ["Lunar orbit period", round(num(L("B19")) / 60, 1), "min"],
        ],
      },
    ];
  },
};

// ---------------------------------------------------------------------------------------------
// Altitude sweep: each column is one formula lifted over the whole altitude column.

const SWEEP_FIRST = 5;
const SWEEP_ALTITUDES = Array.from({ length: 91 }, (_, i) => 300 + 10 * i);
const SWEEP_LAST = SWEEP_FIRST + SWEEP_ALTITUDES.length - 1;
const col = (c: string) => `${c}${SWEEP_FIRST}:${c}${SWEEP_LAST}`;

const sweep: DemoWorkbook = {
  file: "skerry-altitude-sweep.xlsx",
  title: "Skerry-1 altitude sweep, 300 to 1200 km",
  build(book) {
    const s = new Sheet(book.addWorksheet("Altitude sweep")).title("Skerry-1: what the mission altitude changes").widths(14, 14, 14, 14, 14, 16, 18, 14, 14, 18, 18, 16);
    s.set("A3", "Rideshare orbit radius (km)").set("D3", f('=ORBIT.ALTITUDE_TO_RADIUS("Earth", 520)'), "0.000");
    s.heading(4, [
      "Altitude (km)",
      "Radius (km)",
      "Circular speed (km/s)",
      "Period (s)",
      "Period (min)",
      "Sun-synchronous inclination (deg)",
      "Node drift at 97.4 deg (deg/day)",
      "Longest eclipse (s)",
      "Longest eclipse (min)",
      "Hohmann delta-v from 520 km (km/s)",
      "Same, m/s",
      "Mass ratio at Isp 225 s",
    ]);
    SWEEP_ALTITUDES.forEach((h, i) => {
      s.set(`A${SWEEP_FIRST + i}`, h);
      s.ws.getCell(`A${SWEEP_FIRST + i}`).fill = INPUT_FILL;
    });
    const top = (c: string, formula: string, fmt: string) => {
      s.set(`${c}${SWEEP_FIRST}`, f(formula));
      for (let r = SWEEP_FIRST; r <= SWEEP_LAST; r++) s.ws.getCell(`${c}${r}`).numFmt = fmt;
    };
    top("B", `=ORBIT.ALTITUDE_TO_RADIUS("Earth", ${col("A")})`, "0.000");
    top("C", `=ORBIT.ORBITAL_SPEED("Earth", ${col("B")})`, "0.00000");
    top("D", `=ORBIT.PERIOD_FROM_SMA("Earth", ${col("B")})`, "0.0");
    top("E", `=ORBIT.CONVERT_UNIT(${col("D")}, "s", "min")`, "0.00");
    top("F", `=ORBIT.SUN_SYNC_INCLINATION("Earth", ${col("B")}, 0)`, "0.0000");
    top("G", `=ORBIT.NODAL_PRECESSION("Earth", ${col("B")}, 0, 97.4)`, "0.00000");
    top("H", `=ORBIT.ECLIPSE_DURATION("Earth", ${col("B")}, 0)`, "0.0");
    top("I", `=ORBIT.CONVERT_UNIT(${col("H")}, "s", "min")`, "0.00");
    top("J", `=ORBIT.TRANSFER_DV("Earth", $D$3, ${col("B")})`, "0.00000");
    top("K", `=ORBIT.CONVERT_UNIT(${col("J")}, "km/s", "m/s")`, "0.0");
    top("L", `=ORBIT.MASS_RATIO(${col("J")}, 225)`, "0.00000");
  },
  summary(get) {
    const rows: Value[][] = [["Altitude (km)", "Speed (km/s)", "Period (min)", "SSO inc. (deg)", "Eclipse (min)", "Raise dv (m/s)"]];
    SWEEP_ALTITUDES.forEach((h, i) => {
      if (h % 100 !== 0 && h !== 520 && h !== 690) return;
      const r = SWEEP_FIRST + i;
      const g = (c: string) => get("Altitude sweep", `${c}${r}`);
      rows.push([h, round(g("C"), 4), round(g("E"), 2), round(g("F"), 3), round(g("I"), 2), round(g("K"), 1)]);
    });
    return [{ title: "Altitude sweep (every 100 km, and the rideshare and mission altitudes)", rows }];
  },
};

// ---------------------------------------------------------------------------------------------
// Handout: speeds and periods for several bodies, and the catalogue table with its header.

const HANDOUT_BODIES = ["Mercury", "Venus", "Earth", "Moon", "Mars", "Jupiter", "Saturn", "Titan"];
const H_FIRST = 6;
const H_LAST = H_FIRST + HANDOUT_BODIES.length - 1;
const hcol = (c: string) => `${c}${H_FIRST}:${c}${H_LAST}`;

const handout: DemoWorkbook = {
  file: "skerry-handout.xlsx",
  title: "Handout: speeds and periods at the surface of several bodies",
  build(book) {
    const s = new Sheet(book.addWorksheet("Handout")).title("Speeds and periods of a surface-skimming circular orbit").widths(12, 16, 16, 16, 16, 16, 16, 18);
    s.set("A3", "Two-body values at the equatorial radius (no atmosphere, no terrain): a classroom comparison.");
    s.heading(5, ["Body", "GM (km3/s2)", "Equatorial radius (km)", "Circular speed (km/s)", "Escape speed (km/s)", "Period (s)", "Period (min)", "Sphere of influence (km)"]);
    HANDOUT_BODIES.forEach((b, i) => {
      s.set(`A${H_FIRST + i}`, b);
      s.ws.getCell(`A${H_FIRST + i}`).fill = INPUT_FILL;
    });
    s.set(`B${H_FIRST}`, f(`=ORBIT.BODY_GM(${hcol("A")})`));
    s.set(`C${H_FIRST}`, f(`=ORBIT.BODY_RADIUS(${hcol("A")})`));
    s.set(`D${H_FIRST}`, f(`=ORBIT.ORBITAL_SPEED(${hcol("A")}, ${hcol("C")})`));
    s.set(`E${H_FIRST}`, f(`=ORBIT.ESCAPE_SPEED(${hcol("A")}, ${hcol("C")})`));
    s.set(`F${H_FIRST}`, f(`=ORBIT.PERIOD_FROM_SMA(${hcol("A")}, ${hcol("C")})`));
    s.set(`G${H_FIRST}`, f(`=ORBIT.CONVERT_UNIT(${hcol("F")}, "s", "min")`));
    s.set(`H${H_FIRST}`, f(`=ORBIT.SOI_RADIUS(${hcol("A")})`));
    for (let r = H_FIRST; r <= H_LAST; r++) {
      for (const [c, fmt] of [["B", "0.000"], ["C", "0.0"], ["D", "0.000"], ["E", "0.000"], ["F", "0"], ["G", "0.0"], ["H", "#,##0"]]) s.ws.getCell(`${c}${r}`).numFmt = fmt;
    }
    const t = H_LAST + 3;
    s.set(`A${t - 1}`, "The same bodies from the catalogue (sources in the Orbit Cells pane):");
    s.ws.getCell(`A${t - 1}`).font = { bold: true };
    s.set(`A${t}`, f(`=ORBIT.BODY_TABLE("gm, equatorial_radius, j2, rotation_period", ${hcol("A")}, TRUE)`));
  },
  summary(get) {
    const rows: Value[][] = [["Body", "Circular (km/s)", "Escape (km/s)", "Period (min)"]];
    HANDOUT_BODIES.forEach((b, i) => {
      const g = (c: string) => get("Handout", `${c}${H_FIRST + i}`);
      rows.push([b, round(g("D"), 3), round(g("E"), 3), round(g("G"), 1)]);
    });
    return [{ title: "Handout: surface-skimming circular orbit speeds and periods", rows }];
  },
};

// ---------------------------------------------------------------------------------------------
// Mars flyby variant: departure C3 over the 2028-2029 window, the best cell, and its arcs.

const DEPARTURES = 36; // every 10 days from 2028-07-01
const FLIGHTS = 16; // 120 to 420 days every 20
const G_TOP = 15; // header row of the grid (departure dates); the grid is one formula in A15
const G_FIRST = G_TOP + 1;
const G_LAST = G_TOP + FLIGHTS;
/** 1-based column number to letters. */
function columnName(n: number): string {
  let s = "";
  for (; n > 0; n = Math.floor((n - 1) / 26)) s = String.fromCharCode(65 + ((n - 1) % 26)) + s;
  return s;
}
const G_RIGHT = columnName(1 + DEPARTURES); // last departure column
const PER_TOF = columnName(2 + DEPARTURES); // helper column: lowest C3 per flight time
const PER_DEP_ROW = G_LAST + 1; // helper row: lowest C3 per departure

const mars: DemoWorkbook = {
  file: "skerry-mars-window.xlsx",
  title: "Skerry Mars flyby variant: the 2028-2029 departure window",
  build(book) {
    const s = new Sheet(book.addWorksheet("Mars window")).title("Skerry Mars flyby variant: departure C3 over 2028-2029").widths(22, 14, 12, 12, 12);
    s.heading(4, ["Inputs", "Value", "Unit"]);
    s.line(5, "From", "Earth");
    s.line(6, "To", "Mars");
    s.line(7, "First departure", f("=DATE(2028,7,1)"), "date", "", "yyyy-mm-dd");
    s.ws.getCell("B7").fill = INPUT_FILL;
    s.line(8, "Days between departures", 10, "days");
    s.line(9, "Departures", DEPARTURES);
    s.line(10, "Shortest flight", 120, "days");
    s.line(11, "Days between flight times", 20, "days");
    s.line(12, "Flight times", FLIGHTS);
    s.line(13, "Parking orbit altitude at departure", 300, "km", "assumed for the demo (invented)");
    s.set(`A${G_TOP - 1}`, "Departure C3 (km2/s2): flight days down, departure dates across");
    s.ws.getCell(`A${G_TOP - 1}`).font = { bold: true };
    s.set(`A${G_TOP}`, f('=ORBIT.TRANSFER_GRID(B5, B6, B7, B8, B9, B10, B11, B12, "c3", TRUE)'));
    for (let c = 2; c <= DEPARTURES + 1; c++) {
      s.ws.getCell(G_TOP, c).numFmt = "yyyy-mm-dd";
      s.ws.getColumn(c).width = 11;
      for (let r = G_FIRST; r <= PER_DEP_ROW; r++) s.ws.getCell(r, c).numFmt = "0.0";
      const letter = columnName(c);
      s.set(`${letter}${PER_DEP_ROW}`, f(`=MIN(${letter}${G_FIRST}:${letter}${G_LAST})`));
    }
    s.set(`A${PER_DEP_ROW}`, "lowest per departure");
    s.set(`${PER_TOF}${G_TOP}`, "lowest per flight time");
    for (let r = G_FIRST; r <= G_LAST; r++) s.set(`${PER_TOF}${r}`, f(`=MIN(B${r}:${G_RIGHT}${r})`), "0.0");

    const b = PER_DEP_ROW + 2;
    s.heading(b, ["The lowest C3 in the grid", "Value", "Unit"]);
    s.line(b + 1, "Lowest C3", f(`=MIN(B${G_FIRST}:${G_RIGHT}${G_LAST})`), "km2/s2", "", "0.000");
    s.line(b + 2, "Departure", f(`=INDEX(B${G_TOP}:${G_RIGHT}${G_TOP}, 1, MATCH(B${b + 1}, B${PER_DEP_ROW}:${G_RIGHT}${PER_DEP_ROW}, 0))`), "date", "", "yyyy-mm-dd");
    s.line(b + 3, "Flight time", f(`=INDEX(A${G_FIRST}:A${G_LAST}, MATCH(B${b + 1}, ${PER_TOF}${G_FIRST}:${PER_TOF}${G_LAST}, 0))`), "days");
    s.line(b + 4, "Arrival", f(`=B${b + 2}+B${b + 3}`), "date", "", "yyyy-mm-dd");
    s.line(b + 5, "That arc: C3, v-infinity out, v-infinity in, days", f(`=ORBIT.TRANSFER_BETWEEN(B5, B6, B${b + 2}, B${b + 4}, TRUE)`), "", "", "0.000");
    for (const c of ["B", "C", "D", "E"]) s.ws.getCell(`${c}${b + 6}`).numFmt = "0.000";
    s.line(b + 8, "Parking orbit radius", f("=ORBIT.ALTITUDE_TO_RADIUS(B5, B13)"), "km", "", "0.000");
    s.line(b + 9, "Departure burn from the parking orbit", f(`=ORBIT.DEPARTURE_DV(B5, B${b + 8}, C${b + 6})`), "km/s", "", "0.00000");
    s.line(b + 10, "For comparison, circular coplanar Hohmann: v-infinity out, in, time of flight, phase angle, synodic period", f('=ORBIT.PLANET_TRANSFER(B5, B6)'), "", "", "0.000");
    s.line(b + 11, "Hohmann C3", f(`=ORBIT.C3_ENERGY(B${b + 10})`), "km2/s2", "", "0.000");
  },
  summary(get) {
    const g = (c: string) => get("Mars window", c);
    const b = PER_DEP_ROW + 2;
    const iso = (v: unknown) => (typeof v === "number" ? serialToIso(v) : errorText(v));
    const best: Value[][] = [
      ["Quantity", "Value", "Unit"],
      ["Lowest departure C3 in the grid", round(g(`B${b + 1}`), 3), "km2/s2"],
      ["Departure", iso(g(`B${b + 2}`)), ""],
      ["Flight time", round(g(`B${b + 3}`), 0), "days"],
      ["Arrival at Mars", iso(g(`B${b + 4}`)), ""],
      ["v-infinity out / in", `${round(g(`C${b + 6}`), 3)} / ${round(g(`D${b + 6}`), 3)}`, "km/s"],
      ["Departure burn from a 300 km parking orbit", round(g(`B${b + 9}`), 3), "km/s"],
      ["Circular coplanar Hohmann C3, for comparison", round(g(`B${b + 11}`), 3), "km2/s2"],
    ];
    const shape: Value[][] = [["Departure", "Lowest C3 (km2/s2)", "at flight time (days)"]];
    for (let j = 0; j < DEPARTURES; j += 3) {
      const letter = columnName(2 + j);
      let bestRow = G_FIRST;
      for (let r = G_FIRST; r <= G_LAST; r++) if (num(g(`${letter}${r}`)) < num(g(`${letter}${bestRow}`))) bestRow = r;
      shape.push([iso(g(`${letter}${G_TOP}`)), round(g(`${letter}${PER_DEP_ROW}`), 2), round(g(`A${bestRow}`), 0)]);
    }
    return [
      { title: "Mars flyby variant: the 2028-2029 window (zero-revolution Lambert arcs, approximate planet positions)", rows: best },
      { title: "The window's shape: every third departure column", rows: shape },
    ];
  },
};

/** Every demo workbook, in the order the demo prints them. */
export const DEMO_WORKBOOKS: readonly DemoWorkbook[] = [budget, sweep, handout, mars];

/** Writes every demo workbook into `folder`; returns the paths written. */
export async function writeDemoWorkbooks(folder: string): Promise<string[]> {
  mkdirSync(folder, { recursive: true });
  // Loaded here, not at the top, so the command line starts without it when it does not write.
  const excel = (await import("exceljs")) as unknown as typeof ExcelJS & { default?: typeof ExcelJS };
  const { Workbook } = excel.default ?? excel;
  const paths: string[] = [];
  for (const d of DEMO_WORKBOOKS) {
    const book = new Workbook();
    book.creator = "Orbit Cells demo generator";
    book.title = d.title;
    // Fixed dates keep the generated files identical from run to run.
    book.created = new Date(Date.UTC(2026, 0, 1));
    book.modified = new Date(Date.UTC(2026, 0, 1));
    d.build(book);
    const path = join(folder, d.file);
    await book.xlsx.writeFile(path);
    paths.push(path);
  }
  return paths;
}

if (typeof require !== "undefined" && require.main === module) {
  writeDemoWorkbooks(resolve(process.argv[2] ?? __dirname)).then((paths) => console.log(paths.join("\n")));
}
