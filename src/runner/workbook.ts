import { closeSync, existsSync, openSync, readSync, statSync, writeFileSync } from "node:fs";
import type ExcelJS from "exceljs";
import type { RawCellContent } from "hyperformula";
import { markDynamicArrays } from "./dynamicarrays";
import { orbitCalls, toEngineFormula, toStoredFormula } from "./names";

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
  /** The result the file had cached (undefined when none). */
  readonly cached: unknown;
  /** The range of an array formula anchored here, as recorded in the file (rows x cols). */
  readonly arrayRows?: number;
  readonly arrayCols?: number;
}

export interface SheetData {
  readonly name: string;
  /** Cell contents for the engine: numbers, text, booleans, null, formulas in engine form. */
  readonly grid: RawCellContent[][];
  readonly formulas: FormulaCell[];
}

export interface WorkbookData {
  readonly path: string;
  readonly book: ExcelJS.Workbook;
  readonly sheets: SheetData[];
  readonly names: { name: string; expression: string }[];
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

/** A plain cell value as the engine takes it. */
function plainValue(v: ExcelJS.CellValue, date1904: boolean): RawCellContent {
  if (v === null || v === undefined) return null;
  if (typeof v === "number" || typeof v === "boolean") return v;
  // A leading apostrophe keeps text as text: the engine would otherwise read "2028" as a number.
  if (typeof v === "string") return `'${v}`;
  if (v instanceof Date) return toSerial(v, date1904);
  if (typeof v === "object") {
    if ("richText" in v) return `'${v.richText.map((r) => r.text).join("")}`;
    if ("error" in v) return v.error;
    if ("text" in v && typeof v.text === "string") return `'${v.text}`;
  }
  return null;
}

function cachedValue(v: unknown, date1904: boolean): unknown {
  if (v instanceof Date) return toSerial(v, date1904);
  if (typeof v === "object" && v !== null && "error" in v) return { error: (v as { error: string }).error };
  return v;
}

const A1 = /^\$?([A-Z]{1,3})\$?(\d+)$/;

function colIndex(letters: string): number {
  let n = 0;
  for (const ch of letters) n = n * 26 + (ch.charCodeAt(0) - 64);
  return n - 1;
}

/** "B2:D9" -> rows and columns, or undefined. */
function rangeSize(ref: string | undefined): { top: number; left: number; rows: number; cols: number } | undefined {
  if (!ref) return undefined;
  const [a, b = a] = ref.split(":");
  const p = A1.exec(a);
  const q = A1.exec(b);
  if (!p || !q) return undefined;
  const top = Number(p[2]) - 1;
  const left = colIndex(p[1]);
  return { top, left, rows: Number(q[2]) - 1 - top + 1, cols: colIndex(q[1]) - left + 1 };
}

export function columnLetters(col: number): string {
  let s = "";
  for (let n = col + 1; n > 0; n = Math.floor((n - 1) / 26)) s = String.fromCharCode(65 + ((n - 1) % 26)) + s;
  return s;
}

export const cellName = (row: number, col: number): string => `${columnLetters(col)}${row + 1}`;

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
  try {
    await book.xlsx.readFile(path);
  } catch (e) {
    throw new WorkbookError(`${path} could not be read as an .xlsx workbook (${e instanceof Error ? e.message : String(e)}).`);
  }
  const date1904 = Boolean((book.properties as { date1904?: boolean }).date1904);
  const sheets: SheetData[] = [];
  for (const ws of book.worksheets) {
    const grid: RawCellContent[][] = [];
    const formulas: FormulaCell[] = [];
    const spill = new Set<string>();
    ws.eachRow({ includeEmpty: false }, (row, rowNumber) => {
      row.eachCell({ includeEmpty: false }, (cell, colNumber) => {
        const r = rowNumber - 1;
        const c = colNumber - 1;
        let content: RawCellContent = null;
        if (cell.type === ValueType.Formula) {
          const formula = cell.formula;
          const value = cell.value as ExcelJS.CellFormulaValue & { shareType?: string; ref?: string };
          const area = value.shareType === "array" ? rangeSize(value.ref) : undefined;
          if (area && (area.rows > 1 || area.cols > 1))
            for (let i = 0; i < area.rows; i++) for (let j = 0; j < area.cols; j++) if (i || j) spill.add(`${area.top + i}:${area.left + j}`);
          formulas.push({ row: r, col: c, formula, cached: cachedValue(cell.result, date1904), arrayRows: area?.rows, arrayCols: area?.cols });
          content = toEngineFormula(formula);
        } else if (cell.type !== ValueType.Merge) content = plainValue(cell.value, date1904);
        if (content === null) return;
        (grid[r] ??= [])[c] = content;
      });
    });
    // Cells inside an array formula's range hold only its cached results: the engine fills them.
    for (const key of spill) {
      const [r, c] = key.split(":").map(Number);
      if (grid[r]?.[c] !== undefined && !formulas.some((f) => f.row === r && f.col === c)) grid[r][c] = null;
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
  return { path, book, sheets, names };
}

/** A value as exceljs writes it: numbers, text, booleans, or an Excel error code. */
export type OutValue = number | string | boolean | null | { error: string };

export interface FormulaResult {
  /** The value of the formula's own cell (top left of a spilled result). */
  readonly value: OutValue;
  /** The whole spilled result when it fills more than one cell. */
  readonly spill?: OutValue[][];
}

/**
 * Writes the workbook to `outPath` with every formula in stored form and its new cached result.
 * `results` is indexed like `data.sheets[s].formulas[f]`; undefined keeps the file's own cache.
 */
export async function writeWorkbook(data: WorkbookData, results: (FormulaResult | undefined)[][], outPath: string): Promise<void> {
  const { ValueType } = await excel();
  data.sheets.forEach((sheet, s) => {
    const ws = data.book.getWorksheet(sheet.name)!;
    // Clear the old spill areas first, so a result that shrank leaves no stale numbers behind.
    for (const f of sheet.formulas) {
      if ((f.arrayRows ?? 1) * (f.arrayCols ?? 1) <= 1) continue;
      for (let i = 0; i < f.arrayRows!; i++)
        for (let j = 0; j < f.arrayCols!; j++) if (i || j) {
          const cell = ws.getCell(f.row + 1 + i, f.col + 1 + j);
          if (cell.type !== ValueType.Formula) cell.value = null;
        }
    }
    sheet.formulas.forEach((f, k) => {
      const cell = ws.getCell(f.row + 1, f.col + 1);
      const formula = toStoredFormula(f.formula);
      const res = results[s]?.[k];
      const result = res === undefined ? (f.cached as OutValue) : res.value;
      const spill = res?.spill && (res.spill.length > 1 || res.spill[0].length > 1) ? res.spill : undefined;
      // Excel keeps every formula that calls a custom function as a dynamic array formula, one
      // cell or many (marked dynamic below); other formulas keep the plain form unless they spill.
      if (spill || orbitCalls(f.formula).length > 0) {
        const rows = spill?.length ?? 1;
        const cols = spill?.[0].length ?? 1;
        const ref = rows * cols > 1 ? `${cellName(f.row, f.col)}:${cellName(f.row + rows - 1, f.col + cols - 1)}` : cellName(f.row, f.col);
        cell.value = { formula, result: result ?? undefined, shareType: "array", ref } as unknown as ExcelJS.CellValue;
        if (spill)
          for (let i = 0; i < rows; i++)
            for (let j = 0; j < cols; j++) if (i || j) ws.getCell(f.row + 1 + i, f.col + 1 + j).value = spill[i][j] as ExcelJS.CellValue;
      } else cell.value = { formula, result: result ?? undefined } as ExcelJS.CellValue;
    });
  });
  const written = Buffer.from(await data.book.xlsx.writeBuffer());
  writeFileSync(outPath, markDynamicArrays(written));
}
