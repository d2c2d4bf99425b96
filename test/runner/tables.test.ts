import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { dynamicArrayCells, sheetParts, xmlParts, xmlText } from "../../src/runner/package";
import { parseTableSpec, readTables, restoreTables } from "../../src/runner/tables";
import { readZip } from "../../src/runner/zip";
import { tempDir } from "./support";
import { writeExcelLikeBook } from "./xlsx";

// Table parts as ECMA-376 Part 1 defines them (§18.5.1.2 table: displayName, ref, headerRowCount
// default 1, totalsRowCount default 0; §18.5.1.3 tableColumn), reached from a sheet through a
// relationship of type .../table (Part 2 relationships); names escaped as XML and as ST_Xstring
// (§22.9.2.19, `_xHHHH_`). Structured-reference items: MS-XLSX §2.2.2 intra-table-reference.

function fixture() {
  const path = writeExcelLikeBook(join(tempDir(), "tables.xlsx"), [
    { name: "Inputs", cells: { A1: 1 } },
    {
      name: "R&D plan",
      cells: { B3: "Burn", C3: "dv", B4: "raise", C4: 0.12, B5: "Total", C5: { f: "SUBTOTAL(109,Legs[dv])", cached: 0.12 }, E2: { f: "_xlfn._xlws.SORT(C4:C5)", cached: 0.12, array: "E2:E3", dynamic: true } },
      tables: [{ name: "Legs", ref: "B3:C5", columns: ["Burn", "dv"], totalsRow: true }],
    },
    { name: "Other", cells: { A1: "Line_x000A_break", A2: 2 }, tables: [{ name: "Notes", ref: "A1:A2", columns: ["Line_x000A_break"] }] },
  ]);
  return readZip(readFileSync(path));
}

describe("reading table parts", () => {
  it("finds each table with its sheet, area, header and totals rows and column names", () => {
    const tables = readTables(xmlParts(fixture()));
    expect(tables.map(({ xml: _xml, ...t }) => t)).toEqual([
      { name: "Legs", sheet: "R&D plan", row: 2, col: 1, rows: 3, cols: 2, headerRows: 1, totalsRows: 1, columns: ["Burn", "dv"] },
      { name: "Notes", sheet: "Other", row: 0, col: 0, rows: 2, cols: 1, headerRows: 1, totalsRows: 0, columns: ["Line\nbreak"] },
    ]);
  });

  it("reads XML escapes and ST_Xstring escapes in names", () => {
    expect(xmlText("R&amp;D &lt;1&gt; &quot;q&quot; &#233;&#x41;_x000A_")).toBe('R&D <1> "q" éA\n');
  });

  it("lists the sheets in order and the cells holding dynamic array formulas (cm on t=\"array\")", () => {
    const pkg = xmlParts(fixture());
    expect(sheetParts(pkg).map((s) => s.name)).toEqual(["Inputs", "R&D plan", "Other"]);
    expect([...dynamicArrayCells(pkg.get(sheetParts(pkg)[1].part)!)]).toEqual(["E2"]);
  });
});

describe("putting table parts back after exceljs", () => {
  it("replaces a rewritten table part by the original, and adds one that was dropped", () => {
    const entries = fixture();
    const originals = readTables(xmlParts(entries));
    // As if a writer had changed Legs and dropped Notes (part, relationship, tablePart).
    const damaged = entries
      .filter((e) => e.name !== "xl/tables/table2.xml" && e.name !== "xl/worksheets/_rels/sheet3.xml.rels")
      .map((e) => {
        const text = e.data.toString("utf8");
        if (e.name === "xl/tables/table1.xml") return { name: e.name, data: Buffer.from(text.replace('totalsRowCount="1"', 'headerRowCount="0"')) };
        if (e.name === "xl/worksheets/sheet3.xml") return { name: e.name, data: Buffer.from(text.replace(/<tableParts.*<\/tableParts>/, "")) };
        return e;
      });
    expect(readTables(xmlParts(damaged)).map((t) => [t.name, t.headerRows, t.totalsRows])).toEqual([["Legs", 0, 0]]);
    const fixed = restoreTables(damaged, originals);
    expect(readTables(xmlParts(fixed)).map((t) => [t.name, t.sheet, t.headerRows, t.totalsRows, t.xml === originals.find((o) => o.name === t.name)!.xml])).toEqual([
      ["Legs", "R&D plan", 1, 1, true],
      ["Notes", "Other", 1, 0, true],
    ]);
    const types = fixed.find((e) => e.name === "[Content_Types].xml")!.data.toString("utf8");
    expect(types).toMatch(/PartName="\/xl\/tables\/table2\.xml" ContentType="application\/vnd\.openxmlformats-officedocument\.spreadsheetml\.table\+xml"/);
  });
});

describe("intra-table references (MS-XLSX §2.2.2)", () => {
  it.each([
    ["[dv]", { keywords: [], columns: ["dv", "dv"] }],
    ["[#Data]", { keywords: ["#DATA"] }],
    ["[#This Row]", { keywords: ["#THIS ROW"] }],
    ["[[#Headers],[dv]]", { keywords: ["#HEADERS"], columns: ["dv", "dv"] }],
    ["[ [#Headers] , [#Data] , [Burn]:[dv] ]", { keywords: ["#HEADERS", "#DATA"], columns: ["Burn", "dv"] }],
    ["[@dv]", { keywords: ["#THIS ROW"], columns: ["dv", "dv"] }],
    ["[@[Burn]:[dv]]", { keywords: ["#THIS ROW"], columns: ["Burn", "dv"] }],
    ["[@]", { keywords: ["#THIS ROW"] }],
    ["[]", { keywords: [] }],
    ["['#1]", { keywords: [], columns: ["#1", "#1"] }],
  ])("%s", (text, spec) => {
    expect(parseTableSpec(text, 0)).toEqual({ spec, end: text.length });
  });

  it("refuses what is not one: an unknown keyword, an unclosed bracket, a column before a keyword", () => {
    for (const bad of ["[#Everything]", "[dv", "[[dv],[#Data]]"]) expect(parseTableSpec(bad, 0), bad).toBeUndefined();
  });
});
