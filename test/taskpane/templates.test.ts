import { DetailedCellError } from "hyperformula";
import { describe, expect, it } from "vitest";
import { cellAddress, parseBlock, parseCell } from "../../src/formula/cells";
import { excelSerial, layoutTemplate, missingFunctions, orbitCalls, TEMPLATES, templateFunctions } from "../../src/taskpane/templates";
import { builtBundle, recalcSheet } from "../support/scenario";

// The templates are the scenario's sheets (src/scenario); these tests check them against the
// BUILT bundle: every ORBIT call names a function of functions.json with an argument count it
// accepts, and the sheet recalculates in the headless runner's engine (HyperFormula with the same
// functions) to finite numbers, each shown with a number format.
const bundle = builtBundle();
const available = new Set(bundle.metadata.map((m) => m.id));
const ready = TEMPLATES.filter((t) => missingFunctions(t, available).length === 0);

const formulaCells = (t: (typeof TEMPLATES)[number]) => t.cells.filter((c) => typeof c.content === "string" && c.content.startsWith("="));

describe("template layout", () => {
  it.each(TEMPLATES.map((t) => [t.id, t] as const))("%s: one cell per reference, inputs plain values, at least one ORBIT formula", (_id, t) => {
    const filled = t.cells.filter((c) => c.content !== "").map((c) => c.ref);
    expect(new Set(filled).size).toBe(filled.length);
    for (const c of t.cells) expect(parseCell(c.ref), c.ref).not.toBeNull();
    for (const c of t.cells.filter((c) => c.role === "input")) expect(String(c.content).startsWith("="), c.ref).toBe(false);
    expect(templateFunctions(t).length).toBeGreaterThan(0);
    const layout = layoutTemplate(t);
    expect(layout.roles.get("input")!.length).toBeGreaterThan(0);
    for (const c of formulaCells(t)) {
      const at = parseCell(c.ref)!;
      expect(layout.formulas[at.row][at.col]).toBe(c.content);
    }
  });

  it("counts the arguments of nested ORBIT calls, skipping commas in text and inner calls", () => {
    expect(orbitCalls('=ORBIT.CONVERT_UNIT(ORBIT.PERIOD_FROM_SMA(B6, B12:B28), "s", "min")')).toEqual([
      { id: "CONVERT_UNIT", args: 3 },
      { id: "PERIOD_FROM_SMA", args: 2 },
    ]);
    expect(orbitCalls('=ORBIT.BODY_VALUE("a, b", {1,2})')).toEqual([{ id: "BODY_VALUE", args: 2 }]);
    expect(orbitCalls("=ORBIT.BODY_TABLE()")).toEqual([{ id: "BODY_TABLE", args: 0 }]);
  });

  it("writes dates as Excel serials (UTC)", () => {
    // Excel's serial of 2028-01-01 is 46753 (DATE(2028,1,1) in Excel, from memory); 1900-03-01 is 61.
    expect(excelSerial(2028, 1, 1)).toBe(46753);
    expect(excelSerial(1900, 3, 1)).toBe(61);
  });
});

describe("templates against the built functions", () => {
  it("call only functions of functions.json", () => {
    for (const t of TEMPLATES) {
      const missing = missingFunctions(t, available);
      expect({ t: t.id, missing }).toEqual({ t: t.id, missing: [] });
    }
    expect(ready.map((t) => t.id)).toEqual(["budget", "lifetime", "ground", "sweep", "handout", "lunar", "windows"]);
  });

  it("give each call an argument count between the function's required and total parameters", () => {
    for (const t of TEMPLATES)
      for (const c of formulaCells(t))
        for (const call of orbitCalls(String(c.content))) {
          const meta = bundle.metadata.find((m) => m.id === call.id);
          if (!meta) continue;
          const required = meta.parameters.filter((p) => !p.optional).length;
          expect({ at: `${t.id}!${c.ref}`, id: call.id, ok: call.args >= required && call.args <= meta.parameters.length }).toEqual({ at: `${t.id}!${c.ref}`, id: call.id, ok: true });
        }
  });

  it.each(ready.map((t) => [t.id, t] as const))("%s recalculates to finite numbers in every result cell, and shows every number with a format", (_id, t) => {
    const layout = layoutTemplate(t);
    const sheet = recalcSheet(t);
    const problems: string[] = [];
    // BODY_TABLE leaves a cell blank where the catalogue has no sourced value (its help says so);
    // PASSES fills one row per pass, a number known only once they are found, so the rows
    // reserved for it below the last pass stay blank.
    const MAY_LEAVE_BLANKS = ["BODY_TABLE", "PASSES"];
    const mayBeBlank = (ref: string) => {
      const at = parseCell(ref)!;
      const anchors = formulaCells(t).map((f) => ({ f, p: parseCell(f.ref)! })).filter(({ p }) => p.row <= at.row && p.col <= at.col);
      anchors.sort((a, b) => b.p.row - a.p.row || b.p.col - a.p.col);
      return anchors.length > 0 && MAY_LEAVE_BLANKS.includes(orbitCalls(String(anchors[0].f.content))[0]?.id);
    };
    for (const c of t.cells.filter((c) => c.role === "result")) {
      const v = sheet.value(c.ref);
      if ((v === "" || v === null) && c.content === "" && mayBeBlank(c.ref)) continue;
      // Result cells include the spill area of each one-formula column: those must be filled too.
      // A cell with a number format must hold a finite number, or the words its own formula
      // writes for an answer that is not a number (IFNA(call, "over 200 years")); others (a
      // function's own header row, a yes/no answer in words) may hold text, but never an error
      // or nothing.
      const ownWords = typeof v === "string" && typeof c.content === "string" && c.content.includes(`"${v}"`);
      const bad = v instanceof DetailedCellError || v === null || (typeof v === "number" ? !Number.isFinite(v) : c.format !== undefined && !ownWords);
      if (bad) problems.push(`${c.ref}: ${v instanceof DetailedCellError ? `${v.value} ${v.message}` : JSON.stringify(v)}`);
    }
    // Every number on the sheet, typed or computed, spilled ones included, has a number format of
    // its own (days as days, eccentricity to 6 decimals ...): none is left in General.
    for (let r = 0; r < sheet.rows; r++)
      for (let col = 0; col < sheet.cols; col++) {
        const ref = cellAddress(r, col);
        const v = sheet.value(ref);
        if (typeof v !== "number") continue;
        if ((layout.numberFormats[r]?.[col] ?? "General") === "General") problems.push(`${ref}: ${v} without a number format`);
      }
    expect(problems).toEqual([]);
  });

  it("fill each altitude row of the sweep from one formula per column (range lifting)", () => {
    const t = TEMPLATES.find((x) => x.id === "sweep")!;
    const formulasByColumn = new Map<string, number>();
    for (const c of formulaCells(t)) formulasByColumn.set(c.ref.replace(/\d+/, ""), (formulasByColumn.get(c.ref.replace(/\d+/, "")) ?? 0) + 1);
    // Column B also holds the rideshare radius among the inputs; every other column one formula.
    expect([...formulasByColumn.entries()].filter(([col, n]) => col !== "B" && n !== 1)).toEqual([]);
    expect(formulasByColumn.get("B")).toBe(2);
    expect(formulasByColumn.size).toBe(11);
    // 300 to 1200 km every 10 km, typed as inputs in column A.
    expect(t.cells.filter((c) => c.role === "input" && /^A/.test(c.ref)).length).toBe(91);
  });

  it("shade exactly the transfer grid's C3 values as a colour scale, and chart two numeric columns of the sweep", () => {
    const windows = TEMPLATES.find((x) => x.id === "windows")!;
    const grid = parseBlock(windows.colourScale!.range)!;
    expect([grid.rows, grid.cols]).toEqual([16, 36]);
    const w = recalcSheet(windows);
    const valueAt = (r: number, c: number) => w.value(cellAddress(r, c));
    for (let r = grid.row; r < grid.row + grid.rows; r++) for (let c = grid.col; c < grid.col + grid.cols; c++) expect(typeof valueAt(r, c)).toBe("number");
    // Above the block: the departure dates; left of it: the flight days, as the function lays its header out.
    expect(valueAt(grid.row - 1, grid.col)).toBe(excelSerial(2028, 7, 1));
    expect(valueAt(grid.row, grid.col - 1)).toBe(120);
    expect(valueAt(grid.row - 1, grid.col - 1)).toBe("flight days \\ departure");

    const sweep = TEMPLATES.find((x) => x.id === "sweep")!;
    const s = recalcSheet(sweep);
    const x = parseBlock(sweep.chart!.x)!;
    const y = parseBlock(sweep.chart!.y)!;
    for (let i = 0; i < x.rows; i++) {
      expect(s.value(cellAddress(x.row + i, x.col))).toBe(300 + 10 * i);
      expect(typeof s.value(cellAddress(y.row + i, y.col))).toBe("number");
    }
    // The y column is the delta-v in m/s from the rideshare orbit: 0 at 520 km.
    expect(s.value(cellAddress(y.row + 22, y.col))).toBe(0);
  });

  it("find the lowest C3 of the grid with formulas, with its departure date and flight time", () => {
    const windows = TEMPLATES.find((x) => x.id === "windows")!;
    const grid = parseBlock(windows.colourScale!.range)!;
    const w = recalcSheet(windows);
    let best = { v: Infinity, r: 0, c: 0 };
    for (let r = grid.row; r < grid.row + grid.rows; r++)
      for (let c = grid.col; c < grid.col + grid.cols; c++) {
        const v = w.value(cellAddress(r, c)) as number;
        if (v < best.v) best = { v, r, c };
      }
    const shown = (label: string) => windows.keyResults[0].rows.find((row) => row[0] === label)![1] as { cell: string };
    expect(w.value(shown("Lowest departure C3 in the grid").cell)).toBe(best.v);
    expect(w.value(shown("Departure").cell)).toBe(w.value(cellAddress(grid.row - 1, best.c)));
    expect(w.value(shown("Flight time").cell)).toBe(w.value(cellAddress(best.r, grid.col - 1)));
  });

  it.each(ready.map((t) => [t.id, t] as const))("%s: every value the demo prints is a number of the recalculated sheet, or the words its formula writes", (_id, t) => {
    const sheet = recalcSheet(t);
    const formulaAt = new Map(t.cells.map((c) => [c.ref, String(c.content)]));
    for (const block of t.keyResults)
      for (const row of block.rows)
        for (const v of row) {
          if (typeof v !== "object") continue;
          const got = sheet.value(v.cell);
          const words = typeof got === "string" && got !== "" && (formulaAt.get(v.cell) ?? "").includes(`"${got}"`);
          expect({ cell: v.cell, type: words ? "words of its formula" : typeof got }).toEqual({ cell: v.cell, type: typeof got === "string" ? "words of its formula" : "number" });
        }
  });
});
