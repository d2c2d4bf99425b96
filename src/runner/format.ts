import { DetailedCellError, type CellValue } from "hyperformula";
import type { CellIssue, RecalcReport } from "./recalc";

/** Plain-text output of the CLI: values at full double precision, aligned tables, run summaries. */

/** A value as text: numbers in the shortest form that reads back to the same double. */
export function formatValue(v: CellValue | unknown): string {
  if (v instanceof DetailedCellError) return v.value;
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
  return lines.join("\n");
}
