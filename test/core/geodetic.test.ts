import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { earthFixedToGeodetic, geodeticToEarthFixed } from "../../src/core/geodetic";
import { WGS84_A, WGS84_B } from "../../src/core/wgs84";
import { expectError, expectPrinted, ok } from "../support/expect";

const gap = (a: readonly number[], b: readonly number[]) => Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);

describe("WGS 84 geodetic <-> Earth-fixed", () => {
  it("gives Vallado 4th ed. Example 3-3 (r = 6524.834, 6862.875, 6448.296 km)", () => {
    const [lat, lon, h] = ok(earthFixedToGeodetic([6524.834, 6862.875, 6448.296]));
    expectPrinted(lon, 46.4464, 4);
    expectPrinted(h, 5085.22, 2);
    // Printed 34.352496 deg; the exact solution on WGS 84 is 34.3524952 (Vallado's own constants,
    // e = 0.081819221456, give 34.3524952 as well), 1.7 units of the last printed digit below it:
    // 9e-7 deg, 0.1 m on the ground. The book's iteration stops short of convergence.
    expect(Math.abs(lat - 34.352496)).toBeLessThan(1e-6);
    expect(Math.abs(lat - 34.3524951508)).toBeLessThan(1e-9);
  });

  it("puts the poles and the equator where the ellipsoid is (TR8350.2: a = 6378.137 km, b = 6356.7523142 km)", () => {
    expect(ok(geodeticToEarthFixed(90, 0, 0))[2]).toBeCloseTo(WGS84_B, 12);
    expect(ok(geodeticToEarthFixed(-90, 123, 1))[2]).toBeCloseTo(-WGS84_B - 1, 12);
    expect(ok(geodeticToEarthFixed(0, 90, 0))[1]).toBeCloseTo(WGS84_A, 12);
    expect(ok(earthFixedToGeodetic([0, 0, WGS84_B + 400]))).toEqual([90, 0, expect.closeTo(400, 9)]);
    expect(ok(earthFixedToGeodetic([0, 0, -WGS84_B]))[0]).toBe(-90);
  });

  it("round-trips to 1e-9 km at every latitude, poles included, from 100 km deep to 1e6 km up", () => {
    fc.assert(
      fc.property(
        fc.oneof(fc.double({ min: -90, max: 90, noNaN: true }), fc.constantFrom(-90, 90, 0, 89.9999999, -89.9999999)),
        fc.double({ min: -180, max: 180, noNaN: true }),
        fc.oneof(fc.double({ min: -100, max: 1e6, noNaN: true }), fc.constantFrom(0, 35786, 1e6, -100)),
        (lat, lon, h) => {
          const r = ok(geodeticToEarthFixed(lat, lon, h));
          const g = ok(earthFixedToGeodetic(r));
          const r2 = ok(geodeticToEarthFixed(g[0], g[1], g[2]));
          expect(gap(r, r2)).toBeLessThanOrEqual(1e-9);
          expect(Math.abs(g[2] - h)).toBeLessThanOrEqual(1e-9);
        },
      ),
      { numRuns: 5000 },
    );
  });

  it("accepts a six-number state as position and refuses what has no geodetic coordinates", () => {
    expect(ok(earthFixedToGeodetic([7000, 0, 0, 1, 2, 3]))[0]).toBe(0);
    expectError(earthFixedToGeodetic([1, 2]), "bad_argument", "position");
    expectError(earthFixedToGeodetic([10, 0, 0]), "bad_argument", "position");
    expectError(geodeticToEarthFixed(91, 0, 0), "bad_argument", "latitude");
    expectError(geodeticToEarthFixed(0, Infinity, 0), "bad_argument", "longitude");
    expectError(geodeticToEarthFixed(0, 0, -7000), "bad_argument", "height");
  });
});
