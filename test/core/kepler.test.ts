import { describe, expect, it } from "vitest";
import * as k from "../../src/core/kepler";
import { logUniform, seeded } from "../support/random";
import { D, EPS, ellipticResidual, exact, hyperbolicResidual, refBarker, refEccentric, refHyperbolic, relErr } from "./keplerReference";

const DEG = Math.PI / 180;
const ulp = (x: number): number => (x === 0 ? Number.MIN_VALUE : 2 ** (Math.floor(Math.log2(Math.abs(x))) - 52));

describe("solveKeplerElliptic reproduces the textbook worked example", () => {
  it("gives E = 220.512074767522 deg for M = 235.4 deg, e = 0.4", () => {
    // Vallado, Fundamentals of Astrodynamics and Applications, 4th ed., Example 2-1 (pp. 66-67):
    // E = 220.512 074 767 522 deg (printed value, quoted in JuliaSpace/SatelliteToolbox.jl
    // test/general.jl, which cites the example's pp. 66-67).
    // Printed to 12 decimals, so the check is at 5e-13 deg.
    const E = k.solveKeplerElliptic(235.4 * DEG, 0.4) / DEG;
    expect(Math.abs(E - 220.512074767522)).toBeLessThan(5e-13);
  });
});

describe("solveKeplerElliptic against a 70-digit decimal.js recomputation", () => {
  // Residual E - e sin E - M evaluated in 70 digits from the exact binary values of E, e and M.
  // "A few ulp": bound 4 x 2^-52 x max(1, |M|) = 8.9e-16 max(1, |M|). The rounding of E alone
  // contributes up to (1 + e) ulp(E)/2, i.e. up to 4.4e-16 near E = pi.
  const bound = (M: number) => 4 * EPS * Math.max(1, Math.abs(M));
  const sweep = (label: string, n: number, seed: number, draw: (r: () => number) => [number, number]) =>
    it(label, () => {
      const rand = seeded(seed);
      let worst = 0;
      for (let i = 0; i < n; i++) {
        const [M, e] = draw(rand);
        const E = k.solveKeplerElliptic(M, e);
        worst = Math.max(worst, Math.abs(ellipticResidual(E, e, M)) / bound(M));
      }
      expect(worst).toBeLessThanOrEqual(1);
    });

  sweep("residual within a few ulp for 3,000 uniform (M in [-pi, pi], e in [0, 1))", 3000, 101, (r) => [(2 * r() - 1) * Math.PI, r()]);
  sweep("residual within a few ulp for 3,000 cases with 1 - e from 1e-1 down to 1e-7", 3000, 102, (r) => [
    (2 * r() - 1) * Math.PI,
    1 - logUniform(r, 1e-7, 1e-1),
  ]);
  sweep("residual within a few ulp for 2,000 cases with tiny M (1e-15 .. 1) and e up to 0.9999999", 2000, 103, (r) => [
    (r() < 0.5 ? -1 : 1) * logUniform(r, 1e-15, 1),
    r() < 0.5 ? 0.9999999 : 1 - logUniform(r, 1e-7, 1),
  ]);
  sweep("residual within a few ulp of |M| for 1,000 cases with M of many revolutions (up to 1e6 rad)", 1000, 104, (r) => [
    (r() < 0.5 ? -1 : 1) * logUniform(r, 4, 1e6),
    r() * 0.999999,
  ]);

  it("keeps E to a few ulp relative near periapsis of near-parabolic ellipses (M -> 0, e -> 1)", () => {
    // Here the problem is well conditioned relative to E (E ~ M/(1-e) or (6M)^(1/3)), so a solver
    // that forms E - e sin E by subtraction loses digits the residual bound above would not show.
    const rand = seeded(105);
    let worst = 0;
    for (let i = 0; i < 800; i++) {
      const M = logUniform(rand, 1e-15, 1e-2);
      const e = i % 3 === 0 ? 0.9999999 : 1 - logUniform(rand, 1e-9, 1e-1);
      const E = k.solveKeplerElliptic(M, e);
      worst = Math.max(worst, relErr(E, refEccentric(exact(M), exact(e), E)) / EPS);
    }
    expect(worst).toBeLessThanOrEqual(4);
  });
});

describe("solveKeplerElliptic structure", () => {
  it("is odd in M, exact at M = 0, +-pi and for e = 0", () => {
    const rand = seeded(106);
    for (let i = 0; i < 500; i++) {
      const M = (2 * rand() - 1) * Math.PI;
      const e = rand();
      expect(k.solveKeplerElliptic(-M, e)).toBe(-k.solveKeplerElliptic(M, e));
    }
    expect(k.solveKeplerElliptic(0, 0.7)).toBe(0);
    expect(k.solveKeplerElliptic(Math.PI, 0.9)).toBeCloseTo(Math.PI, 15);
    expect(k.solveKeplerElliptic(-Math.PI, 0.3)).toBeCloseTo(-Math.PI, 15);
    expect(Math.abs(k.solveKeplerElliptic(1.234, 0) - 1.234)).toBeLessThanOrEqual(ulp(1.234));
  });

  it("keeps the revolution of M: E(M + 2 pi j) = E(M) + 2 pi j", () => {
    const rand = seeded(107);
    for (let i = 0; i < 500; i++) {
      const M = (2 * rand() - 1) * Math.PI * 0.999;
      const e = rand();
      const j = Math.floor(rand() * 2000) - 1000;
      const shifted = k.solveKeplerElliptic(M + 2 * Math.PI * j, e) - 2 * Math.PI * j;
      expect(Math.abs(shifted - k.solveKeplerElliptic(M, e))).toBeLessThan(1e-11);
    }
  });

  it("never returns NaN or Infinity for e in [0, 1) and finite M, including the extreme corners", () => {
    const Ms = [0, 5e-324, 1e-300, 1e-20, 1e-8, 0.5, Math.PI, -Math.PI, 3.1415926, 7, -1e10, 1e15, 1.7e308];
    const es = [0, 1e-300, 0.5, 0.99, 0.9999999, 1 - 2 ** -53, 1 - 2 ** -52];
    for (const M of Ms) for (const e of es) expect(Number.isFinite(k.solveKeplerElliptic(M, e))).toBe(true);
  });
});

describe("solveKeplerHyperbolic", () => {
  it("gives H = 1.6013761449 for M = 235.4 deg taken as 4.10850505919465, e = 2.4", () => {
    // Vallado, Fundamentals of Astrodynamics and Applications, 4th ed., Example 2-3 (§2.2): the
    // final iteration of its table prints H = 1.601 376 144 9 (quoted, citing Vallado 2004, in
    // Tudat/tudat Tudat/Astrodynamics/BasicAstrodynamics/UnitTests/unitTestOrbitalElementConversions.cpp).
    expect(Math.abs(k.solveKeplerHyperbolic(4.10850505919465, 2.4) - 1.6013761449)).toBeLessThan(5e-11);
  });

  it("keeps H to a few ulp relative for 1,500 cases, e from 1 + 1e-10 to 1e4, |M| from 1e-10 to 1e12", () => {
    const rand = seeded(201);
    let worst = 0;
    for (let i = 0; i < 1500; i++) {
      const e = i % 2 ? 1 + logUniform(rand, 1e-10, 1) : 1 + logUniform(rand, 1e-2, 1e4);
      const M = (rand() < 0.5 ? -1 : 1) * logUniform(rand, 1e-10, 1e12);
      const H = k.solveKeplerHyperbolic(M, e);
      worst = Math.max(worst, relErr(H, refHyperbolic(exact(M), exact(e), H)) / EPS);
    }
    expect(worst).toBeLessThanOrEqual(4);
  });

  it("leaves a residual e sinh H - H - M within a few ulp of max(1, |M|) plus what rounding H implies", () => {
    // For large |H| even the correctly rounded H leaves a residual (e cosh H - 1) ulp(H)/2, which
    // exceeds ulp(M) by a factor ~H; the bound adds that term rather than pretend it away.
    const rand = seeded(202);
    let worst = 0;
    for (let i = 0; i < 3000; i++) {
      const e = i % 2 ? 1 + logUniform(rand, 1e-10, 1) : 1 + logUniform(rand, 1e-2, 1e3);
      const M = (rand() < 0.5 ? -1 : 1) * logUniform(rand, 1e-10, 1e8);
      const H = k.solveKeplerHyperbolic(M, e);
      const slope = e * Math.cosh(H) - 1;
      const bound = 4 * EPS * Math.max(1, Math.abs(M)) + slope * ulp(H);
      worst = Math.max(worst, Math.abs(hyperbolicResidual(H, e, M)) / bound);
    }
    expect(worst).toBeLessThanOrEqual(1);
  });

  it("is odd in M, zero at zero, and finite out to |M| = 1.7e308 and e up to 1e300", () => {
    expect(k.solveKeplerHyperbolic(0, 1.5)).toBe(0);
    expect(k.solveKeplerHyperbolic(-3, 1.7)).toBe(-k.solveKeplerHyperbolic(3, 1.7));
    const Ms = [5e-324, 1e-300, 1e-8, 1, 1e6, 1e100, 1.7e308];
    const es = [1 + 2 ** -52, 1.0000001, 1.5, 10, 1e6, 1e300];
    for (const M of Ms) for (const e of es) expect(Number.isFinite(k.solveKeplerHyperbolic(M, e))).toBe(true);
    // log(2M/e) asymptote for huge M: e sinh H ~ M, so H -> ln(2 M / e) (within ~H/M).
    expect(k.solveKeplerHyperbolic(1e300, 2)).toBeCloseTo(Math.log(1e300), 12);
  });
});

describe("solveBarker (parabolic mean anomaly Mp = D + D^3/3, D = tan(nu/2))", () => {
  it("gives B = 0.8177316 for dt = 4 TU, p = 4 ER (Mp = 2 sqrt(mu/p^3) dt = 1)", () => {
    // Vallado, Fundamentals of Astrodynamics and Applications, 4th ed., Example 2-2 (canonical
    // units, mu = 1): B = 0.817 731 6, 7 decimals printed (quoted for the same example in km,
    // p = 25 512 km and dt = 53.7874 min, in pleira/celest
    // src/test/java/be/angelcorp/libs/celest/kepler/ReferenceKeplerAngles.java).
    const Mp = 2 * Math.sqrt(1 / 4 ** 3) * 4;
    expect(Math.abs(k.solveBarker(Mp) - 0.8177316)).toBeLessThan(1e-7);
  });

  it("agrees with a 70-digit Cardano solution to a few ulp for |Mp| from 1e-12 to 1e250", () => {
    const rand = seeded(301);
    let worst = 0;
    for (let i = 0; i < 3000; i++) {
      const Mp = (rand() < 0.5 ? -1 : 1) * logUniform(rand, 1e-12, 1e250);
      worst = Math.max(worst, relErr(k.solveBarker(Mp), refBarker(exact(Mp))) / EPS);
    }
    expect(worst).toBeLessThanOrEqual(4);
  });
});

describe("cancellation-free pieces against 70-digit values", () => {
  const cases: [string, (x: number) => number, (x: ReturnType<typeof exact>) => ReturnType<typeof exact>][] = [
    ["x - sin x", k.xMinusSin, (x) => x.minus(x.sin())],
    ["1 - cos x", k.oneMinusCos, (x) => new D(1).minus(x.cos())],
    ["sinh x - x", k.sinhMinusX, (x) => x.sinh().minus(x)],
    ["cosh x - 1", k.coshMinusOne, (x) => x.cosh().minus(1)],
  ];
  for (const [name, f, ref] of cases)
    it(`${name} is within 4 ulp relative for |x| from 1e-8 to 3 (series and direct branches)`, () => {
      const rand = seeded(name.length * 7);
      let worst = 0;
      for (let i = 0; i < 1500; i++) {
        const x = (rand() < 0.5 ? -1 : 1) * logUniform(rand, 1e-8, 3);
        worst = Math.max(worst, relErr(f(x), ref(exact(x))) / EPS);
      }
      expect(worst).toBeLessThanOrEqual(4);
    });
});

describe("anomaly conversions", () => {
  it("true -> eccentric and back agree with the 70-digit half-angle formulas", () => {
    const rand = seeded(401);
    let worst = 0;
    for (let i = 0; i < 800; i++) {
      const nu = (2 * rand() - 1) * Math.PI;
      const e = i % 2 ? rand() : 1 - logUniform(rand, 1e-9, 1e-1);
      const E = k.eccentricFromTrue(nu, e);
      const x = exact(nu).div(2);
      const one = new D(1);
      const ref = D.atan2(one.minus(exact(e)).sqrt().times(x.sin()), one.plus(exact(e)).sqrt().times(x.cos())).times(2);
      worst = Math.max(worst, exact(E).minus(ref).abs().toNumber() / (EPS * Math.max(Math.abs(E), 1e-300)));
    }
    expect(worst).toBeLessThanOrEqual(4);
  });

  it("true -> hyperbolic agrees with 2 atanh(sqrt((e-1)/(e+1)) tan(nu/2)) in 70 digits", () => {
    const rand = seeded(402);
    let worst = 0;
    for (let i = 0; i < 800; i++) {
      const e = 1 + logUniform(rand, 1e-6, 10);
      const nuInf = Math.acos(-1 / e);
      const nu = (2 * rand() - 1) * nuInf * 0.9;
      const H = k.hyperbolicFromTrue(nu, e);
      const x = exact(e).minus(1).div(exact(e).plus(1)).sqrt().times(exact(nu).div(2).tan());
      const ref = D.atanh(x).times(2);
      // Away from the asymptote (|nu| < 0.9 nu_inf) the conversion is well conditioned.
      worst = Math.max(worst, relErr(H, ref) / EPS);
    }
    expect(worst).toBeLessThanOrEqual(8);
  });

  const roundTrip = (label: string, seed: number, drawE: (r: () => number) => number, limit: (e: number) => number, tol: number) =>
    it(label, () => {
      const rand = seeded(seed);
      let worst = 0;
      for (let i = 0; i < 3000; i++) {
        const e = drawE(rand);
        const nu = (2 * rand() - 1) * limit(e);
        const back = k.trueFromMean(k.meanFromTrue(nu, e), e);
        worst = Math.max(worst, Math.abs(back - nu) / (EPS * Math.max(1, Math.abs(nu))));
      }
      expect(worst).toBeLessThanOrEqual(tol);
    });
  roundTrip("nu -> M -> nu returns nu to a few ulp on ellipses, e up to 0.9999999", 403, (r) => (r() < 0.5 ? r() : 1 - logUniform(r, 1e-7, 1e-1)), () => Math.PI, 16);
  roundTrip("nu -> Mp -> nu returns nu to a few ulp on the parabola, |nu| < 0.999 pi", 404, () => 1, () => 0.999 * Math.PI, 16);
  roundTrip("nu -> M -> nu returns nu to a few ulp on hyperbolas, |nu| < 0.999 nu_inf", 405, (r) => 1 + logUniform(r, 1e-8, 100), (e) => 0.999 * Math.acos(-1 / e), 16);

  it("keeps the revolution for true <-> eccentric anomaly", () => {
    const E = k.eccentricFromTrue(725 * DEG, 0.3);
    expect(E - 4 * Math.PI).toBeCloseTo(k.eccentricFromTrue(5 * DEG, 0.3), 13);
    expect(k.trueFromEccentric(E, 0.3)).toBeCloseTo(725 * DEG, 13);
  });
});
