import "../support/customFunctions";
import { describe, expect, it } from "vitest";
import { findBody } from "../../src/catalogue/lookup";
import type { Body } from "../../src/catalogue/types";
import { atmosphereDensity as coreDensity } from "../../src/core/atmosphere";
import { ballisticCoefficient as coreB } from "../../src/core/ballistic";
import { decayRate as coreDecay } from "../../src/core/decayrate";
import { disposalPerigee as coreDisposal } from "../../src/core/disposal";
import { isDomainError } from "../../src/core/domain";
import { orbitLifetime as coreLifetime } from "../../src/core/lifetime";
import { dragMakeupDv as coreMakeup } from "../../src/core/makeupdv";
import { EXCEL_SERIAL_TO_JD } from "../../src/core/time";
import * as family from "../../src/functions/drag";
import { code, msg, only, sheet } from "./cells";

/** The family's functions as a test calls them: bare values stand for single cells. */
const { atmosphereDensity, ballisticCoefficient, decayRate, disposalPerigee, dragMakeupDv, orbitLifetime } = sheet(family);

// Family "Drag and lifetime" at the sheet level: the worksheet functions called from source give
// the core's numbers with the catalogue's Earth, lift a column against a row into a table, read
// a forecast range whole and share it among the cases, and refuse impossible altitudes with a
// reason (an altitude typed as a distance from the centre is named as the likely slip).

const earth = findBody("Earth");
if (isDomainError(earth)) throw new Error(earth.message);
const EARTH: Body = earth;
const GM = EARTH.gm.value; // DE440
const R = EARTH.equatorialRadius.value; // JPL SSD
const jdOf = (serial: number) => serial + EXCEL_SERIAL_TO_JD; // serials from 1900-03-01 on
const DAY = 86400;

describe("the sheet gives the core's answers with the catalogue's Earth", () => {
  it("for all six functions, cell for cell", () => {
    for (const [h, f, fa, ap, m] of [[690, 150, 150, 15, null], [400, 70, null, null, "exponential"], [250, 220, 180, 40, "nrlmsise-00"]] as const) {
      expect(only(atmosphereDensity(h, f, fa, ap, m))).toBe(coreDensity(h, f, fa, ap, m));
      expect(only(decayRate(h, 68.18, f, fa, m))).toBe(coreDecay(GM, R, h, 68.18, f, fa, m));
      expect(only(dragMakeupDv(h, 68.18, 5 * 365.25 * DAY, f, fa, m))).toBe(coreMakeup(GM, R, h, 68.18, 5 * 365.25 * DAY, f, fa, m));
    }
    expect(only(ballisticCoefficient(180, 1.2))).toBe(coreB(180, 1.2, null));
    expect(only(orbitLifetime(250, 690, 68.18, 150, 46388))).toBe(coreLifetime(GM, R, 250, 690, 68.18, 150, jdOf(46388), null, null));
    expect(only(orbitLifetime(300, 320, 40, null, null, "exponential", 120))).toBe(coreLifetime(GM, R, 300, 320, 40, null, null, "exponential", 120));
    expect(only(disposalPerigee(690, 68.18, 1826.25, 150))).toBe(coreDisposal(GM, R, 690, 68.18, 1826.25, 150, null, null));
  });

  it("reproduce Vallado's exponential table at its base altitudes, and the decay and make-up formulas built on it", () => {
    // Vallado, Fundamentals of Astrodynamics and Applications, 4th ed., Table 8-4: nominal densities
    // at the base altitudes 300, 500 and 700 km.
    for (const [h, rho] of [[300, 2.418e-11], [500, 6.967e-13], [700, 3.614e-14]]) expect(only(atmosphereDensity(h, null, null, null, "exponential"))).toBe(rho);
    // Circular decay |da/dt| = (rho / B) sqrt(mu a) and make-up delta-v (1/2) rho v^2 / B x t,
    // recomputed here from the table's 400 km density (3.725e-12 kg/m^3); B in kg/m^2, so rho / B
    // is per metre (x 1000 per km).
    const rho = 3.725e-12;
    const a = R + 400;
    expect(only(decayRate(400, 50, null, null, "exponential"))).toBeCloseTo(((1000 * rho) / 50) * Math.sqrt(GM * a) * DAY, 15);
    const v = Math.sqrt(GM / a) * 1000; // m/s
    expect(only(dragMakeupDv(400, 50, 365.25 * DAY, null, null, "exponential"))).toBeCloseTo((((0.5 * rho * v * v) / 50) * 365.25 * DAY) / 1000, 12);
  });

  it("BALLISTIC_COEFFICIENT is m / (C_D A), with C_D 2.2 when omitted", () => {
    expect(only(ballisticCoefficient(180, 1.2))).toBeCloseTo(180 / (2.2 * 1.2), 12);
    expect(only(ballisticCoefficient(180, 1.2, 2.5))).toBeCloseTo(60, 12);
  });

  it("the model is a closed choice: case-insensitive, nrlmsise-00 when omitted, anything else refused with the choices", () => {
    expect(only(atmosphereDensity(500, 150))).toBe(only(atmosphereDensity(500, 150, null, null, "nrlmsise-00")));
    expect(only(atmosphereDensity(500, 150, null, null, " Exponential "))).toBe(6.967e-13);
    const bad = only(orbitLifetime(400, 400, 50, 150, null, "jacchia"));
    expect(code(bad)).toBe("#VALUE!");
    expect(msg(bad)).toMatch(/^model: got "jacchia"; expected one of "nrlmsise-00", "exponential"\./);
  });
});

describe("lifting", () => {
  const perigees = [[300], [400], [500]];
  const bs = [[20, 68.18]];

  it("a column of perigee altitudes against a row of ballistic coefficients is the lifetime table", () => {
    const t = orbitLifetime(perigees, perigees, bs, 150);
    expect(t.length).toBe(3);
    t.forEach((r, i) => expect(r).toEqual(bs[0].map((b) => coreLifetime(GM, R, perigees[i][0], perigees[i][0], b, 150, null, null, null))));
  });

  it("a row of flux levels (low, moderate, high) against a column of altitudes is a table of decay rates", () => {
    const t = decayRate(perigees, 68.18, [[70, 150, 220]]);
    t.forEach((r, i) => expect(r).toEqual([70, 150, 220].map((f) => coreDecay(GM, R, perigees[i][0], 68.18, f, null, null))));
  });

  it("one bad case errors its own cell only", () => {
    const t = orbitLifetime([[400], [-5], [500]], [[400], [400], [500]], 50);
    expect(typeof t[0][0]).toBe("number");
    expect(code(t[1][0])).toBe("#VALUE!");
    expect(msg(t[1][0])).toMatch(/^perigee_altitude: got -5;/);
    expect(typeof t[2][0]).toBe("number");
  });
});

describe("solar_flux as a forecast range", () => {
  // An invented rising-then-falling forecast (illustration only): serials of 2027-01-01 on.
  const serials = [46388, 46753, 47119, 47484, 47849];
  const values = [120, 170, 210, 180, 130];
  const forecast = serials.map((d, i) => [d, values[i]]);
  const asJd = serials.map((d, i) => [jdOf(d), values[i]]);

  it("is one argument shared by every case: a column of perigees gives a column, each the core's lifetime with that forecast", () => {
    const perigees = [[350], [420], [480]];
    const t = orbitLifetime(perigees, perigees, 50, forecast, 46388);
    expect(t.map((r) => r.length)).toEqual([1, 1, 1]);
    t.forEach((r, i) => expect(r[0]).toBe(coreLifetime(GM, R, perigees[i][0], perigees[i][0], 50, asJd, jdOf(46388), null, null)));
  });

  it("with a column of perigees and a row of B it still makes the whole table", () => {
    const t = orbitLifetime([[350], [450]], [[350], [450]], [[20, 50, 100]], forecast);
    expect(t.length).toBe(2);
    expect(t[1]).toEqual([20, 50, 100].map((b) => coreLifetime(GM, R, 450, 450, b, asJd, null, null, null)));
  });

  it("drops trailing blank rows, reads ISO 8601 dates as the sheet does, and DISPOSAL_PERIGEE takes it too", () => {
    const base = only(orbitLifetime(420, 420, 50, forecast));
    expect(only(orbitLifetime(420, 420, 50, [...forecast, [null, null], [0, 0], ["", ""]]))).toBe(base);
    const iso = forecast.map(([d, f]) => [new Date(Date.UTC(1899, 11, 30) + d * 86400000).toISOString().slice(0, 10), f]);
    expect(iso[0][0]).toBe("2027-01-01");
    expect(only(orbitLifetime(420, 420, 50, iso))).toBe(base);
    expect(only(disposalPerigee(690, 68.18, 1826.25, forecast, 46388))).toBe(coreDisposal(GM, R, 690, 68.18, 1826.25, asJd, jdOf(46388), null));
  });

  it("the start date matters against a forecast: starting a year later meets a different Sun", () => {
    const now = only(orbitLifetime(420, 420, 50, forecast, 46388));
    const later = only(orbitLifetime(420, 420, 50, forecast, "2028-01-01"));
    expect(later).not.toBe(now);
    expect(later).toBe(coreLifetime(GM, R, 420, 420, 50, asJd, jdOf(46753), null, null));
  });

  it("refuses a header row, dates out of order and a blank range with #VALUE! naming solar_flux, in every case", () => {
    const header = orbitLifetime([[400], [500]], [[400], [500]], 50, [["Date", "F10.7"], ...forecast]);
    for (const [c] of header) {
      expect(code(c)).toBe("#VALUE!");
      expect(msg(c)).toMatch(/^solar_flux: got row 1 \("Date", "F10\.7"\); expected .*without a header\./);
    }
    const swapped = only(orbitLifetime(400, 400, 50, [forecast[1], forecast[0]]));
    expect(msg(swapped)).toMatch(/^solar_flux: got row 2 \(46388, 120\); expected .*not later than row 1's\./);
    const blank = only(orbitLifetime(400, 400, 50, [[null, null], [null, null]]));
    expect(code(blank)).toBe("#VALUE!");
    expect(msg(blank)).toMatch(/^solar_flux: got a range of blank cells;/);
    const text = only(orbitLifetime(400, 400, 50, [[46388, "high"]]));
    expect(msg(text)).toMatch(/^solar_flux: got row 1 \(46388, "high"\); expected .*the second cell is not a number\./);
  });

  it("a two-column range of flux values (first cell up to 500 sfu) is not a forecast: it lifts case by case", () => {
    const pair = orbitLifetime(450, 450, 50, [[70, 220]]);
    expect(pair).toEqual([[coreLifetime(GM, R, 450, 450, 50, 70, null, null, null), coreLifetime(GM, R, 450, 450, 50, 220, null, null, null)]]);
    const grid = orbitLifetime([[400, 500], [400, 500]], [[400, 500], [400, 500]], 50, [[100, 150], [200, 250]]);
    expect(grid[1][0]).toBe(coreLifetime(GM, R, 400, 400, 50, 200, null, null, null));
  });
});

describe("altitudes: impossible ones refused with a reason, a distance from the centre named as the likely slip", () => {
  it("an altitude typed as a radius (6878 km for a 500 km orbit) is #N/A with the range and the hint", () => {
    for (const c of [only(atmosphereDensity(6878)), only(decayRate(6878, 50)), only(dragMakeupDv(6878, 50, DAY)), only(orbitLifetime(6878, 6878, 50))]) {
      expect(code(c)).toBe("#N/A");
      expect(msg(c)).toMatch(/^(altitude|perigee_altitude): 6878 km is above the 0-1000 km range of the density models; an altitude is measured above Earth's equatorial radius, not from the centre \(6878 km from the centre is 499\.863 km up\)\.$/);
    }
  });

  it("above the range but not a likely radius: #N/A with the range only", () => {
    for (const h of [1500, 9000]) {
      const c = only(atmosphereDensity(h));
      expect(code(c)).toBe("#N/A");
      expect(msg(c)).toBe(`altitude: ${h} km is above the 0-1000 km range of the nrlmsise-00 density model.`);
    }
  });

  it("negative altitudes and an apogee below the perigee are #VALUE! naming them", () => {
    expect(msg(only(atmosphereDensity(-1)))).toMatch(/^altitude: got -1; expected an altitude of 0 km or more/);
    expect(msg(only(orbitLifetime(500, 400, 50)))).toMatch(/^apogee_altitude: got 400; expected an apogee altitude in km at or above the perigee altitude \(500 km\)\./);
    expect(msg(only(disposalPerigee(-10, 50, 1826.25)))).toMatch(/^apogee_altitude: got -10;/);
  });

  it("a lifetime past the 200-year cap is #N/A saying so", () => {
    const c = only(orbitLifetime(800, 800, 200, 70));
    expect(code(c)).toBe("#N/A");
    expect(msg(c)).toMatch(/200-year cap/);
  });
});
