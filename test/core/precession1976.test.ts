import { describe, expect, it } from "vitest";
import { precessionMatrix1976 } from "../../src/core/precession1976";
import { apply } from "../../src/core/rotation";

describe("IAU 1976 precession (Vallado 4th ed. Eqs. 3-87, 3-88)", () => {
  it("takes Vallado's Example 3-15 mean-of-date vectors to J2000 and GCRF to 0.1 mm", () => {
    const jdTT = 2453101.828154745; // Example 3-15
    // [r_MOD, r_J2000] of Example 3-15 / Table 3-6: without and with the IERS nutation corrections.
    const cases: [number[], number[]][] = [
      [[5094.0290167, 6127.8709363, 6380.2478885], [5102.5096, 6123.01152, 6378.1363]],
      [[5094.0283745, 6127.8708164, 6380.2485164], [5102.5089579, 6123.0114007, 6378.1369282]],
    ];
    const p = precessionMatrix1976(jdTT);
    for (const [mod, j2000] of cases) {
      const r = apply(p, mod as [number, number, number]);
      for (let i = 0; i < 3; i++) expect(Math.abs(r[i] - j2000[i])).toBeLessThan(j2000[0] === 5102.5096 ? 5e-5 : 1e-7);
    }
  });

  it("is the identity at J2000 and a rotation (orthonormal to 1e-15) elsewhere", () => {
    const p0 = precessionMatrix1976(2451545.0);
    expect(p0.flat()).toEqual([1, 0, 0, 0, 1, 0, 0, 0, 1]);
    const p = precessionMatrix1976(2470000.5);
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) {
      const dotij = p[i][0] * p[j][0] + p[i][1] * p[j][1] + p[i][2] * p[j][2];
      expect(Math.abs(dotij - (i === j ? 1 : 0))).toBeLessThan(1e-15);
    }
  });
});
