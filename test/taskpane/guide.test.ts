import { existsSync, readFileSync } from "node:fs";
import { resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { guideEntries, searchGuide, splitFirstSentence, type FunctionInfo } from "../../src/taskpane/guide";
import { builtBundle } from "../contract/bundle";

// The guide is built from the generated functions.json (the single source of names and help).
const dist = resolve(__dirname, "../../dist/functions.json");
if (!existsSync(dist)) throw new Error("dist/functions.json is missing: run `npm run build` (npm test does it)");
const functions = (JSON.parse(readFileSync(dist, "utf8")) as { functions: FunctionInfo[] }).functions;
// The declarations (examples, search terms, families) as the functions bundle publishes them in the pane's page.
const specs = builtBundle().registry.specs;
const entries = guideEntries(functions, specs);

describe("guideEntries", () => {
  it("lists every function of functions.json, in its order, with its parameters", () => {
    expect(entries.map((e) => e.id)).toEqual(functions.map((f) => f.id));
    for (const [i, f] of functions.entries()) expect(entries[i].parameters.map((p) => p.name)).toEqual(f.parameters.map((p) => p.name));
  });

  it("writes a signature with optional parameters in brackets", () => {
    const speed = entries.find((e) => e.id === "ORBITAL_SPEED")!;
    expect(speed.signature).toBe("ORBITAL_SPEED(body, radius, [sma])");
    expect(speed.parameters[2]).toMatchObject({ name: "sma", optional: true });
  });

  it("gives every function with a worked example a formula ready for a cell", () => {
    for (const e of entries) expect(e.example).toMatch(new RegExp(`^=ORBIT\\.${e.id}\\(.*\\)$`));
    expect(entries.find((e) => e.id === "ORBITAL_SPEED")!.example).toBe(`=ORBIT.ORBITAL_SPEED("Earth", ${specs.get("ORBITAL_SPEED")!.example[1]})`);
    expect(guideEntries([{ id: "NOT_A_FUNCTION", parameters: [] }], specs)[0].example).toBeNull();
  });
});

describe("searchGuide", () => {
  it("matches every word in the id, description or parameters, ids starting with the query first", () => {
    const hits = searchGuide(entries, "escape speed");
    expect(hits[0].id).toBe("ESCAPE_SPEED");
    expect(hits.every((h) => `${h.id} ${h.description}`.toLowerCase().includes("escape"))).toBe(true);
    expect(searchGuide(entries, "orbital_speed")[0].id).toBe("ORBITAL_SPEED");
    // Ids holding the word come before functions that only mention it.
    const speed = searchGuide(entries, "speed").map((e) => e.id);
    const lastIdHit = Math.max(...speed.map((id, i) => (id.includes("SPEED") ? i : -1)));
    const firstOther = speed.findIndex((id) => !id.includes("SPEED"));
    expect(firstOther === -1 || lastIdHit < firstOther).toBe(true);
    expect(speed).toContain("ORBITAL_SPEED");
  });

  it("returns everything for an empty query and nothing for nonsense", () => {
    expect(searchGuide(entries, "  ").length).toBe(entries.length);
    expect(searchGuide(entries, "zzqx")).toEqual([]);
  });
});

describe("splitFirstSentence", () => {
  it("splits after the first sentence but not after an abbreviation", () => {
    expect(splitFirstSentence("Speed on an orbit. Circular when sma is omitted.")).toEqual(["Speed on an orbit.", "Circular when sma is omitted."]);
    expect(splitFirstSentence("Hohmann transfer about a parent (e.g. Earth to Mars). Coplanar.")).toEqual(["Hohmann transfer about a parent (e.g. Earth to Mars).", "Coplanar."]);
    expect(splitFirstSentence("One sentence only.")).toEqual(["One sentence only.", ""]);
  });
});
