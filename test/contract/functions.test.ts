import { readFileSync } from "node:fs";
import { resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { CellError, isCellError } from "../../src/runner/host";
import { builtBundle, excelArg } from "./bundle";

// Contract: the BUILT dist/functions.js, loaded with nothing but a stand-in CustomFunctions,
// associates exactly the ids of the generated functions.json; every id calls the declaration of
// the same id, whose parameter names and order are functions.json's; and every function answers
// when Excel calls it by id (its worked example, a range, and a bad argument).
const bundle = builtBundle();
const ids = bundle.metadata.map((m) => m.id);
/** functions.json as built, enums included (the bundle loader keeps only its functions). */
const metadata = JSON.parse(readFileSync(resolve(__dirname, "../../dist/functions.json"), "utf8")) as {
  functions: { id: string; parameters: { name: string; customEnumId?: string }[] }[];
  enums: { id: string; type: string; values: { name: string; stringValue: string; tooltip: string }[] }[];
};
const specs = bundle.registry.specs;

const cells = (grid: unknown): unknown[] => (grid as unknown[][]).flat();

describe("the built bundle", () => {
  it("associates each id of functions.json exactly once, and nothing else", () => {
    expect([...bundle.functions.keys()].sort()).toEqual([...ids].sort());
    expect(bundle.duplicates).toEqual([]);
  });

  it("declares every parameter as a matrix, so ranges lift: of any, or of text where it offers AutoComplete suggestions", () => {
    for (const m of bundle.metadata)
      for (const p of m.parameters) {
        const suggests = (specs.get(m.id)?.choices[p.name]?.length ?? 0) > 0;
        expect({ id: m.id, p: p.name, d: p.dimensionality, t: p.type }).toEqual({ id: m.id, p: p.name, d: "matrix", t: suggests ? "string" : "any" });
      }
  });

  it("lists each parameter's suggestions as a custom enum of functions.json, with the words and tooltips its reader records", () => {
    // The shape custom-functions-metadata 2.2.3 gives an enum parameter (type "string",
    // customEnumId) and its "enums" entry (id, type, values of name, stringValue, tooltip).
    const enums = new Map(metadata.enums.map((e) => [e.id, e]));
    expect(enums.size).toBeGreaterThan(0);
    let offered = 0;
    for (const m of metadata.functions)
      for (const p of m.parameters) {
        const choices = specs.get(m.id)!.choices[p.name];
        if (!choices) {
          expect(p.customEnumId, `${m.id}.${p.name}`).toBeUndefined();
          continue;
        }
        offered++;
        const e = enums.get(p.customEnumId!)!;
        expect(e.id, `${m.id}.${p.name}`).toMatch(/^[A-Za-z][A-Za-z0-9_.]{0,127}$/);
        expect(e.type).toBe("string");
        expect(e.values).toEqual(choices.map((c) => ({ name: c.value, stringValue: c.value, tooltip: c.tooltip })));
      }
    expect(offered).toBeGreaterThan(40);
    expect(new Set(metadata.functions.flatMap((m) => m.parameters.map((p) => p.customEnumId).filter(Boolean)))).toEqual(new Set(enums.keys()));
  });

  it("offers the catalogue's names for every body parameter, and still takes a GM number there, as a number or as text", () => {
    // Excel hands a cell to a text-typed (enum) parameter as text, so "398600.4418" must read as the number.
    const bodyChoices = metadata.enums.find((e) => e.values.some((v) => v.stringValue === "Earth") && e.values.some((v) => v.stringValue === "Vesta"))!;
    for (const m of metadata.functions)
      for (const [k, role] of (specs.get(m.id)!.roles ?? []).entries()) if (role === "body") expect(m.parameters[k].customEnumId, m.id).toBe(bodyChoices.id);
    const speed = bundle.functions.get("ORBITAL_SPEED")!;
    const byName = (speed([["Earth"]], [[7000]]) as unknown[][])[0][0] as number;
    expect((speed([[398600.43550702266]], [[7000]]) as unknown[][])[0][0]).toBe(byName); // the catalogue's Earth GM (DE440)
    expect((speed([["398600.43550702266"]], [[7000]]) as unknown[][])[0][0]).toBe(byName);
    expect((speed([[" 3.9860043550702266E5 "]], [[7000]]) as unknown[][])[0][0]).toBe(byName);
    expect(((speed([["-398600"]], [[7000]]) as unknown[][])[0][0] as CellError).code).toBe("#VALUE!");
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

  it("has one declaration per id of functions.json, and none for a function that does not exist", () => {
    expect([...specs.keys()].sort()).toEqual([...ids].sort());
  });

  it("declares each function's parameters with the names and order of its JSDoc (functions.json)", () => {
    for (const m of bundle.metadata) expect({ id: m.id, params: specs.get(m.id)?.params }).toEqual({ id: m.id, params: m.parameters.map((p) => p.name) });
  });

  it("calls, for each id, the declaration of that id", () => {
    for (const id of ids) {
      bundle.registry.lastCalled = "";
      bundle.functions.get(id)!(...bundle.metadata.find((m) => m.id === id)!.parameters.map(() => null));
      expect({ id, called: bundle.registry.lastCalled }).toEqual({ id, called: id });
    }
  });

  it("gives every function a worked example no longer than its parameter list, and search terms", () => {
    for (const m of bundle.metadata) {
      const spec = specs.get(m.id)!;
      expect(spec.example.length, m.id).toBeGreaterThan(0);
      expect(spec.example.length, m.id).toBeLessThanOrEqual(m.parameters.length);
      expect(spec.terms.length, m.id).toBeGreaterThan(0);
    }
  });
});

describe.each(ids)("%s through the bundle", (id) => {
  const fn = bundle.functions.get(id)!;
  const meta = bundle.metadata.find((m) => m.id === id)!;
  const spec = specs.get(id)!;
  const example = spec.example;
  const args = meta.parameters.map((_, k) => excelArg(example[k] ?? null));

  it("answers its worked example with finite numbers or text, no error", () => {
    const out = fn(...args);
    expect(Array.isArray(out)).toBe(true);
    for (const c of cells(out)) {
      expect(isCellError(c), `${id} example gave ${JSON.stringify(c)}`).toBe(false);
      if (typeof c === "number") expect(Number.isFinite(c)).toBe(true);
    }
  });

  // The argument to range: the first one the example gives that is lifted case by case (not a
  // whole-range list, not include_header).
  const k = meta.parameters.findIndex((p, q) => example[q] !== undefined && example[q] !== null && p.name !== "include_header" && !spec.lists.includes(p.name));

  if (spec.kind !== "table") {
    it("lifts over a range: three cases of its first argument give three copies of the answer", () => {
      expect(k, `${id} has no argument to range`).toBeGreaterThanOrEqual(0);
      const plain = args.map((a, q) => (meta.parameters[q].name === "include_header" ? null : a));
      const one = excelArg(example[k]) as unknown[][];
      const ranged = plain.slice();
      // A vector argument (several cells per case) is one row per case; a single value stacks down a column.
      ranged[k] = [one[0], one[0], one[0]];
      const single = fn(...plain) as unknown[][];
      expect(single.length).toBe(1);
      expect(fn(...ranged)).toEqual([single[0], single[0], single[0]]);
    });
  } else if (k < 0) {
    it("reads a list argument's range whole: a column of the example's names gives the same table", () => {
      const q = meta.parameters.findIndex((p, i) => spec.lists.includes(p.name) && typeof example[i] === "string" && String(example[i]).includes(","));
      expect(q, `${id} has no list argument written as text to range`).toBeGreaterThanOrEqual(0);
      const ranged = args.slice();
      ranged[q] = String(example[q])
        .split(",")
        .map((s) => [s.trim()]);
      expect(fn(...ranged)).toEqual(fn(...args));
    });
  } else {
    it("takes its single-cell arguments as single cells: a range there is #VALUE! naming the parameter", () => {
      const ranged = args.slice();
      ranged[k] = [[example[k]], [example[k]]];
      const out = cells(fn(...ranged));
      expect(out).toHaveLength(1);
      expect((out[0] as CellError).code).toBe("#VALUE!");
      expect((out[0] as CellError).message).toMatch(new RegExp(`^${meta.parameters[k].name}: got a 2x1 range; expected a single cell`));
    });
  }

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
