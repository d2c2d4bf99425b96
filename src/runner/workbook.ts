import { accessSync, closeSync, constants, existsSync, openSync, readFileSync, readSync, statSync, writeFileSync } from "node:fs";
import { dirname, resolve } from "node:path";
import type ExcelJS from "exceljs";
import type { RawCellContent } from "hyperformula";
import { cellAddress, parseBlock } from "../formula/cells";
import { callsOrbit } from "../formula/scan";
import { markDynamicArrays } from "./dynamicarrays";
import { toEngineFormula, toStoredFormula } from "./names";
import { dynamicArrayCells, sheetParts, xmlParts } from "./package";
import { readTables, restoreTables, tableIndex, type TableInfo } from "./tables";
import { readZip, writeZip } from "./zip";

/**
 * .xlsx in and out (exceljs). Reading gives, per sheet, the grid the engine takes (values, and
 * formulas rewritten to the engine's form) and the formula cells with what the file had cached.
 * Writing puts each formula back in the stored form Excel writes (names.ts) with its new cached
 * result, and a spilled result as an array formula over the cells it fills, so the file opens with
 * numbers where the add-in is absent and recalculates where it is present.
 */

/** A problem with the input file itself, reported to the user in one sentence. */
export class WorkbookError extends Error {}

export interface FormulaCell {
  readonly row: number; // 0-based
  readonly col: number; // 0-based
  /** As the file has it, without "=". */
  readonly formula: string;
  /** The result the file had cached (null when none). */
  readonly cached: OutValue;
  /** Stored as an array formula (t="array": dynamic, or entered as a legacy array formula). */
  readonly array: boolean;
  /** Stored as a dynamic array formula (an array formula with cell metadata, as Excel 365 writes one). */
  readonly dynamic: boolean;
  /** The range of an array formula anchored here, as recorded in the file (rows x cols). */
  readonly arrayRows?: number;
  readonly arrayCols?: number;
  /** The cached values of that range, as the file had them (for a formula the runner keeps as saved). */
  readonly cachedArea?: OutValue[][];
  /** References in the formula that could not be resolved (structured references to missing tables or columns). */
  readonly problems: readonly string[];
}

export interface SheetData {
  readonly name: string;
  /** Cell contents for the engine: numbers, text, booleans, null, formulas in engine form. */
  readonly grid: RawCellContent[][];
  readonly formulas: FormulaCell[];
}

export interface WorkbookData {
  readonly path: string;
  /** The workbook as exceljs read it (absent for a workbook made in memory, as eval makes one). */
  readonly book?: ExcelJS.Workbook;
  readonly sheets: SheetData[];
  readonly names: { name: string; expression: string }[];
  /** The workbook's tables (for structured references). */
  readonly tables: readonly TableInfo[];
}

const ZIP_MAGIC = [0x50, 0x4b, 0x03, 0x04];
const OLE_MAGIC = [0xd0, 0xcf, 0x11, 0xe0];

function leadingBytes(path: string, n: number): number[] {
  const fd = openSync(path, "r");
  try {
    const buf = Buffer.alloc(n);
    const got = readSync(fd, buf, 0, n, 0);
    return [...buf.subarray(0, got)];
  } finally {
    closeSync(fd);
  }
}

const startsWith = (bytes: number[], magic: number[]): boolean => magic.every((b, i) => bytes[i] === b);

/** Checks that `path` is a readable .xlsx package before handing it to the reader, with a plain message when not. */
function checkWorkbookFile(path: string): void {
  if (!existsSync(path)) throw new WorkbookError(`${path}: no such file.`);
  if (statSync(path).isDirectory()) throw new WorkbookError(`${path} is a folder, not a workbook file.`);
  const head = leadingBytes(path, 4);
  if (startsWith(head, OLE_MAGIC)) throw new WorkbookError(`${path} is an old binary Excel file (.xls); save it as an .xlsx workbook first.`);
  if (!startsWith(head, ZIP_MAGIC)) throw new WorkbookError(`${path} is not an .xlsx workbook (an .xlsx file is a zip package; this file is not).`);
}

/** Excel serial of a date read by exceljs (which reads date-formatted numbers as UTC dates). */
const toSerial = (d: Date, date1904: boolean): number => d.getTime() / 86_400_000 + (date1904 ? 24107 : 25569);

/** A cell's value (or a formula's cached result) as the file holds it: dates as Excel serials, rich text as its text. */
function fileValue(v: unknown, date1904: boolean): OutValue {
  if (v === null || v === undefined) return null;
  if (typeof v === "number" || typeof v === "boolean" || typeof v === "string") return v;
  if (v instanceof Date) return toSerial(v, date1904);
  if (typeof v === "object") {
    if ("richText" in v) return (v as ExcelJS.CellRichTextValue).richText.map((r) => r.text).join("");
    if ("error" in v) return { error: String((v as { error: unknown }).error) };
    if ("text" in v && typeof (v as { text: unknown }).text === "string") return (v as { text: string }).text;
  }
  return null;
}

/** A value as engine content: a leading apostrophe keeps text as text (the engine would read "2028" as a number); errors as their code. */
export function engineContent(v: OutValue | undefined): RawCellContent {
  if (v === null || v === undefined) return null;
  if (typeof v === "string") return `'${v}`;
  if (typeof v === "object") return v.error;
  return v;
}

/** exceljs, loaded when a workbook is first read (evaluating a formula does not need it). */
async function excel(): Promise<typeof ExcelJS> {
  const m = (await import("exceljs")) as unknown as typeof ExcelJS & { default?: typeof ExcelJS };
  return m.default ?? m;
}

/** Reads every sheet's values and formulas. Throws WorkbookError with a plain message for a file that cannot be read. */
export async function readWorkbook(path: string): Promise<WorkbookData> {
  checkWorkbookFile(path);
  const { Workbook, ValueType } = await excel();
  const book = new Workbook();
  const bytes = readFileSync(path);
  let tables: TableInfo[];
  const dynamicCells = new Map<string, Set<string>>();
  try {
    const pkg = xmlParts(readZip(bytes));
    tables = readTables(pkg);
    for (const s of sheetParts(pkg)) dynamicCells.set(s.name, dynamicArrayCells(pkg.get(s.part) ?? ""));
    await book.xlsx.load(bytes as unknown as ArrayBuffer);
  } catch (e) {
    throw new WorkbookError(`${path} could not be read as an .xlsx workbook (${e instanceof Error ? e.message : String(e)}).`);
  }
  const index = tableIndex(tables);
  const date1904 = Boolean((book.properties as { date1904?: boolean }).date1904);
  const sheets: SheetData[] = [];
  for (const ws of book.worksheets) {
    const grid: RawCellContent[][] = [];
    const formulas: FormulaCell[] = [];
    const spill = new Set<string>();
    const dynamicHere = dynamicCells.get(ws.name);
    ws.eachRow({ includeEmpty: false }, (row, rowNumber) => {
      row.eachCell({ includeEmpty: false }, (cell, colNumber) => {
        const r = rowNumber - 1;
        const c = colNumber - 1;
        let content: RawCellContent = null;
        if (cell.type === ValueType.Formula) {
          const formula = cell.formula;
          const value = cell.value as ExcelJS.CellFormulaValue & { shareType?: string; ref?: string };
          const array = value.shareType === "array";
          const area = array ? (parseBlock(value.ref ?? "") ?? undefined) : undefined;
          if (area && (area.rows > 1 || area.cols > 1))
            for (let i = 0; i < area.rows; i++) for (let j = 0; j < area.cols; j++) if (i || j) spill.add(`${area.row + i}:${area.col + j}`);
          const problems: string[] = [];
          content = toEngineFormula(formula, { tables: index, sheet: ws.name, row: r, col: c, dynamic: array || callsOrbit(formula), problems });
          const dynamic = array && dynamicHere !== undefined && dynamicHere.has(cellAddress(r, c));
          formulas.push({ row: r, col: c, formula, cached: fileValue(cell.result, date1904), array, dynamic, arrayRows: area?.rows, arrayCols: area?.cols, problems });
        } else if (cell.type !== ValueType.Merge) content = engineContent(fileValue(cell.value, date1904));
        if (content === null) return;
        (grid[r] ??= [])[c] = content;
      });
    });
    // Cells inside an array formula's range hold only its cached results: the engine fills them.
    // The cached values are kept with the formula, for a formula the runner cannot compute.
    const own = new Set(formulas.map((f) => `${f.row}:${f.col}`));
    for (let k = 0; k < formulas.length; k++) {
      const f = formulas[k];
      if ((f.arrayRows ?? 1) * (f.arrayCols ?? 1) <= 1) continue;
      const cachedArea: OutValue[][] = [];
      for (let i = 0; i < f.arrayRows!; i++) {
        const row: OutValue[] = [];
        for (let j = 0; j < f.arrayCols!; j++) row.push(i || j ? fileValue(ws.getCell(f.row + 1 + i, f.col + 1 + j).value, date1904) : f.cached);
        cachedArea.push(row);
      }
      formulas[k] = { ...f, cachedArea };
    }
    for (const key of spill) {
      const [r, c] = key.split(":").map(Number);
      if (grid[r]?.[c] !== undefined && !own.has(key)) grid[r][c] = null;
    }
    const width = grid.reduce((w, row) => Math.max(w, row?.length ?? 0), 0);
    const dense: RawCellContent[][] = [];
    for (let i = 0; i < grid.length; i++) {
      const src = grid[i] ?? [];
      const out: RawCellContent[] = new Array(width).fill(null);
      for (let j = 0; j < src.length; j++) if (src[j] !== undefined) out[j] = src[j];
      dense.push(out);
    }
    sheets.push({ name: ws.name, grid: dense, formulas });
  }
  const names: { name: string; expression: string }[] = [];
  for (const dn of (book.definedNames as unknown as { model: { name: string; ranges: string[] }[] }).model) {
    // Names of one range in this workbook; print areas (_xlnm.) and references into other files are skipped.
    if (dn.ranges.length === 1 && !dn.name.startsWith("_xlnm.") && !dn.ranges[0].includes("[")) names.push({ name: dn.name, expression: `=${dn.ranges[0]}` });
  }
  return { path, book, sheets, names, tables };
}

/** A value as exceljs writes it: numbers, text, booleans, or an Excel error code. */
export type OutValue = number | string | boolean | null | { error: string };

export interface FormulaResult {
  /** The value of the formula's own cell (top left of a spilled result). */
  readonly value: OutValue;
  /** The whole spilled result when it fills more than one cell. */
  readonly spill?: OutValue[][];
}

/** What writeWorkbook does besides the results. */
export interface WriteOptions {
  /** Ask Excel to recalculate every formula when it opens the file (calcPr fullCalcOnLoad). */
  recalcOnOpen?: boolean;
}

/**
 * Checks before any work that `outPath` can be written (its folder exists and is writable, and it
 * is not a folder), so a mistyped -o costs no recalculation. Throws WorkbookError.
 */
export function checkWritable(outPath: string): void {
  const folder = dirname(resolve(outPath));
  if (!existsSync(folder)) throw new WorkbookError(`cannot write ${outPath}: the folder ${folder} does not exist.`);
  if (!statSync(folder).isDirectory()) throw new WorkbookError(`cannot write ${outPath}: ${folder} is not a folder.`);
  if (existsSync(outPath) && statSync(outPath).isDirectory()) throw new WorkbookError(`cannot write ${outPath}: it is a folder.`);
  try {
    accessSync(existsSync(outPath) ? outPath : folder, constants.W_OK);
  } catch {
    throw new WorkbookError(`cannot write ${outPath}: permission denied.`);
  }
}

/**
 * Writes the workbook to `outPath` with every formula in stored form and its new cached result.
 * `results` is indexed like `data.sheets[s].formulas[f]`; undefined keeps what the file had.
 * Throws WorkbookError when the file cannot be written.
 */
export async function writeWorkbook(data: WorkbookData, results: (FormulaResult | undefined)[][], outPath: string, options: WriteOptions = {}): Promise<void> {
  const { ValueType } = await excel();
  const book = data.book;
  if (!book) throw new Error("writeWorkbook needs a workbook read from a file");
  const dynamic = new Map<string, Set<string>>();
  data.sheets.forEach((sheet, s) => {
    const ws = book.getWorksheet(sheet.name)!;
    // Clear the old spill areas first, so a result that shrank leaves no stale numbers behind.
    for (const f of sheet.formulas) {
      if ((f.arrayRows ?? 1) * (f.arrayCols ?? 1) <= 1) continue;
      for (let i = 0; i < f.arrayRows!; i++)
        for (let j = 0; j < f.arrayCols!; j++) if (i || j) {
          const cell = ws.getCell(f.row + 1 + i, f.col + 1 + j);
          if (cell.type !== ValueType.Formula) cell.value = null;
        }
    }
    const marked = new Set<string>();
    dynamic.set(sheet.name, marked);
    sheet.formulas.forEach((f, k) => {
      const cell = ws.getCell(f.row + 1, f.col + 1);
      const formula = toStoredFormula(f.formula);
      const res: FormulaResult = results[s]?.[k] ?? { value: f.cached, spill: f.cachedArea };
      const result = res.value;
      const spill = res.spill && (res.spill.length > 1 || res.spill[0].length > 1) ? res.spill : undefined;
      if (f.dynamic) marked.add(cellAddress(f.row, f.col));
      // Excel keeps every formula that calls a custom function as a dynamic array formula, one
      // cell or many (marked dynamic below); array formulas stay array formulas; other formulas
      // keep the plain form unless they spill.
      if (spill || f.array || callsOrbit(f.formula)) {
        const rows = spill?.length ?? 1;
        const cols = spill?.[0].length ?? 1;
        const ref = rows * cols > 1 ? `${cellAddress(f.row, f.col)}:${cellAddress(f.row + rows - 1, f.col + cols - 1)}` : cellAddress(f.row, f.col);
        cell.value = { formula, result: result ?? undefined, shareType: "array", ref } as unknown as ExcelJS.CellValue;
        if (spill)
          for (let i = 0; i < rows; i++)
            for (let j = 0; j < cols; j++) if (i || j) ws.getCell(f.row + 1 + i, f.col + 1 + j).value = spill[i][j] as ExcelJS.CellValue;
      } else cell.value = { formula, result: result ?? undefined } as ExcelJS.CellValue;
    });
  });
  if (options.recalcOnOpen) (book as unknown as { calcProperties: { fullCalcOnLoad?: boolean } }).calcProperties.fullCalcOnLoad = true;
  const written = Buffer.from(await book.xlsx.writeBuffer());
  try {
    writeFileSync(outPath, markDynamicArrays(writeZip(restoreTables(readZip(written), data.tables)), dynamic));
  } catch (e) {
    throw new WorkbookError(`cannot write ${outPath}: ${writeFailure(e)}.`);
  }
}

/** Why writing a file failed, in a few words. */
export function writeFailure(e: unknown): string {
  const code = (e as NodeJS.ErrnoException).code;
  if (code === "ENOENT") return "the folder does not exist";
  if (code === "EACCES" || code === "EPERM" || code === "EROFS") return "permission denied";
  if (code === "EISDIR") return "it is a folder";
  if (code === "ENOTDIR") return "a part of the path is a file, not a folder";
  if (code === "ENOSPC") return "the disk is full";
  return e instanceof Error ? e.message : String(e);
}
