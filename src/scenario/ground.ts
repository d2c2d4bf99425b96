/**
 * Sheet "Skerry-1 ground contact": a week of Skerry-1's passes over Skerry Ground, both invented
 * (the element set and the station's coordinates), from the two pasted TLE lines and the site:
 * the element set read back, the daily contact minutes, the week's totals, and for the link
 * budget the slant range and free-space path loss at the minimum elevation. The list of passes
 * comes last: how many rows it fills is known only once the passes are found, so nothing sits
 * below it, and the rows it may fill are reserved (formatted, empty) for the pane's guard to
 * check before it writes.
 */
import { keyRow, SheetBuilder } from "./builder";
import { CONTACT as C, excelSerial, isoDate, SKERRY_1_TLE as TLE, SKERRY_GROUND as G } from "./story";
import { FORMAT as F } from "./styles";
import type { ScenarioSheet, Shown } from "./types";

/** Days in the window: a week. */
const DAYS = 7;
/**
 * Rows reserved for the passes: at most about one pass a revolution for a low orbit, and 16
 * revolutions a day is an orbit as low as about 280 km, so 16 a day over the week (Skerry-1's
 * 14.6 a day gives 42 passes above 10°).
 */
const PASS_ROWS = 16 * DAYS;

const b = new SheetBuilder(`Ground contact: Skerry-1 over ${G.name} (invented station and element set)`);

b.section("Inputs");
b.note(`An invented element set for Skerry-1 (its catalogue number 99001 and designator 26999A are made up). Paste a real one over it, each line in its own cell.`);
const line1 = b.input("TLE line 1", TLE.line1);
const line2 = b.input("TLE line 2", TLE.line2);
const lat = b.input("Site latitude", G.latitude, "deg", F.twoDecimals, `${G.name}: an invented station (invented coordinates); north positive`);
const lon = b.input("Site longitude", G.longitude, "deg", F.twoDecimals, "east positive");
const height = b.input("Site height", G.height, "km", F.twoDecimals, "above the WGS 84 ellipsoid");
const start = b.input("Week start", excelSerial(...C.weekStart), "date (UTC)", F.date);
const minEl = b.input("Minimum elevation", C.minElevation, "deg", F.oneDecimal, "assumed for the demo");
const frequency = b.input("Downlink frequency", C.downlinkFrequency, "Hz", F.hertz, "an S-band downlink (invented)");
const body = b.input("Central body of the closed forms", "Earth", "", undefined, "passes and element sets are Earth's only");
const end = b.result("Week end", `=${start}+${DAYS}`, "date (UTC)", F.date);
const tle = `${line1}:${line2}`;
b.skip();

b.section("Element set, read back (SGP4 mean elements)", []);
const elements = b.row;
b.put(`A${elements}`, `=ORBIT.TLE_ELEMENTS(${line1}, ${line2}, TRUE)`, "result");
const ELEMENT_FORMATS = [F.dateTime, F.deg, F.deg, F.ecc, F.deg, F.deg, "0.00000000", "0.0000E+00"];
ELEMENT_FORMATS.forEach((f, j) => b.put(`${String.fromCharCode(65 + j)}${elements + 1}`, "", "result", f));
const meanMotion = `G${elements + 1}`;
b.after(elements + 1).skip();

b.section("Link budget at the minimum elevation (circular orbit, closed forms)");
const period = b.result("Orbit period from the mean motion", `=86400/${meanMotion}`, "s", F.seconds);
const sma = b.result("Semi-major axis for that period (two-body)", `=ORBIT.SMA_FROM_PERIOD(${body}, ${period})`, "km", F.km);
const radius = b.result("Earth's equatorial radius (WGS 84)", `=ORBIT.BODY_VALUE(${body}, "ellipsoid_semi_major_axis")`, "km", F.km);
const altitude = b.result("Mean altitude, approximate", `=${sma}-${radius}`, "km", F.oneDecimal, "SGP4's mean motion read as two-body: within a few km");
const slant = b.result("Slant range at the minimum elevation", `=ORBIT.SLANT_RANGE(${altitude}, ${minEl})`, "km", F.oneDecimal, "the longest range of a pass, for the link budget");
const loss = b.result("Free-space path loss at that range", `=ORBIT.FREE_SPACE_PATH_LOSS(${slant}, ${frequency})`, "dB", F.decibels);
const longest = b.result("Longest pass (overhead)", `=ORBIT.MAX_PASS_DURATION(${altitude}, ${minEl})`, "s", F.seconds, "the Earth's turn during a pass ignored: a few percent");
const halfAngle = b.result("Coverage half-angle (Earth central angle)", `=ORBIT.COVERAGE_HALF_ANGLE(${altitude}, ${minEl})`, "deg", F.deg);
b.skip();

b.section("Daily contact above the minimum elevation", []);
const daily = b.row;
b.put(`A${daily}`, `=ORBIT.CONTACT_TIME(${tle}, ${lat}, ${lon}, ${height}, ${start}, ${end}, ${minEl}, TRUE)`, "result");
const firstDay = daily + 1;
const lastDay = daily + DAYS;
for (let r = firstDay; r <= lastDay; r++) [F.date, F.oneDecimal, F.integer].forEach((f, j) => b.put(`${String.fromCharCode(65 + j)}${r}`, "", "result", f));
b.after(lastDay);
const minutes = `B${firstDay}:B${lastDay}`;
const weekTotal = b.result("Contact in the week", `=SUM(${minutes})`, "min", F.oneDecimal);
const perDay = b.result("Mean contact per day", `=AVERAGE(${minutes})`, "min", F.oneDecimal);
const passCount = b.result("Passes in the week", `=SUM(C${firstDay}:C${lastDay})`, "", F.integer);

// The week's extremes read the list of passes below over its reserved rows: three rows of them,
// a blank row and the list's heading come first.
const passesAt = b.row + 5;
const firstPass = passesAt + 1;
const lastReserved = passesAt + PASS_ROWS;
const column = (c: string) => `${c}${firstPass}:${c}${lastReserved}`;
const highest = b.result("Highest pass of the week: maximum elevation", `=MAX(${column("C")})`, "deg", F.oneDecimal);
const highestRise = b.result("Highest pass of the week: rise", `=INDEX(${column("A")}, MATCH(${highest}, ${column("C")}, 0))`, "UTC", F.dateTime);
const longestFound = b.result("Longest pass of the week", `=MAX(${column("E")})`, "s", F.seconds, "against the overhead closed form above");
b.skip();

b.section("Passes of the week, one row each (the list grows with the passes: nothing below it)", []);
if (b.row !== passesAt) throw new Error(`ground contact: the passes start in row ${b.row}, not ${passesAt}`);
b.put(`A${passesAt}`, `=ORBIT.PASSES(${tle}, ${lat}, ${lon}, ${height}, ${start}, ${end}, ${minEl}, TRUE)`, "result");
for (let r = firstPass; r <= lastReserved; r++) [F.dateTime, F.dateTime, F.oneDecimal, F.dateTime, F.integer].forEach((f, j) => b.put(`${String.fromCharCode(65 + j)}${r}`, "", "result", f));

const cell = (ref: string, digits: number): Shown => ({ cell: ref, digits });
const time = (ref: string): Shown => ({ cell: ref, time: true });

export const ground: ScenarioSheet = {
  id: "ground",
  title: "Ground contact",
  summary: `A week of Skerry-1's passes over ${G.name}, both invented (the element set and the station at ${G.latitude}° N, ${-G.longitude}° W), from two pasted TLE lines: daily contact minutes, the week's totals, and the slant range and path loss at the minimum elevation for the link budget.`,
  sheetName: "Skerry-1 ground contact",
  file: "skerry-ground-contact.xlsx",
  cells: b.cellsInOrder(),
  widths: [50, 20, 16, 20, 14, 14, 14, 14],
  keyResults: [
    {
      title: `Skerry-1 over ${G.name} (invented station and element set), the week from ${isoDate(C.weekStart)}, above ${C.minElevation} deg`,
      columns: ["Day from (UTC)", "Contact (min)", "Passes"],
      rows: Array.from({ length: DAYS }, (_, i) => [{ cell: `A${firstDay + i}`, date: true }, cell(`B${firstDay + i}`, 1), cell(`C${firstDay + i}`, 0)]),
    },
    {
      title: "The week and the link budget",
      columns: ["Quantity", "Value", "Unit"],
      rows: [
        keyRow("Contact in the week", weekTotal, 1, "min"),
        keyRow("Mean contact per day", perDay, 1, "min"),
        keyRow("Passes in the week", passCount, 0, ""),
        keyRow("Highest pass: maximum elevation", highest, 1, "deg"),
        ["Highest pass: rise", time(highestRise), "UTC"],
        keyRow("Longest pass of the week", longestFound, 0, "s"),
        keyRow("Longest pass, overhead closed form", longest, 0, "s"),
        keyRow("Mean altitude, approximate", altitude, 1, "km"),
        keyRow(`Slant range at ${C.minElevation} deg elevation`, slant, 1, "km"),
        keyRow(`Free-space path loss at ${C.downlinkFrequency / 1e9} GHz`, loss, 2, "dB"),
        keyRow("Coverage half-angle", halfAngle, 3, "deg"),
      ],
    },
    {
      title: "The first passes of the week",
      columns: ["Rise (UTC)", "Highest (UTC)", "Maximum elevation (deg)", "Set (UTC)", "Duration (s)"],
      rows: [0, 1, 2].map((i) => [time(`A${firstPass + i}`), time(`B${firstPass + i}`), cell(`C${firstPass + i}`, 1), time(`D${firstPass + i}`), cell(`E${firstPass + i}`, 0)]),
    },
  ],
};

/** Cells other code reads by meaning (tests). */
export const GROUND_CELLS = { line1, line2, lat, lon, height, start, end, minEl, elements, altitude, slant, loss, longest, halfAngle, weekTotal, perDay, passCount, highest, highestRise, longestFound, daily, passesAt, firstPass, lastReserved, PASS_ROWS } as const;
