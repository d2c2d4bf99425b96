import { readFileSync } from "node:fs";
import { join } from "node:path";
import { DetailedCellError } from "hyperformula";
import { beforeAll, describe, expect, it } from "vitest";
import { BODIES } from "../../src/catalogue/bodies";
import { cellAddress } from "../../src/formula/cells";
import { xmlText } from "../../src/runner/package";
import { recalcFile, type Recalculated } from "../../src/runner/recalc";
import { readZip } from "../../src/runner/zip";
import { buildTablePlan, DEFAULT_BODIES, DEFAULT_FIELDS, DEFAULT_UNITS, tableCells } from "../../src/taskpane/catalogueTable";
import { bundle, direct, sameCell, tempDir } from "./support";
import { writeExcelLikeBook, type CellSpec, type SheetSpec } from "./xlsx";

// A workbook written the way Excel 365 saves one (test/runner/xlsx.ts builds the XML by hand):
// the pane's body catalogue as a table named OrbitBodies with live ORBIT columns, capital-E
// constants (ECMA-376 Part 1, §18.17.2.1 Constants: exponent-part with "e" or "E"), structured
// references (MS-XLSX §2.2.2 structure-reference: a column, [#This Row], [#Headers], [#Data],
// [#Totals]), _xlfn./_xlws. prefixes and _xlfn.SINGLE (the @ operator), dynamic array formulas
// with cell metadata, a formula the engine lacks (kept as saved) and a blocked spill. Expected
// values are direct calls of the built functions with the same inputs; the written file must hold
// the same formulas and table parts as the input, with the new results cached.

const earth = BODIES.find((b) => b.name === "Earth")!;
const plan = buildTablePlan({ bodies: DEFAULT_BODIES, fields: DEFAULT_FIELDS, units: DEFAULT_UNITS, derived: ["soi_radius"] });
const GM = plan.header.find((h) => h.startsWith("GM"))!;
const MEAN = plan.header.find((h) => h.startsWith("Mean radius"))!;
const stale = 0.5; // a cached result the recalculation must replace

/** The pane's table as cells: numbers, text, and its live formulas in the stored form. */
function catalogueCells(): Record<string, CellSpec | number | string> {
  const cells: Record<string, CellSpec | number | string> = {};
  tableCells(plan, 0, 0).forEach((row, i) =>
    row.forEach((v, j) => {
      if (v === "") return;
      const ref = cellAddress(i, j);
      cells[ref] = typeof v === "string" && v.startsWith("=") ? { f: v.slice(1).replace("ORBIT.", "_xldudf_ORBIT_"), cached: stale, array: ref, dynamic: true } : v;
    }),
  );
  return cells;
}

const SHEETS: SheetSpec[] = [
  {
    name: "Body catalogue",
    cells: catalogueCells(),
    tables: [{ name: "OrbitBodies", ref: `A1:${cellAddress(plan.rows.length, plan.header.length - 1)}`, columns: plan.header }],
  },
  {
    name: "Budget",
    cells: {
      A1: "Skerry-1 checks",
      B2: { f: "1E6", cached: stale },
      B3: { f: "_xldudf_ORBIT_ORBITAL_SPEED(3.986004418E5, 6898)", cached: stale, array: "B3", dynamic: true },
      B4: { f: `_xldudf_ORBIT_ORBITAL_SPEED(INDEX(OrbitBodies[${GM}],MATCH("Earth",OrbitBodies[Body],0)), 7000)`, cached: stale, array: "B4", dynamic: true },
      B5: { f: `OrbitBodies[[#Headers],[${GM}]]`, cached: "x" },
      B6: { f: "ROWS(OrbitBodies[#Data])", cached: stale },
      B7: { f: `_xlfn.STDEV.S(OrbitBodies[${MEAN}])`, cached: stale },
      B8: { f: '_xlfn.CONCAT("Skerry","-1")', cached: "Skerry-1" },
      B9: { f: 'B8&" budget"', cached: "old" },
      B10: { f: "1/0", cached: stale },
      B11: { f: '_xldudf_ORBIT_ORBITAL_SPEED("Earth", -5)', cached: stale, array: "B11", dynamic: true },
      B12: { f: ".5E1+1.E1", cached: stale },
      // The spilled-range operator I2# (stored as _xlfn.ANCHORARRAY) and the union operator: not evaluated.
      B13: { f: "SUM(_xlfn.ANCHORARRAY(I2))", cached: 0.175 },
      B14: { f: "SUM((D2,D3))", cached: 0.155 },
      D2: 0.12,
      D3: 0.035,
      D4: 0.02,
      E2: { f: "_xldudf_ORBIT_BURN_SEQUENCE(D2:D4, 225, 180)", cached: stale, array: "E2:G4", dynamic: true },
      F3: stale,
      G4: stale,
      H3: { f: "_xlfn.SINGLE(D2:D4)*1000", cached: stale },
      H6: { f: "_xlfn.SINGLE(D2:D4)", cached: stale },
      E3: stale,
      E4: stale,
      F2: stale,
      G2: stale,
      F4: stale,
      G3: stale,
      I2: { f: "_xlfn._xlws.SORT(D2:D4)", cached: stale, array: "I2:I4", dynamic: true },
      I3: stale,
      I4: stale,
      K2: { f: "_xldudf_ORBIT_BURN_SEQUENCE(D2:D4, 225, 180)", cached: stale, array: "K2", dynamic: true },
      L3: "in the way",
    },
  },
  {
    name: "Plan",
    cells: {
      A1: "Burn",
      B1: "dv (km/s)",
      C1: "m/s",
      A2: "raise",
      B2: 0.12,
      C2: { f: "Legs[[#This Row],[dv (km/s)]]*1000", cached: stale },
      A3: "trim",
      B3: 0.035,
      C3: { f: "Legs[[#This Row],[dv (km/s)]]*1000", cached: stale },
      A4: "Total",
      B4: { f: "SUBTOTAL(109,Legs[dv (km/s)])", cached: stale },
      E1: { f: "Legs[[#Totals],[dv (km/s)]]", cached: stale },
      E2: { f: "ROWS(Legs[[#Data],[#Totals],[Burn]:[m/s]])", cached: stale },
    },
    tables: [{ name: "Legs", ref: "A1:C4", columns: ["Burn", "dv (km/s)", "m/s"], totalsRow: true }],
  },
];

/** Formula text of every formula cell in a package, by "Sheet!A1" (the <f> element as stored). */
function storedFormulas(xlsx: Buffer): Map<string, string> {
  const parts = new Map(readZip(xlsx).map((e) => [e.name, e.data.toString("utf8")]));
  const book = parts.get("xl/workbook.xml")!;
  const rels = parts.get("xl/_rels/workbook.xml.rels")!;
  const out = new Map<string, string>();
  for (const m of book.matchAll(/<sheet [^>]*name="([^"]+)"[^>]*r:id="(rId\d+)"/g)) {
    const target = new RegExp(`Id="${m[2]}"[^>]*Target="([^"]+)"`).exec(rels)![1].replace(/^\/?(xl\/)?/, "xl/");
    for (const c of parts.get(target)!.matchAll(/<c r="([A-Z]+\d+)"[^>]*>\s*<f[^>]*>([^<]*)<\/f>/g)) out.set(`${xmlText(m[1])}!${c[1]}`, xmlText(c[2]));
  }
  return out;
}

const tableParts = (xlsx: Buffer): string[] =>
  readZip(xlsx)
    .filter((e) => /^xl\/tables\/table\d+\.xml$/.test(e.name))
    .map((e) => e.data.toString("utf8"))
    .sort();

describe("a workbook as Excel saves it", () => {
  let input: string;
  let output: string;
  let done: Recalculated;
  let again: Recalculated;
  const v = (sheet: string, cell: string) => done.value(sheet, cell);

  beforeAll(async () => {
    const dir = tempDir();
    input = writeExcelLikeBook(join(dir, "excel.xlsx"), SHEETS);
    output = join(dir, "out.xlsx");
    done = await recalcFile(bundle(), input, { outPath: output });
    again = await recalcFile(bundle(), output);
  });

  it("recalculates with no #ERROR! anywhere, keeping the saved results of the formulas it cannot compute", () => {
    const written = done.results.flat().flatMap((r) => (r ? (r.spill ?? [[r.value]]).flat() : []));
    expect(written.filter((x) => typeof x === "object" && x !== null && x.error === "#ERROR!")).toEqual([]);
    expect([...done.report.orbitErrors, ...done.report.otherErrors].filter((i) => i.code === "#ERROR!")).toEqual([]);
    expect(done.report.kept).toEqual([
      { sheet: "Budget", cell: "B8", code: "#NAME?", message: "Function name CONCAT not recognized" },
      { sheet: "Budget", cell: "B13", code: "#NAME?", message: "Function name ANCHORARRAY not recognized" },
      { sheet: "Budget", cell: "B14", code: "#ERROR!", message: 'the runner cannot read this formula (it stops at ",")' },
    ]);
    expect([v("Budget", "B13"), v("Budget", "B14")]).toEqual([0.175, 0.155]);
    // The cell that uses it is computed from its saved result, and listed for Excel to recalculate.
    expect(v("Budget", "B9")).toBe("Skerry-1 budget");
    expect(done.report.dependOnKept).toEqual([{ sheet: "Budget", cell: "B9" }]);
  });

  it("reads capital-E and leading- or trailing-dot constants (§18.17.2.1)", () => {
    expect(v("Budget", "B2")).toBe(1e6);
    expect(v("Budget", "B3")).toBe(direct("ORBITAL_SPEED", 398600.4418, 6898)[0][0]);
    expect(v("Budget", "B12")).toBe(15);
  });

  it("resolves structured references to the pane's table: a column through INDEX/MATCH, [#Headers], [#Data]", () => {
    expect(v("Budget", "B4")).toBe(direct("ORBITAL_SPEED", earth.gm.value, 7000)[0][0]);
    expect(v("Budget", "B5")).toBe(GM);
    expect(v("Budget", "B6")).toBe(plan.rows.length);
    // Sample standard deviation of the mean radii (the definition of STDEV.S), from the plan's own values.
    const radii = plan.rows.map((r) => r[plan.header.indexOf(MEAN)] as number);
    const mean = radii.reduce((a, b) => a + b, 0) / radii.length;
    const sd = Math.sqrt(radii.reduce((a, b) => a + (b - mean) ** 2, 0) / (radii.length - 1));
    expect(Math.abs((v("Budget", "B7") as number) - sd) / sd).toBeLessThan(1e-14);
  });

  it("computes the table's own live columns, [#This Row], and a totals row", () => {
    plan.rows.forEach((row, i) => {
      const cell = `${cellAddress(0, plan.header.length - 2)[0]}${i + 2}`;
      const formula = tableCells(plan, 0, 0)[i + 1][plan.header.length - 2];
      if (formula === "") return;
      expect(sameCell(v("Body catalogue", cell), direct("SOI_RADIUS", row[0])[0][0]), `${cell} ${row[0]}`).toBe(true);
    });
    expect(v("Plan", "C2")).toBe(120);
    expect(v("Plan", "C3")).toBe(35);
    expect(v("Plan", "B4")).toBe(0.155);
    expect(v("Plan", "E1")).toBe(0.155);
    expect(v("Plan", "E2")).toBe(3);
  });

  it("evaluates the @ operator (_xlfn.SINGLE) by implicit intersection and a _xlws. function", () => {
    // Microsoft, "Implicit intersection operator: @": a column range gives the cell on the formula's row.
    expect(v("Budget", "H3")).toBe(35);
    expect(done.report.otherErrors).toContainEqual({ sheet: "Budget", cell: "H6", code: "#VALUE!", message: "the @ operator's range does not meet the formula's row or column" });
    expect([v("Budget", "I2"), v("Budget", "I3"), v("Budget", "I4")]).toEqual([0.02, 0.035, 0.12]);
  });

  it("spills an ORBIT formula to its full size, and reports a blocked one as #SPILL!", () => {
    const burns = direct("BURN_SEQUENCE", [[0.12], [0.035], [0.02]], 225, 180);
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) expect(sameCell(v("Budget", `${"EFG"[j]}${2 + i}`), burns[i][j])).toBe(true);
    expect(done.report.orbitErrors).toContainEqual({ sheet: "Budget", cell: "K2", code: "#SPILL!", message: "No space for array result." });
    const bad = direct("ORBITAL_SPEED", "Earth", -5)[0][0] as { message: string };
    expect(done.report.orbitErrors).toContainEqual({ sheet: "Budget", cell: "B11", code: "#VALUE!", message: bad.message });
    expect(done.report.otherErrors).toContainEqual({ sheet: "Budget", cell: "B10", code: "#DIV/0!", message: "" });
  });

  it("writes back the same formulas and the same table parts, with the new results cached under their own error codes", () => {
    const before = storedFormulas(readFileSync(input));
    const after = storedFormulas(readFileSync(output));
    expect(after).toEqual(before);
    expect(tableParts(readFileSync(output))).toEqual(tableParts(readFileSync(input)));
    const parts = new Map(readZip(readFileSync(output)).map((e) => [e.name, e.data.toString("utf8")]));
    const budget = parts.get("xl/worksheets/sheet2.xml")!;
    expect(budget).toMatch(/<c r="K2" t="e" cm="1"><f t="array" ref="K2">[^<]*<\/f><v>#SPILL!<\/v>/);
    expect(budget).toMatch(/<c r="B10" t="e"><f>1\/0<\/f><v>#DIV\/0!<\/v>/);
    expect(budget).toMatch(/<c r="I2"[^>]* cm="1"><f t="array" ref="I2:I4">_xlfn\._xlws\.SORT\(D2:D4\)<\/f>/);
    expect(budget).toMatch(/<c r="B8" t="str"><f>_xlfn\.CONCAT\(&quot;Skerry&quot;,&quot;-1&quot;\)<\/f><v>Skerry-1<\/v>/);
    // Something was kept as saved: Excel is asked to recalculate everything on opening (§18.2.2 calcPr).
    expect(parts.get("xl/workbook.xml")).toMatch(/<calcPr[^>]*fullCalcOnLoad="1"/);
  });

  it("reads back from the written file the same values, in one pass", () => {
    expect(again.report.passes).toBe(1);
    for (const sheet of done.data.sheets)
      for (const f of sheet.formulas) {
        const cell = cellAddress(f.row, f.col);
        const a = done.value(sheet.name, cell);
        const b = again.value(sheet.name, cell);
        if (a instanceof DetailedCellError) expect((b as DetailedCellError).value, `${sheet.name}!${cell}`).toBe(a.value);
        else expect(b, `${sheet.name}!${cell}`).toEqual(a);
      }
  });
});
