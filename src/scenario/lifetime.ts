/**
 * Sheet "Skerry-1 lifetime": how long Skerry-1 stays up under drag, in its 690 km mission orbit
 * and after the disposal burn to a 250 km perigee, at low, moderate and high solar activity side
 * by side (the spread is the point: nobody knows the years ahead well); the decay rate and the
 * drag make-up delta-v of the mission years (the budget sheet carries the high-activity figure);
 * and the disposal perigee that meets a 5-year and a 25-year limit. Earth only. Each level is one
 * F10.7 held over the years (ORBIT_LIFETIME also takes a pasted forecast of monthly values; the
 * sheet leaves it out because the first run of one builds several more density profiles).
 */
import { keyRow, SheetBuilder } from "./builder";
import { DISPOSAL_LIMITS as LIMITS, excelSerial, isoDate, SKERRY_1 as S, SOLAR_ACTIVITY as A } from "./story";
import { FORMAT as F } from "./styles";
import type { ScenarioSheet } from "./types";

const b = new SheetBuilder("Skerry-1 lifetime and disposal: decay under drag at low, moderate and high solar activity (Earth only)");

b.section("Inputs");
const mass = b.input("Mass", S.wetMass, "kg", F.oneDecimal, "the wet mass: lighter at the end of life, it comes down sooner, so these lifetimes err long");
const area = b.input("Mean drag area", S.dragArea, "m²", F.twoDecimals, "assumed for the demo (invented): the mean a tumbling body presents");
const cd = b.input("Drag coefficient", S.dragCoefficient, "", F.twoDecimals, "common practice for a tumbling or flat-plate smallsat (real values about 2 to 2.6)");
const hMission = b.input("Mission orbit altitude (circular)", S.missionAltitude, "km", F.integer);
const hPerigee = b.input("Disposal perigee altitude", S.disposalPerigee, "km", F.integer, "the disposal burn lowers the perigee; the apogee stays at the mission altitude");
const years = b.input("Mission duration (station keeping)", S.stationKeepingYears, "years", F.integer);
const endOfMission = b.input("End of mission", excelSerial(...S.endOfMission), "date (UTC)", F.date, "invented; the lifetimes start here");
const model = b.input("Density model", "nrlmsise-00", "", undefined, 'or "exponential" (Vallado\'s static table, no solar dependence)');
const strict = b.input("Strict disposal limit", LIMITS.strictYears, "years", F.integer, "the 5-year rule (sources below)");
const guideline = b.input("Disposal guideline", LIMITS.guidelineYears, "years", F.integer, "the 25-year guideline (sources below)");
b.skip();

b.section("Derived");
const ballistic = b.result("Ballistic coefficient m / (C_D A)", `=ORBIT.BALLISTIC_COEFFICIENT(${mass}, ${area}, ${cd})`, "kg/m²", F.twoDecimals, "some texts use the inverse, C_D A / m");
const seconds = b.result("Mission duration", `=ORBIT.CONVERT_UNIT(${years}, "yr", "s")`, "s", F.thousands);
const strictDays = b.result("Strict disposal limit", `=ORBIT.CONVERT_UNIT(${strict}, "yr", "day")`, "days", F.days);
const guidelineDays = b.result("Disposal guideline", `=ORBIT.CONVERT_UNIT(${guideline}, "yr", "day")`, "days", F.days);
b.skip();

// Three columns of solar activity: B low, C moderate, D high; the unit in E, a note in F.
const LEVELS = [A.low, A.moderate, A.high] as const;
const COLUMNS = ["B", "C", "D"] as const;
b.section("At three levels of solar activity", ["Low", "Moderate", "High", "Unit", "Note"]);

/** A row across the three levels: one formula spilling over them (text), or one formula per level. */
function across(label: string, content: string | ((col: string) => string), format: string | undefined, unit: string, note?: string): string[] {
  const r = b.row;
  b.put(`A${r}`, label, "label");
  const refs = COLUMNS.map((c) => `${c}${r}`);
  if (typeof content === "string") b.spill(refs[0], content, [format ?? "", format ?? "", format ?? ""]);
  else COLUMNS.forEach((c, j) => b.put(refs[j], content(c), "result", format));
  if (unit) b.put(`E${r}`, unit, "unit");
  if (note) b.put(`F${r}`, note, "note");
  b.after(r);
  return refs;
}

const fluxRow = b.row;
b.put(`A${fluxRow}`, "Solar flux F10.7 held over the years", "label");
COLUMNS.forEach((c, j) => b.put(`${c}${fluxRow}`, LEVELS[j], "input", F.integer));
b.put(`E${fluxRow}`, "sfu", "unit");
b.put(`F${fluxRow}`, "common practice: solar minimum, moderate activity, solar maximum", "note");
b.after(fluxRow);
const flux = `B${fluxRow}:D${fluxRow}`;
const at = (refs: readonly string[], col: string) => refs[COLUMNS.indexOf(col as (typeof COLUMNS)[number])];
const fluxOf = (col: string) => `${col}${fluxRow}`;

const decay = across("Decay rate in the mission orbit now", `=ORBIT.DECAY_RATE(${hMission}, ${ballistic}, ${flux}, , ${model})`, F.kmPerDay, "km/day", "it grows as the orbit sinks: altitude ÷ rate is not the lifetime");

// Past the integration's 200-year cap ORBIT_LIFETIME answers #N/A: here that is an answer, "over
// 200 years", not a fault. Its other #N/A answers for a circular orbit (an altitude above the
// density models' range, a flux outside theirs, an altitude typed as a radius) are the decay
// rate's too, for the same altitude and flux: so the words stand only where the decay rate is a
// number, and elsewhere the decay rate's error shows.
const PAST_CAP = "over 200 years";
const missionDays = across(
  "Lifetime in the mission orbit",
  (c) => `=IFNA(ORBIT.ORBIT_LIFETIME(${hMission}, ${hMission}, ${ballistic}, ${fluxOf(c)}, ${endOfMission}, ${model}), IF(ISNUMBER(${at(decay, c)}), "${PAST_CAP}", ${at(decay, c)}))`,
  F.thousands,
  "days",
  "past the integration's 200-year cap at low activity",
);
const missionYears = across("Lifetime in the mission orbit", (c) => `=IF(ISTEXT(${at(missionDays, c)}), "${PAST_CAP}", ${at(missionDays, c)}/365.25)`, F.oneDecimal, "years", "Julian years of 365.25 days");
const disposalDays = across(
  `Lifetime after the disposal burn (${S.disposalPerigee} × ${S.missionAltitude} km)`,
  `=ORBIT.ORBIT_LIFETIME(${hPerigee}, ${hMission}, ${ballistic}, ${flux}, ${endOfMission}, ${model})`,
  F.oneDecimal,
  "days",
);
const makeupKms = across("Drag make-up delta-v over the mission years", `=ORBIT.DRAG_MAKEUP_DV(${hMission}, ${ballistic}, ${seconds}, ${flux}, , ${model})`, F.kms, "km/s");
const makeup = across("Drag make-up delta-v over the mission years", `=ORBIT.CONVERT_UNIT(${makeupKms[0]}:${makeupKms[2]}, "km/s", "m/s")`, F.twoDecimals, "m/s", "before any margin");
const strictPerigee = across(
  "Highest disposal perigee for the 5-year rule",
  `=ORBIT.DISPOSAL_PERIGEE(${hMission}, ${ballistic}, ${strictDays}, ${flux}, ${endOfMission}, ${model})`,
  F.oneDecimal,
  "km",
  "choose lower as margin",
);
const guidelinePerigee = across(
  "Highest disposal perigee for the 25-year guideline",
  `=ORBIT.DISPOSAL_PERIGEE(${hMission}, ${ballistic}, ${guidelineDays}, ${flux}, ${endOfMission}, ${model})`,
  F.oneDecimal,
  "km",
  "the mission altitude itself: the circular mission orbit already comes down in time",
);
const meetsStrict = across(`Does the planned ${S.disposalPerigee} km perigee meet the 5-year rule?`, (c) => `=IF(${hPerigee}<=${at(strictPerigee, c)}, "yes", "no")`, undefined, "");
const meetsGuideline = across(`Does the planned ${S.disposalPerigee} km perigee meet the 25-year guideline?`, (c) => `=IF(${hPerigee}<=${at(guidelinePerigee, c)}, "yes", "no")`, undefined, "");
const missionComplies = across("Does the mission orbit itself meet the 25-year guideline?", (c) => `=IF(${at(guidelinePerigee, c)}>=${hMission}, "yes", "no")`, undefined, "");
// Under the high column, whose figure it is.
const carriedRow = b.row;
b.put(`A${carriedRow}`, "Drag make-up to carry into the budget (high activity, conservative)", "label");
const carried = b.put(`D${carriedRow}`, `=${makeup[2]}`, "result", F.twoDecimals);
b.put(`E${carriedRow}`, "m/s", "unit");
b.put(`F${carriedRow}`, "the budget sheet computes this line from its own inputs", "note");
b.after(carriedRow);
b.skip();

b.section("Rules and cautions", []);
b.note(
  "25-year guideline: IADC Space Debris Mitigation Guidelines, IADC-02-01 (Rev. 1, 2007; later revisions exist, from memory), also in ISO 24113 (from memory); counted from the end of the mission.",
);
b.note(
  "5-year rule: U.S. FCC Second Report and Order FCC 22-74 (IB Docket 22-271, 2022; effective 9 September 2024, 89 FR 65217): satellites licensed by or seeking market access to the FCC that end their missions in or pass through low Earth orbit below 2,000 km and re-enter uncontrolled, no later than five years after the end of the mission.",
);
b.note("Lifetimes are uncertain by tens of percent, and more, because the solar activity of the years ahead is: read the three columns as the spread, not one of them as the answer.");
b.note("Not a re-entry prediction. Compliance is decided by the licensing authority's own analysis, not by these estimates.");
b.note("Earth only: two-body motion plus drag (NRLMSISE-00's global mean at daily Ap 15), no Sun, Moon or oblateness; the lifetime ends when the perigee falls to 100 km.");

const level = (name: string, flux: number) => `${name} (${flux} sfu)`;
const across3 = (label: string, refs: readonly string[], digits: number, unit: string) => [label, ...refs.map((cell) => ({ cell, digits })), unit] as const;

export const lifetime: ScenarioSheet = {
  id: "lifetime",
  title: "Lifetime and disposal",
  summary: `Skerry-1's orbital lifetime in its ${S.missionAltitude} km mission orbit and after the disposal burn to a ${S.disposalPerigee} km perigee, at low, moderate and high solar activity side by side; the decay rate, the drag make-up delta-v of the mission years, and the disposal perigee for a 5-year and a 25-year limit. Earth only.`,
  sheetName: "Skerry-1 lifetime",
  file: "skerry-lifetime.xlsx",
  cells: b.cellsInOrder(),
  widths: [58, 14, 14, 14, 10, 16],
  keyResults: [
    {
      title: `Skerry-1 lifetime and disposal (${S.wetMass} kg, ${S.dragArea} m², C_D ${S.dragCoefficient}; from ${isoDate(S.endOfMission)}, NRLMSISE-00 global mean)`,
      columns: ["Quantity", level("Low", A.low), level("Moderate", A.moderate), level("High", A.high), "Unit"],
      rows: [
        across3(`Lifetime in the ${S.missionAltitude} km mission orbit`, missionYears, 1, "years"),
        across3(`Lifetime after the disposal burn (${S.disposalPerigee} × ${S.missionAltitude} km)`, disposalDays, 1, "days"),
        across3(`Decay rate at ${S.missionAltitude} km`, decay, 6, "km/day"),
        across3(`Drag make-up over ${S.stationKeepingYears} years`, makeup, 2, "m/s"),
        across3("Highest disposal perigee, 5-year rule", strictPerigee, 1, "km"),
        across3("Highest disposal perigee, 25-year guideline", guidelinePerigee, 1, "km"),
        across3(`${S.disposalPerigee} km perigee meets the 5-year rule`, meetsStrict, 0, ""),
        across3(`${S.disposalPerigee} km perigee meets the 25-year guideline`, meetsGuideline, 0, ""),
        across3("Mission orbit itself meets the 25-year guideline", missionComplies, 0, ""),
      ],
    },
    {
      title: "Skerry-1 drag inputs and the budget's station-keeping line",
      columns: ["Quantity", "Value", "Unit"],
      rows: [
        keyRow("Ballistic coefficient m / (C_D A)", ballistic, 2, "kg/m²"),
        keyRow("Drag make-up carried into the budget (high activity)", carried, 2, "m/s"),
      ],
    },
  ],
};

/** Cells other code reads by meaning (tests). */
export const LIFETIME_CELLS = {
  missionAltitude: hMission,
  endOfMission,
  ballistic,
  flux,
  missionDays,
  missionYears,
  disposalDays,
  decay,
  makeupKms,
  makeup,
  strictPerigee,
  guidelinePerigee,
  meetsStrict,
  carried,
  fluxCells: COLUMNS.map((c) => `${c}${fluxRow}`),
} as const;
