import { mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import ExcelJS from "exceljs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { BODIES } from "../../src/catalogue/bodies";
import { blockAddress, cellAddress, parseCell } from "../../src/taskpane/cells";
import { buildTablePlan, DEFAULT_BODIES, DEFAULT_FIELDS, DEFAULT_UNITS, formatWith, planSize, type TableRequest } from "../../src/taskpane/catalogueTable";
import { luminance } from "../../src/taskpane/theme";
import { layoutTemplate, missingFunctions, TEMPLATES } from "../../src/taskpane/templates";
import { addressKey, buildEngine } from "../../src/runner/engine";
import { loadBundle } from "../../src/runner/host";
import { toEngineFormula } from "../../src/runner/names";
import { writeDemoWorkbooks } from "../../src/runner/demobook";
import { BUDGET_CELLS } from "../../src/scenario/budget";
import { GROUND_CELLS } from "../../src/scenario/ground";
import { LIFETIME_CELLS } from "../../src/scenario/lifetime";
import { widthInPoints } from "../../src/scenario/styles";
import { recalcSheet } from "../support/scenario";
import { DIST, OFFICE_DARK, OFFICE_LIGHT, openPane, startHarness, stub, type Harness, type PanePage } from "./harness";

// The built pane (dist/) in Debian's Chromium, with office-stub.js standing in for Office.js over
// an in-memory workbook. Every test also checks that no cell holding data was written over.
// The tests write no files in the repository (the demo workbook a template is compared with goes
// to the system's temporary folder); `npm run screenshots` refreshes docs/screenshots.

const functionsJson = JSON.parse(readFileSync(join(DIST, "functions.json"), "utf8")) as { functions: { id: string }[] };

/** The A1 block an insertion of this request writes from (row, col): table, blank row, notes. */
const written = (req: TableRequest, row: number, col: number) => {
  const size = planSize(buildTablePlan(req));
  return blockAddress(row, col, size.rows, size.cols);
};
const DEFAULTS: TableRequest = { bodies: DEFAULT_BODIES, fields: DEFAULT_FIELDS, units: DEFAULT_UNITS };

let h: Harness;
const opened: PanePage[] = [];

async function pane(cfg: Parameters<typeof openPane>[1] = {}): Promise<PanePage> {
  const p = await openPane(h, cfg);
  opened.push(p);
  return p;
}

const statusOf = async (p: PanePage, id: string) => {
  await p.page.waitForSelector(`#${id} .msg.ok, #${id} .msg.warn, #${id} .msg.err`);
  return (await p.page.textContent(`#${id}`)) ?? "";
};

beforeAll(async () => {
  h = await startHarness();
});

afterAll(async () => {
  // Nothing left the machine but the (stubbed) Office.js request; no page broke.
  const problems = opened.map((p) => [...p.pageErrors, ...p.consoleErrors]).flat();
  await h?.close();
  expect(problems).toEqual([]);
});

type StubCells = Record<string, { value: unknown; formula: string } | null>;

/** A stub sheet as the engine's rows of contents (formulas in the engine's form). */
function engineSheet(cells: StubCells): (string | number | boolean | null)[][] {
  const grid: (string | number | boolean | null)[][] = [];
  for (const [ref, c] of Object.entries(cells)) {
    if (!c || (c.value === "" && c.formula === "")) continue;
    const at = parseCell(ref)!;
    while (grid.length <= at.row) grid.push([]);
    grid[at.row][at.col] = c.formula ? toEngineFormula(c.formula) : (c.value as string | number | boolean);
  }
  return grid.map((row) => Array.from({ length: row.length }, (_, i) => row[i] ?? null));
}

describe("from an empty workbook", () => {
  it("the pane alone gives a sourced catalogue table and a budget sheet that recalculates", async () => {
    const p = await pane();
    expect(await stub(p.page, "dump", "Sheet1")).toEqual({});
    await p.page.click('[data-derived="soi_radius"]');
    await p.page.click("#insert-table");
    expect(await statusOf(p, "catalogue-status")).toContain("Inserted table OrbitBodies at Sheet1!A1:");
    await p.page.click("#tab-templates");
    await p.page.click('[data-template="budget"]');
    expect(await statusOf(p, "templates-status")).toContain("Added 'Skerry-1 budget'!A1:");

    // What the pane wrote, recalculated by the headless runner's engine with the built functions.
    const sheets: Record<string, (string | number | boolean | null)[][]> = {};
    for (const name of await stub<string[]>(p.page, "sheetNames")) sheets[name] = engineSheet(await stub<StubCells>(p.page, "cells", name));
    const { hf } = buildEngine(loadBundle(DIST), sheets);
    const budget = hf.getSheetId("Skerry-1 budget")!;
    const errors: string[] = [];
    for (const [name, grid] of Object.entries(sheets))
      grid.forEach((row, r) =>
        row.forEach((c, col) => {
          if (typeof c !== "string" || !c.startsWith("=")) return;
          const v = hf.getCellValue({ sheet: hf.getSheetId(name)!, row: r, col });
          if (typeof v === "object" && v !== null) errors.push(`${name}!${String.fromCharCode(65 + col)}${r + 1}`);
        }),
      );
    expect(errors).toEqual([]);
    const value = (ref: string) => hf.getCellValue({ sheet: budget, ...parseCell(ref)! });
    const propellant = value(BUDGET_CELLS.propellant) as number;
    expect(propellant).toBeGreaterThan(0);
    expect(propellant).toBeLessThan(180); // less than the whole spacecraft
    // The Skerry-1E block as the pane wrote it recalculates to what the scenario's sheet gives.
    const direct = recalcSheet(TEMPLATES.find((t) => t.id === "budget")!);
    for (const ref of [BUDGET_CELLS.propellant, BUDGET_CELLS.lowDv, BUDGET_CELLS.approach, BUDGET_CELLS.miss]) expect({ ref, v: value(ref) }).toEqual({ ref, v: direct.value(ref) });
    expect(await stub<string[]>(p.page, "overwrites")).toEqual([]);
  });
});

describe("the pane loads", () => {
  it("with no page error, no CSP violation, no layout shift and no request but Office.js", async () => {
    const p = await pane();
    await p.page.waitForTimeout(300);
    expect(p.pageErrors).toEqual([]);
    expect(await p.page.evaluate(() => (window as unknown as { __csp: string[] }).__csp)).toEqual([]);
    const shifts = await p.page.evaluate(() => (window as unknown as { __shifts: number[] }).__shifts);
    expect(shifts.reduce((a, b) => a + b, 0)).toBe(0);
    expect(h.blocked).toEqual([]);
    expect(h.officeJsRequests).toBeGreaterThan(0);
  });

  it("registers every worksheet function in the shared runtime and lists each in the guide", async () => {
    const p = await pane();
    const ids = functionsJson.functions.map((f) => f.id).sort();
    expect((await stub<string[]>(p.page, "associated")).sort()).toEqual(ids);
    const listed = await p.page.$$eval("#guide-list > li[data-function]", (lis) => lis.map((li) => li.getAttribute("data-function")));
    expect([...listed].sort()).toEqual(ids);
  });

  it("fits a 320 px pane without sideways scrolling, and every control has a name", async () => {
    const p = await pane({ width: 320 });
    for (const tab of ["#tab-catalogue", "#tab-templates", "#tab-guide"]) {
      await p.page.click(tab);
      expect(await p.page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(320);
    }
    const unnamed = await p.page.$$eval("input, button, select, textarea, summary", (els) =>
      els
        .filter((e) => {
          const input = e as HTMLInputElement;
          const label = (input.labels?.length ?? 0) > 0 || e.getAttribute("aria-label") || e.getAttribute("aria-labelledby");
          return !label && (e.textContent ?? "").trim() === "";
        })
        .map((e) => e.outerHTML.slice(0, 80)),
    );
    expect(unnamed).toEqual([]);
  });

  it("says so, and writes nothing, when it is not running in Excel", async () => {
    const p = await pane({ host: null });
    expect(await p.page.isDisabled("#insert-table")).toBe(true);
    expect(await p.page.textContent("#catalogue-status")).toContain("Open this pane in Excel");
  });
});

describe("Body catalogue", () => {
  it("inserts a named Excel table with number formats and its sources into an empty area", async () => {
    const p = await pane();
    await stub(p.page, "select", "Sheet1", "B2");
    await p.page.click("#insert-table");
    const text = await statusOf(p, "catalogue-status");
    expect(text).toContain(`Inserted table OrbitBodies at Sheet1!${written(DEFAULTS, 1, 1)}:`);

    const [table] = await stub<{ name: string; address: string; hasHeaders: boolean; header: string[] }[]>(p.page, "tables");
    expect(table).toMatchObject({ name: "OrbitBodies", hasHeaders: true });
    expect(table.address).toBe("B2:H12"); // header + 10 default bodies; Body, 5 fields, Sources
    expect(table.header).toEqual(["Body", "GM (km³/s²)", "Equatorial radius (km)", "Mean radius (km)", "J2", "Rotation period (s)", "Sources"]);

    // Earth's row holds the catalogue's own numbers (one source of truth), not rounded copies.
    const earth = BODIES.find((b) => b.name === "Earth")!;
    const cells = await stub<Record<string, { value: unknown; numberFormat: string } | null>>(p.page, "cells", "Sheet1");
    const earthRow = Object.entries(cells).find(([, c]) => c?.value === "Earth")![0].slice(1);
    expect(cells[`C${earthRow}`]!.value).toBe(earth.gm.value);
    expect(cells[`D${earthRow}`]!.value).toBe(earth.equatorialRadius.value);
    expect(cells[`C${earthRow}`]!.numberFormat).toMatch(/E\+00$/); // GM spans 1e-4..1e11: scientific
    expect(cells[`D${earthRow}`]!.numberFormat).toMatch(/^#,##0\.0+$/);
    expect(String(cells[`H${earthRow}`]!.value)).toContain("JPL DE440: GM");
    // Note rows: the full citations, after one blank row.
    expect(cells["B13"]).toBeUndefined();
    expect(String(cells["B14"]!.value)).toMatch(/^Sources of the values above/);
    const notes = Object.entries(cells).filter(([ref]) => /^B(1[4-9]|[2-9]\d)$/.test(ref)).map(([, c]) => String(c!.value));
    expect(notes.some((n) => n.startsWith("JPL DE440: Park, R. S."))).toBe(true);
    expect(await stub<string[]>(p.page, "overwrites")).toEqual([]);
  });

  it("follows the units, the body and field choices and the filter in the preview and the table", async () => {
    const p = await pane();
    await p.page.click('[data-pick="none"]');
    expect(await p.page.isDisabled("#insert-table")).toBe(true);
    await p.page.fill("#body-filter", "jup");
    expect(await p.page.isVisible('[data-body="Jupiter"]')).toBe(true);
    expect(await p.page.isVisible('[data-body="Earth"]')).toBe(false);
    await p.page.click('[data-pick="all"]'); // all bodies the filter shows: Jupiter and its moons
    await p.page.fill("#body-filter", "");
    await p.page.click('[data-field="sma"]');
    await p.page.click('[data-field="j2"]');
    await p.page.check('input[name="unit-distance"][value="m"]');
    await p.page.check('input[name="unit-gm"][value="m3/s2"]');
    await p.page.check('input[name="unit-time"][value="day"]');
    const head = await p.page.$$eval("#preview thead th", (ths) => ths.map((t) => t.textContent));
    expect(head).toEqual(["Body", "GM (m³/s²)", "Equatorial radius (m)", "Mean radius (m)", "Rotation period (day)", "Semi-major axis (m)", "Sources"]);
    const rows = await p.page.$$eval("#preview tbody th", (ths) => ths.map((t) => t.textContent));
    expect(rows).toEqual(["Jupiter", "Io", "Europa", "Ganymede", "Callisto"]);

    await p.page.click("#insert-table-sheet");
    const req: TableRequest = {
      bodies: ["Jupiter", "Io", "Europa", "Ganymede", "Callisto"],
      fields: ["gm", "equatorial_radius", "mean_radius", "rotation_period", "sma"],
      units: { distance: "m", gm: "m3/s2", time: "day" },
    };
    expect(await statusOf(p, "catalogue-status")).toContain(`Inserted table OrbitBodies at 'Body catalogue'!${written(req, 0, 0)}:`);
    expect((await stub<{ address: string }[]>(p.page, "tables"))[0].address).toBe("A1:G6");
    const cells = await stub<Record<string, { value: unknown } | null>>(p.page, "cells", "Body catalogue");
    const jupiter = BODIES.find((b) => b.name === "Jupiter")!;
    expect(cells["B2"]!.value).toBe(jupiter.gm.value * 1e9);
    expect(cells["C2"]!.value).toBe(jupiter.equatorialRadius.value * 1e3);
    expect(cells["E2"]!.value).toBe(jupiter.rotationPeriod!.value / 86400);
  });

  it("refuses a target that holds data, writes nothing, and offers the nearest free area", async () => {
    const p = await pane();
    await stub(p.page, "setCell", "Sheet1", "D5", "keep me");
    await stub(p.page, "setCell", "Sheet1", "F3", "=1+1");
    await stub(p.page, "select", "Sheet1", "B2");
    await p.page.click("#insert-table");
    const text = await statusOf(p, "catalogue-status");
    const target = written(DEFAULTS, 1, 1);
    expect(target).toMatch(/^B2:H\d+$/);
    expect(text).toContain(`Nothing was written. Sheet1!${target} is not empty: 2 cells hold data, the first at F3.`);
    expect(await stub(p.page, "tables")).toEqual([]);
    expect(await stub(p.page, "dump", "Sheet1")).toEqual({ D5: "keep me", F3: "=1+1" });
    // Same size (7 columns, table plus notes): to the right the first clear block starts past
    // column F (G2); below, past row 5 (B6).
    const offers = await p.page.$$eval("#catalogue-status .offers button", (bs) => bs.map((b) => b.textContent));
    expect(offers).toEqual(["Insert at G2 (right)", "Insert at B6 (below)", "Insert on a new sheet"]);
    expect(await p.page.evaluate(() => document.activeElement?.textContent)).toBe("Insert at G2 (right)");

    await p.page.click("text=Insert at G2 (right)");
    expect(await statusOf(p, "catalogue-status")).toContain(`Inserted table OrbitBodies at Sheet1!${written(DEFAULTS, 1, 6)}:`);
    const dump = await stub<Record<string, unknown>>(p.page, "dump", "Sheet1");
    expect(dump.D5).toBe("keep me");
    expect(dump.F3).toBe("=1+1");
    expect(dump.G2).toBe("Body");
    expect(await stub<string[]>(p.page, "overwrites")).toEqual([]);

    // The same place again is now full: refused, and the table already there is untouched.
    await stub(p.page, "select", "Sheet1", "G2");
    await p.page.click("#insert-table");
    expect(await statusOf(p, "catalogue-status")).toContain(`Nothing was written. Sheet1!${written(DEFAULTS, 1, 6)} is not empty`);
    expect((await stub<unknown[]>(p.page, "tables")).length).toBe(1);
    expect(await stub<string[]>(p.page, "overwrites")).toEqual([]);
  });

  it("adds a live formula column (SOI radius) on each row's Body cell, blank for the Sun", async () => {
    const p = await pane();
    await p.page.click('[data-derived="soi_radius"]');
    expect(await p.page.textContent("#preview tbody tr:nth-child(2) td.live")).toBe("formula");
    await stub(p.page, "select", "Sheet1", "B2");
    await p.page.click("#insert-table");
    expect(await statusOf(p, "catalogue-status")).toContain("Inserted table OrbitBodies at Sheet1!");
    const [table] = await stub<{ header: string[] }[]>(p.page, "tables");
    const col = String.fromCharCode(66 + table.header.indexOf("SOI radius (km)"));
    const cells = await stub<Record<string, { value: unknown; formula: string } | null>>(p.page, "cells", "Sheet1");
    expect(cells["B3"]!.value).toBe("Sun");
    expect(cells[`${col}3`]?.formula ?? "").toBe("");
    expect(cells["B4"]!.value).toBe("Mercury");
    expect(cells[`${col}4`]!.formula).toBe("=ORBIT.SOI_RADIUS(B4)");
  });

  it("refuses a block that would run past the sheet's edge and offers a new sheet", async () => {
    const p = await pane();
    await stub(p.page, "select", "Sheet1", "XFB1");
    await p.page.click("#insert-table");
    expect(await statusOf(p, "catalogue-status")).toContain("would run past the edge of the sheet");
    const offers = await p.page.$$eval("#catalogue-status .offers button", (bs) => bs.map((b) => b.textContent));
    expect(offers).toEqual(["Insert on a new sheet"]);
    await p.page.click("text=Insert on a new sheet");
    expect(await statusOf(p, "catalogue-status")).toContain("'Body catalogue'!A1");
  });
});

describe("Sheet templates", () => {
  const available = new Set(functionsJson.functions.map((f) => f.id));

  it.each(TEMPLATES.map((t) => [t.id, t] as const))("%s: inserts a new sheet of live formulas with marked inputs, its colour scale and chart, as the demo's workbook holds it", async (_id, t) => {
    const p = await pane();
    await p.page.click("#tab-templates");
    const missing = missingFunctions(t, available);
    if (missing.length > 0) {
      // A template whose function is not in this build is described but not offered.
      expect(await p.page.$(`[data-template="${t.id}"]`)).toBeNull();
      expect(await p.page.textContent(`[data-unavailable="${t.id}"]`)).toContain(missing.join(", "));
      return;
    }
    await stub(p.page, "setCell", "Sheet1", "A1", "existing work");
    await p.page.click(`[data-template="${t.id}"]`);
    const text = await statusOf(p, "templates-status");
    expect(text).toContain(`Added '${t.sheetName}'!A1:`);
    expect(await stub<string[]>(p.page, "sheetNames")).toEqual(["Sheet1", t.sheetName]);
    expect(await stub(p.page, "dump", "Sheet1")).toEqual({ A1: "existing work" });

    const cells = await stub<Record<string, { value: unknown; formula: string; numberFormat: string; format: Record<string, unknown> } | null>>(p.page, "cells", t.sheetName);
    const layout = layoutTemplate(t);
    let formulas = 0;
    for (const c of t.cells) {
      if (c.content === "") continue;
      const got = cells[c.ref]!;
      if (typeof c.content === "string" && c.content.startsWith("=")) {
        formulas++;
        expect(got.formula, c.ref).toBe(c.content); // a live formula, not a value
      } else expect(got.value, c.ref).toBe(c.content);
      if (c.format) expect(got.numberFormat, c.ref).toBe(c.format);
    }
    expect(formulas).toBeGreaterThan(0);
    expect(Object.values(cells).some((c) => c?.formula.startsWith("=ORBIT."))).toBe(true);
    // Inputs are plain values with the input fill, and the first one is selected for editing.
    const inputs = layout.roles.get("input")!;
    for (const ref of inputs) {
      expect(cells[ref]!.formula, ref).toBe("");
      expect(cells[ref]!.format.fill, ref).toBe("#FFF1C2");
    }
    expect(await stub<{ sheet: string; address: string }>(p.page, "selection")).toMatchObject({ sheet: t.sheetName, address: inputs[0] });
    for (const ref of layout.roles.get("header") ?? []) expect(cells[ref]!.format, ref).toMatchObject({ "font.bold": true, wrapText: true, "border.EdgeBottom": "Continuous" });
    // The colour scale over the transfer grid: lowest green, the median pale yellow, highest pale grey.
    const scales = await stub<unknown[]>(p.page, "conditionalFormats", t.sheetName);
    if (t.colourScale) {
      const { range, low, mid, high } = t.colourScale;
      expect(scales).toEqual([
        {
          address: range,
          type: "ColorScale",
          criteria: { minimum: { type: "LowestValue", color: low }, midpoint: { type: "Percentile", formula: "50", color: mid }, maximum: { type: "HighestValue", color: high } },
        },
      ]);
    } else expect(scales).toEqual([]);
    // The sweep's chart: the delta-v column against the altitudes, over its note.
    const charts = await stub<unknown[]>(p.page, "charts", t.sheetName);
    if (t.chart) {
      const c = t.chart;
      expect(charts).toEqual([{ type: "XYScatterLinesNoMarkers", seriesBy: "Columns", source: c.y, xValues: c.x, title: c.title, xTitle: c.xTitle, yTitle: c.yTitle, legendVisible: false, from: c.from, to: c.to }]);
    } else expect(charts).toEqual([]);
    expect(await stub<string[]>(p.page, "overwrites")).toEqual([]);

    // What the pane wrote through Office.js is what the demo's workbook writer (exceljs) writes for the same sheet.
    const [path] = await writeDemoWorkbooks(mkdtempSync(join(tmpdir(), "orbit-pane-demo-")), [t]);
    const book = new ExcelJS.Workbook();
    await book.xlsx.readFile(path);
    const ws = book.worksheets[0];
    const drift: string[] = [];
    ws.eachRow({ includeEmpty: false }, (row) =>
      row.eachCell({ includeEmpty: false }, (cell) => {
        const v = cell.value as unknown;
        const demo = v instanceof Date ? v.getTime() / 86_400_000 + 25569 : typeof v === "object" && v !== null && "formula" in v ? `=${(v as { formula: string }).formula}` : v;
        const got = cells[cell.address];
        const pane = got ? got.formula || got.value : undefined;
        if (demo !== null && demo !== pane) drift.push(`${cell.address}: pane ${JSON.stringify(pane)}, demo ${JSON.stringify(demo)}`);
        if (cell.numFmt && got?.numberFormat !== cell.numFmt) drift.push(`${cell.address}: format pane ${got?.numberFormat}, demo ${cell.numFmt}`);
      }),
    );
    const contentCells = Object.entries(cells).filter(([, c]) => c && (c.formula || c.value !== ""));
    let demoCells = 0;
    ws.eachRow({ includeEmpty: false }, (row) => row.eachCell({ includeEmpty: false }, (cell) => void (cell.value !== null && demoCells++)));
    expect(drift).toEqual([]);
    expect(contentCells.length).toBe(demoCells);
    const widths = await stub<Record<string, number>>(p.page, "columnWidths", t.sheetName);
    t.widths.forEach((w, i) => expect(widths[cellAddress(0, i).replace(/\d+$/, "")]).toBe(widthInPoints(w)));

    // A second copy goes on its own sheet; the first is left as it was.
    await p.page.click(`[data-template="${t.id}"]`);
    expect(await statusOf(p, "templates-status")).toContain(`'${t.sheetName} (2)'!A1`);
    expect(await stub<string[]>(p.page, "overwrites")).toEqual([]);
  });

  /** Inserts a template through the pane and recalculates what the stub holds in the headless runner's engine. */
  async function insertAndRecalculate(id: string) {
    const t = TEMPLATES.find((x) => x.id === id)!;
    const p = await pane();
    await p.page.click("#tab-templates");
    await p.page.click(`[data-template="${id}"]`);
    const status = await statusOf(p, "templates-status");
    const cells = await stub<Record<string, { value: unknown; formula: string; numberFormat: string } | null>>(p.page, "cells", t.sheetName);
    const engine = buildEngine(loadBundle(DIST), { [t.sheetName]: engineSheet(cells as StubCells) });
    const sheet = engine.hf.getSheetId(t.sheetName)!;
    const value = (ref: string) => engine.hf.getCellValue({ sheet, ...parseCell(ref)! });
    expect(await stub<string[]>(p.page, "overwrites")).toEqual([]);
    return { t, status, cells, engine, sheet, value };
  }

  it("ground contact: the pane checks and writes the rows reserved for the passes, and the list spills inside them, last on the sheet", async () => {
    const { t, status, cells, engine, sheet, value } = await insertAndRecalculate("ground");
    // The block the guard read before writing (and wrote) runs to the last reserved row.
    const layout = layoutTemplate(t);
    expect(status).toContain(`Added '${t.sheetName}'!${blockAddress(0, 0, layout.rows, layout.cols)}`);
    expect(layout.rows).toBe(GROUND_CELLS.lastReserved);
    // The passes' size is learned from the result: a second evaluation, then nothing left cut.
    expect(engine.passes).toBe(2);
    expect(engine.unsettled).toEqual([]);
    const spill = engine.spills.get(addressKey({ sheet, row: GROUND_CELLS.passesAt - 1, col: 0 }))!;
    expect(spill.cols).toBe(5);
    expect(spill.rows).toBeGreaterThan(30);
    expect(spill.rows - 1).toBeLessThanOrEqual(GROUND_CELLS.PASS_ROWS);
    // Every pass the list spilled is shown with the reserved cell's format, dates with their time.
    for (let r = GROUND_CELLS.firstPass; r < GROUND_CELLS.passesAt + spill.rows; r++)
      ["A", "B", "C", "D", "E"].forEach((c, j) => {
        expect(typeof value(`${c}${r}`), `${c}${r}`).toBe("number");
        expect(cells[`${c}${r}`]?.numberFormat, `${c}${r}`).toBe(["yyyy-mm-dd hh:mm:ss", "yyyy-mm-dd hh:mm:ss", "0.0", "yyyy-mm-dd hh:mm:ss", "0"][j]);
      });
    expect(value(GROUND_CELLS.passCount)).toBe(spill.rows - 1);
    expect(engine.hf.getSheetDimensions(sheet).height).toBe(GROUND_CELLS.lastReserved);
  });

  it("lifetime and disposal: the pane's sheet recalculates as the scenario's, lives shortening as solar activity rises", async () => {
    const { t, value } = await insertAndRecalculate("lifetime");
    const direct = recalcSheet(t);
    for (const ref of [...LIFETIME_CELLS.missionYears, ...LIFETIME_CELLS.disposalDays, ...LIFETIME_CELLS.strictPerigee, ...LIFETIME_CELLS.guidelinePerigee, LIFETIME_CELLS.carried])
      expect({ ref, v: value(ref) }).toEqual({ ref, v: direct.value(ref) });
    const [low, moderate, high] = LIFETIME_CELLS.disposalDays.map((ref) => value(ref) as number);
    expect(low).toBeGreaterThan(moderate);
    expect(moderate).toBeGreaterThan(high);
    expect(value(LIFETIME_CELLS.missionYears[0])).toBe("over 200 years");
  });
});

describe("Function guide", () => {
  it("finds a function, shows its parameters and example, and puts the example in the selected cell", async () => {
    const p = await pane();
    await p.page.click("#tab-guide");
    await p.page.fill("#guide-search", "escape speed");
    const shown = await p.page.$$eval("#guide-list > li:not([hidden])", (lis) => lis.map((li) => li.getAttribute("data-function")));
    expect(shown[0]).toBe("ESCAPE_SPEED");
    await p.page.click('[data-function="ESCAPE_SPEED"] summary');
    const example = (await p.page.textContent('[data-example="ESCAPE_SPEED"]'))!;
    expect(example).toMatch(/^=ORBIT\.ESCAPE_SPEED\(/);
    const params = await p.page.$$eval('[data-function="ESCAPE_SPEED"] dt', (dts) => dts.map((d) => d.textContent));
    expect(params).toEqual(["body", "radius"]);

    await stub(p.page, "select", "Sheet1", "C3");
    await p.page.click('[data-insert="ESCAPE_SPEED"]');
    await p.page.waitForSelector('[data-function="ESCAPE_SPEED"] .msg.ok');
    expect((await stub<{ formula: string }>(p.page, "getCell", "Sheet1", "C3")).formula).toBe(example);

    // The same cell again: it now holds a formula, so nothing is written and C4/D3 are offered.
    await p.page.click('[data-insert="ESCAPE_SPEED"]');
    await p.page.waitForSelector('[data-function="ESCAPE_SPEED"] .msg.warn');
    const offers = await p.page.$$eval('[data-function="ESCAPE_SPEED"] .offers button', (bs) => bs.map((b) => b.textContent));
    expect(offers).toEqual(["Put it at D3 (right)", "Put it at C4 (below)"]);
    await p.page.click('[data-function="ESCAPE_SPEED"] >> text=Put it at C4 (below)');
    await p.page.waitForSelector('[data-function="ESCAPE_SPEED"] .msg.ok');
    expect((await stub<{ formula: string }>(p.page, "getCell", "Sheet1", "C4")).formula).toBe(example);
    expect(await stub<string[]>(p.page, "overwrites")).toEqual([]);
  });

  it("checks the whole area a several-value result spills into, and offers free areas of that size", async () => {
    const p = await pane();
    await p.page.click("#tab-guide");
    await p.page.fill("#guide-search", "TRANSFER_BURNS");
    await p.page.click('[data-function="TRANSFER_BURNS"] summary');
    // The example has a header row and one case: 2 rows by 5 columns from the selected cell.
    await stub(p.page, "setCell", "Sheet1", "F4", "keep me");
    await stub(p.page, "select", "Sheet1", "B3");
    await p.page.click('[data-insert="TRANSFER_BURNS"]');
    await p.page.waitForSelector('[data-function="TRANSFER_BURNS"] .msg.warn');
    expect(await stub(p.page, "dump", "Sheet1")).toEqual({ F4: "keep me" });
    const offers = await p.page.$$eval('[data-function="TRANSFER_BURNS"] .offers button', (bs) => bs.map((b) => b.textContent));
    expect(offers).toEqual(["Put it at G3 (right)", "Put it at B5 (below)"]);
    await p.page.click('[data-function="TRANSFER_BURNS"] >> text=Put it at B5 (below)');
    await p.page.waitForSelector('[data-function="TRANSFER_BURNS"] .msg.ok');
    expect((await stub<{ formula: string }>(p.page, "getCell", "Sheet1", "B5")).formula).toMatch(/^=ORBIT\.TRANSFER_BURNS\(/);
    expect(await p.page.textContent('[data-function="TRANSFER_BURNS"] .msg.ok')).toContain("Wrote TRANSFER_BURNS in Sheet1!B5; its result fills B5:F6.");
    expect(await stub<string[]>(p.page, "overwrites")).toEqual([]);
  });

  it("lists the functions under family headings, shows what each returns and its columns, and writes dates as DATE(...)", async () => {
    const p = await pane();
    await p.page.click("#tab-guide");
    const headings = await p.page.$$eval("#guide-list > li.family:not([hidden]) h3", (hs) => hs.map((h) => h.textContent));
    expect(headings).toContain("Maneuvers");
    expect(new Set(headings).size).toBe(headings.length);
    await p.page.click('[data-function="TRANSFER_BURNS"] summary');
    expect(await p.page.textContent('[data-function="TRANSFER_BURNS"] .columns')).toContain("burn 1 (km/s) · burn 2 (km/s)");
    expect(await p.page.textContent('[data-function="TRANSFER_BURNS"] .returns')).toContain("One row per case");
    await p.page.fill("#guide-search", "sso");
    expect(await p.page.$$eval("#guide-list > li.family:not([hidden])", (hs) => hs.length)).toBe(0);
    const first = await p.page.$eval("#guide-list > li[data-function]:not([hidden])", (li) => li.getAttribute("data-function"));
    expect(first).toBe("SUN_SYNC_INCLINATION");
  });
});

describe("theme", () => {
  const bg = (p: PanePage) => p.page.evaluate(() => getComputedStyle(document.body).backgroundColor);

  it("follows Office's dark theme, with the host's own background", async () => {
    const p = await pane({ theme: OFFICE_DARK, colorScheme: "light" });
    expect(await p.page.getAttribute("html", "data-theme")).toBe("dark");
    expect(await bg(p)).toBe("rgb(41, 41, 41)");
  });

  it("follows Office's light theme even when the system prefers dark", async () => {
    const p = await pane({ theme: OFFICE_LIGHT, colorScheme: "dark" });
    expect(await p.page.getAttribute("html", "data-theme")).toBe("light");
    expect(await bg(p)).toBe("rgb(255, 255, 255)");
  });

  it("falls back to the system's colour scheme when the host gives no theme, and follows a theme change", async () => {
    const p = await pane({ theme: null, colorScheme: "dark" });
    expect(await p.page.getAttribute("html", "data-theme")).toBe("dark");
    expect(await bg(p)).toBe("rgb(31, 31, 33)");
    await stub(p.page, "setTheme", OFFICE_LIGHT);
    expect(await p.page.getAttribute("html", "data-theme")).toBe("light");
  });
});

describe("keyboard", () => {
  /** What has the focus: an id, a body/field/derived key, a radio's value, or a button's text. */
  const focusName = (p: PanePage) =>
    p.page.evaluate(() => {
      const a = document.activeElement as HTMLElement | null;
      return a ? a.getAttribute("data-body") || a.getAttribute("data-field") || a.id || a.getAttribute("value") || a.textContent?.trim() || a.tagName : "";
    });

  it("reaches Insert table from the tabs in 12 Tab presses: one stop per list, then inserts with Enter", async () => {
    const p = await pane();
    await stub(p.page, "select", "Sheet1", "A1");
    await p.page.focus("#tab-catalogue");
    const visited: string[] = [];
    for (let i = 0; i < 40; i++) {
      await p.page.keyboard.press("Tab");
      visited.push(await focusName(p));
      if (visited[visited.length - 1] === "insert-table") break;
    }
    // The skip link, the filter, three quick picks, the body list (on its first body), the field
    // list (on its first field), one stop per unit group (its checked radio), the preview, Insert.
    expect(visited).toEqual(["skip-to-insert", "body-filter", "Sun and planets", "All", "None", "Sun", "gm", "km", "km3/s2", "s", "preview", "insert-table"]);
    await p.page.keyboard.press("Enter");
    expect(await statusOf(p, "catalogue-status")).toContain(`Inserted table OrbitBodies at Sheet1!${written(DEFAULTS, 0, 0)}:`);
  });

  it("the skip link shows when it has the focus and takes Enter straight to Insert table", async () => {
    const p = await pane();
    await p.page.focus("#tab-catalogue");
    const box = () => p.page.evaluate(() => document.getElementById("skip-to-insert")!.getBoundingClientRect().width);
    expect(await box()).toBeLessThanOrEqual(1);
    await p.page.keyboard.press("Tab");
    expect(await focusName(p)).toBe("skip-to-insert");
    expect(await box()).toBeGreaterThan(60);
    await p.page.keyboard.press("Enter");
    expect(await focusName(p)).toBe("insert-table");
  });

  it("moves through the body list with the arrow keys and picks with Space", async () => {
    const p = await pane({ width: 320 });
    await p.page.focus('[data-body="Sun"]');
    // Two columns at 320 px: Down goes to the next row in the same column, Right to the next body.
    await p.page.keyboard.press("ArrowDown");
    expect(await focusName(p)).toBe("Mercury");
    await p.page.keyboard.press("ArrowDown");
    expect(await focusName(p)).toBe("Earth");
    await p.page.keyboard.press("ArrowRight");
    expect(await focusName(p)).toBe("Mars");
    await p.page.keyboard.press("ArrowUp");
    expect(await focusName(p)).toBe("Venus");
    // Only the option in focus is in the tab order.
    expect(await p.page.$$eval('#body-list [role="option"][tabindex="0"]', (os) => os.map((o) => o.getAttribute("data-body")))).toEqual(["Venus"]);
    await p.page.keyboard.press("End");
    expect(await focusName(p)).toBe("Vesta");
    await p.page.keyboard.press("Space");
    expect(await p.page.getAttribute('[data-body="Vesta"]', "aria-selected")).toBe("true");
    expect(await p.page.$$eval("#preview tbody th", (ths) => ths.map((t) => t.textContent))).toContain("Vesta");
    await p.page.keyboard.press("Space");
    expect(await p.page.getAttribute('[data-body="Vesta"]', "aria-selected")).toBe("false");
    await p.page.keyboard.press("Home");
    expect(await focusName(p)).toBe("Sun");
    await p.page.keyboard.press("t"); // type-ahead: the next body whose name starts with T
    expect(await focusName(p)).toBe("Titan");
    // Tab leaves the list in one press, onto the field list.
    await p.page.keyboard.press("Tab");
    expect(await focusName(p)).toBe("gm");
  });

  it("exposes the lists as multi-select listboxes with named groups", async () => {
    const p = await pane();
    const tree = await p.page.evaluate(() => {
      const list = document.getElementById("body-list")!;
      const name = (el: Element) => (el.getAttribute("aria-labelledby") ?? "").split(" ").map((id) => document.getElementById(id)?.textContent ?? "").join(" ");
      return {
        role: list.getAttribute("role"),
        multi: list.getAttribute("aria-multiselectable"),
        name: name(list),
        groups: [...list.querySelectorAll('[role="group"]')].map((g) => [name(g), g.querySelectorAll('[role="option"]').length]),
        stray: [...list.querySelectorAll('[role="option"]')].filter((o) => !o.closest('[role="group"]')).length,
        fields: document.getElementById("field-list")!.getAttribute("role"),
      };
    });
    expect(tree).toMatchObject({ role: "listbox", multi: "true", name: "Bodies", fields: "listbox", stray: 0 });
    expect(tree.groups.slice(0, 3)).toEqual([["Star", 1], ["Planets", 8], ["Moons of Earth", 1]]);
    expect(tree.groups).toContainEqual(["Moons of Uranus", 5]);
  });

  it("moves between tabs with the arrow keys", async () => {
    const p = await pane();
    await p.page.focus("#tab-catalogue");
    await p.page.keyboard.press("ArrowRight");
    expect(await p.page.getAttribute("#tab-templates", "aria-selected")).toBe("true");
    expect(await p.page.isVisible("#panel-templates")).toBe(true);
    expect(await p.page.isVisible("#panel-catalogue")).toBe(false);
    await p.page.keyboard.press("End");
    expect(await p.page.evaluate(() => document.activeElement?.id)).toBe("tab-guide");
    await p.page.keyboard.press("Tab");
    expect(await p.page.evaluate(() => document.activeElement?.id)).toBe("guide-search");
  });
});

// ---- Numbers a person reads, layout, status kinds and the palette ---------------------------

/** "rgb(r, g, b)" or "rgba(r, g, b, a)" as #rrggbb (alpha ignored: callers pass opaque colours). */
const hex = (css: string): string => {
  const m = /rgba?\((\d+),\s*(\d+),\s*(\d+)/.exec(css);
  if (!m) throw new Error(`not an rgb colour: ${css}`);
  return `#${m.slice(1, 4).map((c) => Number(c).toString(16).padStart(2, "0")).join("")}`;
};
/** WCAG 2.x contrast ratio of two computed colours. */
const ratio = (a: string, b: string): number => {
  const [x, y] = [luminance(hex(a))!, luminance(hex(b))!];
  return (Math.max(x, y) + 0.05) / (Math.min(x, y) + 0.05);
};

describe("the inserted table reads as a person expects", () => {
  type Cells = Record<string, { value: unknown; numberFormat: string } | null>;
  const shown = (c: { value: unknown; numberFormat: string } | null) => formatWith(c!.value as number, c!.numberFormat);

  it("days in fixed notation, radii without false decimals, GM and J2 with their sources' digits", async () => {
    const p = await pane();
    await p.page.check('input[name="unit-time"][value="day"]');
    await stub(p.page, "select", "Sheet1", "A1");
    await p.page.click("#insert-table");
    expect(await statusOf(p, "catalogue-status")).toContain("Inserted table OrbitBodies at Sheet1!A1:");
    const [table] = await stub<{ header: string[] }[]>(p.page, "tables");
    expect(table.header).toEqual(["Body", "GM (km³/s²)", "Equatorial radius (km)", "Mean radius (km)", "J2", "Rotation period (day)", "Sources"]);
    const cells = await stub<Cells>(p.page, "cells", "Sheet1");
    const row = (name: string) => Object.entries(cells).find(([ref, c]) => /^A\d+$/.test(ref) && c?.value === name)![0].slice(1);
    const at = (name: string, col: string) => cells[`${col}${row(name)}`];
    // Catalogue order, each moon after its planet: the Moon is the fifth row.
    expect([2, 3, 4, 5, 6].map((r) => cells[`A${r}`]!.value)).toEqual(["Sun", "Mercury", "Venus", "Earth", "Moon"]);
    // Days (JPL SSD 0.99726968 d; the Sun's 360 / 14.1844 deg/day of WGCCRE 2009 = 25.3800 d).
    expect(shown(at("Sun", "F"))).toBe("25.38");
    expect(shown(at("Earth", "F"))).toBe("0.99726968");
    expect(shown(at("Venus", "F"))).toBe("-243.018");
    expect(at("Earth", "F")!.value).toBeCloseTo(0.99726968, 12); // the value keeps every digit
    // Radii: the Sun's IAU 2015 B3 695 700 km without decimals; Earth's JPL SSD 6378.1366 km.
    expect(shown(at("Sun", "C"))).toBe("695,700");
    expect(shown(at("Earth", "C"))).toBe("6,378.1366");
    expect(shown(at("Moon", "D"))).toBe("1,737.4");
    // GM: gm_de440.tpc digits (Venus 3.2485859200000000E+05 is 9 digits, Mercury 12).
    expect(shown(at("Venus", "B"))).toBe("3.24858592E+05");
    expect(shown(at("Mercury", "B"))).toBe("2.20318685514E+04");
    expect(at("Earth", "B")!.numberFormat).toBe(`0.${"0".repeat(14)}E+00`); // 17 printed digits, Excel's 15 shown
    // J2: NSSDC Venus 4.458e-6, Mars 1960.45e-6.
    expect(shown(at("Venus", "E"))).toBe("4.458E-06");
    expect(shown(at("Mars", "E"))).toBe("1.96045E-03");
    // The preview shows what the sheet shows.
    const previewSun = await p.page.$$eval("#preview tbody tr:first-child td", (tds) => tds.map((t) => t.textContent));
    expect(previewSun.slice(0, 5)).toEqual(["1.32712440041279E+11", "695,700", "695,700", "2.11060885327268E-07", "25.38"]);
    // A note row says what the negative periods mean.
    const notes = Object.entries(cells).filter(([ref]) => /^A\d+$/.test(ref) && Number(ref.slice(1)) > 12).map(([, c]) => String(c!.value));
    expect(notes.some((n) => n.startsWith("Negative rotation periods (Venus, Uranus): the body spins retrograde"))).toBe(true);
    expect(await stub<string[]>(p.page, "overwrites")).toEqual([]);
  });

  it("angles in fixed degrees, Earth's inclination non-negative with a note row saying why", async () => {
    const p = await pane();
    await p.page.click('[data-pick="planets"]');
    for (const f of ["gm", "equatorial_radius", "mean_radius", "j2", "rotation_period", "inc"]) await p.page.click(`[data-field="${f}"]`);
    await p.page.click("#insert-table-sheet");
    expect(await statusOf(p, "catalogue-status")).toContain("Inserted table OrbitBodies at 'Body catalogue'!A1:");
    const cells = await stub<Cells>(p.page, "cells", "Body catalogue");
    expect(cells["B1"]!.value).toBe("Inclination (deg)");
    const byName = Object.fromEntries(Object.entries(cells).filter(([ref]) => /^A[2-9]$|^A10$/.test(ref)).map(([ref, c]) => [c!.value, cells[`B${ref.slice(1)}`]]));
    expect(byName.Sun?.value ?? "").toBe(""); // the Sun has no orbit
    expect(shown(byName.Mercury)).toBe("7.00497902"); // Standish Table 1
    expect(shown(byName.Earth)).toBe("0.00001531");
    expect(byName.Earth!.value).toBeGreaterThan(0);
    const notes = Object.values(cells).map((c) => String(c?.value ?? ""));
    expect(notes.some((n) => n.startsWith("Earth, inclination: computed: Standish Table 1 prints I = -0.00001531 deg with the node at 0 deg"))).toBe(true);
  });
});

describe("layout", () => {
  it.each([320, 450])("at %i px every pre-selected body is in view in the list, and the count names the picked ones that are not", async (width) => {
    const p = await pane({ width });
    const outside = await p.page.evaluate((names) => {
      const box = document.getElementById("body-list")!.getBoundingClientRect();
      return names.filter((n) => {
        const r = document.querySelector(`[data-body="${n}"]`)!.getBoundingClientRect();
        return r.top < box.top || r.bottom > box.bottom;
      });
    }, [...DEFAULT_BODIES]);
    expect(outside).toEqual([]);
    expect(await p.page.textContent("#body-count")).toBe(`${DEFAULT_BODIES.length} of ${BODIES.length} bodies picked.`);
    // The preview shows every default row without scrolling.
    expect(await p.page.evaluate(() => { const b = document.getElementById("preview")!; return b.scrollHeight - b.clientHeight; })).toBeLessThanOrEqual(1);
    await p.page.evaluate(() => { const l = document.getElementById("body-list")!; l.scrollTop = l.scrollHeight; });
    await p.page.waitForFunction(() => document.getElementById("body-count")!.textContent!.includes("Scrolled out of view"));
    expect(await p.page.textContent("#body-count")).toContain("Scrolled out of view: Sun, Mercury");
    await p.page.fill("#body-filter", "jup");
    expect(await p.page.textContent("#body-count")).toContain("Hidden by the filter: Sun, Mercury, Venus, Earth, Mars, Saturn, Uranus, Neptune, Moon.");
  });

  it("an empty status area takes no room", async () => {
    const p = await pane();
    const gap = await p.page.evaluate(() => {
      const status = document.getElementById("catalogue-status")!;
      const hint = document.getElementById("insert-hint")!.getBoundingClientRect();
      const cautions = document.querySelector(".cautions")!.getBoundingClientRect();
      return { empty: status.childElementCount === 0, height: status.getBoundingClientRect().height, gap: cautions.top - hint.bottom };
    });
    // The Cautions box follows the hint at its own 16 px margin, with nothing in between.
    expect(gap).toEqual({ empty: true, height: 0, gap: 16 });
  });

  it("draws the guide's open/closed markers inside the cards, clear of their borders", async () => {
    const p = await pane();
    await p.page.click("#tab-guide");
    await p.page.click('[data-function="ORBITAL_SPEED"] summary');
    const cards = await p.page.$$eval("#guide-list > li:not([hidden]) details", (ds) =>
      (ds as HTMLDetailsElement[]).map((d) => {
        const s = d.querySelector("summary")!;
        const cs = getComputedStyle(s);
        const marker = getComputedStyle(s, "::before");
        return {
          display: cs.display,
          marker: marker.borderLeftWidth,
          inset: s.getBoundingClientRect().left + parseFloat(cs.paddingLeft) - (d.getBoundingClientRect().left + parseFloat(getComputedStyle(d).borderLeftWidth)),
          open: d.open,
          turned: marker.transform,
        };
      }),
    );
    expect(cards.length).toBe(functionsJson.functions.length);
    for (const c of cards) {
      expect(c.display).toBe("grid"); // not list-item: no marker outside the box
      expect(c.marker).toBe("7px"); // the drawn marker
      expect(c.inset).toBeGreaterThanOrEqual(8); // it starts inside the card's padding
    }
    expect(cards.filter((c) => c.open).every((c) => c.turned !== "none")).toBe(true);
  });
});

describe("status kinds", () => {
  /** Background, border, badge and text colours of the status message now in `id`, and of the Cautions box. */
  const look = (p: PanePage, sel: string) =>
    p.page.$eval(sel, (m) => {
      const cs = getComputedStyle(m);
      const badge = getComputedStyle(m, "::before");
      const text = getComputedStyle(m.querySelector("p")!);
      return { bg: cs.backgroundColor, border: `${cs.borderTopStyle} ${cs.borderLeftWidth} ${cs.borderLeftColor}`, badge: badge.content, badgeBg: badge.backgroundColor, badgeFg: badge.color, fg: text.color };
    });

  it.each([
    ["light", OFFICE_LIGHT],
    ["dark", OFFICE_DARK],
  ] as const)("%s: info, success, refusal and error each have their own style, unlike the Cautions box, all legible", async (_name, theme) => {
    const p = await pane({ theme });
    const kinds: Record<string, Awaited<ReturnType<typeof look>>> = {};
    // Info: while the insertion waits for Excel.
    await stub(p.page, "delayNextRun", 1500);
    await stub(p.page, "select", "Sheet1", "B2");
    await p.page.click("#insert-table");
    kinds.info = await look(p, "#catalogue-status .msg.info");
    kinds.ok = (await p.page.waitForSelector("#catalogue-status .msg.ok"), await look(p, "#catalogue-status .msg.ok"));
    // Refusal: the same place again is full now.
    await stub(p.page, "select", "Sheet1", "B2");
    await p.page.click("#insert-table");
    kinds.warn = (await p.page.waitForSelector("#catalogue-status .msg.warn"), await look(p, "#catalogue-status .msg.warn"));
    // Error: Excel refuses the batch.
    await stub(p.page, "failNextRun", "The workbook is read-only.");
    await p.page.click('#catalogue-status .offers button:has-text("new sheet")');
    kinds.err = (await p.page.waitForSelector("#catalogue-status .msg.err"), await look(p, "#catalogue-status .msg.err"));
    expect(await p.page.textContent("#catalogue-status")).toContain("The workbook is read-only.");

    const cautions = await p.page.$eval(".cautions", (c) => {
      const cs = getComputedStyle(c);
      return { bg: cs.backgroundColor, border: `${cs.borderTopStyle} ${cs.borderLeftWidth} ${cs.borderLeftColor}`, fg: getComputedStyle(c.querySelector("p")!).color };
    });
    const all = Object.values(kinds);
    expect(new Set(all.map((k) => k.bg)).size).toBe(4);
    expect(new Set(all.map((k) => k.border)).size).toBe(4);
    expect(new Set(all.map((k) => k.badge)).size).toBe(4);
    for (const [kind, k] of Object.entries(kinds)) {
      expect(k.bg, kind).not.toBe(cautions.bg);
      expect(k.border, kind).not.toBe(cautions.border);
      expect(k.badge, kind).not.toBe("none");
      expect(ratio(k.fg, k.bg), `${kind} text`).toBeGreaterThanOrEqual(4.5);
      expect(ratio(k.badgeFg, k.badgeBg), `${kind} badge`).toBeGreaterThanOrEqual(4.5);
    }
    expect(ratio(cautions.fg, cautions.bg)).toBeGreaterThanOrEqual(4.5);
    expect(await stub<string[]>(p.page, "overwrites")).toEqual([]);
  });
});

describe("palette", () => {
  it.each([
    ["Office light", { theme: OFFICE_LIGHT }],
    ["Office dark", { theme: OFFICE_DARK }],
    ["system dark, no host theme", { theme: null, colorScheme: "dark" as const }],
  ] as const)("%s: text reaches 4.5:1 and focus rings, control edges and picked boxes 3:1 on what is behind them", async (_name, cfg) => {
    const p = await pane(cfg);
    const samples = await p.page.evaluate(() => {
      const behind = (el: Element): string => {
        for (let e: Element | null = el; e; e = e.parentElement) {
          const c = getComputedStyle(e).backgroundColor;
          if (c !== "rgba(0, 0, 0, 0)" && c !== "transparent") return c;
        }
        return getComputedStyle(document.documentElement).backgroundColor;
      };
      const text = (sel: string) => {
        const el = document.querySelector(sel)!;
        return [sel, getComputedStyle(el).color, behind(el)];
      };
      const edge = (sel: string, prop: "borderTopColor" | "backgroundColor") => {
        const el = document.querySelector(sel)!;
        return [sel, getComputedStyle(el)[prop], behind(el.parentElement!)];
      };
      return {
        text: [
          text("h1"), text(".tagline"), text(".lead"), text("#body-count"), text(".pick-group-title"), text('[data-body="Sun"]'),
          text("#insert-table"), text('[role="tab"][aria-selected="true"]'), text('[role="tab"][aria-selected="false"]'),
          text(".preview-box th"), text(".preview-box td"), text(".preview-notes"), text(".hint"), text(".cautions p"),
          text('.seg input:checked + span'),
        ],
        ui: [
          edge("#body-filter", "borderTopColor"), edge('[data-body="Phobos"] .box', "borderTopColor"), edge('[data-body="Sun"] .box', "backgroundColor"),
          [".tabs selected underline", getComputedStyle(document.querySelector('[role="tab"][aria-selected="true"]')!).borderBottomColor, behind(document.querySelector(".tabs")!)],
        ],
      };
    });
    for (const [sel, fg, bg] of samples.text) expect(ratio(fg, bg), sel).toBeGreaterThanOrEqual(4.5);
    for (const [sel, fg, bg] of samples.ui) expect(ratio(fg, bg), sel).toBeGreaterThanOrEqual(3);
    // Focus ring, on the page and inside a list.
    for (const sel of ["#body-filter", '[data-body="Sun"]', "#insert-table"]) {
      await p.page.focus(sel);
      await p.page.keyboard.press("Shift+Tab");
      await p.page.keyboard.press("Tab"); // keyboard focus, so :focus-visible applies
      const [ring, bg, style] = await p.page.evaluate(() => {
        const a = document.activeElement as HTMLElement;
        let c = "rgba(0, 0, 0, 0)";
        for (let e: Element | null = a.parentElement; e && (c === "rgba(0, 0, 0, 0)" || c === "transparent"); e = e.parentElement) c = getComputedStyle(e).backgroundColor;
        return [getComputedStyle(a).outlineColor, c, getComputedStyle(a).outlineStyle];
      });
      expect(style, `focus ring of ${sel}`).toBe("solid");
      expect(ratio(ring, bg), `focus ring of ${sel}`).toBeGreaterThanOrEqual(3);
    }
    // The former accent pair is gone from every rendered colour.
    const used = await p.page.evaluate(() => {
      const seen = new Set<string>();
      for (const el of document.querySelectorAll("*")) {
        const cs = getComputedStyle(el);
        for (const v of [cs.color, cs.backgroundColor, cs.borderTopColor, cs.borderBottomColor, cs.outlineColor]) seen.add(v);
      }
      return [...seen];
    });
    expect(used).not.toContain("rgb(138, 180, 248)"); // #8ab4f8
    expect(used).not.toContain("rgb(168, 199, 250)"); // #a8c7fa
  });
});
