import "../support/customFunctions";
import { describe, expect, it } from "vitest";
import { badArgument, noAnswer, arithmeticFailure } from "../../src/core/domain";
import { lift, row, scalar, table } from "../../src/functions/lift";
import { body, flag, list, num, numbers, optNum, vec } from "../../src/functions/params";
import { code, msg } from "./cells";

// The adaptor's contract (DEVELOPERS.md, "Conventions"): broadcasting like Excel's own functions, per-cell errors,
// omitted optionals as null, blanks in ranges as 0, header rows for multi-value functions.
const add = lift(scalar, [num("a"), num("b")], (a, b) => a + b);

describe("broadcasting", () => {
  it("pairs equal shapes element by element", () => {
    expect(add([[1, 2], [3, 4]], [[10, 20], [30, 40]])).toEqual([[11, 22], [33, 44]]);
  });
  it("stretches a single cell over a range", () => {
    expect(add([[1], [2], [3]], [[10]])).toEqual([[11], [12], [13]]);
    expect(add(5, [[1, 2]])).toEqual([[6, 7]]);
  });
  it("crosses a column with a row into a table", () => {
    expect(add([[1], [2]], [[10, 20, 30]])).toEqual([[11, 21, 31], [12, 22, 32]]);
  });
  it("refuses shapes that do not line up, with one error naming both parameters", () => {
    const out = add([[1], [2], [3]], [[1], [2]]);
    expect(out.length).toBe(1);
    expect(code(out[0][0])).toBe("#VALUE!");
    expect(msg(out[0][0])).toBe("b: got 2 rows where a has 3; expected ranges of the same size, or a single cell, row or column that stretches.");
  });
});

describe("argument kinds Excel passes", () => {
  it("takes blank cells inside a range as 0 and rejects text with the parameter named", () => {
    const out = add([[0], ["abc"], [true]], 1);
    expect(out[0][0]).toBe(1);
    expect(msg(out[1][0])).toBe('a: got "abc"; expected a number.');
    expect(msg(out[2][0])).toBe("a: got TRUE; expected a number.");
  });
  it("passes omitted optionals as null, also a blank single cell", () => {
    const f = lift(scalar, [num("x"), optNum("y", "km")], (x, y) => (y === null ? -x : x + y));
    expect(f([[2]], null)).toEqual([[-2]]);
    expect(f([[2]], undefined)).toEqual([[-2]]);
    expect(f([[2]], [[null]])).toEqual([[-2]]);
    expect(f([[2]], [[3]])).toEqual([[5]]);
    expect(msg(f([[2]], [["x"]])[0][0])).toBe('y: got "x"; expected a number (km) or nothing.');
  });
  it("says a required argument is missing", () => {
    expect(msg(add(null, 1)[0][0])).toBe("a: got (blank); expected a number, which is required.");
  });
  it("reads body names case-insensitively and GM numbers, and lists close names for a typo", () => {
    const gm = lift(scalar, [body()], (b) => (typeof b === "number" ? b : b.gm.value));
    expect(gm([["earth"], [" EARTH "], [398600]])).toEqual([[3.9860043550702266e5], [3.9860043550702266e5], [398600]]);
    expect(msg(gm("Eatrh")[0][0])).toMatch(/^body: got "Eatrh"; expected a catalogue body name such as Earth/);
    expect(msg(gm(-5)[0][0])).toMatch(/^body: got -5; expected a catalogue body name \(e\.g\. "Earth"\) or a positive GM/);
  });
  it("takes TRUE/FALSE and 1/0 for flags", () => {
    const f = lift(scalar, [flag("long_way")], (b) => (b ? 1 : 0));
    expect(f([[true], [false], [1], [0], [null]])).toEqual([[1], [0], [1], [0], [0]]);
    expect(code(f("yes")[0][0])).toBe("#VALUE!");
  });
});

describe("a column of numbers (the adaptor's fast path) keeps the general rules", () => {
  it("reports the first bad argument of a case in parameter order, one cell at a time", () => {
    const out = add([[1], ["x"], [3]], [[10], ["y"], [null]]);
    expect(out[0][0]).toBe(11);
    expect(msg(out[1][0])).toBe('a: got "x"; expected a number.');
    expect(msg(out[2][0])).toBe("b: got (blank); expected a number, which is required.");
  });
  it("turns a non-finite core result into #NUM! and a core error into its own cell", () => {
    const inv = lift(scalar, [num("x")], (x) => (x === 0 ? noAnswer("x", "nothing at zero") : 1 / x));
    const out = inv([[2], [0], [1e-320]]);
    expect(out[0][0]).toBe(0.5);
    expect(code(out[1][0])).toBe("#N/A");
    expect(code(out[2][0])).toBe("#NUM!");
  });
  it("gives the same answers as the general path (a row of cases)", () => {
    const column = add([[1], [2], [3]], 10).map((r) => r[0]);
    expect(add([[1, 2, 3]], 10)[0]).toEqual(column);
  });
});

describe("errors from the core", () => {
  const f = lift(scalar, [num("x")], (x) => (x < 0 ? badArgument("x", x, "zero or more") : x === 0 ? noAnswer("x", "nothing at zero") : x > 1e300 ? arithmeticFailure("x", "overflow") : Math.sqrt(x)));
  it("maps each case's error to its own cell only", () => {
    const out = f([[4], [-1], [0], [1e308], [9]]);
    expect(out.map((r) => code(r[0]))).toEqual([2, "#VALUE!", "#N/A", "#NUM!", 3]);
    expect(msg(out[1][0])).toBe("x: got -1; expected zero or more.");
    expect(msg(out[2][0])).toBe("x: nothing at zero.");
    expect(msg(out[3][0])).toBeUndefined(); // Excel shows no custom message with #NUM!
  });
  it("turns a non-finite number from the core into #NUM!, never NaN or Infinity", () => {
    const bad = lift(scalar, [num("x")], (x) => x / 0);
    expect(code(bad(1)[0][0])).toBe("#NUM!");
  });
});

describe("multi-value functions", () => {
  const pair = lift(row("sum", "difference"), [num("a"), num("b")], (a, b) => [a + b, a - b]);
  it("return one row per case, with the header on request", () => {
    expect(pair([[5], [7]], 2)).toEqual([[7, 3], [9, 5]]);
    expect(pair([[5, 7]], 2)).toEqual([[7, 3], [9, 5]]);
    expect(pair(5, 2, [[true]])).toEqual([["sum", "difference"], [7, 3]]);
  });
  it("fill a failing case's row with its error", () => {
    const p = lift(row("x", "y"), [num("a")], (a) => (a < 0 ? noAnswer("a", "negative") : [a, a]));
    const out = p([[1], [-1]]);
    expect(out[0]).toEqual([1, 1]);
    expect(out[1].map(code)).toEqual(["#N/A", "#N/A"]);
  });
  it("refuse a two-dimensional block of cases", () => {
    expect(code(pair([[1, 2], [3, 4]], 1)[0][0])).toBe("#VALUE!");
  });
});

describe("vector parameters", () => {
  const norm = lift(scalar, [vec("r", 3, "x, y, z in km")], (r) => Math.hypot(r[0], r[1], r[2]));
  it("take one case per row of three cells, or a single column of three", () => {
    expect(norm([[3, 4, 0], [0, 0, 2]])).toEqual([[5], [2]]);
    expect(norm([[3], [4], [12]])).toEqual([[13]]);
  });
  it("say a missing vector is required instead of failing", () => {
    expect(msg(norm(null)[0][0])).toBe("r: got (blank); expected 3 numbers in a row (x, y, z in km), which are required.");
  });
  it("refuse a range of the wrong width, naming the parameter", () => {
    expect(msg(norm([[1, 2, 3, 4]])[0][0])).toBe('r: got a 1x4 range; expected 3 columns per case, one case per row.');
    expect(msg(norm([[1, "a", 3]])[0][0])).toBe('r: got "a"; expected 3 numbers in a row (x, y, z in km); item 2 is not a number.');
  });
});

describe("whole-range functions", () => {
  const cumulative = table([list("values", false, numbers), num("start")], (vs, s) => {
    let acc = s;
    return vs.map((v) => [v, (acc += v)]);
  }, () => ["value", "running total"]);
  it("read the list whole and a single cell for the rest", () => {
    expect(cumulative([[1], [2], [3]], 10)).toEqual([[1, 11], [2, 13], [3, 16]]);
    expect(cumulative([[1, 2]], 0, true)).toEqual([["value", "running total"], [1, 1], [2, 3]]);
  });
  it("refuse a range where a single cell is wanted", () => {
    expect(msg(cumulative([[1]], [[1, 2]])[0][0])).toBe('start: got a 1x2 range; expected a single cell.');
  });
});
