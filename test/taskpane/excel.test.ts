import { OfficeMockObject } from "office-addin-mock";
import { afterEach, describe, expect, it } from "vitest";
import { buildTablePlan, DEFAULT_UNITS, planSize } from "../../src/taskpane/catalogueTable";
import { insertCatalogueTable, insertFormula, uniqueName } from "../../src/taskpane/excel";

// The Excel.run code against office-addin-mock 4.0.0. The mock does not throw on misuse: a
// property read before load() + sync() reads as the string "Error, property was not loaded"
// (or "Error, context.sync() was not called"), so the tests assert that no such string reaches
// the results, and that writes land only where the guard found empty cells.

const MOCK_ERROR = /^Error, /;
type Calls = { getRangeByIndexes: number[][]; tablesAdded: number };

/** A workbook whose selected cell is C3 on Sheet1; `target` is what every range read returns. */
function workbook(target: unknown[][], calls: Calls, used: { row: number; col: number; rows: number; cols: number } | null) {
  return {
    context: {
      workbook: {
        selected: { rowIndex: 2, columnIndex: 2, worksheet: { name: "Sheet1" } },
        getSelectedRange() {
          return this.selected;
        },
        worksheets: {
          sheet1: {
            name: "Sheet1",
            block: { values: target, formulas: target, numberFormat: [], select() {}, format: { autofitColumns() {}, font: {}, fill: {} } },
            used: used ? { isNullObject: false, rowIndex: used.row, columnIndex: used.col, rowCount: used.rows, columnCount: used.cols } : { isNullObject: true, rowIndex: 0, columnIndex: 0, rowCount: 0, columnCount: 0 },
            getRangeByIndexes(r: number, c: number, h: number, w: number) {
              calls.getRangeByIndexes.push([r, c, h, w]);
              return this.block;
            },
            getUsedRangeOrNullObject() {
              return this.used;
            },
            tables: {
              add() {
                calls.tablesAdded++;
                return {};
              },
            },
          },
          getItem() {
            return this.sheet1;
          },
        },
      },
    },
    run: async function (batch: (ctx: unknown) => Promise<unknown>) {
      return batch(this.context);
    },
  };
}

afterEach(() => {
  delete (globalThis as { Excel?: unknown }).Excel;
});

describe("office-addin-mock itself", () => {
  it("reads an unloaded property as an error string instead of throwing (what the tests below guard against)", () => {
    const mock = new OfficeMockObject({ range: { address: "C3" } }) as unknown as { range: { address: string } };
    expect(mock.range.address).toMatch(MOCK_ERROR);
  });
});

describe("insertFormula", () => {
  it("reads the selected cell, finds it empty, and writes the formula there", async () => {
    const calls: Calls = { getRangeByIndexes: [], tablesAdded: 0 };
    const mock = new OfficeMockObject(workbook([[""]], calls, null)) as any;
    (globalThis as { Excel?: unknown }).Excel = mock;
    const out = await insertFormula('=ORBIT.ESCAPE_SPEED("Earth", 6898.137)');
    expect(out).toEqual({ ok: true, sheet: "Sheet1", address: "C3" });
    expect(JSON.stringify(out)).not.toMatch(/Error, /);
    expect(mock.context.workbook.worksheets.sheet1.block.formulas).toEqual([['=ORBIT.ESCAPE_SPEED("Earth", 6898.137)']]);
    // First the read of the target (row 2, col 2, one cell), then the write to the same cell.
    expect(calls.getRangeByIndexes).toEqual([
      [2, 2, 1, 1],
      [2, 2, 1, 1],
    ]);
  });

  it("writes nothing into a cell that holds data, and offers the cells right and below", async () => {
    const calls: Calls = { getRangeByIndexes: [], tablesAdded: 0 };
    const mock = new OfficeMockObject(workbook([["budget"]], calls, { row: 2, col: 2, rows: 1, cols: 1 })) as any;
    (globalThis as { Excel?: unknown }).Excel = mock;
    const out = await insertFormula("=ORBIT.C3_ENERGY(3)");
    expect(out).toEqual({
      ok: false,
      sheet: "Sheet1",
      address: "C3",
      reason: "occupied",
      filledCount: 1,
      firstFilled: "C3",
      right: { sheet: "Sheet1", row: 2, col: 3 },
      below: { sheet: "Sheet1", row: 3, col: 2 },
    });
    expect(mock.context.workbook.worksheets.sheet1.block.formulas).toEqual([["budget"]]);
  });

  it("writes at an offered cell given explicitly, checking it first", async () => {
    const calls: Calls = { getRangeByIndexes: [], tablesAdded: 0 };
    const mock = new OfficeMockObject(workbook([[""]], calls, null)) as any;
    (globalThis as { Excel?: unknown }).Excel = mock;
    const out = await insertFormula("=ORBIT.C3_ENERGY(3)", { sheet: "Sheet1", row: 3, col: 2 });
    expect(out).toEqual({ ok: true, sheet: "Sheet1", address: "C4" });
    expect(calls.getRangeByIndexes[0]).toEqual([3, 2, 1, 1]);
  });
});

describe("insertCatalogueTable", () => {
  it("refuses an occupied target without making a table or writing a value", async () => {
    const plan = buildTablePlan({ bodies: ["Earth", "Moon"], fields: ["gm"], units: DEFAULT_UNITS });
    const size = planSize(plan);
    const target = Array.from({ length: size.rows }, (_, r) => Array.from({ length: size.cols }, (_, c) => (r === 1 && c === 1 ? 42 : "")));
    const calls: Calls = { getRangeByIndexes: [], tablesAdded: 0 };
    const mock = new OfficeMockObject(workbook(target, calls, { row: 2, col: 2, rows: size.rows, cols: size.cols })) as any;
    // The mock cannot hold a collection's items array behind load("items/name"); stand in for it.
    mock.context.workbook.tables = { load: () => undefined, items: [] };
    (globalThis as { Excel?: unknown }).Excel = mock;
    const out = await insertCatalogueTable(plan);
    expect(out.ok).toBe(false);
    expect(out).toMatchObject({ reason: "occupied", filledCount: 1, firstFilled: "D4" });
    expect(JSON.stringify(out)).not.toMatch(/Error, /);
    expect(calls.tablesAdded).toBe(0);
    expect(mock.context.workbook.worksheets.sheet1.block.values).toBe(target);
    // The guard read the whole block the insertion would write, from the selected cell.
    expect(calls.getRangeByIndexes[0]).toEqual([2, 2, size.rows, size.cols]);
  });
});

describe("uniqueName", () => {
  it("adds a counter to a taken sheet name, case-insensitively, within Excel's 31 characters", () => {
    expect(uniqueName("Skerry-1 budget", ["Sheet1"])).toBe("Skerry-1 budget");
    expect(uniqueName("Skerry-1 budget", ["skerry-1 BUDGET", "Skerry-1 budget (2)"])).toBe("Skerry-1 budget (3)");
    expect(uniqueName("A sheet name that is much too long for Excel", []).length).toBe(31);
    expect(uniqueName("x".repeat(31), ["x".repeat(31)])).toBe(`${"x".repeat(27)} (2)`);
    expect(uniqueName("OrbitBodies", ["OrbitBodies"], 255, (b, n) => `${b}${n}`)).toBe("OrbitBodies2");
  });
});
