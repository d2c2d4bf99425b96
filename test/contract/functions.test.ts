import { describe, expect, it } from "vitest";
import { CellError, isCellError } from "../../src/runner/host";
import { EXAMPLES } from "../../src/functions/examples";
import { builtBundle, excelArg } from "./bundle";

// Contract: the BUILT dist/functions.js, loaded with nothing but a stand-in CustomFunctions,
// associates exactly the ids of the generated functions.json, and every function answers when
// Excel calls it by id (a single case, a range, and a bad argument).
const bundle = builtBundle();
const ids = bundle.metadata.map((m) => m.id);

// Functions that take whole ranges as lists (not lifted case by case).
const WHOLE_RANGE = new Set(["BODY_TABLE", "BURN_SEQUENCE", "TRANSFER_GRID"]);

const cells = (grid: unknown): unknown[] => (grid as unknown[][]).flat();

describe("the built bundle", () => {
  it("associates each id of functions.json exactly once, and nothing else", () => {
    expect([...bundle.functions.keys()].sort()).toEqual([...ids].sort());
    expect(bundle.duplicates).toEqual([]);
  });

  it("declares every parameter as a matrix of any, so ranges lift", () => {
    for (const m of bundle.metadata) for (const p of m.parameters) expect({ id: m.id, p: p.name, d: p.dimensionality, t: p.type }).toEqual({ id: m.id, p: p.name, d: "matrix", t: "any" });
  });

  it("gives each function as many JavaScript parameters as functions.json lists", () => {
    for (const m of bundle.metadata) expect({ id: m.id, n: bundle.functions.get(m.id)!.length }).toEqual({ id: m.id, n: m.parameters.length });
  });

  it("uses lower_snake parameter names and UPPER_SNAKE ids with a help URL", () => {
    for (const m of bundle.metadata) {
      expect(m.id).toMatch(/^[A-Z][A-Z0-9]*(_[A-Z0-9]+)*$/);
      expect(m.helpUrl).toMatch(/reference\.html#[a-z0-9_]+$/);
      for (const p of m.parameters) expect(p.name).toMatch(/^[a-z][a-z0-9]*(_[a-z0-9]+)*$/);
    }
  });

  it("has a worked example for every function, and no example for a function that does not exist", () => {
    expect(Object.keys(EXAMPLES).sort()).toEqual([...ids].sort());
  });
});

describe.each(ids)("%s through the bundle", (id) => {
  const fn = bundle.functions.get(id)!;
  const meta = bundle.metadata.find((m) => m.id === id)!;
  const example = EXAMPLES[id] ?? [];
  const args = meta.parameters.map((_, k) => excelArg(example[k] ?? null));

  it("answers its worked example with finite numbers or text, no error", () => {
    const out = fn(...args);
    expect(Array.isArray(out)).toBe(true);
    for (const c of cells(out)) {
      expect(isCellError(c), `${id} example gave ${JSON.stringify(c)}`).toBe(false);
      if (typeof c === "number") expect(Number.isFinite(c)).toBe(true);
    }
  });

  it("lifts over a range: three copies of the first numeric argument give three copies of the answer", () => {
    const k = example.findIndex((v) => typeof v === "number");
    if (k < 0 || WHOLE_RANGE.has(id)) return; // whole-range functions have their own range tests
    const plain = args.map((a, q) => (meta.parameters[q].name === "include_header" ? null : a));
    const ranged = plain.slice();
    ranged[k] = [[example[k]], [example[k]], [example[k]]];
    const single = fn(...plain) as unknown[][];
    expect(single.length).toBe(1);
    expect(fn(...ranged)).toEqual([single[0], single[0], single[0]]);
  });

  it("turns a bad argument into a typed cell error with a message naming a parameter", () => {
    const bad = args.slice();
    bad[0] = [["not a valid value ~"]];
    const out = cells(fn(...bad));
    const errors = out.filter(isCellError) as CellError[];
    // A function whose first parameter is free text may accept it; then no error is required.
    for (const e of errors) {
      expect(["#VALUE!", "#N/A"]).toContain(e.code);
      expect(meta.parameters.some((p) => e.message?.startsWith(p.name + ":"))).toBe(true);
    }
    for (const c of out) if (typeof c === "number") expect(Number.isFinite(c)).toBe(true);
  });
});

describe("the bundle outside the isolated context", () => {
  it("registers the same ids when run in this context (as the runner and benchmarks load it)", async () => {
    const { loadBundle } = await import("../../src/runner/host");
    const { resolve } = await import("node:path");
    const fast = loadBundle(resolve(__dirname, "../../dist"));
    expect([...fast.functions.keys()].sort()).toEqual([...bundle.functions.keys()].sort());
  });
});
