/**
 * Everything the pane does to the workbook, through Excel.run. Each insertion reads its target
 * block first and writes nothing if any cell there holds data (the guard); the decisions are the
 * pure functions of freeArea.ts. Requires ExcelApi 1.7 (getRangeByIndexes and a chart series'
 * setXAxisValues; 1.4 for getUsedRangeOrNullObject, 1.6 for the transfer grid's colour scale);
 * wrapText is 1.9 and only styles headings. Hosts that run custom functions in a shared runtime
 * have all of these.
 */
import { blockAddress, cellAddress } from "./cells";
import type { TablePlan } from "./catalogueTable";
import { planSize, tableCells } from "./catalogueTable";
import { embed, filledGrid, filledSummary, fitsSheet, intersect, nearestFree, pastUsedRange, type Block, type FreeOffers } from "./freeArea";
import { NOTE_COLOUR, ROLE_STYLES, widthInPoints } from "../scenario/styles";
import { layoutTemplate, type SheetTemplate } from "./templates";

/** Where the user wants something: a sheet and a top-left cell (zero-based). */
export interface Target {
  sheet: string;
  row: number;
  col: number;
}

export interface Written {
  ok: true;
  sheet: string;
  /** A1 address of everything written, e.g. "B2:H14". */
  address: string;
  /** Name of the Excel table made, for the catalogue. */
  tableName?: string;
}

export interface Refused {
  ok: false;
  sheet: string;
  /** The block that was asked for. */
  address: string;
  /** Why nothing was written. */
  reason: "occupied" | "off-sheet";
  filledCount: number;
  /** First cell holding data, in reading order (e.g. "C4"). */
  firstFilled: string | null;
  /** Nearest empty blocks of the same size (same sheet), as targets. */
  right: Target | null;
  below: Target | null;
}

export type Outcome = Written | Refused;

/** Cells read per band when looking for free space; past that the pane offers the edge of the used range. */
const BAND_CELLS = 50_000;

const toTarget = (sheet: string, b: Block | null): Target | null => (b ? { sheet, row: b.row, col: b.col } : null);

/** The active cell's sheet and position (top-left of the selection). */
async function selectedTarget(ctx: Excel.RequestContext): Promise<Target> {
  const sel = ctx.workbook.getSelectedRange();
  sel.load("rowIndex, columnIndex");
  sel.worksheet.load("name");
  await ctx.sync();
  return { sheet: sel.worksheet.name, row: sel.rowIndex, col: sel.columnIndex };
}

/** Which cells of a block hold something: reads values and formulas of the block itself. */
async function readFilled(ctx: Excel.RequestContext, sheet: Excel.Worksheet, b: Block): Promise<boolean[][]> {
  const range = sheet.getRangeByIndexes(b.row, b.col, b.rows, b.cols);
  range.load("values, formulas");
  await ctx.sync();
  return filledGrid(range.values, range.formulas);
}

/** Reads the bands right of and below a refused block, within the used range, and picks the nearest free blocks. */
async function findOffers(ctx: Excel.RequestContext, sheet: Excel.Worksheet, b: Block): Promise<FreeOffers> {
  const usedRange = sheet.getUsedRangeOrNullObject();
  usedRange.load("isNullObject, rowIndex, columnIndex, rowCount, columnCount");
  await ctx.sync();
  if (usedRange.isNullObject) return nearestFree(b, { rightBand: [], rightBeyondIsClear: true, belowBand: [], belowBeyondIsClear: true });
  const used: Block = { row: usedRange.rowIndex, col: usedRange.columnIndex, rows: usedRange.rowCount, cols: usedRange.columnCount };

  const usedRight = used.col + used.cols; // first column past the used range
  const usedBottom = used.row + used.rows;
  const rightCols = Math.max(1, Math.min(usedRight - b.col, Math.floor(BAND_CELLS / b.rows)));
  const belowRows = Math.max(1, Math.min(usedBottom - b.row, Math.floor(BAND_CELLS / b.cols)));
  const rightBlock: Block = { row: b.row, col: b.col, rows: b.rows, cols: rightCols };
  const belowBlock: Block = { row: b.row, col: b.col, rows: belowRows, cols: b.cols };

  const read = async (whole: Block): Promise<boolean[][]> => {
    const part = intersect(whole, used);
    return embed(whole, part, part ? await readFilled(ctx, sheet, part) : []);
  };
  const rightBand = await read(rightBlock);
  const belowBand = await read(belowBlock);
  const near = nearestFree(b, {
    rightBand,
    rightBeyondIsClear: b.col + rightCols >= usedRight,
    belowBand,
    belowBeyondIsClear: b.row + belowRows >= usedBottom,
  });
  const edge = pastUsedRange(b, used);
  return { right: near.right ?? edge.right, below: near.below ?? edge.below };
}

/**
 * The guard: reads `b` on `sheet`; when every cell is empty runs `write` and syncs, otherwise
 * writes nothing and says where data was found and where there is room.
 */
async function guardedWrite(
  ctx: Excel.RequestContext,
  sheet: Excel.Worksheet,
  sheetName: string,
  b: Block,
  write: (range: Excel.Range) => string | undefined | void,
): Promise<Outcome> {
  const address = blockAddress(b.row, b.col, b.rows, b.cols);
  if (!fitsSheet(b)) {
    const first = { row: Math.max(0, Math.min(b.row, 1_048_575)), col: Math.max(0, Math.min(b.col, 16_383)) };
    return { ok: false, sheet: sheetName, address: cellAddress(first.row, first.col), reason: "off-sheet", filledCount: 0, firstFilled: null, right: null, below: null };
  }
  const filled = await readFilled(ctx, sheet, b);
  const { count, first } = filledSummary(filled);
  if (count > 0) {
    const offers = await findOffers(ctx, sheet, b);
    return {
      ok: false,
      sheet: sheetName,
      address,
      reason: "occupied",
      filledCount: count,
      firstFilled: first ? cellAddress(b.row + first.row, b.col + first.col) : null,
      right: toTarget(sheetName, offers.right),
      below: toTarget(sheetName, offers.below),
    };
  }
  const range = sheet.getRangeByIndexes(b.row, b.col, b.rows, b.cols);
  const tableName = write(range) ?? undefined;
  await ctx.sync();
  return tableName ? { ok: true, sheet: sheetName, address, tableName } : { ok: true, sheet: sheetName, address };
}

/** A sheet name not yet used in the workbook: base, then "base (2)", "base (3)", ... (at most 31 characters). */
export function uniqueName(base: string, taken: readonly string[], maxLength = 31, join = (b: string, n: number) => `${b} (${n})`): string {
  const lower = new Set(taken.map((t) => t.toLowerCase()));
  const cut = base.slice(0, maxLength);
  if (!lower.has(cut.toLowerCase())) return cut;
  for (let n = 2; ; n++) {
    const suffix = join("", n);
    const name = join(base.slice(0, maxLength - suffix.length), n);
    if (!lower.has(name.toLowerCase())) return name;
  }
}

async function addSheet(ctx: Excel.RequestContext, base: string): Promise<{ sheet: Excel.Worksheet; name: string }> {
  const sheets = ctx.workbook.worksheets;
  sheets.load("items/name");
  await ctx.sync();
  const name = uniqueName(base, sheets.items.map((s) => s.name));
  const sheet = sheets.add(name);
  sheet.activate();
  await ctx.sync();
  return { sheet, name };
}

/** The sheet and cell to write at: an explicit target, a new sheet, or the active cell. */
async function resolveTarget(ctx: Excel.RequestContext, where: Target | "selection" | { newSheet: string }): Promise<{ sheet: Excel.Worksheet; target: Target }> {
  if (where === "selection") {
    const t = await selectedTarget(ctx);
    return { sheet: ctx.workbook.worksheets.getItem(t.sheet), target: t };
  }
  if ("newSheet" in where) {
    const { sheet, name } = await addSheet(ctx, where.newSheet);
    return { sheet, target: { sheet: name, row: 0, col: 0 } };
  }
  return { sheet: ctx.workbook.worksheets.getItem(where.sheet), target: where };
}

const CATALOGUE_TABLE = "OrbitBodies";

/**
 * Writes the catalogue as an Excel table (header row, named, a number format per cell) with
 * the source citations in note rows below it, at the active cell, a given cell or a new sheet.
 */
export async function insertCatalogueTable(plan: TablePlan, where: Target | "selection" | { newSheet: string } = "selection"): Promise<Outcome> {
  return Excel.run(async (ctx) => {
    const tables = ctx.workbook.tables;
    tables.load("items/name");
    const { sheet, target } = await resolveTarget(ctx, where);
    await ctx.sync();
    const size = planSize(plan);
    const block: Block = { row: target.row, col: target.col, ...size };
    const tableName = uniqueName(CATALOGUE_TABLE, tables.items.map((t) => t.name), 255, (b, n) => `${b}${n}`);
    return guardedWrite(ctx, sheet, target.sheet, block, () => {
      const width = plan.header.length;
      const tableRange = sheet.getRangeByIndexes(target.row, target.col, 1 + plan.rows.length, width);
      tableRange.formulas = tableCells(plan, target.row, target.col);
      tableRange.numberFormat = [plan.header.map(() => "General"), ...plan.numberFormats];
      const table = sheet.tables.add(tableRange, true);
      table.name = tableName;
      table.style = "TableStyleLight9";
      if (plan.notes.length > 0) {
        const notes = sheet.getRangeByIndexes(target.row + plan.rows.length + 2, target.col, plan.notes.length, 1);
        notes.values = plan.notes.map((n) => [n]);
        notes.format.font.italic = true;
        notes.format.font.color = NOTE_COLOUR;
      }
      tableRange.format.autofitColumns();
      // The sources column holds long text; keep it readable without a screen-wide column.
      sheet.getRangeByIndexes(target.row, target.col + width - 1, 1, 1).format.columnWidth = 260;
      tableRange.select();
      return tableName;
    });
  });
}

/**
 * Writes a template on a new sheet as live formulas, styles its roles (src/scenario/styles.ts,
 * the same styles the demo workbooks get), shades its colour-scale block, draws its chart and
 * selects its first input.
 */
export async function insertTemplate(t: SheetTemplate): Promise<Outcome> {
  return Excel.run(async (ctx) => {
    const { sheet, target } = await resolveTarget(ctx, { newSheet: t.sheetName });
    const layout = layoutTemplate(t);
    const block: Block = { row: 0, col: 0, rows: layout.rows, cols: layout.cols };
    return guardedWrite(ctx, sheet, target.sheet, block, (range) => {
      range.formulas = layout.formulas;
      range.numberFormat = layout.numberFormats;
      for (const [role, refs] of layout.roles) {
        const style = ROLE_STYLES[role];
        if (!style) continue;
        for (const ref of refs) {
          const f = sheet.getRange(ref).format;
          if (style.fill) f.fill.color = style.fill;
          if (style.bold) f.font.bold = true;
          if (style.italic) f.font.italic = true;
          if (style.color) f.font.color = style.color;
          if (style.size) f.font.size = style.size;
          if (style.wrap) f.wrapText = true;
          if (style.underline) f.borders.getItem("EdgeBottom").style = "Continuous";
        }
      }
      t.widths.forEach((w, i) => {
        sheet.getRangeByIndexes(0, i, 1, 1).format.columnWidth = widthInPoints(w);
      });
      if (t.colourScale) {
        const { range: at, low, mid, high } = t.colourScale;
        const cf = sheet.getRange(at).conditionalFormats.add("ColorScale");
        cf.colorScale.criteria = {
          minimum: { type: "LowestValue", color: low },
          midpoint: { type: "Percentile", formula: "50", color: mid },
          maximum: { type: "HighestValue", color: high },
        };
      }
      if (t.chart) {
        const c = t.chart;
        // An XY scatter with lines: the altitudes are numbers on the x axis, not category labels.
        const chart = sheet.charts.add("XYScatterLinesNoMarkers", sheet.getRange(c.y), "Columns");
        chart.series.getItemAt(0).setXAxisValues(sheet.getRange(c.x));
        chart.title.text = c.title;
        chart.axes.categoryAxis.title.text = c.xTitle;
        chart.axes.valueAxis.title.text = c.yTitle;
        chart.legend.visible = false;
        chart.setPosition(c.from, c.to);
      }
      const firstInput = layout.roles.get("input")?.[0];
      if (firstInput) sheet.getRange(firstInput).select();
    });
  });
}

/** Puts one formula in the active cell (or a given cell), through the same guard. */
export async function insertFormula(formula: string, where: Target | "selection" = "selection", spill: { rows: number; cols: number } = { rows: 1, cols: 1 }): Promise<Outcome> {
  return Excel.run(async (ctx) => {
    const { sheet, target } = await resolveTarget(ctx, where);
    // The whole area the result will spill into must be free, not only the formula's own cell.
    const block: Block = { row: target.row, col: target.col, rows: spill.rows, cols: spill.cols };
    return guardedWrite(ctx, sheet, target.sheet, block, (range) => {
      const cell = spill.rows === 1 && spill.cols === 1 ? range : sheet.getRangeByIndexes(target.row, target.col, 1, 1);
      cell.formulas = [[formula]];
      cell.select();
    });
  });
}
