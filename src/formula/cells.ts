/**
 * A1-style cell addresses (ECMA-376 Part 1, §18.17.2.3 Cell References): column letters A..XFD,
 * rows from 1, optional `$` marks; zero-based row and column indexes inside the program, as
 * Excel's getRangeByIndexes and the headless engine take them. Pure, no dependencies.
 */

/** Excel's sheet limits (rows, columns) since the 2007 file format. */
export const MAX_ROWS = 1_048_576;
export const MAX_COLUMNS = 16_384;

/** Column letters for a zero-based index: 0 → A, 25 → Z, 26 → AA. */
export function columnLetters(col: number): string {
  let n = col + 1;
  let out = "";
  while (n > 0) {
    const rem = (n - 1) % 26;
    out = String.fromCharCode(65 + rem) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}

/** Zero-based column index of column letters: A → 0, AA → 26 (either letter case). */
export function columnIndex(letters: string): number {
  let n = 0;
  for (let i = 0; i < letters.length; i++) n = n * 26 + ((letters.charCodeAt(i) & ~32) - 64);
  return n - 1;
}

/** "B3" for row 2, column 1. */
export const cellAddress = (row: number, col: number): string => `${columnLetters(col)}${row + 1}`;

/** "B3:D7" for a block (a single cell gives "B3"). */
export function blockAddress(row: number, col: number, rows: number, cols: number): string {
  const first = cellAddress(row, col);
  return rows === 1 && cols === 1 ? first : `${first}:${cellAddress(row + rows - 1, col + cols - 1)}`;
}

/** "$B$3:$D$7" (absolute), or "$B$3" for a single cell. */
export function absoluteBlock(row: number, col: number, rows: number, cols: number): string {
  const one = (r: number, c: number) => `$${columnLetters(c)}$${r + 1}`;
  return rows === 1 && cols === 1 ? one(row, col) : `${one(row, col)}:${one(row + rows - 1, col + cols - 1)}`;
}

const CELL = /^\$?([A-Za-z]{1,3})\$?([1-9][0-9]{0,6})$/;

/** Parses "B3" (optionally with $ signs) into zero-based { row, col }; null if it is not one cell of the grid. */
export function parseCell(ref: string): { row: number; col: number } | null {
  const m = CELL.exec(ref.trim());
  if (!m) return null;
  const row = Number(m[2]) - 1;
  const col = columnIndex(m[1]);
  return row < MAX_ROWS && col < MAX_COLUMNS ? { row, col } : null;
}

/** A block of cells: top-left corner (zero-based) and size. */
export interface Block {
  readonly row: number;
  readonly col: number;
  readonly rows: number;
  readonly cols: number;
}

/** Parses "B2:D9" or a single "B2" into a block (corners in either order); null if it is neither. */
export function parseBlock(ref: string): Block | null {
  const parts = ref.split(":");
  if (parts.length > 2) return null;
  const a = parseCell(parts[0]);
  const b = parts.length === 2 ? parseCell(parts[1]) : a;
  if (!a || !b) return null;
  const row = Math.min(a.row, b.row);
  const col = Math.min(a.col, b.col);
  return { row, col, rows: Math.abs(b.row - a.row) + 1, cols: Math.abs(b.col - a.col) + 1 };
}

/** A sheet name quoted for use in an address when it needs quotes ('Skerry budget'!A1), doubling quotes inside. */
export function quoteSheet(name: string): string {
  return /^[A-Za-z_][A-Za-z0-9_.]*$/.test(name) && parseCell(name) === null ? name : `'${name.replace(/'/g, "''")}'`;
}
