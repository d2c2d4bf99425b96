import "../support/customFunctions";
import Decimal from "decimal.js";
import { describe, expect, it } from "vitest";
import * as family from "../../src/functions/linkbudget";
import { code, msg, only, sheet } from "./cells";

const { dopplerShift, freeSpacePathLoss } = sheet(family);

// Family "Link budget" at the sheet level: ITU-R P.525's free-space loss and the first-order
// Doppler shift, recomputed at 40 digits with decimal.js, lifted down a column of distances.

const D = Decimal.clone({ precision: 40 });
const C = new D("299792.458"); // km/s, exact (SI Brochure, 9th ed.)

describe("FREE_SPACE_PATH_LOSS", () => {
  it("is 20 log10(4 pi d f / c) (ITU-R P.525-4) to 1e-13 dB, and P.525's rounded 32.45 + 20 log f(MHz) + 20 log d(km) to 0.003 dB", () => {
    const cases = [[2133.528, 2.2e9], [500, 437.5e6], [40000, 8.4e9], [0.001, 1e6]];
    const out = freeSpacePathLoss(cases.map((c) => [c[0]]), cases.map((c) => [c[1]])) as number[][];
    cases.forEach(([d, f], k) => {
      const exact = new D(4).times(D.acos(-1)).times(d).times(f).div(C).log(10).times(20).toNumber();
      expect(Math.abs(out[k][0] - exact)).toBeLessThan(1e-13 * Math.max(1, exact));
      expect(Math.abs(out[k][0] - (32.45 + 20 * Math.log10(f / 1e6) + 20 * Math.log10(d)))).toBeLessThan(0.003);
    });
  });

  it("refuses a non-positive distance or frequency, naming it", () => {
    expect(msg(only(freeSpacePathLoss(0, 2.2e9)))).toMatch(/^distance: /);
    expect(code(only(freeSpacePathLoss(2000, "S band")))).toBe("#VALUE!");
  });
});

describe("DOPPLER_SHIFT", () => {
  it("is -f rdot / c to 1e-15 relative: heard higher while the range shrinks", () => {
    for (const [f, rdot] of [[2.2e9, -3.97], [437.5e6, 7.1], [8.4e9, -0.001]]) {
      const exact = new D(f).times(rdot).neg().div(C).toNumber();
      expect(Math.abs((only(dopplerShift(f, rdot)) as number) - exact)).toBeLessThanOrEqual(1e-15 * Math.abs(exact));
    }
    expect(only(dopplerShift(2.2e9, 0))).toBe(0);
  });

  it("refuses a non-positive frequency, naming it", () => {
    expect(msg(only(dopplerShift(-1, 3)))).toMatch(/^frequency: /);
  });
});
