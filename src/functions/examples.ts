/**
 * One worked call per worksheet function, as the values a user would type: the function guide in
 * the pane shows them as formulas, and the contract tests call every function with them through
 * the built bundle. Ranges are written as rows of values (they become array constants {..}).
 * Values here are illustrations (the invented Skerry mission of DESIGN.md §7), not references.
 */
export type ExampleArg = number | string | boolean | null | (number | string | boolean)[][];

export const EXAMPLES: Record<string, ExampleArg[]> = {
  BODY_GM: ["Earth"],
  BODY_RADIUS: ["Mars"],
  BODY_VALUE: ["Jupiter", "j2"],
  BODY_TABLE: ["gm, mean_radius", "Earth, Moon, Mars", true],
  ORBITAL_SPEED: ["Earth", 6898.137],
  ESCAPE_SPEED: ["Earth", 6898.137],
  PERIOD_FROM_SMA: ["Earth", 7068.137],
  SMA_FROM_PERIOD: ["Earth", 5940],
  GM_FROM_ORBIT: [7068.137, 5917.5],
  SPECIFIC_ENERGY: ["Earth", 7068.137],
  ALTITUDE_TO_RADIUS: ["Earth", 690],
  RADIUS_TO_ALTITUDE: ["Earth", 7068.137],
  SHAPE_FROM_APSES: [6628.137, 7068.137, true],
  APSES_FROM_SHAPE: [6848.137, 0.0321],
  RADIUS_AT_ANOMALY: [6848.137, 0.0321, 90],
  FLIGHT_PATH_ANGLE: [0.0321, 90],
  MAX_FLIGHT_PATH_ANGLE: [0.0321],
};

/** The example as a formula, e.g. =ORBIT.ORBITAL_SPEED("Earth", 6898.137). */
export function exampleFormula(id: string, args: readonly ExampleArg[]): string {
  const lit = (v: number | string | boolean | null): string =>
    v === null ? "" : typeof v === "string" ? `"${v.replace(/"/g, '""')}"` : typeof v === "boolean" ? (v ? "TRUE" : "FALSE") : String(v);
  const parts = args.map((a) => (Array.isArray(a) ? `{${a.map((r) => r.map(lit).join(",")).join(";")}}` : lit(a)));
  while (parts.length > 0 && parts[parts.length - 1] === "") parts.pop();
  return `=ORBIT.${id}(${parts.join(", ")})`;
}
