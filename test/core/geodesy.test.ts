import Decimal from "decimal.js";
import { describe, expect, it } from "vitest";
import { isDomainError } from "../../src/core/domain";
import { greatCircleCourse, greatCircleDistance, horizonRange, rhumbLineCourse, rhumbLineDistance } from "../../src/core/geodesy";
import { seeded } from "../support/random";

const num = (x: unknown): number => {
  if (isDomainError(x)) throw new Error(x.message);
  return x as number;
};
const DEG = Math.PI / 180;
const D = Decimal.clone({ precision: 40 });
const dms = (d: number, m: number) => d + m / 60;

describe("great circles against the Aviation Formulary's worked examples", () => {
  // E. Williams, Aviation Formulary (V1.46), "Worked examples"; the numbers were read in a public
  // translation of the page that keeps the original numbers (copy not recorded). Its longitudes are
  // west-positive; ours are east-positive.
  const lax = [dms(33, 57), -dms(118, 24)];
  const jfk = [dms(40, 38), -dms(73, 47)];
  it("LAX to JFK: 0.623585 rad, 2144 nm", () => {
    expect(num(greatCircleDistance(1, lax[0], lax[1], jfk[0], jfk[1])).toFixed(6)).toBe("0.623585");
    const nmRadius = (180 * 60) / Math.PI; // 1 nm = 1 arcminute of great circle
    expect(Math.round(num(greatCircleDistance(nmRadius, lax[0], lax[1], jfk[0], jfk[1])))).toBe(2144);
  });
  it("LAX to JFK: initial true course 1.150035 rad (66 deg)", () => {
    expect((num(greatCircleCourse(lax[0], lax[1], jfk[0], jfk[1])) * DEG).toFixed(6)).toBe("1.150035");
  });
  it("LAX to D (34:30N 116:30W): 0.02905 rad at 70.17 deg", () => {
    const d = [dms(34, 30), -dms(116, 30)];
    expect(num(greatCircleDistance(1, lax[0], lax[1], d[0], d[1])).toFixed(5)).toBe("0.02905");
    expect(num(greatCircleCourse(lax[0], lax[1], d[0], d[1])).toFixed(2)).toBe("70.17");
  });
  it("REO (42.600N 117.866W) to BKE (44.840N 117.806W): dst12 0.039103, crs12 0.018996 rad", () => {
    expect(num(greatCircleDistance(1, 42.6, -117.866, 44.84, -117.806)).toFixed(6)).toBe("0.039103");
    expect((num(greatCircleCourse(42.6, -117.866, 44.84, -117.806)) * DEG).toFixed(6)).toBe("0.018996");
  });
});

/** 40-digit unit vectors and the angle atan2(|a x b|, a . b), and the course as the direction of b in a's tangent plane. */
function vectorRoute(lat1: number, lon1: number, lat2: number, lon2: number) {
  const pi = D.acos(-1);
  const rad = (x: number) => new D(x).mul(pi).div(180);
  const unit = (lat: number, lon: number) => [D.cos(rad(lat)).mul(D.cos(rad(lon))), D.cos(rad(lat)).mul(D.sin(rad(lon))), D.sin(rad(lat))];
  const a = unit(lat1, lon1);
  const b = unit(lat2, lon2);
  const cross = [a[1].mul(b[2]).minus(a[2].mul(b[1])), a[2].mul(b[0]).minus(a[0].mul(b[2])), a[0].mul(b[1]).minus(a[1].mul(b[0]))];
  const dot = a[0].mul(b[0]).plus(a[1].mul(b[1])).plus(a[2].mul(b[2]));
  const angle = D.atan2(cross[0].pow(2).plus(cross[1].pow(2)).plus(cross[2].pow(2)).sqrt(), dot);
  const east = [D.sin(rad(lon1)).neg(), D.cos(rad(lon1)), new D(0)];
  const north = [D.sin(rad(lat1)).neg().mul(D.cos(rad(lon1))), D.sin(rad(lat1)).neg().mul(D.sin(rad(lon1))), D.cos(rad(lat1))];
  const be = b[0].mul(east[0]).plus(b[1].mul(east[1])).plus(b[2].mul(east[2]));
  const bn = b[0].mul(north[0]).plus(b[1].mul(north[1])).plus(b[2].mul(north[2]));
  const course = D.atan2(be, bn).mul(180).div(pi).plus(360).mod(360);
  return { angle: angle.toNumber(), course: course.toNumber() };
}

describe("great circles against a 40-digit vector route", () => {
  it("distance to 2e-15 rad and course to 1e-9 deg, near-coincident and near-antipodal pairs included", () => {
    const rand = seeded(8);
    for (let k = 0; k < 400; k++) {
      const lat1 = 178 * rand() - 89;
      const lon1 = 720 * rand() - 360;
      let lat2 = 178 * rand() - 89;
      let lon2 = 720 * rand() - 360;
      if (k % 4 === 1) [lat2, lon2] = [lat1 + 1e-7 * (rand() - 0.5), lon1 + 1e-7 * (rand() - 0.5)];
      if (k % 4 === 2) [lat2, lon2] = [-lat1 + 1e-6 * (rand() - 0.5), lon1 + 180 + 1e-6 * (rand() - 0.5)];
      const ref = vectorRoute(lat1, lon1, lat2, lon2);
      expect(Math.abs(num(greatCircleDistance(1, lat1, lon1, lat2, lon2)) - ref.angle)).toBeLessThan(2e-15);
      if (k % 4 !== 2 && k % 4 !== 1) {
        const c = num(greatCircleCourse(lat1, lon1, lat2, lon2));
        expect(Math.abs(((c - ref.course + 540) % 360) - 180)).toBeLessThan(1e-9);
      }
    }
  });

  it("gives half the circumference between antipodes and the shorter way across the antimeridian", () => {
    expect(num(greatCircleDistance(6371, 30, 20, -30, -160))).toBeCloseTo(Math.PI * 6371, 9);
    expect(num(greatCircleDistance(6371, 0, 179, 0, -179))).toBeCloseTo(2 * DEG * 6371, 9);
    expect(num(greatCircleCourse(0, 179, 0, -179))).toBeCloseTo(90, 9);
    expect(num(greatCircleDistance(6371, 10, 0, 10, 360))).toBe(0);
  });

  it("heads south from the north pole and north from the south pole", () => {
    expect(num(greatCircleCourse(90, 0, 10, 123))).toBe(180);
    expect(num(greatCircleCourse(-90, 0, 10, 123))).toBe(0);
    expect(num(greatCircleCourse(10, 20, 90, 0))).toBe(0);
  });

  it("has no course between coincident or antipodal points", () => {
    const same = greatCircleCourse(12, 34, 12, 394);
    expect(isDomainError(same) && same.kind === "no_answer" && same.parameter === "lat2").toBe(true);
    const anti = greatCircleCourse(12, 34, -12, -146);
    expect(isDomainError(anti) && anti.kind === "no_answer").toBe(true);
    const poles = greatCircleCourse(90, 10, 90, 50);
    expect(isDomainError(poles) && poles.kind === "no_answer").toBe(true);
  });
});

/** Independent route: fly the constant course by RK4 on the sphere and see where it ends. */
function flyRhumb(lat1: number, lon1: number, courseDeg: number, distanceOverR: number): [number, number] {
  const c = courseDeg * DEG;
  let phi = lat1 * DEG;
  let lam = lon1 * DEG;
  const steps = 4000;
  const h = distanceOverR / steps;
  const dLam = (p: number) => Math.sin(c) / Math.cos(p);
  for (let k = 0; k < steps; k++) {
    const k1 = dLam(phi);
    const k2 = dLam(phi + (h / 2) * Math.cos(c));
    const k4 = dLam(phi + h * Math.cos(c));
    lam += (h / 6) * (k1 + 4 * k2 + k4);
    phi += h * Math.cos(c);
  }
  return [phi / DEG, lam / DEG];
}

describe("rhumb lines", () => {
  it("land on the destination when flown at their course for their distance (RK4 check)", () => {
    const rand = seeded(31);
    for (let k = 0; k < 200; k++) {
      const lat1 = 150 * rand() - 75;
      const lat2 = 150 * rand() - 75;
      const lon1 = 360 * rand() - 180;
      const lon2 = 360 * rand() - 180;
      const course = num(rhumbLineCourse(lat1, lon1, lat2, lon2));
      const dist = num(rhumbLineDistance(1, lat1, lon1, lat2, lon2));
      const [phi, lam] = flyRhumb(lat1, lon1, course, dist);
      expect(Math.abs(phi - lat2)).toBeLessThan(1e-9);
      expect(Math.abs(((lam - lon2 + 540) % 360) - 180)).toBeLessThan(1e-6);
    }
  });

  it("follows a parallel in the limit: course 90 or 270 deg, distance R cos(lat) dlon", () => {
    expect(num(rhumbLineCourse(50, 10, 50, 40))).toBe(90);
    expect(num(rhumbLineCourse(50, 40, 50, 10))).toBe(270);
    expect(num(rhumbLineDistance(6371, 50, 10, 50, 40))).toBeCloseTo(6371 * Math.cos(50 * DEG) * 30 * DEG, 9);
    // a hair off the parallel: continuous with it
    expect(num(rhumbLineDistance(6371, 50, 10, 50 + 1e-9, 40))).toBeCloseTo(6371 * Math.cos(50 * DEG) * 30 * DEG, 6);
  });

  it("crosses the antimeridian the shorter way and is never shorter than the great circle", () => {
    expect(num(rhumbLineCourse(-20, 170, -20, -170))).toBe(90);
    expect(num(rhumbLineDistance(6371, -20, 170, -20, -170))).toBeCloseTo(6371 * Math.cos(20 * DEG) * 20 * DEG, 9);
    const rand = seeded(4);
    for (let k = 0; k < 200; k++) {
      const p = [160 * rand() - 80, 360 * rand(), 160 * rand() - 80, 360 * rand()];
      expect(num(rhumbLineDistance(1, p[0], p[1], p[2], p[3]))).toBeGreaterThanOrEqual(num(greatCircleDistance(1, p[0], p[1], p[2], p[3])) - 1e-15);
    }
  });

  it("runs along a meridian to a pole and has no course between coincident points", () => {
    expect(num(rhumbLineCourse(10, 30, 90, 30))).toBe(0);
    expect(num(rhumbLineDistance(6371, 10, 30, 90, 30))).toBeCloseTo(6371 * 80 * DEG, 9);
    const same = rhumbLineCourse(5, 5, 5, 365);
    expect(isDomainError(same) && same.kind === "no_answer").toBe(true);
  });
});

describe("rhumb lines that start or end at a pole", () => {
  /** 120-digit Mercator sailing (decimal.js 10.6.0): course and length over R from (lat1, 0) to (lat2, dlon). */
  const P = Decimal.clone({ precision: 120 });
  function mercator(lat1: string, lat2: string, dLonDeg: number) {
    const pi = P.acos(-1);
    const rad = (x: Decimal.Value) => new P(x).mul(pi).div(180);
    // psi = atanh(sin lat): the same isometric latitude as asinh(tan lat), without tan's pole.
    const psi = (lat: string) => P.atanh(P.sin(rad(lat)));
    const dLat = rad(lat2).minus(rad(lat1));
    const dPsi = psi(lat2).minus(psi(lat1));
    const dLon = rad(dLonDeg);
    const course = P.atan2(dLon, dPsi).mul(180).div(pi);
    return { course: course.toNumber(), length: P.sqrt(dLat.pow(2).plus(dLat.div(dPsi).mul(dLon).pow(2))).toNumber() };
  }

  it("are the meridian, the limit of the 120-digit spirals as the end nears the pole (course 0, length R dlat)", () => {
    // From 60 N, 10 E towards the north pole with a 50 deg longitude difference: as the end
    // latitude approaches 90 the exact course falls towards 0 (like 1/ln) and the length towards
    // the meridian's 30 deg. The float64 Mercator term stops at psi = 38 (tan(pi/2) = 1.6e16),
    // which once gave a course of about 1.4 deg at the pole itself.
    let previous = { course: Infinity, length: Infinity };
    for (const eps of ["1e-6", "1e-15", "1e-25", "1e-35"]) {
      const m = mercator("60", new P(90).minus(eps).toString(), 50);
      expect(m.course).toBeGreaterThan(0);
      expect(m.course).toBeLessThan(previous.course);
      expect(m.length).toBeLessThan(previous.length);
      expect(m.length).toBeGreaterThan((30 * Math.PI) / 180);
      previous = m;
    }
    expect(previous.course).toBeLessThan(0.7); // at 1e-35 deg from the pole, still 0.6 deg: the limit comes slowly
    expect(num(rhumbLineCourse(60, 10, 90, 60))).toBe(0);
    expect(num(rhumbLineDistance(1, 60, 10, 90, 60))).toBeCloseTo((30 * Math.PI) / 180, 15);
  });

  it("leave a pole along its meridian: 180 from the north pole, 0 from the south pole, whatever the longitudes", () => {
    expect(num(rhumbLineCourse(90, 10, 60, 60))).toBe(180);
    expect(num(rhumbLineCourse(-90, 10, 60, 60))).toBe(0);
    expect(num(rhumbLineCourse(60, 10, -90, 60))).toBe(180);
    expect(num(rhumbLineCourse(90, 0, -90, 170))).toBe(180);
    expect(num(rhumbLineDistance(6371, -90, 0, 60, 123))).toBeCloseTo(6371 * 150 * DEG, 9);
    // Two points at one pole are the same point.
    expect(num(rhumbLineDistance(6371, 90, 0, 90, 100))).toBe(0);
  });
});

describe("horizon slant range", () => {
  it("agrees with the law-of-cosines route at 40 digits", () => {
    // Triangle centre-site-satellite: the angle at the satellite is asin(R cos e / (R + h)), the
    // central angle is 90 - e - that, and rho^2 = R^2 + (R + h)^2 - 2 R (R + h) cos(central).
    const pi = D.acos(-1);
    const rand = seeded(12);
    for (let k = 0; k < 300; k++) {
      const R = 1000 + 70000 * rand();
      const h = k % 3 === 0 ? 1e-3 * rand() : 40000 * rand();
      const e = 90 * rand();
      const er = new D(e).mul(pi).div(180);
      const Rh = new D(R).plus(h);
      const nadir = D.asin(new D(R).mul(D.cos(er)).div(Rh));
      const central = pi.div(2).minus(er).minus(nadir);
      const ref = new D(R).pow(2).plus(Rh.pow(2)).minus(new D(2).mul(R).mul(Rh).mul(D.cos(central))).sqrt().toNumber();
      expect(Math.abs(num(horizonRange(R, h, e)) - ref)).toBeLessThan(1e-14 * ref + 1e-300);
    }
  });

  it("is sqrt(2Rh + h^2) at the horizon and h overhead", () => {
    expect(num(horizonRange(6378.137, 500, 0))).toBeCloseTo(Math.sqrt(2 * 6378.137 * 500 + 500 * 500), 9);
    expect(num(horizonRange(6378.137, 500, 90))).toBeCloseTo(500, 10);
    expect(num(horizonRange(6378.137, 0, 0))).toBe(0);
  });

  it("refuses negative altitude and elevations outside 0-90 deg", () => {
    const a = horizonRange(6378, -1, 10);
    expect(isDomainError(a) && a.parameter === "altitude").toBe(true);
    const e = horizonRange(6378, 500, -5);
    expect(isDomainError(e) && e.parameter === "min_elevation").toBe(true);
  });
});
