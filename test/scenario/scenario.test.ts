import { readdirSync, readFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { parseBlock, parseCell } from "../../src/formula/cells";
import { callArguments, formulaBody, orbitCallAt, orbitCalls, rootOrbitCall } from "../../src/formula/scan";
import { layoutSheet, SCENARIO, type ScenarioSheet } from "../../src/scenario";
import { fixed, offset, SheetBuilder, span } from "../../src/scenario/builder";
import { CONTACT, DISPOSAL_LIMITS, HANDOUT, SKERRY_1, SKERRY_1_TLE, SKERRY_1E, SKERRY_GROUND, SKERRY_L, SKERRY_L_MARS, SOLAR_ACTIVITY } from "../../src/scenario/story";
import { widthInPoints } from "../../src/scenario/styles";
import { unwrapAnswer } from "../support/scenario";

// The scenario's descriptions on their own, without the functions: layout rules every sheet
// keeps, whatever writes it. Recalculation is checked in test/taskpane/templates.test.ts (the
// engine) and test/runner/demo.test.ts (the demo workbooks).

const ROOT = resolve(__dirname, "../..");
const formulas = (t: ScenarioSheet) => t.cells.filter((c) => typeof c.content === "string" && c.content.startsWith("="));
const at = (ref: string) => parseCell(ref)!;

describe("the scenario's sheets", () => {
  it("have distinct ids, sheet names (at most 31 characters, Excel's limit) and demo files", () => {
    for (const key of ["id", "sheetName", "file"] as const) expect(new Set(SCENARIO.map((t) => t[key])).size).toBe(SCENARIO.length);
    for (const t of SCENARIO) expect(t.sheetName.length, t.sheetName).toBeLessThanOrEqual(31);
    expect(SCENARIO.map((t) => t.id)).toEqual(["budget", "lifetime", "ground", "sweep", "handout", "lunar", "windows"]);
  });

  it.each(SCENARIO.map((t) => [t.id, t] as const))("%s: one cell per address, inputs are plain values, each with a label in its row or a heading above it", (_id, t) => {
    const refs = t.cells.map((c) => c.ref);
    expect(new Set(refs).size).toBe(refs.length);
    const byRef = new Map(t.cells.map((c) => [c.ref, c]));
    const inputs = t.cells.filter((c) => c.role === "input");
    expect(inputs.length).toBeGreaterThan(0);
    for (const c of inputs) {
      expect(c.content === "" || String(c.content).startsWith("="), c.ref).toBe(false);
      const { row, col } = at(c.ref);
      const label = byRef.get(`A${row + 1}`);
      let heading: ScenarioSheet["cells"][number] | undefined;
      for (let r = row - 1; r >= 0 && !heading; r--) {
        const above = t.cells.find((x) => x.ref === offset(c.ref, r - row));
        if (above && above.role !== "input") heading = above;
      }
      // A labelled input row (label in A, value in B), or a column of inputs under its heading.
      const labelled = col === 1 && label?.role === "label";
      const underHeading = heading?.role === "header";
      expect({ ref: c.ref, labelled: labelled || underHeading }).toEqual({ ref: c.ref, labelled: true });
    }
  });

  it.each(SCENARIO.map((t) => [t.id, t] as const))("%s: every ORBIT formula is a single call whose arguments are cells, ranges or words, never a typed number", (_id, t) => {
    // The inputs all live in cells (none hides in a formula); the words allowed are the ones
    // that say what a call computes, not scenario inputs. A call whose #N/A is an answer (a
    // lifetime past the integration's cap) may stand inside IFNA(call, fallback), the fallback
    // calling no ORBIT function; nothing else wraps a call.
    const WORDS: Record<string, number[]> = { CONVERT_UNIT: [1, 2], TRANSFER_GRID: [8], BODY_VALUE: [1] };
    const ANSWERS_WITH_NA = ["ORBIT_LIFETIME"];
    const problems: string[] = [];
    for (const c of formulas(t)) {
      const { formula: f, fallback } = unwrapAnswer(String(c.content));
      if (fallback !== undefined && (orbitCalls(fallback).length > 0 || !ANSWERS_WITH_NA.includes(rootOrbitCall(f) ?? ""))) problems.push(`${c.ref}: IFNA around ${f} with ${fallback}`);
      if (orbitCalls(f).length === 0) continue;
      const id = rootOrbitCall(f);
      if (!id || orbitCalls(f).length !== 1) {
        problems.push(`${c.ref}: not one call: ${f}`);
        continue;
      }
      const body = formulaBody(f);
      callArguments(body, orbitCallAt(body, 0)!.end).args.forEach((a, k) => {
        const cellOrRange = parseBlock(a.replace(/\$/g, "")) !== null;
        const word = /^".*"$/.test(a) && (WORDS[id] ?? []).includes(k);
        if (!(cellOrRange || word || a === "" || a === "TRUE")) problems.push(`${c.ref}: argument ${k + 1} of ${id} is ${a}`);
      });
    }
    expect(problems).toEqual([]);
  });

  it.each(SCENARIO.map((t) => [t.id, t] as const))("%s: the colour scale, the chart and the printout name cells of the sheet", (_id, t) => {
    const layout = layoutSheet(t);
    const inside = (ref: string) => at(ref).row < layout.rows && at(ref).col < layout.cols;
    for (const block of t.keyResults) {
      for (const row of block.rows) expect(row.length).toBe(block.columns.length);
      for (const row of block.rows) for (const v of row) if (typeof v === "object") expect(inside(v.cell), v.cell).toBe(true);
    }
    if (t.colourScale) expect(parseBlock(t.colourScale.range)).not.toBeNull();
    if (t.chart) {
      const x = parseBlock(t.chart.x)!;
      const y = parseBlock(t.chart.y)!;
      expect([x.cols, y.cols, x.rows]).toEqual([1, 1, y.rows]);
      expect(x.row).toBe(y.row);
      // The chart covers nothing but its own note.
      const area = parseBlock(`${t.chart.from}:${t.chart.to}`)!;
      const covered = t.cells.filter((c) => {
        const p = at(c.ref);
        return c.content !== "" && p.row >= area.row && p.row < area.row + area.rows && p.col >= area.col && p.col < area.col + area.cols;
      });
      expect(covered.map((c) => [c.ref, c.role])).toEqual([[t.chart.from, "note"]]);
    }
  });

  it("spell headings one way across the sheets: v∞, superscript units in parentheses, a capital first letter (or a component's symbol), one name for one thing", () => {
    const headings = SCENARIO.flatMap((t) => t.cells.filter((c) => c.role === "header").map((c) => `${t.id}!${c.ref}: ${String(c.content)}`));
    expect(headings.length).toBeGreaterThan(100);
    const bad = headings.filter((h) => {
      const text = h.slice(h.indexOf(": ") + 2);
      return /v_inf|v-inf|km2|km3|s2\b|time of flight/i.test(text) || !/^([A-Z]|v?[xyz] |v∞ )/.test(text) || /\((?![^)]*\))/.test(text);
    });
    expect(bad).toEqual([]);
  });

  it("types each number of the story once (src/scenario/story.ts) and writes it into an input cell", () => {
    const inputsOf = (id: string) => SCENARIO.find((t) => t.id === id)!.cells.filter((c) => c.role === "input").map((c) => c.content);
    const budget = inputsOf("budget");
    for (const v of [SKERRY_1.wetMass, SKERRY_1.isp, SKERRY_1.rideshareAltitude, SKERRY_1.rideshareInclination, SKERRY_1.missionAltitude, SKERRY_1.disposalPerigee, SKERRY_1.stationKeepingYears])
      expect(budget).toContain(v);
    for (const v of [SKERRY_1E.thrust, SKERRY_1E.isp, SKERRY_1E.below, SKERRY_1E.behind, SKERRY_1E.crossTrack, SKERRY_1E.hold, SKERRY_1E.transferTime, SKERRY_1E.companionRaan]) expect(budget).toContain(v);
    expect(inputsOf("sweep")).toEqual(expect.arrayContaining([SKERRY_1.rideshareAltitude, SKERRY_1.rideshareInclination, SKERRY_1.isp, 300, 1200]));
    expect(inputsOf("lunar")).toEqual(expect.arrayContaining([SKERRY_L.wetMass, SKERRY_L.isp, SKERRY_L.lunarAltitude]));
    expect(inputsOf("windows")).toEqual(expect.arrayContaining([SKERRY_L_MARS.departures, SKERRY_L_MARS.flightTimes, SKERRY_L_MARS.parkingAltitude]));
    expect(inputsOf("handout")).toEqual(expect.arrayContaining([...HANDOUT.bodies, HANDOUT.altitude]));
    for (const v of [SKERRY_1.dragArea, SKERRY_1.dragCoefficient, SOLAR_ACTIVITY.high]) expect(budget).toContain(v);
    expect(inputsOf("lifetime")).toEqual(
      expect.arrayContaining([SKERRY_1.wetMass, SKERRY_1.dragArea, SKERRY_1.dragCoefficient, SKERRY_1.missionAltitude, SKERRY_1.disposalPerigee, SKERRY_1.stationKeepingYears, SOLAR_ACTIVITY.low, SOLAR_ACTIVITY.moderate, SOLAR_ACTIVITY.high, DISPOSAL_LIMITS.strictYears, DISPOSAL_LIMITS.guidelineYears]),
    );
    expect(inputsOf("ground")).toEqual(expect.arrayContaining([SKERRY_1_TLE.line1, SKERRY_1_TLE.line2, SKERRY_GROUND.latitude, SKERRY_GROUND.longitude, SKERRY_GROUND.height, CONTACT.minElevation, CONTACT.downlinkFrequency]));
  });

  it("says invented wherever the invented element set and ground station appear", () => {
    // The Skerry-1 element set and Skerry Ground are made up (DEVELOPERS.md, "The Skerry demo scenario").
    const t = SCENARIO.find((s) => s.id === "ground")!;
    const text = (c: { content: string | number }) => String(c.content);
    expect(t.cells.find((c) => c.ref === "A1")!.content).toMatch(/invented station and element set/);
    expect(t.summary).toMatch(/both invented/);
    // The cells of an input's own row and of the row above it (a note over the element set).
    const near = (ref: string) => t.cells.filter((c) => [at(ref).row - 1, at(ref).row].includes(at(c.ref).row));
    for (const input of t.cells.filter((c) => c.role === "input" && (c.content === SKERRY_1_TLE.line1 || c.content === SKERRY_GROUND.latitude)))
      expect(near(input.ref).map(text).join(" "), input.ref).toMatch(/invented/);
    for (const block of t.keyResults.filter((k) => /Skerry Ground/.test(k.title))) expect(block.title).toMatch(/invented/);
  });

  it("tells one story: Skerry-L is the 24U cubesat study whose baseline reaches a 100 km lunar orbit and whose variant flies by Mars", () => {
    const text = (id: string) => {
      const t = SCENARIO.find((s) => s.id === id)!;
      return [t.title, t.summary, ...t.cells.map((c) => String(c.content))].join("\n");
    };
    expect(text("lunar")).toMatch(/24U cubesat/);
    expect(text("lunar")).toMatch(/Mars flyby variant/);
    expect(text("windows")).toMatch(/Skerry-L/);
    expect(text("windows")).toMatch(/Mars flyby variant/);
    expect(text("windows")).toMatch(/24U cubesat study/);
    expect(text("budget")).toMatch(/Skerry-1E/);
  });
});

describe("the sheet builder", () => {
  it("refuses a second write to a cell, and numbers rows after the title block", () => {
    const b = new SheetBuilder("T");
    expect(b.row).toBe(5);
    expect(b.input("x", 1)).toBe("B5");
    expect(() => b.put("B5", 2, "input")).toThrow(/written twice/);
    expect(b.spillRow("r", "=ORBIT.SHAPE_FROM_APSES(B5, B5)", ["a", "b"], ["0", "0.0"])).toBe("B7");
    expect(b.cellsInOrder().filter((c) => c.ref === "C7")).toEqual([{ ref: "C7", content: "", role: "result", format: "0.0" }]);
  });

  it("writes addresses: fixed, offset, span", () => {
    expect(fixed("B7")).toBe("$B$7");
    expect(offset("B7", 2, 1)).toBe("C9");
    expect(span("C4", 3)).toBe("C4:C6");
    expect(span("C4", 3, true)).toBe("C4:E4");
  });

  it("gives column widths in points as Excel draws them (ECMA-376 Part 1 §18.3.1.13)", () => {
    // The default column, 8.43 characters of 11 pt Calibri, is stored as width 9.140625 and drawn
    // 64 px wide, 48 pt (the worked example of §18.3.1.13, from memory).
    expect(widthInPoints(9.140625)).toBe(48);
    expect(widthInPoints(10)).toBe(52.5);
  });
});

describe("the scenario's layer", () => {
  it("imports nothing but its own files and src/formula; the runner never imports examples/, which holds no source", () => {
    const dir = join(ROOT, "src/scenario");
    for (const f of readdirSync(dir)) {
      const specs = [...readFileSync(join(dir, f), "utf8").matchAll(/from "([^"]+)"/g)].map((m) => m[1]);
      for (const s of specs) expect({ f, s, ok: s.startsWith("./") || s.startsWith("../formula/") }).toEqual({ f, s, ok: true });
    }
    const runner = join(ROOT, "src/runner");
    for (const f of readdirSync(runner)) expect({ f, examples: /from "[^"]*examples\//.test(readFileSync(join(runner, f), "utf8")) }).toEqual({ f, examples: false });
    expect(readdirSync(join(ROOT, "examples")).filter((f) => /\.(ts|js|mjs|cjs)$/.test(f))).toEqual([]);
  });
});
