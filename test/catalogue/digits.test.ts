import { describe, expect, it } from "vitest";
import { BODIES } from "../../src/catalogue/bodies";
import { printedDigits, sourceDigits } from "../../src/catalogue/digits";
import type { Sourced } from "../../src/catalogue/types";

const body = (name: string) => BODIES.find((b) => b.name === name)!;

describe("printedDigits", () => {
  it.each([
    [6378.1366, 8], // JPL SSD Earth equatorial radius
    [695700, 4], // IAU 2015 B3 nominal solar radius 6.957e8 m
    [0.0554, 3], // JPL SSD Moon eccentricity
    [2.2031868551400003e4, 12], // gm_de440.tpc BODY199 prints 2.2031868551400003E+04: 22031.8685514
    [5.7945563999999985e6, 8], // gm_de440.tpc BODY7 prints 5.7945563999999985E+06: 5794556.4
    [3.24858592e5, 9], // gm_de440.tpc BODY299
    [1.3271244004127942e11, 15], // 17 digits printed; Excel shows 15
    [-243.018, 6], // JPL SSD Venus rotation, days
    [0, 1],
  ])("%s has %i significant digits", (x, n) => {
    expect(printedDigits(x)).toBe(n);
  });
});

describe("sourceDigits of catalogue values", () => {
  // Values the catalogue stores in another unit or computes keep the digits their source prints:
  // rounded to them, in the source's unit, each gives back the printed (or computed) number.
  const cases: [string, (b: (typeof BODIES)[number]) => Sourced | undefined, number, number, number, string][] = [
    ["Earth", (b) => b.rotationPeriod, 8, 86400, 0.99726968, "JPL SSD sidereal rotation, d"],
    ["Mercury", (b) => b.rotationPeriod, 6, 86400, 58.6462, "JPL SSD, d"],
    ["Sun", (b) => b.rotationPeriod, 6, 86400, 25.38, "360 / 14.1844 deg/day (WGCCRE 2009 W-dot) = 25.3800 d"],
    ["Moon", (b) => b.rotationPeriod, 6, 3600, 655.728, "NSSDC, h"],
    ["Mars", (b) => b.orbit?.sma, 9, 149597870.7, 1.52371034, "Standish a, au"],
    ["Moon", (b) => b.orbit?.period, 8, 86400, 27.321662, "360 / 13.176358 deg/day (JPL mean motion), d"],
    ["Earth", (b) => b.j2, 15, 1, 0.00108262617385222, "-sqrt(5) x EGM2008 C20bar -0.484165143790815e-3"],
    ["Titania", (b) => b.orbit?.period, 7, 86400, 8.705869, "JPL URA182 P, d"],
    ["Sun", (b) => b.equatorialRadius, 4, 1, 695700, "IAU 2015 B3 6.957e8 m, in km"],
  ];
  it.each(cases)("%s: %i digits", (name, pick, digits, unit, printed) => {
    const s = pick(body(name))!;
    expect(sourceDigits(s)).toBe(digits);
    expect(Number((s.value / unit).toPrecision(digits))).toBe(printed);
  });

  it("Earth's sidereal day shows the source's 0.99726968 d, not the 11 digits of its value in seconds", () => {
    const s = body("Earth").rotationPeriod!;
    expect(printedDigits(s.value)).toBeGreaterThan(8);
    expect(Number((s.value / 86400).toPrecision(sourceDigits(s)))).toBe(0.99726968);
  });

  it("every catalogue value has between 1 and 15 digits", () => {
    const all: Sourced[] = [];
    const walk = (x: unknown) => {
      if (x && typeof x === "object") {
        const o = x as Record<string, unknown>;
        if (typeof o.value === "number" && typeof o.source === "string") all.push(o as unknown as Sourced);
        else Object.values(o).forEach(walk);
      }
    };
    BODIES.forEach(walk);
    for (const s of all) expect(sourceDigits(s)).toBeGreaterThanOrEqual(1);
    for (const s of all) expect(sourceDigits(s)).toBeLessThanOrEqual(15);
  });
});
