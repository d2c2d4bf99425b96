import { describe, expect, it } from "vitest";
import { densityProfile } from "../../src/core/densityprofile";
import { averagedDragRates, circularDecayRate } from "../../src/core/dragrates";
import { BODIES } from "../../src/catalogue/bodies";

// The catalogue's Earth (GM: DE440; equatorial radius: JPL SSD), as the worksheet layer passes it.
const earth = BODIES.find((b) => b.name === "Earth")!;
const GM = earth.gm.value;
const R = earth.equatorialRadius.value;

/**
 * Second route: the orbit averages of Gauss's equations for a tangential drag force taken
 * directly in mean anomaly, M uniform (100,000-point midpoint rule), E from Kepler's equation by
 * Newton iteration, the rates da/dt = 2 a^2 v f / mu and de/dt = 2 (e + cos nu) f / v with
 * f = -(1/2) rho v^2 / B (Vallado 4th ed. eq. 9-24 with only a tangential component).
 */
function meanAnomalyAverage(a: number, e: number, B: number, rho: (h: number) => number): { dadt: number; dedt: number } {
  const N = 100000;
  let da = 0;
  let de = 0;
  for (let i = 0; i < N; i++) {
    const M = (2 * Math.PI * (i + 0.5)) / N;
    let E = M + e * Math.sin(M);
    for (let it = 0; it < 30; it++) E -= (E - e * Math.sin(E) - M) / (1 - e * Math.cos(E));
    const r = a * (1 - e * Math.cos(E));
    const v = Math.sqrt(GM * (2 / r - 1 / a));
    const cosNu = (Math.cos(E) - e) / (1 - e * Math.cos(E));
    const f = (-0.5 * rho(r - R) * (v * 1000) ** 2) / B / 1000; // km/s^2
    da += (2 * a * a * v * f) / GM;
    de += (2 * (e + cosNu) * f) / v;
  }
  return { dadt: da / N, dedt: de / N };
}

describe("orbit-averaged drag rates", () => {
  it("circular orbit: da/dt = -(rho / B) sqrt(mu a), de/dt = 0", () => {
    const p = densityProfile("exponential", 150, 150, 15);
    const out = averagedDragRates(GM, R, R + 400, 0, 80, p, p.scaleHeight(400), { dadt: 0, dedt: 0 });
    expect(out.dadt).toBeCloseTo(-((1000 * 3.725e-12) / 80) * Math.sqrt(GM * (R + 400)), 20);
    expect(out.dedt).toBe(0);
    expect(circularDecayRate(GM, R + 400, 3.725e-12, 80)).toBe(out.dadt);
  });

  it("match a direct average over mean anomaly to 1e-7 for eccentric orbits, in both density models", () => {
    // the last four: the perigee and apogee spans of the lifetime benchmark's eccentric table and of a late decay
    const cases: [number, number][] = [[300, 320], [300, 800], [250, 2000], [200, 8000], [300, 600], [500, 800], [700, 1000], [150, 300]];
    for (const model of ["exponential", "nrlmsise-00"] as const) {
      const p = densityProfile(model, 150, 150, 15);
      for (const [hp, ha] of cases) {
        const a = R + (hp + ha) / 2;
        const e = (ha - hp) / (2 * a);
        const got = averagedDragRates(GM, R, a, e, 50, p, p.scaleHeight(hp), { dadt: 0, dedt: 0 });
        const ref = meanAnomalyAverage(a, e, 50, (h) => p.density(h));
        // the midpoint rule in M resolves the perigee peak to ~1e-8 for these cases
        expect(Math.abs(got.dadt / ref.dadt - 1), `${model} ${hp}x${ha} da`).toBeLessThan(1e-7);
        expect(Math.abs(got.dedt / ref.dedt - 1), `${model} ${hp}x${ha} de`).toBeLessThan(1e-7);
      }
    }
  });

  it("shrink a and e, and tend continuously to the circular rates as e -> 0", () => {
    const p = densityProfile("nrlmsise-00", 150, 150, 15);
    const circ = averagedDragRates(GM, R, R + 500, 0, 50, p, p.scaleHeight(500), { dadt: 0, dedt: 0 });
    const tiny = averagedDragRates(GM, R, R + 500, 1e-7, 50, p, p.scaleHeight(500), { dadt: 0, dedt: 0 });
    expect(Math.abs(tiny.dadt / circ.dadt - 1)).toBeLessThan(1e-6);
    expect(tiny.dedt).toBeLessThan(0);
    expect(Math.abs(tiny.dedt)).toBeLessThan(1e-6 * Math.abs(circ.dadt));
  });
});
