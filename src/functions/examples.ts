import { BODIES_EXAMPLES } from "./examples/bodies";
import { ENVIRONMENT_EXAMPLES } from "./examples/environment";
import { LAUNCH_EXAMPLES } from "./examples/launch";
import { UNITS_EXAMPLES } from "./examples/units";
import { ESCAPE_EXAMPLES } from "./examples/escape";
import { MANEUVERS_EXAMPLES } from "./examples/maneuvers";
import { PLANET_TRANSFER_EXAMPLES } from "./examples/planettransfer";
import { PROPELLANT_EXAMPLES } from "./examples/propellant";
import { INTERPLANETARY_EXAMPLES } from "./examples/interplanetary";
import { KEPLER_EXAMPLES } from "./examples/kepler";
import { SPEEDS_EXAMPLES } from "./examples/speeds";
import { STATE_EXAMPLES } from "./examples/state";

/**
 * One worked call per worksheet function, as the values a user would type: the function guide in
 * the pane shows them as formulas, and the contract tests call every function with them through
 * the built bundle. Ranges are written as rows of values (they become array constants {..}).
 * Values here are illustrations (the invented Skerry mission of DESIGN.md §7), not references.
 * One file per family under ./examples, merged here, so families are added independently.
 */
export type ExampleArg = number | string | boolean | null | (number | string | boolean)[][];

export const EXAMPLES: Record<string, ExampleArg[]> = {
  ...BODIES_EXAMPLES,
  ...SPEEDS_EXAMPLES,
  ...ENVIRONMENT_EXAMPLES,
  ...LAUNCH_EXAMPLES,
  ...UNITS_EXAMPLES,
  ...MANEUVERS_EXAMPLES,
  ...PROPELLANT_EXAMPLES,
  ...ESCAPE_EXAMPLES,
  ...PLANET_TRANSFER_EXAMPLES,
  ...KEPLER_EXAMPLES,
  ...STATE_EXAMPLES,
  ...INTERPLANETARY_EXAMPLES,
};

/** The example as a formula, e.g. =ORBIT.ORBITAL_SPEED("Earth", 6898.137). */
export function exampleFormula(id: string, args: readonly ExampleArg[]): string {
  const lit = (v: number | string | boolean | null): string =>
    v === null ? "" : typeof v === "string" ? `"${v.replace(/"/g, '""')}"` : typeof v === "boolean" ? (v ? "TRUE" : "FALSE") : String(v);
  const parts = args.map((a) => (Array.isArray(a) ? `{${a.map((r) => r.map(lit).join(",")).join(";")}}` : lit(a)));
  while (parts.length > 0 && parts[parts.length - 1] === "") parts.pop();
  return `=ORBIT.${id}(${parts.join(", ")})`;
}
