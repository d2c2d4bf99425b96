/**
 * The Skerry demo scenario (DEVELOPERS.md, "The Skerry demo scenario"), one description per
 * sheet. The pane offers each sheet as a template (src/taskpane/templates.ts) and the demo writes
 * each as a workbook (src/runner/demobook.ts), so both have the same inputs, formulas and totals
 * by construction. Pure data and layout: imports nothing outside src/scenario but src/formula.
 *
 * Adding a sheet is one entry in SCENARIO: write src/scenario/<sheet>.ts exporting a
 * ScenarioSheet (lay it out with SheetBuilder; its numbers go into story.ts), and list it below.
 * The pane's card, the demo workbook, its printout and the tests over every sheet follow from
 * that entry. Until a sheet's functions are in the build, the pane shows its card without the
 * button (missingFunctions) and the tests say which functions are missing.
 */
import { budget } from "./budget";
import { ground } from "./ground";
import { handout } from "./handout";
import { lifetime } from "./lifetime";
import { lunar } from "./lunar";
import { marsWindow } from "./mars";
import { sweep } from "./sweep";
import type { ScenarioSheet } from "./types";

/** Every sheet, in the order of the story: the pane lists them so and the demo prints them so. */
export const SCENARIO: readonly ScenarioSheet[] = [budget, lifetime, ground, sweep, handout, lunar, marsWindow];

export type { CellRole, ColourScale, KeyResults, LineChart, ScenarioCell, ScenarioSheet, Shown } from "./types";
export { functionsCalled, layoutSheet, missingFunctions, sheetFunctions, type SheetLayout } from "./layout";
