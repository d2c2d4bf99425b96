import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { DetailedCellError } from "hyperformula";
import { recalcFile } from "../../src/runner/recalc";
import { CellError } from "../../src/runner/host";
import { readZip } from "../../src/runner/zip";
import { bundle, direct, readBook, sameCell, tempDir, writeBook } from "./support";

// Round trip through real .xlsx files written by exceljs: ORBIT formulas in the typed form a user
// writes and in the stored form Excel writes (_xldudf_ORBIT_<ID>, see names.ts for the sources)
// recalculate to what the functions return when called directly; the file written back holds the
// stored form, the results cached, and spilled results as array formulas over the cells they fill.

describe("recalculating a workbook written by exceljs", () => {
  it("gives every ORBIT cell, in typed and stored form, what a direct call gives", async () => {
    const dir = tempDir();
    const path = await writeBook(join(dir, "in.xlsx"), {
      "Orbit inputs": { A1: "Earth", B1: 690, C1: 520 },
      Results: {
        A1: { formula: "ORBIT.ALTITUDE_TO_RADIUS('Orbit inputs'!A1, 'Orbit inputs'!B1)" },
        A2: { formula: "_xldudf_ORBIT_ALTITUDE_TO_RADIUS('Orbit inputs'!A1, 'Orbit inputs'!C1)" },
        A3: { formula: "_xldudf_ORBIT_TRANSFER_DV(\"Earth\", A2, A1)" },
        A4: { formula: "ORBIT.TRANSFER_DV(\"Earth\", A2, A1)*1000" },
        A5: { formula: "_xldudf_ORBIT_SHAPE_FROM_APSES(A2, A1, TRUE)" },
      },
    });
    const done = await recalcFile(bundle(), path);
    const v = (c: string) => done.value("Results", c);
    const r690 = direct("ALTITUDE_TO_RADIUS", "Earth", 690)[0][0] as number;
    const r520 = direct("ALTITUDE_TO_RADIUS", "Earth", 520)[0][0] as number;
    expect(v("A1")).toBe(r690);
    expect(v("A2")).toBe(r520);
    const dv = direct("TRANSFER_DV", "Earth", r520, r690)[0][0] as number;
    expect(v("A3")).toBe(dv);
    expect(v("A4")).toBe(dv * 1000);
    const shape = direct("SHAPE_FROM_APSES", r520, r690, true);
    for (let i = 0; i < 2; i++) for (let j = 0; j < 2; j++) expect(sameCell(v(`${"AB"[j]}${5 + i}`), shape[i][j])).toBe(true);
    expect(done.report).toMatchObject({ sheets: 2, formulas: 5, orbitFormulas: 5, cellsRecalculated: 8, orbitErrors: [], otherErrors: [], kept: [], passes: 1 });
  });

  it("writes stored names, cached results and spilled arrays, and the written file recalculates the same", async () => {
    const dir = tempDir();
    const path = await writeBook(join(dir, "in.xlsx"), {
      Sheet1: {
        A1: 7000,
        A2: 8000,
        A3: 9000,
        B1: { formula: 'ORBIT.ORBITAL_SPEED("Earth", A1:A3)' },
        D1: { formula: 'ORBIT.BODY_TABLE("gm", G1)' },
        G1: "Earth, Moon",
        A5: { formula: 'ORBIT.BODY_VALUE("Earth", "kind")' },
        A6: { formula: 'ORBIT.BODY_GM("Earth")>0' },
      },
    });
    const out = join(dir, "out.xlsx");
    const first = await recalcFile(bundle(), path, { outPath: out });
    expect(first.report.passes).toBe(2); // BODY_TABLE's size follows G1's text: learned, then entered again
    const book = await readBook(out);
    const ws = book.getWorksheet("Sheet1")!;
    const speeds = direct("ORBITAL_SPEED", "Earth", [[7000], [8000], [9000]]);
    expect(ws.getCell("B1").value).toEqual({ formula: '_xldudf_ORBIT_ORBITAL_SPEED("Earth", A1:A3)', result: speeds[0][0], shareType: "array", ref: "B1:B3" });
    expect(ws.getCell("B2").value).toBe(speeds[1][0]);
    expect(ws.getCell("B3").value).toBe(speeds[2][0]);
    const table = direct("BODY_TABLE", "gm", "Earth, Moon");
    expect(ws.getCell("D1").value).toMatchObject({ formula: '_xldudf_ORBIT_BODY_TABLE("gm", G1)', result: table[0][0], ref: "D1:E2" });
    expect([ws.getCell("E1").value, ws.getCell("D2").value, ws.getCell("E2").value]).toEqual([table[0][1], table[1][0], table[1][1]]);
    expect(ws.getCell("A5").value).toEqual({ formula: '_xldudf_ORBIT_BODY_VALUE("Earth", "kind")', result: direct("BODY_VALUE", "Earth", "kind")[0][0], shareType: "array", ref: "A5" });
    expect(ws.getCell("A6").value).toEqual({ formula: '_xldudf_ORBIT_BODY_GM("Earth")>0', result: true, shareType: "array", ref: "A6" });

    // Every ORBIT formula is a dynamic array formula (cm="1" into XLDAPR cell metadata), as Excel stores them.
    const parts = new Map(readZip(readFileSync(out)).map((e) => [e.name, e.data.toString("utf8")]));
    const sheet = parts.get("xl/worksheets/sheet1.xml")!;
    const cellTag = (addr: string) => new RegExp(`<c r="${addr}"[^>]*>`).exec(sheet)?.[0] ?? "";
    for (const addr of ["B1", "D1", "A5", "A6"]) expect(cellTag(addr), addr).toMatch(/ cm="1"/);
    for (const addr of ["A1", "B2", "G1"]) expect(cellTag(addr), addr).not.toMatch(/ cm="/);
    expect(sheet).toMatch(/<c r="B1"[^>]*><f t="array" ref="B1:B3">_xldudf_ORBIT_ORBITAL_SPEED\(&quot;Earth&quot;, A1:A3\)<\/f>/);
    expect(parts.get("xl/metadata.xml")).toMatch(/<metadataType name="XLDAPR"[^>]*cellMeta="1"\/>.*<xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"\/>.*<cellMetadata count="1"><bk><rc t="1" v="0"\/><\/bk><\/cellMetadata>/);
    expect(parts.get("[Content_Types].xml")).toContain('<Override PartName="/xl/metadata.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml"/>');
    expect(parts.get("xl/_rels/workbook.xml.rels")).toMatch(/Type="http:\/\/schemas.openxmlformats.org\/officeDocument\/2006\/relationships\/sheetMetadata" Target="metadata.xml"/);

    // Reading the written file back: the spill cells are the array's, not inputs, and the
    // recorded array range sizes the table before evaluation (one pass).
    const again = await recalcFile(bundle(), out);
    expect(again.report.passes).toBe(1);
    expect(again.report.orbitFormulas).toBe(first.report.orbitFormulas);
    for (const c of ["B1", "B2", "B3", "D1", "E1", "D2", "E2", "A5"]) expect(again.value("Sheet1", c)).toEqual(first.value("Sheet1", c));
  });

  it("reports error cells with address, code and message, and caches the error codes", async () => {
    const dir = tempDir();
    const path = await writeBook(join(dir, "in.xlsx"), {
      Budget: {
        A1: 7000,
        A2: -1,
        B1: { formula: 'ORBIT.ORBITAL_SPEED("Earth", A1:A2)' },
        C1: { formula: "B2*1000" },
        D1: { formula: 'ORBIT.SUN_SYNC_INCLINATION("Earth", 40000, 0)' },
      },
    });
    const out = join(dir, "out.xlsx");
    const done = await recalcFile(bundle(), path, { outPath: out });
    const bad = direct("ORBITAL_SPEED", "Earth", -1)[0][0] as CellError;
    const none = direct("SUN_SYNC_INCLINATION", "Earth", 40000, 0)[0][0] as CellError;
    expect(done.report.orbitErrors).toEqual([
      { sheet: "Budget", cell: "B2", code: "#VALUE!", message: bad.message },
      { sheet: "Budget", cell: "D1", code: "#N/A", message: none.message },
    ]);
    expect(done.report.otherErrors).toEqual([{ sheet: "Budget", cell: "C1", code: "#VALUE!", message: bad.message }]);
    const ws = (await readBook(out)).getWorksheet("Budget")!;
    expect(ws.getCell("B2").value).toEqual({ error: "#VALUE!" });
    expect((ws.getCell("D1").value as { result: unknown }).result).toEqual({ error: "#N/A" });
  });

  it("clears the cells a spilled result no longer fills", async () => {
    const dir = tempDir();
    const path = await writeBook(join(dir, "in.xlsx"), {
      S: {
        A1: 7000,
        A2: 8000,
        B1: { formula: '_xldudf_ORBIT_ORBITAL_SPEED("Earth", A1:A2)', result: 1, shareType: "array", ref: "B1:B4" },
        B2: 2,
        B3: 3,
        B4: 4,
      },
    });
    const out = join(dir, "out.xlsx");
    const done = await recalcFile(bundle(), path, { outPath: out });
    const ws = (await readBook(out)).getWorksheet("S")!;
    expect(ws.getCell("B1").value).toMatchObject({ ref: "B1:B2", result: done.value("S", "B1") });
    expect(ws.getCell("B2").value).toBe(done.value("S", "B2"));
    expect([ws.getCell("B3").value, ws.getCell("B4").value]).toEqual([null, null]);
  });

  it("keeps the saved result of a formula the engine cannot compute, and says so", async () => {
    const dir = tempDir();
    const path = await writeBook(join(dir, "in.xlsx"), { S: { A1: { formula: "SOMEVENDORFUNCTION(1)", result: 42 }, A2: { formula: 'ORBIT.BODY_GM("Moon")' } } });
    const out = join(dir, "out.xlsx");
    const done = await recalcFile(bundle(), path, { outPath: out });
    expect(done.report.kept).toEqual([{ sheet: "S", cell: "A1", code: "#NAME?", message: "Function name SOMEVENDORFUNCTION not recognized" }]);
    expect(done.report.orbitErrors).toEqual([]);
    const ws = (await readBook(out)).getWorksheet("S")!;
    expect(ws.getCell("A1").value).toEqual({ formula: "SOMEVENDORFUNCTION(1)", result: 42 });
  });

  it("keeps the saved results of a circular reference, computes the cells that use them from those, and lists both", async () => {
    const dir = tempDir();
    const path = await writeBook(join(dir, "in.xlsx"), {
      S: { A1: { formula: "B1+1", result: 3 }, B1: { formula: "A1+1", result: 4 }, C1: { formula: "A1*2", result: 0 }, D1: { formula: 'ORBIT.BODY_GM("Moon")' } },
    });
    const out = join(dir, "out.xlsx");
    const done = await recalcFile(bundle(), path, { outPath: out });
    expect(done.report.kept.map((k) => [k.cell, k.code, k.message])).toEqual([
      ["A1", "#CYCLE!", "circular reference: the runner does not iterate"],
      ["B1", "#CYCLE!", "circular reference: the runner does not iterate"],
    ]);
    expect(done.value("S", "C1")).toBe(6);
    expect(done.report.dependOnKept).toEqual([{ sheet: "S", cell: "C1" }]);
    expect(done.report.otherErrors).toEqual([]);
    const ws = (await readBook(out)).getWorksheet("S")!;
    expect([ws.getCell("A1").value, ws.getCell("B1").value, ws.getCell("C1").value]).toEqual([
      { formula: "B1+1", result: 3 },
      { formula: "A1+1", result: 4 },
      { formula: "A1*2", result: 6 },
    ]);
  });

  it("keeps an ORBIT formula that uses a function the engine lacks, and counts it for the exit code", async () => {
    const path = await writeBook(join(tempDir(), "in.xlsx"), { S: { A1: { formula: 'ORBIT.BODY_GM(_xlfn.CONCAT("Ea","rth"))', result: 398600 }, A2: { formula: "ORBIT.NO_SUCH_FUNCTION(1)" } } });
    const done = await recalcFile(bundle(), path);
    expect(done.report.kept).toEqual([{ sheet: "S", cell: "A1", code: "#NAME?", message: "Function name CONCAT not recognized" }]);
    expect(done.report.keptOrbitFormulas).toBe(1);
    // An ORBIT function the build does not have is the answer Excel gives too: an error, not kept.
    expect(done.report.orbitErrors).toEqual([{ sheet: "S", cell: "A2", code: "#NAME?", message: "Function name ORBIT.NO_SUCH_FUNCTION not recognized." }]);
  });

  it("reads workbook names and shared formulas", async () => {
    const dir = tempDir();
    const path = await writeBook(
      join(dir, "in.xlsx"),
      {
        Inputs: { A1: 690 },
        Sweep: {
          A1: 7000,
          A2: 7100,
          A3: 7200,
          B1: { formula: 'ORBIT.ORBITAL_SPEED("Earth",A1)' },
          B2: { sharedFormula: "B1" },
          B3: { sharedFormula: "B1" },
          C1: { formula: 'ORBIT.ALTITUDE_TO_RADIUS("Earth", mission_altitude)' },
        },
      },
      { mission_altitude: "Inputs!$A$1" },
    );
    const done = await recalcFile(bundle(), path);
    for (const [cell, r] of [["B1", 7000], ["B2", 7100], ["B3", 7200]] as const) expect(done.value("Sweep", cell)).toBe(direct("ORBITAL_SPEED", "Earth", r)[0][0]);
    expect(done.value("Sweep", "C1")).toBe(direct("ALTITUDE_TO_RADIUS", "Earth", 690)[0][0]);
    expect(done.report.orbitFormulas).toBe(4);
  });

  it("refuses a workbook with no formulas before writing anything, when asked to", async () => {
    const dir = tempDir();
    const path = await writeBook(join(dir, "plain.xlsx"), { S: { A1: 1 } });
    const out = join(dir, "out.xlsx");
    await expect(recalcFile(bundle(), path, { outPath: out, requireFormulas: true })).rejects.toThrow(/has no formulas: nothing to recalculate/);
    expect(existsSync(out)).toBe(false);
  });

  it("keeps text as text and reads dates as Excel serials", async () => {
    const dir = tempDir();
    const path = await writeBook(join(dir, "in.xlsx"), {
      S: { A1: "2028", A2: new Date(Date.UTC(2028, 0, 1)) as unknown as number, B1: { formula: "ISTEXT(A1)" }, B2: { formula: "A2" } },
    });
    const done = await recalcFile(bundle(), path);
    expect(done.value("S", "B1")).toBe(true);
    // Excel serial of 2028-01-01: days since 1899-12-30 (from memory: Excel's 1900 date system).
    expect(done.value("S", "B2")).toBe((Date.UTC(2028, 0, 1) - Date.UTC(1899, 11, 30)) / 86_400_000);
    expect(done.value("S", "A1")).not.toBeInstanceOf(DetailedCellError);
  });
});
