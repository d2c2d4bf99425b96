/**
 * Sheet "Skerry-L lunar orbit": the baseline of the Skerry-L study, a 24U cubesat carried to
 * translunar injection by its rideshare, then corrections and capture into a 100 km lunar orbit
 * on its own propellant (patched conics, coplanar). Its Mars flyby variant is the window sheet.
 */
import { keyRow, offset, SheetBuilder } from "./builder";
import { SKERRY_L as L } from "./story";
import { FORMAT as F } from "./styles";
import type { ScenarioSheet } from "./types";

const b = new SheetBuilder("Skerry-L: a 24U cubesat to a 100 km lunar orbit (the study's baseline)");
b.section("Inputs");
const earth = b.input("Departure body", "Earth", "", undefined, "catalogue names");
const moon = b.input("Destination", "Moon");
const wet = b.input("Wet mass (24U cubesat)", L.wetMass, "kg", F.oneDecimal, "assumed for the demo (invented)");
const isp = b.input("Specific impulse", L.isp, "s", F.integer);
const hLunar = b.input("Lunar orbit altitude (circular)", L.lunarAltitude, "km", F.integer);
const hPark = b.input("Parking orbit altitude before translunar injection", L.parkingAltitude, "km", F.integer, "the rideshare's upper stage flies the injection (invented)");
const corrections = b.input("Trajectory corrections", L.corrections, "m/s", F.oneDecimal, "assumed for the demo (invented)");
b.skip();

b.section("Trajectory (patched conics, coplanar)");
const rPark = b.result("Parking orbit radius", `=ORBIT.ALTITUDE_TO_RADIUS(${earth}, ${hPark})`, "km", F.km);
const moonDistance = b.result("Moon's distance (catalogue semi-major axis)", `=ORBIT.BODY_VALUE(${moon}, "sma")`, "km", F.radius);
const arc = b.spillRow("Hohmann arc to the Moon's distance", `=ORBIT.TRANSFER_BURNS(${earth}, ${rPark}, ${moonDistance})`, ["Burn 1 (km/s)", "Burn 2 (km/s)", "Burn 3 (km/s)", "Total (km/s)", "Flight time (s)"], [F.kms, F.kms, F.kms, F.kms, F.seconds]);
const vInfinity = b.result("Excess speed at the Moon (burn 2: the Moon's circular speed minus the arc's apogee speed)", `=${offset(arc, 0, 1)}`, "km/s", F.kms);
const flightDays = b.result("Flight time to the Moon", `=ORBIT.CONVERT_UNIT(${offset(arc, 0, 4)}, "s", "day")`, "days", F.days);
const rLunar = b.result("Lunar orbit radius", `=ORBIT.ALTITUDE_TO_RADIUS(${moon}, ${hLunar})`, "km", F.km);
const capture = b.result("Lunar orbit insertion (one periapsis burn into the circular orbit)", `=ORBIT.CAPTURE_DV(${moon}, ${rLunar}, ${vInfinity})`, "km/s", F.kms);
const captureMs = b.result("Lunar orbit insertion", `=ORBIT.CONVERT_UNIT(${capture}, "km/s", "m/s")`, "m/s", F.ms);
const period = b.result("Lunar orbit period", `=ORBIT.PERIOD_FROM_SMA(${moon}, ${rLunar})`, "s", F.seconds);
const periodMin = b.result("Lunar orbit period", `=ORBIT.CONVERT_UNIT(${period}, "s", "min")`, "min", F.oneDecimal);
b.result("Moon's sphere of influence radius", `=ORBIT.SOI_RADIUS(${moon})`, "km", F.thousands);
b.skip();

b.section("Budget (the cubesat's own propellant)", []);
b.headings(["Burn", "Delta-v (km/s)", "Isp (s)", "Mass before (kg)", "Propellant (kg)", "Mass after (kg)"]);
const first = b.row;
b.cellsRow("Trajectory corrections", [
  [`=${corrections}/1000`, "result", F.kms],
  [`=${isp}`, "result", F.integer],
]);
b.cellsRow("Lunar orbit insertion", [
  [`=${capture}`, "result", F.kms],
  [`=${isp}`, "result", F.integer],
]);
b.spill(`D${first}`, `=ORBIT.BURN_SEQUENCE(B${first}:B${first + 1}, C${first}:C${first + 1}, ${wet})`, [F.kg, F.kg, F.kg], 2);
const propellant = b.result("Propellant needed", `=SUM(E${first}:E${first + 1})`, "kg", F.kg);
const fraction = b.result("Propellant fraction of the wet mass", `=${propellant}/${wet}`, "", F.percent);
b.skip();
b.note("The same study's Mars flyby variant: the sheet \"Skerry-L Mars window\" (Sheet templates: Transfer window grid).");


export const lunar: ScenarioSheet = {
  id: "lunar",
  title: "Lunar transfer and capture",
  summary: `Skerry-L, a 24U cubesat study (Isp ${L.isp} s): the Hohmann arc to the Moon's distance, capture into a ${L.lunarAltitude} km lunar orbit and the propellant that takes from its ${L.wetMass} kg. The study's Mars flyby variant is the transfer window grid.`,
  sheetName: "Skerry-L lunar orbit",
  file: "skerry-l-lunar.xlsx",
  cells: b.cellsInOrder(),
  widths: [64, 16, 14, 16, 16, 16],
  keyResults: [
    {
      title: `Skerry-L (24U cubesat, Isp ${L.isp} s) to a ${L.lunarAltitude} km lunar orbit`,
      columns: ["Quantity", "Value", "Unit"],
      rows: [
        keyRow("Excess speed arriving at the Moon", vInfinity, 4, "km/s"),
        keyRow("Flight time on the Hohmann arc", flightDays, 2, "days"),
        keyRow("Lunar orbit insertion", captureMs, 1, "m/s"),
        keyRow("Propellant needed (with corrections)", propellant, 2, "kg"),
        keyRow("Propellant fraction of the wet mass", fraction, 4, ""),
        keyRow("Lunar orbit period", periodMin, 1, "min"),
      ],
    },
  ],
};
