import { writeFileSync } from "node:fs";
import { blockAddress, parseBlock, parseCell } from "../../src/formula/cells";
import { writeZip } from "../../src/runner/zip";

/**
 * Test fixtures: .xlsx packages written by hand the way Excel 365 writes them, for what exceljs
 * cannot write (tables with structured references, dynamic array formulas with their cell
 * metadata, cached #SPILL! errors, capital-E constants). Parts and markup after ECMA-376 Part 1:
 * §18.2 workbook (sheets, definedNames, calcPr), §18.3.1 worksheet (sheetData, c, f, v,
 * tableParts), §18.4 shared strings, §18.5.1 table, §18.8 styles (the minimal stylesheet),
 * Part 2 (content types, relationships); the dynamic-array cell metadata (cm) as in
 * src/runner/dynamicarrays.ts. Formulas are written without "=", as in the file.
 */

export type Cached = number | string | boolean | { error: string };

export interface CellSpec {
  /** A constant: number, text (a shared string), boolean, or an error code. */
  value?: Cached;
  /** A formula as the file stores it (no "="), with its cached result. */
  f?: string;
  cached?: Cached;
  /** An array formula over this area (e.g. "D2:F5"); with dynamic, marked as a dynamic array (cm="1"). */
  array?: string;
  dynamic?: boolean;
}

export interface TableSpec {
  name: string;
  /** The whole area, header (and totals) included. */
  ref: string;
  columns: string[];
  totalsRow?: boolean;
}

export interface SheetSpec {
  name: string;
  cells: Record<string, CellSpec | Cached>;
  tables?: TableSpec[];
}

const esc = (s: string): string => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
const MAIN = "http://schemas.openxmlformats.org/spreadsheetml/2006/main";
const REL = "http://schemas.openxmlformats.org/officeDocument/2006/relationships";
const PKG_REL = "http://schemas.openxmlformats.org/package/2006/relationships";
const HEAD = '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\r\n';

const STYLES =
  `${HEAD}<styleSheet xmlns="${MAIN}"><fonts count="1"><font><sz val="11"/><color theme="1"/><name val="Calibri"/><family val="2"/><scheme val="minor"/></font></fonts>` +
  '<fills count="2"><fill><patternFill patternType="none"/></fill><fill><patternFill patternType="gray125"/></fill></fills>' +
  '<borders count="1"><border><left/><right/><top/><bottom/><diagonal/></border></borders>' +
  '<cellStyleXfs count="1"><xf numFmtId="0" fontId="0" fillId="0" borderId="0"/></cellStyleXfs>' +
  '<cellXfs count="1"><xf numFmtId="0" fontId="0" fillId="0" borderId="0" xfId="0"/></cellXfs>' +
  '<cellStyles count="1"><cellStyle name="Normal" xfId="0" builtinId="0"/></cellStyles><dxfs count="0"/><tableStyles count="0" defaultTableStyle="TableStyleMedium2" defaultPivotStyle="PivotStyleLight16"/></styleSheet>';

const METADATA =
  `${HEAD}<metadata xmlns="${MAIN}" xmlns:xda="http://schemas.microsoft.com/office/spreadsheetml/2017/dynamicarray">` +
  '<metadataTypes count="1"><metadataType name="XLDAPR" minSupportedVersion="120000" copy="1" pasteAll="1" pasteValues="1" merge="1" splitFirst="1" rowColShift="1" clearFormats="1" clearComments="1" assign="1" coerce="1" cellMeta="1"/></metadataTypes>' +
  '<futureMetadata name="XLDAPR" count="1"><bk><extLst><ext uri="{bdbb8cdc-fa1e-496e-a857-3c3f30c029c3}"><xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"/></ext></extLst></bk></futureMetadata>' +
  '<cellMetadata count="1"><bk><rc t="1" v="0"/></bk></cellMetadata></metadata>';

/** `<c>` for one cell: t="s" shared strings, t="b", t="e", t="str" for a formula's text result. */
function cellXml(ref: string, spec: CellSpec, strings: string[]): string {
  const typed = (v: Cached, inFormula: boolean): [string, string] => {
    // Excel writes a number's exponent with a capital E (2.1106088532726839E-7).
    if (typeof v === "number") return ["", String(v).toUpperCase()];
    if (typeof v === "boolean") return [' t="b"', v ? "1" : "0"];
    if (typeof v === "object") return [' t="e"', v.error];
    if (inFormula) return [' t="str"', esc(v)];
    let k = strings.indexOf(v);
    if (k < 0) k = strings.push(v) - 1;
    return [' t="s"', String(k)];
  };
  if (spec.f === undefined) {
    const [t, v] = typed(spec.value!, false);
    return `<c r="${ref}"${t}><v>${v}</v></c>`;
  }
  const [t, v] = spec.cached === undefined ? ["", ""] : typed(spec.cached, true);
  const cm = spec.dynamic ? ' cm="1"' : "";
  const f = spec.array ? `<f t="array" ref="${spec.array}">${esc(spec.f)}</f>` : `<f>${esc(spec.f)}</f>`;
  return `<c r="${ref}"${t}${cm}>${f}${v === "" ? "" : `<v>${v}</v>`}</c>`;
}

function sheetXml(sheet: SheetSpec, strings: string[], tableRels: string[]): string {
  const byRow = new Map<number, [number, string, CellSpec][]>();
  let minR = Infinity;
  let minC = Infinity;
  let maxR = 0;
  let maxC = 0;
  for (const [ref, raw] of Object.entries(sheet.cells)) {
    const at = parseCell(ref)!;
    const spec: CellSpec = typeof raw === "object" && !("error" in raw) ? raw : { value: raw };
    (byRow.get(at.row) ?? byRow.set(at.row, []).get(at.row)!).push([at.col, ref, spec]);
    [minR, minC, maxR, maxC] = [Math.min(minR, at.row), Math.min(minC, at.col), Math.max(maxR, at.row), Math.max(maxC, at.col)];
  }
  const rows = [...byRow.entries()]
    .sort((a, b) => a[0] - b[0])
    .map(([r, cells]) => `<row r="${r + 1}">${cells.sort((a, b) => a[0] - b[0]).map(([, ref, spec]) => cellXml(ref, spec, strings)).join("")}</row>`)
    .join("");
  const dim = blockAddress(minR, minC, maxR - minR + 1, maxC - minC + 1);
  const parts = tableRels.length ? `<tableParts count="${tableRels.length}">${tableRels.map((id) => `<tablePart r:id="${id}"/>`).join("")}</tableParts>` : "";
  return (
    `${HEAD}<worksheet xmlns="${MAIN}" xmlns:r="${REL}"><dimension ref="${dim}"/><sheetViews><sheetView workbookViewId="0"/></sheetViews>` +
    `<sheetFormatPr defaultRowHeight="15"/><sheetData>${rows}</sheetData><pageMargins left="0.7" right="0.7" top="0.75" bottom="0.75" header="0.3" footer="0.3"/>${parts}</worksheet>`
  );
}

function tableXml(t: TableSpec, id: number): string {
  const area = parseBlock(t.ref)!;
  const data = t.totalsRow ? blockAddress(area.row, area.col, area.rows - 1, area.cols) : t.ref;
  const cols = t.columns.map((c, k) => `<tableColumn id="${k + 1}" name="${esc(c)}"/>`).join("");
  const totals = t.totalsRow ? ' totalsRowCount="1"' : ' totalsRowShown="0"';
  return (
    `${HEAD}<table xmlns="${MAIN}" id="${id}" name="${esc(t.name)}" displayName="${esc(t.name)}" ref="${t.ref}"${totals}>` +
    `<autoFilter ref="${data}"/><tableColumns count="${t.columns.length}">${cols}</tableColumns>` +
    '<tableStyleInfo name="TableStyleMedium2" showFirstColumn="0" showLastColumn="0" showRowStripes="1" showColumnStripes="0"/></table>'
  );
}

/** Writes the package to `path` (and returns the path). Names: name -> "Sheet!$A$1". */
export function writeExcelLikeBook(path: string, sheets: SheetSpec[], names: Record<string, string> = {}): string {
  const strings: string[] = [];
  const entries: { name: string; data: Buffer }[] = [];
  const put = (name: string, xml: string) => entries.push({ name, data: Buffer.from(xml, "utf8") });
  const overrides: string[] = [];
  let tableId = 0;
  const sheetXmls: string[] = [];
  sheets.forEach((sheet, s) => {
    const rels: string[] = [];
    const ids: string[] = [];
    for (const t of sheet.tables ?? []) {
      tableId++;
      const rid = `rId${ids.length + 1}`;
      ids.push(rid);
      rels.push(`<Relationship Id="${rid}" Type="${REL}/table" Target="../tables/table${tableId}.xml"/>`);
      put(`xl/tables/table${tableId}.xml`, tableXml(t, tableId));
      overrides.push(`<Override PartName="/xl/tables/table${tableId}.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.table+xml"/>`);
    }
    if (rels.length) put(`xl/worksheets/_rels/sheet${s + 1}.xml.rels`, `${HEAD}<Relationships xmlns="${PKG_REL}">${rels.join("")}</Relationships>`);
    sheetXmls.push(sheetXml(sheet, strings, ids));
    overrides.push(`<Override PartName="/xl/worksheets/sheet${s + 1}.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/>`);
  });
  sheetXmls.forEach((xml, s) => put(`xl/worksheets/sheet${s + 1}.xml`, xml));
  const n = sheets.length;
  const defined = Object.entries(names).map(([name, ref]) => `<definedName name="${esc(name)}">${esc(ref)}</definedName>`).join("");
  put(
    "xl/workbook.xml",
    `${HEAD}<workbook xmlns="${MAIN}" xmlns:r="${REL}"><fileVersion appName="xl" lastEdited="7" lowestEdited="7" rupBuild="28526"/><workbookPr defaultThemeVersion="166925"/>` +
      `<bookViews><workbookView xWindow="0" yWindow="0" windowWidth="28800" windowHeight="12300"/></bookViews><sheets>` +
      sheets.map((sh, s) => `<sheet name="${esc(sh.name)}" sheetId="${s + 1}" r:id="rId${s + 1}"/>`).join("") +
      `</sheets>${defined ? `<definedNames>${defined}</definedNames>` : ""}<calcPr calcId="191029"/></workbook>`,
  );
  put(
    "xl/_rels/workbook.xml.rels",
    `${HEAD}<Relationships xmlns="${PKG_REL}">` +
      sheets.map((_, s) => `<Relationship Id="rId${s + 1}" Type="${REL}/worksheet" Target="worksheets/sheet${s + 1}.xml"/>`).join("") +
      `<Relationship Id="rId${n + 1}" Type="${REL}/styles" Target="styles.xml"/><Relationship Id="rId${n + 2}" Type="${REL}/sharedStrings" Target="sharedStrings.xml"/>` +
      `<Relationship Id="rId${n + 3}" Type="${REL}/sheetMetadata" Target="metadata.xml"/></Relationships>`,
  );
  put("xl/styles.xml", STYLES);
  put("xl/metadata.xml", METADATA);
  put("xl/sharedStrings.xml", `${HEAD}<sst xmlns="${MAIN}" count="${strings.length}" uniqueCount="${strings.length}">${strings.map((s) => `<si><t xml:space="preserve">${esc(s)}</t></si>`).join("")}</sst>`);
  put("_rels/.rels", `${HEAD}<Relationships xmlns="${PKG_REL}"><Relationship Id="rId1" Type="${REL}/officeDocument" Target="xl/workbook.xml"/></Relationships>`);
  put(
    "[Content_Types].xml",
    `${HEAD}<Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types"><Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/><Default Extension="xml" ContentType="application/xml"/>` +
      '<Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/>' +
      overrides.join("") +
      '<Override PartName="/xl/styles.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.styles+xml"/>' +
      '<Override PartName="/xl/sharedStrings.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sharedStrings+xml"/>' +
      '<Override PartName="/xl/metadata.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml"/></Types>',
  );
  // Excel writes [Content_Types].xml first in the package.
  entries.unshift(entries.splice(entries.findIndex((e) => e.name === "[Content_Types].xml"), 1)[0]);
  writeFileSync(path, writeZip(entries));
  return path;
}
