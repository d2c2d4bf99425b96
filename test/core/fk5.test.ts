import { describe, expect, it } from "vitest";
import { earthFixedToInertial, fk5Rotations, inertialToEarthFixed, inertialToItrfKernel, itrfToInertialKernel, temeToJ2000Matrix } from "../../src/core/fk5";
import { julianDateFromCalendar } from "../../src/core/julian";
import { apply, rot3, transpose } from "../../src/core/rotation";
import { err, expectError, ok } from "../support/expect";

// Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013), Example 3-15
// ("Performing IAU-76/FK5 reduction") and its Table 3-6: 2004-04-06 07:51:28.386009 UTC,
// dUT1 = -0.4399619 s, dAT = 32 s, xp = -0.140682", yp = 0.333309", and the IERS nutation
// corrections ddpsi = -0.052195", ddeps = -0.003875" (read from stored copies of the example's
// values in several public test suites).
const AS = Math.PI / 180 / 3600;
const JD = julianDateFromCalendar(2004, 4, 6, 7, 51, 28.386009);
const EOP = { dut1: -0.4399619, xp: -0.140682 * AS, yp: 0.333309 * AS, ddpsi: -0.052195 * AS, ddeps: -0.003875 * AS };
const ITRF = { r: [-1033.479383, 7901.2952754, 6380.3565958] as const, v: [-3.22563652, -2.87245145, 5.531924446] as const };
const GCRF = { r: [5102.5089579, 6123.0114007, 6378.1369282] as const, v: [-4.743220157, 0.790536497, 5.533755727] as const };
const J2000 = { r: [5102.5096, 6123.01152, 6378.1363] as const, v: [-4.7432196, 0.7905366, 5.53375619] as const };
const TEME = { r: [5094.1801621, 6127.6446595, 6380.3445327] as const, v: [-4.746131487, 0.785818041, 5.531931288] as const };
const PEF_R = [-1033.4750313, 7901.3055856, 6380.3445327];

/** Largest component difference. */
const gap = (a: readonly number[], b: readonly number[]) => Math.max(...a.map((x, i) => Math.abs(x - b[i])));

// Velocities: Vallado scales the rotation rate by (1 - LOD/86400) with LOD = 1.5563 ms; the
// reduction here leaves LOD out, which moves the velocity by 1e-8 km/s (0.01 mm/s).
const V_TOL = 1.5e-8;

describe("IAU-76/FK5 reduction against Vallado 4th ed. Example 3-15", () => {
  const rot = fk5Rotations(JD, EOP);

  it("ITRF -> GCRF to 0.1 mm (with the example's nutation corrections)", () => {
    const s = itrfToInertialKernel(ITRF.r, ITRF.v, rot, "J2000");
    expect(gap(s.slice(0, 3), GCRF.r)).toBeLessThan(1e-7);
    expect(gap(s.slice(3), GCRF.v)).toBeLessThan(V_TOL);
  });

  it("GCRF -> ITRF to 0.1 mm", () => {
    const s = inertialToItrfKernel(GCRF.r, GCRF.v, rot, "J2000");
    expect(gap(s.slice(0, 3), ITRF.r)).toBeLessThan(1e-7);
    expect(gap(s.slice(3), ITRF.v)).toBeLessThan(V_TOL);
  });

  it("without the corrections (the worksheet's reduction): the published J2000 vector to its 0.1 m digits, both directions", () => {
    const fwd = ok(earthFixedToInertial([...ITRF.r, ...ITRF.v], JD, -0.4399619, -0.140682, 0.333309));
    expect(gap(fwd.slice(0, 3), J2000.r)).toBeLessThan(5e-5 + 1e-9);
    expect(gap(fwd.slice(3), J2000.v)).toBeLessThan(5e-8 + V_TOL);
    const back = ok(inertialToEarthFixed([...J2000.r, ...J2000.v], JD, -0.4399619, -0.140682, 0.333309));
    expect(gap(back.slice(0, 3), ITRF.r)).toBeLessThan(1e-4);
    // J2000 and GCRF differ by 0.9 m here: the reduction without corrections stays within a metre of the GCRF.
    expect(gap(fwd.slice(0, 3), GCRF.r)).toBeLessThan(1e-3);
  });

  it("passes through the published pseudo-Earth-fixed vector and TEME (0.1 mm)", () => {
    expect(gap(apply(rot.w, ITRF.r), PEF_R)).toBeLessThan(1e-7);
    const teme = itrfToInertialKernel(ITRF.r, ITRF.v, rot, "TEME");
    expect(gap(teme.slice(0, 3), TEME.r)).toBeLessThan(1e-7);
    expect(gap(teme.slice(3), TEME.v)).toBeLessThan(V_TOL);
    const itrf = ok(inertialToEarthFixed([...TEME.r, ...TEME.v], JD, -0.4399619, -0.140682, 0.333309, "teme"));
    expect(gap(itrf.slice(0, 3), ITRF.r)).toBeLessThan(1e-7);
  });

  it("rotates TEME to J2000 through true of date: the published TEME vector to the published J2000 one (0.1 m digits)", () => {
    const m = temeToJ2000Matrix(fk5Rotations(JD, { dut1: -0.4399619, xp: 0, yp: 0 }));
    expect(gap(apply(m, TEME.r), J2000.r)).toBeLessThan(5e-5 + 1e-9);
    // TEME -> J2000 needs no UT1: GAST - GMST does not depend on it.
    const m0 = temeToJ2000Matrix(fk5Rotations(JD, { dut1: 0, xp: 0, yp: 0 }));
    expect(gap(apply(m0, TEME.r), J2000.r)).toBeLessThan(5e-5 + 1e-9);
    expect(gap(apply(transpose(m0), apply(m0, TEME.r)), TEME.r)).toBeLessThan(1e-9);
    expect(rot3(0).flat()).toEqual([1, 0, 0, -0, 1, 0, 0, 0, 1]);
  });
});

describe("inertialToEarthFixed / earthFixedToInertial", () => {
  it("round-trip any state to 1e-9 km and 1e-12 km/s", () => {
    for (let k = 0; k < 50; k++) {
      const s = [7000 * Math.cos(k), 7000 * Math.sin(k), 300 * k - 7000, 1 + Math.sin(3 * k), 7 * Math.cos(k), 0.5];
      const jd = 2440000.5 + 600 * k;
      const fixed = ok(inertialToEarthFixed(s, jd, 0.3, 0.2, -0.1, k % 2 ? "TEME" : null));
      const back = ok(earthFixedToInertial(fixed, jd, 0.3, 0.2, -0.1, k % 2 ? "TEME" : undefined));
      expect(gap(back.slice(0, 3), s.slice(0, 3))).toBeLessThan(1e-9);
      expect(gap(back.slice(3), s.slice(3))).toBeLessThan(1e-12);
    }
  });

  it("refuses bad arguments, naming the parameter", () => {
    const s = [7000, 0, 0, 0, 7.5, 0];
    expectError(inertialToEarthFixed(s.slice(0, 5), JD), "bad_argument", "state");
    expectError(inertialToEarthFixed(s, NaN), "bad_argument", "date");
    expectError(inertialToEarthFixed(s, JD, 2), "bad_argument", "dut1");
    expectError(inertialToEarthFixed(s, JD, 0, 5), "bad_argument", "polar_x");
    expectError(earthFixedToInertial(s, JD, 0, 0, -7), "bad_argument", "polar_y");
    expect(err(inertialToEarthFixed(s, JD, 0, 0, 0, "GCRS")).message).toMatch(/^frame: got "GCRS"; expected an inertial frame: "J2000"/);
  });
});
