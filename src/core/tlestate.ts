import { finite, isDomainError, type Result } from "./domain";
import { fk5Rotations, inertialToItrfKernel, temeToJ2000Matrix } from "./fk5";
import { readStateFrame } from "./lookangles";
import { apply } from "./rotation";
import { sgp4Record, sgp4State } from "./sgp4";
import { parseTle } from "./tle";

/**
 * The state [x, y, z km, vx, vy, vz km/s] of the object of a TLE pair at a UTC Julian date, by
 * SGP4 (src/core/sgp4.ts), in `frame`: "J2000" (default; the sheet's inertial frame), "TEME"
 * (SGP4's own output) or "ITRF" (Earth-fixed). TEME -> J2000 through the true-of-date frame
 * (src/core/fk5.ts: r_J2000 = P N ROT3(-(GAST - GMST)) r_TEME); TEME -> ITRF by GMST with UT1 = UTC
 * and no polar motion (up to 0.4 km along the equator from UT1 - UTC; use INERTIAL_TO_EARTH_FIXED
 * on the TEME state for the full correction). Both lines are checked column by column first.
 * Accuracy: SGP4's own (about 1 km at the element set's epoch, growing by 1-3 km per day away from
 * it for low orbits): a planning value, not for operations or collision assessment.
 */
export function tleState(line1: unknown, line2: unknown, date: number, frame?: unknown): Result<number[]> {
  const parsed = parseTle(line1, line2);
  if (isDomainError(parsed)) return parsed;
  const badDate = finite("date", date, "days (a Julian date, UTC)");
  if (badDate) return badDate;
  const f = readStateFrame(frame);
  if (isDomainError(f)) return f;
  const record = sgp4Record(line1 as string, line2 as string);
  const teme = sgp4State(record, (date - record.epoch) * 1440, "date");
  if (isDomainError(teme) || f === "TEME") return teme;
  const rot = fk5Rotations(date, { dut1: 0, xp: 0, yp: 0 });
  const r = [teme[0], teme[1], teme[2]] as const;
  const v = [teme[3], teme[4], teme[5]] as const;
  if (f === "ITRF") return inertialToItrfKernel(r, v, rot, "TEME");
  const m = temeToJ2000Matrix(rot);
  return [...apply(m, r), ...apply(m, v)];
}
