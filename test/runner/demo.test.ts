import { spawnSync } from "node:child_process";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { DEMO_WORKBOOKS, writeDemoWorkbooks } from "../../examples/generate";
import { addressKey } from "../../src/runner/engine";
import { cellAddress as cellName, columnIndex as colOf } from "../../src/formula/cells";
import { callArguments, orbitCallAt, orbitCalls, rootOrbitCall } from "../../src/formula/scan";
import { recalcFile, type Recalculated } from "../../src/runner/recalc";
import { bundle, direct, ROOT, sameCell, tempDir } from "./support";

// The demo workbooks, recalculated by the runner, against direct calls of the same functions of
// the built bundle: for every ORBIT cell, its arguments are read back from the recalculated
// workbook (literals as written, cells and ranges as the runner computed them) and the function
// is called with them; every cell of the result must match exactly.

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

describe("the demo workbooks", () => {
  const recalculated: Recalculated[] = [];

  beforeAll(async () => {
    const paths = await writeDemoWorkbooks(tempDir());
    for (const p of paths) recalculated.push(await recalcFile(bundle(), p));
  });

  it("cover the Skerry budget, the altitude sweep, the handout and the Mars window, with no error anywhere", () => {
    expect(DEMO_WORKBOOKS.map((d) => d.file)).toEqual(["skerry-budget.xlsx", "skerry-altitude-sweep.xlsx", "skerry-handout.xlsx", "skerry-mars-window.xlsx"]);
    for (const done of recalculated) {
      expect(done.report.formulas).toBeGreaterThan(0);
      expect({ file: done.report.file, orbit: done.report.orbitErrors, other: done.report.otherErrors, kept: done.report.kept }).toEqual({ file: done.report.file, orbit: [], other: [], kept: [] });
    }
  });

  it("give every ORBIT cell exactly what a direct call of the same function with the same arguments gives", () => {
    let checked = 0;
    for (const done of recalculated) {
      done.data.sheets.forEach((sheet, s) => {
        for (const f of sheet.formulas) {
          if (orbitCalls(f.formula).length === 0) continue;
          const id = rootOrbitCall(f.formula);
          expect(id, `${sheet.name}!${cellName(f.row, f.col)}: one ORBIT call per formula`).toBeDefined();
          expect(orbitCalls(f.formula)).toHaveLength(1);
          const body = f.formula.replace(/^=/, "");
          const args = callArguments(body, orbitCallAt(body, 0)!.end).args.map((a) => argument(done, sheet.name, a));
          const returned = direct(id!, ...args);
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
    expect(checked).toBeGreaterThan(500);
  });

  it("print their key results through orbit-cells demo", () => {
    const r = spawnSync(process.execPath, [join(ROOT, "bin", "orbit-cells.js"), "demo", "--out", tempDir()], { cwd: ROOT, encoding: "utf8" });
    expect(r.stderr).toBe("");
    expect(r.status).toBe(0);
    for (const d of DEMO_WORKBOOKS) expect(r.stdout).toContain(`${d.file}: `);
    expect(r.stdout).toMatch(/Skerry-1 budget \(180 kg, Isp 225 s\)/);
    expect(r.stdout).toMatch(/Raise 520 km to 690 km/);
    expect(r.stdout).toMatch(/Lunar orbit insertion/);
    expect(r.stdout).toMatch(/Lowest departure C3 in the grid +\d+\.\d+ +km2\/s2/);
  });
});
