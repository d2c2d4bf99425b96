import { ArraySize, CellError as EngineError, ErrorType, FunctionArgumentType, FunctionPlugin, HyperFormula, SimpleRangeValue, EmptyValue } from "hyperformula";
import type { ConfigParams, RawCellContent, SimpleCellAddress } from "hyperformula";
import { CellError, type FunctionMetadata, type LoadedBundle, type WorksheetFunction } from "./host";
import { NAMESPACE, typedName } from "../formula/namespace";
import { ResultSizes, type ArgInfo, type Shape } from "./sizes";

/**
 * The headless spreadsheet engine (HyperFormula) with every function of the built bundle
 * registered as ORBIT.<ID>, calling the same implementations Excel calls, with the arguments Excel
 * passes: every argument as a matrix, an omitted optional as null, a blank cell as 0 (what Excel
 * desktop passes; OfficeDev/office-js issues #1951 and #5262), an error in any argument cell
 * propagated as that error without calling the function (Excel's default for custom functions).
 * Results keep full doubles; cell errors keep their type and message.
 */

/** Engine settings that make it compute like Excel: full doubles, Excel's date serials and grid limits. */
export const ENGINE_CONFIG: Partial<ConfigParams> = {
  licenseKey: "gpl-v3",
  // No display rounding and no "nearly equal means equal" tolerance: full float64 results.
  smartRounding: false,
  precisionEpsilon: 0,
  // Serial 1 = 1900-01-01 with Excel's phantom 1900-02-29, so DATE() gives Excel's serials.
  leapYear1900: true,
  nullDate: { year: 1899, month: 12, day: 31 },
  maxRows: 1_048_576,
  maxColumns: 16_384,
  evaluateNullToZero: true,
};

const ERROR_TYPES: Record<string, ErrorType> = {
  "#VALUE!": ErrorType.VALUE,
  "#N/A": ErrorType.NA,
  "#NUM!": ErrorType.NUM,
  "#DIV/0!": ErrorType.DIV_BY_ZERO,
  "#NAME?": ErrorType.NAME,
  "#REF!": ErrorType.REF,
};

export const addressKey = (a: SimpleCellAddress): string => `${a.sheet}:${a.row}:${a.col}`;

/** A size learned from an evaluated result (or recorded in a file), for the call at a formula's root. */
export interface KnownSize extends Shape {
  readonly id: string;
}

/** Per-engine state the registered functions reach through their plugin instance. */
interface EngineContext {
  readonly sizes: ResultSizes;
  /** Sizes learned from results, by address of the formula whose root call it is. */
  readonly learned: Map<string, KnownSize>;
  /** Sizes the input recorded (an .xlsx array formula's range), used when no rule predicts one. */
  readonly hints: ReadonlyMap<string, KnownSize>;
  /** Size of each evaluated root ORBIT call's result, by address. */
  readonly spills: Map<string, Shape>;
  /** Addresses whose reserved area was smaller than the result: to be entered again. */
  readonly pending: Map<string, SimpleCellAddress>;
  onCall?: () => void;
}

let constructing: EngineContext | undefined;

/** A cell error of the bundle as an engine error; a code the engine lacks (#NULL!) leads the message, for errorCode() to find. */
function toEngineError(e: CellError): EngineError {
  const type = ERROR_TYPES[e.code];
  return type === undefined ? new EngineError(ErrorType.ERROR, `${e.code} ${e.message ?? ""}`.trim()) : new EngineError(type, e.message);
}

const LEADING_CODE = /^(#NULL!|#CALC!|#GETTING_DATA|#FIELD!|#BLOCKED!|#UNKNOWN!|#CONNECT!|#BUSY!)(?: |$)/;

/**
 * The Excel error code of an engine error and its message: the engine's own codes as they are,
 * except #ERROR! that carries a code the engine lacks (see toEngineError). The engine-only kinds
 * #ERROR! (a formula it cannot parse), #CYCLE! and #LIC! have no code in a file.
 */
export function errorCode(e: { value: string; message: string }): { code: string; message: string } {
  if (e.value === "#ERROR!") {
    const m = LEADING_CODE.exec(e.message);
    if (m) return { code: m[1], message: e.message.slice(m[0].length) };
  }
  return { code: e.value, message: e.message };
}

/** One engine value as Excel passes it inside a matrix, or the error to propagate. */
function cellArg(v: unknown): unknown {
  if (v === EmptyValue) return 0;
  if (typeof v === "object" && v !== null && "val" in v) return (v as { val: number }).val;
  return v;
}

/** An evaluated argument as the matrix Excel passes, or an engine error to return instead. */
function matrixArg(v: unknown): unknown[][] | EngineError {
  if (v instanceof EngineError) return v;
  if (v instanceof SimpleRangeValue) {
    const data = v.data as unknown[][];
    const out: unknown[][] = new Array(data.length);
    for (let i = 0; i < data.length; i++) {
      const src = data[i];
      const row = new Array(src.length);
      for (let j = 0; j < src.length; j++) {
        const c = src[j];
        if (c instanceof EngineError) return c;
        row[j] = cellArg(c);
      }
      out[i] = row;
    }
    return out;
  }
  return [[cellArg(v)]];
}

/** One returned cell as an engine value: numbers finite, errors with type and message. */
function resultCell(v: unknown): unknown {
  if (typeof v === "number") return Number.isFinite(v) ? v : new EngineError(ErrorType.NUM);
  if (v instanceof CellError) return toEngineError(v);
  // Excel shows a null inside a returned array as 0 (OfficeDev/office-js issue #1503).
  if (v === null || v === undefined) return 0;
  if (typeof v === "string" || typeof v === "boolean") return v;
  return new EngineError(ErrorType.VALUE, `unexpected result of type ${typeof v}`);
}

const literalOf = (ast: any): number | string | boolean | undefined => {
  switch (ast.type) {
    case "NUMBER":
    case "STRING":
      return ast.value;
    case "MINUS_UNARY_OP":
      return ast.value.type === "NUMBER" ? -ast.value.value : undefined;
    case "PLUS_UNARY_OP":
      return ast.value.type === "NUMBER" ? ast.value.value : undefined;
    case "PARENTHESES":
      return literalOf(ast.expression);
    case "FUNCTION_CALL":
      if (ast.args.length === 0 && (ast.procedureName === "TRUE" || ast.procedureName === "FALSE")) return ast.procedureName === "TRUE";
      return undefined;
    default:
      return undefined;
  }
};

function callMethod(meta: FunctionMetadata, fn: WorksheetFunction) {
  const id = meta.id;
  const name = typedName(id);
  const arity = meta.parameters.length;
  return function (this: OrbitPlugin, ast: any, state: any): unknown {
    const ctx = this.orbit;
    if (ctx.onCall !== undefined) ctx.onCall();
    const given = ast.args;
    const n = given.length;
    // Extra arguments go to the function too: its adaptor refuses them with #VALUE! naming its
    // parameters, as for any bad argument (Excel itself refuses such a formula when it is typed).
    const argv = new Array<unknown>(Math.max(n, arity));
    for (let k = 0; k < argv.length; k++) {
      const a = k < n ? given[k] : undefined;
      if (a === undefined || a.type === "EMPTY") {
        argv[k] = null;
        continue;
      }
      const m = matrixArg(this.evaluateAst(a, state));
      if (m instanceof EngineError) return m;
      argv[k] = m;
    }
    let out: unknown;
    try {
      out = fn(...argv);
    } catch (e) {
      return new EngineError(ErrorType.VALUE, `${name} failed: ${e instanceof Error ? e.message : String(e)}`);
    }
    if (!Array.isArray(out) || out.length === 0 || !Array.isArray(out[0])) return resultCell(out);
    const rows = out.length;
    let cols = 0;
    for (let i = 0; i < rows; i++) if ((out[i] as unknown[]).length > cols) cols = (out[i] as unknown[]).length;

    // The engine reserved an area for the result before evaluating it: at a formula's root, the
    // formula's own spill area; inside an expression, the size it predicted for this call (an
    // array formula over it was sized from that). A larger result is cut to it now and the size
    // is learned, so the formula is entered again with room.
    let keepRows = rows;
    let keepCols = cols;
    const vertex = state.formulaVertex;
    const root = vertex !== undefined && vertex.formula === ast;
    if (vertex !== undefined && (rows > 1 || cols > 1 || (root && vertex.array !== undefined))) {
      const key = addressKey(state.formulaAddress);
      let haveRows: number;
      let haveCols: number;
      if (root) {
        const array = vertex.array;
        haveRows = array ? array.size.height : 1;
        haveCols = array ? array.size.width : 1;
        ctx.spills.set(key, { rows, cols });
      } else {
        const predicted = this.arraySizeForAst(ast, state);
        haveRows = predicted.height;
        haveCols = predicted.width;
      }
      if (rows > haveRows || cols > haveCols) {
        ctx.learned.set(key, { id, rows, cols });
        ctx.pending.set(key, { ...state.formulaAddress });
        keepRows = Math.min(rows, haveRows);
        keepCols = Math.min(cols, haveCols);
      }
    }
    if (keepRows === 1 && keepCols === 1) return resultCell((out[0] as unknown[])[0] ?? "");
    const data: unknown[][] = new Array(keepRows);
    for (let i = 0; i < keepRows; i++) {
      const src = out[i] as unknown[];
      const row = new Array(keepCols);
      for (let j = 0; j < keepCols; j++) row[j] = j < src.length ? resultCell(src[j]) : "";
      data[i] = row;
    }
    return SimpleRangeValue.onlyValues(data as any);
  };
}

function sizeMethod(meta: FunctionMetadata) {
  const id = meta.id;
  const arity = meta.parameters.length;
  return function (this: OrbitPlugin, ast: any, state: any): ArraySize {
    const ctx = this.orbit;
    if (ast.args.length > arity) return ArraySize.scalar();
    const key = ctx.learned.size > 0 || ctx.hints.size > 0 ? addressKey(state.formulaAddress) : "";
    // A learned size belongs to the call at the formula's root; a nested call of the same function
    // at the same address would share it, a case that only costs another pass.
    const known = key ? ctx.learned.get(key) : undefined;
    if (known !== undefined && known.id === id) return new ArraySize(known.cols, known.rows);
    const args: ArgInfo[] = meta.parameters.map((_, k) => {
      const a = ast.args[k];
      if (a === undefined || a.type === "EMPTY") return { shape: null };
      const s = this.arraySizeForAst(a, state);
      return { shape: { rows: s.height, cols: s.width }, literal: literalOf(a) };
    });
    // An exact prediction wins; else the size the file recorded for this formula; else the guess.
    const predicted = ctx.sizes.predict(id, args);
    const hint = key ? ctx.hints.get(key) : undefined;
    const size = predicted?.exact ? predicted : hint !== undefined && hint.id === id ? hint : (predicted ?? { rows: 1, cols: 1 });
    return size.rows === 1 && size.cols === 1 ? ArraySize.scalar() : new ArraySize(size.cols, size.rows);
  };
}

/**
 * SINGLE(x), Excel's implicit intersection operator `@x` (stored in files as `_xlfn.SINGLE(x)`,
 * MS-XLSX §2.2.2): a single value stays; a reference to several cells gives the one on the
 * formula's row (a column), on its column (a row), or at both (a block the formula's row and
 * column cross), else #VALUE!; an array that is not a reference gives its top-left value.
 * Microsoft, "Implicit intersection operator: @".
 */
function singleMethod(this: FunctionPlugin, ast: any, state: any): unknown {
  if (ast.args.length !== 1 || ast.args[0].type === "EMPTY") return new EngineError(ErrorType.NA, "SINGLE takes one argument (the @ operator's operand)");
  const v = this.evaluateAst(ast.args[0], state);
  if (!(v instanceof SimpleRangeValue)) return v;
  const range = v.range;
  const data = v.data as unknown[][];
  if (range === undefined || (data.length === 1 && data[0].length === 1)) return data[0]?.[0] ?? EmptyValue;
  const at = state.formulaAddress as SimpleCellAddress;
  const rows = data.length;
  const cols = data[0].length;
  const i = rows === 1 ? 0 : at.row - range.start.row;
  const j = cols === 1 ? 0 : at.col - range.start.col;
  if (i < 0 || i >= rows || j < 0 || j >= cols) return new EngineError(ErrorType.VALUE, "the @ operator's range does not meet the formula's row or column");
  return data[i][j];
}

class OrbitPlugin extends FunctionPlugin {
  readonly orbit: EngineContext;
  constructor(interpreter: any) {
    super(interpreter);
    if (constructing === undefined) throw new Error(`${NAMESPACE} functions are available only in engines made by buildEngine()`);
    this.orbit = constructing;
  }
}

/**
 * The plugin class of a bundle, made once. It is given to each engine this module builds (the
 * engine's own plugin list), not registered globally, so other engines in the process are not
 * touched; only the function names are added to the engine's English translations.
 */
const plugins = new WeakMap<LoadedBundle, typeof OrbitPlugin>();

function orbitPlugin(bundle: LoadedBundle): typeof OrbitPlugin {
  const known = plugins.get(bundle);
  if (known) return known;
  class Plugin extends OrbitPlugin {}
  (Plugin.prototype as any).single = singleMethod;
  const implemented: Record<string, unknown> = { SINGLE: { method: "single", parameters: [{ argumentType: FunctionArgumentType.ANY }], vectorizationForbidden: true } };
  const translations: Record<string, string> = { SINGLE: "SINGLE" };
  for (const m of bundle.metadata) {
    const name = typedName(m.id);
    const call = `orbit_${m.id}`;
    const size = `orbitSize_${m.id}`;
    (Plugin.prototype as any)[call] = callMethod(m, bundle.functions.get(m.id)!);
    (Plugin.prototype as any)[size] = sizeMethod(m);
    implemented[name] = {
      method: call,
      sizeOfResultArrayMethod: size,
      parameters: m.parameters.map((p) => ({ argumentType: FunctionArgumentType.ANY, optionalArg: p.optional === true })),
      vectorizationForbidden: true,
    };
    translations[name] = name;
  }
  (Plugin as any).implementedFunctions = implemented;
  HyperFormula.getLanguage("enGB").extendFunctions(translations);
  plugins.set(bundle, Plugin);
  return Plugin;
}

export interface EngineOptions {
  /** Sizes recorded in the input for formulas whose root is an ORBIT call, by addressKey. */
  hints?: ReadonlyMap<string, KnownSize>;
  /** Workbook-level names, as the engine's named expressions ("=Sheet1!$B$2"). */
  names?: readonly { name: string; expression: string }[];
  /** Called at every ORBIT call (for progress). */
  onCall?: () => void;
  /** Largest number of times formulas are entered again to give a result its full size. */
  maxPasses?: number;
}

export interface OrbitEngine {
  readonly hf: HyperFormula;
  /** Size of each root ORBIT call's result, by addressKey. */
  readonly spills: ReadonlyMap<string, Shape>;
  /** Evaluations needed (1 when every size was predicted). */
  readonly passes: number;
  /** Formulas whose result still outgrew its area after the last pass (shown cut to the area). */
  readonly unsettled: readonly SimpleCellAddress[];
  /** Enters again the formulas whose results outgrew their areas since (after contents were changed). */
  settle(): void;
}

const WRAPPED = /^=ARRAYFORMULA\(([\s\S]*)\)$/;

/**
 * The engine's parsing error for a formula in engine form, or undefined when it parses. The
 * ARRAYFORMULA() wrapper of names.ts is taken off first, so the message points into the formula
 * as written.
 */
export function parsingError(formula: string): string | undefined {
  const inner = WRAPPED.exec(formula);
  const text = inner ? `=${inner[1]}` : formula;
  const hf = HyperFormula.buildEmpty(ENGINE_CONFIG);
  try {
    if (hf.validateFormula(text)) return undefined;
    const sheet = hf.getSheetId(hf.addSheet())!;
    hf.setCellContents({ sheet, row: 0, col: 0 }, [[text]]);
    const v = hf.getCellValue({ sheet, row: 0, col: 0 }) as { message?: string };
    return v?.message ?? "Parsing error";
  } finally {
    hf.destroy();
  }
}

/**
 * The size of the array a formula at `a` fills (1x1 when it fills one cell): the result of its
 * root ORBIT call, else the engine's own array area for it.
 */
export function filledSize(engine: OrbitEngine, a: SimpleCellAddress): Shape {
  const own = engine.spills.get(addressKey(a));
  if (own) return own;
  const vertex = engine.hf.dependencyGraph.getCell(a) as { width?: number; height?: number; array?: unknown } | undefined;
  if (vertex && vertex.array !== undefined && typeof vertex.width === "number" && typeof vertex.height === "number") return { rows: vertex.height, cols: vertex.width };
  return { rows: 1, cols: 1 };
}

/**
 * Builds an engine over `sheets` (cell contents with formulas in the engine's form, see
 * names.toEngineFormula), evaluates it, and enters again any formula whose result outgrew the
 * area reserved for it, until sizes settle.
 */
export function buildEngine(bundle: LoadedBundle, sheets: Record<string, RawCellContent[][]>, options: EngineOptions = {}): OrbitEngine {
  const functionPlugins = [...HyperFormula.getAllFunctionPlugins(), orbitPlugin(bundle)];
  const ctx: EngineContext = {
    sizes: new ResultSizes(bundle.functions, bundle.metadata, bundle.registry.specs),
    learned: new Map(),
    hints: options.hints ?? new Map(),
    spills: new Map(),
    pending: new Map(),
    onCall: options.onCall,
  };
  const config = { ...ENGINE_CONFIG, functionPlugins: functionPlugins as any };
  const build = (names: readonly { name: string; expression: string }[]) => {
    constructing = ctx;
    try {
      return HyperFormula.buildFromSheets(sheets, config, names.map((n) => ({ name: n.name, expression: n.expression })));
    } finally {
      constructing = undefined;
    }
  };
  let hf: HyperFormula;
  try {
    hf = build(options.names ?? []);
  } catch (e) {
    // A workbook name the engine cannot take (a reference into another file, say) must not stop
    // the recalculation: build without names; formulas using them then say which name is unknown.
    if (!options.names?.length) throw e;
    ctx.spills.clear();
    ctx.learned.clear();
    ctx.pending.clear();
    hf = build([]);
  }
  let passes = 1;
  const maxPasses = options.maxPasses ?? 4;
  let budget = maxPasses - 1;
  const settle = () => {
    while (ctx.pending.size > 0 && budget > 0) {
      const again = [...ctx.pending.values()];
      ctx.pending.clear();
      hf.batch(() => {
        for (const a of again) {
          const f = hf.getCellFormula(a);
          if (f !== undefined) hf.setCellContents(a, [[f]]);
        }
      });
      passes++;
      budget--;
    }
  };
  settle();
  return {
    hf,
    spills: ctx.spills,
    get passes() {
      return passes;
    },
    get unsettled() {
      return [...ctx.pending.values()];
    },
    settle,
  };
}
