import { isDomainError, noAnswer, type Result } from "../core/domain";
import { BODIES } from "./bodies";
import { BODY_FIELDS, fieldHeader, findField, type BodyField } from "./fields";
import { findBody } from "./lookup";
import type { Body } from "./types";

/** The numeric fields BODY_TABLE shows when no fields are named (parent and kind are text). */
// Earth's WGS 84 ellipsoid fields are asked for by name: in the whole-catalogue table they would
// be five columns blank on every other row.
export const DEFAULT_TABLE_FIELDS = BODY_FIELDS.filter((f) => f.key !== "parent" && f.key !== "kind" && !f.key.startsWith("ellipsoid_")).map((f) => f.key);

/** Names may come one per cell or several per cell separated by commas. */
const split = (names: readonly string[]): string[] =>
  names.flatMap((n) => n.split(",")).map((n) => n.trim()).filter((n) => n !== "");

export interface CatalogueTable {
  header: string[];
  /** One row per body: its name, then each field's value; "" where the catalogue has none. */
  rows: (string | number)[][];
}

/** The catalogue as rows of bodies by columns of fields, in sheet units (DEVELOPERS.md, "Conventions"). */
export function catalogueTable(fieldNames: readonly string[] | null, bodyNames: readonly string[] | null): Result<CatalogueTable> {
  const fields: BodyField[] = [];
  for (const name of fieldNames ? split(fieldNames) : DEFAULT_TABLE_FIELDS) {
    const f = findField(name, "fields");
    if (isDomainError(f)) return f;
    fields.push(f);
  }
  const bodies: Body[] = [];
  for (const name of bodyNames ? split(bodyNames) : BODIES.map((b) => b.name)) {
    const b = findBody(name, "bodies");
    if (isDomainError(b)) return b;
    bodies.push(b);
  }
  if (fields.length === 0) return noAnswer("fields", "no field names were given");
  if (bodies.length === 0) return noAnswer("bodies", "no body names were given");
  return {
    header: ["Body", ...fields.map(fieldHeader)],
    rows: bodies.map((b) => [
      b.name,
      ...fields.map((f) => {
        const v = f.get(b);
        return v === undefined ? "" : typeof v === "string" ? v : v.value;
      }),
    ]),
  };
}
