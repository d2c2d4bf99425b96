import { describe, expect, it } from "vitest";
import { isCellError } from "../../src/runner/host";
import { builtBundle, excelArg } from "../contract/bundle";
import { seeded } from "../support/random";
import { SKERRY_1_TLE, SKERRY_GROUND as SKERRY_STATION } from "../../src/scenario/story";

const { line1: SKERRY_LINE1, line2: SKERRY_LINE2 } = SKERRY_1_TLE;

// The ground families through the BUILT bundle, each check over many cases passed as ONE range
// call (so the lifting path is what is checked): round trips (geodetic <-> Earth-fixed, inertial
// <-> Earth-fixed, Julian date <-> date serial), PASSES against dense one-second sampling of
// LOOK_ANGLES, and invariants tying the functions to each other and to their geometry. The
// hostile-input suite (hostile.test.ts) covers every id of functions.json on its own.
const bundle = builtBundle();
const call = (id: string, ...args: unknown[]) => bundle.functions.get(id)!(...args.map(excelArg)) as unknown[][];
const nums = (g: unknown[][]) => g as number[][];
const col = (xs: readonly unknown[]) => xs.map((x) => [x]);
const N = 2000;

describe("round trips through the bundle", () => {
  it("geodetic -> Earth-fixed -> geodetic -> Earth-fixed returns the position to 1e-9 km, poles and 1e5 km heights included", () => {
    const rand = seeded(15);
    const lat = Array.from({ length: N }, (_, k) => (k % 50 === 0 ? (k % 100 === 0 ? 90 : -90) : 180 * rand() - 90));
    const lon = Array.from({ length: N }, () => 720 * rand() - 360);
    const h = Array.from({ length: N }, (_, k) => (k % 3 === 0 ? 1e5 * rand() : k % 3 === 1 ? 1000 * rand() : 10 * rand() - 5));
    const r = nums(call("GEODETIC_TO_EARTH_FIXED", col(lat), col(lon), col(h)));
    const g = nums(call("EARTH_FIXED_TO_GEODETIC", r));
    const again = nums(call("GEODETIC_TO_EARTH_FIXED", col(g.map((x) => x[0])), col(g.map((x) => x[1])), col(g.map((x) => x[2]))));
    for (let k = 0; k < N; k++) {
      expect(Math.hypot(again[k][0] - r[k][0], again[k][1] - r[k][1], again[k][2] - r[k][2])).toBeLessThan(1e-9);
      expect(Math.abs(g[k][2] - h[k])).toBeLessThan(1e-9);
      expect(Math.abs(g[k][1])).toBeLessThanOrEqual(180);
    }
  });

  it("inertial -> Earth-fixed -> inertial returns the state to 1e-9 km and 1e-12 km/s, in both frames, with Earth orientation, and keeps |r|", () => {
    const rand = seeded(16);
    const states: number[][] = [], dates: number[][] = [], dut1: number[][] = [], px: number[][] = [], py: number[][] = [], frames: string[][] = [];
    for (let k = 0; k < N; k++) {
      const r = 6500 + 40000 * rand() ** 2;
      const th = 2 * Math.PI * rand(), ph = Math.acos(2 * rand() - 1);
      states.push([r * Math.sin(ph) * Math.cos(th), r * Math.sin(ph) * Math.sin(th), r * Math.cos(ph), 10 * rand() - 5, 10 * rand() - 5, 10 * rand() - 5]);
      dates.push([26000 + 40000 * rand()]); // 1971 to 2080 as date serials
      dut1.push([1.8 * rand() - 0.9]);
      px.push([0.6 * rand() - 0.3]);
      py.push([0.6 * rand()]);
      frames.push([k % 2 ? "TEME" : "J2000"]);
    }
    const fixed = nums(call("INERTIAL_TO_EARTH_FIXED", states, dates, dut1, px, py, frames));
    const back = nums(call("EARTH_FIXED_TO_INERTIAL", fixed, dates, dut1, px, py, frames));
    for (let k = 0; k < N; k++) {
      const s = states[k];
      for (let i = 0; i < 3; i++) expect(Math.abs(back[k][i] - s[i])).toBeLessThan(1e-9);
      for (let i = 3; i < 6; i++) expect(Math.abs(back[k][i] - s[i])).toBeLessThan(1e-12);
      expect(Math.abs(Math.hypot(fixed[k][0], fixed[k][1], fixed[k][2]) / Math.hypot(s[0], s[1], s[2]) - 1)).toBeLessThan(1e-14);
    }
  });

  it("date serial -> Julian date -> date serial to 5e-10 day, and Julian date -> serial -> Julian date exactly up to JD 4830037", () => {
    const rand = seeded(17);
    const serials = Array.from({ length: N }, (_, k) => (k % 10 === 0 ? 1 + 58.99 * rand() : 61 + 2958404 * rand()));
    const jd = nums(call("JULIAN_DATE", col(serials)));
    const back = nums(call("DATE_FROM_JULIAN", jd));
    serials.forEach((s, k) => expect(Math.abs(back[k][0] - s)).toBeLessThan(5e-10));
    const jds = Array.from({ length: N }, () => 2415020.5 + (4830037 - 2415020.5) * rand());
    const again = nums(call("JULIAN_DATE", call("DATE_FROM_JULIAN", col(jds))));
    jds.forEach((j, k) => expect(again[k][0]).toBe(j));
  });
});

describe("PASSES against dense one-second sampling of LOOK_ANGLES (invented Skerry-1 over invented Skerry Ground)", () => {
  const { latitude, longitude, height } = SKERRY_STATION;
  const start = 46174; // 2026-06-01 0h UTC
  const SECOND = 1 / 86400;
  // The independent route: the TLE's TEME state every second of the day (TLE_STATE), its elevation
  // from the site (LOOK_ANGLES); a rise is the first second at or above the threshold, a set the
  // last. It shares no bracketing, bisection or peak search with the pass search.
  const dates = Array.from({ length: 86401 }, (_, k) => [start + k * SECOND]);
  const states = call("TLE_STATE", SKERRY_LINE1, SKERRY_LINE2, dates, "TEME");
  const elevation = nums(call("LOOK_ANGLES", latitude, longitude, height, states, dates, "TEME")).map((r) => r[1]);

  it.each([0, 10])("finds the same passes above %i deg within a second", (minEl) => {
    const sampled: [number, number][] = [];
    let rise: number | null = null;
    elevation.forEach((el, k) => {
      const t = dates[k][0];
      if (el >= minEl && rise === null) rise = t;
      if (el < minEl && rise !== null) {
        sampled.push([rise, dates[k - 1][0]]);
        rise = null;
      }
    });
    if (rise !== null) sampled.push([rise, dates[dates.length - 1][0]]);
    const found = nums(call("PASSES", [[SKERRY_LINE1], [SKERRY_LINE2]], latitude, longitude, height, start, start + 1, minEl));
    expect(found.length).toBeGreaterThanOrEqual(4);
    expect(found.length).toBe(sampled.length);
    found.forEach((p, k) => {
      expect(Math.abs(p[0] - sampled[k][0]) / SECOND).toBeLessThanOrEqual(1);
      expect(Math.abs(p[3] - sampled[k][1]) / SECOND).toBeLessThanOrEqual(1);
      // The maximum elevation is the highest sampled one or a little above (the peak falls between seconds).
      const inPass = elevation.filter((_, i) => dates[i][0] >= sampled[k][0] && dates[i][0] <= sampled[k][1]);
      expect(p[2]).toBeGreaterThanOrEqual(Math.max(...inPass) - 1e-9);
      expect(p[2] - Math.max(...inPass)).toBeLessThan(1e-3);
    });
  });

  it("adds the passes into CONTACT_TIME: minutes and passes per day sum to the PASSES totals", () => {
    const found = nums(call("PASSES", [[SKERRY_LINE1], [SKERRY_LINE2]], latitude, longitude, height, start, start + 5, 5));
    const days = nums(call("CONTACT_TIME", [[SKERRY_LINE1], [SKERRY_LINE2]], latitude, longitude, height, start, start + 5, 5));
    expect(days.map((d) => d[0])).toEqual([start, start + 1, start + 2, start + 3, start + 4]);
    expect(days.reduce((s, d) => s + d[1], 0)).toBeCloseTo(found.reduce((s, p) => s + p[4], 0) / 60, 6);
    expect(days.reduce((s, d) => s + d[2], 0)).toBe(found.length);
  });
});

describe("invariants through the bundle", () => {
  it("TIME_SCALE_OFFSET is antisymmetric and adds up along a chain of scales, to 1e-12 s", () => {
    const rand = seeded(18);
    const scales = ["UTC", "TAI", "TT", "GPS", "UT1"];
    const dates = Array.from({ length: N }, () => [26300 + 40000 * rand()]); // from 1972
    const pick = () => col(dates.map(() => scales[Math.floor(rand() * scales.length)]));
    const [a, b, c] = [pick(), pick(), pick()];
    const dut1 = dates.map(() => [1.8 * rand() - 0.9]);
    const ab = nums(call("TIME_SCALE_OFFSET", dates, a, b, dut1));
    const ba = nums(call("TIME_SCALE_OFFSET", dates, b, a, dut1));
    const bc = nums(call("TIME_SCALE_OFFSET", dates, b, c, dut1));
    const ac = nums(call("TIME_SCALE_OFFSET", dates, a, c, dut1));
    for (let k = 0; k < N; k++) {
      expect(ab[k][0] + ba[k][0]).toBeCloseTo(0, 12);
      expect(Math.abs(ab[k][0] + bc[k][0] - ac[k][0])).toBeLessThan(1e-12);
    }
  });

  it("SIDEREAL_TIME lies in [0, 360) and the ERA turns by 360 x 0.00273781191135448 deg a day more than a turn (IERS Conventions 2010, Eq. 5.15)", () => {
    const rand = seeded(19);
    const dates = Array.from({ length: N }, () => [20000 + 50000 * rand()]);
    for (const kind of ["GMST", "GAST", "ERA"]) for (const [v] of nums(call("SIDEREAL_TIME", dates, null, kind))) expect(v >= 0 && v < 360).toBe(true);
    const era = nums(call("SIDEREAL_TIME", dates, null, "ERA"));
    const next = nums(call("SIDEREAL_TIME", dates.map(([d]) => [d + 1]), null, "ERA"));
    // Two dates a day apart each round to their float64 Julian date (40 microseconds apart): 1.7e-7 deg of rotation at worst.
    for (let k = 0; k < N; k++) expect(Math.abs((((next[k][0] - era[k][0]) % 360) + 360) % 360 - 360 * 0.00273781191135448)).toBeLessThan(2e-7);
  });

  it("LOOK_ANGLES' range is the distance between the Earth-fixed satellite and site, and its angles keep their ranges", () => {
    const rand = seeded(20);
    const lat = Array.from({ length: N }, () => 180 * rand() - 90);
    const lon = Array.from({ length: N }, () => 360 * rand() - 180);
    const h = Array.from({ length: N }, () => 3 * rand());
    const states = Array.from({ length: N }, () => {
      const r = 6800 + 36000 * rand();
      const th = 2 * Math.PI * rand(), ph = Math.acos(2 * rand() - 1);
      return [r * Math.sin(ph) * Math.cos(th), r * Math.sin(ph) * Math.sin(th), r * Math.cos(ph), 8 * rand() - 4, 8 * rand() - 4, 8 * rand() - 4];
    });
    const dates = states.map(() => [46000 + 1000 * rand()]);
    const look = nums(call("LOOK_ANGLES", col(lat), col(lon), col(h), states, dates));
    const fixed = nums(call("INERTIAL_TO_EARTH_FIXED", states, dates));
    const sites = nums(call("GEODETIC_TO_EARTH_FIXED", col(lat), col(lon), col(h)));
    const sub = nums(call("SUBSATELLITE_POINT", states, dates));
    const geo = nums(call("EARTH_FIXED_TO_GEODETIC", fixed.map((s) => s.slice(0, 3))));
    for (let k = 0; k < N; k++) {
      const [az, el, range] = look[k];
      expect(az >= 0 && az < 360).toBe(true);
      expect(Math.abs(el)).toBeLessThanOrEqual(90);
      const d = Math.hypot(fixed[k][0] - sites[k][0], fixed[k][1] - sites[k][1], fixed[k][2] - sites[k][2]);
      expect(Math.abs(range - d)).toBeLessThan(1e-9 * d);
      expect(sub[k]).toEqual(geo[k]);
    }
  });

  it("the coverage closed forms keep their geometry: SLANT_RANGE falls with elevation to the altitude overhead; PASS_DURATION <= MAX_PASS_DURATION, 0 beyond COVERAGE_HALF_ANGLE; SWATH_WIDTH = 2 R lambda", () => {
    const rand = seeded(21);
    const h = Array.from({ length: N }, () => 200 + 40000 * rand() ** 3);
    const el = h.map(() => 89 * rand());
    const range = nums(call("SLANT_RANGE", col(h), col(el)));
    const higher = nums(call("SLANT_RANGE", col(h), col(el.map((e) => e + 1))));
    const overhead = nums(call("SLANT_RANGE", col(h), 90));
    const lambda = nums(call("COVERAGE_HALF_ANGLE", col(h), col(el)));
    const swath = nums(call("SWATH_WIDTH", col(h), col(el)));
    const longest = nums(call("MAX_PASS_DURATION", col(h), col(el)));
    const offsets = lambda.map(([l]) => [Math.min(90, 1.2 * l * rand())]);
    const pass = nums(call("PASS_DURATION", col(h), col(el), offsets));
    for (let k = 0; k < N; k++) {
      expect(higher[k][0]).toBeLessThan(range[k][0]);
      expect(Math.abs(overhead[k][0] - h[k])).toBeLessThan(1e-9 * h[k]);
      expect(range[k][0]).toBeGreaterThanOrEqual(h[k]);
      expect(swath[k][0]).toBeCloseTo((2 * 6378.137 * lambda[k][0] * Math.PI) / 180, 6);
      expect(pass[k][0]).toBeLessThanOrEqual(longest[k][0] * (1 + 1e-12));
      if (offsets[k][0] >= lambda[k][0]) expect(pass[k][0]).toBe(0);
      else expect(pass[k][0]).toBeGreaterThan(0);
    }
  });

  it("FREE_SPACE_PATH_LOSS gains 20 log10 2 = 6.0206 dB per doubling of distance or frequency; DOPPLER_SHIFT is odd in the range rate", () => {
    const rand = seeded(22);
    const d = Array.from({ length: N }, () => 10 ** (6 * rand() - 1));
    const f = d.map(() => 10 ** (6 + 4 * rand()));
    const base = nums(call("FREE_SPACE_PATH_LOSS", col(d), col(f)));
    const far = nums(call("FREE_SPACE_PATH_LOSS", col(d.map((x) => 2 * x)), col(f)));
    const high = nums(call("FREE_SPACE_PATH_LOSS", col(d), col(f.map((x) => 2 * x))));
    const rdot = d.map(() => [16 * rand() - 8]);
    const up = nums(call("DOPPLER_SHIFT", col(f), rdot));
    const down = nums(call("DOPPLER_SHIFT", col(f), rdot.map(([r]) => [-r])));
    for (let k = 0; k < N; k++) {
      expect(far[k][0] - base[k][0]).toBeCloseTo(20 * Math.log10(2), 10);
      expect(high[k][0] - base[k][0]).toBeCloseTo(20 * Math.log10(2), 10);
      expect(up[k][0]).toBe(-down[k][0]);
    }
  });

  it("TLE_ELEMENTS reads back the fields of generated element sets exactly, and TLE_STATE gives their orbit or #N/A", () => {
    const rand = seeded(23);
    const fixed = (x: number, width: number, decimals: number) => x.toFixed(decimals).padStart(width, " ");
    const checksum = (line: string) => {
      let s = 0;
      for (const ch of line.slice(0, 68)) s += ch === "-" ? 1 : /[0-9]/.test(ch) ? Number(ch) : 0;
      return s % 10;
    };
    const l1: string[][] = [], l2: string[][] = [], want: number[][] = [];
    for (let k = 0; k < 500; k++) {
      const day = 1 + 364.99999999 * rand();
      const inc = fixed(180 * rand(), 8, 4), raan = fixed(359.9999 * rand(), 8, 4), argp = fixed(359.9999 * rand(), 8, 4), m = fixed(359.9999 * rand(), 8, 4);
      const ecc = String(Math.floor(2e6 * rand())).padStart(7, "0");
      const n = fixed(11 + 5 * rand(), 11, 8);
      const a = SKERRY_LINE1.slice(0, 20) + fixed(day, 12, 8) + SKERRY_LINE1.slice(32, 68);
      const b = `${SKERRY_LINE2.slice(0, 8)}${inc} ${raan} ${ecc} ${argp} ${m} ${n}${SKERRY_LINE2.slice(63, 68)}`;
      l1.push([a + checksum(a)]);
      l2.push([b + checksum(b)]);
      want.push([Number(inc), Number(raan), Number(`0.${ecc}`), Number(argp), Number(m), Number(n)]);
    }
    const out = call("TLE_ELEMENTS", l1, l2);
    const states = call("TLE_STATE", l1, l2, out.map((r) => [r[0]]), "TEME"); // at each element set's epoch
    for (let k = 0; k < want.length; k++) {
      expect(out[k].slice(1, 7)).toEqual(want[k]);
      expect(out[k][0] as number).toBeGreaterThanOrEqual(46023); // 2026-01-01
      const s = states[k];
      if (isCellError(s[0])) {
        expect(s[0].code).toBe("#N/A");
        continue;
      }
      // The TEME radius lies between perigee and apogee of the mean orbit, to within SGP4's short-period terms (1 %).
      const rev = want[k][5], e = want[k][2];
      const sma = Math.cbrt(398600.8 / ((rev * 2 * Math.PI) / 86400) ** 2); // WGS 72 GM, as SGP4 uses
      const r = Math.hypot(s[0] as number, s[1] as number, s[2] as number);
      expect(r).toBeGreaterThan(0.99 * sma * (1 - e));
      expect(r).toBeLessThan(1.01 * sma * (1 + e));
    }
  });
});
