import "../support/customFunctions";
import { describe, expect, it } from "vitest";
import { findBody } from "../../src/catalogue/lookup";
import type { Body } from "../../src/catalogue/types";
import { isDomainError } from "../../src/core/domain";
import * as geodesy from "../../src/core/geodesy";
import { launchAzimuth as coreAzimuth } from "../../src/core/launch";
import { equatorialRotationSpeed, surfaceRotationSpeed as coreSurface } from "../../src/core/surface";
import * as family from "../../src/functions/launch";
import { code, msg, only, sheet } from "./cells";

/** The family's functions as a test calls them: bare values stand for single cells. */
const { greatCircleCourse, greatCircleDistance, horizonRange, launchAzimuth, rhumbLineCourse, rhumbLineDistance, surfaceRotationSpeed } = sheet(family);

// Family "Launch and surface" at the sheet level: the core's numbers with the catalogue's radii
// and rotation periods, ranges lifting, overrides, and the errors a sheet sees.

const catalogue = (name: string): Body => {
  const b = findBody(name);
  if (isDomainError(b)) throw new Error(b.message);
  return b;
};
const EARTH = catalogue("Earth");
const MARS = catalogue("Mars");
const R_EQ = EARTH.equatorialRadius.value;
const R_MEAN = EARTH.meanRadius.value;
const SPIN = EARTH.rotationPeriod!.value;

describe("LAUNCH_AZIMUTH", () => {
  it("equals the core's inertial azimuth when no orbital speed is given, whatever the body", () => {
    for (const [lat, inc] of [[28.5, 51.6], [34.7, 97.4], [-5.2, 5.2], [45, 135]]) {
      const want = coreAzimuth(lat, inc);
      expect(only(launchAzimuth(lat, inc))).toBe(want);
      expect(only(launchAzimuth(lat, inc, "Mars"))).toBe(want);
      expect(only(launchAzimuth(lat, inc, null, null, true))).toBe(coreAzimuth(lat, inc, null, null, true));
    }
  });

  it("gives Molczan's 189.7 deg southbound, and 192.3 deg corrected for Earth's rotation from the catalogue", () => {
    // T. Molczan, SeeSat-L, 2 Apr 2012 (satobs.org/seesat/Apr-2012/0019.html), as in
    // test/core/launch.test.ts: 97.42 deg from 39.66 deg N, inertial 189.7 deg; SMAD 3rd ed. p. 154
    // eq. 6-42c rotation correction +2.7 deg -> 192.3 deg for a 500 km orbit (his site speed
    // 465.5 m/s at the equator; the catalogue's radius and sidereal day give 465.1 m/s). Orbital
    // speed: the circular speed at 500 km, sqrt(398600.4418 / 6878.137) km/s.
    expect((only(launchAzimuth(39.66, 97.42, null, null, true)) as number).toFixed(1)).toBe("189.7");
    const vOrb = Math.sqrt(398600.4418 / 6878.137);
    expect((only(launchAzimuth(39.66, 97.42, "Earth", vOrb, true)) as number).toFixed(1)).toBe("192.3");
  });

  it("corrects with the catalogue body's equatorial speed, Earth when the body is omitted", () => {
    const vEarth = equatorialRotationSpeed(R_EQ, SPIN);
    expect(only(launchAzimuth(28.5, 51.6, "Earth", 7.8))).toBe(coreAzimuth(28.5, 51.6, vEarth, 7.8));
    expect(only(launchAzimuth(28.5, 51.6, null, 7.8))).toBe(coreAzimuth(28.5, 51.6, vEarth, 7.8));
    const vMars = equatorialRotationSpeed(MARS.equatorialRadius.value, MARS.rotationPeriod!.value);
    expect(only(launchAzimuth(18.4, 25, "Mars", 3.4, true))).toBe(coreAzimuth(18.4, 25, vMars, 3.4, true));
  });

  it("lifts over a column of latitudes, one #N/A with the reason where the orbit never reaches the site", () => {
    const lats = [0, 20, 40, 51.6, 60];
    const out = launchAzimuth(lats.map((l) => [l]), 51.6, "Earth", 7.66);
    const vEarth = equatorialRotationSpeed(R_EQ, SPIN);
    lats.slice(0, 4).forEach((l, k) => expect(out[k][0]).toBe(coreAzimuth(l, 51.6, vEarth, 7.66)));
    expect(code(out[4][0])).toBe("#N/A");
    expect(msg(out[4][0])).toBe(
      "latitude: an orbit inclined 51.6 deg reaches only latitudes up to 51.6 deg, so a site at 60 deg cannot launch directly into it (a plane change is needed).",
    );
  });

  it("needs body_radius, then rotation_period, for a numeric body with an orbital speed", () => {
    expect(msg(only(launchAzimuth(28.5, 51.6, 398600, 7.8)))).toMatch(/^body_radius: .*required when body is given as a GM number\.$/);
    expect(msg(only(launchAzimuth(28.5, 51.6, 398600, 7.8, false, 6378)))).toMatch(/^rotation_period: .*required when body is given as a GM number\.$/);
    expect(only(launchAzimuth(28.5, 51.6, 398600, 7.8, false, 6378, 86164))).toBe(coreAzimuth(28.5, 51.6, equatorialRotationSpeed(6378, 86164), 7.8));
    // Without an orbital speed the body plays no part, so a bare GM needs nothing more.
    expect(only(launchAzimuth(28.5, 51.6, 398600))).toBe(coreAzimuth(28.5, 51.6));
  });

  it("names the argument for a bad body or flag", () => {
    expect(msg(only(launchAzimuth(28.5, 51.6, "Eatrh", 7.8)))).toMatch(/^body: got "Eatrh"/);
    expect(code(only(launchAzimuth(28.5, 51.6, "Earth", 7.8, "south")))).toBe("#VALUE!");
  });
});

describe("SURFACE_ROTATION_SPEED", () => {
  it("equals the core's with the catalogue's equatorial radius and sidereal rotation period, down a column", () => {
    const lats = [-90, -45, 0, 28.5, 34.7, 90];
    const out = surfaceRotationSpeed("Earth", lats.map((l) => [l]));
    expect(out.map((r) => r[0])).toEqual(lats.map((l) => coreSurface(R_EQ, SPIN, l)));
  });

  it("gives Braeunig's 1,471 km/h at Cape Canaveral with catalogue Earth", () => {
    // Braeunig, Rocket & Space Technology, "Orbital Mechanics" (Types of Orbits), as in
    // test/core/surface.test.ts: a due-east launch from 28.5 deg N gets 1,471 km/h (his R = 6378.14
    // km, sidereal day 86164.09 s; the catalogue's differ in the 7th digit).
    expect(Math.round((only(surfaceRotationSpeed("Earth", 28.5)) as number) * 3600)).toBe(1471);
  });

  it("is westward for Venus and takes overrides, required for a numeric body", () => {
    expect(only(surfaceRotationSpeed("Venus", 0)) as number).toBeLessThan(0);
    expect(msg(only(surfaceRotationSpeed(398600, 0)))).toMatch(/^body_radius: .*required when body is given as a GM number\.$/);
    expect(msg(only(surfaceRotationSpeed(398600, 0, 6378)))).toMatch(/^rotation_period: .*required when body is given as a GM number\.$/);
    expect(only(surfaceRotationSpeed(398600, 10, 6378, 86164))).toBe(coreSurface(6378, 86164, 10));
    expect(only(surfaceRotationSpeed("Earth", 10, null, 86400))).toBe(coreSurface(R_EQ, 86400, 10));
  });
});

describe("great circles and rhumb lines", () => {
  const lax = [33 + 57 / 60, -(118 + 24 / 60)];
  const jfk = [40 + 38 / 60, -(73 + 47 / 60)];

  it("measure on the catalogue's mean sphere and equal the core's", () => {
    const pts = [[34.7, -120.6, 64.9, -147.9], [0, 0, 0, 90], [-33.9, 151.2, 51.5, -0.1], [10, 179, 10, -179]];
    for (const [a, b, c, d] of pts) {
      expect(only(greatCircleDistance("Earth", a, b, c, d))).toBe(geodesy.greatCircleDistance(R_MEAN, a, b, c, d));
      expect(only(rhumbLineDistance("Earth", a, b, c, d))).toBe(geodesy.rhumbLineDistance(R_MEAN, a, b, c, d));
      expect(only(greatCircleCourse(a, b, c, d))).toBe(geodesy.greatCircleCourse(a, b, c, d));
      expect(only(rhumbLineCourse(a, b, c, d))).toBe(geodesy.rhumbLineCourse(a, b, c, d));
    }
    const mars = catalogue("Mars").meanRadius.value;
    expect(only(greatCircleDistance("Mars", 18.4, 77.5, -4.6, 137.4))).toBe(geodesy.greatCircleDistance(mars, 18.4, 77.5, -4.6, 137.4));
  });

  it("give the Aviation Formulary's LAX-JFK 2144 nm and 66 deg through the body_radius override", () => {
    // E. Williams, Aviation Formulary, "Worked examples" (as in test/core/geodesy.test.ts; its
    // longitudes are west-positive, ours east-positive): 2144 nm, initial course 1.150035 rad.
    // 1 nm = 1.852 km exactly and is one arcminute of great circle, so the sphere is 10800/pi nm.
    const radiusKm = ((180 * 60) / Math.PI) * 1.852;
    const km = only(greatCircleDistance(398600, lax[0], lax[1], jfk[0], jfk[1], radiusKm)) as number;
    expect(Math.round(km / 1.852)).toBe(2144);
    expect(((only(greatCircleCourse(lax[0], lax[1], jfk[0], jfk[1])) as number) * Math.PI / 180).toFixed(6)).toBe("1.150035");
  });

  it("lift a column of destinations, and never make the rhumb line shorter than the great circle", () => {
    const dest = [[40.6, -73.8], [51.5, -0.1], [-33.9, 151.2], [64.9, -147.9]];
    const gc = greatCircleDistance("Earth", 34.7, -120.6, dest.map((d) => [d[0]]), dest.map((d) => [d[1]]));
    const rl = rhumbLineDistance("Earth", 34.7, -120.6, dest.map((d) => [d[0]]), dest.map((d) => [d[1]]));
    expect(gc.length).toBe(4);
    dest.forEach(([la, lo], k) => {
      expect(gc[k][0]).toBe(geodesy.greatCircleDistance(R_MEAN, 34.7, -120.6, la, lo));
      expect(rl[k][0] as number).toBeGreaterThanOrEqual(gc[k][0] as number);
    });
  });

  it("need body_radius for a numeric body, and have no course between coincident points", () => {
    expect(msg(only(greatCircleDistance(398600, 0, 0, 1, 1)))).toMatch(/^body_radius: .*required when body is given as a GM number\.$/);
    expect(msg(only(rhumbLineDistance(398600, 0, 0, 1, 1)))).toMatch(/^body_radius: /);
    expect(only(rhumbLineDistance("Earth", 0, 0, 1, 1, 6378))).toBe(geodesy.rhumbLineDistance(6378, 0, 0, 1, 1));
    const none = only(greatCircleCourse(12, 34, 12, 34));
    expect(code(none)).toBe("#N/A");
    expect(msg(none)).toBe("lat2: the two points coincide, so there is no course between them.");
    expect(code(only(rhumbLineCourse(12, 34, 12, 34)))).toBe("#N/A");
    expect(msg(only(greatCircleDistance("Earth", 91, 0, 0, 0)))).toMatch(/^lat1: got 91;/);
  });
});

describe("HORIZON_RANGE", () => {
  it("uses the catalogue's equatorial radius and equals the core's, over a row of elevations", () => {
    const elev = [0, 5, 10, 30, 90];
    const out = horizonRange("Earth", 690, [elev]);
    expect(out).toEqual([elev.map((e) => geodesy.horizonRange(R_EQ, 690, e))]);
    expect(out[0][4]).toBeCloseTo(690, 9); // overhead, the range is the altitude
  });

  it("takes body_radius, required for a numeric body, and refuses an elevation below the horizon", () => {
    expect(only(horizonRange(398600, 690, 0, 6378))).toBe(geodesy.horizonRange(6378, 690, 0));
    expect(msg(only(horizonRange(398600, 690, 0)))).toMatch(/^body_radius: .*required when body is given as a GM number\.$/);
    expect(msg(only(horizonRange("Earth", 690, -1)))).toMatch(/^min_elevation: got -1;/);
  });
});
