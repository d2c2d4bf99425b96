/**
 * Sheet "Speeds handout": a teaching table, circular speed, escape speed and period of a low
 * circular orbit around several bodies, one formula per column over the list of bodies, then the
 * same bodies' catalogue values with their units.
 */
import { SheetBuilder, span } from "./builder";
import { HANDOUT } from "./story";
import { FORMAT as F } from "./styles";
import type { ScenarioSheet } from "./types";

const BODIES = HANDOUT.bodies;

const b = new SheetBuilder("Handout: speeds and periods of a low circular orbit around several bodies");
b.section("Inputs");
const altitude = b.input("Altitude above each body's equatorial radius", HANDOUT.altitude, "km", F.integer, "the same for every body");
const fields = b.input("Catalogue fields for the table at the bottom", HANDOUT.fields, "", undefined, "field names as the pane's Body catalogue lists them");
b.skip();
b.note("Bodies are inputs too: type any catalogue body into column A.");

const COLUMNS: readonly (readonly [string, string, (col: (c: string) => string) => string])[] = [
  ["Equatorial radius (km)", F.radius, (c) => `=ORBIT.BODY_RADIUS(${c("A")})`],
  ["GM (km³/s²)", F.gm, (c) => `=ORBIT.BODY_GM(${c("A")})`],
  ["Orbit radius (km)", F.radius, (c) => `=ORBIT.ALTITUDE_TO_RADIUS(${c("A")}, ${altitude})`],
  ["Circular speed (km/s)", F.kmsShort, (c) => `=ORBIT.ORBITAL_SPEED(${c("A")}, ${c("D")})`],
  ["Escape speed (km/s)", F.kmsShort, (c) => `=ORBIT.ESCAPE_SPEED(${c("A")}, ${c("D")})`],
  ["Period (s)", F.thousands, (c) => `=ORBIT.PERIOD_FROM_SMA(${c("A")}, ${c("D")})`],
  ["Period (min)", F.oneDecimal, (c) => `=ORBIT.CONVERT_UNIT(${c("G")}, "s", "min")`],
  ["Sphere of influence (km)", F.thousands, (c) => `=ORBIT.SOI_RADIUS(${c("A")})`],
];
const head = b.headings(["Body", ...COLUMNS.map(([h]) => h)]);
const first = head + 1;
const column = (c: string) => span(`${c}${first}`, BODIES.length);
BODIES.forEach((name, i) => b.put(`A${first + i}`, name, "input"));
COLUMNS.forEach(([, format, formula], j) => b.spill(`${String.fromCharCode(66 + j)}${first}`, formula(column), [format], BODIES.length));
b.after(first + BODIES.length - 1);
b.note("Two-body values for a circular orbit; escape speed at the same radius. The gas giants' radii are at the 1 bar level; the Sun's sphere of influence is not defined, and a moon's is about its planet.");
b.skip();

// The catalogue's own values (the units are in the header the function writes).
b.section("The same bodies from the catalogue (sources in the pane's Body catalogue tab)", []);
b.note("A blank cell: the catalogue holds no sourced value for that body.");
const table = b.row;
b.spill(`A${table}`, `=ORBIT.BODY_TABLE(${fields}, ${column("A")}, TRUE)`, [""]);
for (let i = 1; i <= BODIES.length; i++) [F.gm, F.radius, F.j2, F.thousands].forEach((f, j) => b.put(`${String.fromCharCode(66 + j)}${table + i}`, "", "result", f));
b.after(table + BODIES.length);

export const handout: ScenarioSheet = {
  id: "handout",
  title: "Handout: speeds and periods",
  summary: `Circular speed, escape speed and period of a ${HANDOUT.altitude} km circular orbit for ${BODIES.length} bodies, from the catalogue's GM and radius, and the catalogue's values below. Type any catalogue body into the list.`,
  sheetName: "Speeds handout",
  file: "skerry-handout.xlsx",
  cells: b.cellsInOrder(),
  widths: [44, 14, 16, 14, 14, 14, 14, 12, 16],
  keyResults: [
    {
      title: `Handout: a ${HANDOUT.altitude} km circular orbit around each body`,
      columns: ["Body", "Circular (km/s)", "Escape (km/s)", "Period (min)"],
      rows: BODIES.map((name, i) => [name, { cell: `E${first + i}`, digits: 3 }, { cell: `F${first + i}`, digits: 3 }, { cell: `H${first + i}`, digits: 1 }]),
    },
  ],
};
