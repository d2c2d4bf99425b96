/**
 * Lays out a scenario sheet row by row: each call writes one row (or one block) and hands back
 * the addresses it used, so formulas name cells by what they hold, never by a row number typed
 * twice. Columns follow one pattern: A label, B value, C unit, D note; tables start at A.
 */
import { cellAddress, parseCell } from "../formula/cells";
import type { CellRole, ScenarioCell } from "./types";

/** The caution every scenario sheet carries under its title. */
export const CAUTION = "Invented demo mission (Skerry). Preliminary two-body, first-order figures: not for flight operations or safety decisions.";
/** What the legend cell (shaded like an input) says. */
export const LEGEND = "Cells shaded like this are inputs: edit them. Everything else is a live formula.";

/** `$B$7` for `B7`: for a cell that a formula copied down a column must keep. */
export function fixed(ref: string): string {
  const at = parseCell(ref);
  if (!at) throw new Error(`not a cell: ${ref}`);
  return `$${ref.replace(/\$/g, "").replace(/(\d+)$/, "$$$1")}`;
}

/** The cell `rows` below and `cols` right of `ref`. */
export function offset(ref: string, rows: number, cols = 0): string {
  const at = parseCell(ref);
  if (!at) throw new Error(`not a cell: ${ref}`);
  return cellAddress(at.row + rows, at.col + cols);
}

/** "B5:B9" for the column of `count` cells from `ref` down; "B5:F5" across with `across`. */
export function span(ref: string, count: number, across = false): string {
  return `${ref}:${across ? offset(ref, 0, count - 1) : offset(ref, count - 1)}`;
}

export class SheetBuilder {
  private readonly cells = new Map<string, ScenarioCell>();
  private next = 1;

  /** Title in A1, the caution in A2, the legend in A3; the first section starts at row 5. */
  constructor(title: string) {
    this.put("A1", title, "title");
    this.put("A2", CAUTION, "note");
    this.put("A3", "input", "legend");
    this.put("B3", LEGEND, "note");
    this.next = 5;
  }

  /** The row the next call writes (1-based). */
  get row(): number {
    return this.next;
  }

  /** Leaves `n` rows empty. */
  skip(n = 1): this {
    this.next += n;
    return this;
  }

  /** One cell; a second write to the same cell is a layout mistake. */
  put(ref: string, content: string | number, role: CellRole, format?: string): string {
    const at = parseCell(ref);
    if (!at) throw new Error(`not a cell: ${ref}`);
    const key = cellAddress(at.row, at.col);
    if (this.cells.has(key)) throw new Error(`cell ${key} is written twice`);
    this.cells.set(key, format ? { ref: key, content, role, format } : { ref: key, content, role });
    return key;
  }

  /** A section heading in A with column headings after it ("Value", "Unit", "Note" by default). */
  section(label: string, headings: readonly string[] = ["Value", "Unit", "Note"]): number {
    const r = this.next++;
    this.put(`A${r}`, label, "section");
    headings.forEach((h, j) => this.put(cellAddress(r - 1, 1 + j), h, "header"));
    return r;
  }

  /** A row of column headings from column A (null leaves a column empty). */
  headings(labels: readonly (string | null)[]): number {
    const r = this.next++;
    labels.forEach((h, j) => {
      if (h !== null) this.put(cellAddress(r - 1, j), h, "header");
    });
    return r;
  }

  /** An input: label, value (shaded), unit, note. Returns the value's cell. */
  input(label: string, value: string | number, unit = "", format?: string, note?: string): string {
    return this.line(label, value, "input", unit, format, note);
  }

  /** A result: label, formula, unit, note. Returns the formula's cell. */
  result(label: string, formula: string, unit: string, format?: string, note?: string): string {
    return this.line(label, formula, "result", unit, format, note);
  }

  /** A note in column A. */
  note(text: string): number {
    const r = this.next++;
    this.put(`A${r}`, text, "note");
    return r;
  }

  /**
   * A formula whose result spills: the formula at `at`, and a number format on every cell of the
   * `rows` × formats.length block it fills (formats[j] for column j; "" leaves General, for text).
   * Returns the formula's cell. Does not move the row.
   */
  spill(at: string, formula: string, formats: readonly string[], rows = 1): string {
    for (let i = 0; i < rows; i++)
      formats.forEach((f, j) => {
        const ref = offset(at, i, j);
        if (i === 0 && j === 0) this.put(ref, formula, "result", f || undefined);
        else if (f) this.put(ref, "", "result", f);
      });
    return at;
  }

  /**
   * A labelled formula that spills one row of values under headings of its own: the headings in
   * this row from B, the label in A of the next row and the formula in its B, with formats[j] on
   * the j-th value. Returns the formula's cell (the first value).
   */
  spillRow(label: string, formula: string, headings: readonly string[], formats: readonly string[]): string {
    if (headings.length !== formats.length) throw new Error(`${label}: ${headings.length} headings for ${formats.length} formats`);
    const r = this.next;
    headings.forEach((h, j) => this.put(cellAddress(r - 1, 1 + j), h, "header"));
    this.put(`A${r + 1}`, label, "label");
    this.next += 2;
    return this.spill(`B${r + 1}`, formula, formats);
  }

  /** A labelled row of cells from B: each [content, role, format]. Returns their addresses. */
  cellsRow(label: string, items: readonly (readonly [string | number, CellRole, string?])[]): string[] {
    const r = this.next++;
    this.put(`A${r}`, label, "label");
    return items.map(([content, role, format], j) => this.put(cellAddress(r - 1, 1 + j), content, role, format));
  }

  /** Moves to the row after `row`. */
  after(row: number): this {
    this.next = Math.max(this.next, row + 1);
    return this;
  }

  cellsInOrder(): ScenarioCell[] {
    return [...this.cells.values()].sort((a, b) => {
      const p = parseCell(a.ref)!;
      const q = parseCell(b.ref)!;
      return p.row - q.row || p.col - q.col;
    });
  }

  private line(label: string, content: string | number, role: CellRole, unit: string, format?: string, note?: string): string {
    const r = this.next++;
    this.put(`A${r}`, label, "label");
    const at = this.put(`B${r}`, content, role, format);
    if (unit) this.put(`C${r}`, unit, "unit");
    if (note) this.put(`D${r}`, note, "note");
    return at;
  }
}

/** A row of a key-results block: label, a cell shown with `digits` decimals, unit. */
export const keyRow = (label: string, cell: string, digits: number, unit: string) => [label, { cell, digits }, unit] as const;
