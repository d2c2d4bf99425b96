import { storedName, typedName } from "../formula/namespace";
import { callArguments, formulaBody, isNameChar, orbitCallAt, rootOrbitCall, skipBracketed, skipQuoted, walkTokens } from "../formula/scan";
import { isDataRow, parseTableSpec, resolveTableSpec, ROW_MARK, tableAt, type FormulaCellRef, type Resolved, type TableIndex, type TableInfo } from "./tables";

/**
 * The formula rewrites between what Excel stores in an .xlsx file (or a user types) and what the
 * headless engine (HyperFormula 3.5) parses. The engine gets:
 *
 * - ORBIT calls in the typed form (`ORBIT.X(`), from either form (src/formula/namespace.ts);
 * - numbers with a lower-case exponent: ECMA-376 Part 1, §18.17.2.1 Constants allows `e` and `E`
 *   (exponent-part) and a leading or trailing full stop; Excel writes `E` (`3.986004418E5`), which
 *   the engine reads only as `e`;
 * - no `_xlfn.` / `_xlws.` prefixes, which Excel stores in front of functions newer than the
 *   2007 file format (MS-XLSX §2.2.2, future functions): `_xlfn.STDEV.S` is `STDEV.S`;
 * - the implicit intersection operator as a function call: Excel stores `@x` as
 *   `_xlfn.SINGLE(x)` (MS-XLSX §2.2.2); both become `SINGLE(x)`, which the engine's ORBIT plugin
 *   implements (engine.ts);
 * - TRUE and FALSE as the engine's TRUE() and FALSE();
 * - structured references to the workbook's tables as the plain ranges they stand for (tables.ts);
 * - on request, every reference without a sheet qualified with a given sheet (a formula evaluated
 *   on a sheet of its own, as `orbit-cells eval` does), and the whole formula wrapped in
 *   ARRAYFORMULA() for the dynamic-array semantics Excel gives formulas that call custom functions
 *   and array formulas (element-wise arithmetic over ranges; the engine's default is the legacy
 *   implicit intersection).
 *
 * What is written back to a file is the formula as it was read, with only the ORBIT names put in
 * the stored form (toStoredFormula).
 */

export interface FormulaContext extends FormulaCellRef {
  /** The workbook's tables, for structured references. */
  readonly tables?: TableIndex;
  /** Qualify every reference without a sheet with this sheet (quoted as needed). */
  readonly qualifyWith?: string;
  /** Give the formula dynamic-array semantics (see above). */
  readonly dynamic?: boolean;
  /** Receives a sentence for each reference that could not be resolved (it becomes #REF! or #VALUE!). */
  readonly problems?: string[];
}

const NAME_END = "(?![A-Za-z0-9_.(!\\u00C0-\\u02AF])";
const FUTURE_PREFIX = /(?:_xlfn\.|_xlws\.)+/iy;
const BOOLEAN_WORD = new RegExp(`(TRUE|FALSE)${NAME_END}`, "iy");
const NUMBER = /(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?/y;
const CELL_OR_AREA = new RegExp(`\\$?[A-Za-z]{1,3}\\$?\\d+(?::\\$?[A-Za-z]{1,3}\\$?\\d+)?${NAME_END}`, "y");
const COLUMN_AREA = new RegExp(`\\$?[A-Za-z]{1,3}:\\$?[A-Za-z]{1,3}${NAME_END}`, "y");
const ROW_AREA = new RegExp(`\\$?\\d+:\\$?\\d+${NAME_END}`, "y");
const NAME = /[A-Za-z_\\\u00C0-\u02AF][A-Za-z0-9_.\u00C0-\u02AF]*/y;
const EXTERNAL_LINK = /\[\d+\]/y;

const sticky = (re: RegExp, s: string, i: number): RegExpExecArray | null => {
  re.lastIndex = i;
  return re.exec(s);
};

/** Index just past the operand of a prefix operator at i: a parenthesised expression, or a reference, name or call. */
function operandEnd(f: string, i: number): number {
  if (f[i] === "(") return callArguments(f, i + 1).end;
  let j = i;
  while (j < f.length) {
    const c = f.charCodeAt(j);
    if (c === 39) j = skipQuoted(f, j);
    else if (isNameChar(c) || c === 36 || c === 33 || c === 58) j++; // $ ! :
    else if (c === 91) j = skipBracketed(f, j);
    else if (c === 40) return callArguments(f, j + 1).end;
    else break;
  }
  return j;
}

/** What one rewrite found: problems, and the tables whose this-row references carry ROW_MARK. */
interface Found {
  readonly problems: string[];
  readonly rowTables: TableInfo[];
  /** Write ROW_MARK for the row of this-row references (one rewrite for a whole column). */
  readonly rowMark: boolean;
}

function resolved(r: Resolved, found: Found): string {
  if ("range" in r) return r.range;
  found.problems.push(r.reason);
  return r.error;
}

/** Rewrites one formula body (no "="). */
function rewriteBody(body: string, ctx: FormulaContext, found: Found): string {
  let out = "";
  let copied = 0;
  const emit = (from: number, to: number, text: string): number => {
    out += body.slice(copied, from) + text;
    copied = to;
    return to;
  };
  const tables = ctx.tables !== undefined && ctx.tables.size > 0 ? ctx.tables : undefined;
  const brackets = body.includes("[");
  const resolve = (t: TableInfo, spec: Parameters<typeof resolveTableSpec>[1]): string => {
    const r = resolveTableSpec(t, spec, ctx, found.rowMark);
    if (found.rowMark && "range" in r && r.range.includes(ROW_MARK) && !found.rowTables.includes(t)) found.rowTables.push(t);
    return resolved(r, found);
  };
  walkTokens(body, (i) => {
    const c = body.charCodeAt(i);
    const call = orbitCallAt(body, i);
    if (call) {
      const typed = `${typedName(call.id)}(`;
      return body.startsWith(typed, i) ? call.end : emit(i, call.end, typed);
    }
    if (c === 64 /* @ */) {
      const end = operandEnd(body, i + 1);
      return emit(i, end, `SINGLE(${rewriteBody(body.slice(i + 1, end), ctx, found)})`);
    }
    if (c === 91 /* [ */) {
      if (sticky(EXTERNAL_LINK, body, i)) return undefined;
      const parsed = parseTableSpec(body, i);
      if (!parsed) return undefined;
      const t = tables ? tableAt(tables, ctx) : undefined;
      const text = t ? resolve(t, parsed.spec) : resolved({ error: "#REF!", reason: `${body.slice(i, parsed.end)}: a reference without a table name must sit inside a table` }, found);
      return emit(i, parsed.end, text);
    }
    const prev = body.charCodeAt(i - 1);
    const qualify = ctx.qualifyWith !== undefined && prev !== 33 /* ! */ && prev !== 58; /* : */
    if ((c >= 48 && c <= 57) || c === 46 || c === 36) {
      if (qualify) {
        const area = sticky(ROW_AREA, body, i) ?? (c === 36 ? (sticky(CELL_OR_AREA, body, i) ?? sticky(COLUMN_AREA, body, i)) : null);
        if (area) return emit(i, i + area[0].length, `${ctx.qualifyWith}!${area[0]}`);
      }
      if (c === 36) return undefined;
      const m = sticky(NUMBER, body, i);
      if (!m) return undefined;
      const end = i + m[0].length;
      return m[0].includes("E") ? emit(i, end, m[0].toLowerCase()) : end;
    }
    if (!isNameChar(c)) return undefined;
    if (c === 95 /* _ */) {
      const m = sticky(FUTURE_PREFIX, body, i);
      if (m) return emit(i, i + m[0].length, "");
    }
    if (c === 84 || c === 116 || c === 70 || c === 102) {
      const word = sticky(BOOLEAN_WORD, body, i);
      if (word) return emit(i, i + word[0].length, `${word[1].toUpperCase()}()`);
    }
    const name = tables !== undefined || brackets ? sticky(NAME, body, i) : null;
    if (name) {
      const after = i + name[0].length;
      const t = tables?.get(name[0].toUpperCase());
      if (body[after] === "[") {
        const parsed = parseTableSpec(body, after);
        if (parsed) {
          const text = t ? resolve(t, parsed.spec) : resolved({ error: "#REF!", reason: `${body.slice(i, parsed.end)}: the workbook has no table named ${name[0]}` }, found);
          return emit(i, parsed.end, text);
        }
      } else if (t && body[after] !== "(" && body[after] !== "!") return emit(i, after, resolve(t, { keywords: [] }));
    }
    if (qualify) {
      const area = sticky(CELL_OR_AREA, body, i) ?? sticky(COLUMN_AREA, body, i);
      if (area) return emit(i, i + area[0].length, `${ctx.qualifyWith}!${area[0]}`);
    }
    return undefined;
  });
  return out + body.slice(copied);
}

/** A rewrite that serves every cell holding the same formula text in the same setting. */
interface Template {
  readonly text: string;
  readonly problems: readonly string[];
  readonly rowTables: readonly TableInfo[];
}

/**
 * Rewrites by setting (tables; the rest of the key is in the map key). A column of a table holds
 * one formula text in every row, so it is rewritten once and its row filled in; bounded, so a
 * sheet of all-different formulas cannot grow it without limit.
 */
const templates = new WeakMap<object, Map<string, Template>>();
const NO_TABLES = {};
const TEMPLATE_LIMIT = 20_000;

function template(body: string, ctx: FormulaContext): Template {
  const byTables = templates.get(ctx.tables ?? NO_TABLES) ?? new Map<string, Template>();
  if (!templates.has(ctx.tables ?? NO_TABLES)) templates.set(ctx.tables ?? NO_TABLES, byTables);
  // A reference without a table name depends on the table holding the cell.
  const holder = ctx.tables !== undefined && body.includes("[") ? (tableAt(ctx.tables, ctx)?.name ?? "") : "";
  const key = `${ctx.dynamic ? 1 : 0}\u0000${ctx.qualifyWith ?? ""}\u0000${ctx.sheet ?? ""}\u0000${ctx.row === undefined ? 0 : 1}\u0000${holder}\u0000${body}`;
  let t = byTables.get(key);
  if (t === undefined) {
    const found: Found = { problems: [], rowTables: [], rowMark: ctx.row !== undefined };
    const rewritten = rewriteBody(body, ctx, found);
    const text = ctx.dynamic && rootOrbitCall(body) === undefined ? `=ARRAYFORMULA(${rewritten})` : `=${rewritten}`;
    t = { text, problems: found.problems, rowTables: found.rowTables };
    if (byTables.size >= TEMPLATE_LIMIT) byTables.clear();
    byTables.set(key, t);
  }
  return t;
}

/**
 * The formula as the engine parses it (see above). Accepts a formula with or without the leading
 * "=" and returns it with one.
 */
export function toEngineFormula(formula: string, ctx: FormulaContext = {}): string {
  const body = formulaBody(formula);
  const t = template(body, ctx);
  if (t.rowTables.length === 0) {
    ctx.problems?.push(...t.problems);
    return t.text;
  }
  const row = ctx.row!;
  if (t.rowTables.every((table) => isDataRow(table, row))) {
    ctx.problems?.push(...t.problems);
    return t.text.split(ROW_MARK).join(String(row + 1));
  }
  // A this-row reference off its table's data rows: rewrite this cell on its own, which says why.
  const found: Found = { problems: [], rowTables: [], rowMark: false };
  const rewritten = rewriteBody(body, ctx, found);
  ctx.problems?.push(...found.problems);
  return ctx.dynamic && rootOrbitCall(body) === undefined ? `=ARRAYFORMULA(${rewritten})` : `=${rewritten}`;
}

/**
 * The formula as it is written into an .xlsx file (without "="): ORBIT calls in the stored form
 * Excel itself writes, so the add-in binds them when the file is opened. Everything else is kept
 * as the file had it.
 */
export function toStoredFormula(formula: string): string {
  const body = formulaBody(formula);
  let out = "";
  let copied = 0;
  walkTokens(body, (i) => {
    const call = orbitCallAt(body, i);
    if (!call) return undefined;
    out += `${body.slice(copied, i)}${storedName(call.id)}(`;
    copied = call.end;
    return call.end;
  });
  return out + body.slice(copied);
}
