import { describe, expect, it } from "vitest";
import { absoluteBlock, parseBlock, quoteSheet } from "../../src/formula/cells";

// A1 references as ECMA-376 Part 1, §18.17.2.3 Cell References writes them (areas as two corners
// joined by ":"); the rest of the module is checked through the pane's own tests
// (test/taskpane/cells.test.ts), which import it unchanged.
describe("blocks of cells", () => {
  it("parses an area or a single cell, corners in either order, and rejects the rest", () => {
    expect(parseBlock("B2:D9")).toEqual({ row: 1, col: 1, rows: 8, cols: 3 });
    expect(parseBlock("$D$9:$B$2")).toEqual({ row: 1, col: 1, rows: 8, cols: 3 });
    expect(parseBlock("C3")).toEqual({ row: 2, col: 2, rows: 1, cols: 1 });
    for (const bad of ["", "A1:B2:C3", "A:A", "A0:B2"]) expect(parseBlock(bad)).toBeNull();
  });

  it("writes absolute areas, a single cell without a colon", () => {
    expect(absoluteBlock(1, 2, 10, 1)).toBe("$C$2:$C$11");
    expect(absoluteBlock(0, 0, 1, 1)).toBe("$A$1");
  });

  it("quotes a sheet name that reads as a cell address", () => {
    expect(quoteSheet("AB1")).toBe("'AB1'");
  });
});
