import { CellError } from "../../src/runner/host";

// The cell contract of DEVELOPERS.md, "Conventions", as one check shared by the property and contract tests.
const ERROR_CODES = new Set(["#VALUE!", "#N/A", "#NUM!"]);

/** What breaks the cell contract in a function result, or undefined when nothing does. */
export function contractProblem(params: readonly string[], out: unknown): string | undefined {
  if (!Array.isArray(out) || out.length === 0) return "result is not a non-empty matrix";
  const width = (out[0] as unknown[]).length;
  for (const row of out) {
    if (!Array.isArray(row) || row.length !== width) return "result rows are not all the same width";
    for (const c of row) {
      if (typeof c === "number") {
        if (!Number.isFinite(c)) return `non-finite number ${c}`;
      } else if (typeof c === "string") {
        if (/^#|NaN|Infinity|undefined|\[object/.test(c)) return `error-looking text ${JSON.stringify(c)}`;
      } else if (typeof c === "boolean") {
        // allowed
      } else if (c instanceof CellError) {
        if (!ERROR_CODES.has(c.code)) return `unexpected error code ${c.code}`;
        if (c.code !== "#NUM!" && !params.some((p) => c.message?.startsWith(p + ":"))) return `message names no parameter: ${JSON.stringify(c.message)}`;
        if (c.code === "#NUM!" && c.message) return "a #NUM! carries a message Excel would not show";
      } else return `unexpected cell value ${JSON.stringify(c)}`;
    }
  }
  return undefined;
}

