import { describe, expect, it } from "vitest";
import { isCellError } from "../../src/runner/host";
import { builtBundle, excelArg } from "../contract/bundle";
import { logUniform, seeded } from "../support/random";

// Properties of the "Relative motion and low thrust" functions through the BUILT bundle, each over
// thousands of random cases passed as ONE range call (so the lifting path is what is checked).
// Tolerances are stated with the reason for each.
const bundle = builtBundle();
const call = (id: string, ...args: unknown[]) => bundle.functions.get(id)!(...args.map(excelArg)) as unknown[][];
const GM = 398600.4418;
const N = 2000;
const size3 = (s: readonly number[], at = 0) => Math.hypot(s[at], s[at + 1], s[at + 2]);
const gap3 = (p: readonly number[], q: readonly number[], at = 0) => Math.hypot(p[at] - q[at], p[at + 1] - q[at + 1], p[at + 2] - q[at + 2]);
const numbers = (g: unknown[][]): number[][] => {
  for (const r of g) for (const c of r) if (isCellError(c) || typeof c !== "number") throw new Error(`unexpected cell ${JSON.stringify(c)}`);
  return g as number[][];
};

/** Random target orbits of every shape (LEO to beyond GEO, e up to 0.7, any inclination, retrograde included) as state rows. */
function randomTargets(seed: number, n: number): number[][] {
  const rand = seeded(seed);
  const elements = Array.from({ length: n }, () => {
    const e = rand() < 0.3 ? 0 : 0.7 * rand();
    const rp = logUniform(rand, 6600, 50000);
    return [rp / (1 - e), e, 180 * rand(), 360 * rand(), 360 * rand(), 360 * rand()];
  });
  const col = (k: number) => elements.map((r) => [r[k]]);
  return numbers(call("STATE_FROM_ELEMENTS", GM, col(0), col(1), col(2), col(3), col(4), col(5)));
}

/** Random relative states: separations log-uniform from 1 m to 500 km in any direction, rates up to 1e-3 n-scaled km/s. */
function randomRelative(seed: number, n: number, rate = 1e-3): number[][] {
  const rand = seeded(seed);
  return Array.from({ length: n }, () => {
    const s = logUniform(rand, 1e-3, 500);
    const dir = [2 * rand() - 1, 2 * rand() - 1, 2 * rand() - 1];
    const d = Math.hypot(...dir) || 1;
    return [...dir.map((x) => (x / d) * s), ...[0, 0, 0].map(() => (2 * rand() - 1) * rate * s)];
  });
}

describe("RELATIVE_STATE and CHASER_STATE through the bundle", () => {
  const targets = randomTargets(1601, N);

  it("RELATIVE_STATE(CHASER_STATE(rel)) returns rel: positions to 1e-15 |r_target| + 1e-12 |rho|, rates to 1e-15 |v_target| + 1e-12 |rho_dot|", () => {
    // The chaser's inertial state carries a rounding of a few ulp of |r_target| (about 1e-12 km in
    // low orbit, more out at 50,000 km), which the difference brings back absolutely: a 1 m
    // separation cannot come back better than that.
    const rels = randomRelative(1602, N);
    const back = numbers(call("RELATIVE_STATE", GM, targets, numbers(call("CHASER_STATE", GM, targets, rels))));
    for (let k = 0; k < N; k++) {
      expect(gap3(back[k], rels[k])).toBeLessThanOrEqual(1e-15 * size3(targets[k]) + 1e-12 * size3(rels[k]));
      expect(gap3(back[k], rels[k], 3)).toBeLessThanOrEqual(1e-15 * size3(targets[k], 3) + 1e-12 * size3(rels[k], 3) + 1e-15 * size3(rels[k]) * (size3(targets[k], 3) / size3(targets[k])));
    }
  });

  it("CHASER_STATE(RELATIVE_STATE(chaser)) returns the chaser's state to 1e-14 of its size", () => {
    const rels = randomRelative(1603, N);
    const chasers = targets.map((t, k) => t.map((x, q) => (q < 3 ? x + rels[k][q] : x * (1 + rels[k][q]))));
    const back = numbers(call("CHASER_STATE", GM, targets, numbers(call("RELATIVE_STATE", GM, targets, chasers))));
    for (let k = 0; k < N; k++) {
      expect(gap3(back[k], chasers[k])).toBeLessThanOrEqual(1e-14 * size3(chasers[k]));
      expect(gap3(back[k], chasers[k], 3)).toBeLessThanOrEqual(1e-14 * size3(chasers[k], 3));
    }
  });

  it("keeps the separation's length (the local axes are orthonormal): |rho| = |r_chaser - r_target| to 1e-15 |r_target|", () => {
    const rels = randomRelative(1604, N);
    const chasers = targets.map((t, k) => t.map((x, q) => (q < 3 ? x + rels[k][q] : x)));
    const rel = numbers(call("RELATIVE_STATE", GM, targets, chasers));
    for (let k = 0; k < N; k++) expect(Math.abs(size3(rel[k]) - gap3(chasers[k], targets[k]))).toBeLessThanOrEqual(2e-15 * size3(targets[k]) + 1e-15 * size3(rel[k]));
  });
});

describe("RELATIVE_STATE_AT_TIME through the bundle: the Clohessy-Wiltshire flow composes in time", () => {
  const rand = seeded(1605);
  const smas = Array.from({ length: N }, () => [logUniform(rand, 6600, 45000)]);
  const n = smas.map(([a]) => Math.sqrt(GM / a ** 3));
  const rels = randomRelative(1606, N).map((s, k) => s.map((x, q) => (q < 3 ? x : x * n[k] * 1e3)));
  const t1 = n.map((nk) => [((2 * rand() - 1) * 3 * 2 * Math.PI) / nk]);
  const t2 = n.map((nk) => [((2 * rand() - 1) * 3 * 2 * Math.PI) / nk]);
  // The closed form's terms grow like 6 n t |rho| and cancel between them, so a component is good
  // to a few ulp of the largest term; two steps compound that growth once more (a generous scale:
  // the errors measured with it are about 3e-17 of it).
  const scale = (k: number) => (size3(rels[k]) + size3(rels[k], 3) / n[k]) * (1 + 6 * n[k] * (Math.abs(t1[k][0]) + Math.abs(t2[k][0]))) ** 2;

  it("propagating t1 then t2 equals propagating t1 + t2 (positions to 1e-15 of the term scale, rates to 1e-15 n times it; measured 3e-17)", () => {
    const twoSteps = numbers(call("RELATIVE_STATE_AT_TIME", GM, smas, numbers(call("RELATIVE_STATE_AT_TIME", GM, smas, rels, t1)), t2));
    const oneStep = numbers(call("RELATIVE_STATE_AT_TIME", GM, smas, rels, t1.map(([a], k) => [a + t2[k][0]])));
    for (let k = 0; k < N; k++) {
      expect(gap3(twoSteps[k], oneStep[k])).toBeLessThanOrEqual(1e-15 * scale(k));
      expect(gap3(twoSteps[k], oneStep[k], 3)).toBeLessThanOrEqual(1e-15 * scale(k) * n[k]);
    }
  });

  it("propagating t then -t returns the start", () => {
    const back = numbers(call("RELATIVE_STATE_AT_TIME", GM, smas, numbers(call("RELATIVE_STATE_AT_TIME", GM, smas, rels, t1)), t1.map(([t]) => [-t])));
    for (let k = 0; k < N; k++) {
      expect(gap3(back[k], rels[k])).toBeLessThanOrEqual(1e-15 * scale(k));
      expect(gap3(back[k], rels[k], 3)).toBeLessThanOrEqual(1e-15 * scale(k) * n[k]);
    }
  });

  it("keeps the integral vy + 2 n x of the equations (from y'' + 2 n x' = 0)", () => {
    const out = numbers(call("RELATIVE_STATE_AT_TIME", GM, smas, rels, t1));
    for (let k = 0; k < N; k++) {
      const drift = (s: number[]) => s[4] + 2 * n[k] * s[0];
      expect(Math.abs(drift(out[k]) - drift(rels[k]))).toBeLessThanOrEqual(2e-16 * n[k] * scale(k));
    }
  });
});

describe("RELATIVE_RENDEZVOUS through the bundle", () => {
  it("lands on the aim point and stops there: burn 1 added and propagated by RELATIVE_STATE_AT_TIME arrives at the aim, at the velocity burn 2 cancels", () => {
    const rand = seeded(1607);
    const a = 7068.1366;
    const n = Math.sqrt(GM / a ** 3);
    const rels = randomRelative(1608, N).map((s) => s.map((x, q) => (q < 3 ? x / 10 : x * n * 1e2)));
    const aims = rels.map(() => [0, 0, 0].map(() => (2 * rand() - 1) * 5));
    const times = rels.map(() => [((0.05 + 0.9 * rand()) * Math.PI) / n]); // within the first half period: no singular time
    const burns = numbers(call("RELATIVE_RENDEZVOUS", GM, a, rels, aims, times));
    const after = rels.map((s, k) => s.map((x, q) => (q < 3 ? x : x + burns[k][q - 3])));
    const arrival = numbers(call("RELATIVE_STATE_AT_TIME", GM, a, after, times));
    for (let k = 0; k < N; k++) {
      // The solve amplifies rounding by up to the transfer matrix's condition (below 1e3 here).
      const distances = size3(aims[k]) + 10 * size3(rels[k]);
      expect(gap3(arrival[k], aims[k])).toBeLessThanOrEqual(1e-12 * distances);
      expect(gap3(arrival[k].slice(3), burns[k].slice(3, 6).map((x) => -x))).toBeLessThanOrEqual(1e-15 * (burns[k][7] + n * distances));
      expect(burns[k][8]).toBe(burns[k][6] + burns[k][7]);
    }
  });
});

describe("LOW_THRUST_DV and LOW_THRUST_TIME through the bundle", () => {
  const rand = seeded(1609);
  const from = Array.from({ length: N }, () => [logUniform(rand, 6600, 1e5)]);
  const to = Array.from({ length: N }, () => [logUniform(rand, 6600, 1e5)]);

  it("costs at least the impulsive Hohmann transfer between the same coplanar circles, and is symmetric in the radii", () => {
    const dv = numbers(call("LOW_THRUST_DV", GM, from, to, 0));
    const back = numbers(call("LOW_THRUST_DV", GM, to, from, 0));
    const hohmann = numbers(call("TRANSFER_DV", GM, from, to));
    for (let k = 0; k < N; k++) {
      expect(dv[k][0]).toBeGreaterThanOrEqual(hohmann[k][0] * (1 - 1e-14));
      expect(Math.abs(dv[k][0] - back[k][0])).toBeLessThanOrEqual(1e-15 * dv[k][0]);
    }
  });

  it("fires for as long as the rocket equation's propellant takes at the flow F / (g0 Isp): t F / (g0 Isp) = m0 (1 - 1 / MASS_RATIO) to 1e-13", () => {
    const dv = from.map(() => [2 * rand()]);
    const thrust = dv.map(() => [logUniform(rand, 1e-3, 1)]);
    const mass = dv.map(() => [logUniform(rand, 5, 5000)]);
    const isp = dv.map(() => [logUniform(rand, 200, 5000)]);
    const t = numbers(call("LOW_THRUST_TIME", dv, thrust, mass, isp));
    const ratio = numbers(call("MASS_RATIO", dv, isp));
    for (let k = 0; k < N; k++) {
      const burned = (t[k][0] * thrust[k][0]) / (9.80665 * isp[k][0]); // kg; g0 = 9.80665 m/s^2 exactly
      const expected = mass[k][0] * (1 - 1 / ratio[k][0]);
      // 1 - 1 / ratio cancels for small burns (dv / (g0 Isp) down to 1e-7 here): allow for it.
      expect(Math.abs(burned - expected)).toBeLessThanOrEqual(1e-13 * expected + 4e-16 * mass[k][0]);
    }
  });
});
