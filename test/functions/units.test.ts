import "../support/customFunctions";
import { describe, expect, it } from "vitest";
import { convertUnit as coreConvert } from "../../src/core/units";
import * as family from "../../src/functions/units";
import { code, msg, only, sheet } from "./cells";

/** The family's functions as a test calls them: bare values stand for single cells. */
const { convertUnit } = sheet(family);

// Family "Units" at the sheet level: CONVERT_UNIT gives the core's conversion, lifts over ranges of
// values and of unit names, and explains an unknown unit or a mismatched pair with what is accepted.

const ALL =
  "length km, m, au, ft, mi, nmi; time s, min, h, day, yr; speed km/s, m/s, km/h; gravitational parameter km3/s2, m3/s2; angle deg, rad, arcmin, arcsec; mass kg, lb (other spellings are read too, such as days, hr, km^3/s^2)";

describe("CONVERT_UNIT", () => {
  it("takes the au as exactly 149,597,870.7 km (IAU 2012 Resolution B2) and the Julian year as 365.25 days (IAU)", () => {
    expect(only(convertUnit(1, "au", "km"))).toBe(149597870.7);
    expect(only(convertUnit(1, "AU", " m "))).toBe(149597870700);
    expect(only(convertUnit(1, "yr", "day"))).toBe(365.25);
  });

  it("equals the core's conversion, down a column of values and across a row of units", () => {
    const values = [690, 7068.137, -1.5, 0];
    const out = convertUnit(values.map((v) => [v]), "km", [["m", "au", "km"]]);
    expect(out).toEqual(values.map((v) => ["m", "au", "km"].map((u) => coreConvert(v, "km", u))));
    expect(only(convertUnit(398600.4418, "km3/s2", "m3/s2"))).toBe(coreConvert(398600.4418, "km3/s2", "m3/s2"));
    expect(only(convertUnit(98.15, "deg", "rad"))).toBe(coreConvert(98.15, "deg", "rad"));
  });

  it("is #VALUE! listing the accepted units for an unknown or missing unit, and the right ones for a mismatch", () => {
    expect(msg(only(convertUnit(1, "furlong", "m")))).toBe(`from: got "furlong"; expected a unit name: ${ALL}.`);
    expect(msg(only(convertUnit(1, 5, "m")))).toBe(`from: got 5; expected a unit name: ${ALL}.`);
    expect(msg(only(convertUnit(1, "km", null)))).toBe(`to: got (blank); expected a unit name: ${ALL}.`);
    const mismatch = only(convertUnit(1, "km", "s"));
    expect(code(mismatch)).toBe("#VALUE!");
    expect(msg(mismatch)).toBe('to: got "s"; expected a unit of length like "km": one of km, m, au, ft, mi, nmi.');
    expect(msg(only(convertUnit("x", "km", "m")))).toMatch(/^value: got "x";/);
  });
});
