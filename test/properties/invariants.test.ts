import { describe, expect, it } from "vitest";
import { isCellError } from "../../src/runner/host";
import { builtBundle, excelArg } from "../contract/bundle";
import { logUniform, seeded } from "../support/random";

// Invariants of the sheet functions through the BUILT bundle, each over thousands of random orbits
// passed as ONE range call (so the lifting path is what is checked). Tolerances are relative and
// stated; where float64 cannot reach 1e-10 the test says why.
const bundle = builtBundle();
const call = (id: string, ...args: unknown[]) => bundle.functions.get(id)!(...args.map(excelArg)) as unknown[][];
const GM = 398600.4418;
const N = 3000;

function randomOrbits(seed: number, n: number) {
  const rand = seeded(seed);
  const rows: number[][] = [];
  for (let k = 0; k < n; k++) {
    const kind = k % 6; // ellipse, near-circular, equatorial, polar/retrograde, high ellipse, hyperbola
    const e = kind === 1 ? 1e-6 * rand() + 1e-9 : kind === 4 ? 0.9 + 0.09 * rand() : kind === 5 ? 1.05 + 3 * rand() : 0.7 * rand();
    const a = kind === 5 ? -logUniform(rand, 7000, 1e6) : logUniform(rand, 7000, 1e6);
    const inc = kind === 2 ? 1e-3 + 1e-3 * rand() : kind === 3 ? 90 + 90 * rand() : 180 * rand();
    const limit = e > 1 ? (Math.acos(-1 / e) * 180) / Math.PI - 1 : 360;
    const nu = e > 1 ? (2 * rand() - 1) * limit : 360 * rand();
    rows.push([a, e, inc, 360 * rand(), 360 * rand(), nu]);
  }
  return rows;
}
const col = (rows: number[][], k: number) => rows.map((r) => [r[k]]);
const angleGap = (x: number, y: number) => Math.abs(((x - y + 540) % 360) - 180);

describe("invariants through the bundle", () => {
  const orbits = randomOrbits(42, N);
  const states = call("STATE_FROM_ELEMENTS", GM, col(orbits, 0), col(orbits, 1), col(orbits, 2), col(orbits, 3), col(orbits, 4), col(orbits, 5)) as number[][];

  it("elements -> state -> elements returns the elements (sma 1e-10 rel, angles 1e-7 deg; near-circular and near-equatorial angles compared as their well-conditioned sums)", () => {
    expect(states.length).toBe(N);
    const back = call("ELEMENTS_FROM_STATE", GM, states) as number[][];
    for (let k = 0; k < N; k++) {
      const [a, e, i, raan, argPeriapsis, nu] = orbits[k];
      const [a2, e2, i2, raan2, argp2, nu2] = back[k];
      expect(Math.abs(a2 / a - 1)).toBeLessThan(1e-10);
      expect(Math.abs(e2 - e)).toBeLessThan(1e-10 * Math.max(1, e));
      expect(Math.abs(i2 - i)).toBeLessThan(1e-7);
      // For e ~ 1e-6 arg_periapsis and nu are individually ill-conditioned (error ~ 1e-16 / e rad); their sum is not.
      if (e > 1e-4) expect(angleGap(argp2, argPeriapsis) + angleGap(nu2, nu)).toBeLessThan(1e-6);
      else expect(angleGap(argp2 + nu2, argPeriapsis + nu)).toBeLessThan(1e-7);
      if (i > 0.01) expect(angleGap(raan2, raan)).toBeLessThan(1e-7);
    }
  });

  it("propagating forward then back returns the state to 1e-9 relative, and conserves energy and angular momentum to 1e-11", () => {
    const rand = seeded(7);
    const dts = orbits.map(([a]) => [(rand() * 2 - 1) * 3 * 2 * Math.PI * Math.sqrt(Math.abs(a) ** 3 / GM)]);
    const fwd = call("PROPAGATE_STATE", GM, states, dts) as number[][];
    const back = call("PROPAGATE_STATE", GM, fwd, dts.map(([t]) => [-t])) as number[][];
    const energy = (s: number[]) => (s[3] ** 2 + s[4] ** 2 + s[5] ** 2) / 2 - GM / Math.hypot(s[0], s[1], s[2]);
    const h = (s: number[]) => Math.hypot(s[1] * s[5] - s[2] * s[4], s[2] * s[3] - s[0] * s[5], s[0] * s[4] - s[1] * s[3]);
    for (let k = 0; k < N; k++) {
      const s0 = states[k];
      const r0 = Math.hypot(s0[0], s0[1], s0[2]);
      const v0 = Math.hypot(s0[3], s0[4], s0[5]);
      for (let q = 0; q < 3; q++) expect(Math.abs(back[k][q] - s0[q]) / r0).toBeLessThan(1e-9);
      for (let q = 3; q < 6; q++) expect(Math.abs(back[k][q] - s0[q]) / v0).toBeLessThan(1e-9);
      expect(Math.abs(energy(fwd[k]) - energy(s0)) / (GM / r0)).toBeLessThan(1e-11);
      expect(Math.abs(h(fwd[k]) / h(s0) - 1)).toBeLessThan(1e-11);
    }
  });

  it("mean -> eccentric -> true -> mean anomaly closes to 1e-9 deg on ellipses up to e = 0.999", () => {
    const rand = seeded(3);
    const m = Array.from({ length: N }, () => [720 * rand() - 360]);
    const e = Array.from({ length: N }, () => [0.999 * rand() ** 0.5]);
    const nu = call("TRUE_ANOMALY_FROM_MEAN", m, e) as number[][];
    const m2 = call("MEAN_ANOMALY_FROM_TRUE", nu, e) as number[][];
    const bigE = call("SOLVE_ECCENTRIC_ANOMALY", m, e) as number[][];
    for (let k = 0; k < N; k++) {
      expect(Math.abs(m2[k][0] - m[k][0])).toBeLessThan(1e-9);
      // Kepler's equation itself, in degrees: M = E - e sin E.
      const E = (bigE[k][0] * Math.PI) / 180;
      expect(Math.abs(((E - e[k][0] * Math.sin(E)) * 180) / Math.PI - m[k][0])).toBeLessThan(1e-9);
    }
  });

  it("a Lambert arc's v_from, propagated for the flight time, lands on r_to to 1e-8 relative (0-2 revolutions, both branches)", () => {
    const rand = seeded(11);
    const r1: number[][] = [], r2: number[][] = [], tof: number[][] = [], revs: number[][] = [], high: boolean[][] = [];
    for (let k = 0; k < 1000; k++) {
      const a = logUniform(rand, 7000, 50000);
      const b = logUniform(rand, 7000, 50000);
      const th = 0.2 + 2.7 * rand();
      r1.push([a, 0, 0]);
      r2.push([b * Math.cos(th), b * Math.sin(th) * Math.cos(0.3), b * Math.sin(th) * Math.sin(0.3)]);
      const n = k % 3;
      revs.push([n]);
      high.push([rand() < 0.5]);
      tof.push([(n + 0.5 + rand()) * 2 * Math.PI * Math.sqrt(((a + b) / 2) ** 3 / GM)]);
    }
    const v = call("LAMBERT_SOLVE", GM, r1, r2, tof, revs, null, high) as unknown[][];
    let solved = 0;
    for (let k = 0; k < v.length; k++) {
      if (isCellError(v[k][0])) continue; // too short for that many revolutions: #N/A, checked elsewhere
      solved++;
      const [end] = call("PROPAGATE_STATE", GM, [[...r1[k], ...(v[k].slice(0, 3) as number[])]], tof[k][0]) as number[][];
      const rr = Math.hypot(...r2[k]);
      for (let q = 0; q < 3; q++) expect(Math.abs(end[q] - r2[k][q]) / rr).toBeLessThan(1e-8);
    }
    expect(solved).toBeGreaterThan(800);
  });
});

describe("edge geometry through the bundle", () => {
  const s = (args: unknown[]) => call("STATE_FROM_ELEMENTS", GM, ...args)[0];
  it("handles e = 0 exactly, circular equatorial, polar and retrograde orbits", () => {
    const circEq = call("ELEMENTS_FROM_STATE", GM, [s([7000, 0, 0, 0, 0, 45])])[0] as number[];
    expect(circEq[1]).toBeLessThan(1e-15);
    expect(circEq[5]).toBeCloseTo(45, 9); // circular equatorial: true anomaly is the true longitude
    const polar = call("ELEMENTS_FROM_STATE", GM, [s([8000, 0.1, 90, 30, 40, 50])])[0] as number[];
    expect(polar[2]).toBeCloseTo(90, 10);
    const retro = call("ELEMENTS_FROM_STATE", GM, [s([8000, 0.1, 180, 0, 40, 50])])[0] as number[];
    expect(retro[2]).toBeCloseTo(180, 10);
  });
  it("refuses ecc exactly 1 in an element function and propagates an exactly parabolic state", () => {
    const refused = call("STATE_FROM_ELEMENTS", GM, 7000, 1, 10, 0, 0, 0)[0][0];
    expect(isCellError(refused) && refused.code).toBe("#VALUE!");
    const rp = 7000;
    const vp = Math.sqrt((2 * GM) / rp); // escape speed at periapsis: a parabola
    const out = call("PROPAGATE_STATE", GM, [[rp, 0, 0, 0, vp, 0]], 3600)[0] as number[];
    const energy = (out[3] ** 2 + out[4] ** 2 + out[5] ** 2) / 2 - GM / Math.hypot(out[0], out[1], out[2]);
    expect(Math.abs(energy) / (GM / rp)).toBeLessThan(1e-13);
  });
  it("returns the state for zero elapsed time and stays bound over a very long time", () => {
    const st = s([7000, 0.01, 51.6, 10, 20, 30]);
    expect(call("PROPAGATE_STATE", GM, [st], 0)[0]).toEqual(st);
    const far = call("PROPAGATE_STATE", GM, [st], 86400 * 365.25 * 100)[0] as number[];
    const r = Math.hypot(far[0], far[1], far[2]);
    expect(r).toBeGreaterThan(7000 * 0.99 - 1);
    expect(r).toBeLessThan(7000 * 1.01 + 1);
  });
  it("gives #N/A for a 180 degree Lambert transfer (plane undefined)", () => {
    const out = call("LAMBERT_SOLVE", GM, [[7000, 0, 0]], [[-8000, 0, 0]], 4000)[0][0];
    expect(isCellError(out) && out.code).toBe("#N/A");
  });
});
