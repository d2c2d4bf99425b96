import { relative } from "node:path";
import { DEMO_WORKBOOKS, writeDemoWorkbooks } from "../../examples/generate";
import type { Io } from "./cli";
import { formatReport, formatTable } from "./format";
import type { LoadedBundle } from "./host";
import { recalcFile } from "./recalc";
import { WorkbookError, writeFailure } from "./workbook";

/**
 * `orbit-cells demo`: writes the Skerry demo workbooks (examples/generate.ts), recalculates each
 * through the runner (writing the results back into the file, so it opens with numbers), and
 * prints the key results. Exit code 1 when any ORBIT cell of the demo is an error.
 */
export async function runDemo(bundle: LoadedBundle, folder: string, io: Io): Promise<number> {
  let paths: string[];
  try {
    paths = await writeDemoWorkbooks(folder);
  } catch (e) {
    throw new WorkbookError(`cannot write the demo workbooks into ${folder}: ${writeFailure(e)}.`);
  }
  io.stdout.write("Orbit Cells demo: the invented Skerry mission, recalculated without Excel.\n");
  io.stdout.write("Preliminary two-body, impulsive estimates: not for flight operations.\n\n");
  let errors = 0;
  for (let i = 0; i < paths.length; i++) {
    const path = paths[i];
    const shown = relative(process.cwd(), path) || path;
    const done = await recalcFile(bundle, path, { outPath: path });
    const r = done.report;
    errors += r.orbitErrors.length;
    if (r.orbitErrors.length > 0 || r.otherErrors.length > 0 || r.kept.length > 0) io.stdout.write(formatReport({ ...r, file: shown }) + "\n");
    else io.stdout.write(`${shown}: ${r.formulas} formulas, ${r.cellsRecalculated} cells recalculated, no errors.\n`);
    for (const block of DEMO_WORKBOOKS[i].summary((sheet, cell) => done.value(sheet, cell))) {
      io.stdout.write(`\n  ${block.title}\n${formatTable(block.rows, "    ")}\n`);
    }
    io.stdout.write("\n");
  }
  io.stdout.write(`Open the workbooks in ${relative(process.cwd(), folder) || "."}/ to see every formula; recalculate any workbook with: orbit-cells recalc <file.xlsx>\n`);
  return errors > 0 ? 1 : 0;
}
