import { DetailedCellError, type CellValue } from "hyperformula";
import { errorCode } from "./engine";
import type { CellIssue, RecalcReport } from "./recalc";

/**
 * Output of the CLI: plain text (values at full double precision, aligned tables, run
 * summaries), JSON and CSV (RFC 4180: fields with a comma, quote or line break are quoted, quotes
 * doubled) for scripts.
 */

export type OutputFormat = "text" | "json" | "csv";
export const OUTPUT_FORMATS: readonly OutputFormat[] = ["text", "json", "csv"];

/** A value as text: numbers in the shortest form that reads back to the same double. */
export function formatValue(v: CellValue | unknown): string {
  if (v instanceof DetailedCellError) return errorCode(v).code;
  if (v === null || v === undefined) return "";
  if (typeof v === "boolean") return v ? "TRUE" : "FALSE";
  return String(v);
}

/** Rows of cells as an aligned table; numbers right-aligned, text left-aligned. */
export function formatTable(rows: readonly (readonly unknown[])[], indent = ""): string {
  const text = rows.map((r) => r.map(formatValue));
  const widths: number[] = [];
  for (const r of text) r.forEach((c, j) => (widths[j] = Math.max(widths[j] ?? 0, c.length)));
  return text
    .map((r, i) => indent + r.map((c, j) => (typeof rows[i][j] === "number" ? c.padStart(widths[j]) : c.padEnd(widths[j]))).join("  ").trimEnd())
    .join("\n");
}

/** A value for JSON: numbers, text, booleans, null, or { error, message }. */
export function jsonValue(v: CellValue | unknown): unknown {
  if (v instanceof DetailedCellError) {
    const e = errorCode(v);
    return e.message ? { error: e.code, message: e.message } : { error: e.code };
  }
  return v === undefined ? null : v;
}

const csvField = (s: string): string => (/[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s);

/** Rows as CSV lines (CRLF line ends, as RFC 4180 writes them). */
export const formatCsv = (rows: readonly (readonly unknown[])[]): string => rows.map((r) => r.map((v) => csvField(formatValue(v))).join(",")).join("\r\n");

const plural = (n: number, one: string, many = `${one}s`): string => `${n.toLocaleString("en-US")} ${n === 1 ? one : many}`;

function issueLines(title: string, issues: readonly CellIssue[], limit: number): string[] {
  if (issues.length === 0) return [];
  const byCode = new Map<string, CellIssue[]>();
  for (const i of issues) byCode.set(i.code, [...(byCode.get(i.code) ?? []), i]);
  const lines = [`${title} (${issues.length}):`];
  for (const [code, list] of [...byCode].sort((a, b) => b[1].length - a[1].length)) {
    lines.push(`  ${code}  ${plural(list.length, "cell")}`);
    for (const i of list.slice(0, limit)) lines.push(`    ${i.sheet}!${i.cell}  ${i.message || "(no message)"}`);
    if (list.length > limit) lines.push(`    ... and ${list.length - limit} more`);
  }
  return lines;
}

/** The summary `orbit-cells recalc` prints. */
export function formatReport(r: RecalcReport, limit = 20): string {
  const lines = [
    `${r.file}: ${plural(r.sheets, "sheet")}, ${plural(r.formulas, "formula")} (${r.orbitFormulas.toLocaleString("en-US")} calling ORBIT functions), ${plural(r.cellsRecalculated, "cell")} recalculated in ${r.seconds.toFixed(2)} s.`,
  ];
  if (r.orbitErrors.length === 0) lines.push("No errors in ORBIT cells.");
  lines.push(...issueLines("Errors in ORBIT cells", r.orbitErrors, limit));
  lines.push(...issueLines("Errors in other formulas", r.otherErrors, limit));
  lines.push(...issueLines("Kept as saved (the runner cannot compute these formulas)", r.kept, limit));
  if (r.kept.length > 0) {
    const n = r.kept.length + r.dependOnKept.length;
    const using = r.dependOnKept.length > 0 ? `, and ${plural(r.dependOnKept.length, "cell")} computed from their saved results: ${r.dependOnKept.slice(0, limit).map((c) => `${c.sheet}!${c.cell}`).join(", ")}${r.dependOnKept.length > limit ? ", ..." : ""}` : "";
    lines.push(`Excel must recalculate ${plural(n, "cell")} when it opens the file: the kept ones${using}.`);
  }
  return lines.join("\n");
}

/** The recalc report as JSON (the written file's path, or null). */
export const formatReportJson = (r: RecalcReport, written: string | null): string => JSON.stringify({ ...r, written }, null, 2);

/** The recalc report as CSV: one line per reported cell (list, sheet, cell, code, message). */
export function formatReportCsv(r: RecalcReport): string {
  const rows: unknown[][] = [["list", "sheet", "cell", "code", "message"]];
  const add = (list: string, issues: readonly CellIssue[]) => issues.forEach((i) => rows.push([list, i.sheet, i.cell, i.code, i.message]));
  add("orbit-error", r.orbitErrors);
  add("other-error", r.otherErrors);
  add("kept", r.kept);
  r.dependOnKept.forEach((c) => rows.push(["uses-kept", c.sheet, c.cell, "", "computed from a kept saved result"]));
  return formatCsv(rows);
}
