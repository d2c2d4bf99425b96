import { existsSync } from "node:fs";
import { resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { buildEngine } from "../../src/runner/engine";
import { loadBundle } from "../../src/runner/host";
import { toEngineFormula } from "../../src/runner/names";
import { BODIES } from "../../src/catalogue/bodies";
import { BODY_FIELDS } from "../../src/catalogue/fields";
import { SOURCES } from "../../src/catalogue/sources";
import {
  bodyGroups,
  buildTablePlan,
  DEFAULT_BODIES,
  DEFAULT_FIELDS,
  DEFAULT_UNITS,
  displayUnit,
  formatWith,
  matchesFilter,
  numberFormatFor,
  planSize,
  tableCells,
} from "../../src/taskpane/catalogueTable";

const body = (name: string) => BODIES.find((b) => b.name === name)!;

describe("bodyGroups", () => {
  it("puts every catalogue body in exactly one group: star, planets, their moons (Earth's first), dwarf planets, their moons, asteroids", () => {
    const groups = bodyGroups();
    expect(groups.flatMap((g) => g.bodies).length).toBe(BODIES.length);
    expect(new Set(groups.flatMap((g) => g.bodies.map((b) => b.name))).size).toBe(BODIES.length);
    expect(groups.map((g) => g.title)).toEqual([
      "Star", "Planets", "Moons of Earth", "Moons of Mars", "Moons of Jupiter", "Moons of Saturn", "Moons of Uranus", "Moons of Neptune",
      "Dwarf planets", "Moons of Pluto", "Asteroids",
    ]);
    expect(groups.find((g) => g.title === "Moons of Uranus")!.bodies.map((b) => b.name)).toEqual(["Miranda", "Ariel", "Umbriel", "Titania", "Oberon"]);
    for (const g of groups.filter((g) => g.title.startsWith("Moons of "))) for (const b of g.bodies) expect(`Moons of ${b.parent}`).toBe(g.title);
    expect(groups.find((g) => g.title === "Planets")!.bodies.map((b) => b.name)).toEqual(["Mercury", "Venus", "Earth", "Mars", "Jupiter", "Saturn", "Uranus", "Neptune"]);
  });

  it("filters on name, alias, kind and parent, ignoring case", () => {
    expect(matchesFilter(body("Moon"), "LUNA")).toBe(true);
    expect(matchesFilter(body("Io"), "jupiter")).toBe(true);
    expect(matchesFilter(body("Ceres"), "dwarf")).toBe(true);
    expect(matchesFilter(body("Earth"), "saturn")).toBe(false);
    expect(matchesFilter(body("Earth"), "  ")).toBe(true);
  });
});

describe("number formats", () => {
  it("shows each value with the digits its source gives: fixed, trailing zeros of the rounding dropped", () => {
    expect(numberFormatFor(6378.1366, 8, false)).toBe("#,##0.0000"); // JPL SSD Earth radius, km
    expect(numberFormatFor(695700, 4, false)).toBe("#,##0"); // IAU 2015 B3 Sun radius: no false decimals
    expect(numberFormatFor(25.379970530865943, 6, false)).toBe("#,##0.00"); // 360 / 14.1844 d = 25.3800 -> 25.38
    expect(numberFormatFor(0.99726968, 8, false)).toBe("#,##0.00000000"); // JPL SSD sidereal day, d
    expect(numberFormatFor(0.00001531, 4, false)).toBe("#,##0.00000000"); // Standish I of the EM barycentre, deg
    expect(numberFormatFor(0, 1, false)).toBe("#,##0");
  });

  it("writes GM and J2 in scientific notation with one mantissa digit per source digit", () => {
    expect(numberFormatFor(3.24858592e5, 9, true)).toBe("0.00000000E+00"); // gm_de440 Venus: 9 digits
    expect(numberFormatFor(4.458e-6, 4, true)).toBe("0.000E+00"); // NSSDC Venus J2
    expect(numberFormatFor(5, 1, true)).toBe("0E+00");
  });

  it("previews a value as the format shows it", () => {
    expect(formatWith(6378.1366, "#,##0.0000")).toBe("6,378.1366");
    expect(formatWith(71492, "#,##0")).toBe("71,492");
    expect(formatWith(1.3271244004127942e11, "0.000E+00")).toBe("1.327E+11");
    expect(formatWith(2.110608853272684e-7, "0.0000E+00")).toBe("2.1106E-07");
    expect(formatWith("Sun", "General")).toBe("Sun");
  });

  it("writes units with superscripts", () => {
    expect(displayUnit("km3/s2")).toBe("km³/s²");
    expect(displayUnit("km")).toBe("km");
  });
});

describe("buildTablePlan", () => {
  it("makes one row per body, the catalogue's own values in sheet units, and a Sources column", () => {
    const plan = buildTablePlan({ bodies: ["Earth", "Moon"], fields: ["gm", "equatorial_radius", "j2_reference_radius"], units: DEFAULT_UNITS });
    expect(plan.header).toEqual(["Body", "GM (km³/s²)", "Equatorial radius (km)", "J2 reference radius (km)", "Sources"]);
    expect(plan.rows[0].slice(0, 4)).toEqual(["Earth", body("Earth").gm.value, body("Earth").equatorialRadius.value, body("Earth").j2ReferenceRadius!.value]);
    // The Moon has no J2 reference radius in the catalogue: an empty cell, not a zero.
    expect(plan.rows[1][3]).toBe("");
    expect(plan.rows[0][4]).toContain(`${SOURCES.DE440.label}: GM`);
    expect(plan.rows[0][4]).toContain(`${SOURCES.EGM2008.label}: J2 reference radius`);
  });

  it("converts to metres, m³/s² and hours or days when asked", () => {
    const plan = buildTablePlan({ bodies: ["Mars"], fields: ["gm", "mean_radius", "rotation_period"], units: { distance: "m", gm: "m3/s2", time: "h" } });
    const mars = body("Mars");
    expect(plan.header.slice(1, 4)).toEqual(["GM (m³/s²)", "Mean radius (m)", "Rotation period (h)"]);
    expect(plan.rows[0].slice(1, 4)).toEqual([mars.gm.value * 1e9, mars.meanRadius.value * 1e3, mars.rotationPeriod!.value / 3600]);
    const days = buildTablePlan({ bodies: ["Mars"], fields: ["orbital_period"], units: { ...DEFAULT_UNITS, time: "day" } });
    expect(days.rows[0][1]).toBe(mars.orbit!.period.value / 86400);
  });

  it("cites every source it uses in full below the table, and flags recalled and computed values", () => {
    const plan = buildTablePlan({ bodies: [...DEFAULT_BODIES, "Charon"], fields: BODY_FIELDS.map((f) => f.key), units: DEFAULT_UNITS });
    expect(plan.notes[0]).toMatch(/^Sources of the values above/);
    for (const label of plan.sourcesUsed) {
      const src = Object.values(SOURCES).find((s) => s.label === label)!;
      expect(plan.notes).toContain(`${label}: ${src.citation}.`);
    }
    // Each Sources cell names only sources that are cited in full.
    for (const r of plan.rows) for (const part of String(r[r.length - 1]).split("; ")) expect(plan.sourcesUsed).toContain(part.split(": ")[0]);
    // Charon's orbit is marked in the catalogue as recalled from memory: the table says so.
    expect(String(plan.rows.find((r) => r[0] === "Charon")![plan.header.length - 1])).toContain("(from memory)");
    expect(plan.notes.some((n) => n.startsWith("Charon, semi-major axis: recalled from memory"))).toBe(true);
    expect(plan.notes.some((n) => n.startsWith("Earth, J2: computed: J2 = -sqrt(5) * C20bar"))).toBe(true);
    expect(plan.notes[plan.notes.length - 1]).toMatch(/not ephemerides/);
  });

  it("sizes the block it writes: header, rows, one blank row, then the notes", () => {
    const plan = buildTablePlan({ bodies: DEFAULT_BODIES, fields: DEFAULT_FIELDS, units: DEFAULT_UNITS });
    expect(planSize(plan)).toEqual({ rows: 1 + DEFAULT_BODIES.length + 1 + plan.notes.length, cols: 2 + DEFAULT_FIELDS.length });
    const empty = buildTablePlan({ bodies: [], fields: DEFAULT_FIELDS, units: DEFAULT_UNITS });
    expect(empty.notes).toEqual([]);
    expect(planSize(empty)).toEqual({ rows: 1, cols: 2 + DEFAULT_FIELDS.length });
  });

  it("gives every cell the format of its own value's digits", () => {
    const plan = buildTablePlan({ bodies: ["Sun", "Mercury", "Earth", "Moon"], fields: ["gm", "equatorial_radius", "rotation_period", "inc"], units: { ...DEFAULT_UNITS, time: "day" } });
    const f = (body: string, col: number) => plan.numberFormats[plan.rows.findIndex((r) => r[0] === body)][col];
    expect(plan.numberFormats.map((r) => r.length)).toEqual(plan.rows.map((r) => r.length));
    expect(f("Sun", 0)).toBe("General");
    expect(f("Sun", plan.header.length - 1)).toBe("General");
    // gm_de440: Mercury 2.2031868551400003E+04 is 12 digits; Earth's 17 printed digits, 15 shown.
    expect(f("Mercury", 1)).toBe(`0.${"0".repeat(11)}E+00`);
    expect(f("Earth", 1)).toBe(`0.${"0".repeat(14)}E+00`);
    expect(f("Sun", 2)).toBe("#,##0"); // 695 700 km
    expect(f("Earth", 2)).toBe("#,##0.0000"); // 6378.1366 km
    expect(f("Sun", 3)).toBe("#,##0.00"); // 25.38 d
    expect(f("Earth", 3)).toBe("#,##0.00000000"); // 0.99726968 d
    expect(f("Sun", 4)).toBe("General"); // the Sun has no orbit: empty cell
    expect(f("Moon", 4)).toBe("#,##0.00"); // 5.16 deg
  });

  it("explains surprising signs in note rows: Earth's inclination, retrograde spins and orbits", () => {
    const plan = buildTablePlan({ bodies: ["Venus", "Earth", "Uranus", "Titania", "Triton"], fields: ["rotation_period", "inc"], units: DEFAULT_UNITS });
    expect(plan.notes.some((n) => n.startsWith("Earth, inclination: computed: Standish Table 1 prints I = -0.00001531 deg"))).toBe(true);
    expect(plan.notes).toContain(
      "Negative rotation periods (Venus, Uranus, Titania, Triton): the body spins retrograde, clockwise seen from above its IAU north pole (the pole on the north side of the solar system's invariable plane); the size of the number is the sidereal period.",
    );
    expect(plan.notes.some((n) => n.startsWith("Inclinations above 90 deg (Triton)"))).toBe(true);
    const noSpin = buildTablePlan({ bodies: ["Venus"], fields: ["gm"], units: DEFAULT_UNITS });
    expect(noSpin.notes.some((n) => n.startsWith("Negative rotation"))).toBe(false);
  });
});

describe("derived columns (live formulas)", () => {
  it("adds a formula column per derived field, blank for a body without a parent, in km or m", () => {
    const plan = buildTablePlan({ bodies: ["Sun", "Earth"], fields: ["gm"], derived: ["soi_radius", "hill_radius"], units: DEFAULT_UNITS });
    expect(plan.header).toEqual(["Body", "GM (km³/s²)", "SOI radius (km)", "Hill radius (km)", "Sources"]);
    expect(plan.rows[0].slice(2, 4)).toEqual(["", ""]);
    expect(plan.rows[1].slice(2, 4)).toEqual([{ formula: "=ORBIT.SOI_RADIUS({body})" }, { formula: "=ORBIT.HILL_RADIUS({body})" }]);
    expect(String(plan.rows[1][4])).toContain("live formulas: ORBIT.SOI_RADIUS, ORBIT.HILL_RADIUS");
    expect(plan.notes.some((n) => n.startsWith("SOI radius: computed in the sheet by ORBIT.SOI_RADIUS"))).toBe(true);
    const metres = buildTablePlan({ bodies: ["Earth"], fields: ["gm"], derived: ["soi_radius"], units: { ...DEFAULT_UNITS, distance: "m" } });
    expect(metres.rows[0][2]).toEqual({ formula: '=ORBIT.CONVERT_UNIT(ORBIT.SOI_RADIUS({body}), "km", "m")' });
  });

  it("writes the formulas against each row's Body cell wherever the table lands", () => {
    const plan = buildTablePlan({ bodies: ["Earth", "Mars"], fields: ["gm"], derived: ["soi_radius"], units: DEFAULT_UNITS });
    const cells = tableCells(plan, 4, 2); // table at C5: bodies in C6 and C7
    expect(cells[0]).toEqual(plan.header);
    expect(cells[1][2]).toBe("=ORBIT.SOI_RADIUS(C6)");
    expect(cells[2][2]).toBe("=ORBIT.SOI_RADIUS(C7)");
    expect(cells[1][0]).toBe("Earth");
  });

  it("recalculates in the headless runner's engine: Earth's SOI radius near 925,000 km", () => {
    // Curtis, Orbital Mechanics for Engineering Students, 3rd ed., Table 8.1: Earth's sphere of
    // influence 925,000 km (from memory); the function's own checks live in test/functions.
    const dist = resolve(__dirname, "../../dist");
    if (!existsSync(`${dist}/functions.js`)) throw new Error("dist/functions.js is missing: run `npm run build` (npm test does it)");
    const bundle = loadBundle(dist);
    const plan = buildTablePlan({ bodies: ["Sun", "Earth", "Mars"], fields: ["gm"], derived: ["soi_radius", "hill_radius"], units: DEFAULT_UNITS });
    const cells = tableCells(plan, 0, 0).map((r) => r.map((c) => (typeof c === "string" && c.startsWith("=") ? toEngineFormula(c) : c === "" ? null : c)));
    const { hf } = buildEngine(bundle, { T: cells });
    const value = (row: number, col: number) => hf.getCellValue({ sheet: 0, row, col });
    expect(value(1, 2)).toBeNull(); // the Sun: no parent, no formula
    expect(value(2, 2) as number).toBeGreaterThan(0.92e6);
    expect(value(2, 2) as number).toBeLessThan(0.93e6);
    expect(typeof value(3, 3)).toBe("number");
  });
});
