import { badArgument, finiteResult, firstError, noAnswer, nonNegative, positive, type DomainError, type Result } from "./domain";

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
 * Largest mass ratio m0 / mf the rocket-equation functions accept for one vehicle: 100, a
 * propellant fraction of 99 %, where the tanks, engines and payload together would weigh 1 % of
 * the loaded vehicle. No stage comes near it: Saturn V's first stage, among the best mass
 * fractions flown, weighed 4,881,000 lb loaded and 303,000 lb dry, a mass ratio of 16.1
 * (propellant fraction 0.94), its second and third stages 10.9 and 10.0 (NASA Marshall Space
 * Flight Center, Saturn V News Reference, December 1968, stage weights, as quoted by the public
 * page walthelm.net/inverted-aerobraking/SaturnV.htm). A burn that needs more than six times the
 * best stage's ratio is the mark of a unit slip, most often a delta-v in m/s where km/s belongs
 * (92 for 0.092) or an exhaust speed in km/s where the specific impulse in s belongs, so it is
 * #N/A with the likely slip rather than a confident, impossible propellant mass. The limit lies
 * above every real single-stage question: even a single stage to low Earth orbit (9.4 km/s at
 * Isp 250 s, a ratio of 46) stays under it.
 */
export const MAX_MASS_RATIO = 100;

/** Largest burn exponent dv / (g0 Isp) under MAX_MASS_RATIO. */
const MAX_EXPONENT = Math.log(MAX_MASS_RATIO);

const sig = (x: number, digits = 3): string => String(Number(x.toPrecision(digits)));

/** The mass ratio written for a message: plain below a million, else in e-notation. */
const ratioText = (x: number): string => (x < 1e6 ? sig(x) : Number.isFinite(x) ? x.toExponential(1).replace("e+", "e") : `more than ${Number.MAX_VALUE.toExponential(1).replace("e+", "e")}`);

/** The unit slips that make a plausible burn look impossible, as hints for the message. */
function unitSlipHints(dv: number, isp: number): string {
  const hints: string[] = [];
  if (dv >= 1) hints.push(`delta-v is in km/s — ${sig(dv, 6)} m/s is ${sig(dv / 1000, 6)}`);
  if (isp < 10) hints.push(`specific impulse is in s — an exhaust speed of ${sig(isp, 6)} km/s is an Isp of ${sig(isp / G0_KM_PER_S2, 4)} s`);
  return hints.length > 0 ? `; ${hints.join("; ")}` : "";
}

const NO_STAGE = `no single stage exceeds about 16 (Saturn V's first stage), and ${MAX_MASS_RATIO} would be 99 % propellant`;

/**
 * The plausibility limit (MAX_MASS_RATIO) on one burn or a chain of burns of exponent x = dv /
 * (g0 Isp): undefined when the ratio exp(x) is within it, else #N/A naming the likely unit slip.
 */
export function implausibleBurn(dvParameter: string, dv: number, isp: number, x = burnExponent(dv, isp)): DomainError | undefined {
  if (!(x > MAX_EXPONENT)) return undefined;
  return noAnswer(
    dvParameter,
    `${sig(dv, 6)} km/s at an Isp of ${sig(isp, 6)} s needs a mass ratio of ${ratioText(Math.exp(x))}; ${NO_STAGE}${unitSlipHints(dv, isp)}`,
  );
}

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
  if (initialMass > MAX_MASS_RATIO * finalMass)
    return noAnswer(
      "final_mass",
      `initial_mass is ${ratioText(initialMass / finalMass)} times final_mass; ${NO_STAGE}, so check that both masses are in kg (a final mass in tonnes, or an initial one in grams, gives such a ratio)`,
    );
  return G0_KM_PER_S2 * isp * Math.log1p((initialMass - finalMass) / finalMass);
}

/**
 * Propellant (kg) that gives `dv` (km/s) at `isp` (s) to a vehicle weighing `finalMass` (kg) after
 * the burn: mf (exp(dv / (g0 Isp)) - 1), formed with expm1. #N/A with the likely unit slip when
 * the mass ratio exceeds MAX_MASS_RATIO; #NUM! only if a huge final mass overflows float64.
 * Accuracy: a few ulp.
 */
export function propellantMass(dv: number, isp: number, finalMass: number): Result<number> {
  const bad = firstError(nonNegative("dv", dv, "km/s"), ispCheck("isp", isp), positive("final_mass", finalMass, "kg"));
  return bad ?? implausibleBurn("dv", dv, isp) ?? finiteResult("final_mass", finalMass * Math.expm1(burnExponent(dv, isp)));
}

/**
 * Mass ratio m0 / mf = exp(dv / (g0 Isp)) for `dv` (km/s) at `isp` (s), at most MAX_MASS_RATIO
 * (above it #N/A with the likely unit slip). Accuracy: a few ulp.
 */
export function massRatio(dv: number, isp: number): Result<number> {
  const bad = firstError(nonNegative("dv", dv, "km/s"), ispCheck("isp", isp));
  return bad ?? implausibleBurn("dv", dv, isp) ?? Math.exp(burnExponent(dv, isp));
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
 * cannot fly them. A burn that takes the chain's mass ratio (initial mass over mass after it)
 * beyond MAX_MASS_RATIO is #N/A with the likely unit slip, and so is every later row. Omitted, null or 0 means no floor (0 is the same thing physically, and a blank
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
  let chainExponent = 0;
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
    chainExponent += x;
    const implausible = implausibleChain(i, x, chainExponent, dvs[i], isp);
    if (implausible) {
      rows.push(implausible);
      stoppedAt = i;
      stopReason = "needs a mass ratio no single vehicle reaches";
      continue;
    }
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
    // Finite by construction: every mass lies between initialMass / MAX_MASS_RATIO and initialMass.
    rows.push([massBefore, propellant, massAfter]);
    massBefore = massAfter;
  }
  return rows;
}

/**
 * Burns 1 to i + 1 flown by one vehicle (no staging) multiply their mass ratios, so the chain is
 * held to the limit of one burn (MAX_MASS_RATIO): #N/A with the likely unit slip beyond it.
 */
function implausibleChain(i: number, x: number, chain: number, dv: number, isp: number): DomainError | undefined {
  if (!(chain > MAX_EXPONENT)) return undefined;
  const what =
    x > MAX_EXPONENT
      ? `burn ${i + 1}, ${sig(dv, 6)} km/s at an Isp of ${sig(isp, 6)} s, needs a mass ratio of ${ratioText(Math.exp(x))}`
      : `burns 1 to ${i + 1} together need a mass ratio of ${ratioText(Math.exp(chain))} from one vehicle`;
  return noAnswer("dvs", `${what}; ${NO_STAGE}${unitSlipHints(dv, isp)}`);
}

const fmtKg = (m: number): string => String(Number(m.toPrecision(6)));
