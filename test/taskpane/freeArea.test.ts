import { describe, expect, it } from "vitest";
import {
  clearColumns,
  clearRows,
  embed,
  filledGrid,
  filledSummary,
  firstClearRun,
  fitsSheet,
  intersect,
  isEmptyCell,
  nearestFree,
  pastUsedRange,
  type Block,
} from "../../src/taskpane/freeArea";

/** A band from a picture: "x" marks a cell holding data. */
const band = (...rows: string[]) => rows.map((r) => [...r].map((ch) => ch === "x"));

describe("the never-overwrite guard", () => {
  it("counts a cell as empty only when it shows nothing and holds no formula", () => {
    expect(isEmptyCell("", "")).toBe(true);
    expect(isEmptyCell(null, null)).toBe(true);
    expect(isEmptyCell(0, 0)).toBe(false); // a typed zero is data
    expect(isEmptyCell("", '=IF(A1>0,"","")')).toBe(false); // a formula showing ""
    expect(isEmptyCell(42, "")).toBe(false); // a cell inside another formula's spill
    expect(isEmptyCell(false, false)).toBe(false);
  });

  it("summarises filled cells in reading order", () => {
    const filled = filledGrid(
      [
        ["", "", ""],
        ["", "", 7],
        ["a", "", ""],
      ],
      [
        ["", "", ""],
        ["", "", 7],
        ["a", "", ""],
      ],
    );
    expect(filledSummary(filled)).toEqual({ count: 2, first: { row: 1, col: 2 } });
    expect(filledSummary(band("...", "..."))).toEqual({ count: 0, first: null });
  });

  it("finds clear columns and rows of a band", () => {
    const b = band("..x.", "x...");
    expect(clearColumns(b)).toEqual([false, true, false, true]);
    expect(clearRows(b)).toEqual([false, false]);
  });
});

describe("firstClearRun", () => {
  it("returns the start of the first run long enough, at or after `from`", () => {
    expect(firstClearRun([true, false, true, true, false, true, true, true], 1, 3, false)).toBe(5);
    expect(firstClearRun([true, false, true, true], 1, 2, false)).toBe(2);
  });

  it("counts slots past the band as clear only when the band reached the end of the used range", () => {
    expect(firstClearRun([false, true, true], 1, 3, true)).toBe(1);
    expect(firstClearRun([false, true, true], 1, 3, false)).toBeNull();
    expect(firstClearRun([false, false], 1, 2, true)).toBe(2);
  });
});

describe("nearestFree", () => {
  // Target B2 (row 1, col 1), 3 rows x 2 columns; data at C3 (band row 1, band col 1).
  const target: Block = { row: 1, col: 1, rows: 3, cols: 2 };

  it("offers the first clear block to the right in the same rows and below in the same columns", () => {
    const right = band("....", ".x..", "....");
    const below = band("..", ".x", "..", "..", "..", "..");
    const offers = nearestFree(target, { rightBand: right, rightBeyondIsClear: true, belowBand: below, belowBeyondIsClear: true });
    expect(offers.right).toEqual({ row: 1, col: 3, rows: 3, cols: 2 }); // D2:E4
    expect(offers.below).toEqual({ row: 3, col: 1, rows: 3, cols: 2 }); // B4:C6
  });

  it("may overlap the refused block where those cells are empty (nearest, not merely past it)", () => {
    const offers = nearestFree({ row: 0, col: 0, rows: 1, cols: 3 }, { rightBand: band("x..."), rightBeyondIsClear: true, belowBand: band("x..", "..."), belowBeyondIsClear: true });
    expect(offers.right).toEqual({ row: 0, col: 1, rows: 1, cols: 3 });
    expect(offers.below).toEqual({ row: 1, col: 0, rows: 1, cols: 3 });
  });

  it("offers nothing past Excel's last column or row", () => {
    const edge: Block = { row: 0, col: 16_380, rows: 1, cols: 4 };
    const offers = nearestFree(edge, { rightBand: band("x..."), rightBeyondIsClear: true, belowBand: band("x...", "...."), belowBeyondIsClear: true });
    expect(offers.right).toBeNull(); // col 16,381 + 4 > 16,384
    expect(offers.below).toEqual({ row: 1, col: 16_380, rows: 1, cols: 4 });
  });

  it("falls back to the edge of the used range when the bands were cut short", () => {
    const used: Block = { row: 0, col: 0, rows: 100_000, cols: 30 };
    expect(pastUsedRange(target, used)).toEqual({ right: { row: 1, col: 30, rows: 3, cols: 2 }, below: { row: 100_000, col: 1, rows: 3, cols: 2 } });
  });
});

describe("block helpers", () => {
  it("intersects blocks", () => {
    expect(intersect({ row: 0, col: 0, rows: 5, cols: 5 }, { row: 3, col: 4, rows: 10, cols: 10 })).toEqual({ row: 3, col: 4, rows: 2, cols: 1 });
    expect(intersect({ row: 0, col: 0, rows: 2, cols: 2 }, { row: 2, col: 0, rows: 1, cols: 1 })).toBeNull();
  });

  it("embeds what was read from part of a block, the rest empty", () => {
    expect(embed({ row: 0, col: 0, rows: 2, cols: 3 }, { row: 1, col: 1, rows: 1, cols: 2 }, band("x."))).toEqual(band("...", ".x."));
    expect(embed({ row: 0, col: 0, rows: 1, cols: 2 }, null, [])).toEqual(band(".."));
  });

  it("knows Excel's sheet limits (1,048,576 rows x 16,384 columns; Excel specifications, from memory)", () => {
    expect(fitsSheet({ row: 1_048_575, col: 16_383, rows: 1, cols: 1 })).toBe(true);
    expect(fitsSheet({ row: 1_048_575, col: 0, rows: 2, cols: 1 })).toBe(false);
    expect(fitsSheet({ row: 0, col: 16_383, rows: 1, cols: 2 })).toBe(false);
  });
});
