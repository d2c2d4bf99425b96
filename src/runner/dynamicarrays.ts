import { NAMESPACE } from "../formula/namespace";
import { sheetParts, withOverride, withRelationship, xmlParts } from "./package";
import { readZip, writeZip, type ZipEntry } from "./zip";

/**
 * Marks the ORBIT array formulas of an .xlsx package as dynamic arrays, the way Excel stores a
 * custom function's formula: `<c r="A1" cm="1"><f t="array" ref="A1:A9">_xldudf_...</f>` (the
 * sheet XML quoted in evelyn-chrono/officejs-custom-functions-name-error-repro), where cm="1"
 * points at the workbook's cell metadata block of type XLDAPR whose dynamicArrayProperties has
 * fDynamic="1" (MS-XLSX, the 2017 dynamicarray schema and its extension
 * {bdbb8cdc-fa1e-496e-a857-3c3f30c029c3}). Without the mark Excel opens an array formula as a
 * fixed-size legacy array formula. exceljs writes neither the attribute nor the part, so they are
 * added to the package exceljs wrote: to every ORBIT array formula, and to the other formulas the
 * input file had as dynamic arrays.
 */
const METADATA_PART = "xl/metadata.xml";
const METADATA_TYPE = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml";
const METADATA_REL = "http://schemas.openxmlformats.org/officeDocument/2006/relationships/sheetMetadata";

const METADATA_XML =
  '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n' +
  '<metadata xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:xda="http://schemas.microsoft.com/office/spreadsheetml/2017/dynamicarray">' +
  '<metadataTypes count="1"><metadataType name="XLDAPR" minSupportedVersion="120000" copy="1" pasteAll="1" pasteValues="1" merge="1" splitFirst="1" rowColShift="1" clearFormats="1" clearComments="1" assign="1" coerce="1" cellMeta="1"/></metadataTypes>' +
  '<futureMetadata name="XLDAPR" count="1"><bk><extLst><ext uri="{bdbb8cdc-fa1e-496e-a857-3c3f30c029c3}"><xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"/></ext></extLst></bk></futureMetadata>' +
  '<cellMetadata count="1"><bk><rc t="1" v="0"/></bk></cellMetadata>' +
  "</metadata>";

const ARRAY_CELL = /<c ([^>]*?)>(<f t="array"[^>]*>)([^<]*)<\/f>/g;
const STORED_ORBIT = `_xldudf_${NAMESPACE}_`;

/** Adds cm="1" to the cells whose array formula calls an ORBIT function or is listed in `dynamic`; returns how many. */
function markSheet(xml: string, dynamic: ReadonlySet<string> | undefined): [string, number] {
  let marked = 0;
  const out = xml.replace(ARRAY_CELL, (whole, attrs: string, open: string, formula: string) => {
    if (/\bcm="/.test(attrs)) return whole;
    const address = /\br="([A-Z]+\d+)"/.exec(attrs)?.[1] ?? "";
    if (!formula.includes(STORED_ORBIT) && !dynamic?.has(address)) return whole;
    marked++;
    return `<c ${attrs} cm="1">${open}${formula}</f>`;
  });
  return [out, marked];
}

/**
 * The package with its ORBIT array formulas, and the cells `dynamic` lists by sheet name, marked
 * dynamic (unchanged when there are none).
 */
export function markDynamicArrays(xlsx: Buffer, dynamic: ReadonlyMap<string, ReadonlySet<string>> = new Map()): Buffer {
  const entries = readZip(xlsx);
  const sheetOfPart = new Map(sheetParts(xmlParts(entries)).map((s) => [s.part, s.name]));
  let marked = 0;
  const out: ZipEntry[] = entries.map((e) => {
    const sheet = sheetOfPart.get(e.name);
    if (sheet === undefined) return e;
    const [xml, n] = markSheet(e.data.toString("utf8"), dynamic.get(sheet));
    marked += n;
    return n > 0 ? { name: e.name, data: Buffer.from(xml, "utf8") } : e;
  });
  if (marked === 0) return xlsx;
  const edit = (name: string, f: (s: string) => string) => {
    const e = out.find((x) => x.name === name);
    if (!e) throw new Error(`the package has no ${name}`);
    e.data = Buffer.from(f(e.data.toString("utf8")), "utf8");
  };
  edit("[Content_Types].xml", (types) => withOverride(types, METADATA_PART, METADATA_TYPE));
  edit("xl/_rels/workbook.xml.rels", (rels) => (rels.includes(METADATA_REL) ? rels : withRelationship(rels, METADATA_REL, "metadata.xml").xml));
  const existing = out.find((x) => x.name === METADATA_PART);
  if (existing) existing.data = Buffer.from(METADATA_XML, "utf8");
  else out.push({ name: METADATA_PART, data: Buffer.from(METADATA_XML, "utf8") });
  return writeZip(out);
}
