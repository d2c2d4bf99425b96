import "../support/customFunctions";
import { describe, expect, it } from "vitest";
import * as core from "../../src/core/rocket";
import * as family from "../../src/functions/propellant";
import { code, msg, sheet } from "./cells";

const { burnSequence, massRatio, propellantMass, rocketDv } = sheet(family);

// The Propellant family on the sheet: the core's answers, lifting, the burn table with its header,
// and exhaustion as #N/A rows with the reason.

describe("ROCKET_DV, PROPELLANT_MASS, MASS_RATIO", () => {
  it("are the core's answers", () => {
    expect(rocketDv(225, 180, 172.5)).toEqual([[core.rocketDv(225, 180, 172.5)]]);
    expect(propellantMass(0.1, 225, 172.5)).toEqual([[core.propellantMass(0.1, 225, 172.5)]]);
    expect(massRatio(0.1, 225)).toEqual([[core.massRatio(0.1, 225)]]);
  });

  it("give g0 Isp for a mass ratio of e, with g0 = 9.80665 m/s^2 exactly", () => {
    // Standard gravity 9.80665 m/s^2 (3rd CGPM, 1901): dv = g0 Isp ln(e) = 9.80665e-3 Isp km/s.
    expect(Math.abs((rocketDv(300, Math.E * 100, 100)[0][0] as number) - 2.941995)).toBeLessThan(1e-12);
    expect(Math.abs((massRatio(2.941995, 300)[0][0] as number) - Math.E)).toBeLessThan(1e-12);
  });

  it("round-trip on the sheet: the propellant PROPELLANT_MASS gives is what ROCKET_DV spends", () => {
    const dvs = [[0.01], [0.5], [3.2]];
    const prop = propellantMass(dvs, 225, 172.5);
    const back = rocketDv(225, prop.map(([p]) => [(p as number) + 172.5]), 172.5);
    back.forEach(([dv], i) => expect(Math.abs((dv as number) - dvs[i][0])).toBeLessThanOrEqual(1e-14 * dvs[i][0]));
  });

  it("refuse impossible masses and a bad isp, naming the parameter", () => {
    expect(msg(rocketDv(225, 170, 180)[0][0])).toBe("final_mass: got 180; expected a final mass no greater than initial_mass (170 kg): a burn only loses mass.");
    expect(msg(propellantMass(0.1, 0, 172.5)[0][0])).toMatch(/^isp: got 0; expected a positive number of seconds of specific impulse/);
    expect(msg(massRatio("fast", 225)[0][0])).toBe('dv: got "fast"; expected a number (km/s).');
    expect(code(massRatio(1e6, 1)[0][0])).toBe("#N/A");
  });
});

describe("BURN_SEQUENCE", () => {
  const dvs = [[0.0458], [0.0459], [0.105], [0.121]];

  it("gives one row per burn, each mass after the next mass before, with a header on request", () => {
    const out = burnSequence(dvs, 225, 180, 150, true);
    expect(out[0]).toEqual(["mass before (kg)", "propellant (kg)", "mass after (kg)"]);
    expect(out.slice(1)).toEqual(core.burnSequence(dvs.map(([d]) => d), [225], 180, 150));
    for (let i = 2; i < out.length; i++) expect(out[i][0]).toBe(out[i - 1][2]);
  });

  it("takes the burns as a row or a column and one isp per burn", () => {
    expect(burnSequence([[0.0458, 0.0459]], [[225, 215]], 180)).toEqual(core.burnSequence([0.0458, 0.0459], [225, 215], 180));
    expect(burnSequence([[0.0458], [0.0459]], [[225], [215]], 180)).toEqual(burnSequence([[0.0458, 0.0459]], [[225, 215]], 180));
  });

  it("marks the exhausting burn and every later one #N/A with the shortfall, keeping the rows before", () => {
    const out = burnSequence([[0.1], [0.5], [0.1]], 225, 180, 160);
    expect(out[0]).toEqual((core.burnSequence([0.1], [225], 180) as number[][])[0]);
    expect(out[1].map(code)).toEqual(["#N/A", "#N/A", "#N/A"]);
    expect(msg(out[1][0])).toMatch(/^dvs: burn 2 needs [\d.]+ kg of propellant but only [\d.]+ kg remain above the dry mass of 160 kg\.$/);
    expect(out[2].map(code)).toEqual(["#N/A", "#N/A", "#N/A"]);
    expect(msg(out[2][0])).toBe("dvs: burn 3 follows burn 2, which exhausts the propellant.");
  });

  it("refuses whole-call errors in one cell, naming the parameter", () => {
    expect(msg(burnSequence(dvs, [[225, 215]], 180)[0][0])).toBe("isps: got a range; expected one specific impulse for all burns, or one per burn (4).");
    expect(msg(burnSequence([["a"]], 225, 180)[0][0])).toBe('dvs: got "a"; expected a range of numbers.');
    expect(msg(burnSequence(dvs, 225, [[180], [170]])[0][0])).toBe('initial_mass: got a 2x1 range; expected a single cell.');
    expect(msg(burnSequence(dvs, 225, 180, 200)[0][0])).toBe("dry_mass: got 200; expected a dry mass no greater than initial_mass (180 kg).");
    expect(msg(burnSequence(null, 225, 180)[0][0])).toBe("dvs: got (blank); expected a range, which is required.");
  });
});
