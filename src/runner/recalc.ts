import { DetailedCellError, type CellValue, type RawCellContent, type SimpleCellAddress, type SimpleCellRange } from "hyperformula";
import { cellAddress, parseCell } from "../formula/cells";
import { NAMESPACE } from "../formula/namespace";
import { callsOrbit, orbitCalls, rootOrbitCall } from "../formula/scan";
import { addressKey, buildEngine, errorCode, filledSize, parsingError, type KnownSize, type OrbitEngine } from "./engine";
import type { LoadedBundle } from "./host";
import { checkWritable, engineContent, readWorkbook, WorkbookError, writeWorkbook, type FormulaCell, type FormulaResult, type OutValue, type WorkbookData } from "./workbook";

/** One cell worth reporting: where, which error, and the message the function gave. */
export interface CellIssue {
  readonly sheet: string;
  readonly cell: string;
  readonly code: string;
  readonly message: string;
}

export interface RecalcReport {
  readonly file: string;
  readonly sheets: number;
  /** Formula cells in the workbook. */
  readonly formulas: number;
  /** Formula cells that call ORBIT functions. */
  readonly orbitFormulas: number;
  /** Cells given a new value: formula cells plus the cells their spilled results fill. */
  readonly cellsRecalculated: number;
  /** Error cells of ORBIT formulas (their own cells and spilled cells). */
  readonly orbitErrors: CellIssue[];
  /** Error cells of other formulas (often an ORBIT error carried along). */
  readonly otherErrors: CellIssue[];
  /**
   * Formulas the runner cannot compute (a function or name it does not have, syntax it does not
   * read, a circular reference): their saved results are kept, and the cells that use them are
   * computed from those saved results.
   */
  readonly kept: CellIssue[];
  /** How many of the kept formulas call ORBIT functions. */
  readonly keptOrbitFormulas: number;
  /** Formula cells computed from a kept saved result (directly or through other cells): Excel must recalculate these too. */
  readonly dependOnKept: { readonly sheet: string; readonly cell: string }[];
  /** Evaluations needed to give every spilled result its size (1 when all were predicted). */
  readonly passes: number;
  readonly seconds: number;
}

export type Phase = "reading" | "calculating" | "writing";
export type Progress = (phase: Phase, done: number, total: number) => void;

/**
 * Why the runner cannot compute the formula at `a`, whose value is `v`, or undefined when it can:
 * the engine cannot parse the formula itself, the formula itself names a function or name the
 * engine lacks (other than an ORBIT function, whose absence is the answer Excel gives too), or it
 * is part of a circular reference (the runner does not iterate). An error that only comes from a
 * cell the formula reads is not the formula's own.
 */
function cannotCompute(hf: OrbitEngine["hf"], a: SimpleCellAddress, v: CellValue): string | undefined {
  if (!(v instanceof DetailedCellError)) return undefined;
  if (v.type === "CYCLE") return onCycle(hf, a) ? "circular reference: the runner does not iterate" : undefined;
  const own = hf.getCellFormula(a);
  if (own === undefined) return undefined;
  if (v.type === "ERROR" && /^Parsing error/.test(v.message)) {
    const error = parsingError(own);
    return error === undefined ? undefined : `the runner cannot read this formula (${parseProblem(error)})`;
  }
  const unknown = v.type === "NAME" ? /^(?:Function name|Named expression) (.+) not recognized/.exec(v.message) : null;
  if (!unknown || unknown[1].toUpperCase().startsWith(`${NAMESPACE}.`)) return undefined;
  const name = unknown[1].replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
  return new RegExp(`(?<![A-Za-z0-9_.])${name}(?![A-Za-z0-9_])`, "i").test(own) ? v.message.replace(/\.$/, "") : undefined;
}

/** Whether the cell at `a` is part of a circular reference (not only downstream of one): it reaches itself through its dependents. */
function onCycle(hf: OrbitEngine["hf"], a: SimpleCellAddress): boolean {
  const start = addressKey(a);
  const seen = new Set<string>();
  const queue: (SimpleCellAddress | SimpleCellRange)[] = [a];
  while (queue.length > 0 && seen.size < 100_000) {
    for (const d of hf.getCellDependents(queue.pop()!)) {
      const key = "start" in d ? `${addressKey(d.start)}-${addressKey(d.end)}` : addressKey(d);
      if (key === start) return true;
      if (seen.has(key)) continue;
      seen.add(key);
      queue.push(d);
    }
  }
  return false;
}

/** The engine's parsing error in a few words: where it stopped reading. */
export function parseProblem(message: string): string {
  const found = /but found: '?([^']*)'?\s*$/.exec(message) ?? /but found --> '?(.*?)'? <--/.exec(message) ?? /found: (\S+)/.exec(message);
  if (found) return found[1] === "" ? "it ends too early" : `it stops at "${found[1]}"`;
  const char = /unexpected character: ->(.)<-/.exec(message);
  if (char) return `it does not know the character "${char[1]}"`;
  return message.replace(/\s+/g, " ").trim();
}

/**
 * An engine value as written into the file. Every error keeps its own code (#SPILL!, #NULL! and
 * Excel's other codes included); undefined for the engine-only kinds (#ERROR!, #CYCLE!, #LIC!),
 * which no Excel cell holds: the formula's saved result stays.
 */
export function outValue(v: CellValue): OutValue | undefined {
  if (v instanceof DetailedCellError) {
    const { code } = errorCode(v);
    return code === "#ERROR!" || code === "#CYCLE!" || code === "#LIC!" ? undefined : { error: code };
  }
  if (v === null || v === undefined) return null;
  return v as number | string | boolean;
}

export interface Recalculated {
  readonly data: WorkbookData;
  readonly engine: OrbitEngine;
  readonly report: RecalcReport;
  /** Per sheet, per formula cell (as in data.sheets[s].formulas). */
  readonly results: (FormulaResult | undefined)[][];
  /** The recalculated value of a cell, e.g. value("Budget", "C7"). */
  value(sheet: string, cell: string): CellValue;
}

/** A sheet added to the workbook for the run only (the formula `orbit-cells eval` evaluates). */
export interface ExtraSheet {
  readonly name: string;
  readonly grid: RawCellContent[][];
}

/** Recalculates a workbook already read, through the engine. */
export function recalcData(bundle: LoadedBundle, data: WorkbookData, onProgress?: Progress, extra?: ExtraSheet): Recalculated {
  const started = performance.now();
  const hints = new Map<string, KnownSize>();
  let expectedCalls = 0;
  data.sheets.forEach((sheet, s) => {
    for (const f of sheet.formulas) {
      expectedCalls += orbitCalls(f.formula).length;
      const id = rootOrbitCall(f.formula);
      if (id && f.arrayRows && f.arrayCols) hints.set(addressKey({ sheet: s, row: f.row, col: f.col }), { id, rows: f.arrayRows, cols: f.arrayCols });
    }
  });
  let calls = 0;
  const onCall = onProgress
    ? () => {
        calls++;
        if ((calls & 255) === 0) onProgress("calculating", Math.min(calls, expectedCalls), expectedCalls);
      }
    : undefined;
  const sheets: Record<string, RawCellContent[][]> = {};
  for (const sh of data.sheets) sheets[sh.name] = sh.grid;
  if (extra) sheets[extra.name] = extra.grid;
  const engine = buildEngine(bundle, sheets, { hints, names: data.names, onCall });
  onProgress?.("calculating", expectedCalls, expectedCalls);
  const hf = engine.hf;

  // Formulas the runner cannot compute keep their saved results, and the engine computes the
  // cells that use them from those results, as Excel shows the file until it recalculates.
  const kept = new Map<string, { f: FormulaCell; code: string; reason: string }>();
  data.sheets.forEach((sheet) => {
    const sheetId = hf.getSheetId(sheet.name)!;
    for (const f of sheet.formulas) {
      const a = { sheet: sheetId, row: f.row, col: f.col };
      const v = hf.getCellValue(a);
      const reason = cannotCompute(hf, a, v);
      if (reason) kept.set(addressKey(a), { f, code: (v as DetailedCellError).value, reason });
    }
  });
  const dependOnKept: { sheet: string; cell: string }[] = [];
  if (kept.size > 0) {
    const keptAt: SimpleCellAddress[] = [];
    hf.batch(() => {
      for (const [key, { f }] of kept) {
        const sheet = Number(key.split(":")[0]);
        const area = f.cachedArea ?? [[f.cached]];
        hf.setCellContents({ sheet, row: f.row, col: f.col }, area.map((r) => r.map(engineContent)));
        keptAt.push({ sheet, row: f.row, col: f.col });
      }
    });
    engine.settle();
    // Every formula cell downstream of a kept one (through cells and ranges), for the report.
    const seen = new Set<string>(kept.keys());
    const queue: (SimpleCellAddress | SimpleCellRange)[] = [...keptAt];
    while (queue.length > 0) {
      for (const d of hf.getCellDependents(queue.pop()!)) {
        const key = "start" in d ? `${addressKey(d.start)}-${addressKey(d.end)}` : addressKey(d);
        if (seen.has(key)) continue;
        seen.add(key);
        if ("start" in d) queue.push(d);
        else if (hf.doesCellHaveFormula(d)) {
          const sheetName = hf.getSheetName(d.sheet);
          if (sheetName !== undefined && sheetName !== extra?.name) dependOnKept.push({ sheet: sheetName, cell: cellAddress(d.row, d.col) });
          queue.push(d);
        }
      }
    }
  }

  const orbitErrors: CellIssue[] = [];
  const otherErrors: CellIssue[] = [];
  const keptIssues: CellIssue[] = [];
  let orbitFormulas = 0;
  let keptOrbitFormulas = 0;
  let formulas = 0;
  let cellsRecalculated = 0;
  const results = data.sheets.map((sheet) => {
    const sheetId = hf.getSheetId(sheet.name)!;
    return sheet.formulas.map((f): FormulaResult | undefined => {
      formulas++;
      const isOrbit = callsOrbit(f.formula);
      if (isOrbit) orbitFormulas++;
      const a = { sheet: sheetId, row: f.row, col: f.col };
      const issue = (code: string, message: string, row = f.row, col = f.col): CellIssue => ({ sheet: sheet.name, cell: cellAddress(row, col), code, message });
      const keep = kept.get(addressKey(a));
      if (keep) {
        keptIssues.push(issue(keep.code, keep.reason));
        if (isOrbit) keptOrbitFormulas++;
        return undefined;
      }
      const v = hf.getCellValue(a);
      const size = filledSize(engine, a);
      const grid =
        size.rows * size.cols > 1
          ? hf.getRangeValues({ start: a, end: { sheet: sheetId, row: f.row + size.rows - 1, col: f.col + size.cols - 1 } })
          : [[v]];
      cellsRecalculated += size.rows * size.cols;
      grid.forEach((r, i) =>
        r.forEach((c, j) => {
          if (!(c instanceof DetailedCellError)) return;
          const e = errorCode(c);
          // A reference the runner could not resolve says why, where the engine has no message.
          const message = e.message || (i === 0 && j === 0 && f.problems.length > 0 ? f.problems.join("; ") : "");
          (isOrbit ? orbitErrors : otherErrors).push(issue(e.code, message, f.row + i, f.col + j));
        }),
      );
      const out = grid.map((r) => r.map((c) => outValue(c) ?? null));
      return { value: out[0][0], spill: size.rows * size.cols > 1 ? out : undefined };
    });
  });
  for (const a of engine.unsettled) {
    const sheet = data.sheets[a.sheet];
    if (sheet) orbitErrors.push({ sheet: sheet.name, cell: cellAddress(a.row, a.col), code: "#SPILL!", message: `the result kept changing size over ${engine.passes} passes; it is cut to the last size` });
  }
  const report: RecalcReport = {
    file: data.path,
    sheets: data.sheets.length,
    formulas,
    orbitFormulas,
    cellsRecalculated,
    orbitErrors,
    otherErrors,
    kept: keptIssues,
    keptOrbitFormulas,
    dependOnKept,
    passes: engine.passes,
    seconds: (performance.now() - started) / 1000,
  };
  return {
    data,
    engine,
    report,
    results,
    value(sheetName: string, cell: string): CellValue {
      const sheet = hf.getSheetId(sheetName);
      if (sheet === undefined) throw new Error(`no sheet named ${sheetName}`);
      const at = parseCell(cell);
      if (!at) throw new Error(`not a cell address: ${cell}`);
      return hf.getCellValue({ sheet, ...at });
    },
  };
}

export interface RecalcOptions {
  /** Where to write the recalculated workbook; nothing is written when omitted. */
  outPath?: string;
  onProgress?: Progress;
  /** Refuse (WorkbookError) a workbook without a single formula, before anything is written. */
  requireFormulas?: boolean;
}

/** Reads, recalculates and (with outPath) writes a workbook. Throws WorkbookError for an unreadable file or an unwritable outPath. */
export async function recalcFile(bundle: LoadedBundle, inPath: string, options: RecalcOptions = {}): Promise<Recalculated> {
  const started = performance.now();
  if (options.outPath) checkWritable(options.outPath);
  options.onProgress?.("reading", 0, 1);
  const data = await readWorkbook(inPath);
  options.onProgress?.("reading", 1, 1);
  if (options.requireFormulas && data.sheets.every((s) => s.formulas.length === 0)) throw new WorkbookError(`${inPath} has no formulas: nothing to recalculate.`);
  const done = recalcData(bundle, data, options.onProgress);
  if (options.outPath) {
    options.onProgress?.("writing", 0, 1);
    await writeWorkbook(data, done.results, options.outPath, { recalcOnOpen: done.report.kept.length > 0 });
    options.onProgress?.("writing", 1, 1);
  }
  return { ...done, report: { ...done.report, seconds: (performance.now() - started) / 1000 } };
}
