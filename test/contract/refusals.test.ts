import { describe, expect, it } from "vitest";
import { CellError } from "../../src/runner/host";
import { builtBundle, excelArg } from "./bundle";

// The mistakes people make in real sheets, each called through the BUILT bundle as Excel calls
// it: every one is a typed cell error whose message says what is wrong and what was probably
// meant (README.md, "Conventions", lists these refusals). The numbers are the Skerry scenario's
// (DEVELOPERS.md) or plain slips of unit; Earth's radius is the catalogue's 6378.1366 km.
const bundle = builtBundle();
const call = (id: string, ...args: unknown[]): unknown[][] => bundle.functions.get(id)!(...args.map(excelArg)) as unknown[][];
/** The one error cell of a call (every cell of a several-values row carries the same error). */
function refusal(id: string, ...args: unknown[]): CellError {
  const cells = call(id, ...args).flat();
  const errors = cells.filter((c): c is CellError => c instanceof CellError);
  expect(errors.length, `${id} gave ${JSON.stringify(cells)}`).toBe(cells.filter((c) => typeof c !== "string" || c === "").length);
  return errors[0];
}
const expectRefusal = (e: CellError, code: string, message: RegExp) => {
  expect(e.code).toBe(code);
  expect(e.message).toMatch(message);
};

describe("an altitude typed where a radius belongs", () => {
  it("ORBITAL_SPEED(\"Earth\", 500) says 500 km is inside Earth and gives the radius of that altitude", () => {
    expect(refusal("ORBITAL_SPEED", "Earth", 500).message).toBe(
      "radius: got 500 km, inside Earth (radius 6378.1366 km). Radii are from the centre: an altitude of 500 km is a radius of 6878.1366 km; ALTITUDE_TO_RADIUS converts.",
    );
  });

  it("TRANSFER_DV, ESCAPE_SPEED, PERIOD_FROM_SMA, DEPARTURE_DV and CAPTURE_DV refuse the same slip, naming the parameter", () => {
    expectRefusal(refusal("TRANSFER_DV", "Earth", 520, 690), "#VALUE!", /^radius_from: got 520 km, inside Earth .* a radius of 6898.1366 km/);
    expectRefusal(refusal("ESCAPE_SPEED", "Earth", 100), "#VALUE!", /^radius: got 100 km, inside Earth/);
    expectRefusal(refusal("PERIOD_FROM_SMA", "Earth", 690), "#VALUE!", /^sma: got 690 km, inside Earth .* an sma of 7068.1366 km/);
    expectRefusal(refusal("DEPARTURE_DV", "Earth", 300, 3), "#VALUE!", /^parking_radius: got 300 km, inside Earth .* 6678.1366 km/);
    expectRefusal(refusal("CAPTURE_DV", "Mars", 100, 2.6), "#VALUE!", /^periapsis_radius: got 100 km, inside Mars \(radius 3396.19 km\).* 3496.19 km/);
  });

  it("a thousands separator that splits 6,898 into two arguments is refused, not read as radius 6 km", () => {
    expectRefusal(refusal("ORBITAL_SPEED", "Earth", 6, 898), "#VALUE!", /^radius: got 6 km, inside Earth/);
    expectRefusal(refusal("TRANSFER_DV", "Earth", 6, 898, 7, 68), "#VALUE!", /^via_radius: got 1 more argument after it; expected at most 4 arguments \(body, radius_from, radius_to, via_radius\); a comma inside a number, as in 6,898, splits it into two arguments: type 6898\.$/);
  });

  it("an sma that is an altitude gives no orbit anywhere: SPECIFIC_ENERGY, TIME_OF_FLIGHT, TRUE_ANOMALY_AT_TIME, STATE_FROM_ELEMENTS", () => {
    expectRefusal(refusal("SPECIFIC_ENERGY", "Earth", 690), "#VALUE!", /^sma: got 690 km, an orbit that even at its most eccentric reaches at most 1380 km from the centre, inside Earth/);
    expectRefusal(refusal("TIME_OF_FLIGHT", "Earth", 690, 0.001, 0, 180), "#VALUE!", /^sma: got 690 km, an orbit that reaches at most 690.69 km .*an sma of 7068.1366 km/);
    expectRefusal(refusal("TRUE_ANOMALY_AT_TIME", "Earth", 690, 0.001, 0, 600), "#VALUE!", /^sma: got 690 km/);
    expectRefusal(refusal("STATE_FROM_ELEMENTS", "Earth", 690, 0.001, 98.2, 40, 90, 30), "#VALUE!", /^sma: got 690 km, which puts the position 689.402 km from the centre, inside Earth .*an sma of 7068.1366 km/);
    // A ballistic arc (sma below the radius, apoapsis above it) is a real trajectory and stays answered.
    expect(typeof call("TIME_OF_FLIGHT", "Earth", 4500, 0.6, 150, 210)[0][0]).toBe("number");
  });

  it("J2 functions refuse an orbit whose periapsis a(1 - e) is inside the body", () => {
    expectRefusal(refusal("NODAL_PRECESSION", "Earth", 7068.137, 0.2, 98), "#VALUE!", /^sma: got 7068.137; expected a semi-major axis whose periapsis a\(1 - e\) = 5654.5096 km clears the body radius/);
    expectRefusal(refusal("APSIDAL_PRECESSION", "Earth", 690, 0.001, 98), "#VALUE!", /^sma: got 690 km, inside Earth/);
  });

  it("SMA_FROM_PERIOD with a period in minutes or hours says periods are in seconds", () => {
    expect(refusal("SMA_FROM_PERIOD", "Earth", 95).message).toBe(
      "period: got 95 s, the period of an orbit with an sma of 450 km, inside Earth (radius 6378.1366 km). Periods are in seconds: 95 minutes is 5700 s, 95 hours is 342000 s.",
    );
    expectRefusal(refusal("SMA_FROM_PERIOD", "Mars", 1.88), "#VALUE!", /^period: got 1.88 s/);
    expect(typeof call("SMA_FROM_PERIOD", "Earth", 5700)[0][0]).toBe("number");
  });

  it("PHASING_ORBIT whose lower phasing orbit would hit the body names the fewest revolutions that clear it", () => {
    // 690 km circle (radius 7068.137 km), target 150 deg ahead: in one revolution the phasing
    // orbit's periapsis falls inside Earth.
    expectRefusal(refusal("PHASING_ORBIT", "Earth", 7068.137, 150, 1), "#N/A", /^revolutions: catching a target 150 deg ahead in 1 revolution needs a phasing orbit whose periapsis, [\d,.]+ km from the centre, is inside Earth .*; \d+ revolutions or more clear the surface/);
    const fewest = Number(/; (\d+) revolutions or more/.exec(refusal("PHASING_ORBIT", "Earth", 7068.137, 150, 1).message!)![1]);
    expect(typeof call("PHASING_ORBIT", "Earth", 7068.137, 150, fewest)[0][0]).toBe("number");
    expect(call("PHASING_ORBIT", "Earth", 7068.137, 150, fewest - 1)[0][0]).toBeInstanceOf(CellError);
  });

  it("REPEAT_TRACK_SMA with revolutions and days swapped into an orbit inside the body is #N/A saying so", () => {
    expectRefusal(refusal("REPEAT_TRACK_SMA", "Earth", 175, 1, 0.001, 98), "#N/A", /^revolutions: 175 revolutions in 1 nodal day needs sma 1347.674 km, whose periapsis lies inside the body .*not swapped/);
  });
});

describe("a delta-v in m/s where km/s belongs, and other impossible mass ratios", () => {
  it("PROPELLANT_MASS(92, 225, 150) is #N/A: 92 km/s needs a mass ratio of 1.3e18; 92 m/s is 0.092", () => {
    expectRefusal(refusal("PROPELLANT_MASS", 92, 225, 150), "#N/A", /^dv: 92 km\/s at an Isp of 225 s needs a mass ratio of 1\.3e18; no single stage exceeds about 16 .*; delta-v is in km\/s — 92 m\/s is 0\.092\.$/);
  });

  it("MASS_RATIO(1000, 1) is #N/A with a message, not a bare #NUM!", () => {
    expectRefusal(refusal("MASS_RATIO", 1000, 1), "#N/A", /^dv: 1000 km\/s at an Isp of 1 s needs a mass ratio of more than 1\.8e308/);
  });

  it("an exhaust speed typed where the specific impulse belongs is named", () => {
    expectRefusal(refusal("MASS_RATIO", 0.5, 2.2), "#N/A", /specific impulse is in s — an exhaust speed of 2\.2 km\/s is an Isp of 224\.3 s/);
  });

  it("ROCKET_DV with the final mass in tonnes and BURN_SEQUENCE with burns in m/s", () => {
    expectRefusal(refusal("ROCKET_DV", 225, 180, 0.1725), "#N/A", /^final_mass: initial_mass is 1040 times final_mass; .* check that both masses are in kg/);
    const rows = call("BURN_SEQUENCE", [[45.8], [45.9], [105], [121]], 225, 180, 150);
    expect(rows.map((r) => (r[0] as CellError).code)).toEqual(["#N/A", "#N/A", "#N/A", "#N/A"]);
    expect((rows[0][0] as CellError).message).toMatch(/^dvs: burn 1, 45.8 km\/s at an Isp of 225 s, needs a mass ratio of 1.0e9; .* 45.8 m\/s is 0.0458\.$/);
    expect((rows[3][0] as CellError).message).toBe("dvs: burn 4 follows burn 1, which needs a mass ratio no single vehicle reaches.");
  });
});

describe("physically meaningless pairs", () => {
  it("ECLIPSE_DURATION(\"Sun\", 1e6, 0): the Sun casts no shadow of its own", () => {
    expectRefusal(refusal("ECLIPSE_DURATION", "Sun", 1e6, 0), "#VALUE!", /^body: got "Sun"; expected a planet or moon: Sun casts no shadow on its own orbits/);
  });

  it("TRANSFER_BETWEEN and TRANSFER_GRID from a planet to itself", () => {
    expectRefusal(refusal("TRANSFER_BETWEEN", "Earth", "Earth", 47082, 47292), "#VALUE!", /^to: got "Earth"; expected a planet other than from: a transfer from a planet to itself/);
    expectRefusal(refusal("TRANSFER_GRID", "Mars", "mars", 47030, 10, 3, 150, 30, 2), "#VALUE!", /^to: got "mars"; expected a planet other than from/);
  });

  it("PLANET_TRANSFER and SYNODIC_PERIOD with the same body twice, SUN_SYNC_INCLINATION about the Sun", () => {
    expectRefusal(refusal("PLANET_TRANSFER", "Mars", "Mars"), "#VALUE!", /^to: got "Mars"; expected a body other than from \(Mars\)/);
    expectRefusal(refusal("SYNODIC_PERIOD", "Earth", "earth"), "#VALUE!", /^body_b: got "Earth"; expected a body other than body_a \(Earth\): a body is always aligned with itself/);
    expectRefusal(refusal("SUN_SYNC_INCLINATION", "Sun", 7e5, 0, null, 2e-7, 3e7), "#VALUE!", /^body: got "Sun"; expected a planet or moon: Sun orbits no star/);
  });
});

describe("shapes, argument counts, dates and units", () => {
  it("a column of radii against a row of radii in a several-values function names both parameters and says one row per case", () => {
    expectRefusal(refusal("TRANSFER_BURNS", "Earth", [[6878], [7000]], [[7000, 8000, 9000]], null, true), "#VALUE!", /^radius_to: got radius_from as a column of 2 cases against radius_to as a row of 3; expected one column or one row of cases/);
  });

  it("too many arguments is #VALUE!, naming the last parameter", () => {
    expectRefusal(refusal("ESCAPE_SPEED", "Earth", 6898.137, 1), "#VALUE!", /^radius: got 1 more argument after it; expected at most 2 arguments \(body, radius\)/);
  });

  it("a Julian date typed where a date belongs lands in the year 8637, outside the models", () => {
    expectRefusal(refusal("BETA_ANGLE", 98.15, 292.5, 2461000), "#VALUE!", /^date: got a date in the year 8637 \(Julian date 4876018.5\); expected a date from 1800-01-01 up to 2200-01-01/);
    expectRefusal(refusal("PLANET_STATE", "Mars", 2461000), "#VALUE!", /^date: got a date in the year 8637 .* 3000 BC/);
  });

  it("dates as ISO 8601 text are read as UTC, the same as their serials", () => {
    expect(call("PLANET_STATE", "Mars", "2028-11-25")).toEqual(call("PLANET_STATE", "Mars", 47082));
    expect(call("BETA_ANGLE", 98.15, 292.5, "2027-01-01T12:00Z")).toEqual(call("BETA_ANGLE", 98.15, 292.5, 46388.5));
    expect(call("TRANSFER_GRID", "Earth", "Mars", "2028-10-04", 10, 2, 150, 30, 2, "c3", true)[0]).toEqual(["flight days \\ departure", 47030, 47040]);
  });

  it("an empty eccentricity in the J2 functions is a circular orbit, and SUN_SYNC_INCLINATION's ecc may be omitted", () => {
    expect(call("NODAL_PRECESSION", "Earth", 7068.137, null, 98.15)).toEqual(call("NODAL_PRECESSION", "Earth", 7068.137, 0, 98.15));
    expect(call("APSIDAL_PRECESSION", "Earth", 7068.137, null, 98.15)).toEqual(call("APSIDAL_PRECESSION", "Earth", 7068.137, 0, 98.15));
    expect(call("REPEAT_TRACK_SMA", "Earth", 175, 12, null, 98.15)).toEqual(call("REPEAT_TRACK_SMA", "Earth", 175, 12, 0, 98.15));
    expect(call("SUN_SYNC_INCLINATION", "Earth", 7068.137)).toEqual(call("SUN_SYNC_INCLINATION", "Earth", 7068.137, 0));
  });

  it("CONVERT_UNIT takes the spellings people type and lists the units of the quantity when one is unknown", () => {
    expect(call("CONVERT_UNIT", 2, "days", "hr")[0][0]).toBe(48);
    expect(call("CONVERT_UNIT", 398600.4418, "km^3/s^2", "m³/s²")[0][0]).toBe(3.986004418e14);
    expect(call("CONVERT_UNIT", 100, "lb", "kg")[0][0]).toBe(45.359237);
    expectRefusal(refusal("CONVERT_UNIT", 1, "km", "furlong"), "#VALUE!", /^to: got "furlong"; expected a unit of length: one of km, m, au, ft, mi, nmi/);
  });
});
