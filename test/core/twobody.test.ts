import { describe, expect, it } from "vitest";
import { isDomainError } from "../../src/core/domain";
import * as tb from "../../src/core/twobody";
import { exactDecimal as X } from "../support/exact";
import { logUniform, seeded } from "../support/random";

const num = (x: unknown): number => {
  if (isDomainError(x)) throw new Error(x.message);
  return x as number;
};

describe("circular speed, period and geosynchronous radius", () => {
  // Braeunig, Rocket & Space Technology, "Orbital Mechanics" Problems 4.1-4.3, with its constants
  // GM = 3.986005e14 m^3/s^2 and R = 6378.14 km. Printed answers from memory: 7,784 m/s; 5,310 s;
  // 42,164,170 m.
  const gm = 3.986005e5;
  const r = 6378.14 + 200;
  it("gives 7.784 km/s at 200 km altitude (Problem 4.1)", () => {
    expect(num(tb.orbitalSpeed(gm, r)).toFixed(3)).toBe("7.784");
  });
  it("gives a 5,310 s period there (Problem 4.2)", () => {
    expect(Math.round(num(tb.periodFromSma(gm, r)) / 10) * 10).toBe(5310);
  });
  it("puts a 86,164.1 s orbit at 42,164.17 km (Problem 4.3)", () => {
    expect(num(tb.smaFromPeriod(gm, 86164.1)).toFixed(2)).toBe("42164.17");
  });
});

describe("vis-viva against a 50-digit recomputation", () => {
  it("agrees to 1e-15 relative over 5,000 random ellipses and hyperbolas, right up to r = 2a", () => {
    const rand = seeded(7);
    let worst = 0;
    for (let k = 0; k < 5000; k++) {
      const gm = logUniform(rand, 1e-3, 2e11);
      const r = logUniform(rand, 1, 1e9);
      // sma from r/2 (v -> 0 at apoapsis of a degenerate ellipse) to hyperbolas
      const sma = rand() < 0.7 ? r * (0.5 + 100 * rand() ** 3) : -r * logUniform(rand, 1e-3, 1e3);
      if (sma > 0 && sma <= 0.5 * r) continue; // beyond r = 2a no orbit of that sma reaches (tested below)
      const v = num(tb.orbitalSpeed(gm, r, sma));
      const ref = X(gm).mul(X(2).div(X(r)).minus(X(1).div(X(sma)))).sqrt();
      worst = Math.max(worst, X(v).minus(ref).abs().div(ref).toNumber());
    }
    expect(worst).toBeLessThan(1e-15);
  });

  it("matches escape speed = sqrt(2) x circular speed, and zero energy at escape", () => {
    const rand = seeded(11);
    for (let k = 0; k < 1000; k++) {
      const gm = logUniform(rand, 1, 1e11);
      const r = logUniform(rand, 10, 1e9);
      expect(num(tb.escapeSpeed(gm, r)) / num(tb.orbitalSpeed(gm, r))).toBeCloseTo(Math.SQRT2, 14);
    }
  });
});

describe("Kepler's third law round trips", () => {
  it("period -> sma -> period and GM from the orbit return the inputs to 1e-14", () => {
    const rand = seeded(3);
    for (let k = 0; k < 2000; k++) {
      const gm = logUniform(rand, 1e-3, 2e11);
      const a = logUniform(rand, 1, 1e10);
      const t = num(tb.periodFromSma(gm, a));
      expect(Math.abs(num(tb.smaFromPeriod(gm, t)) / a - 1)).toBeLessThan(1e-14);
      expect(Math.abs(num(tb.gmFromOrbit(a, t)) / gm - 1)).toBeLessThan(1e-14);
    }
  });
});

describe("apsides and shape", () => {
  it("round trips periapsis/apoapsis -> (sma, ecc) -> apsides", () => {
    const rand = seeded(5);
    for (let k = 0; k < 2000; k++) {
      const rp = logUniform(rand, 100, 1e8);
      const ra = rp * (1 + logUniform(rand, 1e-9, 1e4));
      const [a, e] = tb.shapeFromApses(rp, ra) as number[];
      const [p2, a2] = tb.apsesFromShape(a, e) as number[];
      expect(Math.abs(p2 / rp - 1)).toBeLessThan(1e-12);
      expect(Math.abs(a2 / ra - 1)).toBeLessThan(1e-14);
    }
  });

  it("gives a hyperbola its periapsis and an #N/A apoapsis", () => {
    const out = tb.apsesFromShape(-10000, 1.5) as unknown[];
    expect(out[0]).toBeCloseTo(5000, 9);
    expect(isDomainError(out[1]) && out[1].kind).toBe("no_answer");
  });

  it("refuses an apoapsis below the periapsis, naming apoapsis_radius", () => {
    const e = tb.shapeFromApses(7000, 6900);
    expect(isDomainError(e) && e.message).toMatch(/^apoapsis_radius: got 6900; expected/);
  });
});

describe("radius and flight-path angle along the conic", () => {
  // Independent route: cos(gamma) = h / (r v) with h = sqrt(mu p), r from the conic equation and v
  // from vis-viva (Vallado 4th ed. eq. 2-95/2-96 are the two forms; they must agree).
  it("agree with the angular-momentum route to 1e-12 rad on ellipses and hyperbolas", () => {
    const rand = seeded(9);
    const gm = 398600.4418;
    for (let k = 0; k < 3000; k++) {
      const hyper = rand() < 0.4;
      const e = hyper ? 1 + logUniform(rand, 1e-4, 10) : rand() * 0.99;
      const a = hyper ? -logUniform(rand, 1e3, 1e6) : logUniform(rand, 1e3, 1e6);
      const limit = hyper ? (Math.acos(-1 / e) * 180) / Math.PI : 180;
      const nu = (2 * rand() - 1) * limit * 0.999;
      const r = num(tb.radiusAtAnomaly(a, e, nu));
      const v = num(tb.orbitalSpeed(gm, r, a));
      const h = Math.sqrt(gm * a * (1 - e * e));
      const gammaRef = Math.sign(nu) * Math.acos(Math.min(1, h / (r * v)));
      const gamma = (num(tb.flightPathAngle(e, nu)) * Math.PI) / 180;
      expect(Math.abs(gamma - gammaRef)).toBeLessThan(2e-7 + 1e-12); // acos near 1 loses half the digits of gammaRef itself
    }
  });

  it("puts the largest flight-path angle asin(e) where cos(nu) = -e", () => {
    for (const e of [0, 0.1, 0.5, 0.9, 0.999]) {
      const [g, nu] = tb.maxFlightPathAngle(e) as number[];
      expect(g).toBeCloseTo((Math.asin(e) * 180) / Math.PI, 12);
      expect(num(tb.flightPathAngle(e, nu))).toBeCloseTo(g, 10);
      expect(num(tb.flightPathAngle(e, nu + 0.01))).toBeLessThanOrEqual(g);
      expect(num(tb.flightPathAngle(e, nu - 0.01))).toBeLessThanOrEqual(g);
    }
    expect(isDomainError(tb.maxFlightPathAngle(1.2))).toBe(true);
  });

  it("keeps full precision next to the parabola (50-digit recomputation of a(1-e)(1+e)/(1+e cos nu))", () => {
    const rand = seeded(13);
    let worst = 0;
    for (let k = 0; k < 2000; k++) {
      const e = rand() < 0.5 ? 1 - logUniform(rand, 1e-12, 1e-3) : 1 + logUniform(rand, 1e-12, 1e-3);
      const a = (e < 1 ? 1 : -1) * logUniform(rand, 1e3, 1e9);
      const limit = e > 1 ? (Math.acos(-1 / e) * 180) / Math.PI : 180;
      const nu = (2 * rand() - 1) * limit * 0.9;
      const r = num(tb.radiusAtAnomaly(a, e, nu));
      const cos = Math.cos((nu * Math.PI) / 180); // cos itself is correctly rounded; the reference takes it as exact
      const ref = X(a).mul(X(1).minus(X(e))).mul(X(1).plus(X(e))).div(X(1).plus(X(e).mul(X(cos))));
      worst = Math.max(worst, X(r).minus(ref).abs().div(ref.abs()).toNumber());
    }
    expect(worst).toBeLessThan(1e-13);
  });

  it("refuses a true anomaly beyond a hyperbola's asymptote", () => {
    const e = tb.radiusAtAnomaly(-10000, 2, 125); // asymptote at 120 deg
    expect(isDomainError(e) && e.message).toMatch(/^true_anomaly: got 125; expected a true anomaly strictly between -120 and 120/);
  });
});

describe("domain errors", () => {
  it("names the parameter, the value and what is allowed", () => {
    const cases: [unknown, RegExp][] = [
      [tb.orbitalSpeed(-1, 7000), /^body: got -1; expected a positive number/],
      [tb.orbitalSpeed(398600, 0), /^radius: got 0; expected a positive number of km/],
      [tb.orbitalSpeed(398600, 20000, 7000), /^radius: 20000 km is beyond 2 x sma/],
      [tb.periodFromSma(398600, -7000), /^sma: got -7000; expected a positive number of km/],
      [tb.altitudeToRadius(6378, -7000), /^altitude: got -7000; expected an altitude above -6378 km/],
      [tb.radiusAtAnomaly(7000, 1, 0), /^ecc: got 1; expected an eccentricity other than exactly 1/],
      [tb.radiusAtAnomaly(7000, 1.5, 0), /^sma: got 7000; expected a negative sma for a hyperbola/],
    ];
    for (const [res, re] of cases) expect(isDomainError(res) && res.message).toMatch(re);
  });

  it("never returns NaN or Infinity for extreme finite inputs", () => {
    const extremes = [1e-300, 1e-30, 1, 1e30, 1e300, -1e300, -1, 0];
    for (const gm of extremes) for (const x of extremes) for (const y of extremes) {
      for (const r of [tb.orbitalSpeed(gm, x, y), tb.periodFromSma(gm, x), tb.smaFromPeriod(gm, x), tb.gmFromOrbit(x, y), tb.specificEnergy(gm, x), tb.radiusAtAnomaly(x, Math.abs(y) % 3, 30)]) {
        if (!isDomainError(r)) expect(Number.isFinite(r as number)).toBe(true);
      }
    }
  });
});
