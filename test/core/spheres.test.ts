import { describe, expect, it } from "vitest";
import { hillRadius, soiRadius, synodicPeriod } from "../../src/core/spheres";
import { HP as D, exactDecimal as exact } from "../support/exact";
import { expectRelative, expectError } from "../support/expect";

// Only the mass ratio enters, so masses in kg stand in for GMs where a source gives masses.
// Curtis 2nd ed. Table A.1 (from memory): Sun 1.989e30 kg, Earth 5.974e24 kg, Moon 7.348e22 kg,
// Earth orbit 149.6e6 km, Moon orbit 384.4e3 km.
const M_SUN = 1.989e30, M_EARTH = 5.974e24, M_MOON = 7.348e22;

describe("soiRadius", () => {
  it("matches Curtis 2nd ed. Table 8.1 for Earth and the Moon", () => {
    // Curtis Table 8.1 sphere-of-influence radii (from memory): Earth 925e3 km, Moon 66.2e3 km.
    expect(Math.round((soiRadius(149.6e6, M_EARTH, M_SUN) as number) / 1e3)).toBe(925);
    expect(Math.round((soiRadius(384.4e3, M_MOON, M_EARTH) as number) / 100) / 10).toBe(66.2);
  });

  it("agrees with a 50-digit recomputation of a (m/M)^(2/5)", () => {
    for (const [a, m, M] of [[149.6e6, M_EARTH, M_SUN], [778.6e6, 1.26712764e8, 1.32712440018e11], [1, 1e-20, 1]]) {
      const expected = exact(a).mul(exact(m).div(exact(M)).pow(new D("0.4"))).toNumber(); // decimal.js 10.6.0
      expectRelative(soiRadius(a, m, M), expected, 1e-14);
    }
  });

  it("refuses a body heavier than its parent and non-positive values", () => {
    expectError(soiRadius(1e6, 2, 1), "bad_argument", "body");
    expectError(soiRadius(0, 1, 2), "bad_argument", "body");
    expectError(soiRadius(1e6, -1, 2), "bad_argument", "body");
  });
});

describe("hillRadius", () => {
  it("is about 0.01 au for Earth", () => {
    // Observatoire de Paris, Dictionary of Astronomy, "Hill sphere": Earth's Hill sphere has a
    // radius of 0.01 au. (au = 149597870.7 km, IAU 2012 Resolution B2.)
    const r = (hillRadius(149.6e6, 0, M_EARTH, M_SUN) as number) / 149597870.7;
    expect(r).toBeGreaterThan(0.0095);
    expect(r).toBeLessThan(0.0105);
  });

  it("agrees with a 50-digit recomputation of a (1 - e) (m / 3M)^(1/3)", () => {
    for (const [a, e, m, M] of [[149.6e6, 0.0167, M_EARTH, M_SUN], [227.9e6, 0.0934, 42828.37, 1.32712440018e11], [384.4e3, 0.0549, M_MOON, M_EARTH]]) {
      const expected = exact(a).mul(new D(1).sub(exact(e))).mul(exact(m).div(exact(M).mul(3)).cbrt()).toNumber(); // decimal.js 10.6.0
      expectRelative(hillRadius(a, e, m, M), expected, 1e-14);
    }
  });

  it("exceeds the Laplace sphere of influence for a planet (m/M << 1)", () => {
    // (m/3M)^(1/3) > (m/M)^(2/5) whenever m/M < 3^-5 (about 0.004): the usual ordering.
    expect(hillRadius(149.6e6, 0, M_EARTH, M_SUN) as number).toBeGreaterThan(soiRadius(149.6e6, M_EARTH, M_SUN) as number);
  });

  it("refuses eccentricities outside [0, 1)", () => {
    expectError(hillRadius(1e6, 1, 1, 2), "bad_argument", "body");
    expectError(hillRadius(1e6, -0.1, 1, 2), "bad_argument", "body");
  });
});

describe("synodicPeriod", () => {
  it("matches Britannica's mean synodic period of Mars", () => {
    // Encyclopaedia Britannica, "Planetary data for Mars": sidereal period 686.980 d, mean synodic
    // period 779.94 d. Earth's sidereal year 365.256 d (from memory). The formula gives 779.934 d;
    // the printed value is a mean over real (eccentric) orbits, so compare to 0.01 d.
    expect(Math.abs((synodicPeriod(365.256, 686.98) as number) - 779.94)).toBeLessThan(0.01);
  });

  it("agrees with a 50-digit recomputation and is symmetric", () => {
    for (const [a, b] of [[365.256, 224.701], [27.321661, 365.256363], [1, 1 + 1e-9]]) {
      const expected = new D(1).div(new D(1).div(exact(a)).sub(new D(1).div(exact(b))).abs()).toNumber(); // decimal.js 10.6.0
      expectRelative(synodicPeriod(a, b), expected, 1e-13);
      expect(synodicPeriod(b, a)).toBe(synodicPeriod(a, b));
    }
  });

  it("has no answer for equal periods", () => {
    expectError(synodicPeriod(100, 100), "no_answer", "body_b");
    expectError(synodicPeriod(0, 100), "bad_argument", "body_a");
    expectError(synodicPeriod(100, -1), "bad_argument", "body_b");
  });
});
