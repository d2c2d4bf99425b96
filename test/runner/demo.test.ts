import { spawnSync } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";
import type ExcelJS from "exceljs";
import { beforeAll, describe, expect, it } from "vitest";
import { cellAddress as cellName, columnIndex as colOf, parseCell } from "../../src/formula/cells";
import { callArguments, orbitCallAt, orbitCalls, rootOrbitCall } from "../../src/formula/scan";
import { runDemo } from "../../src/runner/demo";
import { writeDemoWorkbooks } from "../../src/runner/demobook";
import { addressKey } from "../../src/runner/engine";
import { recalcFile, type Recalculated } from "../../src/runner/recalc";
import { readZip } from "../../src/runner/zip";
import { layoutSheet, SCENARIO } from "../../src/scenario";
import { INPUT_FILL } from "../../src/scenario/styles";
import { CellError } from "../../src/runner/host";
import { recalcSheet, unwrapAnswer } from "../support/scenario";
import { bundle, direct, readBook, ROOT, sameCell, tempDir } from "./support";

// The demo workbooks, made by the runner's writer (src/runner/demobook.ts) from the scenario's
// sheets (src/scenario), read back and recalculated by the runner: against direct calls of the
// same functions of the built bundle, and against the pane's template of the same sheet.

/** An argument as Excel passes it: a literal, or the cells of a reference as the runner computed them (blank as 0). */
function argument(done: Recalculated, sheet: string, text: string): unknown {
  if (text === "") return null;
  if (/^".*"$/.test(text)) return text.slice(1, -1).replace(/""/g, '"');
  if (/^(TRUE|FALSE)$/i.test(text)) return text.toUpperCase() === "TRUE";
  if (/^-?\d+(\.\d+)?(e[+-]?\d+)?$/i.test(text)) return Number(text);
  const m = /^\$?([A-Z]{1,3})\$?(\d+)(?::\$?([A-Z]{1,3})\$?(\d+))?$/.exec(text);
  if (!m) throw new Error(`the demo's ORBIT calls take literals, cells and ranges; got ${text}`);
  const [r0, c0] = [Number(m[2]) - 1, colOf(m[1])];
  const [r1, c1] = m[3] ? [Number(m[4]) - 1, colOf(m[3])] : [r0, c0];
  const rows: unknown[][] = [];
  for (let r = r0; r <= r1; r++) {
    const row: unknown[] = [];
    for (let c = c0; c <= c1; c++) {
      const v = done.value(sheet, cellName(r, c));
      row.push(v === null ? 0 : v);
    }
    rows.push(row);
  }
  return rows;
}

/** A cell as exceljs read it back: formulas in the typed form with "=", dates (date-formatted numbers) as Excel serials. */
function written(cell: ExcelJS.Cell): string | number | null {
  const v = cell.value as unknown;
  if (v === null || v === undefined) return null;
  if (v instanceof Date) return v.getTime() / 86_400_000 + 25569;
  if (typeof v === "object" && v !== null && "formula" in v) return `=${(v as { formula: string }).formula}`;
  return v as string | number;
}

describe("the demo workbooks", () => {
  const folder = tempDir();
  let paths: string[] = [];
  const recalculated: Recalculated[] = [];

  beforeAll(async () => {
    paths = await writeDemoWorkbooks(folder, SCENARIO);
    for (const p of paths) recalculated.push(await recalcFile(bundle(), p, { outPath: p.replace(/\.xlsx$/, "-recalculated.xlsx") }));
  });

  it("are one file per sheet of the scenario (budget, lifetime, ground contact, sweep, handout, lunar baseline, Mars window), with no error anywhere", () => {
    expect(paths.map((p) => p.slice(folder.length + 1))).toEqual([
      "skerry-budget.xlsx",
      "skerry-lifetime.xlsx",
      "skerry-ground-contact.xlsx",
      "skerry-altitude-sweep.xlsx",
      "skerry-handout.xlsx",
      "skerry-l-lunar.xlsx",
      "skerry-l-mars-window.xlsx",
    ]);
    for (const done of recalculated) {
      expect(done.report.formulas).toBeGreaterThan(0);
      expect({ file: done.report.file, orbit: done.report.orbitErrors, other: done.report.otherErrors, kept: done.report.kept }).toEqual({ file: done.report.file, orbit: [], other: [], kept: [] });
    }
  });

  it("give every ORBIT cell exactly what a direct call of the same function with the same arguments gives", () => {
    let checked = 0;
    let answered = 0;
    for (const done of recalculated) {
      done.data.sheets.forEach((sheet, s) => {
        for (const f of sheet.formulas) {
          if (orbitCalls(f.formula).length === 0) continue;
          // A call whose #N/A is an answer stands in IFNA(call, "words"): the cell holds the words exactly where the call gives #N/A.
          const { formula, words } = unwrapAnswer(f.formula.startsWith("=") ? f.formula : `=${f.formula}`);
          const id = rootOrbitCall(formula);
          expect(id, `${sheet.name}!${cellName(f.row, f.col)}: one ORBIT call per formula`).toBeDefined();
          expect(orbitCalls(formula)).toHaveLength(1);
          const body = formula.replace(/^=/, "");
          const args = callArguments(body, orbitCallAt(body, 0)!.end).args.map((a) => argument(done, sheet.name, a));
          const called = direct(id!, ...args);
          const returned = words === undefined ? called : called.map((r) => r.map((v) => (v instanceof CellError && v.code === "#N/A" ? words : v)));
          if (words !== undefined) answered++;
          const rows = returned.length;
          const cols = Math.max(...returned.map((r) => r.length));
          if (rows * cols > 1) expect(done.engine.spills.get(addressKey({ sheet: s, row: f.row, col: f.col }))).toEqual({ rows, cols });
          for (let i = 0; i < rows; i++)
            for (let j = 0; j < cols; j++) {
              const at = `${sheet.name}!${cellName(f.row + i, f.col + j)}`;
              const got = done.value(sheet.name, cellName(f.row + i, f.col + j));
              expect(sameCell(got, returned[i][j] ?? ""), `${at}: runner ${JSON.stringify(got)}, direct ${JSON.stringify(returned[i][j])}`).toBe(true);
              checked++;
            }
        }
      });
    }
    expect(checked).toBeGreaterThan(1500);
    expect(answered).toBe(3);
  });

  it.each(SCENARIO.map((t, i) => [t.id, t, i] as const))("%s: the demo file holds exactly what the pane's template writes: inputs, formulas, formats, input shading, widths", async (_id, t, i) => {
    const book = await readBook(paths[i]);
    expect(book.worksheets.map((w) => w.name)).toEqual([t.sheetName]);
    const ws = book.worksheets[0];
    const layout = layoutSheet(t);
    const differences: string[] = [];
    for (let r = 0; r < Math.max(layout.rows, ws.rowCount); r++)
      for (let c = 0; c < Math.max(layout.cols, ws.columnCount); c++) {
        const ref = cellName(r, c);
        const cell = ws.getCell(ref);
        const pane = layout.formulas[r]?.[c] ?? "";
        const demo = written(cell) ?? "";
        if (demo !== pane) differences.push(`${ref}: pane ${JSON.stringify(pane)}, demo ${JSON.stringify(demo)}`);
        const format = layout.numberFormats[r]?.[c] ?? "General";
        if ((cell.numFmt || "General") !== format) differences.push(`${ref}: format pane ${format}, demo ${cell.numFmt}`);
      }
    for (const ref of layout.roles.get("input") ?? []) {
      const fill = ws.getCell(ref).fill as ExcelJS.FillPattern | undefined;
      if (fill?.fgColor?.argb !== `FF${INPUT_FILL.slice(1)}`) differences.push(`${ref}: input not shaded`);
    }
    t.widths.forEach((w, c) => {
      if (ws.getColumn(c + 1).width !== w) differences.push(`column ${c + 1}: width ${ws.getColumn(c + 1).width}, want ${w}`);
    });
    expect(differences).toEqual([]);
  });

  it.each(SCENARIO.map((t, i) => [t.id, t, i] as const))("%s: the demo workbook and the pane's template recalculate to the same value in every cell", (_id, t, i) => {
    const pane = recalcSheet(t);
    const demo = recalculated[i];
    const differences: string[] = [];
    let numbers = 0;
    for (let r = 0; r < pane.rows; r++)
      for (let c = 0; c < pane.cols; c++) {
        const ref = cellName(r, c);
        const a = pane.value(ref);
        const b = demo.value(t.sheetName, ref);
        if (typeof a === "number") numbers++;
        const same = typeof a === "object" && a !== null ? typeof b === "object" && b !== null && (a as { value: unknown }).value === (b as { value: unknown }).value : Object.is(a, b) || (a === null && b === "") || (a === "" && b === null);
        if (!same) differences.push(`${ref}: pane ${JSON.stringify(a)}, demo ${JSON.stringify(b)}`);
      }
    expect(differences).toEqual([]);
    expect(numbers).toBeGreaterThan(20);
  });

  it("keep the transfer grid's colour scale in the written file, through the runner's recalculation", () => {
    const t = SCENARIO.find((s) => s.colourScale)!;
    const scale = t.colourScale!;
    const i = SCENARIO.indexOf(t);
    for (const path of [paths[i], paths[i].replace(/\.xlsx$/, "-recalculated.xlsx")]) {
      const sheetXml = readZip(readFileSync(path))
        .find((e) => e.name === "xl/worksheets/sheet1.xml")!
        .data.toString("utf8");
      // ECMA-376 Part 1 §18.3.1.18 conditionalFormatting, §18.3.1.16 colorScale: three cfvo (lowest, 50th percentile, highest) and three colours.
      const rule = new RegExp(
        `<conditionalFormatting sqref="${scale.range}"><cfRule type="colorScale" priority="1"><colorScale><cfvo type="min"/><cfvo type="percentile" val="50"/><cfvo type="max"/>` +
          `<color rgb="FF${scale.low.slice(1)}"/><color rgb="FF${scale.mid.slice(1)}"/><color rgb="FF${scale.high.slice(1)}"/></colorScale></cfRule></conditionalFormatting>`,
      );
      expect(sheetXml, path).toMatch(rule);
    }
  });

  it("carry no chart (exceljs cannot write one) but say where the pane's template draws it", () => {
    const t = SCENARIO.find((s) => s.chart)!;
    const names = readZip(readFileSync(paths[SCENARIO.indexOf(t)])).map((e) => e.name);
    expect(names.filter((n) => /chart|drawing/.test(n))).toEqual([]);
    const note = t.cells.find((c) => c.ref === t.chart!.from)!;
    expect(String(note.content)).toMatch(/cannot write charts/);
    expect(parseCell(t.chart!.from)).not.toBeNull();
  });

  it("print their key results through orbit-cells demo", () => {
    const r = spawnSync(process.execPath, [join(ROOT, "bin", "orbit-cells.js"), "demo", "--out", tempDir()], { cwd: ROOT, encoding: "utf8" });
    expect(r.stderr).toBe("");
    expect(r.status).toBe(0);
    for (const t of SCENARIO) expect(r.stdout).toContain(`${t.file}: `);
    expect(r.stdout).toMatch(/Skerry-1 budget \(180 kg, Isp 225 s\): 520 km at 97\.4 deg to 690 km sun-synchronous/);
    expect(r.stdout).toMatch(/Raise to the mission orbit \(Hohmann, two burns\) +\d+\.\d +\d+\.\d+ +\d+\.\d+/);
    expect(r.stdout).toMatch(/Skerry-1E: 20 mN at Isp 1500 s/);
    expect(r.stdout).toMatch(/Miss of the hold point in exact two-body motion +\d+\.\d+ +m/);
    expect(r.stdout).toMatch(/ 690 +7\.5096 /);
    expect(r.stdout).toMatch(/Lunar orbit insertion +\d+\.\d +m\/s/);
    expect(r.stdout).toMatch(/Lowest departure C3 in the grid +\d+\.\d+ +km²\/s²/);
    expect(r.stdout).toMatch(/Departure +20\d\d-\d\d-\d\d/);
    expect(r.stdout).toMatch(/No chart in this file: exceljs cannot write charts/);
    // The budget's station keeping is the drag make-up at high activity, the lifetime sheet's last column.
    expect(r.stdout).toMatch(/Station keeping: drag make-up at the mission orbit \(Earth only\) +\d+\.\d +\d+\.\d+ +\d+\.\d+/);
    expect(r.stdout).toMatch(/Station keeping: drag make-up over 5 years at 220 sfu, without margin +0\.0\d+ +km\/s/);
    expect(r.stdout).toMatch(/Skerry-1 lifetime and disposal \(180 kg, 1\.2 m², C_D 2\.2; from 2032-01-01/);
    expect(r.stdout).toMatch(/Lifetime in the 690 km mission orbit +over 200 years +\d+\.\d +\d+\.\d +years/);
    expect(r.stdout).toMatch(/Highest disposal perigee, 5-year rule +\d+\.\d +\d+\.\d +\d+\.\d +km/);
    expect(r.stdout).toMatch(/250 km perigee meets the 5-year rule +yes +yes +yes/);
    expect(r.stdout).toMatch(/Skerry-1 over Skerry Ground \(invented station and element set\), the week from 2026-06-01, above 10 deg/);
    expect(r.stdout).toMatch(/2026-06-01 +\d+\.\d +\d+\n/);
    expect(r.stdout).toMatch(/Passes in the week +\d+\n/);
    expect(r.stdout).toMatch(/Slant range at 10 deg elevation +\d{4}\.\d +km/);
    expect(r.stdout).toMatch(/Free-space path loss at 2\.2 GHz +\d{3}\.\d+ +dB/);
    expect(r.stdout).toMatch(/2026-06-01 \d\d:\d\d:\d\d +2026-06-01 \d\d:\d\d:\d\d +\d+\.\d +2026-06-01 \d\d:\d\d:\d\d +\d+/);
    expect(r.stdout).not.toMatch(/#(VALUE|N\/A|NUM)!/);
  });

  it("skip, with a line saying why, a sheet whose functions this build lacks (a sheet waiting for its family)", async () => {
    const handout = SCENARIO.find((t) => t.id === "handout")!;
    const waiting = { ...handout, id: "waiting", file: "skerry-waiting.xlsx", cells: [...handout.cells, { ref: "Z1", content: "=ORBIT.NOT_IN_THIS_BUILD(A1)", role: "result" as const }] };
    const out: string[] = [];
    const io = { stdout: { write: (x: string) => out.push(x) }, stderr: { write: (x: string) => out.push(x) } };
    const dir = tempDir();
    expect(await runDemo(bundle(), dir, io, [handout, waiting])).toBe(0);
    const text = out.join("");
    expect(text).toContain("skerry-waiting.xlsx: skipped, this build lacks NOT_IN_THIS_BUILD.");
    expect(text).toMatch(/skerry-handout\.xlsx: \d+ formulas/);
    expect(existsSync(join(dir, "skerry-waiting.xlsx"))).toBe(false);
    expect(existsSync(join(dir, "skerry-handout.xlsx"))).toBe(true);
  });
});
