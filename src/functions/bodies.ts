import { badArgument, isDomainError, withAll, type Result } from "../core/domain";
import type { Body } from "../catalogue/types";
import { bodyFieldValue } from "../catalogue/fields";
import { catalogueTable } from "../catalogue/table";
import { lift, scalar, table } from "./lift";
import { body, list, text, texts, type BodyArg } from "./params";
import { gmOf, radiusOf } from "./bodyargs";

// Family "Bodies" (DESIGN.md §4): the catalogue's values, each with a published source (see the
// pane's catalogue table for the citations).

const catalogueOnly = (b: BodyArg): Result<Body> =>
  typeof b === "number" ? badArgument("body", b, "a catalogue body name: a bare GM number has no other catalogue values") : b;

const f = {
  bodyGm: lift(scalar, [body()], gmOf),
  bodyRadius: lift(scalar, [body()], (b) => withAll([catalogueOnly(b)], (c) => radiusOf(c))),
  bodyValue: lift(scalar, [body(), text("field", "a field name such as \"gm\", \"mean_radius\" or \"j2\"")], (b, field) => withAll([catalogueOnly(b)], (c) => bodyFieldValue(c, field))),
  bodyTable: table([list("fields", true, texts), list("bodies", true, texts)], (fields, bodies) => withAll([catalogueTable(fields, bodies)], (t) => t.rows), (fields, bodies) => {
    const t = catalogueTable(fields, bodies);
    return isDomainError(t) ? [] : t.header;
  }),
};

/**
 * GM (gravitational parameter) of a catalogue body alone, without its moons (JPL DE440 for the Sun, planets, Moon, Ceres and Vesta).
 * @customfunction BODY_GM
 * @helpurl https://localhost:3000/reference.html#body_gm
 * @param body Catalogue body name, e.g. "Mars" (case-insensitive); a number is returned as given.
 * @returns GM, km³/s².
 */
export function bodyGm(body: any[][]): any[][] {
  return f.bodyGm(body);
}

/**
 * Equatorial radius of a catalogue body: the reference radius altitudes are measured from.
 * @customfunction BODY_RADIUS
 * @helpurl https://localhost:3000/reference.html#body_radius
 * @param body Catalogue body name, e.g. "Earth".
 * @returns Equatorial radius, km.
 */
export function bodyRadius(body: any[][]): any[][] {
  return f.bodyRadius(body);
}

/**
 * One catalogue value of a body by field name: gm, system_gm, equatorial_radius, mean_radius, polar_radius, j2, j2_reference_radius, rotation_period, parent, kind, sma, ecc, inc, orbital_period.
 * @customfunction BODY_VALUE
 * @helpurl https://localhost:3000/reference.html#body_value
 * @param body Catalogue body name, e.g. "Jupiter".
 * @param field Field name, e.g. "j2" or "orbital_period" (case-insensitive).
 * @returns The value in sheet units (km, km³/s², s, deg), or text for parent and kind; #N/A where the catalogue has none.
 */
export function bodyValue(body: any[][], field: any[][]): any[][] {
  return f.bodyValue(body, field);
}

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
  return f.bodyTable(fields, bodies, include_header);
}
