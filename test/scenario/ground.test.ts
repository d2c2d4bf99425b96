import { ecfToLookAngles, eciToEcf, gstime, propagate, twoline2satrec, type EciVec3 } from "satellite.js";
import { describe, expect, it } from "vitest";
import { parseCell } from "../../src/formula/cells";
import { layoutSheet, SCENARIO } from "../../src/scenario";
import { GROUND_CELLS as G } from "../../src/scenario/ground";
import { CONTACT, excelSerial, SKERRY_1_TLE as TLE, SKERRY_GROUND as SITE } from "../../src/scenario/story";
import { builtBundle, recalcSheet, type RecalculatedSheet } from "../support/scenario";

// The ground contact sheet, recalculated by the runner's engine with the built functions: the
// element set read back against the format's columns, the link budget against the closed forms
// of the space-mission-engineering texts, the week's passes settled by the runner inside the
// rows the sheet reserves for them, and the rises and peaks against satellite.js's own SGP4 and
// look angles.

const t = SCENARIO.find((s) => s.id === "ground")!;
const call = (id: string, ...args: unknown[]) => (builtBundle().functions.get(id)!(...args.map((a) => (a === null ? null : Array.isArray(a) ? a : [[a]]))) as unknown[][])[0][0];
const num = (s: RecalculatedSheet, ref: string) => s.value(ref) as number;
const R = 6378.137; // km, WGS 84 semi-major axis (NIMA TR8350.2, Table 3.1)
const C = 299_792.458; // km/s, exact by the SI definition of the metre
const deg = Math.PI / 180;

describe("the Skerry-1 ground contact sheet", () => {
  const s = recalcSheet(t);
  const valueRow = G.elements + 1;
  const passRows = (s.spill(`A${G.passesAt}`)?.rows ?? 0) - 1;
  const pass = (i: number, col: string) => num(s, `${col}${G.firstPass + i}`);

  it("writes the invented element set and station of the story into its inputs, and reads the element set back column by column", () => {
    expect([s.value(G.line1), s.value(G.line2)]).toEqual([TLE.line1, TLE.line2]);
    expect([s.value(G.lat), s.value(G.lon), s.value(G.height)]).toEqual([SITE.latitude, SITE.longitude, SITE.height]);
    // The two-line format's columns (Hoots and Roehrich, Spacetrack Report No. 3, 1980, and its
    // revision, Vallado et al., AIAA 2006-6753, appendix; from memory): line 1 columns 19-20 the
    // epoch year (00-56: 20xx), 21-32 the day of the year with its fraction, 54-61 B* with an
    // assumed leading decimal point and a power of ten; line 2 columns 9-16 inclination, 18-25
    // RAAN, 27-33 eccentricity with an assumed leading decimal point, 35-42 argument of perigee,
    // 44-51 mean anomaly, 53-63 mean motion (rev/day).
    const field = (line: string, from: number, to: number) => Number(line.slice(from - 1, to));
    const epoch = excelSerial(2000 + field(TLE.line1, 19, 20), 1, 1) + field(TLE.line1, 21, 32) - 1;
    const bstar = Number(`0.${TLE.line1.slice(54, 59)}e${TLE.line1.slice(59, 61)}`);
    const want = [epoch, field(TLE.line2, 9, 16), field(TLE.line2, 18, 25), Number(`0.${TLE.line2.slice(26, 33)}`), field(TLE.line2, 35, 42), field(TLE.line2, 44, 51), field(TLE.line2, 53, 63), bstar];
    const got = ["A", "B", "C", "D", "E", "F", "G", "H"].map((c) => num(s, `${c}${valueRow}`));
    got.forEach((v, i) => expect(v, `column ${i + 1}`).toBeCloseTo(want[i], 9));
    expect(num(s, G.end) - num(s, G.start)).toBe(7);
    expect(num(s, G.start)).toBe(excelSerial(...CONTACT.weekStart));
  });

  it("gives the link budget of the closed forms at the minimum elevation: slant range, path loss, coverage and the longest pass", () => {
    // Mean altitude from the mean motion by Kepler's third law, a = (mu / n²)^(1/3), with the
    // catalogue's GM (the sheet reads SGP4's mean motion as two-body: within a few km).
    const gm = call("BODY_GM", "Earth") as number;
    const n = (num(s, `G${valueRow}`) * 2 * Math.PI) / 86_400;
    const a = Math.cbrt(gm / (n * n));
    expect(num(s, G.altitude)).toBeCloseTo(a - R, 9);
    expect(Math.abs(num(s, G.altitude) - 690)).toBeLessThan(5);
    // Wertz and Larson, Space Mission Analysis and Design, 3rd ed., §5.2 and §5.3 (from memory):
    // the angular radius of the Earth sin(rho) = R / (R + H), the nadir angle sin(eta) = cos(eps)
    // sin(rho), the Earth central angle lambda = 90° - eps - eta, the range D = R sin(lambda) /
    // sin(eta), and an overhead pass lasting P (2 lambda / 360°), P the two-body period on the
    // WGS 84 sphere with WGS 84's GM, 398600.4418 km³/s² (NIMA TR8350.2, Table 3.1).
    const H = num(s, G.altitude);
    const eps = CONTACT.minElevation * deg;
    const eta = Math.asin(Math.cos(eps) * (R / (R + H)));
    const lambda = Math.PI / 2 - eps - eta;
    expect(num(s, G.halfAngle)).toBeCloseTo(lambda / deg, 9);
    expect(num(s, G.slant)).toBeCloseTo((R * Math.sin(lambda)) / Math.sin(eta), 6);
    const period = 2 * Math.PI * Math.sqrt((R + H) ** 3 / 398_600.4418);
    expect(num(s, G.longest)).toBeCloseTo((period * 2 * lambda) / (2 * Math.PI), 6);
    // ITU-R P.525-4, Eq. (4): free-space basic transmission loss 20 log10(4 pi d / lambda), lambda = c / f.
    expect(num(s, G.loss)).toBeCloseTo(20 * Math.log10((4 * Math.PI * num(s, G.slant) * CONTACT.downlinkFrequency) / C), 9);
  });

  it("lists the week's passes last, settled by the runner in a second pass, inside the rows reserved for them", () => {
    // PASSES has no size rule: the engine learns the size from the result and enters the formula again.
    expect(s.passes).toBe(2);
    expect(s.unsettled).toBe(0);
    expect(s.spill(`A${G.daily}`)).toEqual({ rows: 8, cols: 3 });
    expect(passRows).toBeGreaterThan(30);
    expect(s.spill(`A${G.passesAt}`)).toEqual({ rows: passRows + 1, cols: 5 });
    expect(passRows).toBeLessThanOrEqual(G.PASS_ROWS);
    // Nothing below the list but its reserved rows (formatted, empty), which end the sheet.
    const layout = layoutSheet(t);
    expect(layout.rows).toBe(G.lastReserved);
    const below = t.cells.filter((c) => parseCell(c.ref)!.row + 1 > G.passesAt && c.content !== "");
    expect(below).toEqual([]);
    for (let r = G.firstPass; r <= G.lastReserved; r++) expect(layout.numberFormats[r - 1].slice(0, 5), `row ${r}`).toEqual(["yyyy-mm-dd hh:mm:ss", "yyyy-mm-dd hh:mm:ss", "0.0", "yyyy-mm-dd hh:mm:ss", "0"]);
    for (let r = G.firstPass + passRows; r <= G.lastReserved; r++) expect(s.value(`A${r}`), `row ${r}`).toBeNull();
  });

  it("counts the same passes and minutes in the daily table as in the list, and finds the week's highest and longest pass in it", () => {
    expect(num(s, G.passCount)).toBe(passRows);
    let seconds = 0;
    let highest = { el: -90, rise: 0 };
    let longest = 0;
    for (let i = 0; i < passRows; i++) {
      seconds += pass(i, "E");
      if (pass(i, "C") > highest.el) highest = { el: pass(i, "C"), rise: pass(i, "A") };
      longest = Math.max(longest, pass(i, "E"));
      // Rise before the highest point before the set; the duration is set minus rise.
      expect(pass(i, "A")).toBeLessThan(pass(i, "B"));
      expect(pass(i, "B")).toBeLessThan(pass(i, "D"));
      expect(pass(i, "E")).toBeCloseTo((pass(i, "D") - pass(i, "A")) * 86_400, 6);
    }
    expect(num(s, G.weekTotal)).toBeCloseTo(seconds / 60, 9);
    expect(num(s, G.perDay)).toBeCloseTo(seconds / 60 / 7, 9);
    expect(num(s, G.highest)).toBe(highest.el);
    expect(s.value(G.highestRise)).toBe(highest.rise);
    expect(num(s, G.longestFound)).toBe(longest);
    // No pass outlasts the overhead pass by more than the Earth's turn under it (a few percent).
    expect(longest).toBeLessThan(num(s, G.longest) * 1.05);
  });

  it("has each pass rise at the minimum elevation and peak at its maximum in satellite.js's own SGP4 and look angles", () => {
    // satellite.js 6.0.2, used here only through its own propagate, gstime (GMST, IAU 1982),
    // eciToEcf and ecfToLookAngles (WGS 84 site): an independent route to the elevation.
    const rec = twoline2satrec(TLE.line1, TLE.line2);
    const site = { latitude: SITE.latitude * deg, longitude: SITE.longitude * deg, height: SITE.height };
    const elevation = (serial: number) => {
      const when = new Date(Math.round((serial - 25569) * 86_400_000));
      const pv = propagate(rec, when);
      if (!pv || typeof pv.position !== "object") throw new Error(`satellite.js could not propagate to ${when.toISOString()}`);
      const ecf = eciToEcf(pv.position as EciVec3<number>, gstime(when));
      return ecfToLookAngles(site, ecf).elevation / deg;
    };
    // Measured: within 0.0001° at every rise, set and peak; asserted 0.001°.
    let worst = 0;
    for (let i = 0; i < passRows; i++) {
      // A pass cut at the window's start or end rises or sets at the edge, above the minimum.
      if (pass(i, "A") > num(s, G.start)) worst = Math.max(worst, Math.abs(elevation(pass(i, "A")) - CONTACT.minElevation));
      if (pass(i, "D") < num(s, G.end)) worst = Math.max(worst, Math.abs(elevation(pass(i, "D")) - CONTACT.minElevation));
      worst = Math.max(worst, Math.abs(elevation(pass(i, "B")) - pass(i, "C")));
    }
    expect(worst).toBeLessThan(0.001);
  });
});
