/**
 * The body catalogue as a table plan: header, rows of values in the chosen units, a number
 * format per cell that shows the digits its source gives (no more), a source for every value,
 * and the note rows that cite each source in full and explain surprising signs. Pure: reads
 * the catalogue, no Office calls.
 */
import { BODIES } from "../catalogue/bodies";
import { sourceDigits } from "../catalogue/digits";
import { BODY_FIELDS, type BodyField } from "../catalogue/fields";
import { SOURCES } from "../catalogue/sources";
import type { Body, BodyKind, Sourced } from "../catalogue/types";
import { cellAddress } from "./cells";

export type DistanceUnit = "km" | "m";
export type GmUnit = "km3/s2" | "m3/s2";
export type TimeUnit = "s" | "h" | "day";

export interface Units {
  distance: DistanceUnit;
  gm: GmUnit;
  time: TimeUnit;
}

export const DEFAULT_UNITS: Units = { distance: "km", gm: "km3/s2", time: "s" };

/** What the pane starts with: the Sun, the planets and the Moon; GM, radii, J2 and spin. */
export const DEFAULT_BODIES: readonly string[] = ["Sun", "Mercury", "Venus", "Earth", "Moon", "Mars", "Jupiter", "Saturn", "Uranus", "Neptune"];
export const DEFAULT_FIELDS: readonly string[] = ["gm", "equatorial_radius", "mean_radius", "j2", "rotation_period"];

/**
 * Columns the sheet computes itself, as live ORBIT formulas on each row's body name (so they
 * recalculate with the add-in and cite the function). Rows of bodies without a parent are left
 * empty. The pane never computes these values: it only writes the formula.
 */
export interface DerivedField {
  key: string;
  label: string;
  /** Worksheet function id; the column is offered only when the build has it. */
  fn: string;
  /** Sheet unit of the function's result. */
  unit: "km";
  description: string;
}

export const DERIVED_FIELDS: readonly DerivedField[] = [
  { key: "soi_radius", label: "SOI radius", fn: "SOI_RADIUS", unit: "km", description: "Laplace sphere of influence about the parent" },
  { key: "hill_radius", label: "Hill radius", fn: "HILL_RADIUS", unit: "km", description: "Hill-sphere radius about the parent, at pericentre" },
];

/** A cell the sheet computes: the formula with {body} standing for the row's Body cell. */
export interface FormulaCell {
  formula: string;
}

export const isFormulaCell = (v: unknown): v is FormulaCell => typeof v === "object" && v !== null && "formula" in v;

export interface BodyGroup {
  title: string;
  bodies: Body[];
}

const KIND_TITLES: [BodyKind, string][] = [
  ["star", "Star"],
  ["planet", "Planets"],
  ["dwarf planet", "Dwarf planets"],
  ["asteroid", "Asteroids"],
];

/**
 * Bodies grouped for the pane: star, planets, the planets' moons (Earth's first, so the Moon
 * sits right under the planets), dwarf planets and their moons, then asteroids.
 */
export function bodyGroups(bodies: readonly Body[] = BODIES): BodyGroup[] {
  const groups: BodyGroup[] = [];
  const moonsOf = (kind: BodyKind) =>
    bodies
      .filter((p) => p.kind === kind && bodies.some((m) => m.kind === "moon" && m.parent === p.name))
      .map((p) => ({ title: `Moons of ${p.name}`, bodies: bodies.filter((m) => m.kind === "moon" && m.parent === p.name) }));
  for (const [kind, title] of KIND_TITLES) {
    groups.push({ title, bodies: bodies.filter((b) => b.kind === kind) });
    if (kind === "planet" || kind === "dwarf planet") groups.push(...moonsOf(kind));
  }
  return groups.filter((g) => g.bodies.length > 0);
}

/** Case-insensitive filter on name, aliases, kind and parent. */
export function matchesFilter(b: Body, filter: string): boolean {
  const q = filter.trim().toLowerCase();
  if (q === "") return true;
  const words = [b.name, ...(b.aliases ?? []), b.kind, b.parent ?? ""].map((w) => w.toLowerCase());
  return words.some((w) => w.includes(q));
}

/** Unit shown in headers, with superscripts: "km3/s2" → "km³/s²". */
export const displayUnit = (unit: string): string => unit.replace(/3/g, "³").replace(/2/g, "²");

/**
 * The unit a field takes in the chosen units, and the conversion from the catalogue's sheet
 * unit: multiply by `times`, then divide by `per` (one rounding each, so 86400 s / 86400 is 1).
 */
export function unitFor(field: BodyField, units: Units): { unit: string; times: number; per: number } {
  switch (field.unit) {
    case "km":
      return units.distance === "m" ? { unit: "m", times: 1e3, per: 1 } : { unit: "km", times: 1, per: 1 };
    case "km3/s2":
      return units.gm === "m3/s2" ? { unit: "m3/s2", times: 1e9, per: 1 } : { unit: "km3/s2", times: 1, per: 1 };
    case "s":
      return units.time === "h" ? { unit: "h", times: 1, per: 3600 } : units.time === "day" ? { unit: "day", times: 1, per: 86400 } : { unit: "s", times: 1, per: 1 };
    default:
      return { unit: field.unit, times: 1, per: 1 };
  }
}

const convert = (v: number, c: { times: number; per: number }): number => (v * c.times) / c.per;

/** Fields a person reads in scientific notation: GM spans 1e-5 to 1e11 km³/s², J2 1e-7 to 1e-2. */
const SCIENTIFIC_FIELDS: ReadonlySet<string> = new Set(["gm", "system_gm", "j2"]);

/** Digits after the decimal point in the plain decimal text of x (25.38 → 2, 1.531e-5 → 8). */
function decimalsOf(x: number): number {
  if (Number.isInteger(x)) return 0;
  const [mantissa, exponent] = Math.abs(x).toExponential().split("e");
  return Math.max(0, (mantissa.split(".")[1] ?? "").length - Number(exponent));
}

/**
 * The Excel number format of one value, showing the significant digits its source gives and no
 * more: scientific with that many mantissa digits (GM, J2), or fixed with thousands separators
 * and the decimals the value needs once rounded to those digits and stripped of trailing zeros
 * (25.3800 d reads 25.38, the Sun's 695 700 km reads 695,700, 6378.1366 km keeps 4 decimals).
 */
export function numberFormatFor(value: number, digits: number, scientific: boolean): string {
  if (scientific) return digits <= 1 ? "0E+00" : `0.${"0".repeat(digits - 1)}E+00`;
  const decimals = decimalsOf(Number(value.toPrecision(Math.max(1, digits))));
  return decimals === 0 ? "#,##0" : `#,##0.${"0".repeat(decimals)}`;
}

export interface TablePlan {
  /** Header row: "Body", one column per field (label with unit), "Sources". */
  header: string[];
  /** One row per body; a value the catalogue lacks is "" (an empty cell); derived columns hold formulas. */
  rows: (string | number | FormulaCell)[][];
  /** Excel number format of every cell of `rows` (same shape): each value's own source digits. */
  numberFormats: string[][];
  /** Lines to write below the table: the full citation of every source used, and value notes. */
  notes: string[];
  /** Short labels of the sources the table cites, in first-use order. */
  sourcesUsed: string[];
}

export interface TableRequest {
  bodies: readonly string[];
  fields: readonly string[];
  units: Units;
  /** Keys of DERIVED_FIELDS to add as live formula columns, after the catalogue fields. */
  derived?: readonly string[];
}

/** "Equatorial radius" → "equatorial radius"; "GM", "J2 reference radius" stay as they are. */
const lowerFirst = (s: string): string => (/^[A-Z][a-z]/.test(s) ? s.charAt(0).toLowerCase() + s.slice(1) : s);

const sourceLabel = (key: string): string => SOURCES[key]?.label ?? key;

/** Per-value source of one field of one body: a source key plus flags, or null when the value is missing. */
function sourceOf(b: Body, f: BodyField): { key: string; fromMemory: boolean; computed?: string; note?: string } | null {
  const entry = f.get(b);
  if (entry === undefined) return null;
  if (typeof entry === "string") {
    const key = f.textSource?.(b);
    return key ? { key, fromMemory: false } : null;
  }
  const s: Sourced = entry;
  return { key: s.source, fromMemory: s.fromMemory === true, computed: s.computed, note: s.note };
}

/** "JPL DE440: GM, system GM; IAU 2015 B3: mean radius (from memory)". */
function sourcesCell(b: Body, fields: readonly BodyField[]): string {
  const byLabel = new Map<string, string[]>();
  for (const f of fields) {
    const s = sourceOf(b, f);
    if (!s) continue;
    const label = sourceLabel(s.key);
    const what = lowerFirst(f.label);
    const tag = s.fromMemory ? `${what} (from memory)` : s.computed ? `${what} (computed)` : what;
    byLabel.set(label, [...(byLabel.get(label) ?? []), tag]);
  }
  return [...byLabel].map(([label, whats]) => `${label}: ${whats.join(", ")}`).join("; ");
}

/** Builds the table the pane previews and inserts. Unknown body names and field keys are skipped. */
export function buildTablePlan(req: TableRequest): TablePlan {
  const bodies = req.bodies.map((n) => BODIES.find((b) => b.name === n)).filter((b): b is Body => b !== undefined);
  const fields = req.fields.map((k) => BODY_FIELDS.find((f) => f.key === k)).filter((f): f is BodyField => f !== undefined);
  const conv = fields.map((f) => unitFor(f, req.units));
  const derived = (req.derived ?? []).map((k) => DERIVED_FIELDS.find((d) => d.key === k)).filter((d): d is DerivedField => d !== undefined);
  const derivedUnit = req.units.distance;
  const header = [
    "Body",
    ...fields.map((f, i) => (conv[i].unit ? `${f.label} (${displayUnit(conv[i].unit)})` : f.label)),
    ...derived.map((d) => `${d.label} (${derivedUnit})`),
    "Sources",
  ];
  const derivedFormula = (d: DerivedField): FormulaCell =>
    derivedUnit === "m" ? { formula: `=ORBIT.CONVERT_UNIT(ORBIT.${d.fn}({body}), "km", "m")` } : { formula: `=ORBIT.${d.fn}({body})` };

  const rows = bodies.map((b) => {
    const own = sourcesCell(b, fields);
    const live = b.parent && derived.length > 0 ? `live formulas: ${derived.map((d) => `ORBIT.${d.fn}`).join(", ")}` : "";
    return [
      b.name,
      ...fields.map((f, i) => {
        const e = f.get(b);
        if (e === undefined) return "";
        return typeof e === "string" ? e : convert(e.value, conv[i]);
      }),
      ...derived.map((d) => (b.parent ? derivedFormula(d) : "")),
      [own, live].filter((x) => x !== "").join("; "),
    ];
  });

  const numberFormats = bodies.map((b) => [
    "General",
    ...fields.map((f, i) => {
      const e = f.get(b);
      return e === undefined || typeof e === "string" ? "General" : numberFormatFor(convert(e.value, conv[i]), sourceDigits(e), SCIENTIFIC_FIELDS.has(f.key));
    }),
    ...derived.map(() => "#,##0"),
    "General",
  ]);

  const sourcesUsed: string[] = [];
  const valueNotes: string[] = [];
  const frames = new Map<string, string[]>();
  for (const b of bodies) {
    for (const f of fields) {
      const s = sourceOf(b, f);
      if (!s) continue;
      const label = sourceLabel(s.key);
      if (!sourcesUsed.includes(label)) sourcesUsed.push(label);
      const parts = [s.fromMemory ? "recalled from memory, not read from a copy of the source" : "", s.computed ? `computed: ${s.computed}` : "", s.note ?? ""].filter(
        (p) => p !== "",
      );
      if (parts.length > 0) valueNotes.push(`${b.name}, ${lowerFirst(f.label)}: ${parts.join("; ")}.`);
    }
    if (b.orbit?.frame && fields.some((f) => ["sma", "ecc", "inc", "orbital_period"].includes(f.key))) {
      frames.set(b.orbit.frame, [...(frames.get(b.orbit.frame) ?? []), b.name]);
    }
  }
  const citations = sourcesUsed.map((label) => {
    const src = Object.values(SOURCES).find((s) => s.label === label);
    return src ? `${label}: ${src.citation}.` : `${label}.`;
  });
  const notes =
    bodies.length === 0 || fields.length === 0
      ? []
      : [
          "Sources of the values above (Orbit Cells body catalogue):",
          ...citations,
          ...[...frames].map(([frame, names]) => `Orbit elements of ${names.join(", ")}: ${frame}.`),
          ...signNotes(bodies, fields),
          ...derived.map(
            (d) => `${d.label}: computed in the sheet by ORBIT.${d.fn} (${d.description}) from the catalogue's GM values and orbits; it recalculates with the add-in.`,
          ),
          ...valueNotes,
          "Mean or nominal values for preliminary two-body work, not ephemerides; check each source for its uncertainty.",
        ];
  return { header, rows, numberFormats, notes, sourcesUsed };
}

/** Note rows for signs that surprise: negative spin periods, inclinations above 90 degrees. */
function signNotes(bodies: readonly Body[], fields: readonly BodyField[]): string[] {
  const notes: string[] = [];
  const has = (key: string) => fields.some((f) => f.key === key);
  const retrogradeSpin = bodies.filter((b) => (b.rotationPeriod?.value ?? 0) < 0).map((b) => b.name);
  if (has("rotation_period") && retrogradeSpin.length > 0)
    notes.push(
      `Negative rotation periods (${retrogradeSpin.join(", ")}): the body spins retrograde, clockwise seen from above its IAU north pole (the pole on the north side of the solar system's invariable plane); the size of the number is the sidereal period.`,
    );
  const retrogradeOrbit = bodies.filter((b) => (b.orbit?.inc.value ?? 0) > 90).map((b) => b.name);
  if (has("inc") && retrogradeOrbit.length > 0)
    notes.push(`Inclinations above 90 deg (${retrogradeOrbit.join(", ")}): the orbit is retrograde, against the sense of the reference plane's pole.`);
  return notes;
}

/**
 * Header and rows as the cell contents to write with the table's top-left at (row, col):
 * derived columns become ORBIT calls on the row's Body cell; text that would read as a formula
 * is kept as text.
 */
export function tableCells(plan: TablePlan, row: number, col: number): (string | number)[][] {
  return [
    plan.header,
    ...plan.rows.map((r, i) =>
      r.map((v) => (isFormulaCell(v) ? v.formula.split("{body}").join(cellAddress(row + 1 + i, col)) : typeof v === "string" && v.startsWith("=") ? `'${v}` : v)),
    ),
  ];
}

/** Width and height of the block an insertion writes: the table, a blank row, then the notes. */
export function planSize(plan: TablePlan): { rows: number; cols: number } {
  const tableRows = 1 + plan.rows.length;
  return { rows: plan.notes.length > 0 ? tableRows + 1 + plan.notes.length : tableRows, cols: plan.header.length };
}

/**
 * A value as the cell shows it under one of the formats columnFormat makes ("General",
 * "#,##0", "#,##0.000", "0.000E+00"): for the pane's preview, so it matches the sheet.
 */
export function formatWith(value: string | number, format: string): string {
  if (typeof value === "string") return value;
  const fixed = /^#,##0(?:\.(0+))?$/.exec(format);
  if (fixed) {
    const decimals = fixed[1]?.length ?? 0;
    return value.toLocaleString("en-US", { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
  }
  const sci = /^0(?:\.(0+))?E\+00$/.exec(format);
  if (sci) {
    const [mantissa, exp] = value.toExponential(sci[1]?.length ?? 0).split("e");
    const e = Number(exp);
    return `${mantissa}E${e < 0 ? "-" : "+"}${String(Math.abs(e)).padStart(2, "0")}`;
  }
  return String(Number(value.toPrecision(10)));
}
