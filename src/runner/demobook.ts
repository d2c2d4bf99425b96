import { mkdirSync } from "node:fs";
import { join } from "node:path";
import type ExcelJS from "exceljs";
import type { ScenarioSheet } from "../scenario";
import { ROLE_STYLES } from "../scenario/styles";

/**
 * The demo's workbook writer: one .xlsx per scenario sheet (src/scenario), written with exceljs
 * as the pane's template writer writes the same sheet through Office.js: the same cells,
 * formulas in the typed form, number formats, role styles, column widths and colour scale.
 * exceljs 4.4.0 cannot write charts (it has no chart model; exceljs/exceljs issue #141 "Chart
 * support" is open), so a sheet's chart exists only in the pane's template; the scenario puts a
 * note where the chart goes.
 */

/** "#1B3A5C" as exceljs's opaque ARGB "FF1B3A5C". */
const argb = (hex: string): string => `FF${hex.replace(/^#/, "").toUpperCase()}`;

/** Writes one scenario sheet into a new worksheet of `book`. */
export function writeScenarioSheet(book: ExcelJS.Workbook, t: ScenarioSheet): ExcelJS.Worksheet {
  const ws = book.addWorksheet(t.sheetName);
  for (const c of t.cells) {
    const cell = ws.getCell(c.ref);
    if (c.content !== "") cell.value = typeof c.content === "string" && c.content.startsWith("=") ? ({ formula: c.content.slice(1) } as ExcelJS.CellFormulaValue) : c.content;
    if (c.format) cell.numFmt = c.format;
    const style = ROLE_STYLES[c.role];
    if (!style || c.content === "") continue;
    if (style.fill) cell.fill = { type: "pattern", pattern: "solid", fgColor: { argb: argb(style.fill) } };
    const font: Partial<ExcelJS.Font> = {};
    if (style.bold) font.bold = true;
    if (style.italic) font.italic = true;
    if (style.color) font.color = { argb: argb(style.color) };
    if (style.size) font.size = style.size;
    if (Object.keys(font).length > 0) cell.font = font;
    if (style.wrap) cell.alignment = { wrapText: true, vertical: "top" };
    if (style.underline) cell.border = { bottom: { style: "thin" } };
  }
  t.widths.forEach((w, i) => (ws.getColumn(i + 1).width = w));
  if (t.colourScale) {
    const { range, low, mid, high } = t.colourScale;
    ws.addConditionalFormatting({
      ref: range,
      rules: [
        {
          type: "colorScale",
          priority: 1,
          cfvo: [{ type: "min" }, { type: "percentile", value: 50 }, { type: "max" }],
          color: [{ argb: argb(low) }, { argb: argb(mid) }, { argb: argb(high) }],
        },
      ],
    });
  }
  return ws;
}

/** Writes each sheet as its own workbook into `folder`; returns the paths written, in order. */
export async function writeDemoWorkbooks(folder: string, sheets: readonly ScenarioSheet[]): Promise<string[]> {
  mkdirSync(folder, { recursive: true });
  // Loaded here, not at the top, so the command line starts without it when it does not write.
  const excel = (await import("exceljs")) as unknown as typeof ExcelJS & { default?: typeof ExcelJS };
  const { Workbook } = excel.default ?? excel;
  const paths: string[] = [];
  for (const t of sheets) {
    const book = new Workbook();
    book.creator = "Orbit Cells demo";
    book.title = t.sheetName;
    // Fixed dates keep the generated files identical from run to run.
    book.created = new Date(Date.UTC(2026, 0, 1));
    book.modified = new Date(Date.UTC(2026, 0, 1));
    writeScenarioSheet(book, t);
    const path = join(folder, t.file);
    await book.xlsx.writeFile(path);
    paths.push(path);
  }
  return paths;
}
