import { existsSync } from "node:fs";
import { resolve } from "node:path";
import { DetailedCellError } from "hyperformula";
import { describe, expect, it } from "vitest";
import { buildEngine } from "../../src/runner/engine";
import { loadBundle } from "../../src/runner/host";
import { toEngineFormula } from "../../src/runner/names";
import { parseCell } from "../../src/taskpane/cells";
import { excelSerial, layoutTemplate, missingFunctions, orbitCalls, TEMPLATES, templateFunctions } from "../../src/taskpane/templates";

// Templates are data; these tests check them against the BUILT bundle: every ORBIT call names a
// function of functions.json with an argument count it accepts, and the sheet recalculates in
// the headless runner's engine (HyperFormula with the same functions) to finite numbers.
const dist = resolve(__dirname, "../../dist");
if (!existsSync(`${dist}/functions.js`)) throw new Error("dist/functions.js is missing: run `npm run build` (npm test does it)");
const bundle = loadBundle(dist);
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
    expect(ready.map((t) => t.id)).toEqual(["budget", "sweep", "handout", "windows"]);
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

  it.each(ready.map((t) => [t.id, t] as const))("%s recalculates to finite numbers in every result cell", (_id, t) => {
    const layout = layoutTemplate(t);
    const cells = layout.formulas.map((row) => row.map((c) => (typeof c === "string" && c.startsWith("=") ? toEngineFormula(c) : c === "" ? null : c)));
    const { hf } = buildEngine(bundle, { [t.sheetName]: cells });
    const sheet = hf.getSheetId(t.sheetName)!;
    const problems: string[] = [];
    for (const c of t.cells.filter((c) => c.role === "result")) {
      const at = parseCell(c.ref)!;
      const v = hf.getCellValue({ sheet, row: at.row, col: at.col });
      // Result cells include the spill area of each one-formula column: those must be filled too.
      // A cell with a number format must hold a finite number; others (a header a function puts
      // at its own corner) may hold text, but never an error or nothing.
      const bad = v instanceof DetailedCellError || v === null || (typeof v === "number" ? !Number.isFinite(v) : c.format !== undefined);
      if (bad) problems.push(`${c.ref}: ${v instanceof DetailedCellError ? `${v.value} ${v.message}` : JSON.stringify(v)}`);
    }
    expect(problems).toEqual([]);
  });

  it("fill each altitude row of the sweep from one formula per column (range lifting)", () => {
    const t = TEMPLATES.find((x) => x.id === "sweep")!;
    const formulasByColumn = new Map<string, number>();
    for (const c of formulaCells(t)) formulasByColumn.set(c.ref.replace(/\d+/, ""), (formulasByColumn.get(c.ref.replace(/\d+/, "")) ?? 0) + 1);
    expect([...formulasByColumn.values()].every((n) => n === 1)).toBe(true);
    expect(formulasByColumn.size).toBe(7);
    // Every result column covers the 17 altitude rows (A12:A28), checked above by recalculation.
    expect(t.cells.filter((c) => c.role === "input" && /^A/.test(c.ref)).length).toBe(17);
  });
});
