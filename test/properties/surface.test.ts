import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { BODIES } from "../../src/catalogue/bodies";
import { isCellError } from "../../src/runner/host";
import { builtBundle, excelArg } from "../contract/bundle";

// Property through the BUILT bundle: no function returns a finite number for a distance from the
// centre that lies inside its catalogue body. The parameters concerned are found from the
// registry (FunctionSpec.roles: radius, sma, position, state), so a new function that declares
// such a parameter is covered without editing this file. Every other argument is the function's
// worked example; the body is each catalogue body in turn, and the distance any value strictly
// between 0 and the body's equatorial radius (the surface itself stays valid).
const bundle = builtBundle();
const CHECKED = new Set(["radius", "sma", "position", "state"]);

const cases = [...bundle.registry.specs.values()].flatMap((spec) => {
  const body = spec.roles.indexOf("body");
  if (body < 0) return [];
  return spec.roles.flatMap((role, k) => (role && CHECKED.has(role) ? [{ id: spec.id, body, k, role, example: spec.example, params: spec.params }] : []));
});

/** The argument a case puts in the checked parameter: a distance, or a vector of that length. */
function inside(role: string, r: number): unknown {
  if (role === "position") return [[0, r * 0.6, r * 0.8]];
  if (role === "state") return [[r * 0.6, 0, r * 0.8, 0, 7.5, 0]];
  return [[r]];
}

describe("a distance inside the catalogue body", () => {
  it("covers every function with a body and a distance from its centre", () => {
    expect(cases.length).toBeGreaterThanOrEqual(20);
  });

  describe.each(cases.map((c) => [`${c.id}(${c.params[c.k]})`, c] as const))("%s", (_, c) => {
    const fn = bundle.functions.get(c.id)!;
    it("gives no finite number for any body of the catalogue and any distance below its surface", () => {
      fc.assert(
        fc.property(fc.constantFrom(...BODIES), fc.double({ min: 1e-6, max: 1 - 1e-9, noNaN: true }), (b, fraction) => {
          const r = b.equatorialRadius.value * fraction;
          const args = c.params.map((_, q) => (q === c.body ? [[b.name]] : q === c.k ? inside(c.role, r) : excelArg(c.example[q] ?? null)));
          const out = fn(...args) as unknown[][];
          for (const row of out)
            for (const cell of row) if (typeof cell === "number") throw new Error(`${c.id} gave ${cell} for ${c.params[c.k]} ${r} km inside ${b.name}`);
          return out.flat().some(isCellError);
        }),
        { numRuns: 300, seed: 11 },
      );
    });
  });
});
