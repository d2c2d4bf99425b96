import { DetailedCellError, type CellValue, type SimpleCellAddress } from "hyperformula";
import type { LoadedBundle } from "./host";
import { addressKey, buildEngine, type KnownSize, type OrbitEngine } from "./engine";
import { orbitCalls, rootOrbitCall } from "./names";
import type { Shape } from "./sizes";
import { cellName, readWorkbook, WorkbookError, writeWorkbook, type FormulaResult, type OutValue, type WorkbookData } from "./workbook";

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
  /** Formulas the runner cannot compute (a function or name it does not have, syntax it does not read): their saved results are kept. */
  readonly kept: CellIssue[];
  /** Evaluations needed to give every spilled result its size (1 when all were predicted). */
  readonly passes: number;
  readonly seconds: number;
}

export type Phase = "reading" | "calculating" | "writing";
export type Progress = (phase: Phase, done: number, total: number) => void;

/** The file's cached results keep their place in these cases: the runner could not compute the formula. */
function cannotCompute(v: CellValue): boolean {
  return v instanceof DetailedCellError && ((v.type === "NAME" && /not recognized/.test(v.message)) || (v.type === "ERROR" && /^Parsing error/.test(v.message)));
}

const CLASSIC_CODES = new Set(["#NULL!", "#DIV/0!", "#VALUE!", "#REF!", "#NAME?", "#NUM!", "#N/A"]);

/** An engine value as written into the file; engine-only error kinds (#SPILL!, #CYCLE!, #ERROR!) are cached as #N/A. */
export function outValue(v: CellValue): OutValue {
  if (v instanceof DetailedCellError) return { error: CLASSIC_CODES.has(v.value) ? v.value : "#N/A" };
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

/** The engine's size of the array a formula fills (1x1 when it fills one cell). */
function filledSize(engine: OrbitEngine, a: SimpleCellAddress): Shape {
  const own = engine.spills.get(addressKey(a));
  if (own) return own;
  const vertex = engine.hf.dependencyGraph.getCell(a) as { width?: number; height?: number; array?: unknown } | undefined;
  if (vertex && vertex.array !== undefined && typeof vertex.width === "number" && typeof vertex.height === "number") return { rows: vertex.height, cols: vertex.width };
  return { rows: 1, cols: 1 };
}

function parseCell(cell: string): { row: number; col: number } {
  const m = /^\$?([A-Za-z]{1,3})\$?(\d+)$/.exec(cell);
  if (!m) throw new Error(`not a cell address: ${cell}`);
  let col = 0;
  for (const ch of m[1].toUpperCase()) col = col * 26 + ch.charCodeAt(0) - 64;
  return { row: Number(m[2]) - 1, col: col - 1 };
}

/** Recalculates a workbook already read, through the engine. */
export function recalcData(bundle: LoadedBundle, data: WorkbookData, onProgress?: Progress): Recalculated {
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
  const sheets: Record<string, (typeof data.sheets)[number]["grid"]> = {};
  for (const sh of data.sheets) sheets[sh.name] = sh.grid;
  const engine = buildEngine(bundle, sheets, { hints, names: data.names, onCall });
  onProgress?.("calculating", expectedCalls, expectedCalls);
  const hf = engine.hf;

  const orbitErrors: CellIssue[] = [];
  const otherErrors: CellIssue[] = [];
  const kept: CellIssue[] = [];
  let orbitFormulas = 0;
  let formulas = 0;
  let cellsRecalculated = 0;
  const results = data.sheets.map((sheet) => {
    const sheetId = hf.getSheetId(sheet.name)!;
    return sheet.formulas.map((f): FormulaResult | undefined => {
      formulas++;
      const isOrbit = orbitCalls(f.formula).length > 0;
      if (isOrbit) orbitFormulas++;
      const a = { sheet: sheetId, row: f.row, col: f.col };
      const v = hf.getCellValue(a);
      const issue = (code: string, message: string, row = f.row, col = f.col): CellIssue => ({ sheet: sheet.name, cell: cellName(row, col), code, message });
      if (cannotCompute(v) && !isOrbit) {
        kept.push(issue((v as DetailedCellError).value, (v as DetailedCellError).message));
        return undefined;
      }
      const size = filledSize(engine, a);
      const grid =
        size.rows * size.cols > 1
          ? hf.getRangeValues({ start: a, end: { sheet: sheetId, row: f.row + size.rows - 1, col: f.col + size.cols - 1 } })
          : [[v]];
      cellsRecalculated += size.rows * size.cols;
      grid.forEach((r, i) =>
        r.forEach((c, j) => {
          if (c instanceof DetailedCellError) (isOrbit ? orbitErrors : otherErrors).push(issue(c.value, c.message, f.row + i, f.col + j));
        }),
      );
      const out = grid.map((r) => r.map(outValue));
      return { value: out[0][0], spill: size.rows * size.cols > 1 ? out : undefined };
    });
  });
  for (const a of engine.unsettled) {
    const sheet = data.sheets[a.sheet];
    if (sheet) orbitErrors.push({ sheet: sheet.name, cell: cellName(a.row, a.col), code: "#SPILL!", message: `the result kept changing size over ${engine.passes} passes; it is cut to the last size` });
  }
  const report: RecalcReport = {
    file: data.path,
    sheets: data.sheets.length,
    formulas,
    orbitFormulas,
    cellsRecalculated,
    orbitErrors,
    otherErrors,
    kept,
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
      return hf.getCellValue({ sheet, ...parseCell(cell) });
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

/** Reads, recalculates and (with outPath) writes a workbook. Throws WorkbookError for an unreadable file. */
export async function recalcFile(bundle: LoadedBundle, inPath: string, options: RecalcOptions = {}): Promise<Recalculated> {
  const started = performance.now();
  options.onProgress?.("reading", 0, 1);
  const data = await readWorkbook(inPath);
  options.onProgress?.("reading", 1, 1);
  if (options.requireFormulas && data.sheets.every((s) => s.formulas.length === 0)) throw new WorkbookError(`${inPath} has no formulas: nothing to recalculate.`);
  const done = recalcData(bundle, data, options.onProgress);
  if (options.outPath) {
    options.onProgress?.("writing", 0, 1);
    await writeWorkbook(data, done.results, options.outPath);
    options.onProgress?.("writing", 1, 1);
  }
  return { ...done, report: { ...done.report, seconds: (performance.now() - started) / 1000 } };
}
