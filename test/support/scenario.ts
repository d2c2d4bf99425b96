import { existsSync } from "node:fs";
import { resolve } from "node:path";
import type { CellValue } from "hyperformula";
import { parseCell } from "../../src/formula/cells";
import { buildEngine } from "../../src/runner/engine";
import { loadBundle, type LoadedBundle } from "../../src/runner/host";
import { toEngineFormula } from "../../src/runner/names";
import { layoutSheet, type ScenarioSheet } from "../../src/scenario";

/** Recalculating a scenario sheet as the pane writes it (one block from A1) in the headless runner's engine with the BUILT functions. */

const DIST = resolve(__dirname, "../../dist");
let loaded: LoadedBundle | undefined;

/** The built bundle (npm test builds it first). */
export function builtBundle(): LoadedBundle {
  if (!existsSync(`${DIST}/functions.js`)) throw new Error("dist/functions.js is missing: run `npm run build` (npm test does it)");
  return (loaded ??= loadBundle(DIST));
}

export interface RecalculatedSheet {
  /** The value of a cell ("B7"). */
  value(ref: string): CellValue;
  /** Rows and columns the sheet fills once every formula has spilled. */
  readonly rows: number;
  readonly cols: number;
}

/** The sheet's block (as layoutSheet gives it to the pane) recalculated in the engine. */
export function recalcSheet(t: ScenarioSheet, cells: (string | number)[][] = layoutSheet(t).formulas): RecalculatedSheet {
  const grid = cells.map((row) => row.map((c) => (typeof c === "string" && c.startsWith("=") ? toEngineFormula(c) : c === "" ? null : c)));
  const { hf } = buildEngine(builtBundle(), { [t.sheetName]: grid });
  const sheet = hf.getSheetId(t.sheetName)!;
  const size = hf.getSheetDimensions(sheet);
  return {
    value: (ref) => hf.getCellValue({ sheet, ...parseCell(ref)! }),
    rows: size.height,
    cols: size.width,
  };
}
