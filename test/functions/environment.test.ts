import "../support/customFunctions";
import { describe, expect, it } from "vitest";
import { findBody } from "../../src/catalogue/lookup";
import type { Body } from "../../src/catalogue/types";
import { isDomainError } from "../../src/core/domain";
import { betaAngle as coreBeta } from "../../src/core/betaangle";
import { eclipseDuration as coreEclipse } from "../../src/core/eclipse";
import * as core from "../../src/core/j2";
import * as family from "../../src/functions/environment";
import { code, msg, only, sheet } from "./cells";

/** The family's functions as a test calls them: bare values stand for single cells. */
const { apsidalPrecession, betaAngle, eclipseDuration, nodalPrecession, repeatTrackSma, sunSyncInclination } = sheet(family);

// Family "J2 and environment" at the sheet level: the worksheet functions called from source give
// the core's numbers with the catalogue's constants, lift over ranges, take their overrides, and
// turn a numeric body without them into #VALUE! naming the missing override.

const catalogue = (name: string): Body => {
  const b = findBody(name);
  if (isDomainError(b)) throw new Error(b.message);
  return b;
};
const EARTH = catalogue("Earth");
const gm = EARTH.gm.value;
const rJ2 = EARTH.j2ReferenceRadius!.value; // J2's own reference radius (EGM2008), not the equatorial radius
const j2 = EARTH.j2!.value;
const year = EARTH.orbit!.period.value;
const spin = EARTH.rotationPeriod!.value;

describe("NODAL_PRECESSION and APSIDAL_PRECESSION", () => {
  it("equal the core's rates with the catalogue's GM, J2 and J2 reference radius", () => {
    for (const [a, e, i] of [[7068.137, 0.001, 98.15], [6778, 0, 51.6], [26560, 0.7, 63.4], [42164, 0, 0.1]]) {
      expect(only(nodalPrecession("Earth", a, e, i))).toBe(core.nodalPrecession(gm, rJ2, j2, a, e, i));
      expect(only(apsidalPrecession("earth", a, e, i))).toBe(core.apsidalPrecession(gm, rJ2, j2, a, e, i));
    }
  });

  it("lift an altitude sweep: ten sma values down a column in one call", () => {
    const smas = Array.from({ length: 10 }, (_, k) => 6378.1366 + 400 + 50 * k);
    const out = nodalPrecession("Earth", smas.map((a) => [a]), 0, 98);
    expect(out.length).toBe(10);
    out.forEach((r, k) => expect(r).toEqual([core.nodalPrecession(gm, rJ2, j2, smas[k], 0, 98)]));
    // The drift weakens with height (|rate| ~ a^-3.5).
    for (let k = 1; k < 10; k++) expect(Math.abs(out[k][0] as number)).toBeLessThan(Math.abs(out[k - 1][0] as number));
    // ... and a row of inclinations crosses the column into a table.
    const table = apsidalPrecession("Earth", smas.map((a) => [a]), 0.01, [[30, 63.43, 98]]);
    expect(table.length).toBe(10);
    expect(table[3]).toEqual([30, 63.43, 98].map((i) => core.apsidalPrecession(gm, rJ2, j2, smas[3], 0.01, i)));
  });

  it("reproduce Curtis's J2 example with the book's constants given as overrides", () => {
    // Curtis, Orbital Mechanics for Engineering Students, 2nd ed., the J2 worked example of §4.7
    // (280 km x 400 km at 51.43 deg; mu = 398600, R = 6378, J2 = 0.00108263). Printed answers from
    // memory (as in test/core/j2.test.ts): node -5.181 deg/day, perigee +3.920 deg/day.
    const rp = 6378 + 280;
    const ra = 6378 + 400;
    const a = (rp + ra) / 2;
    const e = (ra - rp) / (ra + rp);
    expect((only(nodalPrecession(398600, a, e, 51.43, 6378, 0.00108263)) as number).toFixed(3)).toBe("-5.181");
    expect((only(apsidalPrecession(398600, a, e, 51.43, 6378, 0.00108263)) as number).toFixed(3)).toBe("3.920");
  });

  it("let overrides replace catalogue values one at a time", () => {
    expect(only(nodalPrecession("Earth", 7000, 0, 50, 6378, null))).toBe(core.nodalPrecession(gm, 6378, j2, 7000, 0, 50));
    expect(only(nodalPrecession("Earth", 7000, 0, 50, null, 1.1e-3))).toBe(core.nodalPrecession(gm, rJ2, 1.1e-3, 7000, 0, 50));
    expect(only(nodalPrecession("Earth", 7000, 0, 50, [[null]], [[null]]))).toBe(core.nodalPrecession(gm, rJ2, j2, 7000, 0, 50));
  });

  it("are #VALUE! naming body_radius, then j2, for a numeric body without them", () => {
    const noRadius = only(nodalPrecession(398600.4418, 7000, 0, 50));
    expect(code(noRadius)).toBe("#VALUE!");
    expect(msg(noRadius)).toMatch(/^body_radius: got \(blank\); expected a body radius in km: required when body is given as a GM number\.$/);
    const noJ2 = only(apsidalPrecession(398600.4418, 7000, 0, 50, 6378.137));
    expect(code(noJ2)).toBe("#VALUE!");
    expect(msg(noJ2)).toMatch(/^j2: .*required when body is given as a GM number\.$/);
    expect(only(nodalPrecession(398600.4418, 7000, 0, 50, 6378.137, 1.08263e-3))).toBe(core.nodalPrecession(398600.4418, 6378.137, 1.08263e-3, 7000, 0, 50));
  });

  it("refuse an altitude given as sma, one cell of a range at a time", () => {
    const out = nodalPrecession("Earth", [[690], [7068.137]], 0, 98);
    expect(code(out[0][0])).toBe("#VALUE!");
    expect(msg(out[0][0])).toBe("sma: got 690 km, inside Earth (radius 6378.1366 km), so the orbit would pass through the body. A semi-major axis is from the centre: an orbit at 690 km altitude has an sma of 7068.1366 km; ALTITUDE_TO_RADIUS converts.");
    expect(typeof out[1][0]).toBe("number");
  });

  it("say when the catalogue has no J2 for the body", () => {
    const phobos = only(nodalPrecession("Phobos", 30, 0, 10));
    expect(code(phobos)).toBe("#VALUE!");
    expect(msg(phobos)).toBe("j2: got (blank); expected a J2 value (dimensionless): the catalogue has none for Phobos, so give it.");
  });
});

describe("SUN_SYNC_INCLINATION", () => {
  it("equals the core's with the catalogue's constants and Earth's sidereal year", () => {
    for (const [a, e] of [[7068.137, 0.001], [6878, 0], [7500, 0.1]])
      expect(only(sunSyncInclination("Earth", a, e))).toBe(core.sunSyncInclination(gm, rJ2, j2, a, e, year));
  });

  it("gives about 98.6 deg at 800 km with catalogue Earth (Vallado 4th ed., Example 11-2)", () => {
    // Vallado, Fundamentals of Astrodynamics and Applications, 4th ed., Example 11-2, a circular
    // 800 km orbit: 98.627 deg as its companion code ex11_2.m carries it on (public copy:
    // Posnet/Vallado, matlab/ex11_2.m; see test/core/j2.test.ts). The catalogue's constants (DE440
    // GM, EGM2008 J2, the sidereal year) and the book's year of 365.2421897 sidereal days differ,
    // which moves the answer by about 0.025 deg, so this check is at one decimal; the next test
    // passes the book's own constants and compares all three.
    expect((only(sunSyncInclination("Earth", EARTH.equatorialRadius.value + 800, 0)) as number).toFixed(1)).toBe("98.6");
  });

  it("reproduces Vallado's 98.627 deg with the book's constants as overrides", () => {
    // ex11_2.m (public copy: Posnet/Vallado, matlab/ex11_2.m): re = 6378.1363 km,
    // mu = 398600.4415, J2 = 0.00108263, node rate 360/365.2421897 deg per 86164.0989036973 s.
    const T = 365.2421897 * 86164.0989036973;
    expect((only(sunSyncInclination(398600.4415, 7178.1363, 0, 6378.1363, 0.00108263, T)) as number).toFixed(3)).toBe("98.627");
  });

  it("reproduces Curtis's 100-minute sun-synchronous orbit, 98.43 deg", () => {
    // Curtis, 2nd ed., §4.7 sun-synchronous example (mu = 398600, R = 6378, J2 = 0.00108263, node
    // rate 1.991e-7 rad/s); printed answer from memory: 98.43 deg.
    const r = Math.cbrt(398600 * (6000 / (2 * Math.PI)) ** 2);
    expect((only(sunSyncInclination(398600, r, 0, 6378, 0.00108263, (2 * Math.PI) / 1.991e-7)) as number).toFixed(2)).toBe("98.43");
  });

  it("takes a moon's year from its planet: the Moon keeps pace with Earth's orbit about the Sun", () => {
    const moon = catalogue("Moon");
    const radius = moon.j2ReferenceRadius?.value ?? moon.equatorialRadius.value;
    const out = only(sunSyncInclination("Moon", 1900, 0));
    expect(out).toEqual(core.sunSyncInclination(moon.gm.value, radius, moon.j2!.value, 1900, 0, year));
  });

  it("puts the node on the Sun's pace: NODAL_PRECESSION at that inclination is 360 deg per year", () => {
    const sweep = [[6978], [7178], [7378]];
    const inc = sunSyncInclination("Earth", sweep, 0);
    const rate = nodalPrecession("Earth", sweep, 0, inc);
    for (const r of rate) expect((r[0] as number) / (360 / (year / 86400))).toBeCloseTo(1, 12);
  });

  it("is #N/A above the highest sun-synchronous orbit, and #VALUE! naming each missing override in order", () => {
    const high = only(sunSyncInclination("Earth", 13000, 0));
    expect(code(high)).toBe("#N/A");
    expect(msg(high)).toMatch(/^sma: the orbit is too high for a sun-synchronous plane/);
    expect(msg(only(sunSyncInclination(398600, 7000, 0)))).toMatch(/^body_radius: /);
    expect(msg(only(sunSyncInclination(398600, 7000, 0, 6378)))).toMatch(/^j2: /);
    const noYear = only(sunSyncInclination(398600, 7000, 0, 6378, 1.08e-3));
    expect(code(noYear)).toBe("#VALUE!");
    expect(msg(noYear)).toMatch(/^body_orbital_period: .*required when body is given as a GM number\.$/);
  });
});

describe("REPEAT_TRACK_SMA", () => {
  it("equals the core's with the catalogue's constants and Earth's sidereal rotation period", () => {
    for (const [k, d, e, i] of [[175, 12, 0.001, 98.15], [15, 1, 0, 51.6], [233, 16, 0.001, 98.2]])
      expect(only(repeatTrackSma("Earth", k, d, e, i))).toBe(core.repeatTrackSma(gm, rJ2, j2, spin, k, d, e, i));
  });

  it("lands within a kilometre of Landsat's published repeat orbit with catalogue Earth", () => {
    // Landsat 7/8 (WRS-2): 233 orbits in 16 days at 98.2 deg, sma 7077.7 km (from memory, as in
    // test/core/j2.test.ts); first-order J2 claims about a kilometre.
    expect(Math.abs((only(repeatTrackSma("Earth", 233, 16, 0.001, 98.2)) as number) - 7077.7)).toBeLessThan(1);
  });

  it("lifts over a column of repeat cycles", () => {
    const out = repeatTrackSma("Earth", [[14], [29], [44]], [[1], [2], [3]], 0, 98);
    expect(out.map((r) => r[0])).toEqual([[14, 1], [29, 2], [44, 3]].map(([k, d]) => core.repeatTrackSma(gm, rJ2, j2, spin, k, d, 0, 98)));
  });

  it("takes the rotation period as the third override, after body_radius and j2", () => {
    const out = only(repeatTrackSma(398600.4418, 15, 1, 0, 51.6, 6378.137, 1.08263e-3, 86164.0905));
    expect(out).toBe(core.repeatTrackSma(398600.4418, 6378.137, 1.08263e-3, 86164.0905, 15, 1, 0, 51.6));
    const missing = only(repeatTrackSma(398600.4418, 15, 1, 0, 51.6, 6378.137, 1.08263e-3));
    expect(code(missing)).toBe("#VALUE!");
    expect(msg(missing)).toMatch(/^rotation_period: .*required when body is given as a GM number\.$/);
    expect(msg(only(repeatTrackSma(398600.4418, 15, 1, 0, 51.6)))).toMatch(/^body_radius: /);
  });

  it("is #N/A with the reason when the orbit would lie inside the body, #VALUE! for fractional counts", () => {
    const low = only(repeatTrackSma("Earth", 18, 1, 0, 50));
    expect(code(low)).toBe("#N/A");
    expect(msg(low)).toMatch(/^revolutions: .*inside the body/);
    expect(code(only(repeatTrackSma("Earth", 14.5, 1, 0, 98)))).toBe("#VALUE!");
  });
});

describe("ECLIPSE_DURATION", () => {
  const R = EARTH.equatorialRadius.value;
  it("equals the core's with the catalogue's equatorial radius and GM, and lifts over beta angles", () => {
    const betas = [0, 10, 20, 40, 60, 70];
    const out = eclipseDuration("Earth", 7068.137, betas.map((b) => [b]));
    expect(out.map((r) => r[0])).toEqual(betas.map((b) => coreEclipse(R, gm, 7068.137, b)));
    // 690 km: the shadow ends at beta* = asin(R / r), about 64.5 deg.
    expect(out[5][0]).toBe(0);
  });

  it("gives Lofstrom's 2868 s through the overrides", () => {
    // server-sky.com "Earth Eclipse of Server Sky Arrays" (K. Lofstrom): R = 6371 km, a 12,789 km
    // equatorial orbit of period 17,280 s, 17280 x asin(6371 / 12789) / 180 deg = 2868 s at beta 0.
    // The GM is chosen to give that period at that radius.
    const mu = (4 * Math.PI * Math.PI * 12789 ** 3) / 17280 ** 2;
    expect(Math.round(only(eclipseDuration(mu, 12789, 0, 6371)) as number)).toBe(2868);
  });

  it("is #VALUE! naming body_radius for a numeric body, and refuses an altitude given as radius", () => {
    const out = only(eclipseDuration(398600.4418, 7000, 0));
    expect(code(out)).toBe("#VALUE!");
    expect(msg(out)).toMatch(/^body_radius: .*required when body is given as a GM number\.$/);
    expect(msg(only(eclipseDuration("Earth", 690, 0)))).toMatch(/^radius: got 690 km, inside Earth \(radius 6378.1366 km\)\. Radii are from the centre: an altitude of 690 km is a radius of 7068.1366 km/);
  });
});

describe("BETA_ANGLE", () => {
  it("equals the core's, and lifts over a column of dates", () => {
    const dates = [46388.5, 46419.5, 46447.5, 46478.5];
    const out = betaAngle(98.15, 292.5, dates.map((d) => [d]));
    expect(out.map((r) => r[0])).toEqual(dates.map((d) => coreBeta(98.15, 292.5, d + 2415018.5))); // serial to Julian date (src/core/time.ts)
  });

  it("sees the Sun face-on to a dawn-dusk polar orbit at the March equinox", () => {
    // Equinox instant 2024-03-20 03:06 UTC from astronomy-engine 2.1.19 Seasons(2024) (as in
    // test/core/betaangle.test.ts): the Sun is at RA 0, on the normal of a polar orbit with RAAN 90.
    expect(only(betaAngle(90, 90, 45371.13))).toBeCloseTo(90, 1);
  });

  it("is #VALUE! for a date outside the solar formula's 1800-2200 window (a Julian date typed as a serial) or an inclination beyond 180", () => {
    expect(msg(only(betaAngle(98, 0, 2461000)))).toMatch(/^date: got a date in the year 8637 \(Julian date 4876018.5\); expected a date from 1800-01-01 up to 2200-01-01/);
    expect(only(betaAngle(98, 0, "2027-03-20T06:00Z"))).toBe(only(betaAngle(98, 0, 46466.25)));
    expect(msg(only(betaAngle(181, 0, 46388)))).toMatch(/^inc: /);
  });
});
