import { mkdirSync, readFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { BODIES } from "../../src/catalogue/bodies";
import { blockAddress } from "../../src/taskpane/cells";
import { buildTablePlan, DEFAULT_BODIES, DEFAULT_FIELDS, DEFAULT_UNITS, planSize, type TableRequest } from "../../src/taskpane/catalogueTable";
import { layoutTemplate, missingFunctions, TEMPLATES } from "../../src/taskpane/templates";
import { buildEngine } from "../../src/runner/engine";
import { loadBundle } from "../../src/runner/host";
import { toEngineFormula } from "../../src/runner/names";
import { parseCell } from "../../src/taskpane/cells";
import { DIST, openPane, startHarness, stub, type Harness, type PanePage } from "./harness";

// The built pane (dist/) in Debian's Chromium, with office-stub.js standing in for Office.js over
// an in-memory workbook. Every test also checks that no cell holding data was written over.

const SHOTS = resolve(__dirname, "../../docs/screenshots");
const functionsJson = JSON.parse(readFileSync(join(DIST, "functions.json"), "utf8")) as { functions: { id: string }[] };

/** Office's dark theme colours as the host reports them (shape of Office.context.officeTheme). */
const OFFICE_DARK = { bodyBackgroundColor: "#292929", bodyForegroundColor: "#FFFFFF", controlBackgroundColor: "#3D3D3D", controlForegroundColor: "#FFFFFF" };
const OFFICE_LIGHT = { bodyBackgroundColor: "#FFFFFF", bodyForegroundColor: "#262626", controlBackgroundColor: "#F3F3F3", controlForegroundColor: "#262626" };

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
  mkdirSync(SHOTS, { recursive: true });
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
    await p.page.check('[data-derived="soi_radius"]');
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
    const propellant = hf.getCellValue({ sheet: budget, ...parseCell("B35")! }) as number;
    expect(propellant).toBeGreaterThan(0);
    expect(propellant).toBeLessThan(180); // less than the whole spacecraft
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
    const listed = await p.page.$$eval("#guide-list > li", (lis) => lis.map((li) => li.getAttribute("data-function")));
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
    await p.page.check('[data-field="sma"]');
    await p.page.uncheck('[data-field="j2"]');
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
    await p.page.screenshot({ path: join(SHOTS, "refused-light-320.png") });

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
    await p.page.check('[data-derived="soi_radius"]');
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

  it.each(TEMPLATES.map((t) => [t.id, t] as const))("%s: inserts a new sheet of live formulas with marked inputs", async (_id, t) => {
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
    for (const ref of layout.roles.get("header") ?? []) expect(cells[ref]!.format, ref).toMatchObject({ "font.bold": true, wrapText: true });
    if (t.colourScale) expect(await stub<{ address: string; type: string }[]>(p.page, "conditionalFormats", t.sheetName)).toMatchObject([{ address: t.colourScale, type: "ColorScale" }]);
    expect(await stub<string[]>(p.page, "overwrites")).toEqual([]);

    // A second copy goes on its own sheet; the first is left as it was.
    await p.page.click(`[data-template="${t.id}"]`);
    expect(await statusOf(p, "templates-status")).toContain(`'${t.sheetName} (2)'!A1`);
    expect(await stub<string[]>(p.page, "overwrites")).toEqual([]);
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
    await p.page.screenshot({ path: join(SHOTS, "guide-light-320.png") });
  });
});

describe("theme", () => {
  const bg = (p: PanePage) => p.page.evaluate(() => getComputedStyle(document.body).backgroundColor);

  it("follows Office's dark theme, with the host's own background", async () => {
    const p = await pane({ theme: OFFICE_DARK, colorScheme: "light" });
    expect(await p.page.getAttribute("html", "data-theme")).toBe("dark");
    expect(await bg(p)).toBe("rgb(41, 41, 41)");
    await p.page.screenshot({ path: join(SHOTS, "catalogue-dark-320.png"), fullPage: true });
    await p.page.click("#tab-templates");
    await p.page.screenshot({ path: join(SHOTS, "templates-dark-320.png"), fullPage: true });
    await p.page.click("#tab-guide");
    await p.page.fill("#guide-search", "speed");
    await p.page.click('[data-function="ORBITAL_SPEED"] summary');
    await p.page.screenshot({ path: join(SHOTS, "guide-dark-320.png"), fullPage: true });
  });

  it("follows Office's light theme even when the system prefers dark", async () => {
    const p = await pane({ theme: OFFICE_LIGHT, colorScheme: "dark" });
    expect(await p.page.getAttribute("html", "data-theme")).toBe("light");
    expect(await bg(p)).toBe("rgb(255, 255, 255)");
    await p.page.screenshot({ path: join(SHOTS, "catalogue-light-320.png"), fullPage: true });
    await p.page.click("#tab-templates");
    await p.page.screenshot({ path: join(SHOTS, "templates-light-320.png"), fullPage: true });
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
  it("reaches Insert table with Tab alone and inserts with Enter", async () => {
    const p = await pane();
    await stub(p.page, "select", "Sheet1", "A1");
    const visited: string[] = [];
    for (let i = 0; i < 80; i++) {
      await p.page.keyboard.press("Tab");
      const id = await p.page.evaluate(() => {
        const a = document.activeElement as HTMLElement | null;
        return a ? a.id || a.getAttribute("data-body") || a.getAttribute("data-field") || a.getAttribute("value") || a.textContent?.trim() || a.tagName : "";
      });
      visited.push(id);
      if (id === "insert-table") break;
    }
    expect(visited[visited.length - 1]).toBe("insert-table");
    // On the way: the tab, the filter, the quick picks, body and field boxes, units, the preview.
    for (const stop of ["tab-catalogue", "body-filter", "Sun and planets", "Earth", "gm", "km", "preview"]) expect(visited).toContain(stop);
    await p.page.keyboard.press("Enter");
    expect(await statusOf(p, "catalogue-status")).toContain(`Inserted table OrbitBodies at Sheet1!${written(DEFAULTS, 0, 0)}:`);
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
