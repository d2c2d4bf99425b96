/**
 * Deterministic random orbits for the invariant tests: a seeded mulberry32 generator (so every run
 * draws the same orbits) and element sets per orbit class. sma in km, angles in degrees.
 */
export { seeded as rng } from "../support/random";

export const EARTH_GM = 398600.4418; // km^3/s^2, the value Vallado 4th ed. uses in his examples

export type OrbitClass =
  | "ellipse"
  | "high-ellipse"
  | "hyperbola"
  | "near-parabolic-ellipse"
  | "near-parabolic-hyperbola"
  | "circular"
  | "equatorial"
  | "retrograde-equatorial"
  | "circular-equatorial"
  | "polar"
  | "retrograde";

export const ORBIT_CLASSES: OrbitClass[] = [
  "ellipse",
  "high-ellipse",
  "hyperbola",
  "near-parabolic-ellipse",
  "near-parabolic-hyperbola",
  "circular",
  "equatorial",
  "retrograde-equatorial",
  "circular-equatorial",
  "polar",
  "retrograde",
];

export interface RandomOrbit {
  kind: OrbitClass;
  /** [sma, ecc, inc, raan, arg_periapsis, true_anomaly] */
  elements: number[];
  /** periapsis radius, km */
  rp: number;
}

/** One random element set of the class: periapsis 6600-50000 km, true anomaly inside the asymptotes for open orbits. */
export function randomOrbit(next: () => number, kind: OrbitClass): RandomOrbit {
  const between = (lo: number, hi: number) => lo + (hi - lo) * next();
  const logBetween = (lo: number, hi: number) => Math.exp(between(Math.log(lo), Math.log(hi)));
  const rp = between(6600, 50000);
  let ecc: number;
  switch (kind) {
    case "high-ellipse": ecc = between(0.9, 0.999); break;
    case "hyperbola": ecc = between(1.01, 6); break;
    case "near-parabolic-ellipse": ecc = 1 - logBetween(1e-9, 1e-3); break;
    case "near-parabolic-hyperbola": ecc = 1 + logBetween(1e-9, 1e-3); break;
    case "circular": case "circular-equatorial": ecc = 0; break;
    default: ecc = between(0.001, 0.9);
  }
  let inc: number;
  switch (kind) {
    case "equatorial": case "circular-equatorial": inc = 0; break;
    case "retrograde-equatorial": inc = 180; break;
    case "polar": inc = 90; break;
    case "retrograde": inc = between(90.5, 179.5); break;
    default: inc = between(0.5, 179.5);
  }
  const equatorial = inc === 0 || inc === 180;
  const raan = equatorial ? 0 : between(0, 360);
  const argPeriapsis = ecc === 0 ? 0 : between(0, 360);
  let nu = between(0, 360);
  if (ecc > 1) {
    const limit = (Math.acos(-1 / ecc) * 180) / Math.PI;
    nu = between(-0.9 * limit, 0.9 * limit);
    if (nu < 0) nu += 360;
  }
  const sma = rp / (1 - ecc);
  return { kind, elements: [sma, ecc, inc, raan, argPeriapsis, nu], rp };
}
