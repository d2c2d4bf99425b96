import { existsSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import ExcelJS from "exceljs";
import { DetailedCellError, type CellValue } from "hyperformula";
import { CellError, loadBundle, type LoadedBundle } from "../../src/runner/host";

/** Shared helpers of the runner tests: the built bundle, direct calls, workbooks on disk. */

export const ROOT = resolve(__dirname, "../..");
export const DIST = join(ROOT, "dist");

let loaded: LoadedBundle | undefined;
/** The BUILT bundle (npm test builds it first), loaded once per test file. */
export function bundle(): LoadedBundle {
  if (!existsSync(join(DIST, "functions.js"))) throw new Error("dist/functions.js is missing: run `npm run build` (npm test does it)");
  return (loaded ??= loadBundle(DIST));
}

/** Calls a function of the bundle directly, as Excel does: each argument a matrix, omitted ones null. */
export function direct(id: string, ...args: unknown[]): unknown[][] {
  const fn = bundle().functions.get(id);
  if (!fn) throw new Error(`the bundle has no ${id}`);
  const meta = bundle().metadata.find((m) => m.id === id)!;
  const argv = meta.parameters.map((_, k) => {
    const a = args[k];
    return a === undefined || a === null ? null : Array.isArray(a) ? a : [[a]];
  });
  return fn(...argv) as unknown[][];
}

/** The engine's value for one cell equals what the function returned for it (errors: same code and message). */
export function sameCell(engine: CellValue, returned: unknown): boolean {
  if (returned instanceof CellError) return engine instanceof DetailedCellError && engine.value === returned.code && engine.message === (returned.message ?? "");
  if (engine instanceof DetailedCellError) return false;
  if (returned === null || returned === undefined) return engine === 0;
  return Object.is(engine, returned);
}

export const tempDir = (): string => mkdtempSync(join(tmpdir(), "orbit-runner-"));

export type Content = string | number | boolean | null | { formula: string; result?: unknown; shareType?: string; ref?: string } | { sharedFormula: string };

/** Writes a workbook with exceljs: sheet name -> address -> value or { formula }; names: name -> "Sheet!$A$1". */
export async function writeBook(path: string, sheets: Record<string, Record<string, Content>>, names: Record<string, string> = {}): Promise<string> {
  const book = new ExcelJS.Workbook();
  for (const [name, cells] of Object.entries(sheets)) {
    const ws = book.addWorksheet(name);
    for (const [addr, v] of Object.entries(cells)) ws.getCell(addr).value = v as ExcelJS.CellValue;
  }
  for (const [name, ref] of Object.entries(names)) book.definedNames.add(ref, name);
  await book.xlsx.writeFile(path);
  return path;
}

/** Reads a workbook back with exceljs (to see what was written). */
export async function readBook(path: string): Promise<ExcelJS.Workbook> {
  const book = new ExcelJS.Workbook();
  await book.xlsx.readFile(path);
  return book;
}
