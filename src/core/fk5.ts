import { RAD_PER_DEG } from "./angles";
import { badArgument, finite, firstError, isDomainError, type DomainError, type Result } from "./domain";
import { equationOfEquinoxes, nutation1980, nutationMatrix } from "./nutation1980";
import { precessionMatrix1976 } from "./precession1976";
import { apply, chain, rot1, rot2, rot3, transpose, type Mat3 } from "./rotation";
import { gmst1982 } from "./sidereal";
import { readState } from "./state";
import { SECONDS_PER_DAY } from "./time";
import { checkDut1, julianDateTT } from "./timescales";
import { cross, type Vec3 } from "./vector3";

/**
 * Inertial <-> Earth-fixed frames by the IAU-76/FK5 reduction (Vallado, Fundamentals of
 * Astrodynamics and Applications, 4th ed., §3.7, Alg. 24 FK5):
 *   r_J2000 = P N R W r_ITRF
 *   P  IAU 1976 precession, J2000 <- mean of date             (src/core/precession1976.ts)
 *   N  IAU 1980 nutation, mean of date <- true of date        (src/core/nutation1980.ts)
 *   R  = ROT3(-GAST), true of date <- pseudo Earth-fixed, GAST = GMST(IAU 1982, UT1) + equation
 *      of the equinoxes (src/core/sidereal.ts)
 *   W  = ROT1(yp) ROT2(xp), pseudo Earth-fixed <- ITRF, polar motion (Vallado Eq. 3-77)
 * Velocities: v_TOD = R (v_PEF + w x r_PEF), w = 7.292115146706979e-5 rad/s about z (the IERS
 * Conventions (2010) rate of the Earth rotation angle, the value Vallado's Example 3-15 uses;
 * the length-of-day excess, ~1 ms, is ignored: it changes speeds by under 1e-8 km/s).
 * P and N are taken as constant over the instant (their rates move speeds by ~1e-9 km/s).
 *
 * TEME, the frame of SGP4 (true equator, mean equinox; Vallado, Crawford, Hujsak, Kelso,
 * "Revisiting Spacetrack Report #3", AIAA 2006-6753, §5 and Appendix C): r_PEF = ROT3(GMST) r_TEME
 * with the IAU 1982 GMST; towards the inertial frames r_TOD = ROT3(-(GAST - GMST)) r_TEME.
 *
 * "J2000" here is the FK5 realisation: mean equator and equinox of J2000 by the IAU-1976/1980
 * theories without the IERS celestial pole offsets. It differs from the GCRF by the frame bias and
 * the offsets, about 0.05 arcsec, i.e. under a metre at low-orbit radius (Vallado 4th ed. Example
 * 3-15: 0.9 m), which the worksheet's accuracy statements include. Core callers may pass the
 * published offsets (nutationCorrection) to reach the GCRF to the millimetre.
 */

/** Rate of the Earth rotation angle, rad/s (IERS Conventions 2010: 2 pi x 1.00273781191135448 / 86400 s). */
export const EARTH_ROTATION_RATE = 7.292115146706979e-5;
const ARCSEC = RAD_PER_DEG / 3600;

/** Earth orientation at the instant: UT1 - UTC (s), polar motion (rad) and optional corrections to the IAU-1980 nutation (rad). */
export interface EarthOrientation {
  dut1: number;
  xp: number;
  yp: number;
  ddpsi?: number;
  ddeps?: number;
}

/** The rotations of the reduction at one instant. */
export interface Fk5Rotations {
  /** r_J2000 = pn r_TOD (precession times nutation). */
  pn: Mat3;
  /** GAST and GMST (IAU 1982), rad. */
  gast: number;
  gmst: number;
  /** r_PEF = w r_ITRF. */
  w: Mat3;
}

/** Kernel: the FK5 rotations at a UTC Julian date (TT from the leap-second table, UT1 = UTC + dut1). */
export function fk5Rotations(jdUtc: number, eop: EarthOrientation): Fk5Rotations {
  const jdTT = julianDateTT(jdUtc);
  const nut = nutation1980(jdTT);
  const dpsi = nut.dpsi + (eop.ddpsi ?? 0);
  const deps = nut.deps + (eop.ddeps ?? 0);
  const pn = chain(precessionMatrix1976(jdTT), nutationMatrix(dpsi, deps, nut.meanObliquity));
  const gmst = gmst1982(jdUtc + eop.dut1 / SECONDS_PER_DAY);
  const gast = gmst + equationOfEquinoxes(dpsi, nut.meanObliquity, nut.moonNode);
  return { pn, gast, gmst, w: chain(rot1(eop.yp), rot2(eop.xp)) };
}

const OMEGA: Vec3 = [0, 0, EARTH_ROTATION_RATE];

export type InertialFrame = "J2000" | "TEME";

/** Kernel: inertial state (J2000 or TEME) -> ITRF state, km and km/s. */
export function inertialToItrfKernel(r: Vec3, v: Vec3, rot: Fk5Rotations, frame: InertialFrame): number[] {
  // To the pseudo Earth-fixed frame: from J2000 through true of date and GAST, or from TEME by GMST.
  const toPef = frame === "TEME" ? rot3(rot.gmst) : chain(rot3(rot.gast), transpose(rot.pn));
  const rPef = apply(toPef, r);
  const vRot = apply(toPef, v);
  const wxr = cross(OMEGA, rPef);
  const vPef: Vec3 = [vRot[0] - wxr[0], vRot[1] - wxr[1], vRot[2] - wxr[2]];
  const wt = transpose(rot.w);
  return [...apply(wt, rPef), ...apply(wt, vPef)];
}

/** Kernel: ITRF state -> inertial state (J2000 or TEME), km and km/s. */
export function itrfToInertialKernel(r: Vec3, v: Vec3, rot: Fk5Rotations, frame: InertialFrame): number[] {
  const rPef = apply(rot.w, r);
  const vPef = apply(rot.w, v);
  const wxr = cross(OMEGA, rPef);
  const vIn: Vec3 = [vPef[0] + wxr[0], vPef[1] + wxr[1], vPef[2] + wxr[2]];
  const fromPef = frame === "TEME" ? rot3(-rot.gmst) : chain(rot.pn, rot3(-rot.gast));
  return [...apply(fromPef, rPef), ...apply(fromPef, vIn)];
}

/** Kernel: TEME -> J2000 rotation (quasi-inertial: the same matrix for position and velocity), r_J2000 = m r_TEME. */
export const temeToJ2000Matrix = (rot: Fk5Rotations): Mat3 => chain(rot.pn, rot3(-(rot.gast - rot.gmst)));

/** Reads the optional `frame` argument naming an inertial frame; blank means J2000. */
export function readInertialFrame(value: unknown): InertialFrame | DomainError {
  if (value === null || value === undefined) return "J2000";
  const key = typeof value === "string" ? value.trim().toUpperCase() : "";
  return key === "J2000" || key === "TEME" ? key : badArgument("frame", value, `an inertial frame: "J2000" (FK5 mean equator and equinox of J2000, the default) or "TEME" (the frame of SGP4 and two-line element sets)`);
}

/** Reads dut1 (s), polar_x, polar_y (arcsec; blank = 0) into an EarthOrientation. */
export function readEarthOrientation(dut1: number | null | undefined, polarX: number | null | undefined, polarY: number | null | undefined): EarthOrientation | DomainError {
  const pole = (name: string, v: number | null | undefined) =>
    v === null || v === undefined ? undefined : firstError(finite(name, v, "arcsec"), Math.abs(v) <= 2 ? undefined : badArgument(name, v, "a polar-motion coordinate in arcsec, within 2 (IERS Bulletin A values stay under 0.6)"));
  const bad = firstError(checkDut1(dut1), pole("polar_x", polarX), pole("polar_y", polarY));
  if (bad) return bad;
  return { dut1: dut1 ?? 0, xp: (polarX ?? 0) * ARCSEC, yp: (polarY ?? 0) * ARCSEC };
}

/** The checked arguments of the two frame conversions, or the first error in parameter order. */
function readConversion(
  state: readonly number[],
  date: number,
  dut1: number | null | undefined,
  polarX: number | null | undefined,
  polarY: number | null | undefined,
  frame: unknown,
): { r: Vec3; v: Vec3; rot: Fk5Rotations; frame: InertialFrame } | DomainError {
  const read = readState(state);
  if (isDomainError(read)) return read;
  const badDate = finite("date", date, "days (a Julian date, UTC)");
  if (badDate) return badDate;
  const eop = readEarthOrientation(dut1, polarX, polarY);
  if (isDomainError(eop)) return eop;
  const f = readInertialFrame(frame);
  if (isDomainError(f)) return f;
  return { r: read.r, v: read.v, rot: fk5Rotations(date, eop), frame: f };
}

/**
 * Earth-fixed (ITRF) state [x, y, z km, vx, vy, vz km/s] of an inertial state at a UTC Julian
 * date, by the IAU-76/FK5 reduction above; `frame` names the input frame ("J2000", default, or
 * "TEME"); dut1 = UT1 - UTC in s, polar_x and polar_y in arcsec (IERS Bulletin A), all blank = 0.
 * Accuracy against Vallado 4th ed. Example 3-15 (test/core/fk5.test.ts): the published
 * intermediate and final vectors to 0.1 mm with the example's EOP; without the celestial pole
 * offsets, the published J2000 vector to its 0.1 m digits. Leaving dut1 at 0 rotates the result
 * by up to 0.9 s of Earth rotation, 0.4 km at the equator; leaving out polar motion, up to ~15 m.
 */
export function inertialToEarthFixed(
  state: readonly number[],
  date: number,
  dut1?: number | null,
  polarX?: number | null,
  polarY?: number | null,
  frame?: unknown,
): Result<number[]> {
  const c = readConversion(state, date, dut1, polarX, polarY, frame);
  return isDomainError(c) ? c : inertialToItrfKernel(c.r, c.v, c.rot, c.frame);
}

/** Inertial state (J2000 or TEME, per `frame`) of an Earth-fixed ITRF state; the inverse of inertialToEarthFixed, same method and accuracy. */
export function earthFixedToInertial(
  state: readonly number[],
  date: number,
  dut1?: number | null,
  polarX?: number | null,
  polarY?: number | null,
  frame?: unknown,
): Result<number[]> {
  const c = readConversion(state, date, dut1, polarX, polarY, frame);
  return isDomainError(c) ? c : itrfToInertialKernel(c.r, c.v, c.rot, c.frame);
}
