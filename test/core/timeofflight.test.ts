import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { isDomainError } from "../../src/core/domain";
import { timeOfFlight, trueAnomalyAtTime } from "../../src/core/timeofflight";
import { periodFromSma } from "../../src/core/twobody";
import { logUniform, seeded } from "../support/random";
import { D, EPS, exact, fromDeg, refEccentric, refPi, toDeg } from "./keplerReference";
import { err } from "../support/expect";

const num = (x: unknown): number => {
  if (isDomainError(x)) throw new Error(x.message);
  return x as number;
};

describe("TIME_OF_FLIGHT and TRUE_ANOMALY_AT_TIME against Curtis's worked examples", () => {
  // Curtis, Orbital Mechanics for Engineering Students, Examples 3.1 and 3.2 (printed answers from
  // memory): geocentric ellipse with rp = 9,600 km, ra = 21,000 km, mu = 398,600 km^3/s^2.
  const mu = 398600;
  const rp = 9600;
  const ra = 21000;
  const sma = (rp + ra) / 2;
  const ecc = (ra - rp) / (ra + rp);
  it("takes 4,077 s from perigee to 120 deg (Example 3.1)", () => {
    expect(Math.round(num(timeOfFlight(mu, sma, ecc, 0, 120)))).toBe(4077);
  });
  it("is at 193.2 deg three hours after perigee (Example 3.2)", () => {
    expect(num(trueAnomalyAtTime(mu, sma, ecc, 0, 3 * 3600)).toFixed(1)).toBe("193.2");
  });

  // Curtis, Example 3.5 (printed answers from memory): geocentric hyperbola with perigee speed
  // 15 km/s at 300 km altitude (rp = 6,678 km), mu = 398,600: e = 2.7696, 4,141 s from perigee
  // to 100 deg, and 107.78 deg three hours after that.
  const rpH = 6378 + 300;
  const h = rpH * 15;
  const eH = (h * h) / (rpH * mu) - 1;
  const aH = rpH / (1 - eH);
  it("has e = 2.7696 (Example 3.5 set-up)", () => {
    expect(eH.toFixed(4)).toBe("2.7696");
  });
  it("takes 4,141 s from perigee to 100 deg on the hyperbola (Example 3.5)", () => {
    expect(Math.round(num(timeOfFlight(mu, aH, eH, 0, 100)))).toBe(4141);
  });
  it("is at 107.78 deg three hours later (Example 3.5)", () => {
    expect(num(trueAnomalyAtTime(mu, aH, eH, 100, 3 * 3600)).toFixed(2)).toBe("107.78");
  });
});

describe("ellipse: forward time in [0, period)", () => {
  const gm = 398600.4418;
  it("sums the two ways round to one period, and gives 0 from an anomaly to itself", () => {
    const rand = seeded(701);
    for (let i = 0; i < 2000; i++) {
      const sma = logUniform(rand, 6600, 4e5);
      const ecc = rand() < 0.5 ? rand() : 1 - logUniform(rand, 1e-6, 0.1);
      const a = 720 * rand() - 360;
      const b = 720 * rand() - 360;
      const period = num(periodFromSma(gm, sma));
      const ab = num(timeOfFlight(gm, sma, ecc, a, b));
      const ba = num(timeOfFlight(gm, sma, ecc, b, a));
      expect(ab).toBeGreaterThanOrEqual(0);
      expect(ab).toBeLessThan(period);
      // Same direction of travel round the whole orbit; unless a and b coincide modulo 360.
      expect(Math.abs(ab + ba - period) / period).toBeLessThan(1e-12);
      expect(num(timeOfFlight(gm, sma, ecc, a, a))).toBe(0);
    }
  });

  it("crosses periapsis going from 350 to 10 deg (the short way), not the long way", () => {
    const sma = 10000;
    const ecc = 0.2;
    const period = num(periodFromSma(gm, sma));
    const t = num(timeOfFlight(gm, sma, ecc, 350, 10));
    expect(t).toBeLessThan(0.1 * period);
    expect(t).toBeCloseTo(2 * num(timeOfFlight(gm, sma, ecc, 0, 10)), 9);
  });

  it("inverts TRUE_ANOMALY_AT_TIME: nu(start, tof(start, end)) = end", () => {
    const rand = seeded(702);
    let worst = 0;
    for (let i = 0; i < 3000; i++) {
      const sma = logUniform(rand, 6600, 4e5);
      const ecc = rand() * 0.95;
      const a = 360 * rand();
      const b = 360 * rand();
      const back = num(trueAnomalyAtTime(gm, sma, ecc, a, num(timeOfFlight(gm, sma, ecc, a, b))));
      const d = Math.abs(back - b);
      worst = Math.max(worst, Math.min(d, 360 - d));
    }
    expect(worst).toBeLessThan(1e-9);
  });
});

describe("ellipse: very long times keep the accuracy of their own float64 value", () => {
  // 70-digit reference from the exact double inputs: n = sqrt(GM/a^3), M = M0 + n t reduced
  // modulo 2 pi in decimal, then Kepler's equation and the half-angle formula in decimal.
  // float64 cannot do better than the rounding of n and of n t, about 2^-52 (n |t| + 2 pi) rad
  // in M, carried to nu by d nu / d M = (1 + e cos nu)^2 / (1 - e^2)^(3/2); the bound allows 8x that.
  it("matches the 70-digit propagation for elapsed times up to 1e6 periods, either sign", () => {
    const rand = seeded(703);
    const two = new D(2);
    for (let i = 0; i < 300; i++) {
      const gm = 398600.4418;
      const sma = logUniform(rand, 6600, 50000);
      const ecc = rand() * 0.7;
      const nu0 = 360 * rand();
      const periods = logUniform(rand, 1, 1e6) * (rand() < 0.5 ? -1 : 1);
      const elapsed = periods * num(periodFromSma(gm, sma));
      const got = num(trueAnomalyAtTime(gm, sma, ecc, nu0, elapsed));

      const e = exact(ecc);
      const n = exact(gm).div(exact(sma).pow(3)).sqrt();
      const half = fromDeg(exact(nu0)).div(2);
      const E0 = D.atan2(new D(1).minus(e).sqrt().times(half.sin()), new D(1).plus(e).sqrt().times(half.cos())).times(2);
      const M0 = E0.minus(e.times(E0.sin()));
      const twoPi = refPi.times(2);
      let M = M0.plus(n.times(exact(elapsed))).mod(twoPi);
      if (M.isNeg()) M = M.plus(twoPi);
      const E = refEccentric(M, e);
      const nuRef = D.atan2(new D(1).plus(e).sqrt().times(E.div(two).sin()), new D(1).minus(e).sqrt().times(E.div(two).cos())).times(2);
      let nuRefDeg = toDeg(nuRef).toNumber();
      if (nuRefDeg < 0) nuRefDeg += 360;

      const slope = (1 + ecc * Math.cos((got * Math.PI) / 180)) ** 2 / (1 - ecc * ecc) ** 1.5;
      const bound = 8 * EPS * (Math.abs(n.toNumber() * elapsed) + 2 * Math.PI) * slope * (180 / Math.PI);
      let diff = Math.abs(got - nuRefDeg);
      diff = Math.min(diff, 360 - diff);
      expect(diff).toBeLessThanOrEqual(bound);
    }
  });

  it("returns to the start after whole periods as PERIOD_FROM_SMA gives them", () => {
    const gm = 398600.4418;
    const sma = 7000;
    const period = num(periodFromSma(gm, sma));
    for (const k of [1, 7, 1000, 123456])
      expect(num(trueAnomalyAtTime(gm, sma, 0.1, 33, k * period))).toBeCloseTo(33, 6);
  });
});

describe("hyperbola: signed times inside the asymptotes", () => {
  const gm = 398600.4418;
  it("is antisymmetric, and TRUE_ANOMALY_AT_TIME inverts it", () => {
    const rand = seeded(801);
    let worst = 0;
    for (let i = 0; i < 3000; i++) {
      const ecc = 1 + logUniform(rand, 1e-4, 10);
      const sma = -logUniform(rand, 1000, 1e6);
      const lim = (Math.acos(-1 / ecc) * 180) / Math.PI;
      const a = (2 * rand() - 1) * lim * 0.95;
      const b = (2 * rand() - 1) * lim * 0.95;
      const ab = num(timeOfFlight(gm, sma, ecc, a, b));
      expect(ab).toBe(-num(timeOfFlight(gm, sma, ecc, b, a)));
      expect(Math.sign(ab)).toBe(Math.sign(b - a));
      const back = num(trueAnomalyAtTime(gm, sma, ecc, a, ab));
      worst = Math.max(worst, Math.abs(back - b));
    }
    expect(worst).toBeLessThan(1e-8);
  });

  it("approaches but never leaves the asymptote for huge elapsed times", () => {
    const ecc = 1.5;
    const lim = (Math.acos(-1 / ecc) * 180) / Math.PI;
    const nu = num(trueAnomalyAtTime(gm, -20000, ecc, 0, 1e15));
    expect(nu).toBeLessThanOrEqual(lim);
    expect(nu).toBeGreaterThan(lim - 1e-6);
    expect(num(trueAnomalyAtTime(gm, -20000, ecc, 0, -1e15))).toBeCloseTo(-nu, 12);
  });

  it("refuses anomalies outside the asymptotes, naming the parameter", () => {
    expect(err(timeOfFlight(gm, -20000, 2, 0, 121)).parameter).toBe("true_anomaly_to");
    expect(err(timeOfFlight(gm, -20000, 2, -130, 0)).parameter).toBe("true_anomaly_from");
    expect(err(trueAnomalyAtTime(gm, -20000, 2, 125, 10)).parameter).toBe("true_anomaly_start");
  });
});

describe("argument checks", () => {
  const gm = 398600.4418;
  it("names body, sma and ecc as the sheet does", () => {
    expect(err(timeOfFlight(-1, 7000, 0.1, 0, 10)).parameter).toBe("body");
    expect(err(timeOfFlight(0, 7000, 0.1, 0, 10)).parameter).toBe("body");
    expect(err(timeOfFlight(gm, -7000, 0.1, 0, 10)).parameter).toBe("sma");
    expect(err(timeOfFlight(gm, 7000, 1.5, 0, 10)).parameter).toBe("sma");
    const parabola = err(timeOfFlight(gm, 7000, 1, 0, 10));
    expect(parabola.parameter).toBe("ecc");
    expect(parabola.message).toContain("propagate a state vector instead");
    expect(err(trueAnomalyAtTime(gm, 7000, 0.1, 0, NaN)).parameter).toBe("elapsed");
    expect(err(trueAnomalyAtTime(gm, 7000, 0.1, Infinity, 1)).parameter).toBe("true_anomaly_start");
  });

  it("returns a finite number or a DomainError for any doubles", () => {
    const anyNumber = fc.oneof(fc.double(), fc.constantFrom(0, 1, -1, 0.5, 1.5, 398600, 7000, -7000, 1e308, 5e-324));
    fc.assert(
      fc.property(anyNumber, anyNumber, anyNumber, anyNumber, anyNumber, (g, a, e, x, y) => {
        for (const r of [timeOfFlight(g, a, e, x, y), trueAnomalyAtTime(g, a, e, x, y)])
          if (!(isDomainError(r) || (typeof r === "number" && Number.isFinite(r)))) return false;
        return true;
      }),
      { numRuns: 3000, seed: 7 },
    );
  });
});
