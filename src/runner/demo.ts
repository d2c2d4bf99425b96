import { relative } from "node:path";
import { DetailedCellError } from "hyperformula";
import { missingFunctions, SCENARIO, type KeyResults, type ScenarioSheet } from "../scenario";
import type { Io } from "./cli";
import { writeDemoWorkbooks } from "./demobook";
import { errorCode } from "./engine";
import { formatReport, formatTable } from "./format";
import type { LoadedBundle } from "./host";
import { recalcFile, type Recalculated } from "./recalc";
import { WorkbookError, writeFailure } from "./workbook";

/** Excel date serial (1900 system, UTC) as YYYY-MM-DD, or YYYY-MM-DD hh:mm:ss with `time` (rounded to the second). */
export function serialToIso(serial: number, time = false): string {
  const iso = new Date(Math.round((serial - 25569) * 86_400) * 1000).toISOString();
  return time ? `${iso.slice(0, 10)} ${iso.slice(11, 19)}` : iso.slice(0, 10);
}

/** The printout of one sheet's key results, read from its recalculated workbook. */
export function keyResultRows(block: KeyResults, done: Pick<Recalculated, "value">, sheet: string): (string | number)[][] {
  const shown = (v: unknown, digits: number | undefined, date: boolean, time: boolean): string | number => {
    if (v instanceof DetailedCellError) return errorCode(v).code;
    if (typeof v !== "number") return v === null || v === undefined ? "" : String(v);
    if (date || time) return serialToIso(v, time);
    return digits === undefined ? v : Number(v.toFixed(digits));
  };
  return [
    [...block.columns],
    ...block.rows.map((row) => row.map((c) => (typeof c === "object" ? shown(done.value(sheet, c.cell), c.digits, c.date === true, c.time === true) : c))),
  ];
}

/**
 * `orbit-cells demo`: writes the Skerry scenario's workbooks (one per sheet of src/scenario, the
 * same sheets the pane's templates insert), recalculates each through the runner (writing the
 * results back into the file, so it opens with numbers), and prints the key results. A sheet that
 * needs functions this build lacks is skipped with a line saying which. Exit code 1 when any
 * ORBIT cell of the demo is an error.
 */
export async function runDemo(bundle: LoadedBundle, folder: string, io: Io, sheets: readonly ScenarioSheet[] = SCENARIO): Promise<number> {
  const available = new Set(bundle.metadata.map((m) => m.id));
  const ready = sheets.filter((t) => missingFunctions(t, available).length === 0);
  let paths: string[];
  try {
    paths = await writeDemoWorkbooks(folder, ready);
  } catch (e) {
    throw new WorkbookError(`cannot write the demo workbooks into ${folder}: ${writeFailure(e)}.`);
  }
  io.stdout.write("Orbit Cells demo: the invented Skerry mission, recalculated without Excel.\n");
  io.stdout.write("Preliminary two-body, first-order estimates: not for flight operations or safety decisions.\n\n");
  for (const t of sheets.filter((s) => !ready.includes(s))) io.stdout.write(`${t.file}: skipped, this build lacks ${missingFunctions(t, available).join(", ")}.\n\n`);
  let errors = 0;
  for (let i = 0; i < paths.length; i++) {
    const path = paths[i];
    const shown = relative(process.cwd(), path) || path;
    const done = await recalcFile(bundle, path, { outPath: path });
    const r = done.report;
    errors += r.orbitErrors.length;
    if (r.orbitErrors.length > 0 || r.otherErrors.length > 0 || r.kept.length > 0) io.stdout.write(formatReport({ ...r, file: shown }) + "\n");
    else io.stdout.write(`${shown}: ${r.formulas} formulas, ${r.cellsRecalculated} cells recalculated, no errors.\n`);
    for (const block of ready[i].keyResults) io.stdout.write(`\n  ${block.title}\n${formatTable(keyResultRows(block, done, ready[i].sheetName), "    ")}\n`);
    if (ready[i].chart) io.stdout.write(`\n  (No chart in this file: exceljs cannot write charts. The pane's "${ready[i].title}" template draws "${ready[i].chart!.title}".)\n`);
    io.stdout.write("\n");
  }
  io.stdout.write(`Open the workbooks in ${relative(process.cwd(), folder) || "."}/ to see every formula; recalculate any workbook with: orbit-cells recalc <file.xlsx>\n`);
  return errors > 0 ? 1 : 0;
}
