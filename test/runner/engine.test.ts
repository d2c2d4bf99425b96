import { describe, expect, it } from "vitest";
import { DetailedCellError, HyperFormula, type RawCellContent } from "hyperformula";
import { exampleFormula } from "../../src/functions/examples";
import { addressKey, buildEngine, errorCode, filledSize, parsingError, type OrbitEngine } from "../../src/runner/engine";
import { outValue } from "../../src/runner/recalc";
import { CellError } from "../../src/runner/host";
import { toEngineFormula } from "../../src/runner/names";
import { ResultSizes } from "../../src/runner/sizes";
import { bundle, direct, sameCell } from "./support";

// The engine is a second host for the BUILT functions: every check compares what the engine
// shows with a direct call of the same function from dist/functions.js (loadBundle), cell by cell,
// with exact equality (full doubles), errors by code and message.

type Grid = RawCellContent[][];

function engineOf(grid: Grid): OrbitEngine {
  return buildEngine(
    bundle(),
    { S: grid.map((r) => r.map((c) => (typeof c === "string" && c.startsWith("=") ? toEngineFormula(c) : c))) },
  );
}

/** The values the engine shows in rows x cols cells from (row, col). */
function block(e: OrbitEngine, row: number, col: number, rows: number, cols: number) {
  return e.hf.getRangeValues({ start: { sheet: 0, row, col }, end: { sheet: 0, row: row + rows - 1, col: col + cols - 1 } });
}

/** Expects the engine's spilled result at (row, col) to be exactly `returned`, filling exactly its shape. */
function expectSpill(e: OrbitEngine, row: number, col: number, returned: unknown[][]) {
  const rows = returned.length;
  const cols = Math.max(...returned.map((r) => r.length));
  // A one-cell result at a one-cell formula needs no record; any other is recorded with its size.
  expect(e.spills.get(addressKey({ sheet: 0, row, col })) ?? { rows: 1, cols: 1 }).toEqual({ rows, cols });
  const got = block(e, row, col, rows, cols);
  for (let i = 0; i < rows; i++)
    for (let j = 0; j < cols; j++) expect(sameCell(got[i][j], returned[i][j] ?? ""), `cell ${i},${j}: engine ${JSON.stringify(got[i][j])}, function ${JSON.stringify(returned[i][j])}`).toBe(true);
}

const arg = (v: unknown): unknown => (v === null || v === undefined ? null : Array.isArray(v) ? v : [[v]]);

describe("registration", () => {
  const metadata = bundle().metadata;

  it("registers every function of functions.json as ORBIT.<ID>", () => {
    const names = new Set(engineOf([[1]]).hf.getRegisteredFunctionNames());
    expect(metadata.length).toBeGreaterThan(0);
    for (const m of metadata) expect(names.has(`ORBIT.${m.id}`), m.id).toBe(true);
  });

  it.each(metadata.map((m) => m.id))("%s answers its worked example exactly as the bundle does when called directly", (id) => {
    const example = bundle().registry.specs.get(id)!.example;
    const e = engineOf([[exampleFormula(id, example)]]);
    const meta = metadata.find((m) => m.id === id)!;
    const returned = bundle().functions.get(id)!(...meta.parameters.map((_, k) => arg(example[k]))) as unknown[][];
    expectSpill(e, 0, 0, returned);
    // One evaluation when the size is known beforehand; a whole-range function whose size rule
    // cannot tell (PASSES: one row per pass found) is sized from its result and entered once more.
    const literal = (v: unknown) => (Array.isArray(v) ? undefined : (v as number | string | boolean));
    const shape = (v: unknown) => (v === null || v === undefined ? null : Array.isArray(v) ? { rows: v.length, cols: (v[0] as unknown[]).length } : { rows: 1, cols: 1 });
    const predicted = new ResultSizes(bundle().functions, metadata, bundle().registry.specs).predict(id, meta.parameters.map((_, k) => ({ shape: shape(example[k]), literal: literal(example[k]) })));
    expect(e.passes).toBe(predicted ? 1 : 2);
  });

  it("leaves other engines in the process alone: they keep the built-in functions and know no ORBIT function", () => {
    engineOf([[1]]);
    const other = HyperFormula.buildFromSheets({ S: [["=SQRT(16)", '=ORBIT.BODY_GM("Earth")']] }, { licenseKey: "gpl-v3" });
    expect(other.getCellValue({ sheet: 0, row: 0, col: 0 })).toBe(4);
    expect((other.getCellValue({ sheet: 0, row: 0, col: 1 }) as DetailedCellError).value).toBe("#NAME?");
  });
});

describe("values", () => {
  it("keeps full doubles (no display rounding, no nearly-equal tolerance)", () => {
    const e = engineOf([["=ORBIT.GM_FROM_ORBIT(7068.137, 5917.5)", "=A1-398600"]]);
    const v = e.hf.getCellValue({ sheet: 0, row: 0, col: 0 }) as number;
    expect(v).toBe(direct("GM_FROM_ORBIT", 7068.137, 5917.5)[0][0]);
    expect(String(v).replace(/\D/g, "").length).toBeGreaterThan(12);
    expect(e.hf.getCellValue({ sheet: 0, row: 0, col: 1 })).toBe(v - 398600);
  });

  it("passes an omitted optional as null and a blank cell as 0, as Excel desktop does (OfficeDev/office-js issues #1951, #5262)", () => {
    const e = engineOf([['=ORBIT.ORBITAL_SPEED("Earth", 7000, )', '=ORBIT.ORBITAL_SPEED("Earth", 7000, C1)', null]]);
    expectSpill(e, 0, 0, direct("ORBITAL_SPEED", "Earth", 7000, null));
    const blank = direct("ORBITAL_SPEED", "Earth", 7000, 0);
    expect(blank[0][0]).toBeInstanceOf(CellError);
    expectSpill(e, 0, 1, blank);
  });

  it("gives dates as Excel serials: DATE(2028,1,1) is the day count from 1899-12-30", () => {
    const e = engineOf([["=DATE(2028,1,1)", "=DATE(1900,3,1)"]]);
    // Excel's serial for a date after 1900-02-28 is days since 1899-12-30 (its 1900 leap-year quirk), from memory.
    expect(e.hf.getCellValue({ sheet: 0, row: 0, col: 0 })).toBe((Date.UTC(2028, 0, 1) - Date.UTC(1899, 11, 30)) / 86_400_000);
    expect(e.hf.getCellValue({ sheet: 0, row: 0, col: 1 })).toBe(61);
  });

  it("uses ORBIT results inside the engine's own formulas and references into a spill", () => {
    const e = engineOf([
      [7000, "=ORBIT.ORBITAL_SPEED(\"Earth\", A1:A3)", "=SUM(ORBIT.ORBITAL_SPEED(\"Earth\", A1:A3))", "=2*ORBIT.BODY_GM(\"Earth\")", "=B3"],
      [8000, null, null, null, null],
      [9000, null, null, null, null],
    ]);
    const speeds = direct("ORBITAL_SPEED", "Earth", [[7000], [8000], [9000]]);
    expectSpill(e, 0, 1, speeds);
    expect(e.hf.getCellValue({ sheet: 0, row: 0, col: 2 })).toBe((speeds[0][0] as number) + (speeds[1][0] as number) + (speeds[2][0] as number));
    expect(e.hf.getCellValue({ sheet: 0, row: 0, col: 3 })).toBe(2 * (direct("BODY_GM", "Earth")[0][0] as number));
    expect(e.hf.getCellValue({ sheet: 0, row: 0, col: 4 })).toBe(speeds[2][0]);
  });
});

describe("spilled results fill the cells the function returns, sized before evaluation", () => {
  const col = [[6800], [6900], [7000], [7100], [7200]];
  const row = [["Earth", "Mars", "Moon"]];

  it("a column of cases", () => {
    const e = engineOf([[6800, '=ORBIT.ORBITAL_SPEED("Earth", A1:A5)'], [6900], [7000], [7100], [7200]]);
    expectSpill(e, 0, 1, direct("ORBITAL_SPEED", "Earth", col));
    expect(e.passes).toBe(1);
  });

  it("a column against a row makes a table", () => {
    const e = engineOf([[6800, "Earth", "Mars", "Moon"], [6900], [7000], [7100], [7200], [null, "=ORBIT.ESCAPE_SPEED(B1:D1, A1:A5)"]]);
    expectSpill(e, 5, 1, direct("ESCAPE_SPEED", row, col));
    expect(e.passes).toBe(1);
  });

  it("k values per case, one row per case, with a literal header row", () => {
    const e = engineOf([[6800, 7200, "=ORBIT.SHAPE_FROM_APSES(A1:A3, B1:B3, TRUE)"], [6900, 7300], [7000, 7400]]);
    expectSpill(e, 0, 2, direct("SHAPE_FROM_APSES", [[6800], [6900], [7000]], [[7200], [7300], [7400]], true));
    expect(e.passes).toBe(1);
  });

  it("a vector argument of six cells per case (a state per row), and one case given as a column", () => {
    const states = [
      [7068.137, 0, 0, 0, -1.0727, 7.4333],
      [7000, 100, 0, 0.1, 7.5, 0.2],
    ];
    const e = engineOf([...states, ['=ORBIT.ELEMENTS_FROM_STATE("Earth", A1:F2)']]);
    expectSpill(e, 2, 0, direct("ELEMENTS_FROM_STATE", "Earth", states));
    const f = engineOf([...states[0].map((v) => [v]), ['=ORBIT.ELEMENTS_FROM_STATE("Earth", A1:A6)']]);
    expectSpill(f, 6, 0, direct("ELEMENTS_FROM_STATE", "Earth", states[0].map((v) => [v])));
    expect(e.passes + f.passes).toBe(2);
  });

  it("ranges that do not line up give one error cell, sized as the function sizes it", () => {
    const e = engineOf([[1, 1, '=ORBIT.ORBITAL_SPEED("Earth", A1:A2, B1:B3)'], [2, 2], [3, 3]]);
    const returned = direct("ORBITAL_SPEED", "Earth", [[1], [2]], [[1], [2], [3]]);
    expect(returned.length).toBe(1);
    expectSpill(e, 0, 2, returned);
  });

  it("whole-range functions: a burn sequence over a range and a catalogue table from literal lists", () => {
    const e = engineOf([
      [0.1, 225, "=ORBIT.BURN_SEQUENCE(A1:A3, B1:B3, 180, , TRUE)", null, null, '=ORBIT.BODY_TABLE("gm, mean_radius", "Earth, Moon, Mars", TRUE)'],
      [0.2, 225],
      [0.05, 230],
    ]);
    expectSpill(e, 0, 2, direct("BURN_SEQUENCE", [[0.1], [0.2], [0.05]], [[225], [225], [230]], 180, null, true));
    expectSpill(e, 0, 5, direct("BODY_TABLE", "gm, mean_radius", "Earth, Moon, Mars", true));
    expect(e.passes).toBe(1);
  });

  it("a transfer grid: flight times down, departures across, and a header row and column on request", () => {
    const e = engineOf([['=ORBIT.TRANSFER_GRID("Earth", "Mars", 47085, 15, 4, 200, 50, 3, "c3", TRUE)']]);
    expectSpill(e, 0, 0, direct("TRANSFER_GRID", "Earth", "Mars", 47085, 15, 4, 200, 50, 3, "c3", true));
    expect(e.passes).toBe(1);
    const byRef = engineOf([[4, 3, '=ORBIT.TRANSFER_GRID("Earth", "Mars", 47085, 15, A1, 200, 50, B1)']]);
    expectSpill(byRef, 0, 2, direct("TRANSFER_GRID", "Earth", "Mars", 47085, 15, 4, 200, 50, 3));
    expect(byRef.passes).toBe(2); // the counts are values in cells: learned from the result
  });

  it("the whole catalogue table when both lists are omitted", () => {
    const e = engineOf([["=ORBIT.BODY_TABLE()"]]);
    expectSpill(e, 0, 0, direct("BODY_TABLE"));
    expect(e.passes).toBe(1);
  });

  it("learns the size when it depends on a referenced value, and enters the formula again", () => {
    const e = engineOf([
      [6800, 7200, true, "=ORBIT.SHAPE_FROM_APSES(A1:A2, B1:B2, C1)", null, null, "Earth, Moon", "=ORBIT.BODY_TABLE(\"gm\", G1)"],
      [6900, 7300],
    ]);
    expectSpill(e, 0, 3, direct("SHAPE_FROM_APSES", [[6800], [6900]], [[7200], [7300]], true));
    expectSpill(e, 0, 7, direct("BODY_TABLE", "gm", "Earth, Moon"));
    expect(e.passes).toBe(2);
  });

  it("names a formula whose size has not settled when the passes run out", () => {
    const e = buildEngine(bundle(), { S: [[toEngineFormula('=ORBIT.BODY_TABLE("gm", D1)'), null, null, "'Earth, Moon, Mars"]] }, { maxPasses: 1 });
    expect(e.unsettled).toEqual([{ sheet: 0, row: 0, col: 0 }]);
    expect(engineOf([['=ORBIT.BODY_TABLE("gm", D1)', null, null, "Earth, Moon, Mars"]]).unsettled).toEqual([]);
  });

  it("a result with no room to spill is #SPILL!, as in Excel", () => {
    const e = engineOf([[6800, '=ORBIT.ORBITAL_SPEED("Earth", A1:A2)'], [6900, "in the way"]]);
    const v = e.hf.getCellValue({ sheet: 0, row: 0, col: 1 });
    expect(v).toBeInstanceOf(DetailedCellError);
    expect((v as DetailedCellError).type).toBe("SPILL");
  });
});

describe("cell errors keep their type and message", () => {
  it("#VALUE! for a bad argument, #N/A when no answer exists, #NUM! when the arithmetic fails", () => {
    const e = engineOf([['=ORBIT.ORBITAL_SPEED("Earth", -5)', '=ORBIT.SUN_SYNC_INCLINATION("Earth", 40000, 0)', "=ORBIT.CONVERT_UNIT(1e300, \"au\", \"m\")"]]);
    const cases = [direct("ORBITAL_SPEED", "Earth", -5), direct("SUN_SYNC_INCLINATION", "Earth", 40000, 0), direct("CONVERT_UNIT", 1e300, "au", "m")];
    expect(cases.map((c) => (c[0][0] as CellError).code)).toEqual(["#VALUE!", "#N/A", "#NUM!"]);
    cases.forEach((c, j) => expectSpill(e, 0, j, c));
    const msg = e.hf.getCellValue({ sheet: 0, row: 0, col: 0 }) as DetailedCellError;
    expect(msg.message).toMatch(/radius/);
  });

  it("one bad case inside a range errors its own cell only", () => {
    const e = engineOf([[7000, '=ORBIT.ORBITAL_SPEED("Earth", A1:A3)'], [-1], [8000]]);
    const returned = direct("ORBITAL_SPEED", "Earth", [[7000], [-1], [8000]]);
    expect(returned.map((r) => r[0] instanceof CellError)).toEqual([false, true, false]);
    expectSpill(e, 0, 1, returned);
  });

  it("an error in an argument cell is passed on without calling the function, as Excel does", () => {
    const e = engineOf([["#N/A", "=ORBIT.BODY_GM(A1)", "=ORBIT.ORBITAL_SPEED(\"Earth\", A1:A2)"], [7000]]);
    expect((e.hf.getCellValue({ sheet: 0, row: 0, col: 1 }) as DetailedCellError).type).toBe("NA");
    expect((e.hf.getCellValue({ sheet: 0, row: 0, col: 2 }) as DetailedCellError).type).toBe("NA");
  });

  it("too many arguments is #VALUE! naming the parameters, and an unknown ORBIT function #NAME?", () => {
    const e = engineOf([['=ORBIT.BODY_GM("Earth", 1)', '=ORBIT.NO_SUCH_FUNCTION("Earth")', '=ORBIT.TRANSFER_BURNS("Earth", 6878, 7000, , TRUE, 3)']]);
    const many = e.hf.getCellValue({ sheet: 0, row: 0, col: 0 }) as DetailedCellError;
    expect(many.value).toBe("#VALUE!");
    expect(many.message).toMatch(/^body: got 1 more argument after it; expected at most 1 argument \(body\); a comma inside a number/);
    const burns = e.hf.getCellValue({ sheet: 0, row: 0, col: 2 }) as DetailedCellError;
    expect(burns.value).toBe("#VALUE!");
    expect(burns.message).toMatch(/^include_header: got 1 more argument after it; expected at most 5 arguments \(body, radius_from, radius_to, via_radius, include_header\)/);
    expect((e.hf.getCellValue({ sheet: 0, row: 0, col: 1 }) as DetailedCellError).value).toBe("#NAME?");
  });
});

describe("dynamic-array semantics, SINGLE and error codes", () => {
  const dyn = (grid: Grid): OrbitEngine =>
    buildEngine(bundle(), { S: grid.map((r) => r.map((c) => (typeof c === "string" && c.startsWith("=") ? toEngineFormula(c, { dynamic: true }) : c))) });

  it("spills an ORBIT result used element-wise in an expression, as Excel 365 does", () => {
    const e = dyn([[7000, '=1000*ORBIT.ORBITAL_SPEED("Earth", A1:A3)'], [8000], [9000]]);
    const speeds = direct("ORBITAL_SPEED", "Earth", [[7000], [8000], [9000]]);
    expect(block(e, 0, 1, 3, 1).map((r) => r[0])).toEqual(speeds.map((r) => 1000 * (r[0] as number)));
    expect(filledSize(e, { sheet: 0, row: 0, col: 1 })).toEqual({ rows: 3, cols: 1 });
  });

  it("gives a nested whole-range result whose size was guessed its full size (cut, learned, entered again)", () => {
    const e = dyn([['=2*ORBIT.BODY_TABLE("gm", A5)'], [], [], [], ["Earth, Moon, Mars"]]);
    const table = direct("BODY_TABLE", "gm", "Earth, Moon, Mars");
    expect(e.passes).toBe(2);
    expect(block(e, 0, 0, table.length, 2).map((r) => r[1])).toEqual(table.map((r) => 2 * (r[1] as number)));
  });

  it("SINGLE (the @ operator) intersects a column with the formula's row, a row with its column, and takes an array's first value", () => {
    const e = dyn([
      [1, 10, "=SINGLE(A1:A3)", "=SINGLE(A1:B1)"],
      [2, 20, "=SINGLE(A1:A3)", "=SINGLE({7,8;9,10})"],
      [3, 30, "=SINGLE(A1:B3)", "=SINGLE(A5:A9)"],
    ]);
    expect(block(e, 0, 2, 2, 1).map((r) => r[0])).toEqual([1, 2]);
    // Microsoft, "Implicit intersection operator: @": a range meets the formula's row or column in
    // one cell or the result is #VALUE! (C3: row 3 of A1:B3 is two cells; D1: A1:B1 has no column D;
    // D3: A5:A9 has no row 3).
    const value = (row: number, col: number) => (block(e, row, col, 1, 1)[0][0] as DetailedCellError).value;
    expect([value(2, 2), value(0, 3), value(2, 3)]).toEqual(["#VALUE!", "#VALUE!", "#VALUE!"]);
    expect(block(e, 1, 3, 1, 1)[0][0]).toBe(7);
  });

  it("keeps the codes the engine lacks (#NULL!) and maps only the engine-only kinds out of a file", () => {
    expect(errorCode({ value: "#ERROR!", message: "#NULL! ranges do not meet" })).toEqual({ code: "#NULL!", message: "ranges do not meet" });
    expect(errorCode({ value: "#SPILL!", message: "No space for array result." })).toEqual({ code: "#SPILL!", message: "No space for array result." });
    const hf = HyperFormula.buildFromArray([["=1/0", "=#SPILL!", "=A1+", "=C1"]], { licenseKey: "gpl-v3" });
    const at = (col: number) => hf.getCellValue({ sheet: 0, row: 0, col });
    expect([outValue(at(0)), outValue(at(1)), outValue(at(2))]).toEqual([{ error: "#DIV/0!" }, { error: "#SPILL!" }, undefined]);
    expect(parsingError("=A1+")).toMatch(/^Parsing error/);
    expect(parsingError("=ARRAYFORMULA(A1+)")).toMatch(/^Parsing error/);
    expect(parsingError("=A1+1")).toBeUndefined();
  });
});
