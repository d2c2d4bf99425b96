import * as Astronomy from "astronomy-engine";
import Decimal from "decimal.js";
import { describe, expect, it } from "vitest";
import { isDomainError } from "../../src/core/domain";
import { planetIndex, planetState, planetStateKernel, usesTable1 } from "../../src/core/ephemeris";
import { AU_KM, PUBLISHED_ERRORS, STANDISH_BODIES, TABLE_1, TABLE_1_END_JD, TABLE_1_FIRST_JD, TABLE_2, TABLE_2_FIRST_JD, TABLE_2_LAST_JD, type ElementRow } from "../../src/core/ephemerisdata";

const EXCEL_TO_JD = 2415018.5;
const ARCSEC = Math.PI / 180 / 3600;
const state = (index: number, jd: number): number[] => {
  const out = [0, 0, 0, 0, 0, 0];
  planetStateKernel(index, jd, out);
  return out;
};
const dist = (a: readonly number[], b: readonly number[]) => Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
const evenly = (lo: number, hi: number, n: number) => Array.from({ length: n }, (_, k) => lo + ((hi - lo) * (k + 0.5)) / n);

// ---------------------------------------------------------------------------------------------
// 40-digit recomputation of the document's recipe (Standish, "Keplerian Elements for Approximate
// Positions of the Major Planets", JPL SSD): elements at T, M = L - varpi (+ Table 2b terms),
// omega = varpi - Omega, Kepler's equation by Newton's method in decimal, and the document's
// rotation x_ecl = (cos w cos O - sin w sin O cos I) x' + (-sin w cos O - cos w sin O cos I) y', ...
// A different route from the float64 code (no Markley starter, no perifocal-vector algebra).
const D = Decimal.clone({ precision: 40 });
const PI = D.acos(-1);
const rad = (deg: Decimal) => deg.mul(PI).div(180);
/** The double's own binary value (not its shortest decimal string, which differs by up to half an ulp of the date). */
const exactJd = (jd: number) => new D(jd.toPrecision(40));

function referencePosition(row: ElementRow, jd: Decimal): Decimal[] {
  const t = jd.minus(2451545).div(36525);
  const el = row.at.map((v, k) => new D(v).plus(new D(row.rate[k]).mul(t)));
  const [a, e, inc, L, varpi, node] = el;
  let M = L.minus(varpi);
  if (row.b !== undefined) {
    M = M.plus(new D(row.b).mul(t).mul(t));
    if (row.f !== undefined) {
      const ft = rad(new D(row.f).mul(t));
      M = M.plus(new D(row.c!).mul(ft.cos())).plus(new D(row.s!).mul(ft.sin()));
    }
  }
  M = rad(M.mod(360));
  let E = M.plus(e.mul(M.sin()));
  for (let k = 0; k < 60; k++) {
    const dE = E.minus(e.mul(E.sin())).minus(M).div(new D(1).minus(e.mul(E.cos())));
    E = E.minus(dE);
    if (dE.abs().lt("1e-38")) break;
  }
  const xp = a.mul(E.cos().minus(e));
  const yp = a.mul(new D(1).minus(e.mul(e)).sqrt()).mul(E.sin());
  const w = rad(varpi.minus(node));
  const O = rad(node);
  const I = rad(inc);
  const [cw, sw, cO, sO, cI, sI] = [w.cos(), w.sin(), O.cos(), O.sin(), I.cos(), I.sin()];
  const x = cw.mul(cO).minus(sw.mul(sO).mul(cI)).mul(xp).plus(sw.neg().mul(cO).minus(cw.mul(sO).mul(cI)).mul(yp));
  const y = cw.mul(sO).plus(sw.mul(cO).mul(cI)).mul(xp).plus(sw.neg().mul(sO).plus(cw.mul(cO).mul(cI)).mul(yp));
  const z = sw.mul(sI).mul(xp).plus(cw.mul(sI).mul(yp));
  return [x, y, z].map((c) => c.mul(AU_KM));
}

describe("planetState reproduces the document's recipe (40-digit decimal.js recomputation)", () => {
  // Dates: inside Table 1, and for Table 2 before 1800 and after 2050 out to the span's ends.
  const dates = [2451545, 2378496.5 + 1, 2415020.3, 2461771.5, 2470172.5 - 0.5, 625673.5 + 3, 1000000.25, 2086302.5, 2470172.5, 2600000.75, 2817152.5];
  it("positions agree to float64 rounding of the mean longitude (about 1e-15 of L, in rad, relative)", () => {
    for (const jd of dates)
      for (let i = 0; i < 9; i++) {
        const row = usesTable1(jd) ? TABLE_1[i] : TABLE_2[i];
        const ref = referencePosition(row, exactJd(jd));
        const got = state(i, jd);
        const r = Math.hypot(got[0], got[1], got[2]);
        // float64 carries L (up to 7.5e6 deg at the span's ends) to one ulp, 2e-16 relative.
        const lRad = Math.abs(row.at[3] + (row.rate[3] * (jd - 2451545)) / 36525) * (Math.PI / 180);
        const tol = 1e-14 + 4e-16 * lRad;
        const err = Math.hypot(got[0] - ref[0].toNumber(), got[1] - ref[1].toNumber(), got[2] - ref[2].toNumber()) / r;
        expect(err, `${STANDISH_BODIES[i]} at JD ${jd}`).toBeLessThan(tol);
      }
  });

  it("velocities are the time derivative of that model (40-digit central difference, h = 1e-4 day)", () => {
    const h = new D("1e-4");
    for (const jd of [2451545.3, 2461771.5, 1500000.5, 2700000.5])
      for (let i = 0; i < 9; i++) {
        const row = usesTable1(jd) ? TABLE_1[i] : TABLE_2[i];
        const plus = referencePosition(row, exactJd(jd).plus(h));
        const minus = referencePosition(row, exactJd(jd).minus(h));
        const ref = plus.map((p, k) => p.minus(minus[k]).div(h.mul(2 * 86400)).toNumber());
        const got = state(i, jd).slice(3);
        // Truncation error h^2/6 |r'''| is below 1e-12 relative for Mercury, the fastest.
        expect(dist(got, ref) / Math.hypot(...ref), `${STANDISH_BODIES[i]} at JD ${jd}`).toBeLessThan(1e-10);
      }
  });
});

// ---------------------------------------------------------------------------------------------
// Against astronomy-engine 2.1.19 (MIT; VSOP87-based, its README states ±1 arcminute), rotated from
// its J2000 equator (EQJ) to the J2000 ecliptic with its own Rotation_EQJ_ECL, taken at the same
// TT/TDB instant (AstroTime.FromTerrestrialTime), so no UTC-TT model enters.
const BODIES = [
  Astronomy.Body.Mercury,
  Astronomy.Body.Venus,
  Astronomy.Body.EMB,
  Astronomy.Body.Mars,
  Astronomy.Body.Jupiter,
  Astronomy.Body.Saturn,
  Astronomy.Body.Uranus,
  Astronomy.Body.Neptune,
  Astronomy.Body.Pluto,
];
const EQJ_TO_ECL = Astronomy.Rotation_EQJ_ECL();
const toEcliptic = (x: number, y: number, z: number, t: Astronomy.AstroTime, scale: number) => {
  const v = Astronomy.RotateVector(EQJ_TO_ECL, new Astronomy.Vector(x, y, z, t));
  return [v.x * scale, v.y * scale, v.z * scale];
};
function reference(index: number, jd: number): { helio: number[]; helioVel: number[]; sunFromBarycentre: number } {
  const t = Astronomy.AstroTime.FromTerrestrialTime(jd - 2451545);
  const s = Astronomy.HelioState(BODIES[index], t);
  const sun = Astronomy.BaryState(Astronomy.Body.Sun, t);
  return {
    helio: toEcliptic(s.x, s.y, s.z, t, AU_KM),
    helioVel: toEcliptic(s.vx, s.vy, s.vz, t, AU_KM / 86400),
    sunFromBarycentre: Math.hypot(sun.x, sun.y, sun.z) * AU_KM,
  };
}

/**
 * The published approximate errors (JPL SSD "Approximate Positions of the Planets": heliocentric
 * longitude and latitude in arcsec, distance in 1000 km; the page calls them nominal errors)
 * combined into one position error in km at the planet's distance r.
 */
const publishedPositionError = (index: number, jd: number, r: number) => {
  const [lon, lat, dist1000] = usesTable1(jd) ? PUBLISHED_ERRORS[index].table1 : PUBLISHED_ERRORS[index].table2;
  return Math.hypot(r * lon * ARCSEC, r * lat * ARCSEC, dist1000 * 1000);
};

/** RMS over the dates of the position error, and of the published error, in km. */
function rmsErrors(index: number, jds: number[], extra?: (ref: ReturnType<typeof reference>) => number) {
  let err2 = 0;
  let pub2 = 0;
  for (const jd of jds) {
    const got = state(index, jd);
    const ref = reference(index, jd);
    const allowance = publishedPositionError(index, jd, Math.hypot(got[0], got[1], got[2])) + (extra ? extra(ref) : 0);
    err2 += dist(got, ref.helio) ** 2;
    pub2 += allowance ** 2;
  }
  return { rms: Math.sqrt(err2 / jds.length), published: Math.sqrt(pub2 / jds.length) };
}

describe("planetState against astronomy-engine 2.1.19, within the published errors", () => {
  // The published figures are nominal, not worst-case (the worst single date is up to about twice
  // them), so the check is on the RMS over many evenly spread dates; one bad date in 2,500 that
  // was off by 50 times the figure would still fail it.
  const table1Dates = evenly(TABLE_1_FIRST_JD, TABLE_1_END_JD, 2500);

  for (const index of [0, 1, 2, 3, 4, 5, 6])
    it(`${STANDISH_BODIES[index]}, Table 1, 2,500 dates 1800-2050: RMS position error within the published figures`, () => {
      const { rms, published } = rmsErrors(index, table1Dates);
      expect(rms).toBeLessThan(published);
    });

  for (const index of [7, 8])
    it(`${STANDISH_BODIES[index]}, Table 1, 1800-2050: within the published figures plus the Sun's offset from the barycentre`, () => {
      // Measured: Neptune's and Pluto's elements track their motion about the solar-system
      // barycentre better than the heliocentric one (against astronomy-engine's barycentric
      // positions the RMS error is 0.75 of the published figure for Neptune, 1.2 for Pluto), and
      // heliocentric positions differ from barycentric ones by the Sun's offset, up to ~1.5
      // million km. Heliocentric RMS errors are ~3x the published figures (0.97 and 0.94 million
      // km); the allowance adds that offset, taken from the library at each date.
      const { rms, published } = rmsErrors(index, table1Dates, (ref) => ref.sunFromBarycentre);
      expect(rms).toBeLessThan(published);
      expect(rms).toBeGreaterThan(rmsErrors(index, table1Dates).published); // the offset is needed: this is not vacuous
    });

  it("every planet, Table 2, 1500-1800 and 2051-2500: RMS position error within the Table 2 figures", () => {
    // Outside these years astronomy-engine's own series drift faster than the tables' errors
    // (Mercury's orbital plane already disagrees by 9" at 1800 while Tables 1 and 2 agree with
    // each other to 1.5"), so it cannot check the full 3000 BC - 3000 AD span; see the range test below.
    const dates = [...evenly(2268923.5, TABLE_1_FIRST_JD, 1500), ...evenly(TABLE_1_END_JD, 2634166.5, 1500)];
    for (const jd of dates) expect(usesTable1(jd)).toBe(false);
    for (let index = 0; index < 9; index++) {
      const { rms, published } = rmsErrors(index, dates);
      expect(rms, STANDISH_BODIES[index]).toBeLessThan(published);
    }
  });

  it("velocity: within the limits stated in ephemeris.ts (m/s), 800 dates 1800-2050", () => {
    // No published velocity accuracy exists for the tables; these are the doc comment's stated
    // limits (measured maxima rounded up), kept here as a regression guard against astronomy-engine.
    const statedMetresPerSecond = [20, 5, 4, 10, 25, 45, 20, 20, 20];
    for (let index = 0; index < 9; index++) {
      let worst = 0;
      for (const jd of evenly(TABLE_1_FIRST_JD, TABLE_1_END_JD, 800)) worst = Math.max(worst, dist(state(index, jd).slice(3), reference(index, jd).helioVel) * 1000);
      expect(worst, STANDISH_BODIES[index]).toBeLessThan(statedMetresPerSecond[index]);
    }
  });

  it("the switch between the tables at 2051-01-01 jumps by no more than the two tables' published errors", () => {
    for (let index = 0; index < 9; index++) {
      const before = state(index, TABLE_1_END_JD - 1e-6);
      const after = state(index, TABLE_1_END_JD);
      const r = Math.hypot(after[0], after[1], after[2]);
      const [l1, b1, d1] = PUBLISHED_ERRORS[index].table1;
      const [l2, b2, d2] = PUBLISHED_ERRORS[index].table2;
      const bound = 2 * (Math.hypot(r * l1 * ARCSEC, r * b1 * ARCSEC, d1 * 1000) + Math.hypot(r * l2 * ARCSEC, r * b2 * ARCSEC, d2 * 1000));
      expect(dist(before, after), STANDISH_BODIES[index]).toBeLessThan(bound);
      expect(dist(before, after)).toBeGreaterThan(0); // a different table really is used
    }
  });
});

describe("planetState: names, dates, errors", () => {
  it("accepts the tables' names case-insensitively; Earth is the Earth-Moon barycentre", () => {
    expect(planetIndex("MARS")).toBe(3);
    expect(planetIndex(" pluto ")).toBe(8);
    for (const alias of ["Earth", "earth", "EM Bary", "EMB", "Earth-Moon barycenter", "Earth-Moon barycentre"]) expect(planetIndex(alias)).toBe(2);
    expect(planetState("earth", 46753 + EXCEL_TO_JD)).toEqual(planetState("EM Bary", 46753 + EXCEL_TO_JD));
  });

  it("unknown bodies are #VALUE! naming the accepted ones", () => {
    for (const name of ["Moon", "Sun", "Ceres", ""]) {
      const r = planetState(name, 46753 + EXCEL_TO_JD);
      expect(isDomainError(r) && r.kind).toBe("bad_argument");
      if (isDomainError(r)) {
        expect(r.parameter).toBe("body");
        expect(r.message).toMatch(/Mercury, Venus, Earth .*Pluto/);
      }
    }
  });

  it("dates outside 3000 BC - 3000 AD are #VALUE! naming the span; its ends are accepted", () => {
    expect(Array.isArray(planetState("Mars", TABLE_2_FIRST_JD))).toBe(true);
    expect(Array.isArray(planetState("Mars", TABLE_2_LAST_JD))).toBe(true);
    for (const date of [TABLE_2_FIRST_JD - 1, TABLE_2_LAST_JD + 1, NaN, Infinity]) {
      const r = planetState("Mars", date);
      expect(isDomainError(r) && r.kind).toBe("bad_argument");
      if (isDomainError(r)) expect(r.message).toMatch(/3000 BC/);
    }
  });

  it("Table 1 covers 1800-01-01 up to 2051-01-01 (Excel serials -36522 and 55154), Table 2 the rest", () => {
    // Serials of those dates: 1800-01-01 is JD 2378496.5 and 2051-01-01 is JD 2470172.5 (proleptic
    // Gregorian day counts, checked here with the JavaScript Date arithmetic).
    const jd = (y: number) => Date.UTC(y, 0, 1) / 86400000 + 2440587.5;
    expect(jd(1800)).toBe(TABLE_1_FIRST_JD);
    expect(jd(2051)).toBe(TABLE_1_END_JD);
    expect(TABLE_1_FIRST_JD - EXCEL_TO_JD).toBe(-36522);
    expect(usesTable1(TABLE_1_FIRST_JD)).toBe(true);
    expect(usesTable1(TABLE_1_FIRST_JD - 1e-6)).toBe(false);
    expect(usesTable1(TABLE_1_END_JD)).toBe(false);
    expect(jd(3001)).toBe(TABLE_2_LAST_JD);
  });

  it("finite states over the whole span, every planet", () => {
    for (const jd of evenly(TABLE_2_FIRST_JD, TABLE_2_LAST_JD, 3000))
      for (let i = 0; i < 9; i++) for (const c of state(i, jd)) expect(Number.isFinite(c)).toBe(true);
  });
});
