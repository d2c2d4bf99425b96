import "../support/customFunctions";
import Decimal from "decimal.js";
import { describe, expect, it } from "vitest";
import * as family from "../../src/functions/passes";
import { buildEngine } from "../../src/runner/engine";
import { toEngineFormula } from "../../src/runner/names";
import { bundle, direct, sameCell } from "../runner/support";
import { SKERRY_1_TLE, SKERRY_GROUND as SKERRY_STATION } from "../../src/scenario/story";
import { code, msg, only, sheet } from "./cells";

const { line1: L1, line2: L2 } = SKERRY_1_TLE;

const { contactTime, coverageHalfAngle, groundTrackSpacing, maxPassDuration, passDuration, passes, slantRange, swathWidth } = sheet(family);

// Family "Passes and coverage" at the sheet level: PASSES and CONTACT_TIME from a TLE pair or a
// state with its epoch (dates as serials), their labels, limits and errors; the headless runner
// sizing them; the coverage closed forms against exact geometry (decimal.js) and against the
// passes found for the invented Skerry-1 over the invented Skerry Ground station.

const { latitude: LAT, longitude: LON, height: H } = SKERRY_STATION;
const TLE = [[L1], [L2]];
const DAY = "2026-06-01"; // serial 46174
const R = 6378.137; // WGS 84 a, km (NIMA TR8350.2)

describe("PASSES", () => {
  const rows = passes(TLE, LAT, LON, H, DAY, "2026-06-02", 10, true) as (number | string)[][];

  it("gives one labelled row per pass: rise, highest, maximum elevation, set (UTC serials) and duration (s)", () => {
    expect(rows[0]).toEqual(["rise (UTC)", "highest (UTC)", "maximum elevation (deg)", "set (UTC)", "duration (s)"]);
    const found = rows.slice(1) as number[][];
    expect(found.length).toBeGreaterThanOrEqual(4); // a 58 deg N site sees a sun-synchronous orbiter several times a day
    for (const [rise, top, maxEl, set, duration] of found) {
      expect(rise).toBeGreaterThanOrEqual(46174);
      expect(set).toBeLessThanOrEqual(46175);
      expect(rise < top && top < set).toBe(true);
      expect(maxEl).toBeGreaterThanOrEqual(10);
      expect(maxEl).toBeLessThanOrEqual(90);
      expect(Math.abs(duration - (set - rise) * 86400)).toBeLessThan(1e-3); // float64 serials resolve 0.6 microseconds
    }
  });

  it("reads the TLE pair as a column or a row, and dates as serials or ISO text alike", () => {
    expect(passes([[L1, L2]], LAT, LON, H, 46174, 46175, 10, true)).toEqual(rows);
  });

  it("takes a J2000 state and its epoch as seven cells, the epoch as a serial or ISO text", () => {
    const state = [-4972.121, 5027.826, -3.679, 0.773416, 0.75797, 7.43123]; // Skerry-1 at its element set's epoch (SGP4, rounded)
    const a = passes([[...state, "2026-05-30T12:00Z"]], LAT, LON, H, DAY, "2026-06-02", 10) as number[][];
    const b = passes([[...state, 46172.5]], LAT, LON, H, DAY, "2026-06-02", 10) as number[][];
    expect(a).toEqual(b);
    // The J2 secular route stays within about 50 km of SGP4 over a week (test/core/passes.test.ts): the same passes, rises within 15 s.
    expect(a.length).toBe(rows.length - 1);
    a.forEach((p, k) => {
      expect(Math.abs(p[0] - (rows[k + 1][0] as number)) * 86400).toBeLessThan(15);
      expect(Math.abs(p[3] - (rows[k + 1][3] as number)) * 86400).toBeLessThan(15);
    });
  });

  it("caps the window at 31 days, checks the elevation and says when there is no pass", () => {
    expect(msg(only(passes(TLE, LAT, LON, H, DAY, "2026-07-03")))).toMatch(/^end: got .*; expected a date at most 31 days after start/);
    expect(code(only(passes(TLE, LAT, LON, H, DAY, "2026-06-02", 95)))).toBe("#VALUE!");
    // An equatorial orbit never rises at 58 deg N.
    const equatorial = [[7068, 0, 0, 0, 7.51, 0, DAY]];
    expect(code(only(passes(equatorial, LAT, LON, H, DAY, "2026-06-02", 5)))).toBe("#N/A");
    expect(msg(only(passes(equatorial, LAT, LON, H, DAY, "2026-06-02", 5)))).toMatch(/^min_elevation: the satellite does not rise above 5 deg/);
  });

  it("refuses a source that is neither a TLE pair nor a state with its epoch, naming source", () => {
    for (const bad of [[[L1]], [[1, 2, 3, 4, 5, 6]], [[7000, 0, 0, 0, 7.5, 0, "soon"]], [[L1.slice(0, 68) + "0"], [L2]]]) {
      const out = only(passes(bad, LAT, LON, H, DAY, "2026-06-02"));
      expect(code(out)).toBe("#VALUE!");
      expect(msg(out)).toMatch(/^source: /);
    }
    expect(msg(only(passes(TLE, [[LAT], [LAT]], LON, H, DAY, "2026-06-02")))).toMatch(/^site_latitude: got a 2x1 range; expected a single cell/);
  });
});

describe("CONTACT_TIME", () => {
  it("adds up each day's passes: minutes per 24 hours from start, and the passes rising in them", () => {
    const days = contactTime(TLE, LAT, LON, H, DAY, "2026-06-04", 10, true) as (number | string)[][];
    expect(days[0]).toEqual(["day from (UTC)", "contact (min)", "passes"]);
    expect(days.slice(1).map((d) => d[0])).toEqual([46174, 46175, 46176]);
    const found = passes(TLE, LAT, LON, H, DAY, "2026-06-04", 10) as number[][];
    const total = found.reduce((s, p) => s + p[4], 0) / 60;
    expect((days.slice(1) as number[][]).reduce((s, d) => s + d[1], 0)).toBeCloseTo(total, 6);
    expect((days.slice(1) as number[][]).reduce((s, d) => s + d[2], 0)).toBe(found.length);
  });

  it("gives zero minutes, not #N/A, on a day without passes", () => {
    expect(contactTime([[7068, 0, 0, 0, 7.51, 0, DAY]], LAT, LON, H, DAY, "2026-06-02", 5)).toEqual([[46174, 0, 0]]);
  });
});

describe("the closed forms against the passes SGP4 gives (invented Skerry-1, about 690 km)", () => {
  const week = passes(TLE, LAT, LON, H, DAY, "2026-06-08", 10) as number[][];
  // Skerry-1's mean altitude: the element set's mean motion 14.60983543 rev/day, WGS 84 GM.
  const n = (14.60983543 * 2 * Math.PI) / 86400;
  const altitude = Math.cbrt(398600.4418 / (n * n)) - R;

  it("no pass outlasts MAX_PASS_DURATION by more than the Earth's rotation allows (3 %, common practice)", () => {
    const longest = Math.max(...week.map((p) => p[4]));
    const bound = only(maxPassDuration(altitude, 10)) as number;
    expect(longest).toBeLessThan(1.03 * bound);
    expect(longest).toBeGreaterThan(0.95 * bound); // a week holds a pass close to overhead
  });

  it("PASS_DURATION, given the offset that the pass's maximum elevation implies, matches each pass within 5 %", () => {
    // On the sphere the highest elevation of a pass is seen at the closest approach, whose central angle is COVERAGE_HALF_ANGLE at that elevation.
    for (const [, , maxEl, , duration] of week) {
      const offset = only(coverageHalfAngle(altitude, Math.min(90, maxEl))) as number;
      const closed = only(passDuration(altitude, 10, offset)) as number;
      expect(Math.abs(closed - duration) / duration).toBeLessThan(0.05);
    }
  });
});

describe("SLANT_RANGE and the coverage geometry", () => {
  // Exact geometry of the triangle centre-site-satellite, at 40 digits: (R + h)^2 = R^2 + D^2 + 2 R D sin(e).
  const D = Decimal.clone({ precision: 40 });
  const exact = (radius: number, h: number, el: number) => {
    const r = new D(radius);
    const s = D.sin(new D(el).times(D.acos(-1)).div(180));
    return r.times(s).neg().plus(r.times(s).pow(2).plus(r.times(2).times(h)).plus(new D(h).pow(2)).sqrt()).toNumber();
  };

  it("is the exact triangle to 1e-12 relative, on WGS 84's sphere by default and on a named body's", () => {
    for (const h of [0.5, 250, 520, 690, 20200, 35786])
      for (const el of [0, 5, 10, 30, 60, 90]) {
        expect(Math.abs((only(slantRange(h, el)) as number) / exact(R, h, el) - 1)).toBeLessThan(1e-12);
        expect(Math.abs((only(slantRange(h, el, "Moon")) as number) / exact(1737.4, h, el) - 1)).toBeLessThan(1e-12); // WGCCRE 2015 lunar radius
      }
    expect(only(slantRange(100, 45, 4902.8, 1737.4))).toBe(only(slantRange(100, 45, "Moon")));
  });

  it("needs a radius for a bare GM, and refuses elevations outside 0-90 deg", () => {
    expect(msg(only(slantRange(690, 10, 398600.4418)))).toMatch(/^body_radius: /);
    expect(msg(only(slantRange(690, 91)))).toMatch(/^elevation: /);
    expect(msg(only(slantRange(690, 10, null, -5)))).toMatch(/^body_radius: got -5/);
  });

  it("COVERAGE_HALF_ANGLE at the horizon is acos(R / (R + h)), and SWATH_WIDTH twice that arc", () => {
    for (const h of [400, 690, 35786]) {
      const lambda = only(coverageHalfAngle(h, 0)) as number;
      expect(lambda).toBeCloseTo((Math.acos(R / (R + h)) * 180) / Math.PI, 11);
      expect(only(swathWidth(h, 0))).toBeCloseTo((2 * R * lambda * Math.PI) / 180, 8);
    }
    expect(only(coverageHalfAngle(35786, 0))).toBeCloseTo(81.3, 1); // geostationary coverage reaches 81.3 deg (common practice)
  });

  it("GROUND_TRACK_SPACING with a fixed node is the Earth's turn in one two-body period, R w P (SMAD 3rd ed. §5.3)", () => {
    const period = 2 * Math.PI * Math.sqrt((R + 690) ** 3 / 398600.4418);
    expect(only(groundTrackSpacing(690))).toBeCloseTo(R * 7.292115e-5 * period, 9);
    expect(msg(only(groundTrackSpacing(690, 200)))).toMatch(/^inc: /);
  });
});

describe("PASSES and CONTACT_TIME in the headless runner", () => {
  const grid = [
    [L1, "2026-06-01", 46181, 10],
    [L2, "2026-06-08"],
    [toEngineFormula(`=ORBIT.PASSES(A1:A2, ${LAT}, ${LON}, ${H}, B1, B2, D1, TRUE)`)],
  ];

  it("learns PASSES' size from its first result (one row per pass is unknown beforehand) and spills it whole on the second pass", () => {
    const e = buildEngine(bundle(), { S: grid });
    const returned = direct("PASSES", [[L1], [L2]], LAT, LON, H, "2026-06-01", "2026-06-08", 10, true);
    expect(returned.length).toBeGreaterThan(40);
    expect(e.passes).toBe(2);
    expect(e.unsettled).toEqual([]);
    const shown = e.hf.getRangeValues({ start: { sheet: 0, row: 2, col: 0 }, end: { sheet: 0, row: 2 + returned.length - 1, col: 4 } });
    returned.forEach((r, i) => r.forEach((c, j) => expect(sameCell(shown[i][j], c), `${i},${j}`).toBe(true)));
  });

  it("knows CONTACT_TIME's size beforehand when the dates are literal serials, and learns it when they are cells", () => {
    const literal = buildEngine(bundle(), { S: [[L1], [L2], [toEngineFormula(`=ORBIT.CONTACT_TIME(A1:A2, ${LAT}, ${LON}, ${H}, 46174, 46181, 10, TRUE)`)]] });
    expect(literal.passes).toBe(1);
    const byCell = buildEngine(bundle(), { S: [[L1, 46174], [L2, 46181], [toEngineFormula(`=ORBIT.CONTACT_TIME(A1:A2, ${LAT}, ${LON}, ${H}, B1, B2, 10, TRUE)`)]] });
    expect(byCell.passes).toBe(2);
    const want = direct("CONTACT_TIME", [[L1], [L2]], LAT, LON, H, 46174, 46181, 10, true);
    expect(want.length).toBe(8);
    for (const e of [literal, byCell]) {
      const shown = e.hf.getRangeValues({ start: { sheet: 0, row: 2, col: 0 }, end: { sheet: 0, row: 9, col: 2 } });
      want.forEach((r, i) => r.forEach((c, j) => expect(sameCell(shown[i][j], c)).toBe(true)));
    }
  });
});
