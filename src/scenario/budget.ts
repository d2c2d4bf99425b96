/**
 * Sheet "Skerry-1 budget": Skerry-1 from its rideshare orbit to the sun-synchronous mission orbit,
 * five years of station keeping (the drag make-up delta-v at high solar activity, as the lifetime
 * sheet computes it) and a disposal burn, with propellant burn by burn; the trade of
 * folding the plane change into the circularisation burn; and the Skerry-1E block (the electric
 * raise and an inspection of a companion, Clohessy–Wiltshire, checked in exact two-body motion).
 */
import { fixed, keyRow, offset, SheetBuilder, span } from "./builder";
import { SKERRY_1 as S, SKERRY_1E as E, SOLAR_ACTIVITY } from "./story";
import { FORMAT as F } from "./styles";
import type { ScenarioSheet } from "./types";

const b = new SheetBuilder("Skerry-1: delta-v and propellant budget, and the Skerry-1E electric variant");

b.section("Inputs");
const body = b.input("Central body", S.body, "", undefined, "a catalogue name, or a GM in km³/s²");
const wet = b.input("Mass at separation (wet)", S.wetMass, "kg", F.oneDecimal);
const isp = b.input("Specific impulse (monopropellant thruster)", S.isp, "s", F.integer);
const hRide = b.input("Rideshare orbit altitude (circular)", S.rideshareAltitude, "km", F.integer);
const incRide = b.input("Rideshare orbit inclination", S.rideshareInclination, "deg", F.twoDecimals);
const hMission = b.input("Mission orbit altitude (sun-synchronous)", S.missionAltitude, "km", F.integer);
const ecc = b.input("Mission orbit eccentricity", 0, "", F.ecc, "0 for a circular orbit");
const years = b.input("Station-keeping duration", S.stationKeepingYears, "years", F.integer);
const dragArea = b.input("Mean drag area", S.dragArea, "m²", F.twoDecimals, "assumed for the demo (invented)");
const cd = b.input("Drag coefficient", S.dragCoefficient, "", F.twoDecimals, "common practice for a tumbling or flat-plate smallsat");
const flux = b.input("Solar flux F10.7 held over the station-keeping years", SOLAR_ACTIVITY.high, "sfu", F.integer, "high activity (common practice): the most drag, so the conservative figure for a budget");
const hDisposal = b.input("Disposal perigee altitude", S.disposalPerigee, "km", F.integer);
const margin = b.input("Delta-v margin on every manoeuvre", S.margin, "", F.wholePercent, "assumed for the demo (invented)");
const dry = b.input("Dry mass (all usable propellant gone)", S.dryMass, "kg", F.oneDecimal, "assumed for the demo (invented)");
b.skip();

b.section("Orbits");
const rRide = b.result("Rideshare orbit radius", `=ORBIT.ALTITUDE_TO_RADIUS(${body}, ${hRide})`, "km", F.km);
const rMission = b.result("Mission orbit radius", `=ORBIT.ALTITUDE_TO_RADIUS(${body}, ${hMission})`, "km", F.km);
const rDisposal = b.result("Disposal perigee radius", `=ORBIT.ALTITUDE_TO_RADIUS(${body}, ${hDisposal})`, "km", F.km);
const incSso = b.result("Sun-synchronous inclination at the mission orbit", `=ORBIT.SUN_SYNC_INCLINATION(${body}, ${rMission}, ${ecc})`, "deg", F.deg);
const turn = b.result("Plane change needed", `=ABS(${incSso}-${incRide})`, "deg", F.deg);
const vMission = b.result("Circular speed in the mission orbit", `=ORBIT.ORBITAL_SPEED(${body}, ${rMission})`, "km/s", F.kms);
const period = b.result("Mission orbit period", `=ORBIT.PERIOD_FROM_SMA(${body}, ${rMission})`, "s", F.seconds);
b.result("Mission orbit period", `=ORBIT.CONVERT_UNIT(${period}, "s", "min")`, "min", F.minutes);
const ballistic = b.result("Ballistic coefficient m / (C_D A)", `=ORBIT.BALLISTIC_COEFFICIENT(${wet}, ${dragArea}, ${cd})`, "kg/m²", F.twoDecimals);
const skSeconds = b.result("Station-keeping duration", `=ORBIT.CONVERT_UNIT(${years}, "yr", "s")`, "s", F.thousands);
const disposal = b.spillRow("Disposal ellipse: perigee lowered, apogee at the mission orbit", `=ORBIT.SHAPE_FROM_APSES(${rDisposal}, ${rMission})`, ["Semi-major axis (km)", "Eccentricity"], [F.km, F.ecc]);
const vApogee = b.result("Speed at the disposal ellipse's apogee", `=ORBIT.ORBITAL_SPEED(${body}, ${rMission}, ${disposal})`, "km/s", F.kms);
b.skip();

b.section("Budget", []);
b.headings(["Manoeuvre", "Delta-v (km/s)", "With margin (km/s)", "Isp (s)", "Mass before (kg)", "Propellant (kg)", "Mass after (kg)", "With margin (m/s)"]);
const BURNS: readonly (readonly [string, string])[] = [
  ["Raise to the mission orbit (Hohmann, two burns)", `=ORBIT.TRANSFER_DV(${body}, ${rRide}, ${rMission})`],
  ["Plane change to sun-synchronous, at the mission orbit", `=ORBIT.PLANE_CHANGE_DV(${vMission}, ${turn})`],
  ["Station keeping: drag make-up at the mission orbit (Earth only)", `=ORBIT.DRAG_MAKEUP_DV(${hMission}, ${ballistic}, ${skSeconds}, ${flux})`],
  ["Disposal: lower the perigee", `=${vMission}-${vApogee}`],
];
const first = b.row;
const count = BURNS.length;
const last = first + count - 1;
BURNS.forEach(([label, formula], i) => {
  const r = first + i;
  b.put(`A${r}`, label, "label");
  b.put(`B${r}`, formula, "result", F.kms);
  b.put(`C${r}`, `=B${r}*(1+${fixed(margin)})`, "result", F.kms);
  b.put(`D${r}`, `=${fixed(isp)}`, "result", F.integer);
});
b.spill(`E${first}`, `=ORBIT.BURN_SEQUENCE(${span(`C${first}`, count)}, ${span(`D${first}`, count)}, ${wet}, ${dry})`, [F.kg, F.kg, F.kg], count);
b.spill(`H${first}`, `=ORBIT.CONVERT_UNIT(${span(`C${first}`, count)}, "km/s", "m/s")`, [F.ms], count);
b.after(last);
const stationKeeping = `B${first + BURNS.findIndex(([label]) => label.startsWith("Station keeping"))}`;
const total = b.row;
b.put(`A${total}`, "Total", "header");
const dvTotal = b.put(`B${total}`, `=SUM(${span(`B${first}`, count)})`, "result", F.kms);
const dvWithMargin = b.put(`C${total}`, `=SUM(${span(`C${first}`, count)})`, "result", F.kms);
const propellant = b.put(`F${total}`, `=SUM(${span(`F${first}`, count)})`, "result", F.kg);
const msTotal = b.put(`H${total}`, `=SUM(${span(`H${first}`, count)})`, "result", F.ms);
b.after(total);
const finalMass = `G${last}`;
b.result("Check: the rocket equation over the budget (= total with margin)", `=ORBIT.ROCKET_DV(${isp}, ${wet}, ${finalMass})`, "km/s", F.kms);
const leftOver = b.result("Propellant left above the dry mass at the end", `=${finalMass}-${dry}`, "kg", F.kg);
b.skip();

b.section("Trade: turn the plane during the circularisation burn", []);
const transfer = b.spillRow("Hohmann transfer from the rideshare orbit", `=ORBIT.TRANSFER_BURNS(${body}, ${rRide}, ${rMission})`, ["Burn 1 (km/s)", "Burn 2 (km/s)", "Burn 3 (km/s)", "Total (km/s)", "Flight time (s)"], [F.kms, F.kms, F.kms, F.kms, F.seconds]);
const burn2 = offset(transfer, 0, 1);
const vTransferApogee = b.result("Speed at the transfer's apogee", `=${vMission}-${burn2}`, "km/s", F.kms);
const combined = b.result("Circularise and turn the plane in one burn", `=ORBIT.COMBINED_PLANE_CHANGE_DV(${vTransferApogee}, ${vMission}, ${turn})`, "km/s", F.kms);
const saving = b.result("Saving against two separate burns", `=${burn2}+B${first + 1}-${combined}`, "km/s", F.kms);
const savingMs = b.result("Saving against two separate burns", `=ORBIT.CONVERT_UNIT(${saving}, "km/s", "m/s")`, "m/s", F.ms);
b.skip();

// Skerry-1E: the same bus with a 20 mN electric thruster.
b.section("Proximity and electric propulsion (Skerry-1E)");
const eMass = b.result("Wet mass (the same bus)", `=${wet}`, "kg", F.oneDecimal);
const thrust = b.input("Electric thruster's thrust", E.thrust, "N", F.thrust, "20 mN");
const eIsp = b.input("Electric thruster's specific impulse", E.isp, "s", F.integer);
const lowDv = b.result("Electric raise with the plane change (Edelbaum)", `=ORBIT.LOW_THRUST_DV(${body}, ${rRide}, ${rMission}, ${turn})`, "km/s", F.kms);
const firing = b.result("Firing time", `=ORBIT.LOW_THRUST_TIME(${lowDv}, ${thrust}, ${eMass}, ${eIsp})`, "s", F.thousands);
const firingDays = b.result("Firing time", `=ORBIT.CONVERT_UNIT(${firing}, "s", "day")`, "days", F.days, "firing only: eclipses and the duty cycle lengthen it");
const raiseMasses = b.spillRow("Electric raise: masses", `=ORBIT.BURN_SEQUENCE(${lowDv}, ${eIsp}, ${eMass})`, ["Mass before (kg)", "Propellant (kg)", "Mass after (kg)"], [F.kg, F.kg, F.kg]);
const raisePropellant = offset(raiseMasses, 0, 1);
const massAfterRaise = offset(raiseMasses, 0, 2);
b.result("For comparison: impulsive raise and plane change", `=B${first}+B${first + 1}`, "km/s", F.kms);
b.skip();

b.section("Inspection of a companion (Clohessy–Wiltshire)");
const below = b.input("Start: below the companion", E.below, "km", F.kmNear, "invented; the relative motion is first-order (linear)");
const behind = b.input("Start: behind the companion", E.behind, "km", F.kmNear);
const cross = b.input("Start: cross-track offset", E.crossTrack, "km", F.kmNear);
const hold = b.input("Hold point: behind the companion", E.hold, "km", F.kmNear);
const transferTime = b.input("Transfer time from burn 1 to burn 2", E.transferTime, "s", F.thousands);
const REL = ["x radial (km)", "y along-track (km)", "z cross-track (km)", "vx radial (km/s)", "vy along-track (km/s)", "vz cross-track (km/s)"];
const REL_FORMATS = [F.kmNear, F.kmNear, F.kmNear, F.kmsNear, F.kmsNear, F.kmsNear];
b.headings(["Relative states, companion's local frame", ...REL]);
// A chaser on its own circular orbit `below` km under the companion drifts ahead at 1.5 n below (n = 2π / period).
const start = b.cellsRow("Start, on its own circular orbit", [
  [`=-${below}`, "result", F.kmNear],
  [`=-${behind}`, "result", F.kmNear],
  [`=${cross}`, "result", F.kmNear],
  ["=0", "result", F.kmsNear],
  [`=1.5*2*PI()/${period}*${below}`, "result", F.kmsNear],
  ["=0", "result", F.kmsNear],
]);
const startState = `${start[0]}:${start[5]}`;
const holdPoint = b.cellsRow("Hold point", [
  ["=0", "result", F.kmNear],
  [`=-${hold}`, "result", F.kmNear],
  ["=0", "result", F.kmNear],
]);
const coast = b.row;
b.put(`A${coast}`, "Coast without burns, after the transfer time", "label");
b.spill(`B${coast}`, `=ORBIT.RELATIVE_STATE_AT_TIME(${body}, ${rMission}, ${startState}, ${transferTime})`, REL_FORMATS);
b.after(coast);
const rendezvous = b.spillRow(
  "Two burns to the hold point",
  `=ORBIT.RELATIVE_RENDEZVOUS(${body}, ${rMission}, ${startState}, ${holdPoint[0]}:${holdPoint[2]}, ${transferTime})`,
  ["Burn 1 radial (km/s)", "Burn 1 along-track (km/s)", "Burn 1 cross-track (km/s)", "Burn 2 radial (km/s)", "Burn 2 along-track (km/s)", "Burn 2 cross-track (km/s)", "Burn 1 size (km/s)", "Burn 2 size (km/s)", "Total (km/s)"],
  Array(9).fill(F.kmsNear),
);
const burn1Size = offset(rendezvous, 0, 6);
const burn2Size = offset(rendezvous, 0, 7);
const approach = offset(rendezvous, 0, 8);
const approachMs = b.result("Approach delta-v", `=ORBIT.CONVERT_UNIT(${approach}, "km/s", "m/s")`, "m/s", F.msFine);
const burn1Firing = b.result("Burn 1 on the electric thruster: firing time", `=ORBIT.LOW_THRUST_TIME(${burn1Size}, ${thrust}, ${massAfterRaise}, ${eIsp})`, "s", F.thousands);
const burn2Firing = b.result("Burn 2 on the electric thruster: firing time", `=ORBIT.LOW_THRUST_TIME(${burn2Size}, ${thrust}, ${massAfterRaise}, ${eIsp})`, "s", F.thousands);
b.result(
  "Can the electric thruster fly these burns as impulses?",
  `=IF(MAX(${burn1Firing}, ${burn2Firing})>${transferTime}, "No: each firing is longer than the transfer. Use the monopropellant thruster, or plan a longer transfer.", "Yes: both firings are shorter than the transfer.")`,
  "",
);
const approachMasses = b.spillRow("Approach on the monopropellant thruster: masses", `=ORBIT.BURN_SEQUENCE(${approach}, ${isp}, ${massAfterRaise})`, ["Mass before (kg)", "Propellant (kg)", "Mass after (kg)"], [F.kg, F.kg, F.kg]);
b.skip();

// The check: fly burn 1 in exact two-body motion and see where the chaser is after the transfer time.
b.section("Check of the linear theory in exact two-body motion", []);
b.headings(["Companion's orbit", "Semi-major axis (km)", "Eccentricity", "Inclination (deg)", "RAAN (deg)", "Argument of periapsis (deg)", "True anomaly (deg)"]);
const elements = b.cellsRow("Circular: true anomaly from a periapsis at the node", [
  [`=${rMission}`, "result", F.km],
  [`=${ecc}`, "result", F.ecc],
  [`=${incSso}`, "result", F.deg],
  [E.companionRaan, "input", F.oneDecimal],
  [0, "input", F.oneDecimal],
  [E.companionArgumentOfLatitude, "input", F.oneDecimal],
]);
const STATE = ["x (km)", "y (km)", "z (km)", "vx (km/s)", "vy (km/s)", "vz (km/s)"];
const STATE_FORMATS = [F.km, F.km, F.km, F.kms, F.kms, F.kms];
b.headings(["State vectors, inertial", ...STATE]);
const sixFrom = (ref: string) => span(ref, 6, true);
const companion = b.row;
b.put(`A${companion}`, "Companion at burn 1", "label");
b.spill(`B${companion}`, `=ORBIT.STATE_FROM_ELEMENTS(${body}, ${elements.join(", ")})`, STATE_FORMATS);
b.after(companion);
const afterBurn = b.cellsRow("Chaser just after burn 1, relative (companion's local frame)", [
  [`=${start[0]}`, "result", F.kmNear],
  [`=${start[1]}`, "result", F.kmNear],
  [`=${start[2]}`, "result", F.kmNear],
  [`=${start[3]}+${rendezvous}`, "result", F.kmsNear],
  [`=${start[4]}+${offset(rendezvous, 0, 1)}`, "result", F.kmsNear],
  [`=${start[5]}+${offset(rendezvous, 0, 2)}`, "result", F.kmsNear],
]);
const chaser = b.row;
b.put(`A${chaser}`, "Chaser just after burn 1", "label");
b.spill(`B${chaser}`, `=ORBIT.CHASER_STATE(${body}, ${sixFrom(`B${companion}`)}, ${afterBurn[0]}:${afterBurn[5]})`, STATE_FORMATS);
b.after(chaser);
const companionLater = b.row;
b.put(`A${companionLater}`, "Companion after the transfer time", "label");
b.spill(`B${companionLater}`, `=ORBIT.PROPAGATE_STATE(${body}, ${sixFrom(`B${companion}`)}, ${transferTime})`, STATE_FORMATS);
b.after(companionLater);
const chaserLater = b.row;
b.put(`A${chaserLater}`, "Chaser after the transfer time", "label");
b.spill(`B${chaserLater}`, `=ORBIT.PROPAGATE_STATE(${body}, ${sixFrom(`B${chaser}`)}, ${transferTime})`, STATE_FORMATS);
b.after(chaserLater);
const arrival = b.row;
b.put(`A${arrival}`, "Chaser on arrival, relative (companion's local frame)", "label");
b.spill(`B${arrival}`, `=ORBIT.RELATIVE_STATE(${body}, ${sixFrom(`B${companionLater}`)}, ${sixFrom(`B${chaserLater}`)})`, REL_FORMATS);
b.after(arrival);
const [hx, hy, hz] = holdPoint;
const miss = b.result(
  "Miss of the hold point in exact two-body motion",
  `=1000*SQRT((B${arrival}-${hx})^2+(C${arrival}-${hy})^2+(D${arrival}-${hz})^2)`,
  "m",
  F.m,
  "grows with the square of the separation",
);
b.skip();

b.section("Skerry-1E in short");
const sRaise = b.result("Electric raise delta-v", `=ORBIT.CONVERT_UNIT(${lowDv}, "km/s", "m/s")`, "m/s", F.ms);
const sDays = b.result("Electric raise firing time", `=${firingDays}`, "days", F.days);
const sProp = b.result("Electric raise propellant", `=${raisePropellant}`, "kg", F.kg);
const sApproach = b.result("Approach delta-v", `=${approachMs}`, "m/s", F.msFine);
const sBurn1 = b.result("Burn 1's electric firing time over the transfer time", `=${burn1Firing}/${transferTime}`, "", F.twoDecimals, "above 1: too long to count as an impulse");
const sMiss = b.result("Miss in exact two-body motion", `=${miss}`, "m", F.m);


export const budget: ScenarioSheet = {
  id: "budget",
  title: "Delta-v and propellant budget",
  summary:
    "Skerry-1 from its 520 km rideshare orbit at 97.4° to 690 km sun-synchronous, five years of station keeping against drag at high solar activity and a 250 km disposal perigee, propellant burn by burn; then Skerry-1E, the electric variant: its raise and an inspection of a companion.",
  sheetName: "Skerry-1 budget",
  file: "skerry-budget.xlsx",
  cells: b.cellsInOrder(),
  widths: [58, 16, 16, 16, 16, 16, 16, 16, 16, 16],
  keyResults: [
    {
      title: `Skerry-1 budget (${S.wetMass} kg, Isp ${S.isp} s): ${S.rideshareAltitude} km at ${S.rideshareInclination} deg to ${S.missionAltitude} km sun-synchronous, ${S.stationKeepingYears} years, disposal perigee ${S.disposalPerigee} km, ${S.margin * 100}% margin`,
      columns: ["Manoeuvre", "Delta-v with margin (m/s)", "Propellant (kg)", "Mass after (kg)"],
      rows: [
        ...BURNS.map(([label], i) => [label, { cell: `H${first + i}`, digits: 1 }, { cell: `F${first + i}`, digits: 2 }, { cell: `G${first + i}`, digits: 2 }]),
        ["Total", { cell: msTotal, digits: 1 }, { cell: propellant, digits: 2 }, ""],
      ],
    },
    {
      title: "Skerry-1 orbits and trade",
      columns: ["Quantity", "Value", "Unit"],
      rows: [
        keyRow(`Sun-synchronous inclination at ${S.missionAltitude} km`, incSso, 4, "deg"),
        keyRow("Plane change needed from the rideshare orbit", turn, 4, "deg"),
        keyRow(`Ballistic coefficient (${S.dragArea} m², C_D ${S.dragCoefficient})`, ballistic, 2, "kg/m²"),
        keyRow(`Station keeping: drag make-up over ${S.stationKeepingYears} years at ${SOLAR_ACTIVITY.high} sfu, without margin`, stationKeeping, 5, "km/s"),
        keyRow("Delta-v without margin", dvTotal, 5, "km/s"),
        keyRow("Delta-v with margin", dvWithMargin, 5, "km/s"),
        keyRow("Propellant left above the dry mass", leftOver, 2, "kg"),
        keyRow("Saving if the plane change rides on the circularisation burn", savingMs, 1, "m/s"),
      ],
    },
    {
      title: `Skerry-1E: ${E.thrust * 1000} mN at Isp ${E.isp} s, and the inspection of a companion at 690 km (first-order)`,
      columns: ["Quantity", "Value", "Unit"],
      rows: [
        keyRow("Electric raise delta-v", sRaise, 1, "m/s"),
        keyRow("Electric raise firing time", sDays, 2, "days"),
        keyRow("Electric raise propellant", sProp, 3, "kg"),
        keyRow("Approach delta-v (two burns)", sApproach, 3, "m/s"),
        keyRow("Burn 1's electric firing time over the transfer time", sBurn1, 2, ""),
        keyRow("Approach propellant on the monopropellant thruster", offset(approachMasses, 0, 1), 4, "kg"),
        keyRow("Miss of the hold point in exact two-body motion", sMiss, 2, "m"),
      ],
    },
  ],
};

/** Cells other code reads by meaning (tests, the pane's first-run check). */
export const BUDGET_CELLS = { propellant, dvWithMargin, leftOver, lowDv, approach, miss, ballistic, stationKeeping } as const;
