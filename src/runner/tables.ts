import { absoluteBlock, parseBlock, quoteSheet } from "../formula/cells";
import { EMPTY_RELS, relationships, relsOf, sheetParts, tags, withOverride, withRelationship, xmlParts, type Package } from "./package";
import type { ZipEntry } from "./zip";

/**
 * The workbook's own tables (Excel "ListObjects"), read from the package's table parts, and
 * structured references to them (`OrbitBodies[GM]`, `Table[@Column]`,
 * `Table[[#Headers],[Column]]`, `Table[#Data]`) resolved into the plain ranges they stand for, so
 * the engine, which has no tables, sees ordinary references.
 *
 * Table parts: ECMA-376 Part 1, §18.5.1.2 table (attributes displayName, ref, headerRowCount
 * default 1, totalsRowCount default 0) and §18.5.1.3 tableColumn (name); a worksheet reaches its
 * tables through relationships of type .../relationships/table (Part 1, §12.3.20 Table Definition
 * Part). ECMA-376 does not specify structured references (MS-OI29500 §2.1.859 a); their grammar is
 * MS-XLSX §2.2.2 Formulas (structure-reference, intra-table-reference, keyword, column-range),
 * where the table name is the table's displayName and a missing name means the table holding the
 * formula's cell. What each part refers to follows Microsoft's "Using structured references with
 * Excel tables": no keyword means the data rows; [#This Row] (shown as @) the data cell on the
 * formula's own row.
 */
export interface TableInfo {
  /** The name formulas use (displayName). */
  readonly name: string;
  readonly sheet: string;
  /** The table's whole area, headers and totals included (zero-based). */
  readonly row: number;
  readonly col: number;
  readonly rows: number;
  readonly cols: number;
  readonly headerRows: number;
  readonly totalsRows: number;
  readonly columns: readonly string[];
  /** The table part as the file had it (written back unchanged). */
  readonly xml: string;
}

/** Tables by upper-case name. */
export type TableIndex = ReadonlyMap<string, TableInfo>;

export const tableIndex = (tables: readonly TableInfo[]): TableIndex => new Map(tables.map((t) => [t.name.toUpperCase(), t]));

// ---------------------------------------------------------------------------------------------
// Reading the table parts

/** Every table of an .xlsx package, with the sheet it sits on. Unreadable table parts are skipped. */
export function readTables(pkg: Package): TableInfo[] {
  const tables: TableInfo[] = [];
  for (const sheet of sheetParts(pkg)) {
    for (const r of relationships(pkg, sheet.part).values()) {
      if (!r.type.endsWith("/table")) continue;
      const xml = pkg.get(r.target);
      const t = xml ? tags(xml, "table")[0] : undefined;
      const area = t ? parseBlock(t.get("ref") ?? "") : null;
      const displayName = t?.get("displayName") ?? t?.get("name");
      if (!t || !area || !displayName) continue;
      tables.push({
        name: displayName,
        sheet: sheet.name,
        ...area,
        headerRows: Number(t.get("headerRowCount") ?? 1) > 0 ? 1 : 0,
        totalsRows: Number(t.get("totalsRowCount") ?? 0) > 0 ? 1 : 0,
        columns: tags(xml!, "tableColumn").map((c) => c.get("name") ?? ""),
        xml: xml!,
      });
    }
  }
  return tables;
}

const TABLE_REL = "http://schemas.openxmlformats.org/officeDocument/2006/relationships/table";
const TABLE_TYPE = "application/vnd.openxmlformats-officedocument.spreadsheetml.table+xml";

/**
 * The package exceljs wrote, with every table part as the input file had it: exceljs rewrites
 * table parts (it drops the default header row, headerRowCount="0", and adds filter buttons), so
 * each is put back by name, and a table exceljs left out is added again (part, relationship,
 * tablePart, content type). The cells a table covers are not moved by a recalculation, so the
 * original parts stay valid.
 */
export function restoreTables(entries: readonly ZipEntry[], originals: readonly TableInfo[]): ZipEntry[] {
  const out = entries.map((e) => ({ name: e.name, data: e.data }));
  if (originals.length === 0) return out;
  const pkg = xmlParts(entries);
  const text = (name: string): string | undefined => out.find((e) => e.name === name)?.data.toString("utf8");
  const put = (name: string, xml: string) => {
    const e = out.find((x) => x.name === name);
    if (e) e.data = Buffer.from(xml, "utf8");
    else out.push({ name, data: Buffer.from(xml, "utf8") });
  };
  const byName = new Map(originals.map((t) => [t.name.toUpperCase(), t]));
  const placed = new Set<string>();
  const sheets = sheetParts(pkg);
  for (const sheet of sheets)
    for (const r of relationships(pkg, sheet.part).values()) {
      if (!r.type.endsWith("/table")) continue;
      const t = tags(pkg.get(r.target) ?? "", "table")[0];
      const original = byName.get((t?.get("displayName") ?? t?.get("name") ?? "").toUpperCase());
      if (!original || original.sheet !== sheet.name) continue;
      put(r.target, original.xml);
      placed.add(original.name.toUpperCase());
    }
  for (const t of originals) {
    if (placed.has(t.name.toUpperCase())) continue;
    const sheet = sheets.find((s) => s.name === t.sheet);
    const sheetXml = sheet ? text(sheet.part) : undefined;
    if (!sheet || !sheetXml) continue;
    let k = 1;
    while (out.some((e) => e.name === `xl/tables/table${k}.xml`)) k++;
    const part = `xl/tables/table${k}.xml`;
    put(part, t.xml);
    const relsPart = relsOf(sheet.part);
    const { xml: rels, id } = withRelationship(text(relsPart) ?? EMPTY_RELS, TABLE_REL, `../tables/table${k}.xml`);
    put(relsPart, rels);
    const tablePart = `<tablePart r:id="${id}"/>`;
    const withPart = /<tableParts\b/.test(sheetXml)
      ? sheetXml.replace(/<tableParts count="(\d+)">/, (_, n: string) => `<tableParts count="${Number(n) + 1}">`).replace("</tableParts>", `${tablePart}</tableParts>`)
      : sheetXml.replace(/(<extLst>|<\/worksheet>)/, `<tableParts count="1">${tablePart}</tableParts>$1`);
    put(sheet.part, withPart);
    const types = text("[Content_Types].xml");
    if (types) put("[Content_Types].xml", withOverride(types, part, TABLE_TYPE));
  }
  return out;
}

// ---------------------------------------------------------------------------------------------
// Structured references

type Keyword = "#ALL" | "#DATA" | "#HEADERS" | "#TOTALS" | "#THIS ROW";
const KEYWORDS = new Set<string>(["#ALL", "#DATA", "#HEADERS", "#TOTALS", "#THIS ROW"]);

/** What the bracketed part of a structured reference names. */
export interface TableSpec {
  readonly keywords: readonly Keyword[];
  /** First and last column named (one column when both are the same), or undefined for every column. */
  readonly columns?: readonly [string, string];
}

/**
 * Reads one "[...]" item starting at i: its text with the escapes taken out (an apostrophe
 * escapes the next character), whether it is a keyword ("#..." unescaped) or a this-row item
 * ("@..."), and the index past "]".
 */
function bracketItem(f: string, i: number): { text: string; keyword: boolean; thisRow: boolean; end: number } | undefined {
  if (f[i] !== "[") return undefined;
  const first = f[skipSpaces(f, i + 1)];
  let j = i + 1;
  let text = "";
  while (j < f.length && f[j] !== "]") {
    if (f[j] === "[") return undefined;
    if (f[j] === "'" && j + 1 < f.length) {
      text += f[j + 1];
      j += 2;
    } else text += f[j++];
  }
  return j < f.length ? { text, keyword: first === "#", thisRow: first === "@", end: j + 1 } : undefined;
}

const skipSpaces = (f: string, i: number): number => {
  while (f[i] === " ") i++;
  return i;
};

/**
 * Parses the intra-table reference (MS-XLSX §2.2.2) that opens with "[" at index i, in the form
 * Excel stores (`[Col]`, `[#Data]`, `[[#Headers],[Col]]`, `[[#This Row],[A]:[B]]`) and the form it
 * shows (`[@Col]`, `[@[Col name]]`, `[@]`). Returns the spec and the index past it, or undefined
 * when the text there is not a structured reference.
 */
export function parseTableSpec(f: string, i: number): { spec: TableSpec; end: number } | undefined {
  if (f[i] !== "[") return undefined;
  const next = f[skipSpaces(f, i + 1)];
  // "[@...]": this row, then nothing, a bare column name, or bracketed column(s).
  if (f[i + 1] === "@") {
    const j = i + 2;
    if (f[j] === "]") return { spec: { keywords: ["#THIS ROW"] }, end: j + 1 };
    if (f[j] === "[") {
      const cols = columnRange(f, j);
      if (!cols || f[cols.end] !== "]") return undefined;
      return { spec: { keywords: ["#THIS ROW"], columns: cols.columns }, end: cols.end + 1 };
    }
    const item = bracketItem(f, i);
    if (!item) return undefined;
    const name = item.text.slice(1);
    return { spec: { keywords: ["#THIS ROW"], columns: [name, name] }, end: item.end };
  }
  if (next !== "[") {
    const item = bracketItem(f, i);
    if (!item) return undefined;
    const kw = item.text.trim().toUpperCase();
    if (item.keyword) return KEYWORDS.has(kw) ? { spec: { keywords: [kw as Keyword] }, end: item.end } : undefined;
    const name = item.text;
    return { spec: name === "" ? { keywords: [] } : { keywords: [], columns: [name, name] }, end: item.end };
  }
  // "[ [item], [item], [col]:[col] ]"
  const keywords: Keyword[] = [];
  let columns: [string, string] | undefined;
  let j = skipSpaces(f, i + 1);
  for (;;) {
    const first = bracketItem(f, j);
    if (!first) return undefined;
    const kw = first.text.trim().toUpperCase();
    if (first.keyword || first.thisRow) {
      if (columns) return undefined;
      if (first.thisRow) {
        keywords.push("#THIS ROW");
        const rest = first.text.slice(1);
        if (rest !== "") columns = [rest, rest];
      } else if (KEYWORDS.has(kw)) keywords.push(kw as Keyword);
      else return undefined;
      j = first.end;
    } else {
      if (columns) return undefined;
      const cols = columnRange(f, j);
      if (!cols) return undefined;
      columns = cols.columns;
      j = cols.end;
    }
    j = skipSpaces(f, j);
    if (f[j] === ",") {
      j = skipSpaces(f, j + 1);
      continue;
    }
    if (f[j] !== "]") return undefined;
    return { spec: { keywords, columns }, end: j + 1 };
  }
}

/** "[A]" or "[A]:[B]" at i. */
function columnRange(f: string, i: number): { columns: [string, string]; end: number } | undefined {
  const a = bracketItem(f, i);
  if (!a) return undefined;
  const first = a.text.trim();
  if (f[a.end] !== ":") return { columns: [first, first], end: a.end };
  const b = bracketItem(f, a.end + 1);
  return b ? { columns: [first, b.text.trim()], end: b.end } : undefined;
}

/** Where the formula that holds a reference sits (for [#This Row] and references without a table name). */
export interface FormulaCellRef {
  readonly sheet?: string;
  readonly row?: number;
  readonly col?: number;
}

/** A resolved reference: the range as text the engine reads, or an error constant with the reason. */
export type Resolved = { readonly range: string } | { readonly error: "#REF!" | "#VALUE!"; readonly reason: string };

const findColumn = (t: TableInfo, name: string): number => {
  const want = name.toUpperCase();
  let k = t.columns.findIndex((c) => c.toUpperCase() === want);
  if (k < 0) k = t.columns.findIndex((c) => c.trim().toUpperCase() === want.trim());
  return k;
};

/** The character standing for the formula's row number in a resolved this-row reference, until filled in (see names.ts). */
export const ROW_MARK = "\u0001";

/** Whether a (zero-based) sheet row is one of a table's data rows. */
export const isDataRow = (t: TableInfo, row: number): boolean => row >= t.row + t.headerRows && row <= t.row + t.rows - 1 - t.totalsRows;

/**
 * The range a structured reference stands for. With `rowMark`, a this-row reference gets
 * ROW_MARK for its row number and is not checked against the data rows (the caller fills in the
 * row and checks it with isDataRow), so one resolution serves a whole column of the same formula.
 */
export function resolveTableSpec(t: TableInfo, spec: TableSpec, at: FormulaCellRef, rowMark = false): Resolved {
  const ref = `${t.name}[...]`;
  const headerRow = t.row;
  const dataTop = t.row + t.headerRows;
  const dataBottom = t.row + t.rows - 1 - t.totalsRows;
  const last = t.row + t.rows - 1;
  const has = (k: Keyword) => spec.keywords.includes(k);
  let top: number;
  let bottom: number;
  if (has("#THIS ROW")) {
    if (spec.keywords.length > 1) return { error: "#REF!", reason: `${ref}: [#This Row] cannot be combined with another item` };
    if (at.row === undefined) return { error: "#VALUE!", reason: `${ref}: a this-row reference needs the formula's own row, and this formula has none` };
    if (!rowMark && !isDataRow(t, at.row)) return { error: "#VALUE!", reason: `${ref}: the formula's row ${at.row + 1} is not a data row of table ${t.name}` };
    top = bottom = rowMark ? dataTop : at.row;
  } else if (has("#ALL")) {
    [top, bottom] = [t.row, last];
  } else if (has("#HEADERS") && has("#DATA")) {
    if (!t.headerRows) return { error: "#REF!", reason: `${ref}: table ${t.name} has no header row` };
    [top, bottom] = [headerRow, dataBottom];
  } else if (has("#DATA") && has("#TOTALS")) {
    if (!t.totalsRows) return { error: "#REF!", reason: `${ref}: table ${t.name} has no totals row` };
    [top, bottom] = [dataTop, last];
  } else if (has("#HEADERS")) {
    if (!t.headerRows) return { error: "#REF!", reason: `${ref}: table ${t.name} has no header row` };
    top = bottom = headerRow;
  } else if (has("#TOTALS")) {
    if (!t.totalsRows) return { error: "#REF!", reason: `${ref}: table ${t.name} has no totals row` };
    top = bottom = last;
  } else [top, bottom] = [dataTop, dataBottom];
  if (bottom < top) return { error: "#REF!", reason: `${ref}: table ${t.name} has no data rows` };
  let left = t.col;
  let right = t.col + t.cols - 1;
  if (spec.columns) {
    const a = findColumn(t, spec.columns[0]);
    const b = findColumn(t, spec.columns[1]);
    if (a < 0 || b < 0) return { error: "#REF!", reason: `table ${t.name} has no column named "${spec.columns[a < 0 ? 0 : 1]}"` };
    left = t.col + Math.min(a, b);
    right = t.col + Math.max(a, b);
  }
  // Absolute columns; the rows of a this-row reference relative, so the same formula down a
  // table's column reads the same to the engine (which then parses it once).
  const block = absoluteBlock(top, left, bottom - top + 1, right - left + 1);
  const text = has("#THIS ROW") ? block.replace(/\$(\d+)/g, rowMark ? ROW_MARK : "$1") : block;
  return { range: at.sheet === t.sheet ? text : `${quoteSheet(t.sheet)}!${text}` };
}

/** The table whose area holds a cell, if any. */
export function tableAt(tables: TableIndex, at: FormulaCellRef): TableInfo | undefined {
  if (at.sheet === undefined || at.row === undefined || at.col === undefined) return undefined;
  for (const t of tables.values())
    if (t.sheet === at.sheet && at.row >= t.row && at.row < t.row + t.rows && at.col >= t.col && at.col < t.col + t.cols) return t;
  return undefined;
}
