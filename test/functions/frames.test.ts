import "../support/customFunctions";
import { describe, expect, it } from "vitest";
import * as family from "../../src/functions/frames";
import { code, msg, only, sheet } from "./cells";

const { earthFixedToGeodetic, earthFixedToInertial, geodeticToEarthFixed, inertialToEarthFixed, lookAngles, subsatellitePoint } = sheet(family);

// Family "Frames and ground sites" at the sheet level: the published worked examples through the
// worksheet functions (ISO dates, frame words, Earth orientation cells), header labels, lifting
// and errors in the cell.

/** Largest component difference. */
const gap = (a: readonly unknown[], b: readonly number[]) => Math.max(...b.map((x, i) => Math.abs((a[i] as number) - x)));

// Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013), Example 3-15:
// 2004-04-06 07:51:28.386009 UTC, dUT1 = -0.4399619 s, xp = -0.140682", yp = 0.333309"; the
// published ITRF, TEME and J2000 (FK5, without the IERS nutation corrections) vectors.
const WHEN = "2004-04-06T07:51:28.386009Z";
const EOP = [-0.4399619, -0.140682, 0.333309] as const;
const ITRF = [-1033.479383, 7901.2952754, 6380.3565958, -3.22563652, -2.87245145, 5.531924446];
const TEME = [5094.1801621, 6127.6446595, 6380.3445327, -4.746131487, 0.785818041, 5.531931288];
const J2000 = [5102.5096, 6123.01152, 6378.1363, -4.7432196, 0.7905366, 5.53375619];

describe("INERTIAL_TO_EARTH_FIXED and EARTH_FIXED_TO_INERTIAL", () => {
  it("reproduce Vallado 4th ed. Example 3-15 from the sheet: J2000 to the printed 0.1 m, TEME to 0.1 mm", () => {
    // The J2000 vector is printed to 0.1 m (and its velocity to 0.1 mm/s); the others to 0.1 mm.
    const toJ2000 = earthFixedToInertial([ITRF], WHEN, ...EOP)[0];
    expect(gap(toJ2000.slice(0, 3), J2000.slice(0, 3))).toBeLessThan(5e-5 + 1e-7);
    expect(gap(toJ2000.slice(3), J2000.slice(3))).toBeLessThan(5e-8 + 2e-8);
    const toTeme = earthFixedToInertial([ITRF], WHEN, ...EOP, "teme")[0];
    expect(gap(toTeme.slice(0, 3), TEME.slice(0, 3))).toBeLessThan(1e-7);
    const fromTeme = inertialToEarthFixed([TEME], WHEN, ...EOP, "TEME")[0];
    expect(gap(fromTeme.slice(0, 3), ITRF.slice(0, 3))).toBeLessThan(1e-7);
    // Vallado scales the rotation rate by the length of day (1.5563 ms); the reduction here does not: 1e-8 km/s.
    expect(gap(fromTeme.slice(3), ITRF.slice(3))).toBeLessThan(2e-8);
  });

  it("say how far blank Earth orientation moves the answer: dut1 0.44 s is 0.2 km at this radius, polar motion metres", () => {
    const full = inertialToEarthFixed([J2000], WHEN, ...EOP)[0];
    const noPole = inertialToEarthFixed([J2000], WHEN, EOP[0])[0];
    const none = inertialToEarthFixed([J2000], WHEN)[0];
    const d = (a: unknown[], b: unknown[]) => Math.hypot(...[0, 1, 2].map((k) => (a[k] as number) - (b[k] as number)));
    // Polar motion turns the frame by at most hypot(xp, yp) = 0.36 arcsec: 18 m at this 10 255 km radius.
    const turn = (Math.hypot(EOP[1], EOP[2]) / 3600) * (Math.PI / 180) * Math.hypot(J2000[0], J2000[1], J2000[2]);
    expect(d(full, noPole)).toBeGreaterThan(0.5 * turn);
    expect(d(full, noPole)).toBeLessThanOrEqual(turn * (1 + 1e-6));
    // 0.44 s of rotation at 7.3e-5 rad/s on the 7966 km distance from the axis: 0.26 km.
    expect(d(noPole, none)).toBeCloseTo(0.4399619 * 7.292115e-5 * Math.hypot(J2000[0], J2000[1]), 2);
  });

  it("label their columns and lift over a column of states with a column of dates", () => {
    const out = inertialToEarthFixed([J2000, J2000], [[WHEN], ["2004-04-07T07:51:28.386009Z"]], ...EOP, null, true);
    expect(out[0]).toEqual(["x (km)", "y (km)", "z (km)", "vx (km/s)", "vy (km/s)", "vz (km/s)"]);
    expect(out.length).toBe(3);
    expect(out[1]).toEqual(inertialToEarthFixed([J2000], WHEN, ...EOP)[0]);
    // A day later the Earth has turned 360.9856 deg: the Earth-fixed position has moved by about a degree of longitude.
    expect(out[2][0]).not.toBeCloseTo(out[1][0] as number, 0);
  });

  it("refuse a frame they do not know, and Earth orientation values out of range, naming the parameter", () => {
    expect(msg(inertialToEarthFixed([J2000], WHEN, null, null, null, "GCRF")[0][0])).toBe('frame: got "GCRF"; expected one of "J2000", "TEME".');
    expect(msg(inertialToEarthFixed([J2000], WHEN, 1.5)[0][0])).toMatch(/^dut1: /);
    expect(msg(earthFixedToInertial([ITRF], WHEN, 0, 3)[0][0])).toMatch(/^polar_x: /);
    expect(code(earthFixedToInertial([ITRF.slice(0, 5)], WHEN)[0][0])).toBe("#VALUE!");
  });
});

describe("GEODETIC_TO_EARTH_FIXED and EARTH_FIXED_TO_GEODETIC", () => {
  it("reproduce Vallado 4th ed. Example 3-3 (r = 6524.834, 6862.875, 6448.296 km: 34.352496 deg, 46.4464 deg, 5085.22 km)", () => {
    const [lat, lon, h] = earthFixedToGeodetic([[6524.834, 6862.875, 6448.296]])[0] as number[];
    expect(Math.abs(lat - 34.352496)).toBeLessThan(1e-6); // the book's iteration stops 1.7 units of its last digit short
    expect(Math.abs(lon - 46.4464)).toBeLessThan(5e-5);
    expect(Math.abs(h - 5085.22)).toBeLessThan(5e-3);
    // Back from the printed coordinates: within what their rounding allows (1e-6 deg is 0.2 m at this radius).
    expect(gap(geodeticToEarthFixed(34.352496, 46.4464, 5085.22)[0], [6524.834, 6862.875, 6448.296])).toBeLessThan(0.01);
  });

  it("put the poles and the equator on the WGS 84 ellipsoid (NIMA TR8350.2: a = 6378.137 km, b = 6356.7523142 km)", () => {
    expect(Math.abs((geodeticToEarthFixed(90, 0, 0)[0][2] as number) - 6356.7523142)).toBeLessThan(1e-7);
    expect(geodeticToEarthFixed(0, 0, 0)[0]).toEqual([6378.137, 0, 0]);
    expect(earthFixedToGeodetic([[0, 0, -6356.7523142 - 10]])[0]).toEqual([-90, 0, expect.closeTo(10, 6)]);
  });

  it("place the invented Skerry Ground station (58.21 N, 6.39 W, 0.05 km) and read it back to 1e-12 deg", () => {
    const r = geodeticToEarthFixed(58.21, -6.39, 0.05, true);
    expect(r[0]).toEqual(["x (km)", "y (km)", "z (km)"]);
    const back = earthFixedToGeodetic([r[1]], true);
    expect(back[0]).toEqual(["latitude (deg)", "longitude (deg)", "height (km)"]);
    expect(gap(back[1], [58.21, -6.39, 0.05])).toBeLessThan(1e-12);
  });

  it("refuse what has no answer, naming the parameter", () => {
    expect(msg(geodeticToEarthFixed(91, 0, 0)[0][0])).toMatch(/^latitude: /);
    expect(msg(earthFixedToGeodetic([[10, 0, 0]])[0][0])).toMatch(/^position: got 10; expected a position at least 100 km from the Earth's centre/);
  });
});

describe("LOOK_ANGLES and SUBSATELLITE_POINT", () => {
  it("reproduce Vallado 4th ed. Example 4-1: range 11710.812 km, azimuth 210.8777747 deg, elevation -5.9409535 deg, range rate 6.0842826 km/s", () => {
    // Site 39.007 deg N, 104.883 deg W, 2194.56 m; 1994-05-14 13:11:20.59856 UTC; the example's ECI
    // state. The sheet gives no Earth orientation here (as the example's own result needs none to
    // a metre of range): azimuth within 1e-6 deg, elevation within 5e-6 deg, range rate 5e-7 km/s.
    const state = [5036.736529, -10806.660797, -4534.633784, 2.6843855, -5.759592, -2.4168093];
    const [az, el, range, rate] = lookAngles(39.007, -104.883, 2.19456, [state], "1994-05-14T13:11:20.59856Z")[0] as number[];
    expect(Math.abs(range - 11710.812)).toBeLessThan(5e-4);
    expect(Math.abs(az - 210.8777747)).toBeLessThan(1e-6);
    expect(Math.abs(el - -5.9409535)).toBeLessThan(5e-6);
    expect(Math.abs(rate - 6.0842826)).toBeLessThan(5e-7);
  });

  it("agree with the frame functions: the sub-satellite point is the geodetic point of the Earth-fixed state", () => {
    const itrf = inertialToEarthFixed([J2000], WHEN)[0];
    const geodetic = earthFixedToGeodetic([itrf.slice(0, 3)])[0];
    expect(subsatellitePoint([J2000], WHEN)[0]).toEqual(geodetic);
    expect(subsatellitePoint([itrf], WHEN, "ITRF")[0]).toEqual(geodetic);
    // Seen from the sub-satellite point itself the satellite is straight overhead.
    const [lat, lon] = geodetic as number[];
    expect(lookAngles(lat, lon, 0, [J2000], WHEN)[0][1]).toBeCloseTo(90, 7);
  });

  it("label their columns and refuse a site out of range", () => {
    expect(lookAngles(58.21, -6.39, 0.05, [J2000], WHEN, null, true)[0]).toEqual(["azimuth (deg)", "elevation (deg)", "slant range (km)", "range rate (km/s)"]);
    expect(subsatellitePoint([J2000], WHEN, "J2000", true)[0]).toEqual(["latitude (deg)", "longitude (deg)", "altitude (km)"]);
    expect(msg(lookAngles(58.21, -6.39, 500, [J2000], WHEN)[0][0])).toMatch(/^site_height: /);
    expect(msg(subsatellitePoint([J2000], WHEN, "ECEF")[0][0])).toBe('frame: got "ECEF"; expected one of "J2000", "TEME", "ITRF".');
    expect(code(only(lookAngles(58.21, -6.39, 0.05, [J2000], "never")[0].slice(0, 1).map((c) => [c])))).toBe("#VALUE!");
  });
});
