/**
 * A1-style cell addresses for the pane's own bookkeeping (zero-based row and column indexes, as
 * Excel's getRangeByIndexes takes them). Pure: no Office calls.
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

/** Zero-based column index of column letters: A → 0, AA → 26. */
export function columnIndex(letters: string): number {
  let n = 0;
  for (const ch of letters.toUpperCase()) n = n * 26 + (ch.charCodeAt(0) - 64);
  return n - 1;
}

/** "B3" for row 2, column 1. */
export const cellAddress = (row: number, col: number): string => `${columnLetters(col)}${row + 1}`;

/** "B3:D7" for a block (a single cell gives "B3"). */
export function blockAddress(row: number, col: number, rows: number, cols: number): string {
  const first = cellAddress(row, col);
  return rows === 1 && cols === 1 ? first : `${first}:${cellAddress(row + rows - 1, col + cols - 1)}`;
}

/** Parses "B3" (optionally with $ signs) into zero-based { row, col }; null if it is not one cell. */
export function parseCell(ref: string): { row: number; col: number } | null {
  const m = /^\$?([A-Za-z]{1,3})\$?([1-9][0-9]{0,6})$/.exec(ref.trim());
  if (!m) return null;
  const row = Number(m[2]) - 1;
  const col = columnIndex(m[1]);
  return row < MAX_ROWS && col < MAX_COLUMNS ? { row, col } : null;
}

/** A sheet name quoted for use in an address when it needs quotes ('Skerry budget'!A1). */
export function quoteSheet(name: string): string {
  return /^[A-Za-z_][A-Za-z0-9_.]*$/.test(name) ? name : `'${name.replace(/'/g, "''")}'`;
}
