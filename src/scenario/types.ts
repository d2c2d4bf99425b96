/**
 * The shape of one sheet of the Skerry demo scenario (DEVELOPERS.md, "The Skerry demo scenario"):
 * what every cell holds and what it is for, its number format, the column widths, an optional
 * colour-scale block and chart, and the key results the demo prints. Two writers read it: the
 * pane's template writer (Office.js, src/taskpane/excel.ts) and the demo's workbook writer
 * (exceljs, src/runner/demobook.ts). Pure data: no Office, no file, no engine.
 */

/** What a cell is for. Both writers style each role the same way (src/scenario/styles.ts). */
export type CellRole = "title" | "note" | "legend" | "section" | "header" | "label" | "input" | "result" | "unit";

export interface ScenarioCell {
  /** A1 address on the sheet. */
  readonly ref: string;
  /** A value, a formula in the typed form ("=ORBIT.X(...)"), or "" for a cell that only carries a format (a spilled cell). */
  readonly content: string | number;
  readonly role: CellRole;
  /** Excel number format; absent means General. */
  readonly format?: string;
}

/** A three-colour scale over a block: lowest value, the 50th percentile, highest value. */
export interface ColourScale {
  /** A1 block, e.g. "B17:AK32". */
  readonly range: string;
  /** Colours as #RRGGBB. */
  readonly low: string;
  readonly mid: string;
  readonly high: string;
}

/** A line chart of one column against another (an XY scatter with lines, so the x values are numbers, not categories). */
export interface LineChart {
  readonly title: string;
  /** A1 block of the x values (one column). */
  readonly x: string;
  /** A1 block of the y values (one column, the same rows). */
  readonly y: string;
  readonly xTitle: string;
  readonly yTitle: string;
  /** Cells the chart covers: top-left and bottom-right. */
  readonly from: string;
  readonly to: string;
}

/** A value the demo prints: a cell of the recalculated sheet, rounded for reading, or shown as a date. */
export interface Shown {
  readonly cell: string;
  /** Decimal places (the workbook keeps full precision). */
  readonly digits?: number;
  /** An Excel date serial, printed as YYYY-MM-DD. */
  readonly date?: true;
  /** An Excel date serial, printed as YYYY-MM-DD hh:mm:ss (UTC, to the second). */
  readonly time?: true;
}

/** One block of the demo's printout: column headings, then rows of text, numbers typed here and cell values. */
export interface KeyResults {
  readonly title: string;
  readonly columns: readonly string[];
  readonly rows: readonly (readonly (string | number | Shown)[])[];
}

/** One sheet of the scenario: a pane template and a demo workbook, made from this one description. */
export interface ScenarioSheet {
  /** Stable id (the pane's data-template attribute). */
  readonly id: string;
  /** Card title in the pane. */
  readonly title: string;
  /** One or two plain sentences for the card. */
  readonly summary: string;
  /** Sheet name (the pane adds a suffix when the name is taken). */
  readonly sheetName: string;
  /** File name of the demo workbook that holds this sheet. */
  readonly file: string;
  readonly cells: readonly ScenarioCell[];
  /** Column widths from column A, in Excel's stored width unit (about one character of the default font). */
  readonly widths: readonly number[];
  readonly colourScale?: ColourScale;
  readonly chart?: LineChart;
  /** What the demo prints after recalculating the workbook. */
  readonly keyResults: readonly KeyResults[];
}
