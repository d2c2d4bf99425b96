import * as rocket from "../core/rocket";
import { isDomainError, type DomainError, type Result } from "../core/domain";
import { family, type SizeView } from "./define";
import { list, num, numbers, optNum } from "./params";

// Family "Propellant": the ideal rocket equation, dv = g0 Isp ln(m0 / mf), with
// g0 = 9.80665 m/s² exactly and dv in km/s. No gravity, steering or drag losses. Examples: the
// invented Skerry-1, 180 kg at separation with a monopropellant thruster of Isp 225 s.

const BURN_COLUMNS = ["mass before (kg)", "propellant (kg)", "mass after (kg)"];

/** A burn row that has no result fills all of its cells with the reason. */
const burnRows = (rows: Result<Result<number[]>[]>): Result<(number[] | DomainError[])[]> =>
  isDomainError(rows) ? rows : rows.map((r) => (isDomainError(r) ? BURN_COLUMNS.map(() => r) : r));

const define = family("Propellant");

const ROCKET_DV = define.scalar("ROCKET_DV", [num("isp", "s"), num("initial_mass", "kg"), num("final_mass", "kg")], rocket.rocketDv, {
  example: [225, 180, 172.5],
  terms: ["Tsiolkovsky", "rocket equation", "delta-v from masses", "dv"],
});
/**
 * Delta-v a burn gives when it takes the vehicle from initial_mass to final_mass (ideal rocket equation, g0 = 9.80665 m/s²; no gravity or drag losses). Refuses (#N/A) an initial mass more than 100 times the final one, which no single stage reaches (the best flown are near 16): usually the two masses in different units.
 * @customfunction ROCKET_DV
 * @helpurl https://localhost:3000/reference.html#rocket_dv
 * @param isp Specific impulse, s.
 * @param initial_mass Vehicle mass before the burn, kg.
 * @param final_mass Vehicle mass after the burn, kg (no more than initial_mass).
 * @returns Delta-v, km/s.
 */
export function rocketDv(isp: any[][], initial_mass: any[][], final_mass: any[][]): any[][] {
  return ROCKET_DV(arguments);
}

const PROPELLANT_MASS = define.scalar("PROPELLANT_MASS", [num("dv", "km/s"), num("isp", "s"), num("final_mass", "kg")], rocket.propellantMass, {
  example: [0.1, 225, 172.5],
  terms: ["fuel mass", "Tsiolkovsky", "rocket equation", "propellant budget", "dv"],
});
/**
 * Propellant needed to give a delta-v to a vehicle that weighs final_mass after the burn: mf (exp(dv / (g0 Isp)) − 1), g0 = 9.80665 m/s² (ideal rocket equation; add margins for losses). Refuses (#N/A) a burn needing a mass ratio above 100, which no single stage reaches: usually a delta-v in m/s where km/s belongs.
 * @customfunction PROPELLANT_MASS
 * @helpurl https://localhost:3000/reference.html#propellant_mass
 * @param dv Delta-v of the burn, km/s.
 * @param isp Specific impulse, s.
 * @param final_mass Vehicle mass after the burn, kg.
 * @returns Propellant mass, kg.
 */
export function propellantMass(dv: any[][], isp: any[][], final_mass: any[][]): any[][] {
  return PROPELLANT_MASS(arguments);
}

const MASS_RATIO = define.scalar("MASS_RATIO", [num("dv", "km/s"), num("isp", "s")], rocket.massRatio, {
  example: [0.1, 225],
  terms: ["Tsiolkovsky", "rocket equation", "wet to dry ratio"],
});
/**
 * Mass ratio (mass before over mass after) for a delta-v: exp(dv / (g0 Isp)), g0 = 9.80665 m/s² (ideal rocket equation). Refuses (#N/A, with the ratio it would need) a ratio above 100, which no single stage reaches (the best flown are near 16): usually a delta-v in m/s where km/s belongs.
 * @customfunction MASS_RATIO
 * @helpurl https://localhost:3000/reference.html#mass_ratio
 * @param dv Delta-v, km/s.
 * @param isp Specific impulse, s.
 * @returns Mass ratio m0 / mf (dimensionless, 1 to 100).
 */
export function massRatio(dv: any[][], isp: any[][]): any[][] {
  return MASS_RATIO(arguments);
}

const BURN_SEQUENCE = define.table(
  "BURN_SEQUENCE",
  [list("dvs", false, numbers), list("isps", false, numbers), num("initial_mass", "kg"), optNum("dry_mass", "kg")],
  (dvs, isps, m0, dry) => burnRows(rocket.burnSequence(dvs, isps, m0, dry)),
  {
    example: [[[0.0458], [0.0459], [0.105], [0.121]], 225, 180, 150, true],
    terms: ["delta-v budget", "propellant budget", "mass budget", "staging", "burn plan"],
    labels: () => BURN_COLUMNS,
    // One row per burn (a blank cell in the range still counts: Excel passes it as 0).
    size: (a: SizeView) => {
      const burns = a.cells("dvs");
      return burns === undefined ? undefined : { rows: burns + (a.header() ? 1 : 0), cols: BURN_COLUMNS.length };
    },
  },
);
/**
 * Masses through a sequence of burns flown in order (ideal rocket equation, g0 = 9.80665 m/s²), one row per burn. With dry_mass, a burn that needs more propellant than remains above it is #N/A with the shortfall, and so is every burn after it; so is a burn that takes the vehicle's mass ratio since the first burn above 100, which no single vehicle reaches (usually a delta-v in m/s).
 * @customfunction BURN_SEQUENCE
 * @helpurl https://localhost:3000/reference.html#burn_sequence
 * @param dvs Delta-v of each burn in order, km/s (a column or a row).
 * @param isps Specific impulse, s: one value for every burn, or one per burn.
 * @param initial_mass Vehicle mass before the first burn, kg.
 * @param [dry_mass] Mass with all usable propellant gone (structure, payload, residuals), kg. Omit (or 0) for no limit.
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per burn: mass before (kg), propellant used (kg), mass after (kg).
 */
export function burnSequence(dvs: any[][], isps: any[][], initial_mass: any[][], dry_mass?: any[][], include_header?: any[][]): any[][] {
  return BURN_SEQUENCE(arguments);
}
