/**
 * Sheet templates: the sheets of the invented Skerry scenario (src/scenario, DEVELOPERS.md "The
 * Skerry demo scenario"), written as live =ORBIT.* formulas over shaded input cells, so a user
 * edits an input and the sheet recalculates. The demo workbooks are made from the same
 * descriptions, so a template and its demo sheet hold the same inputs, formulas and totals.
 * Pure data: no Office calls (excel.ts writes them).
 */
import { layoutSheet, SCENARIO, sheetFunctions, type CellRole, type ScenarioSheet, type SheetLayout } from "../scenario";

export type SheetTemplate = ScenarioSheet;
export type TemplateLayout = SheetLayout;
export type { CellRole };

export const TEMPLATES: readonly SheetTemplate[] = SCENARIO;

/** Everything the Excel side writes for a template, as one block from A1. */
export const layoutTemplate = (t: SheetTemplate): TemplateLayout => layoutSheet(t);

/** ORBIT function ids a template calls, in order of first use. */
export const templateFunctions = (t: SheetTemplate): string[] => sheetFunctions(t);

export { functionsCalled, missingFunctions } from "../scenario";
export { orbitCalls } from "../formula/scan";
export { excelSerial } from "../scenario/story";
