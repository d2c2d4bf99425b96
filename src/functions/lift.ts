import { badArgument, badArgumentDescribed, DomainError, type Result } from "../core/domain";
import { toCellError } from "./cellerror";
import { flag, type Cell, type ListParam, type Param } from "./params";
import { positionInside, radiusInside, smaInside, type Surface } from "./surface";

/**
 * The shared adaptor between Excel and the core (DEVELOPERS.md, "Conventions"). `lift` reads the arguments Excel
 * passes, broadcasts ranges the way Excel's own functions do (equal shapes pair element by
 * element; a single cell, row or column stretches; anything else is an error), calls the scalar
 * core function once per case, and maps each case's DomainError to that cell's error. The loop
 * reads arguments that are single cells once, reuses one argument array, and does no other
 * allocation per case than the result rows Excel needs, so a 10,000-row column costs about what
 * 10,000 core calls cost (bench/lift.ts measures it).
 */
export type Grid = unknown[][];
export type CellValue = number | string | boolean | DomainError;

export interface ScalarOutput {
  readonly kind: "scalar";
}
export interface RowOutput {
  readonly kind: "row";
  /** Header labels with units, one per value; shown when include_header is TRUE. */
  readonly labels: readonly string[];
}

export const scalar: ScalarOutput = { kind: "scalar" };
/** k values per case, one row per case, with these header labels. */
export const row = (...labels: string[]): RowOutput => ({ kind: "row", labels });

export type ValuesOf<P extends readonly unknown[]> = {
  [K in keyof P]: P[K] extends Param<infer T> ? T : P[K] extends ListParam<infer U> ? U : never;
};

const includeHeader = flag("include_header");

/** The names of the arguments a function takes, in order: its parameters, then include_header where it has one. */
export const argumentNames = (params: readonly { readonly name: string }[], withHeader: boolean): string[] =>
  withHeader ? [...params.map((q) => q.name), includeHeader.name] : params.map((q) => q.name);

/** Excel's argument as a matrix, or null when it was omitted. */
function asMatrix(arg: unknown): Cell[][] | null {
  if (arg === undefined || arg === null) return null;
  if (Array.isArray(arg)) return Array.isArray(arg[0]) ? (arg as Cell[][]) : [arg as Cell[]];
  return [[arg]];
}

/** One cell of Excel's output: numbers must be finite, errors become cell errors. */
function toCell(v: CellValue): unknown {
  if (typeof v === "number") return Number.isFinite(v) ? v : new CustomFunctions.Error(CustomFunctions.ErrorCode.invalidNumber);
  if (v instanceof DomainError) return toCellError(v);
  return v;
}

const UNSET = Symbol("per-case");

interface Plan {
  rows: number;
  cols: number;
  /** Per parameter: the value read once (single-cell argument), or UNSET when read per case. */
  fixed: unknown[];
  mats: (Cell[][] | null)[];
  /** Per parameter: whether its rows / columns stretch (size 1). */
  rowFixed: boolean[];
  colFixed: boolean[];
  /** Which parameters set the case rows and columns (for messages). */
  rowsFrom: string;
  colsFrom: string;
  /** The body's surface when it is the same for every case (or known to be unknown: null); UNSET when it varies. */
  surface: Surface | null | typeof UNSET;
}

/**
 * Which parameters the surface check compares with which body, fixed per function: the body
 * parameter, the body_radius override if any, and the distances from the centre.
 */
interface SurfaceCheck {
  body: number;
  override: number;
  checked: number[];
}

function surfaceCheckOf(params: readonly Param[]): SurfaceCheck | null {
  const body = params.findIndex((p) => p.role === "body" && p.surface);
  const checked = params.flatMap((p, k) => (p.role === "radius" || p.role === "sma" || p.role === "position" || p.role === "state" ? [k] : []));
  if (body < 0 || checked.length === 0) return null;
  return { body, override: params.findIndex((p) => p.role === "body_radius"), checked };
}

/** One case's cell of a parameter (a row of cells for a vector parameter). */
function cellAt(prm: Param, p: Plan, k: number, i: number, j: number): Cell {
  const m = p.mats[k];
  if (m === null) return null;
  const rowCells = m[p.rowFixed[k] ? 0 : i];
  if (prm.width > 1) return p.rowFixed[k] && m.length === prm.width && m[0].length === 1 ? m.map((rw) => rw[0]) : rowCells;
  return rowCells[p.colFixed[k] ? 0 : j];
}

/** The body's surface for a case: the body_radius given, else the catalogue body's radius, else unknown. */
function surfaceFor(params: readonly Param[], check: SurfaceCheck, bodyCell: Cell, override: unknown): Surface | null {
  if (typeof override === "number" && override > 0) {
    const named = params[check.body].surface!(bodyCell);
    return { name: named ? named.name : "the body", radius: override };
  }
  return params[check.body].surface!(bodyCell) ?? null;
}

/** The surface check of one case's read values (src/functions/surface.ts). */
function belowSurface(params: readonly Param[], check: SurfaceCheck, s: Surface, values: readonly unknown[]): DomainError | undefined {
  for (const k of check.checked) {
    const v = values[k];
    const prm = params[k];
    if (typeof v === "number") {
      // A negative distance is the core's to refuse (not a slip of altitude for radius); a blank
      // optional cell inside a range arrives as 0 and means "not given".
      if (v < 0 || (v === 0 && (prm.optional || prm.role === "sma")) || v >= s.radius) continue;
      return prm.role === "sma" ? smaInside(prm.name, v, s) : radiusInside(prm.name, v, s);
    } else if (Array.isArray(v)) {
      const d = Math.hypot(v[0] as number, v[1] as number, v[2] as number);
      if (d < s.radius) return positionInside(prm.name, d, s);
    }
  }
  return undefined;
}

/** A parameter's size along one dimension that neither stretches nor matches the size set before it. */
function mismatch(name: string, size: number, set: number, setBy: string, what: string): DomainError | undefined {
  if (size === 1 || set === 1 || size === set) return undefined;
  return new DomainError("bad_argument", name, `${name}: got ${size} ${what} where ${setBy} has ${set}; expected ranges of the same size, or a single cell, row or column that stretches.`);
}

/** Broadcasts the arguments' case shapes, or says why they do not line up. */
function plan(params: readonly Param[], args: ArrayLike<unknown>, check: SurfaceCheck | null): Plan | DomainError {
  let rows = 1;
  let cols = 1;
  let rowsFrom = "";
  let colsFrom = "";
  const n = params.length;
  const p: Plan = { rows, cols, fixed: new Array(n), mats: new Array(n), rowFixed: new Array(n), colFixed: new Array(n), rowsFrom, colsFrom, surface: null };
  for (let k = 0; k < n; k++) {
    const prm = params[k];
    const m = asMatrix(args[k]);
    p.mats[k] = m;
    let r = 1;
    let c = 1;
    if (m !== null) {
      r = m.length;
      c = m[0]?.length ?? 0;
      if (r === 0 || c === 0) return badArgument(prm.name, null, "a cell or a range with at least one cell");
      if (prm.width > 1) {
        if (c === prm.width) c = 1;
        else if (c === 1 && r === prm.width) r = 1;
        else return badArgumentDescribed(prm.name, `a ${m.length}x${m[0].length} range`, `${prm.width} columns per case, one case per row`);
      }
    }
    p.rowFixed[k] = r === 1;
    p.colFixed[k] = c === 1;
    const rowsMismatch = mismatch(prm.name, r, rows, rowsFrom, "rows");
    if (rowsMismatch) return rowsMismatch;
    const colsMismatch = mismatch(prm.name, c, cols, colsFrom, "columns");
    if (colsMismatch) return colsMismatch;
    if (r !== 1 && rows === 1) {
      rows = r;
      rowsFrom = prm.name;
    }
    if (c !== 1 && cols === 1) {
      cols = c;
      colsFrom = prm.name;
    }
    p.fixed[k] = r === 1 && c === 1 ? prm.read(cellAt(prm, p, k, 0, 0)) : UNSET;
  }
  p.rows = rows;
  p.cols = cols;
  p.rowsFrom = rowsFrom;
  p.colsFrom = colsFrom;
  if (check) {
    const bodyFixed = p.fixed[check.body] !== UNSET;
    const overrideFixed = check.override < 0 || p.fixed[check.override] !== UNSET;
    p.surface = bodyFixed && overrideFixed ? surfaceFor(params, check, cellAt(params[check.body], p, check.body, 0, 0), check.override < 0 ? null : p.fixed[check.override]) : UNSET;
  }
  return p;
}

/** Reads one case's arguments into `out`; the first bad argument, or the surface check's refusal, is returned instead. */
function caseArgs(params: readonly Param[], p: Plan, check: SurfaceCheck | null, i: number, j: number, out: unknown[]): DomainError | undefined {
  for (let k = 0; k < params.length; k++) {
    let v = p.fixed[k];
    if (v === UNSET) {
      const prm = params[k];
      const m = p.mats[k] as Cell[][];
      if (prm.width === 1) {
        const c = m[p.rowFixed[k] ? 0 : i][p.colFixed[k] ? 0 : j];
        // The common case, a finite number for a number parameter, without a call.
        v = prm.plainNumber && typeof c === "number" && c - c === 0 ? c : prm.read(c);
      } else v = prm.read(m[p.rowFixed[k] ? 0 : i]);
    }
    if (v instanceof DomainError) return v;
    out[k] = v;
  }
  if (check) {
    const s = p.surface === UNSET ? surfaceFor(params, check, cellAt(params[check.body], p, check.body, i, j), check.override < 0 ? null : out[check.override]) : p.surface;
    if (s) return belowSurface(params, check, s, out);
  }
  return undefined;
}

/**
 * The common column, fast: one value per case down a single column, every argument that varies
 * a number parameter, the body (if any) the same for every case, no argument that is bad for
 * every case. The arguments
 * that stay fixed are written once; per case only the varying cells are read (a finite number
 * taken as it is, anything else through its reader), in parameter order, so the first bad
 * argument is the one reported, as on the general path. Undefined when the case does not apply.
 */
function columnOfNumbers(params: readonly Param[], p: Plan, check: SurfaceCheck | null, core: (...args: any[]) => unknown, argv: unknown[]): Grid | undefined {
  if (p.cols !== 1 || p.rows < 2 || p.surface === UNSET) return undefined;
  const surface = p.surface;
  const varying: number[] = [];
  for (let k = 0; k < params.length; k++) {
    const v = p.fixed[k];
    if (v === UNSET) {
      if (params[k].width !== 1 || !params[k].plainNumber) return undefined;
      varying.push(k);
    } else if (v instanceof DomainError) return undefined;
    else argv[k] = v;
  }
  const mats = varying.map((k) => p.mats[k] as Cell[][]);
  const n = varying.length;
  const g: Grid = new Array(p.rows);
  for (let i = 0; i < p.rows; i++) {
    let bad: DomainError | undefined;
    for (let q = 0; q < n; q++) {
      const c = mats[q][i][0];
      if (typeof c === "number" && c - c === 0) argv[varying[q]] = c;
      else {
        const v = params[varying[q]].read(c);
        if (v instanceof DomainError) {
          bad = v;
          break;
        }
        argv[varying[q]] = v;
      }
    }
    if (bad === undefined && surface !== null && check !== null) bad = belowSurface(params, check, surface, argv);
    if (bad) {
      g[i] = [toCellError(bad)];
      continue;
    }
    const r = callCore(core, argv);
    g[i] = [typeof r === "number" && r - r === 0 ? r : toCell(r as CellValue)];
  }
  return g;
}

/** Calls the core with the case's arguments; a direct call by arity avoids apply's overhead. */
function callCore(core: (...args: any[]) => unknown, a: unknown[]): unknown {
  switch (a.length) {
    case 1:
      return core(a[0]);
    case 2:
      return core(a[0], a[1]);
    case 3:
      return core(a[0], a[1], a[2]);
    case 4:
      return core(a[0], a[1], a[2], a[3]);
    case 5:
      return core(a[0], a[1], a[2], a[3], a[4]);
    case 6:
      return core(a[0], a[1], a[2], a[3], a[4], a[5]);
    default:
      return core(...a);
  }
}

function filled(rows: number, cols: number, value: unknown): Grid {
  const g: Grid = new Array(rows);
  for (let i = 0; i < rows; i++) g[i] = new Array(cols).fill(value);
  return g;
}

/**
 * More arguments than the function has parameters: only a host other than Excel can pass them
 * (Excel refuses the formula), and the message names the last parameter as every message names one.
 */
function tooMany(names: readonly string[], given: number): DomainError {
  const last = names[names.length - 1];
  return badArgumentDescribed(
    last,
    `${given - names.length} more argument${given - names.length === 1 ? "" : "s"} after it`,
    `at most ${names.length} argument${names.length === 1 ? "" : "s"} (${names.join(", ")}); a comma inside a number, as in 6,898, splits it into two arguments: type 6898`,
  );
}

/** One value per case: the output has the broadcast shape of the arguments. */
export function lift<const P extends readonly Param<any>[]>(
  out: ScalarOutput,
  params: P,
  core: (...args: ValuesOf<P>) => Result<CellValue>,
): (...args: unknown[]) => Grid;
/** k values per case: one output row per case, optional header row (last argument include_header). */
export function lift<const P extends readonly Param<any>[]>(
  out: RowOutput,
  params: P,
  core: (...args: ValuesOf<P>) => Result<readonly CellValue[]>,
): (...args: unknown[]) => Grid;
export function lift(out: ScalarOutput | RowOutput, params: readonly Param[], core: (...args: any[]) => unknown): (...args: unknown[]) => Grid {
  const run = liftArgs(out, params, core);
  return (...args: unknown[]) => run(args);
}

/** `lift` taking Excel's arguments as one array-like (a wrapper's `arguments`), without a spread per call. */
export function liftArgs(out: ScalarOutput | RowOutput, params: readonly Param[], core: (...args: any[]) => unknown): (args: ArrayLike<unknown>) => Grid {
  const n = params.length;
  const argv = new Array<unknown>(n);
  const check = surfaceCheckOf(params);
  const names = argumentNames(params, out.kind === "row");
  return function lifted(args: ArrayLike<unknown>): Grid {
    if (args.length > names.length) return [[toCellError(tooMany(names, args.length))]];
    const p = plan(params, args, check);
    if (out.kind === "scalar") {
      if (p instanceof DomainError) return [[toCellError(p)]];
      const column = columnOfNumbers(params, p, check, core, argv);
      if (column) return column;
      const g: Grid = new Array(p.rows);
      for (let i = 0; i < p.rows; i++) {
        if (p.cols === 1) {
          // A literal one-element row: the cheapest form of the row arrays Excel's result needs.
          const bad = caseArgs(params, p, check, i, 0, argv);
          g[i] = [toCell(bad ?? (callCore(core, argv) as CellValue))];
          continue;
        }
        const r = new Array(p.cols);
        for (let j = 0; j < p.cols; j++) {
          const bad = caseArgs(params, p, check, i, j, argv);
          r[j] = toCell(bad ?? (callCore(core, argv) as CellValue));
        }
        g[i] = r;
      }
      return g;
    }
    const k = out.labels.length;
    const header = includeHeader.read(asMatrix(args[n])?.[0]?.[0] ?? null);
    if (header instanceof DomainError) return [[toCellError(header)]];
    const top: Grid = header ? [out.labels.slice()] : [];
    if (p instanceof DomainError) return top.concat(filled(1, k, toCellError(p)));
    if (p.rows > 1 && p.cols > 1) {
      // Name the parameter that set the second dimension, and the one that set the first.
      const later = params.findIndex((q) => q.name === p.rowsFrom) > params.findIndex((q) => q.name === p.colsFrom) ? p.rowsFrom : p.colsFrom;
      const blame = new DomainError(
        "bad_argument",
        later,
        `${later}: got ${p.rowsFrom} as a column of ${p.rows} cases against ${p.colsFrom} as a row of ${p.cols}; expected one column or one row of cases, since each case fills a row of ${k} values (give both as columns, or as rows).`,
      );
      return top.concat(filled(1, k, toCellError(blame)));
    }
    const cases = p.rows * p.cols;
    const g: Grid = top;
    for (let c = 0; c < cases; c++) {
      const i = p.rows > 1 ? c : 0;
      const j = p.rows > 1 ? 0 : c;
      const bad = caseArgs(params, p, check, i, j, argv);
      const res = bad ?? (callCore(core, argv) as Result<readonly CellValue[]>);
      if (res instanceof DomainError) g.push(new Array(k).fill(toCellError(res)));
      else {
        const rw = new Array(k);
        for (let q = 0; q < k; q++) rw[q] = q < res.length ? toCell(res[q]) : "";
        g.push(rw);
      }
    }
    return g;
  };
}

/**
 * Whole-range functions (a burn sequence, a catalogue table, a transfer grid): list parameters
 * take their whole range, other parameters must be single cells; the core returns the rows.
 * With `labels`, the last argument include_header puts them on top.
 */
export function table<const P extends readonly (Param<any> | ListParam<any>)[]>(
  params: P,
  core: (...args: ValuesOf<P>) => Result<readonly (readonly CellValue[])[]>,
  labels?: (...args: ValuesOf<P>) => readonly string[],
): (...args: unknown[]) => Grid {
  const run = tableArgs(params, core, labels);
  return (...args: unknown[]) => run(args);
}

/** `table` taking Excel's arguments as one array-like. */
export function tableArgs<const P extends readonly (Param<any> | ListParam<any>)[]>(
  params: P,
  core: (...args: ValuesOf<P>) => Result<readonly (readonly CellValue[])[]>,
  labels?: (...args: ValuesOf<P>) => readonly string[],
): (args: ArrayLike<unknown>) => Grid {
  const n = params.length;
  const names = argumentNames(params, labels !== undefined);
  return function tabled(args: ArrayLike<unknown>): Grid {
    if (args.length > names.length) return [[toCellError(tooMany(names, args.length))]];
    const argv = new Array<unknown>(n);
    for (let k = 0; k < n; k++) {
      const prm = params[k];
      const m = asMatrix(args[k]);
      let v: unknown;
      if ("list" in prm) {
        if (m === null) v = prm.optional ? null : badArgument(prm.name, null, "a range, which is required");
        else {
          const cells = m.flat().filter((c) => c !== null && c !== undefined && c !== "");
          v = cells.length === 0 ? (prm.optional ? null : badArgument(prm.name, null, "a range with at least one value")) : prm.read(cells);
        }
      } else if (m !== null && (m.length > 1 || m[0].length > 1)) v = badArgumentDescribed(prm.name, `a ${m.length}x${m[0].length} range`, "a single cell");
      else v = prm.read(m === null ? null : m[0][0]);
      if (v instanceof DomainError) return [[toCellError(v)]];
      argv[k] = v;
    }
    const rows = core(...(argv as ValuesOf<P>));
    if (rows instanceof DomainError) return [[toCellError(rows)]];
    const width = rows.reduce((w, r) => Math.max(w, r.length), 0);
    const g: Grid = [];
    if (labels) {
      const header = includeHeader.read(asMatrix(args[n])?.[0]?.[0] ?? null);
      if (header instanceof DomainError) return [[toCellError(header)]];
      if (header) g.push(labels(...(argv as ValuesOf<P>)).slice());
    }
    for (const r of rows) {
      const out = new Array(width);
      for (let q = 0; q < width; q++) out[q] = q < r.length ? toCell(r[q]) : "";
      g.push(out);
    }
    return g.length > 0 ? g : [[""]];
  };
}
