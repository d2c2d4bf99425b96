import Decimal from "decimal.js";
import { describe, expect, it } from "vitest";
import { isDomainError } from "../../src/core/domain";
import { AU_KM, convertUnit, UNIT_NAMES } from "../../src/core/units";

const num = (x: unknown): number => {
  if (isDomainError(x)) throw new Error(x.message);
  return x as number;
};

describe("unit definitions", () => {
  it("takes the au as exactly 149,597,870.7 km (IAU 2012 Resolution B2)", () => {
    expect(num(convertUnit(1, "au", "km"))).toBe(149597870.7);
    expect(num(convertUnit(1, "au", "m"))).toBe(149597870700);
    expect(num(convertUnit(149597870700, "m", "au"))).toBe(1);
    expect(AU_KM * 1000).toBe(149597870700); // the exported constant is the same au, exactly
  });
  it("takes the Julian year as 365.25 days of 86,400 s (IAU)", () => {
    expect(num(convertUnit(1, "yr", "day"))).toBe(365.25);
    expect(num(convertUnit(1, "yr", "s"))).toBe(31557600);
    expect(num(convertUnit(1, "day", "h"))).toBe(24);
    expect(num(convertUnit(90, "min", "h"))).toBe(1.5);
  });
  it("converts GM between km3/s2 and m3/s2 by 1e9 (WGS 84 GM 3986004.418e8 m3/s2, NIMA TR8350.2)", () => {
    expect(num(convertUnit(3986004.418e8, "m3/s2", "km3/s2"))).toBe(398600.4418);
    expect(num(convertUnit(398600.4418, "km3/s2", "m3/s2"))).toBe(3.986004418e14);
  });
  it("converts speeds and lengths by 1000", () => {
    expect(num(convertUnit(7.784, "km/s", "m/s"))).toBe(7784);
    expect(num(convertUnit(465.1, "m/s", "km/s"))).toBe(0.4651);
    expect(num(convertUnit(6378.137, "km", "m"))).toBe(6378137);
  });
  it("converts angles exactly as the core's own toRadians / toDegrees", () => {
    expect(num(convertUnit(180, "deg", "rad"))).toBe(Math.PI);
    expect(num(convertUnit(Math.PI / 2, "rad", "deg"))).toBe(90);
  });
});

describe("conversion accuracy", () => {
  it("is within two roundings (1.5 |x| eps) of a 40-digit recomputation for every pair of a quantity", () => {
    const D = Decimal.clone({ precision: 40 });
    const pi = D.acos(-1);
    const groups: Record<string, Decimal>[] = [
      // ft, mi: international yard (1959); nmi: international nautical mile (1929); lb: international pound (1959).
      { km: new D(1000), m: new D(1), au: new D("149597870700"), ft: new D("0.3048"), mi: new D("1609.344"), nmi: new D(1852) },
      { s: new D(1), min: new D(60), h: new D(3600), day: new D(86400), yr: new D(31557600) },
      { "km/s": new D(1000), "m/s": new D(1), "km/h": new D(1).div(new D("3.6")) },
      { "km3/s2": new D(1e9), "m3/s2": new D(1) },
      { deg: pi.div(180), rad: new D(1), arcmin: pi.div(180 * 60), arcsec: pi.div(180 * 3600) },
      { kg: new D(1), lb: new D("0.45359237") },
    ];
    const values = [1, 0.1, 123.456, 6378.137, 1e-200, 2.5e300 / 1.5e11, -42.75, 86164.0905];
    for (const g of groups)
      for (const from of Object.keys(g))
        for (const to of Object.keys(g))
          for (const v of values) {
            const ref = new D(v).mul(g[from]).div(g[to]);
            const got = num(convertUnit(v, from, to));
            const ulp = 1.5 * Math.abs(ref.toNumber()) * Number.EPSILON; // value * factor, then / factor: two correctly rounded operations
            expect(new D(got).minus(ref).abs().toNumber()).toBeLessThanOrEqual(ulp);
          }
  });
});

describe("unit names and errors", () => {
  it("reads names case-insensitively and ignores surrounding spaces", () => {
    expect(num(convertUnit(1, " AU ", "KM"))).toBe(149597870.7);
    expect(num(convertUnit(1, "Day", "MIN"))).toBe(1440);
    expect(num(convertUnit(1, "KM3/S2", "M3/s2"))).toBe(1e9);
  });
  it("refuses an unknown unit on the side where it appears, listing the accepted ones", () => {
    const f = convertUnit(1, "furlong", "m");
    expect(isDomainError(f) && f.kind === "bad_argument" && f.parameter === "from").toBe(true);
    expect(isDomainError(f) && f.message.includes("length km, m, au, ft, mi, nmi; time s, min, h, day, yr; speed km/s, m/s, km/h")).toBe(true);
    const t = convertUnit(1, "m", "parsec");
    expect(isDomainError(t) && t.parameter === "to").toBe(true);
    const n = convertUnit(1, 42 as unknown as string, "m");
    expect(isDomainError(n) && n.parameter === "from").toBe(true);
  });
  it("refuses an incompatible pair, naming the units of the source's quantity", () => {
    const e = convertUnit(1, "km", "s");
    expect(isDomainError(e) && e.parameter === "to" && e.message.includes("km, m, au")).toBe(true);
    const g = convertUnit(1, "km3/s2", "km/s");
    expect(isDomainError(g) && g.message.includes("gravitational parameter")).toBe(true);
  });
  it("refuses a non-finite value and reports overflow as #NUM!", () => {
    const v = convertUnit(NaN, "km", "m");
    expect(isDomainError(v) && v.parameter === "value").toBe(true);
    const o = convertUnit(1e300, "au", "m");
    expect(isDomainError(o) && o.kind === "arithmetic").toBe(true);
  });
});

describe("the list of unit names", () => {
  it("names exactly the units convertUnit accepts, each converting to itself", () => {
    const names = UNIT_NAMES.split("; ").flatMap((q) => q.replace(/^[a-z ]+? (?=[a-z°]+(,|$)|km|m\/|m3)/, "").split(", "));
    expect(names).toEqual(["km", "m", "au", "ft", "mi", "nmi", "s", "min", "h", "day", "yr", "km/s", "m/s", "km/h", "km3/s2", "m3/s2", "deg", "rad", "arcmin", "arcsec", "kg", "lb"]);
    for (const u of names) expect(convertUnit(2.5, u, u)).toBe(2.5);
  });
});

describe("the spellings people type", () => {
  it("reads day/days/d, h/hr/hour, km3/s2 in every written form, deg/degrees/°, kg/lb as the same units", () => {
    for (const d of ["day", "days", "d", "Days"]) expect(num(convertUnit(1, d, "h"))).toBe(24);
    for (const h of ["h", "hr", "hrs", "hour", "hours"]) expect(num(convertUnit(2, h, "min"))).toBe(120);
    for (const g of ["km3/s2", "km^3/s^2", "km³/s²", "KM^3/S^2"]) expect(num(convertUnit(398600.4418, g, "m3/s2"))).toBe(3.986004418e14);
    for (const a of ["deg", "degrees", "°"]) expect(num(convertUnit(180, a, "rad"))).toBe(Math.PI);
    expect(num(convertUnit(1, "arcsec", "deg"))).toBe(1 / 3600);
    expect(num(convertUnit(100, "lb", "kg"))).toBe(45.359237); // the international pound, 0.45359237 kg exactly (1959)
    expect(num(convertUnit(1, "nmi", "km"))).toBe(1.852); // the international nautical mile, 1852 m exactly
    expect(num(convertUnit(36, "km/h", "m/s"))).toBe(10);
    expect(num(convertUnit(1, "mi", "ft"))).toBe(5280);
  });
  it("lists the units of the source's quantity when the target is unknown", () => {
    const e = convertUnit(1, "km", "furlong");
    expect(isDomainError(e) && e.parameter === "to" && e.message.startsWith('to: got "furlong"; expected a unit of length: one of km, m, au, ft, mi, nmi')).toBe(true);
    const m = convertUnit(1, "kg", "stone");
    expect(isDomainError(m) && m.message.includes("one of kg, lb")).toBe(true);
  });
});
