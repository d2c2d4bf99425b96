/**
 * Worked examples as formulas. Each worksheet function declares its worked call beside its JSDoc
 * (src/functions/define.ts); this module only writes such a call as the formula a user would
 * type, for the pane's function guide, the runner's help and the tests. Pure and import-free, so
 * the pane can use it without loading the functions themselves.
 */

/** An example argument as a user would type it; a matrix becomes an array constant {..}. */
export type ExampleArg = number | string | boolean | null | readonly (readonly (number | string | boolean)[])[];

/** The example as a formula, e.g. =ORBIT.ORBITAL_SPEED("Earth", 6898.137); trailing omitted arguments are dropped. */
export function exampleFormula(id: string, args: readonly ExampleArg[], namespace = "ORBIT"): string {
  const lit = (v: number | string | boolean | null): string =>
    v === null ? "" : typeof v === "string" ? `"${v.replace(/"/g, '""')}"` : typeof v === "boolean" ? (v ? "TRUE" : "FALSE") : String(v);
  const parts = args.map((a) => (Array.isArray(a) ? `{${a.map((r) => r.map(lit).join(",")).join(";")}}` : lit(a as number | string | boolean | null)));
  while (parts.length > 0 && parts[parts.length - 1] === "") parts.pop();
  return `=${namespace}.${id}(${parts.join(", ")})`;
}
