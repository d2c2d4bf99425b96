/**
 * Sheet "Skerry-L Mars window": the Mars flyby variant of the Skerry-L study. One formula gives
 * the departure C3 over a grid of departure dates and flight times, shaded as a colour scale; the
 * lowest C3 is found by formulas beside the grid, with its date and flight time, and that arc's
 * departure burn and the circular coplanar Hohmann figures follow for comparison.
 */
import { cellAddress, columnLetters } from "../formula/cells";
import { fixed, keyRow, offset, SheetBuilder, span } from "./builder";
import { excelSerial, SKERRY_L_MARS as M } from "./story";
import { FORMAT as F, WINDOW_SCALE } from "./styles";
import type { ScenarioSheet } from "./types";

const b = new SheetBuilder("Skerry-L Mars flyby variant: departure C3 over the 2028–2029 window");
b.section("Inputs");
const from = b.input("From", "Earth", "", undefined, "catalogue names");
const to = b.input("To", "Mars");
const firstDeparture = b.input("First departure", excelSerial(...M.firstDeparture), "date (UTC)", F.date);
const departureStep = b.input("Days between departures", M.departureStep, "days", F.integer);
const departures = b.input("Departures", M.departures, "", F.integer, "columns of the grid");
const firstFlight = b.input("Shortest flight", M.firstFlightTime, "days", F.integer);
const flightStep = b.input("Days between flight times", M.flightTimeStep, "days", F.integer);
const flights = b.input("Flight times", M.flightTimes, "", F.integer, "rows of the grid");
const hPark = b.input("Parking orbit altitude at departure", M.parkingAltitude, "km", F.integer, "assumed for the demo (invented)");
b.skip();
b.note("Each cell: the zero-revolution Lambert arc between the planets' approximate mean-element positions (the lower of the short and long way). The lowest values, shaded darkest, mark the window.");
b.section("Departure C3 (km²/s²): flight days down, departure dates across", []);

// The grid: one formula at A{top} spills the dates across row `top`, the flight days down column A.
const top = b.row;
const gridFirst = top + 1;
const gridLast = top + M.flightTimes;
const firstCol = 1; // column B
const lastCol = firstCol + M.departures - 1;
const perFlightCol = lastCol + 1;
const letter = (col: number) => columnLetters(col);
b.put(`A${top}`, `=ORBIT.TRANSFER_GRID(${from}, ${to}, ${firstDeparture}, ${departureStep}, ${departures}, ${firstFlight}, ${flightStep}, ${flights}, "c3", TRUE)`, "result");
for (let c = firstCol; c <= lastCol; c++) b.put(cellAddress(top - 1, c), "", "result", F.date);
for (let r = gridFirst; r <= gridLast; r++) {
  b.put(`A${r}`, "", "result", F.wholeDays);
  for (let c = firstCol; c <= lastCol; c++) b.put(cellAddress(r - 1, c), "", "result", F.c3);
}
const grid = `B${gridFirst}:${letter(lastCol)}${gridLast}`;
const dates = `B${top}:${letter(lastCol)}${top}`;
const flightDays = span(`A${gridFirst}`, M.flightTimes);

// Beside the grid: the lowest C3 of each flight time; under it: the lowest of each departure and its flight time.
const perFlight = letter(perFlightCol);
b.put(`${perFlight}${top}`, "Lowest per flight time", "header");
for (let r = gridFirst; r <= gridLast; r++) b.put(`${perFlight}${r}`, `=MIN(B${r}:${letter(lastCol)}${r})`, "result", F.c3);
const perDeparture = gridLast + 1;
const itsFlight = gridLast + 2;
b.put(`A${perDeparture}`, "Lowest per departure", "header");
b.put(`A${itsFlight}`, "Its flight time (days)", "header");
for (let c = firstCol; c <= lastCol; c++) {
  const l = letter(c);
  b.put(`${l}${perDeparture}`, `=MIN(${l}${gridFirst}:${l}${gridLast})`, "result", F.c3);
  b.put(`${l}${itsFlight}`, `=INDEX(${fixed(`A${gridFirst}`)}:${fixed(`A${gridLast}`)}, MATCH(${l}${perDeparture}, ${l}${gridFirst}:${l}${gridLast}, 0))`, "result", F.wholeDays);
}
b.after(itsFlight).skip();

b.section("The lowest C3 in the grid");
const lowest = b.result("Lowest C3", `=MIN(${grid})`, "km²/s²", F.c3);
const departure = b.result("Departure", `=INDEX(${dates}, 1, MATCH(${lowest}, B${perDeparture}:${letter(lastCol)}${perDeparture}, 0))`, "date (UTC)", F.date);
const flight = b.result("Flight time", `=INDEX(${flightDays}, MATCH(${lowest}, ${span(`${perFlight}${gridFirst}`, M.flightTimes)}, 0))`, "days", F.wholeDays);
const arrival = b.result("Arrival", `=${departure}+${flight}`, "date (UTC)", F.date);
const arc = b.spillRow("That arc", `=ORBIT.TRANSFER_BETWEEN(${from}, ${to}, ${departure}, ${arrival})`, ["C3 (km²/s²)", "v∞ out (km/s)", "v∞ in (km/s)", "Flight time (days)"], [F.c3, F.kms, F.kms, F.days]);
const rPark = b.result("Parking orbit radius", `=ORBIT.ALTITUDE_TO_RADIUS(${from}, ${hPark})`, "km", F.km);
const departureBurn = b.result("Departure burn from the parking orbit", `=ORBIT.DEPARTURE_DV(${from}, ${rPark}, ${offset(arc, 0, 1)})`, "km/s", F.kms);
const hohmann = b.spillRow(
  "For comparison: circular coplanar Hohmann transfer",
  `=ORBIT.PLANET_TRANSFER(${from}, ${to})`,
  ["v∞ out (km/s)", "v∞ in (km/s)", "Flight time (s)", "Phase angle (deg)", "Synodic period (s)"],
  [F.kms, F.kms, F.thousands, F.deg, F.thousands],
);
const hohmannC3 = b.result("Hohmann C3", `=ORBIT.C3_ENERGY(${hohmann})`, "km²/s²", F.c3);


export const marsWindow: ScenarioSheet = {
  id: "windows",
  title: "Transfer window grid",
  summary: `Skerry-L's Mars flyby variant (the same 24U cubesat study as the lunar baseline): launch energy C3 from Earth to Mars over ${M.departures} departures from July 2028 and flight times of ${M.firstFlightTime} to ${M.firstFlightTime + M.flightTimeStep * (M.flightTimes - 1)} days, shaded as a colour scale, with the lowest C3, its date and flight time found by formulas.`,
  sheetName: "Skerry-L Mars window",
  file: "skerry-l-mars-window.xlsx",
  cells: b.cellsInOrder(),
  widths: [40, ...Array<number>(M.departures).fill(11), 14],
  colourScale: { range: grid, ...WINDOW_SCALE },
  keyResults: [
    {
      title: "Mars flyby variant: the 2028–2029 window (zero-revolution Lambert arcs, approximate planet positions)",
      columns: ["Quantity", "Value", "Unit"],
      rows: [
        keyRow("Lowest departure C3 in the grid", lowest, 3, "km²/s²"),
        ["Departure", { cell: departure, date: true }, ""],
        keyRow("Flight time", flight, 0, "days"),
        ["Arrival at Mars", { cell: arrival, date: true }, ""],
        keyRow("v∞ out", offset(arc, 0, 1), 3, "km/s"),
        keyRow("v∞ in", offset(arc, 0, 2), 3, "km/s"),
        keyRow(`Departure burn from a ${M.parkingAltitude} km parking orbit`, departureBurn, 3, "km/s"),
        keyRow("Circular coplanar Hohmann C3, for comparison", hohmannC3, 3, "km²/s²"),
      ],
    },
    {
      title: "The window's shape: every third departure column",
      columns: ["Departure", "Lowest C3 (km²/s²)", "at flight time (days)"],
      rows: Array.from({ length: Math.ceil(M.departures / 3) }, (_, k) => {
        const l = letter(firstCol + 3 * k);
        return [{ cell: `${l}${top}`, date: true }, { cell: `${l}${perDeparture}`, digits: 2 }, { cell: `${l}${itsFlight}`, digits: 0 }];
      }),
    },
  ],
};
