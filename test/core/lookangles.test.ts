import { describe, expect, it } from "vitest";
import { geodeticToEarthFixed } from "../../src/core/geodetic";
import { julianDateFromCalendar } from "../../src/core/julian";
import { lookAngles, subsatellitePoint } from "../../src/core/lookangles";
import { err, expectError, ok } from "../support/expect";

describe("look angles", () => {
  it("gives Vallado 4th ed. Example 4-1 (range, azimuth, elevation from a site)", () => {
    // Site 39.007 deg N, 104.883 deg W, 2194.56 m; 1994-05-14 13:11:20.59856 UTC; the satellite's
    // ECI state 5036.736529, -10806.660797, -4534.633784 km, 2.6843855, -5.759592, -2.4168093 km/s.
    // Published: range 11710.812 km, azimuth 210.8777747 deg, elevation -5.9409535 deg, range rate
    // 6.0842826 km/s. With no Earth orientation parameters (as the worksheet function works) the
    // result agrees to the printed metre in range; azimuth within 1e-6 deg, elevation within
    // 5e-6 deg (0.9 m across the 11 711 km range) and range rate within 5e-7 km/s.
    const jd = julianDateFromCalendar(1994, 5, 14, 13, 11, 20.59856);
    const [az, el, range, rate] = ok(lookAngles(39.007, -104.883, 2.19456, [5036.736529, -10806.660797, -4534.633784, 2.6843855, -5.759592, -2.4168093], jd));
    expect(Math.abs(range - 11710.812)).toBeLessThan(5e-4);
    expect(Math.abs(az - 210.8777747)).toBeLessThan(1e-6);
    expect(Math.abs(el - -5.9409535)).toBeLessThan(5e-6);
    expect(Math.abs(rate - 6.0842826)).toBeLessThan(5e-7);
  });

  it("sees a point straight above the site at 90 deg, at the height difference, and its sub-point under it", () => {
    const r = ok(geodeticToEarthFixed(57.3, -6.2, 500.03));
    const [, el, range, rate] = ok(lookAngles(57.3, -6.2, 0.03, [...r, 0, 0, 0], 2460000.5, "ITRF"));
    expect(el).toBeCloseTo(90, 9);
    expect(range).toBeCloseTo(500, 9);
    expect(rate).toBe(0);
    const sub = ok(subsatellitePoint([...r, 0, 0, 0], 2460000.5, "itrf"));
    expect(sub[0]).toBeCloseTo(57.3, 10);
    expect(sub[1]).toBeCloseTo(-6.2, 10);
    expect(sub[2]).toBeCloseTo(500.03, 9);
  });

  it("gives north 0, east 90 deg for points north and east of the site on its horizon plane", () => {
    const site = ok(geodeticToEarthFixed(0, 0, 0));
    expect(ok(lookAngles(0, 0, 0, [site[0], 0, 100, 0, 0, 0], 2460000.5, "ITRF"))[0]).toBe(0);
    expect(ok(lookAngles(0, 0, 0, [site[0], 100, 0, 0, 0, 0], 2460000.5, "ITRF"))[0]).toBeCloseTo(90, 12);
  });

  it("refuses bad arguments, naming the parameter", () => {
    const s = [7000, 0, 0, 0, 7.5, 0];
    expectError(lookAngles(91, 0, 0, s, 2460000.5), "bad_argument", "site_latitude");
    expectError(lookAngles(0, NaN, 0, s, 2460000.5), "bad_argument", "site_longitude");
    expectError(lookAngles(0, 0, 200, s, 2460000.5), "bad_argument", "site_height");
    expectError(lookAngles(0, 0, 0, [1, 2, 3], 2460000.5), "bad_argument", "state");
    expect(err(lookAngles(0, 0, 0, s, 2460000.5, "ECEF")).message).toMatch(/^frame: got "ECEF"/);
    expectError(subsatellitePoint(s, NaN), "bad_argument", "date");
  });
});
