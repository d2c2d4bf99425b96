import { describe, expect, it } from "vitest";
import { addressKey, buildEngine } from "../../src/runner/engine";
import { isCellError } from "../../src/runner/host";
import { toEngineFormula } from "../../src/runner/names";
import { builtBundle, excelArg } from "../contract/bundle";
import { logUniform, seeded } from "../support/random";

// The drag and lifetime functions through the BUILT bundle, as Excel calls them: each check is
// ONE lifted call over a column of random cases (seeded), so the lifting path is what is checked.
// Every answer is a finite number (or, for a lifetime past the 200-year cap, #N/A), and every
// dependence has the physical sense (King-Hele, Satellite Orbits in an Atmosphere, 1987, ch. 1:
// density falls with height and rises with solar and geomagnetic activity; decay and its
// make-up scale with rho / B; lifetime grows with the orbit's height and with B, and shrinks with
// activity).
const bundle = builtBundle();
const call = (id: string, ...args: unknown[]) => bundle.functions.get(id)!(...args.map(excelArg)) as unknown[][];
const col = (xs: number[]) => xs.map((x) => [x]);
const values = (g: unknown[][]) => g.map((r) => r[0]);
const MODELS = ["nrlmsise-00", "exponential"];

/** Every cell a finite number. */
function finite(g: unknown[][]): number[] {
  return values(g).map((c, k) => {
    if (typeof c !== "number" || !Number.isFinite(c)) throw new Error(`case ${k}: ${JSON.stringify(c)}`);
    return c;
  });
}

/** A lifetime column: finite positive numbers, or #N/A past the cap (Infinity here, for comparisons). */
function lifetimes(g: unknown[][]): number[] {
  return values(g).map((c, k) => {
    if (typeof c === "number" && Number.isFinite(c) && c >= 0) return c;
    if (isCellError(c) && c.code === "#N/A" && /200-year cap/.test(c.message ?? "")) return Number.POSITIVE_INFINITY;
    throw new Error(`case ${k}: ${JSON.stringify(c)}`);
  });
}

describe("the sense of every dependence, through the bundle", () => {
  const rand = seeded(1414);
  const N = 300;

  // NRLMSISE-00's mean density costs about a millisecond per case (more in the isolated bundle), so
  // its sweeps are shorter than the exponential model's.
  it("ATMOSPHERE_DENSITY: positive, falls with altitude (both models); rises with F10.7 and Ap above 200 km", () => {
    for (const [m, n] of [["exponential", N], ["nrlmsise-00", 60]] as const) {
      const h = Array.from({ length: n }, () => 999 * rand());
      const lo = finite(call("ATMOSPHERE_DENSITY", col(h), 150, null, null, m));
      const hi = finite(call("ATMOSPHERE_DENSITY", col(h.map((x) => x + 1)), 150, null, null, m));
      lo.forEach((r, k) => expect(hi[k], `${m} ${h[k]} km`).toBeLessThan(r));
      lo.forEach((r) => expect(r).toBeGreaterThan(0));
    }
    const th = Array.from({ length: 60 }, () => 200 + 800 * rand());
    const f = th.map(() => 60 + 300 * rand());
    const quiet = finite(call("ATMOSPHERE_DENSITY", col(th), col(f), null, 10));
    const active = finite(call("ATMOSPHERE_DENSITY", col(th), col(f.map((x) => x + 20)), null, 10));
    const stormy = finite(call("ATMOSPHERE_DENSITY", col(th), col(f), null, 80));
    quiet.forEach((r, k) => {
      expect(active[k]).toBeGreaterThan(r);
      expect(stormy[k]).toBeGreaterThan(r);
    });
  });

  it("BALLISTIC_COEFFICIENT: rises with mass, falls with area and drag coefficient", () => {
    const m = Array.from({ length: N }, () => logUniform(rand, 1, 5000));
    const a = m.map(() => logUniform(rand, 0.01, 50));
    const b = finite(call("BALLISTIC_COEFFICIENT", col(m), col(a)));
    const heavier = finite(call("BALLISTIC_COEFFICIENT", col(m.map((x) => x * 1.01)), col(a)));
    const larger = finite(call("BALLISTIC_COEFFICIENT", col(m), col(a.map((x) => x * 1.01))));
    const draggier = finite(call("BALLISTIC_COEFFICIENT", col(m), col(a), 2.5));
    b.forEach((x, k) => {
      expect(heavier[k]).toBeGreaterThan(x);
      expect(larger[k]).toBeLessThan(x);
      expect(draggier[k]).toBeLessThan(x);
    });
  });

  it("DECAY_RATE and DRAG_MAKEUP_DV: fall with altitude and with B (both models), rise with F10.7; make-up grows in proportion to duration", () => {
    for (const [m, n] of [["exponential", N], ["nrlmsise-00", 40]] as const) {
      const h = Array.from({ length: n }, () => 150 + 800 * rand());
      const b = h.map(() => logUniform(rand, 5, 300));
      const f = h.map(() => 60 + 300 * rand());
      for (const id of ["DECAY_RATE", "DRAG_MAKEUP_DV"]) {
        const extra = id === "DRAG_MAKEUP_DV" ? [86400 * 365.25] : [];
        const base = finite(call(id, col(h), col(b), ...extra, col(f), null, m));
        const higher = finite(call(id, col(h.map((x) => x + 5)), col(b), ...extra, col(f), null, m));
        const denser = finite(call(id, col(h), col(b.map((x) => x * 1.1)), ...extra, col(f), null, m));
        base.forEach((x, k) => {
          expect(x).toBeGreaterThan(0);
          expect(higher[k]).toBeLessThan(x);
          expect(denser[k]).toBeLessThan(x);
        });
        if (m === "nrlmsise-00") {
          const active = finite(call(id, col(h), col(b), ...extra, col(f.map((x) => x + 20)), null, m));
          base.forEach((x, k) => expect(active[k]).toBeGreaterThan(x));
        } else {
          const year = finite(call("DRAG_MAKEUP_DV", col(h), col(b), 86400 * 365.25, null, null, m));
          const five = finite(call("DRAG_MAKEUP_DV", col(h), col(b), 5 * 86400 * 365.25, null, null, m));
          year.forEach((x, k) => expect(five[k] / x).toBeCloseTo(5, 10));
        }
      }
    }
  });

  it("ORBIT_LIFETIME: longer with a higher perigee, a higher apogee and a higher B; shorter with a more active Sun (both models)", () => {
    const n = 80;
    const hp = Array.from({ length: n }, () => 150 + 550 * rand());
    const ha = hp.map((x) => x + (rand() < 0.3 ? 0 : 600 * rand()));
    const b = hp.map(() => logUniform(rand, 5, 300));
    // a few flux levels (the model's profiles are built per 10-sfu node; 135 lies between nodes)
    const levels = [70, 100, 135, 150, 200];
    const f = hp.map(() => levels[Math.floor(rand() * levels.length)]);
    for (const m of MODELS) {
      const base = lifetimes(call("ORBIT_LIFETIME", col(hp), col(ha), col(b), col(f), null, m));
      const perigeeUp = lifetimes(call("ORBIT_LIFETIME", col(hp.map((x, k) => Math.min(x + 5, ha[k] + 5))), col(ha.map((x) => x + 5)), col(b), col(f), null, m));
      const apogeeUp = lifetimes(call("ORBIT_LIFETIME", col(hp), col(ha.map((x) => x + 50)), col(b), col(f), null, m));
      const denser = lifetimes(call("ORBIT_LIFETIME", col(hp), col(ha), col(b.map((x) => x * 1.2)), col(f), null, m));
      base.forEach((t, k) => {
        expect(t).toBeGreaterThan(0);
        const c = `${m} ${hp[k]} x ${ha[k]} km, B ${b[k]}`;
        if (Number.isFinite(t)) {
          expect(perigeeUp[k], c).toBeGreaterThan(t);
          expect(apogeeUp[k], c).toBeGreaterThan(t);
          expect(denser[k], c).toBeGreaterThan(t);
        }
      });
      if (m === "nrlmsise-00") {
        const active = lifetimes(call("ORBIT_LIFETIME", col(hp), col(ha), col(b), col(f.map((x) => x + 30)), null, m));
        base.forEach((t, k) => {
          if (Number.isFinite(active[k])) expect(active[k]).toBeLessThan(t);
          else expect(t).toBe(Number.POSITIVE_INFINITY);
        });
      }
    }
  });

  it("DISPOSAL_PERIGEE: higher for a longer limit or a more active Sun, lower for a higher B, never above the apogee", () => {
    const n = 30;
    const ha = Array.from({ length: n }, () => 350 + 600 * rand());
    const b = ha.map(() => logUniform(rand, 10, 200));
    const limit = ha.map(() => 365.25 * (1 + 30 * rand()));
    const base = finite(call("DISPOSAL_PERIGEE", col(ha), col(b), col(limit), 150));
    const longer = finite(call("DISPOSAL_PERIGEE", col(ha), col(b), col(limit.map((x) => 1.5 * x)), 150));
    const active = finite(call("DISPOSAL_PERIGEE", col(ha), col(b), col(limit), 200));
    const denser = finite(call("DISPOSAL_PERIGEE", col(ha), col(b.map((x) => 1.5 * x)), col(limit), 150));
    base.forEach((p, k) => {
      expect(p).toBeGreaterThan(100);
      expect(p).toBeLessThanOrEqual(ha[k]);
      // strictly where the answer is a perigee below the apogee; equal where both reach the apogee
      expect(longer[k]).toBeGreaterThanOrEqual(p);
      expect(active[k]).toBeGreaterThanOrEqual(p);
      expect(denser[k]).toBeLessThanOrEqual(p);
      if (p < ha[k]) {
        expect(longer[k]).toBeGreaterThan(p);
        expect(denser[k]).toBeLessThan(p);
      }
    });
  });
});

describe("a column against a row is a table, through the bundle", () => {
  const perigees = [[300], [400], [500], [600], [700]];
  const bs = [[10, 50, 100, 200]];

  it("ORBIT_LIFETIME: 5 perigee altitudes down, 4 ballistic coefficients across, each cell the single-cell answer", () => {
    const t = call("ORBIT_LIFETIME", perigees, perigees, bs, 150);
    expect(t.length).toBe(5);
    for (let i = 0; i < 5; i++) {
      expect(t[i].length).toBe(4);
      for (let j = 0; j < 4; j++) expect(t[i][j]).toEqual(call("ORBIT_LIFETIME", perigees[i][0], perigees[i][0], bs[0][j], 150)[0][0]);
    }
  });

  it("the same table against a forecast range, which stays one argument: still 5 x 4", () => {
    const forecast = [[46388, 110], [46753, 160], [47119, 190], [47484, 150]];
    const t = call("ORBIT_LIFETIME", perigees, perigees, bs, forecast, 46388);
    expect(t.map((r) => r.length)).toEqual([4, 4, 4, 4, 4]);
    expect(t[2][1]).toEqual(call("ORBIT_LIFETIME", 500, 500, 50, forecast, 46388)[0][0]);
    expect(t[2][1]).not.toEqual(call("ORBIT_LIFETIME", 500, 500, 50, 150)[0][0]);
  });

  it("DISPOSAL_PERIGEE: apogees down, 5-year and 25-year limits across", () => {
    const t = call("DISPOSAL_PERIGEE", [[600], [690], [800]], 68.18, [[1826.25, 9131.25]], 150);
    expect(t.map((r) => r.length)).toEqual([2, 2, 2]);
    for (const r of t) expect(r[1] as number).toBeGreaterThan(r[0] as number);
  });
});

describe("in the headless runner", () => {
  it("a forecast range with a trailing blank row, perigees down and B across: the table is sized right on the first pass and equals the direct call", () => {
    const grid: unknown[][] = [
      [null, 20, 68.18, null, 46388, 150],
      [350, null, null, null, 46753, 180],
      [450, null, null, null, 47119, 200],
      [550, null, null, null, 47484, 170],
      [null, null, null, null, null, null],
      [toEngineFormula("=ORBIT.ORBIT_LIFETIME(A2:A4, A2:A4, B1:C1, E1:F5, E1)")],
    ];
    const e = buildEngine(bundle, { S: grid as never });
    expect(e.passes).toBe(1);
    expect(e.spills.get(addressKey({ sheet: 0, row: 5, col: 0 }))).toEqual({ rows: 3, cols: 2 });
    const shown = e.hf.getRangeValues({ start: { sheet: 0, row: 5, col: 0 }, end: { sheet: 0, row: 7, col: 1 } });
    const perigees = [[350], [450], [550]];
    const forecast = [[46388, 150], [46753, 180], [47119, 200], [47484, 170]];
    expect(shown).toEqual(call("ORBIT_LIFETIME", perigees, perigees, [[20, 68.18]], forecast, 46388));
  });
});
