/**
 * The never-overwrite guard, pure part: whether a block of cells is empty, and where the nearest
 * empty block of the same size lies to the right or below. The Excel side (excel.ts) reads the
 * cells; these functions only decide. Pure: no Office calls.
 */
import { MAX_COLUMNS, MAX_ROWS } from "./cells";

/** A block of cells on one sheet, zero-based. */
export interface Block {
  row: number;
  col: number;
  rows: number;
  cols: number;
}

/**
 * A cell is empty only when it shows nothing and holds no formula: a formula that returns ""
 * and a cell inside another formula's spill both count as data.
 */
export function isEmptyCell(value: unknown, formula: unknown): boolean {
  const blank = (x: unknown) => x === "" || x === null || x === undefined;
  return blank(value) && blank(formula);
}

/** Which cells of a block read from the sheet hold something (values and formulas of equal shape). */
export function filledGrid(values: readonly (readonly unknown[])[], formulas: readonly (readonly unknown[])[]): boolean[][] {
  return values.map((row, r) => row.map((v, c) => !isEmptyCell(v, formulas[r]?.[c])));
}

/** How many cells hold something, and the first of them in reading order (row by row). */
export function filledSummary(filled: readonly (readonly boolean[])[]): { count: number; first: { row: number; col: number } | null } {
  let count = 0;
  let first: { row: number; col: number } | null = null;
  filled.forEach((row, r) =>
    row.forEach((f, c) => {
      if (!f) return;
      count++;
      if (first === null) first = { row: r, col: c };
    }),
  );
  return { count, first };
}

/** For each column of a band, true when no cell in it holds anything. */
export function clearColumns(filled: readonly (readonly boolean[])[]): boolean[] {
  const width = filled.reduce((w, row) => Math.max(w, row.length), 0);
  return Array.from({ length: width }, (_, c) => filled.every((row) => !row[c]));
}

/** For each row of a band, true when no cell in it holds anything. */
export function clearRows(filled: readonly (readonly boolean[])[]): boolean[] {
  return filled.map((row) => row.every((f) => !f));
}

/**
 * Start of the first run of `length` consecutive clear slots at or after `from`. Slots at or past
 * `clear.length` count as clear when `beyondIsClear` (the band was read up to the end of the
 * sheet's used range), and as unknown otherwise (the band was cut short), in which case a run
 * that would reach past the band is not returned. Null when there is no such run.
 */
export function firstClearRun(clear: readonly boolean[], from: number, length: number, beyondIsClear: boolean): number | null {
  let runStart = from;
  for (let k = from; k < clear.length; k++) {
    if (!clear[k]) {
      runStart = k + 1;
      continue;
    }
    if (k - runStart + 1 >= length) return runStart;
  }
  return beyondIsClear ? runStart : null;
}

/** What the Excel side read around a refused target: the bands to its right and below. */
export interface Surroundings {
  /** Rows target.row .. target.row+rows-1, columns target.col .. (end of what was read). */
  rightBand: readonly (readonly boolean[])[];
  /** Whether everything right of rightBand is known to be empty (past the used range). */
  rightBeyondIsClear: boolean;
  /** Rows target.row .. (end of what was read), columns target.col .. target.col+cols-1. */
  belowBand: readonly (readonly boolean[])[];
  belowBeyondIsClear: boolean;
}

export interface FreeOffers {
  right: Block | null;
  below: Block | null;
}

/**
 * The nearest empty blocks of the target's size that start to the right of it (same rows) and
 * below it (same columns). Either is null when none fits inside the sheet or inside what was read.
 */
export function nearestFree(target: Block, around: Surroundings): FreeOffers {
  const rightK = firstClearRun(clearColumns(around.rightBand), 1, target.cols, around.rightBeyondIsClear);
  const belowK = firstClearRun(clearRows(around.belowBand), 1, target.rows, around.belowBeyondIsClear);
  const right = rightK === null ? null : { ...target, col: target.col + rightK };
  const below = belowK === null ? null : { ...target, row: target.row + belowK };
  return { right: right && fitsSheet(right) ? right : null, below: below && fitsSheet(below) ? below : null };
}

/** Whether a block lies inside Excel's sheet limits. */
export const fitsSheet = (b: Block): boolean =>
  b.row >= 0 && b.col >= 0 && b.rows >= 1 && b.cols >= 1 && b.row + b.rows <= MAX_ROWS && b.col + b.cols <= MAX_COLUMNS;

/** The part of `b` that overlaps `other`, or null. */
export function intersect(b: Block, other: Block): Block | null {
  const row = Math.max(b.row, other.row);
  const col = Math.max(b.col, other.col);
  const end = Math.min(b.row + b.rows, other.row + other.rows);
  const endCol = Math.min(b.col + b.cols, other.col + other.cols);
  return end > row && endCol > col ? { row, col, rows: end - row, cols: endCol - col } : null;
}

/**
 * Places the cells read from `part` (a sub-block of `whole`, e.g. the used-range overlap) into a
 * grid the size of `whole`; everything outside `part` is empty.
 */
export function embed(whole: Block, part: Block | null, filled: readonly (readonly boolean[])[]): boolean[][] {
  return Array.from({ length: whole.rows }, (_, r) =>
    Array.from({ length: whole.cols }, (_, c) => {
      if (!part) return false;
      const pr = whole.row + r - part.row;
      const pc = whole.col + c - part.col;
      return pr >= 0 && pc >= 0 && pr < part.rows && pc < part.cols ? Boolean(filled[pr]?.[pc]) : false;
    }),
  );
}

/**
 * Blocks of the target's size just past the sheet's used range, to its right and below: always
 * empty, so they answer when the bands read around the target were cut short.
 */
export function pastUsedRange(target: Block, used: Block): FreeOffers {
  const right = { ...target, col: Math.max(target.col + 1, used.col + used.cols) };
  const below = { ...target, row: Math.max(target.row + 1, used.row + used.rows) };
  return { right: fitsSheet(right) ? right : null, below: fitsSheet(below) ? below : null };
}
