import "../support/customFunctions";
import { describe, expect, it } from "vitest";
import { lowThrustTime as coreLowThrustTime } from "../../src/core/firingtime";
import { chaserState as coreChaserState, relativeState as coreRelativeState } from "../../src/core/localframe";
import { lowThrustDv as coreLowThrustDv } from "../../src/core/lowthrust";
import { relativeStateAtTime as coreRelativeStateAtTime } from "../../src/core/relativemotion";
import { relativeRendezvous as coreRelativeRendezvous } from "../../src/core/rendezvous";
import { findBody } from "../../src/catalogue/lookup";
import type { Body } from "../../src/catalogue/types";
import * as propellantFamily from "../../src/functions/propellant";
import * as family from "../../src/functions/relative";
import * as stateFamily from "../../src/functions/state";
import { ok } from "../support/expect";
import { code, expectPrinted, msg, sheet } from "./cells";

const { chaserState, lowThrustDv, lowThrustTime, relativeRendezvous, relativeState, relativeStateAtTime } = sheet(family);
const { propagateState, stateFromElements } = sheet(stateFamily);
const { burnSequence } = sheet(propellantFamily);

// The "Relative motion and low thrust" family on the sheet: the core's answers with the
// catalogue's GM (the core is checked against Curtis, Vallado, Kechichian and exact two-body
// propagation in test/core/{localframe,relativemotion,rendezvous,lowthrust,firingtime}.test.ts),
// lifting over columns of times and of relative states, header rows, errors as typed cells naming
// the parameter, and a chain of sheet functions checked against two-body propagation of both craft.
const EARTH = findBody("Earth") as Body;
const MU = EARTH.gm.value;
const A = EARTH.equatorialRadius.value + 690; // the Skerry 690 km orbit, km
const N = Math.sqrt(MU / A ** 3);
const PERIOD = (2 * Math.PI) / N;
// Skerry-1E's inspection start: 100 m below, 2 km behind, 50 m cross-track, on its own circle's drift.
const START = [-0.1, -2, 0.05, 0, 0.000159, 0];
const gap3 = (p: readonly unknown[], q: readonly unknown[], at = 0) => Math.hypot((p[at] as number) - (q[at] as number), (p[at + 1] as number) - (q[at + 1] as number), (p[at + 2] as number) - (q[at + 2] as number));

describe("RELATIVE_STATE_AT_TIME", () => {
  it("is the core's Clohessy-Wiltshire state with Earth's catalogue GM, with the local-frame labels on request", () => {
    const out = relativeStateAtTime("Earth", A, [START], 2400, true);
    expect(out[0]).toEqual(["x radial (km)", "y along-track (km)", "z cross-track (km)", "vx radial (km/s)", "vy along-track (km/s)", "vz cross-track (km/s)"]);
    expect(out.slice(1)).toEqual([ok(coreRelativeStateAtTime(MU, A, START, 2400))]);
    // The worked example of the help text (a demo figure of the Skerry scenario, not a reference).
    [-0.1013, -1.6156, -0.0415].forEach((x, k) => expectPrinted(out[1][k], x, 4));
  });

  it("lifts over a column of elapsed times (one row each) and over a column of relative states as rows", () => {
    const times = [[0], [600], [-600], [PERIOD]];
    expect(relativeStateAtTime("Earth", A, [START], times)).toEqual(times.map(([t]) => ok(coreRelativeStateAtTime(MU, A, START, t))));
    const states = [START, [0, -1, 0, 0, 0, 0], [0.2, 0, 0, 0, -1.5 * N * 0.2, 0]];
    expect(relativeStateAtTime("Earth", A, states, 2400)).toEqual(states.map((s) => ok(coreRelativeStateAtTime(MU, A, s, 2400))));
    // A column of six cells is one state, as a row is.
    expect(relativeStateAtTime("Earth", A, START.map((x) => [x]), 2400)).toEqual(relativeStateAtTime("Earth", A, [START], 2400));
  });

  it("pairs a column of states with a column of times row by row", () => {
    const states = [START, [0, -1, 0, 0, 0, 0]];
    const out = relativeStateAtTime("Earth", A, states, [[600], [1200]]);
    expect(out).toEqual([ok(coreRelativeStateAtTime(MU, A, states[0], 600)), ok(coreRelativeStateAtTime(MU, A, states[1], 1200))]);
  });

  it("takes a chaser on the target (a zero relative state): an offset from the target gets no surface check", () => {
    const still = relativeStateAtTime("Earth", A, [[0, 0, 0, 0, 0, 0]], 1000);
    expect(still[0].map((x) => Math.abs(x as number))).toEqual([0, 0, 0, 0, 0, 0]);
  });

  it("refuses an altitude typed as target_sma, and bad cells, each as a typed error naming the parameter", () => {
    const alt = relativeStateAtTime("Earth", 690, [START], 2400)[0];
    expect(alt.map(code)).toEqual(Array(6).fill("#VALUE!"));
    expect(msg(alt[0])).toMatch(/^target_sma: got 690 km, inside Earth .*an altitude of 690 km is a radius of 7068\.1366 km/);
    expect(msg(relativeStateAtTime("Earth", A, [[-0.1, -2, "x", 0, 0, 0]], 2400)[0][0])).toMatch(/^relative_state: got "x"; expected 6 numbers in a row .*item 3 is not a number/);
    expect(msg(relativeStateAtTime("Earth", A, [[-0.1, -2, 0, 0, 0]], 2400)[0][0])).toMatch(/^relative_state: got a 1x5 range; expected 6 columns per case/);
    expect(msg(relativeStateAtTime("Earth", A, [START], "soon")[0][0])).toBe('elapsed: got "soon"; expected a number (s).');
    expect(msg(relativeStateAtTime("Eart", A, [START], 1)[0][0])).toMatch(/^body: got "Eart"/);
    expect(msg(relativeStateAtTime(398600.4418, -7000, [START], 1)[0][0])).toMatch(/^target_sma: got -7000; expected a positive number/);
  });

  it("keeps a bad case's error in its own row inside a range", () => {
    const out = relativeStateAtTime("Earth", A, [START, [1, 2, 3, 4, 5, "z"]], 600);
    expect(out[0]).toEqual(ok(coreRelativeStateAtTime(MU, A, START, 600)));
    expect(out[1].map(code)).toEqual(Array(6).fill("#VALUE!"));
  });
});

describe("RELATIVE_RENDEZVOUS", () => {
  const AIM = [0, -0.2, 0];

  it("is the core's two burns, sizes and total, with labels on request", () => {
    const out = relativeRendezvous("Earth", A, [START], [AIM], 2400, true);
    expect(out[0]).toEqual([
      "burn 1 radial (km/s)",
      "burn 1 along-track (km/s)",
      "burn 1 cross-track (km/s)",
      "burn 2 radial (km/s)",
      "burn 2 along-track (km/s)",
      "burn 2 cross-track (km/s)",
      "burn 1 size (km/s)",
      "burn 2 size (km/s)",
      "total dv (km/s)",
    ]);
    expect(out.slice(1)).toEqual([ok(coreRelativeRendezvous(MU, A, START, AIM, 2400))]);
    expectPrinted(out[1][8], 0.001234, 6); // the help text's example figure (demo)
  });

  it("lands on the aim point: burn 1 added to the start and propagated on the sheet arrives there, at the velocity burn 2 cancels", () => {
    const burns = relativeRendezvous("Earth", A, [START], [AIM], 2400)[0] as number[];
    const after = START.map((x, k) => (k < 3 ? x : x + burns[k - 3]));
    const arrival = relativeStateAtTime("Earth", A, [after], 2400)[0];
    expect(gap3(arrival, AIM)).toBeLessThan(1e-12);
    expect(gap3(arrival.slice(3), burns.slice(3, 6).map((x) => -x))).toBeLessThan(1e-17);
  });

  it("lifts over a column of transfer times; a whole orbit period with a radial offset to undo is #N/A in its own row, with the reason", () => {
    const times = [[1200], [PERIOD], [2400]];
    const out = relativeRendezvous("Earth", A, [START], [AIM], times);
    expect(out[0]).toEqual(ok(coreRelativeRendezvous(MU, A, START, AIM, 1200)));
    expect(out[2]).toEqual(ok(coreRelativeRendezvous(MU, A, START, AIM, 2400)));
    expect(out[1].map(code)).toEqual(Array(9).fill("#N/A"));
    expect(msg(out[1][0])).toMatch(/^transfer_time: [\d.]+ s is 1 periods of the target orbit, a whole number: .*choose another transfer time/);
  });

  it("is #N/A at a half period for a cross-track offset it cannot change, and answers once there is none", () => {
    const half = relativeRendezvous("Earth", A, [START], [AIM], PERIOD / 2)[0];
    expect(code(half[0])).toBe("#N/A");
    expect(msg(half[0])).toMatch(/^transfer_time: .*a whole number of half periods/);
    const coplanar = [-0.1, -2, 0, 0, 0.000159, 0];
    expect(relativeRendezvous("Earth", A, [coplanar], [AIM], PERIOD / 2)).toEqual([ok(coreRelativeRendezvous(MU, A, coplanar, AIM, PERIOD / 2))]);
  });

  it("refuses a bad aim point or transfer time, naming the parameter", () => {
    expect(msg(relativeRendezvous("Earth", A, [START], [[0, -0.2]], 2400)[0][0])).toMatch(/^aim_point: got a 1x2 range; expected 3 columns per case/);
    expect(msg(relativeRendezvous("Earth", A, [START], [[0, "near", 0]], 2400)[0][0])).toMatch(/^aim_point: got "near"; expected 3 numbers in a row/);
    expect(msg(relativeRendezvous("Earth", A, [START], [AIM], 0)[0][0])).toMatch(/^transfer_time: got 0; expected a positive number/);
    expect(code(relativeRendezvous("Earth", 500, [START], [AIM], 2400)[0][0])).toBe("#VALUE!");
    expect(msg(relativeRendezvous("Earth", 500, [START], [AIM], 2400)[0][0])).toMatch(/^target_sma: got 500 km, inside Earth/);
  });
});

describe("RELATIVE_STATE and CHASER_STATE", () => {
  // The Skerry-1E pair from STATE_FROM_ELEMENTS: target at 690 km, 98.2 deg, argument of latitude
  // 10 deg; chaser on the circle 100 m lower, 0.01621 deg behind.
  const target = stateFromElements("Earth", A, 0, 98.2, 30, 0, 10);
  const chaser = stateFromElements("Earth", A - 0.1, 0, 98.2, 30, 0, 9.98379);

  it("are the core's conversions with Earth's catalogue GM, relative labels for RELATIVE_STATE and state labels for CHASER_STATE", () => {
    const rel = relativeState("Earth", target, chaser, true);
    expect(rel[0]).toEqual(["x radial (km)", "y along-track (km)", "z cross-track (km)", "vx radial (km/s)", "vy along-track (km/s)", "vz cross-track (km/s)"]);
    expect(rel.slice(1)).toEqual([ok(coreRelativeState(MU, target[0] as number[], chaser[0] as number[]))]);
    const back = chaserState("Earth", target, [START], true);
    expect(back[0]).toEqual(["x (km)", "y (km)", "z (km)", "vx (km/s)", "vy (km/s)", "vz (km/s)"]);
    expect(back.slice(1)).toEqual([ok(coreChaserState(MU, target[0] as number[], START))]);
  });

  it("put the Skerry-1E chaser 100 m below and 2 km behind, drifting forward at 1.5 n x (the help text's example)", () => {
    const rel = relativeState("Earth", target, chaser)[0] as number[];
    [-0.1003, -1.9997, 0].forEach((x, k) => expectPrinted(rel[k], x, 4));
    // A circular orbit d below the target's drifts ahead at 1.5 n d in the linear theory (Curtis 3rd ed. §7.6, from memory).
    expect(Math.abs(rel[4] / (1.5 * N * 0.1) - 1)).toBeLessThan(1e-3);
    expectPrinted(rel[4], 0.000159, 6);
  });

  it("undo each other on the sheet, over a column of relative states", () => {
    const rels = [START, [1, 2, 3, 1e-3, -2e-3, 3e-3], [0, 0, 0, 0, 0, 0], [-50, 300, -20, 0.01, 0.02, -0.01]];
    const chasers = chaserState("Earth", target, rels);
    const back = relativeState("Earth", target, chasers) as number[][];
    back.forEach((r, i) => {
      expect(gap3(r, rels[i])).toBeLessThan(1e-9 * (1 + Math.hypot(...rels[i].slice(0, 3))));
      expect(gap3(r, rels[i], 3)).toBeLessThan(1e-12 * (1 + Math.hypot(...rels[i].slice(3))));
    });
  });

  it("work with a GM number as body (no surface known, so none checked) and give the same answer", () => {
    expect(relativeState(MU, target, chaser)).toEqual(relativeState("Earth", target, chaser));
  });

  it("refuse a state inside the body, a target with no orbit plane, and bad cells, naming the parameter", () => {
    const inside = relativeState("Earth", target, [[6000, 0, 0, 0, 7, 0]])[0];
    expect(inside.map(code)).toEqual(Array(6).fill("#VALUE!"));
    expect(msg(inside[0])).toMatch(/^chaser_state: got a position 6000 km from the centre, inside Earth/);
    expect(msg(chaserState("Earth", [[690, 0, 0, 0, 7.5, 0]], [START])[0][0])).toMatch(/^target_state: got a position 690 km from the centre, inside Earth/);
    const flat = chaserState("Earth", [[A, 0, 0, 1, 0, 0]], [START])[0][0];
    expect(code(flat)).toBe("#N/A");
    expect(msg(flat)).toMatch(/^target_state: .*no orbit plane/);
    expect(msg(relativeState("Earth", target, [[1, 2, 3]])[0][0])).toMatch(/^chaser_state: got a 1x3 range; expected 6 columns per case/);
    expect(msg(chaserState("Earth", target, [[1, 2, 3, 4, 5, true]])[0][0])).toMatch(/^relative_state: got TRUE; expected 6 numbers in a row/);
    expect(msg(chaserState(-5, target, [START])[0][0])).toMatch(/^body: got -5;/);
  });
});

describe("the chain on the sheet: STATE_FROM_ELEMENTS -> RELATIVE_STATE -> RELATIVE_STATE_AT_TIME -> CHASER_STATE against PROPAGATE_STATE of the chaser", () => {
  // The independent route: both craft propagated in exact two-body motion by PROPAGATE_STATE
  // (universal variables; checked against Vallado 4th ed. in test/core/propagate.test.ts). The
  // linear theory's error is the quadratic one the help text states: for a chaser a distance y0
  // away along-track, CW's straight y axis leaves it y0^2 / 2a off the target's circle, and the
  // position error is (y0^2 / 2a) |(3 (1 - cos nt), 6 (sin nt - nt))|, 6 pi y0^2 / a per orbit
  // (src/core/relativemotion.ts; measured in test/core/relativemotion.test.ts).
  const times = [[600], [2400], [PERIOD], [2 * PERIOD]];
  const cwError = (lower: number, behindDeg: number) => {
    const target = stateFromElements("Earth", A, 0, 98.2, 30, 0, 10);
    const chaser = stateFromElements("Earth", A - lower, 0, 98.2, 30, 0, 10 - behindDeg);
    const start = relativeState("Earth", target, chaser);
    const predicted = relativeStateAtTime("Earth", A, start, times);
    const back = chaserState("Earth", propagateState("Earth", target, times), predicted);
    const exact = propagateState("Earth", chaser, times);
    const separation = Math.hypot(...(start[0] as number[]).slice(0, 3));
    return { errors: times.map((_, i) => gap3(back[i], exact[i])), separation };
  };
  const leading = (y0: number, t: number) => {
    const th = N * t;
    return ((y0 * y0) / (2 * A)) * Math.hypot(3 * (1 - Math.cos(th)), 6 * (Math.sin(th) - th));
  };

  it("errs by the stated quadratic amount for the Skerry-1E start (100 m below, 2 km behind): within 6 pi |rho|^2 / a per orbit, and near the leading term", () => {
    const { errors, separation } = cwError(0.1, 0.01621);
    // Measured: 0.18 m at 10 min, 3.6 m at 40 min, 10.7 m after one orbit, 21.3 m after two;
    // 0.967 to 0.996 of the leading term (the 100 m radial offset adds its own, smaller, second-order terms).
    errors.forEach((e, i) => {
      const t = times[i][0];
      expect(e).toBeLessThanOrEqual(((6 * Math.PI * separation ** 2) / A) * Math.max(1, t / PERIOD) * 1.01);
      expect(e / leading(separation, t)).toBeGreaterThan(0.95);
      expect(e / leading(separation, t)).toBeLessThan(1.01);
    });
  });

  it("puts a chaser 10 km along-track about 0.27 km wrong after one orbit and one 1 km away 2.7 m wrong: 100x per tenfold (the help text's figures)", () => {
    const ten = cwError(0, (10 / A) * (180 / Math.PI)).errors[2];
    const one = cwError(0, (1 / A) * (180 / Math.PI)).errors[2];
    expectPrinted(ten, 0.27, 2);
    expectPrinted(one * 1000, 2.7, 1);
    expect(ten / one).toBeGreaterThan(99);
    expect(ten / one).toBeLessThan(101);
  });
});

describe("LOW_THRUST_DV", () => {
  it("is the core's Edelbaum delta-v with Earth's catalogue GM, lifted over a row of plane changes", () => {
    expect(lowThrustDv("Earth", A - 170, A, 0.8)).toEqual([[ok(coreLowThrustDv(MU, A - 170, A, 0.8))]]);
    expectPrinted(lowThrustDv("Earth", 6898.1366, 7068.1366, 0.8)[0][0], 0.1895, 4); // the help text's example (Skerry-1E, demo)
    const angles = [[0, 0.8, 10, 114]];
    expect(lowThrustDv("Earth", 6898.1366, 7068.1366, angles)).toEqual([angles[0].map((di) => ok(coreLowThrustDv(MU, 6898.1366, 7068.1366, di)))]);
  });

  it("gives Kechichian's low-orbit-to-geostationary case with a 28.5 deg plane change through the sheet, GM as a number", () => {
    // 7000 km to 42166 km, 28.5 deg: 5.78378 km/s (Kechichian 1997's case, from memory, as tabulated
    // in poliastro's tests/tests_twobody/test_thrust.py with mu = 398600.4418 and rtol 1e-5).
    const dv = lowThrustDv(398600.4418, 7000, 42166, 28.5)[0][0] as number;
    expect(Math.abs(dv / 5.78378 - 1)).toBeLessThan(1e-5);
  });

  it("refuses an altitude typed as a radius, and is #N/A beyond the closed form's 114.59 deg, naming the parameter", () => {
    expect(msg(lowThrustDv("Earth", 520, 7068.1366, 0.8)[0][0])).toMatch(/^radius_from: got 520 km, inside Earth .*a radius of 6898\.1366 km/);
    expect(msg(lowThrustDv("Earth", 6898.1366, 690, 0.8)[0][0])).toMatch(/^radius_to: got 690 km, inside Earth/);
    const far = lowThrustDv("Earth", 7000, 42166, 120)[0][0];
    expect(code(far)).toBe("#N/A");
    expect(msg(far)).toMatch(/^plane_change: Edelbaum's closed form covers plane changes up to 2 rad \(114\.59 deg\)/);
    expect(msg(lowThrustDv("Earth", 7000, 42166, 200)[0][0])).toMatch(/^plane_change: got 200; expected an angle between the two orbit planes from 0 to 180 deg/);
  });
});

describe("LOW_THRUST_TIME", () => {
  it("is the core's firing time, lifted over a column of thrust levels", () => {
    expect(lowThrustTime(0.1895, 0.02, 180, 1500)).toEqual([[ok(coreLowThrustTime(0.1895, 0.02, 180, 1500))]]);
    const thrusts = [[0.01], [0.02], [0.04]];
    expect(lowThrustTime(0.1895, thrusts, 180, 1500)).toEqual(thrusts.map(([f]) => [ok(coreLowThrustTime(0.1895, f, 180, 1500))]));
    // The help text's example (Skerry-1E, demo): about 1.695e6 s, 19.6 days.
    expectPrinted((lowThrustTime(0.1895, 0.02, 180, 1500)[0][0] as number) / 1e6, 1.695, 3);
  });

  it("burns at the flow F / (g0 Isp) the propellant BURN_SEQUENCE gives for the same delta-v (why there is no separate propellant function)", () => {
    // g0 = 9.80665 m/s^2 exactly (3rd CGPM, 1901).
    const dv = lowThrustDv("Earth", 6898.1366, 7068.1366, 0.8)[0][0] as number;
    const t = lowThrustTime(dv, 0.02, 180, 1500)[0][0] as number;
    const propellant = burnSequence(dv, 1500, 180)[0][1] as number;
    expect(Math.abs((t * 0.02) / (9.80665 * 1500) / propellant - 1)).toBeLessThan(1e-14);
    expectPrinted(propellant, 2.30, 2); // 2.30 kg of Skerry-1E's 180 kg (demo)
  });

  it("refuses bad inputs, naming the parameter", () => {
    expect(msg(lowThrustTime(-0.1, 0.02, 180, 1500)[0][0])).toMatch(/^delta_v: got -0.1; expected/);
    expect(msg(lowThrustTime(0.1, 0, 180, 1500)[0][0])).toMatch(/^thrust: got 0; expected a positive number/);
    expect(msg(lowThrustTime(0.1, 0.02, "heavy", 1500)[0][0])).toBe('initial_mass: got "heavy"; expected a number (kg).');
    expect(code(lowThrustTime(0.1, 0.02, 180, -1)[0][0])).toBe("#VALUE!");
  });
});
