import type { ZipEntry } from "./zip";

/**
 * Reading the XML parts of an .xlsx package (ECMA-376 Part 2, Open Packaging Conventions): part
 * names, relationships (§9.3) and the workbook's sheets in order, enough to find each sheet's
 * tables and cell metadata, which exceljs does not expose. Start tags and their attributes only;
 * the parts Excel and exceljs write are plain, well-formed XML.
 */

/** The XML parts of a package (and relationship parts) by part name, as text. */
export type Package = ReadonlyMap<string, string>;

export const xmlParts = (entries: readonly ZipEntry[]): Package =>
  new Map(entries.filter((e) => e.name.endsWith(".xml") || e.name.endsWith(".rels")).map((e) => [e.name, e.data.toString("utf8")]));

const XML_ENTITIES: Record<string, string> = { amp: "&", lt: "<", gt: ">", quot: '"', apos: "'" };

/**
 * XML attribute text as a string: entity and character references, then the `_xHHHH_` escapes
 * of ST_Xstring (ECMA-376 Part 1, §22.9.2.19) that Excel writes for characters XML cannot hold.
 */
export function xmlText(s: string): string {
  return s
    .replace(/&(#x[0-9a-f]+|#\d+|[a-z]+);/gi, (whole, e: string) =>
      e[0] === "#" ? String.fromCodePoint(e[1] === "x" || e[1] === "X" ? parseInt(e.slice(2), 16) : Number(e.slice(1))) : (XML_ENTITIES[e] ?? whole),
    )
    .replace(/_x([0-9A-Fa-f]{4})_/g, (_, hex: string) => String.fromCharCode(parseInt(hex, 16)));
}

/** The attributes of each start tag `<name ...>` (any namespace prefix) in an XML part, in document order. */
export function tags(xml: string, name: string): Map<string, string>[] {
  const out: Map<string, string>[] = [];
  const re = new RegExp(`<(?:\\w+:)?${name}\\b((?:[^>"']|"[^"]*"|'[^']*')*)>`, "g");
  for (let m = re.exec(xml); m; m = re.exec(xml)) out.push(attributes(m[1]));
  return out;
}

/** Attributes of a start tag's text (after its name). */
export function attributes(text: string): Map<string, string> {
  const attrs = new Map<string, string>();
  for (const a of text.matchAll(/([\w:.-]+)\s*=\s*(?:"([^"]*)"|'([^']*)')/g)) attrs.set(a[1], xmlText(a[2] ?? a[3] ?? ""));
  return attrs;
}

/** An attribute by local name, whatever its namespace prefix (r:id, x:id). */
export const localAttribute = (a: ReadonlyMap<string, string>, local: string): string | undefined => {
  for (const [k, v] of a) if (k === local || k.endsWith(`:${local}`)) return v;
  return undefined;
};

/** A relationship target as a part name: relative to the folder of the part that holds the relationship. */
function partName(from: string, target: string): string {
  const parts = target.startsWith("/") ? [] : from.split("/").slice(0, -1);
  for (const seg of target.replace(/^\//, "").split("/")) {
    if (seg === "..") parts.pop();
    else if (seg !== "." && seg !== "") parts.push(seg);
  }
  return parts.join("/");
}

export const relsOf = (part: string): string => {
  const i = part.lastIndexOf("/");
  return `${part.slice(0, i + 1)}_rels/${part.slice(i + 1)}.rels`;
};

/** Internal relationships of a part (the package's own for ""): id -> type and target part name. */
export function relationships(pkg: Package, part: string): Map<string, { type: string; target: string }> {
  const out = new Map<string, { type: string; target: string }>();
  const xml = pkg.get(relsOf(part));
  if (!xml) return out;
  for (const r of tags(xml, "Relationship")) {
    if ((r.get("TargetMode") ?? "").toLowerCase() === "external") continue;
    out.set(r.get("Id") ?? "", { type: r.get("Type") ?? "", target: partName(part, r.get("Target") ?? "") });
  }
  return out;
}

/** The workbook part's name (the package's officeDocument relationship). */
export const workbookPart = (pkg: Package): string =>
  [...relationships(pkg, "").values()].find((r) => r.type.endsWith("/officeDocument"))?.target ?? "xl/workbook.xml";

/** The workbook's sheets in order: name and worksheet part name. */
export function sheetParts(pkg: Package): { name: string; part: string }[] {
  const book = workbookPart(pkg);
  const xml = pkg.get(book);
  if (!xml) return [];
  const rels = relationships(pkg, book);
  const out: { name: string; part: string }[] = [];
  for (const s of tags(xml, "sheet")) {
    const name = s.get("name");
    const rel = rels.get(localAttribute(s, "id") ?? "");
    if (name && rel) out.push({ name, part: rel.target });
  }
  return out;
}

/**
 * The cells of a worksheet part that hold a dynamic array formula: an array formula (`<f
 * t="array">`) in a cell carrying cell metadata (`cm`), which is how Excel marks a dynamic array
 * (the XLDAPR cell metadata described in dynamicarrays.ts).
 */
export function dynamicArrayCells(sheetXml: string): Set<string> {
  const out = new Set<string>();
  for (const m of sheetXml.matchAll(/<c\b((?:[^>"']|"[^"]*")*)>\s*<f\b((?:[^>"']|"[^"]*")*)>/g)) {
    const cell = attributes(m[1]);
    if (cell.has("cm") && attributes(m[2]).get("t") === "array") out.add(cell.get("r") ?? "");
  }
  return out;
}

/** A relationships part with one more relationship (unless one of that type and target is there); returns the part and the id. */
export function withRelationship(rels: string, type: string, target: string): { xml: string; id: string } {
  const existing = new RegExp(`Id="(rId\\d+)"[^>]*Type="${type.replace(/[.]/g, "\\.")}"[^>]*Target="${target.replace(/[.]/g, "\\.")}"`).exec(rels);
  if (existing) return { xml: rels, id: existing[1] };
  const ids = [...rels.matchAll(/Id="rId(\d+)"/g)].map((m) => Number(m[1]));
  const id = `rId${Math.max(0, ...ids) + 1}`;
  return { xml: rels.replace("</Relationships>", `<Relationship Id="${id}" Type="${type}" Target="${target}"/></Relationships>`), id };
}

/** A content-types part with an override for one more part (unless it has one). */
export const withOverride = (types: string, part: string, contentType: string): string =>
  types.includes(`PartName="/${part}"`) ? types : types.replace("</Types>", `<Override PartName="/${part}" ContentType="${contentType}"/></Types>`);

/** An empty relationships part. */
export const EMPTY_RELS = '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"></Relationships>';
