import "../support/customFunctions";
import { describe, expect, it } from "vitest";
import * as core from "../../src/core/maneuvers";
import { findBody } from "../../src/catalogue/lookup";
import type { Body } from "../../src/catalogue/types";
import * as family from "../../src/functions/maneuvers";
import { code, expectPrinted, msg, sheet } from "./cells";

const { combinedPlaneChangeDv, phasingOrbit, planeChangeDv, transferBurns, transferDv } = sheet(family);

// The Maneuvers family on the sheet: the core's answers for catalogue bodies (GM from the
// catalogue), lifting over ranges, header rows, and errors that name the parameter.
const EARTH = findBody("Earth") as Body;
const MU = EARTH.gm.value;

describe("TRANSFER_DV", () => {
  it("is the core's Hohmann and bi-elliptic total with Earth's catalogue GM", () => {
    expect(transferDv("Earth", 6898.137, 7068.137)).toEqual([[core.transferDv(MU, 6898.137, 7068.137)]]);
    expect(transferDv([["earth"]], [[7000]], [[105000]], [[210000]])).toEqual([[core.transferDv(MU, 7000, 105000, 210000)]]);
  });

  it("matches Vallado 4th ed. Example 6-1 with his GM passed as a number", () => {
    // Vallado 4th ed. Example 6-1: 191.34411 km to 35781.34857 km altitude, R = 6378.137 km,
    // mu = 398600.4418 km^3/s^2; total dv 3.935224 km/s (as quoted in poliastro/poliastro
    // tests/test_maneuver.py, "Data from Vallado, example 6.1").
    expectPrinted(transferDv(398600.4418, 6378.137 + 191.34411, 6378.137 + 35781.34857)[0][0], 3.935224, 6);
  });

  it("lifts over a column of target radii, a blank via radius (0) meaning Hohmann", () => {
    const to = [[7068.137], [7378.137], [42164]];
    const out = transferDv("Earth", 6898.137, to, [[0], [null], [0]]);
    expect(out).toEqual(to.map(([r]) => [core.transferDv(MU, 6898.137, r)]));
  });

  it("refuses a via radius inside the outer orbit and names the parameters", () => {
    const bad = transferDv("Earth", 7000, 42164, 20000)[0][0];
    expect(code(bad)).toBe("#VALUE!");
    expect(msg(bad)).toMatch(/^via_radius: got 20000; expected a radius of at least 42164 km/);
    expect(msg(transferDv("Earth", "low", 42164)[0][0])).toBe('radius_from: got "low"; expected a number (km).');
    expect(msg(transferDv("Earth", 7000, -1)[0][0])).toMatch(/^radius_to: got -1; expected a positive number/);
    expect(msg(transferDv("Eart", 7000, 42164)[0][0])).toMatch(/^body: got "Eart"; expected a catalogue body name such as Earth/);
  });
});

describe("TRANSFER_BURNS", () => {
  it("gives one row of burn 1, burn 2, burn 3, total, time of flight, with a header on request", () => {
    const out = transferBurns("Earth", 6898.137, 7068.137, null, true);
    expect(out[0]).toEqual(["burn 1 (km/s)", "burn 2 (km/s)", "burn 3 (km/s)", "total dv (km/s)", "time of flight (s)"]);
    expect(out.slice(1)).toEqual([core.transferBurns(MU, 6898.137, 7068.137)]);
    expect(out[1][2]).toBe(0);
  });

  it("lifts down a column, one row per case, and gives three burns for a bi-elliptic case", () => {
    const out = transferBurns("Earth", [[7000], [7000]], [[105000], [105000]], [[null], [210000]]);
    expect(out).toEqual([core.transferBurns(MU, 7000, 105000), core.transferBurns(MU, 7000, 105000, 210000)]);
    expect(out[1][2] as number).toBeGreaterThan(0);
  });

  it("fills a bad case's row with its error and keeps the others", () => {
    const out = transferBurns("Earth", [[7000], [0]], 42164);
    expect(out[0]).toEqual(core.transferBurns(MU, 7000, 42164));
    expect(out[1].map(code)).toEqual(Array(5).fill("#VALUE!"));
    expect(msg(out[1][0])).toMatch(/^radius_from: got 0 km, inside Earth/);
  });
});

describe("PLANE_CHANGE_DV and COMBINED_PLANE_CHANGE_DV", () => {
  it("match Vallado 4th ed. Example 6-4 (15 deg at 5.892311 km/s)", () => {
    // Inputs from Vallado's companion code ex6_4.m; the book's answer 1.5382 km/s is from memory.
    expectPrinted(planeChangeDv(5.892311, 15)[0][0], 1.5382, 4);
  });

  it("are the core's answers, lifted over a row of angles", () => {
    expect(planeChangeDv(7.5, [[0.5, 1, 10]])).toEqual([[0.5, 1, 10].map((a) => core.planeChangeDv(7.5, a))]);
    expect(combinedPlaneChangeDv([[7.4638], [7.0]], 7.5096, 0.8)).toEqual([[core.combinedPlaneChangeDv(7.4638, 7.5096, 0.8)], [core.combinedPlaneChangeDv(7.0, 7.5096, 0.8)]]);
  });

  it("costs less combined than a speed change and a plane change apart", () => {
    const combined = combinedPlaneChangeDv(7.4638, 7.5096, 10)[0][0] as number;
    const apart = 7.5096 - 7.4638 + (planeChangeDv(7.5096, 10)[0][0] as number);
    expect(combined).toBeLessThan(apart);
  });

  it("refuse angles outside 0 to 180 deg, naming the parameter", () => {
    const bad = planeChangeDv(7.5, 200)[0][0];
    expect(code(bad)).toBe("#VALUE!");
    expect(msg(bad)).toMatch(/^angle: got 200; expected an angle between the two planes from 0 to 180 deg/);
    expect(msg(combinedPlaneChangeDv(7.5, -1, 5)[0][0])).toMatch(/^speed_to: got -1;/);
  });
});

describe("PHASING_ORBIT", () => {
  it("gives period, sma and total dv, with a header on request", () => {
    const out = phasingOrbit("Earth", 7068.137, 20, 3, true);
    expect(out[0]).toEqual(["phasing period (s)", "phasing sma (km)", "total dv (km/s)"]);
    expect(out[1]).toEqual(core.phasingOrbit(MU, 7068.137, 20, 3));
  });

  it("goes lower for a target ahead and higher for one behind", () => {
    const [ahead, behind] = phasingOrbit("Earth", 7068.137, [[20], [-20]], 1);
    expect(ahead[1] as number).toBeLessThan(7068.137);
    expect(behind[1] as number).toBeGreaterThan(7068.137);
  });

  it("is #N/A with the reason when the phasing orbit would pass through the centre, #VALUE! for half a revolution", () => {
    const none = phasingOrbit("Earth", 7068.137, 300, 1)[0][0];
    expect(code(none)).toBe("#N/A");
    expect(msg(none)).toMatch(/^phase_angle: catching a target 300 deg ahead in 1 revolution\(s\).*use more revolutions\.$/);
    expect(msg(phasingOrbit("Earth", 7068.137, 20, 1.5)[0][0])).toMatch(/^revolutions: got 1.5; expected a whole number of revolutions/);
  });
});
