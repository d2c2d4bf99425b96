import { describe, expect, it } from "vitest";
import { dopplerShift, freeSpacePathLoss, SPEED_OF_LIGHT } from "../../src/core/linkbudget";
import { expectError, ok } from "../support/expect";

describe("link budget helpers", () => {
  it("free-space path loss follows ITU-R P.525: 32.45 + 20 log f(MHz) + 20 log d(km) dB", () => {
    // The exact constant is 20 log10(4 pi 1e9 / c) = 32.4478 dB; P.525 prints it rounded.
    const k = 20 * Math.log10((4 * Math.PI * 1e9) / (SPEED_OF_LIGHT * 1000));
    expect(k).toBeCloseTo(32.4478, 4);
    for (const [d, fMHz] of [[1000, 2200], [2500, 437.5], [40000, 8400], [0.001, 1]]) {
      const L = ok(freeSpacePathLoss(d, fMHz * 1e6));
      expect(L).toBeCloseTo(k + 20 * Math.log10(fMHz) + 20 * Math.log10(d), 10);
      expect(Math.abs(L - (32.45 + 20 * Math.log10(fMHz) + 20 * Math.log10(d)))).toBeLessThan(0.003);
    }
    expect(ok(freeSpacePathLoss(1000, 2.2e9))).toBeCloseTo(159.296, 3);
  });

  it("Doppler shift is -f rdot / c: an approaching source is heard higher", () => {
    expect(ok(dopplerShift(437.5e6, -7))).toBeCloseTo((437.5e6 * 7) / 299792.458, 9);
    expect(ok(dopplerShift(2.2e9, 5))).toBeLessThan(0);
    expect(Object.is(ok(dopplerShift(1e9, 0)), 0)).toBe(true);
  });

  it("refuses bad arguments, naming the parameter", () => {
    expectError(freeSpacePathLoss(0, 1e9), "bad_argument", "distance");
    expectError(freeSpacePathLoss(100, -1), "bad_argument", "frequency");
    expectError(dopplerShift(1e9, NaN), "bad_argument", "range_rate");
  });
});
