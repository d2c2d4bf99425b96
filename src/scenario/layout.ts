import { parseCell } from "../formula/cells";
import { orbitCalls } from "../formula/scan";
import type { CellRole, ScenarioSheet } from "./types";

/** A sheet as one rectangular block from A1, as the pane writes it in one range. */
export interface SheetLayout {
  rows: number;
  cols: number;
  /** Formulas or constants, "" for cells left empty (spill areas included). */
  formulas: (string | number)[][];
  /** Number format of every cell ("General" where none is set). */
  numberFormats: string[][];
  /** A1 addresses of the cells of each role that hold something. */
  roles: Map<CellRole, string[]>;
}

/** Lays a sheet out as one block from A1. */
export function layoutSheet(t: ScenarioSheet): SheetLayout {
  const placed = t.cells.map((c) => {
    const at = parseCell(c.ref);
    if (!at) throw new Error(`sheet ${t.id}: bad cell reference ${c.ref}`);
    return { ...c, ...at };
  });
  const rows = Math.max(...placed.map((c) => c.row)) + 1;
  const cols = Math.max(...placed.map((c) => c.col)) + 1;
  const formulas: (string | number)[][] = Array.from({ length: rows }, () => Array<string | number>(cols).fill(""));
  const numberFormats: string[][] = Array.from({ length: rows }, () => Array<string>(cols).fill("General"));
  const roles = new Map<CellRole, string[]>();
  for (const c of placed) {
    if (c.content !== "") formulas[c.row][c.col] = c.content;
    if (c.format) numberFormats[c.row][c.col] = c.format;
    if (c.content !== "") roles.set(c.role, [...(roles.get(c.role) ?? []), c.ref]);
  }
  return { rows, cols, formulas, numberFormats, roles };
}

/** ORBIT function ids a formula calls, in order of first use. */
export const functionsCalled = (formula: string): string[] => [...new Set(orbitCalls(formula).map((c) => c.id))];

/** ORBIT function ids a sheet calls, in order of first use. */
export const sheetFunctions = (t: ScenarioSheet): string[] => [...new Set(t.cells.flatMap((c) => (typeof c.content === "string" ? functionsCalled(c.content) : [])))];

/** Functions a sheet needs that a build does not have (the pane offers it, and the demo writes it, only when none). */
export const missingFunctions = (t: ScenarioSheet, available: ReadonlySet<string>): string[] => sheetFunctions(t).filter((id) => !available.has(id));
