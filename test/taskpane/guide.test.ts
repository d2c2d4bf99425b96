import { existsSync, readFileSync } from "node:fs";
import { resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { dateFormula, exampleFormula } from "../../src/functions/examples";
import { byFamily, guideEntries, searchGuide, splitFirstSentence, type FunctionInfo } from "../../src/taskpane/guide";
import { builtBundle } from "../contract/bundle";

// eslint-disable-next-line @typescript-eslint/no-require-imports
const { guideMetadata } = require("../../scripts/reference.cjs");

// The guide is built from the generated functions.json (the single source of names and help).
const dist = resolve(__dirname, "../../dist/functions.json");
if (!existsSync(dist)) throw new Error("dist/functions.json is missing: run `npm run build` (npm test does it)");
// The guide's metadata as the build bundles it into the pane (functions.json with each @returns text).
const functions = (guideMetadata(readFileSync(dist, "utf8")) as { functions: FunctionInfo[] }).functions;
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

  // The words people use, and where they should lead (the guide's ranking: id, exact search
  // term, words in the id, words in the terms, the rest).
  it.each([
    ["sun-synchronous", "SUN_SYNC_INCLINATION"],
    ["sso", "SUN_SYNC_INCLINATION"],
    ["velocity", "ORBITAL_SPEED"],
    ["porkchop", "TRANSFER_GRID"],
    ["window", "TRANSFER_GRID"],
    ["launch window", "TRANSFER_BETWEEN"],
    ["hohmann", "TRANSFER_DV"],
    ["Tsiolkovsky", "ROCKET_DV"],
    ["escape speed", "ESCAPE_SPEED"],
    ["SOLVE_ECCENTRIC_ANOMALY", "SOLVE_ECCENTRIC_ANOMALY"],
  ])("finds %s first as %s", (query, id) => {
    expect(searchGuide(entries, query)[0]?.id).toBe(id);
  });

  it("matches words from their start only, so dv finds delta-v functions and not BETA_ANGLE (\"advance\")", () => {
    const dv = searchGuide(entries, "dv").map((e) => e.id);
    expect(dv).toContain("TRANSFER_DV");
    expect(dv).toContain("PLANE_CHANGE_DV");
    expect(dv).not.toContain("BETA_ANGLE");
  });

  it("returns everything for an empty query and nothing for nonsense", () => {
    expect(searchGuide(entries, "  ").length).toBe(entries.length);
    expect(searchGuide(entries, "zzqx")).toEqual([]);
  });
});

describe("entries", () => {
  it("say what each function returns, with its unit, and name the columns of several-value results", () => {
    for (const e of entries) expect(e.returns, e.id).not.toBe("");
    expect(entries.find((e) => e.id === "ORBITAL_SPEED")!.returns).toBe("Speed, km/s.");
    expect(entries.find((e) => e.id === "TRANSFER_BURNS")!.columns).toEqual(["burn 1 (km/s)", "burn 2 (km/s)", "burn 3 (km/s)", "total dv (km/s)", "time of flight (s)"]);
  });

  it("know the area each example spills to", () => {
    expect(entries.find((e) => e.id === "ORBITAL_SPEED")!.spill).toEqual({ rows: 1, cols: 1 });
    expect(entries.find((e) => e.id === "TRANSFER_BURNS")!.spill).toEqual({ rows: 2, cols: 5 }); // header row + one case
    expect(entries.find((e) => e.id === "TRANSFER_GRID")!.spill).toEqual({ rows: 6, cols: 7 }); // 5 flight times x 6 dates + headers
    for (const e of entries) expect(e.spill, e.id).not.toBeNull();
  });

  it("are grouped by family, every family under one heading", () => {
    const groups = byFamily(entries);
    expect(new Set(groups.map((g) => g.family)).size).toBe(groups.length);
    expect(groups.find((g) => g.family === "Maneuvers")!.entries.map((e) => e.id)).toContain("TRANSFER_DV");
    expect(groups.every((g) => g.family !== "")).toBe(true);
  });

  it("write date arguments as DATE(...) formulas", () => {
    expect(dateFormula(47085)).toBe("DATE(2028,11,28)");
    expect(dateFormula(47085.25)).toBe("DATE(2028,11,28)+TIME(6,0,0)");
    expect(exampleFormula("X", [98.15, 47085], [undefined, "date"])).toBe("=ORBIT.X(98.15, DATE(2028,11,28))");
  });
});

describe("splitFirstSentence", () => {
  it("splits after the first sentence but not after an abbreviation", () => {
    expect(splitFirstSentence("Speed on an orbit. Circular when sma is omitted.")).toEqual(["Speed on an orbit.", "Circular when sma is omitted."]);
    expect(splitFirstSentence("Hohmann transfer about a parent (e.g. Earth to Mars). Coplanar.")).toEqual(["Hohmann transfer about a parent (e.g. Earth to Mars).", "Coplanar."]);
    expect(splitFirstSentence("One sentence only.")).toEqual(["One sentence only.", ""]);
  });
});
