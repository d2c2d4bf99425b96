/**
 * Worked examples as formulas. Each worksheet function declares its worked call beside its JSDoc
 * (src/functions/define.ts); this module only writes such a call as the formula a user would
 * type, for the pane's function guide, the runner's help and the tests. Pure and import-free, so
 * the pane can use it without loading the functions themselves.
 */

/** An example argument as a user would type it; a matrix becomes an array constant {..}. */
export type ExampleArg = number | string | boolean | null | readonly (readonly (number | string | boolean)[])[];

/**
 * A date serial as the formula a user would write for it: DATE(2028,11,28), with +TIME(h,m,s) for
 * a time of day. Serials from 61 (1900-03-01) on count days from 1899-12-30 in Excel's 1900 date
 * system; earlier ones stay numbers.
 */
export function dateFormula(serial: number): string {
  if (!(serial >= 61)) return String(serial);
  const ms = Math.round(serial * 86_400_000);
  const d = new Date(Date.UTC(1899, 11, 30) + ms);
  const date = `DATE(${d.getUTCFullYear()},${d.getUTCMonth() + 1},${d.getUTCDate()})`;
  const seconds = d.getUTCSeconds() + d.getUTCMilliseconds() / 1000;
  return d.getUTCHours() || d.getUTCMinutes() || seconds ? `${date}+TIME(${d.getUTCHours()},${d.getUTCMinutes()},${seconds})` : date;
}

/**
 * The example as a formula, e.g. =ORBIT.ORBITAL_SPEED("Earth", 6898.137); trailing omitted
 * arguments are dropped, and a number given to a date parameter (`roles[k] === "date"`) is
 * written as DATE(...).
 */
export function exampleFormula(id: string, args: readonly ExampleArg[], roles: readonly (string | undefined)[] = [], namespace = "ORBIT"): string {
  const lit = (v: number | string | boolean | null): string =>
    v === null ? "" : typeof v === "string" ? `"${v.replace(/"/g, '""')}"` : typeof v === "boolean" ? (v ? "TRUE" : "FALSE") : String(v);
  const parts = args.map((a, k) =>
    Array.isArray(a) ? `{${a.map((r) => r.map(lit).join(",")).join(";")}}` : typeof a === "number" && roles[k] === "date" ? dateFormula(a) : lit(a as number | string | boolean | null),
  );
  while (parts.length > 0 && parts[parts.length - 1] === "") parts.pop();
  return `=${namespace}.${id}(${parts.join(", ")})`;
}
