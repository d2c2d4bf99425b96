import { BODIES_EXAMPLES } from "./examples/bodies";
import { SPEEDS_EXAMPLES } from "./examples/speeds";

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
};

/** The example as a formula, e.g. =ORBIT.ORBITAL_SPEED("Earth", 6898.137). */
export function exampleFormula(id: string, args: readonly ExampleArg[]): string {
  const lit = (v: number | string | boolean | null): string =>
    v === null ? "" : typeof v === "string" ? `"${v.replace(/"/g, '""')}"` : typeof v === "boolean" ? (v ? "TRUE" : "FALSE") : String(v);
  const parts = args.map((a) => (Array.isArray(a) ? `{${a.map((r) => r.map(lit).join(",")).join(";")}}` : lit(a)));
  while (parts.length > 0 && parts[parts.length - 1] === "") parts.pop();
  return `=ORBIT.${id}(${parts.join(", ")})`;
}
