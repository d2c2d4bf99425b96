import { readFileSync } from "node:fs";
import { resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { withReference } from "../../scripts/function-reference";

// The README's function reference is generated from the built functions.json; this fails when a
// function was added or its help changed without `npm run docs:reference`.
describe("README", () => {
  const root = resolve(__dirname, "../..");
  const readme = readFileSync(resolve(root, "README.md"), "utf8");
  const meta = JSON.parse(readFileSync(resolve(root, "dist/functions.json"), "utf8"));

  it("has the function reference of the current build", () => {
    expect(withReference(readme, meta)).toBe(readme);
  });

  it("lists every function id", () => {
    for (const fn of meta.functions) expect(readme).toContain(`=ORBIT.${fn.name}(`);
  });

  it("starts with the job, then the two set-up commands, then Excel, reference and cautions", () => {
    const order = ["# Orbit Cells", "npm ci && npm run demo", "npm test", "## Install into Excel", "## Function reference", "## Cautions"].map((s) => readme.indexOf(s));
    expect(order.every((i) => i >= 0)).toBe(true);
    expect([...order].sort((a, b) => a - b)).toEqual(order);
  });
});
