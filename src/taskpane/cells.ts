/**
 * A1-style cell addresses for the pane's own bookkeeping (zero-based row and column indexes, as
 * Excel's getRangeByIndexes takes them). One implementation, shared with the headless runner:
 * src/formula/cells.ts.
 */
export { MAX_ROWS, MAX_COLUMNS, columnLetters, columnIndex, cellAddress, blockAddress, parseCell, quoteSheet } from "../formula/cells";
