import { existsSync } from "node:fs";
import { resolve } from "node:path";
import type { CellValue } from "hyperformula";
import { parseCell } from "../../src/formula/cells";
import { addressKey, buildEngine } from "../../src/runner/engine";
import { loadBundle, type LoadedBundle } from "../../src/runner/host";
import { callArguments, formulaBody, orbitCallAt } from "../../src/formula/scan";
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
  /** Evaluations the engine needed (2 when a result's size was learned from the result), and formulas still cut to a smaller area after the last. */
  readonly passes: number;
  readonly unsettled: number;
  /** Rows and columns the root ORBIT call at a cell filled. */
  spill(ref: string): { rows: number; cols: number } | undefined;
}

/**
 * A formula with an ORBIT call whose #N/A is an answer, written =IFNA(call, fallback) (a lifetime
 * past the integration's cap), as the call alone, the fallback, and the words the fallback writes;
 * any other formula as it is.
 */
export function unwrapAnswer(formula: string): { formula: string; fallback?: string; words?: string } {
  const body = formulaBody(formula).trim();
  if (!/^IFNA\(/i.test(body)) return { formula };
  const { args, end } = callArguments(body, "IFNA(".length);
  if (end !== body.length || args.length !== 2 || !orbitCallAt(args[0], 0)) return { formula };
  return { formula: `=${args[0]}`, fallback: args[1], words: /"([^"]*)"/.exec(args[1])?.[1] };
}

/** The sheet's block (as layoutSheet gives it to the pane) recalculated in the engine. */
export function recalcSheet(t: ScenarioSheet, cells: (string | number)[][] = layoutSheet(t).formulas): RecalculatedSheet {
  const grid = cells.map((row) => row.map((c) => (typeof c === "string" && c.startsWith("=") ? toEngineFormula(c) : c === "" ? null : c)));
  const engine = buildEngine(builtBundle(), { [t.sheetName]: grid });
  const { hf } = engine;
  const sheet = hf.getSheetId(t.sheetName)!;
  const size = hf.getSheetDimensions(sheet);
  return {
    value: (ref) => hf.getCellValue({ sheet, ...parseCell(ref)! }),
    rows: size.height,
    cols: size.width,
    passes: engine.passes,
    unsettled: engine.unsettled.length,
    spill: (ref) => engine.spills.get(addressKey({ sheet, ...parseCell(ref)! })),
  };
}
