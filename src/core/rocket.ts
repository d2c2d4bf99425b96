import { arithmeticFailure, badArgument, finiteResult, firstError, noAnswer, nonNegative, positive, type DomainError, type Result } from "./domain";

/**
 * The ideal rocket equation (Tsiolkovsky): dv = g0 Isp ln(m0 / mf), for impulsive burns with no
 * gravity or drag losses. Sheet units: dv km/s, Isp s, masses kg. Curtis, Orbital Mechanics for
 * Engineering Students, 2nd ed., ch. 6, impulsive maneuvers (eq. 6.1, from memory).
 */

/** Standard gravity g0 = 9.80665 m/s^2 exactly (CGPM 1901), in km/s^2 because dv is in km/s. */
export const G0_KM_PER_S2 = 0.00980665;

/** Kernel: dv / (g0 Isp), the burn's exponent in the rocket equation. */
export const burnExponent = (dv: number, isp: number): number => dv / (G0_KM_PER_S2 * isp);

/**
 * Kernel: propellant (kg) a burn of exponent x = dv / (g0 Isp) uses, starting from `initialMass`
 * (kg): m0 (1 - exp(-x)), formed as -m0 expm1(-x) so small burns keep full relative precision.
 */
export const propellantFromInitialMass = (initialMass: number, x: number): number => -initialMass * Math.expm1(-x);

const ispCheck = (parameter: string, isp: number): DomainError | undefined => positive(parameter, isp, "seconds of specific impulse");

/**
 * Dv (km/s) a burn gives when it takes the vehicle from `initialMass` to `finalMass` (kg) at
 * specific impulse `isp` (s). ln(m0/mf) is formed as log1p((m0 - mf)/mf), so small burns keep
 * full relative precision. Accuracy: a few ulp.
 */
export function rocketDv(isp: number, initialMass: number, finalMass: number): Result<number> {
  const bad = firstError(ispCheck("isp", isp), positive("initial_mass", initialMass, "kg"), positive("final_mass", finalMass, "kg"));
  if (bad) return bad;
  if (finalMass > initialMass)
    return badArgument("final_mass", finalMass, `a final mass no greater than initial_mass (${initialMass} kg): a burn only loses mass`);
  return G0_KM_PER_S2 * isp * Math.log1p((initialMass - finalMass) / finalMass);
}

/**
 * Propellant (kg) that gives `dv` (km/s) at `isp` (s) to a vehicle weighing `finalMass` (kg) after
 * the burn: mf (exp(dv / (g0 Isp)) - 1), formed with expm1. #NUM! when the mass ratio overflows
 * float64 (dv above about 709 g0 Isp). Accuracy: a few ulp.
 */
export function propellantMass(dv: number, isp: number, finalMass: number): Result<number> {
  const bad = firstError(nonNegative("dv", dv, "km/s"), ispCheck("isp", isp), positive("final_mass", finalMass, "kg"));
  return bad ?? finiteResult("dv", finalMass * Math.expm1(burnExponent(dv, isp)));
}

/** Mass ratio m0 / mf = exp(dv / (g0 Isp)) for `dv` (km/s) at `isp` (s). Accuracy: a few ulp. */
export function massRatio(dv: number, isp: number): Result<number> {
  const bad = firstError(nonNegative("dv", dv, "km/s"), ispCheck("isp", isp));
  return bad ?? finiteResult("dv", Math.exp(burnExponent(dv, isp)));
}

/**
 * Rows within this relative margin below the dry mass count as reaching it exactly, so a budget
 * sized to use every kilogram is not failed by the last bit of rounding.
 */
const DRY_MASS_ROUNDING = 1e-12;

/**
 * A sequence of burns flown one after another: one row per burn, [mass before, propellant, mass
 * after] (kg). `isps` holds one specific impulse for every burn or one per burn.
 *
 * Exhaustion model: the ideal equation alone never runs out (mass after = before exp(-dv/(g0 Isp))
 * stays positive), so `dryMass` (kg, optional, last before the sheet's include_header) is the
 * mass with all usable propellant gone: structure, payload, residuals. A burn whose mass after
 * would fall below it is #N/A with the shortfall, and so is every later row, since the vehicle
 * cannot fly them. Omitted, null or 0 means no floor (0 is the same thing physically, and a blank
 * cell in a range arrives as 0). A negative dv or a bad isp errors its own row; later rows are
 * #N/A because their starting mass is unknown.
 *
 * Whole-call errors (bad initial_mass or dry_mass, no burns, an isps list of the wrong length)
 * return one DomainError instead of rows. Accuracy: each row a few ulp per burn, accumulating
 * linearly along the sequence.
 */
export function burnSequence(dvs: number[], isps: number[], initialMass: number, dryMass?: number | null): Result<Result<number[]>[]> {
  if (dvs.length === 0) return badArgument("dvs", dvs, "at least one burn dv in km/s");
  if (isps.length !== 1 && isps.length !== dvs.length)
    return badArgument("isps", isps, `one specific impulse for all burns, or one per burn (${dvs.length})`);
  const floor = dryMass ?? 0;
  const bad = firstError(
    positive("initial_mass", initialMass, "kg"),
    nonNegative("dry_mass", floor, "kg"),
    floor <= initialMass ? undefined : badArgument("dry_mass", floor, `a dry mass no greater than initial_mass (${initialMass} kg)`),
  );
  if (bad) return bad;

  const rows: Result<number[]>[] = [];
  let massBefore = initialMass;
  let stoppedAt = -1;
  let stopReason = "";
  for (let i = 0; i < dvs.length; i++) {
    if (stoppedAt >= 0) {
      rows.push(noAnswer("dvs", `burn ${i + 1} follows burn ${stoppedAt + 1}, which ${stopReason}`));
      continue;
    }
    const isp = isps.length === 1 ? isps[0] : isps[i];
    const rowBad = firstError(nonNegative("dvs", dvs[i], "km/s"), ispCheck("isps", isp));
    if (rowBad) {
      rows.push(rowBad);
      stoppedAt = i;
      stopReason = "has no result";
      continue;
    }
    const x = burnExponent(dvs[i], isp);
    const propellant = propellantFromInitialMass(massBefore, x);
    const massAfter = massBefore * Math.exp(-x);
    if (massAfter < floor * (1 - DRY_MASS_ROUNDING)) {
      const available = massBefore - floor;
      rows.push(
        noAnswer(
          "dvs",
          `burn ${i + 1} needs ${fmtKg(propellant)} kg of propellant but only ${fmtKg(available)} kg remain above the dry mass of ${fmtKg(floor)} kg`,
        ),
      );
      stoppedAt = i;
      stopReason = "exhausts the propellant";
      continue;
    }
    const row = [massBefore, propellant, massAfter];
    if (!row.every(Number.isFinite)) {
      rows.push(arithmeticFailure("dvs", "the result overflows float64 for these inputs"));
      stoppedAt = i;
      stopReason = "has no result";
      continue;
    }
    rows.push(row);
    massBefore = massAfter;
  }
  return rows;
}

const fmtKg = (m: number): string => String(Number(m.toPrecision(6)));
