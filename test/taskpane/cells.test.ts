import { describe, expect, it } from "vitest";
import { blockAddress, cellAddress, columnIndex, columnLetters, MAX_COLUMNS, parseCell, quoteSheet } from "../../src/taskpane/cells";

// A1 notation as Excel defines it: columns A..Z, AA..ZZ, AAA..XFD (16,384 columns, XFD the last;
// Excel specifications and limits, from memory), rows from 1.
describe("A1 addresses", () => {
  it.each([
    [0, "A"],
    [25, "Z"],
    [26, "AA"],
    [51, "AZ"],
    [52, "BA"],
    [701, "ZZ"],
    [702, "AAA"],
    [MAX_COLUMNS - 1, "XFD"],
  ])("column %i is %s and back", (i, letters) => {
    expect(columnLetters(i)).toBe(letters);
    expect(columnIndex(letters)).toBe(i);
  });

  it("round-trips every column index", () => {
    const wrong = Array.from({ length: MAX_COLUMNS }, (_, i) => i).filter((i) => columnIndex(columnLetters(i)) !== i);
    expect(wrong).toEqual([]);
  });

  it("writes cells and blocks", () => {
    expect(cellAddress(2, 1)).toBe("B3");
    expect(blockAddress(1, 1, 1, 1)).toBe("B2");
    expect(blockAddress(1, 1, 11, 7)).toBe("B2:H12");
  });

  it("parses a single cell, with or without $, and rejects the rest", () => {
    expect(parseCell("B3")).toEqual({ row: 2, col: 1 });
    expect(parseCell("$AA$10")).toEqual({ row: 9, col: 26 });
    for (const bad of ["B0", "3B", "A1:B2", "XFE1", "A1048577", ""]) expect(parseCell(bad)).toBeNull();
  });

  it("quotes sheet names only when Excel needs it, doubling quotes inside", () => {
    expect(quoteSheet("Sheet1")).toBe("Sheet1");
    expect(quoteSheet("Skerry-1 budget")).toBe("'Skerry-1 budget'");
    expect(quoteSheet("Bob's")).toBe("'Bob''s'");
  });
});
