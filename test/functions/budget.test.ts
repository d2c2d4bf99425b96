import "../support/customFunctions";
import { describe, expect, it } from "vitest";
import { G0_KM_PER_S2 } from "../../src/core/rocket";
import * as maneuvers from "../../src/functions/maneuvers";
import * as propellant from "../../src/functions/propellant";
import * as speeds from "../../src/functions/speeds";
import { code, sheet } from "./cells";

const { planeChangeDv, transferBurns } = sheet(maneuvers);
const { burnSequence, propellantMass, rocketDv } = sheet(propellant);
const { altitudeToRadius, orbitalSpeed } = sheet(speeds);

// A delta-v and propellant budget written end to end as a sheet would hold it: every value after
// the typed inputs comes from another function's output, as cell references would carry it.
// Inputs are the invented Skerry-1 mission (DEVELOPERS.md, "The Skerry demo scenario"): 180 kg,
// Isp 225 s, 520 km rideshare orbit raised to 690 km, a 0.8 deg plane trim, perigee lowered to 250 km.
const cell = (g: unknown[][]): number => g[0][0] as number;

function budget(dryMass: number | null) {
  const rRideshare = altitudeToRadius("Earth", 520);
  const rMission = altitudeToRadius("Earth", 690);
  const rDisposal = altitudeToRadius("Earth", 250);
  const raise = transferBurns("Earth", rRideshare, rMission, null, true);
  const trim = planeChangeDv(orbitalSpeed("Earth", rMission), 0.8);
  const lower = transferBurns("Earth", rMission, rDisposal);
  // The burn column: =raise burn 1, =raise burn 2, =trim, =lower burn 1 (the perigee-lowering burn).
  const dvs = [[raise[1][0]], [raise[1][1]], [trim[0][0]], [lower[0][0]]];
  const table = burnSequence(dvs, 225, 180, dryMass, true);
  return { dvs: dvs.map(([d]) => d as number), table };
}

describe("a budget from parking orbit to disposal, no value typed by hand", () => {
  const { dvs, table } = budget(150);
  const rows = table.slice(1) as number[][];

  it("gives a header and one finite row per burn", () => {
    expect(table[0]).toEqual(["mass before (kg)", "propellant (kg)", "mass after (kg)"]);
    expect(rows.length).toBe(4);
    for (const r of rows) for (const v of r) expect(Number.isFinite(v)).toBe(true);
    for (const d of dvs) expect(d).toBeGreaterThan(0);
  });

  it("spends, burn by burn, exactly the dv the maneuver functions asked for (ROCKET_DV of each row)", () => {
    rows.forEach(([before, , after], i) => expect(Math.abs(cell(rocketDv(225, before, after)) - dvs[i])).toBeLessThanOrEqual(1e-13 * dvs[i]));
  });

  it("ends at the mass one burn of the summed dv would leave, and its propellant is PROPELLANT_MASS of the total", () => {
    const total = dvs.reduce((s, d) => s + d, 0);
    const final = rows[3][2];
    expect(Math.abs(final - 180 * Math.exp(-total / (G0_KM_PER_S2 * 225)))).toBeLessThanOrEqual(1e-12 * 180);
    const used = rows.reduce((s, r) => s + r[1], 0);
    expect(Math.abs(used - cell(propellantMass(total, 225, final)))).toBeLessThanOrEqual(1e-11 * used);
    expect(used).toBeCloseTo(180 - final, 10);
  });

  it("turns the budget's failure into #N/A rows when the dry mass leaves too little propellant", () => {
    // With 176 kg dry only 4 kg is usable: the first raise burn (about 3.7 kg) fits, the second does not.
    const tight = budget(176).table.slice(1);
    expect(tight[0].every((v) => typeof v === "number")).toBe(true);
    const firstBad = tight.findIndex((r) => code(r[0]) === "#N/A");
    expect(firstBad).toBe(1);
    for (const r of tight.slice(firstBad)) expect(r.map(code)).toEqual(["#N/A", "#N/A", "#N/A"]);
  });
});
