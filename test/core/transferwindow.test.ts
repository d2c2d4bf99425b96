import { describe, expect, it } from "vitest";
import { DomainError, isDomainError } from "../../src/core/domain";
import { planetState } from "../../src/core/ephemeris";
import { solveLambert } from "../../src/core/lambert";
import { propagateState } from "../../src/core/propagate";
import { TRANSFER_GRID_CELL_CAP, transferBetween, transferGrid, transferKernel } from "../../src/core/transferwindow";
import { BODIES } from "../../src/catalogue/bodies";
import { seeded } from "../support/random";

// The catalogue's Sun (DE440, Park et al. 2021), as the worksheet layer passes it.
const GM_SUN_DE440 = BODIES.find((b) => b.kind === "star")!.gm.value;

const asNumbers = (r: unknown): number[] => {
  if (!Array.isArray(r)) throw new Error(`expected numbers, got ${JSON.stringify(r)}`);
  return r as number[];
};
const sub = (a: readonly number[], b: readonly number[]) => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
const norm = (a: readonly number[]) => Math.hypot(a[0], a[1], a[2]);
/** Julian date of a UTC calendar date (JD 2440587.5 is 1970-01-01 0h). */
const serial = (y: number, m: number, d: number) => Date.UTC(y, m - 1, d) / 86400000 + 2440587.5;
const EXCEL_TO_JD = 2415018.5; // Excel 1900 serial -> JD (from serial 61 on), as src/core/time.ts

describe("transferBetween: C3 and v∞ computed a second way", () => {
  // Second route: the planets' states from planetState, both Lambert arcs from solveLambert, the
  // departure state propagated with the universal-variable propagator (propagate.ts) to the
  // arrival date; it must land on the arrival planet, and v∞ in is read from the propagated
  // velocity rather than from Lambert's v_to.
  const rand = seeded(2029);
  const pairs: [string, string][] = [["Earth", "Mars"], ["Earth", "Venus"], ["Mars", "Earth"], ["Earth", "Jupiter"], ["Venus", "Mercury"]];
  it("300 random date pairs, five planet pairs: same C3, v∞ out, v∞ in, days; arc chosen by the lower v∞ sum", () => {
    for (let k = 0; k < 300; k++) {
      const [from, to] = pairs[k % pairs.length];
      const depart = serial(2026, 1, 1) + rand() * 3650;
      const days = 30 + rand() * (to === "Jupiter" ? 1500 : 500);
      const got = asNumbers(transferBetween(GM_SUN_DE440, from, to, depart, depart + days));
      const sDep = asNumbers(planetState(from, depart));
      const sArr = asNumbers(planetState(to, depart + days));
      const arcs = [false, true].map((longWay) => {
        const v = asNumbers(solveLambert(GM_SUN_DE440, sDep.slice(0, 3), sArr.slice(0, 3), days * 86400, 0, longWay));
        const end = asNumbers(propagateState(GM_SUN_DE440, [...sDep.slice(0, 3), v[0], v[1], v[2]], days * 86400));
        expect(norm(sub(end, sArr)) / norm(sArr)).toBeLessThan(1e-8);
        const vOut = norm(sub(v, sDep.slice(3)));
        const vIn = norm(sub(end.slice(3), sArr.slice(3)));
        return { vOut, vIn, sum: vOut + vIn };
      });
      const best = arcs[0].sum <= arcs[1].sum ? arcs[0] : arcs[1];
      expect(Math.abs(got[0] - best.vOut ** 2) / got[0]).toBeLessThan(1e-9);
      expect(Math.abs(got[1] - best.vOut) / got[1]).toBeLessThan(1e-9);
      expect(Math.abs(got[2] - best.vIn) / got[2]).toBeLessThan(1e-6);
      expect(got[3]).toBe(days);
      expect(Math.abs(got[0] - got[1] * got[1]) / got[0]).toBeLessThan(1e-15);
    }
  });

  it("gm_sun defaults to DE440's value and can be overridden", () => {
    const d = serial(2028, 11, 10);
    expect(transferBetween(1.327e11, "Earth", "Mars", d, d + 250)).not.toEqual(transferBetween(GM_SUN_DE440, "Earth", "Mars", d, d + 250));
  });
});

describe("transferBetween: bad arguments", () => {
  const d = serial(2028, 11, 10);
  it("names the parameter at fault", () => {
    const cases: [unknown, string][] = [
      [transferBetween(GM_SUN_DE440, "Earth", "Mars", d, d), "arrive_date"],
      [transferBetween(GM_SUN_DE440, "Earth", "Mars", d, d - 10), "arrive_date"],
      [transferBetween(GM_SUN_DE440, "Moon", "Mars", d, d + 200), "from"],
      [transferBetween(GM_SUN_DE440, "Earth", "Sun", d, d + 200), "to"],
      [transferBetween(GM_SUN_DE440, "Earth", "EM Bary", d, d + 200), "to"], // one planet twice: no transfer

      [transferBetween(GM_SUN_DE440, "Earth", "Mars", -3e6, d + 200), "depart_date"],
      [transferBetween(GM_SUN_DE440, "Earth", "Mars", d, 5e5), "arrive_date"],
      [transferBetween(0, "Earth", "Mars", d, d + 200), "gm_sun"],
    ];
    for (const [r, parameter] of cases) {
      expect(isDomainError(r) && r.kind).toBe("bad_argument");
      if (isDomainError(r)) expect(r.parameter).toBe(parameter);
    }
  });

  it("the kernel reports no arc for positions in line with the Sun", () => {
    const out = [0, 0, 0];
    const dep = [1.5e8, 0, 0, 0, 30, 0];
    expect(transferKernel(GM_SUN_DE440, dep, [-2.2e8, 0, 0, 0, -24, 0], 200 * 86400, out)).toBe(false);
    expect(transferKernel(GM_SUN_DE440, dep, [2.2e8, 0, 0, 0, 24, 0], 200 * 86400, out)).toBe(false);
    expect(transferKernel(GM_SUN_DE440, dep, [0, 2.2e8, 1e6, -24, 0, 0], 200 * 86400, out)).toBe(true);
  });
});

describe("transferGrid", () => {
  const first = serial(2028, 8, 1);

  it("departure dates run across, flight times down, and each cell is the transferBetween figure", () => {
    for (const quantity of ["c3", "v_inf_out", "v_inf_in", "v_inf_sum"]) {
      const g = transferGrid(GM_SUN_DE440, "Earth", "Mars", first, 10, 7, 150, 25, 5, quantity);
      if (isDomainError(g)) throw new Error(g.message);
      expect(g.length).toBe(5);
      for (const row of g) expect(row.length).toBe(7);
      for (let i = 0; i < 5; i++)
        for (let j = 0; j < 7; j++) {
          const t = asNumbers(transferBetween(GM_SUN_DE440, "Earth", "Mars", first + 10 * j, first + 10 * j + 150 + 25 * i));
          const expected = quantity === "c3" ? t[0] : quantity === "v_inf_out" ? t[1] : quantity === "v_inf_in" ? t[2] : t[1] + t[2];
          expect(g[i][j]).toBe(expected);
        }
    }
  });

  it("quantity defaults to c3 and is case-insensitive", () => {
    const a = transferGrid(GM_SUN_DE440, "Earth", "Mars", first, 5, 3, 200, 10, 2);
    expect(transferGrid(GM_SUN_DE440, "Earth", "Mars", first, 5, 3, 200, 10, 2, null)).toEqual(a);
    expect(transferGrid(GM_SUN_DE440, "Earth", "Mars", first, 5, 3, 200, 10, 2, " C3 ")).toEqual(a);
    const bad = transferGrid(GM_SUN_DE440, "Earth", "Mars", first, 5, 3, 200, 10, 2, "dv");
    expect(isDomainError(bad) && bad.parameter).toBe("quantity");
  });

  it(`grids above ${TRANSFER_GRID_CELL_CAP} cells are #VALUE! with the cap in the message`, () => {
    const r = transferGrid(GM_SUN_DE440, "Earth", "Mars", first, 1, 501, 100, 1, 500);
    expect(isDomainError(r) && r.kind).toBe("bad_argument");
    if (isDomainError(r)) expect(r.message).toContain(String(TRANSFER_GRID_CELL_CAP));
    expect(isDomainError(transferGrid(GM_SUN_DE440, "Earth", "Mars", first, 1, 500, 100, 1, 1))).toBe(false);
  });

  it("counts, steps, first flight time and the date span are checked", () => {
    const cases: [unknown, string][] = [
      [transferGrid(GM_SUN_DE440, "Earth", "Mars", first, 5, 0, 200, 10, 2), "depart_count"],
      [transferGrid(GM_SUN_DE440, "Earth", "Mars", first, 5, 2.5, 200, 10, 2), "depart_count"],
      [transferGrid(GM_SUN_DE440, "Earth", "Mars", first, -5, 3, 200, 10, 2), "depart_step"],
      [transferGrid(GM_SUN_DE440, "Earth", "Mars", first, 5, 3, 0, 10, 2), "tof_first"],
      [transferGrid(GM_SUN_DE440, "Earth", "Mars", first, 5, 3, 200, -1, 2), "tof_step"],
      [transferGrid(GM_SUN_DE440, "Earth", "Mars", first, 5, 3, 200, 10, 0), "tof_count"],
      [transferGrid(GM_SUN_DE440, "Earth", "Pluto", 402000 + EXCEL_TO_JD, 5, 3, 200, 10, 2), "tof_count"],
      [transferGrid(GM_SUN_DE440, "Earth", "Mars", 401000 + EXCEL_TO_JD, 1000, 3, 200, 10, 2), "depart_count"],
      [transferGrid(GM_SUN_DE440, "Earth", "Mars", -2e6, 5, 3, 200, 10, 2), "depart_first"],
      [transferGrid(GM_SUN_DE440, "Earth", "Ceres", first, 5, 3, 200, 10, 2), "to"],
      [transferGrid(GM_SUN_DE440, "Mars", "mars", first, 5, 3, 200, 10, 2), "to"],
    ];
    for (const [r, parameter] of cases) {
      expect(isDomainError(r) && r.kind, parameter).toBe("bad_argument");
      if (isDomainError(r)) expect(r.parameter).toBe(parameter);
    }
  });

  it("cells are finite positive numbers or DomainErrors, never NaN (Earth-Mars 2028-29, 60 x 40)", () => {
    const g = transferGrid(GM_SUN_DE440, "Earth", "Mars", first, 6, 60, 80, 10, 40, "v_inf_sum");
    if (isDomainError(g)) throw new Error(g.message);
    for (const row of g) for (const c of row) expect(c instanceof DomainError || (Number.isFinite(c) && c > 0)).toBe(true);
  });
});
