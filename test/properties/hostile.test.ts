import fc from "fast-check";
import { afterAll, describe, it } from "vitest";
import { builtBundle } from "../contract/bundle";
import { contractProblem as problem } from "../support/contract";

// Hostile inputs through the BUILT bundle, for every function in functions.json (a new function is
// covered without editing this file): the argument kinds Excel really passes — finite numbers of
// every magnitude, text (empty, names, junk), booleans, null for omitted optionals, 0 for blanks
// inside ranges, ranges of mixed content and mismatched shapes. Whatever comes in, what goes out
// is a rectangle of finite numbers, plain text, booleans, or typed cell errors whose message (for
// #VALUE! and #N/A; Excel shows none with #NUM!) starts with one of the function's parameter names.
const bundle = builtBundle();
const CALLS = Number(process.env.ORBIT_PROPERTY_CALLS ?? 10_000);
const counts: Record<string, number> = {};

const magnitudes = fc.oneof(
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e6, max: 1e6 }),
  fc.integer({ min: -10, max: 400 }),
  fc.constantFrom(0, -0, 1, -1, 0.5, 0.999999, 1.000001, 90, 180, 360, 6378.137, 7000, 42164, 1e-300, 1e300, -1e300, 5e-324, Number.MAX_VALUE, 46000, 47000),
);
const words = fc.oneof(
  fc.constantFrom("", " ", "Earth", "earth", "MOON", "Mars", "Sun", "Jupiter", "Ceres", "Titan", "Pluto", "Phobos", "junk", "gm", "j2", "mean_radius", "c3", "v_inf_sum", "km", "au", "deg", "rad", "m/s", "#N/A", "NaN", "Infinity", "1e309", "12"),
  fc.string({ maxLength: 12 }),
);
const cell = fc.oneof({ weight: 6, arbitrary: magnitudes }, { weight: 2, arbitrary: words }, { weight: 1, arbitrary: fc.boolean() }, { weight: 1, arbitrary: fc.constant(null) });
const range = fc
  .tuple(fc.integer({ min: 1, max: 4 }), fc.integer({ min: 1, max: 7 }))
  .chain(([r, c]) => fc.array(fc.array(cell, { minLength: c, maxLength: c }), { minLength: r, maxLength: r }));
const argument = fc.oneof({ weight: 6, arbitrary: cell.map((v) => (v === null ? null : [[v]])) }, { weight: 2, arbitrary: range }, { weight: 1, arbitrary: fc.constant(null) });

describe.each(bundle.metadata.map((m) => m.id))("%s under hostile inputs", (id) => {
  const fn = bundle.functions.get(id)!;
  const meta = bundle.metadata.find((m) => m.id === id)!;
  const params = meta.parameters.map((p) => p.name);
  it(`keeps the error contract over ${CALLS} generated calls`, () => {
    counts[id] = 0;
    fc.assert(
      fc.property(fc.array(argument, { minLength: params.length, maxLength: params.length }), (args) => {
        counts[id]++;
        let out: unknown;
        try {
          out = fn(...args);
        } catch (e) {
          throw new Error(`${id} threw ${(e as Error).message}`);
        }
        const p = problem(params, out);
        if (p) throw new Error(`${id}: ${p}`);
      }),
      { numRuns: CALLS, seed: 20261201 },
    );
  });
});

afterAll(() => {
  const total = Object.values(counts).reduce((a, b) => a + b, 0);
  console.log(`hostile-input calls per function (${total} in all):\n` + Object.entries(counts).map(([id, n]) => `  ${id}: ${n}`).join("\n"));
});
