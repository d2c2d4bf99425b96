import { badArgument, isDomainError, withAll, type Result } from "../core/domain";
import type { Body } from "../catalogue/types";
import { BODY_FIELDS, bodyFieldValue } from "../catalogue/fields";
import { catalogueTable } from "../catalogue/table";
import { family, type SizeView } from "./define";
import { body, gm, list, suggesting, text, texts, type BodyArg } from "./params";

/** The catalogue's fields, offered as suggestions for BODY_VALUE's field. */
const FIELD_CHOICES = BODY_FIELDS.map((f) => ({ value: f.key, tooltip: `${f.label}${f.unit ? ` (${f.unit})` : ""}: ${f.description}.` }));
import { radiusOf } from "./bodyargs";

// Family "Bodies": the catalogue's values, each with a published source (see the
// pane's catalogue table for the citations).

const catalogueOnly = (b: BodyArg): Result<Body> =>
  typeof b === "number" ? badArgument("body", b, "a catalogue body name: a bare GM number has no other catalogue values") : b;

const define = family("Bodies");

const BODY_GM = define.scalar("BODY_GM", [gm()], (mu) => mu, {
  example: ["Earth"],
  terms: ["gravitational parameter", "mu", "standard gravitational parameter", "mass"],
});
/**
 * GM (gravitational parameter) of a catalogue body alone, without its moons (JPL DE440 for the Sun, planets, Moon, Ceres and Vesta).
 * @customfunction BODY_GM
 * @helpurl https://localhost:3000/reference.html#body_gm
 * @param body Catalogue body name, e.g. "Mars" (case-insensitive); a number is returned as given.
 * @returns GM, km³/s².
 */
export function bodyGm(body: any[][]): any[][] {
  return BODY_GM(arguments);
}

const BODY_RADIUS = define.scalar("BODY_RADIUS", [body()], (b) => withAll([catalogueOnly(b)], (c) => radiusOf(c)), {
  example: ["Mars"],
  terms: ["equatorial radius", "planet size", "reference radius"],
});
/**
 * Equatorial radius of a catalogue body: the reference radius altitudes are measured from.
 * @customfunction BODY_RADIUS
 * @helpurl https://localhost:3000/reference.html#body_radius
 * @param body Catalogue body name, e.g. "Earth".
 * @returns Equatorial radius, km.
 */
export function bodyRadius(body: any[][]): any[][] {
  return BODY_RADIUS(arguments);
}

const BODY_VALUE = define.scalar(
  "BODY_VALUE",
  [body(), suggesting(text("field", 'a field name such as "gm", "mean_radius" or "j2"'), FIELD_CHOICES)],
  (b, field) => withAll([catalogueOnly(b)], (c) => bodyFieldValue(c, field)),
  { example: ["Jupiter", "j2"], terms: ["constant", "catalogue value", "J2", "rotation period", "oblateness"] },
);
/**
 * One catalogue value of a body by field name: gm, system_gm, equatorial_radius, mean_radius, polar_radius, j2, j2_reference_radius, rotation_period, parent, kind, sma, ecc, inc, orbital_period; for Earth also the WGS 84 ellipsoid (NIMA TR8350.2): ellipsoid_semi_major_axis, ellipsoid_inverse_flattening, ellipsoid_gm, ellipsoid_rotation_rate, ellipsoid_j2.
 * @customfunction BODY_VALUE
 * @helpurl https://localhost:3000/reference.html#body_value
 * @param body Catalogue body name, e.g. "Jupiter".
 * @param field Field name, e.g. "j2" or "orbital_period" (case-insensitive).
 * @returns The value in sheet units (km, km³/s², s, deg), or text for parent and kind; #N/A where the catalogue has none.
 */
export function bodyValue(body: any[][], field: any[][]): any[][] {
  return BODY_VALUE(arguments);
}

const BODY_TABLE = define.table(
  "BODY_TABLE",
  [list("fields", true, texts), list("bodies", true, texts)],
  (fields, bodies) => withAll([catalogueTable(fields, bodies)], (t) => t.rows),
  {
    example: ["gm, mean_radius", "Earth, Moon, Mars", true],
    terms: ["constants table", "planet data", "solar system table", "catalogue"],
    labels: (fields, bodies) => {
      const t = catalogueTable(fields, bodies);
      return isDomainError(t) ? [] : t.header;
    },
    // One row per body (name, then one column per field); an omitted list takes the defaults' size.
    size: (a: SizeView) => {
      const all = a.omitted("fields") || a.omitted("bodies") ? a.defaults() : undefined;
      const fields = a.omitted("fields") ? (all ? all.cols - 1 : undefined) : a.names("fields");
      const bodies = a.omitted("bodies") ? (all ? all.rows : undefined) : a.names("bodies");
      return bodies === undefined || fields === undefined ? undefined : { rows: bodies + (a.header() ? 1 : 0), cols: fields + 1 };
    },
  },
);
/**
 * A table of catalogue values: one row per body, one column per field. Missing values are blank.
 * @customfunction BODY_TABLE
 * @helpurl https://localhost:3000/reference.html#body_table
 * @param [fields] Field names (a range, or one text with commas); omitted: every numeric field.
 * @param [bodies] Body names (a range, or one text with commas); omitted: the whole catalogue.
 * @param [include_header] TRUE puts a header row of labels with units on top.
 * @returns Rows of body name and values in sheet units.
 */
export function bodyTable(fields?: any[][], bodies?: any[][], include_header?: any[][]): any[][] {
  return BODY_TABLE(arguments);
}
