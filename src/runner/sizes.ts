import type { FunctionSpec, Shape, SizeView } from "../functions/registry";
import type { FunctionMetadata, WorksheetFunction } from "./host";

/**
 * How many cells an ORBIT call fills, known before it is evaluated: a headless engine reserves a
 * spill area when it parses a formula, where Excel sizes the spill after the call returns. The
 * rules, all in this file:
 *
 * - Functions lifted case by case (the adaptor's `lift`): the shape the function itself gives for
 *   the arguments' shapes. The function is called once with matrices of nulls of those shapes
 *   (every case then fails its own argument check, which costs no core work), so broadcasting
 *   (equal shapes pair, a single cell, row or column stretches), k values per case as one row per
 *   case, vector arguments of several cells per case, and shape errors all come out exactly as the
 *   adaptor makes them: the runner keeps no second copy of those rules. include_header counts when
 *   it is written as a literal. Shapes repeat down a column of formulas, so results are cached by
 *   shape.
 * - Whole-range functions (the adaptor's `table`): their size follows argument values (how many
 *   burns, bodies, fields, dates), so each declares its own rule beside its JSDoc (the `size` of its
 *   declaration in src/functions, which the runner reads from the bundle's registry), from literal
 *   arguments and range sizes. A count read from a referenced cell (a list of names may sit in one cell) or a header
 *   flag given by reference is a guess, and the prediction says so (`exact: false`); the engine
 *   then prefers the size the file recorded for the formula, if any.
 *
 * Where a prediction is missing or wrong, the engine learns the size from the evaluated result and
 * re-enters the formula (engine.ts), so a wrong guess costs time, never a wrong answer.
 */
export type { Shape };

/** A predicted size; `exact` is false when it rests on a guess (a list in a referenced cell, a header flag by reference). */
export interface Prediction extends Shape {
  readonly exact: boolean;
}

/** What the engine knows of one argument before evaluation. */
export interface ArgInfo {
  /** Rows and columns of the argument; null when it is omitted. */
  readonly shape: Shape | null;
  /** Its value when written in the formula as a literal number, text or TRUE/FALSE. */
  readonly literal?: number | string | boolean;
}

/** Reads arguments by parameter name for the whole-range rules, noting when a reading is a guess. */
class ArgView implements SizeView {
  guessed = false;

  constructor(
    private readonly meta: FunctionMetadata,
    private readonly args: readonly ArgInfo[],
    readonly defaults: () => Shape | undefined,
  ) {}

  private at(name: string): ArgInfo | undefined {
    const k = this.meta.parameters.findIndex((p) => p.name === name);
    return k < 0 ? undefined : this.args[k];
  }

  omitted(name: string): boolean {
    const a = this.at(name);
    return a === undefined || a.shape === null;
  }

  /** How many names a list argument carries: comma-separated words of a literal text, else (a guess) one per cell. */
  names(name: string): number | undefined {
    const a = this.at(name);
    if (a === undefined || a.shape === null) return undefined;
    if (typeof a.literal === "string") return a.literal.split(",").filter((s) => s.trim() !== "").length;
    if (a.literal === undefined) this.guessed = true;
    return a.shape.rows * a.shape.cols;
  }

  /** How many cells an argument has (a blank cell arrives as 0, so it still counts). */
  cells(name: string): number | undefined {
    const a = this.at(name);
    return a === undefined || a.shape === null ? undefined : a.shape.rows * a.shape.cols;
  }

  /** A whole number written as a literal. */
  integer(name: string): number | undefined {
    const v = this.at(name)?.literal;
    return typeof v === "number" && Number.isInteger(v) && v > 0 ? v : undefined;
  }

  /** include_header: false when omitted, its literal value; when it is a reference, guessed false. */
  header(): boolean {
    const a = this.at("include_header");
    if (a === undefined || a.shape === null) return false;
    const v = a.literal;
    if (typeof v === "boolean") return v;
    if (v === 0 || v === 1) return v === 1;
    this.guessed = true;
    return false;
  }
}

export class ResultSizes {
  private readonly cache = new Map<string, Shape | undefined>();
  private readonly defaults = new Map<string, Shape | undefined>();
  private readonly meta: Map<string, FunctionMetadata>;

  constructor(
    private readonly functions: ReadonlyMap<string, WorksheetFunction>,
    metadata: readonly FunctionMetadata[],
    private readonly specs: ReadonlyMap<string, FunctionSpec>,
  ) {
    this.meta = new Map(metadata.map((m) => [m.id, m]));
  }

  /** The predicted size of a call of `id` with these arguments; undefined when nothing can be said before evaluation. */
  predict(id: string, args: readonly ArgInfo[]): Prediction | undefined {
    const meta = this.meta.get(id);
    const fn = this.functions.get(id);
    if (meta === undefined || fn === undefined) return undefined;
    const rule = this.specs.get(id)?.size;
    if (rule) {
      const view = new ArgView(meta, args, () => this.defaultSize(id, meta, fn));
      const s = rule(view);
      return s && { ...s, exact: !view.guessed };
    }
    return this.liftedSize(id, meta, fn, args);
  }

  private liftedSize(id: string, meta: FunctionMetadata, fn: WorksheetFunction, args: readonly ArgInfo[]): Prediction | undefined {
    let exact = true;
    let key = id;
    const params = meta.parameters;
    for (let k = 0; k < params.length; k++) {
      const a = args[k];
      if (a === undefined || a.shape === null) key += "|-";
      else if (params[k].name === "include_header") {
        const v = headerLiteral(a);
        if (v === null) exact = false;
        key += `|h${String(v)}`;
      } else key += `|${a.shape.rows}x${a.shape.cols}`;
    }
    let size = this.cache.get(key);
    if (size === undefined && !this.cache.has(key)) {
      const probe = params.map((p, k) => {
        const a = args[k];
        if (a === undefined || a.shape === null) return null;
        return p.name === "include_header" ? [[headerLiteral(a)]] : blank(a.shape);
      });
      size = shapeOf(call(fn, probe));
      this.cache.set(key, size);
    }
    return size && { rows: size.rows, cols: size.cols, exact };
  }

  /** The size a whole-range function gives with every argument omitted (its defaults). */
  private defaultSize(id: string, meta: FunctionMetadata, fn: WorksheetFunction): Shape | undefined {
    if (!this.defaults.has(id)) this.defaults.set(id, shapeOf(call(fn, meta.parameters.map(() => null))));
    return this.defaults.get(id);
  }
}

const headerLiteral = (a: ArgInfo): boolean | number | null => (typeof a.literal === "boolean" || typeof a.literal === "number" ? a.literal : null);

function blank(s: Shape): null[][] {
  const m: null[][] = new Array(s.rows);
  for (let i = 0; i < s.rows; i++) m[i] = new Array<null>(s.cols).fill(null);
  return m;
}

function call(fn: WorksheetFunction, args: unknown[]): unknown {
  try {
    return fn(...args);
  } catch {
    return undefined;
  }
}

/** Rows and columns of a returned matrix (the widest row counts). */
export function shapeOf(out: unknown): Shape | undefined {
  if (!Array.isArray(out) || out.length === 0) return undefined;
  let cols = 0;
  for (const r of out) cols = Math.max(cols, Array.isArray(r) ? r.length : 1);
  return cols === 0 ? undefined : { rows: out.length, cols };
}
