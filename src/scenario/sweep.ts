/**
 * Sheet "Skerry-1 altitude sweep": what the choice of mission altitude changes, 300 to 1200 km.
 * Each result column is one formula lifted over the whole altitude column. Unit changes go
 * through CONVERT_UNIT on the column a formula returned (not arithmetic on it), so the sheet
 * recalculates the same in engines without array arithmetic, such as the headless runner.
 */
import { fixed, SheetBuilder, span } from "./builder";
import { SKERRY_1 as S, SWEEP } from "./story";
import { FORMAT as F } from "./styles";
import type { ScenarioSheet } from "./types";

const ALTITUDES = Array.from({ length: SWEEP.count }, (_, i) => SWEEP.first + SWEEP.step * i);

const b = new SheetBuilder("Skerry-1 altitude sweep: what the mission altitude changes");
b.section("Inputs");
const body = b.input("Central body", S.body, "", undefined, "a catalogue name, or a GM in km³/s²");
const hRide = b.input("Rideshare orbit altitude (circular)", S.rideshareAltitude, "km", F.integer, "where every transfer in column J starts");
const inc = b.input("Inclination for the node drift", S.rideshareInclination, "deg", F.twoDecimals, "the rideshare orbit's");
const ecc = b.input("Eccentricity", 0, "", F.ecc, "0 for circular orbits");
const beta = b.input("Beta angle", 0, "deg", F.oneDecimal, "0° gives the longest eclipse");
const isp = b.input("Specific impulse", S.isp, "s", F.integer, "Skerry-1's monopropellant thruster");
const rRide = b.result("Rideshare orbit radius", `=ORBIT.ALTITUDE_TO_RADIUS(${body}, ${hRide})`, "km", F.km);
b.skip();
b.note(`Altitudes are inputs too: type any altitudes into column A (${ALTITUDES.length} rows). Skerry-1 leaves its ${S.rideshareAltitude} km rideshare orbit for ${S.missionAltitude} km.`);

const COLUMNS: readonly (readonly [string, string, (col: (c: string) => string) => string])[] = [
  ["Radius (km)", F.km, (c) => `=ORBIT.ALTITUDE_TO_RADIUS(${body}, ${c("A")})`],
  ["Circular speed (km/s)", F.kms, (c) => `=ORBIT.ORBITAL_SPEED(${body}, ${c("B")})`],
  ["Period (s)", F.seconds, (c) => `=ORBIT.PERIOD_FROM_SMA(${body}, ${c("B")})`],
  ["Period (min)", F.minutes, (c) => `=ORBIT.CONVERT_UNIT(${c("D")}, "s", "min")`],
  ["Sun-synchronous inclination (deg)", F.deg, (c) => `=ORBIT.SUN_SYNC_INCLINATION(${body}, ${c("B")}, ${ecc})`],
  ["Node drift at the inclination above (deg/day)", F.degPerDay, (c) => `=ORBIT.NODAL_PRECESSION(${body}, ${c("B")}, ${ecc}, ${inc})`],
  ["Longest eclipse (s)", F.seconds, (c) => `=ORBIT.ECLIPSE_DURATION(${body}, ${c("B")}, ${beta})`],
  ["Longest eclipse (min)", F.minutes, (c) => `=ORBIT.CONVERT_UNIT(${c("H")}, "s", "min")`],
  ["Hohmann delta-v from the rideshare orbit (km/s)", F.kms, (c) => `=ORBIT.TRANSFER_DV(${body}, ${fixed(rRide)}, ${c("B")})`],
  ["Hohmann delta-v from the rideshare orbit (m/s)", F.ms, (c) => `=ORBIT.CONVERT_UNIT(${c("J")}, "km/s", "m/s")`],
  ["Mass ratio at the specific impulse above", F.ratio, (c) => `=ORBIT.MASS_RATIO(${c("J")}, ${isp})`],
];

const head = b.headings(["Altitude (km)", ...COLUMNS.map(([h]) => h)]);
const first = head + 1;
const last = first + ALTITUDES.length - 1;
const column = (c: string) => span(`${c}${first}`, ALTITUDES.length);
ALTITUDES.forEach((h, i) => b.put(`A${first + i}`, h, "input", F.integer));
COLUMNS.forEach(([, format, formula], j) => b.spill(`${String.fromCharCode(66 + j)}${first}`, formula(column), [format], ALTITUDES.length));

// exceljs 4.4.0, which writes the demo file, has no chart support, so the file gets this note
// where the pane's template draws the chart (over the note).
const CHART_FROM = `N${head}`;
b.put(
  CHART_FROM,
  `Chart: the Hohmann delta-v from the rideshare orbit (column K) against altitude (column A). The pane's template draws it here; the demo file has none, because exceljs 4.4.0, which writes it, cannot write charts: select ${column("A")} and ${column("K")} and insert a scatter chart with lines.`,
  "note",
);
b.after(last);

/** Rows the demo prints: every 100 km, and the rideshare and mission altitudes. */
const shownRows = ALTITUDES.map((h, i) => [h, first + i] as const).filter(([h]) => h % 100 === 0 || h === S.rideshareAltitude || h === S.missionAltitude);

export const sweep: ScenarioSheet = {
  id: "sweep",
  title: "Altitude sweep",
  summary: `Circular speed, period, sun-synchronous inclination, node drift, longest eclipse and the Hohmann delta-v from Skerry-1's ${S.rideshareAltitude} km rideshare orbit, ${ALTITUDES[0]} to ${ALTITUDES[ALTITUDES.length - 1]} km: one formula per column, with a line chart of the delta-v.`,
  sheetName: "Skerry-1 altitude sweep",
  file: "skerry-altitude-sweep.xlsx",
  cells: b.cellsInOrder(),
  widths: [34, 12, 12, 12, 12, 14, 14, 12, 12, 14, 14, 14],
  chart: {
    title: `Hohmann delta-v from the ${S.rideshareAltitude} km rideshare orbit`,
    x: column("A"),
    y: column("K"),
    xTitle: "Altitude (km)",
    yTitle: "Delta-v (m/s)",
    from: CHART_FROM,
    to: `V${head + 22}`,
  },
  keyResults: [
    {
      title: `Altitude sweep (every 100 km, and the ${S.rideshareAltitude} km rideshare and ${S.missionAltitude} km mission altitudes)`,
      columns: ["Altitude (km)", "Speed (km/s)", "Period (min)", "Sun-sync. inclination (deg)", "Eclipse (min)", `From ${S.rideshareAltitude} km (m/s)`],
      rows: shownRows.map(([h, r]) => [
        h,
        { cell: `C${r}`, digits: 4 },
        { cell: `E${r}`, digits: 2 },
        { cell: `F${r}`, digits: 3 },
        { cell: `I${r}`, digits: 2 },
        { cell: `K${r}`, digits: 1 },
      ]),
    },
  ],
};
