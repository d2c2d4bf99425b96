import { describe, expect, it } from "vitest";
import { parseCell } from "../../src/formula/cells";
import { layoutSheet, SCENARIO } from "../../src/scenario";
import { BUDGET_CELLS } from "../../src/scenario/budget";
import { LIFETIME_CELLS } from "../../src/scenario/lifetime";
import { SKERRY_1, SKERRY_1E, SOLAR_ACTIVITY } from "../../src/scenario/story";
import { builtBundle, recalcSheet, type RecalculatedSheet } from "../support/scenario";

// The Skerry-1 budget sheet, recalculated by the runner's engine with the built functions,
// against the same quantities worked out here from the textbook formulas, each with its source.
// GM is the catalogue's (read through the bundle), so the checks test the sheet's wiring and
// the formulas, not the constant.

const t = SCENARIO.find((s) => s.id === "budget")!;
const G0 = 9.80665; // m/s², standard gravity (exact by definition, CGPM 1901)
const gm = (builtBundle().functions.get("BODY_GM")!([["Earth"]]) as number[][])[0][0];
const radiusOf = (altitude: number) => (builtBundle().functions.get("ALTITUDE_TO_RADIUS")!([["Earth"]], [[altitude]]) as number[][])[0][0];

/** The cell in column `col` of the row whose label (column A) is `label`. */
function cellOf(label: string, col = "B", nth = 0): string {
  const rows = t.cells.filter((c) => c.ref.startsWith("A") && c.content === label).map((c) => parseCell(c.ref)!.row + 1);
  if (rows.length <= nth) throw new Error(`no row labelled ${label}`);
  return `${col}${rows[nth]}`;
}
const STATION_KEEPING = "Station keeping: drag make-up at the mission orbit (Earth only)";
const num = (s: RecalculatedSheet, ref: string) => s.value(ref) as number;
const close = (got: number, want: number, rel = 1e-12) => expect(Math.abs(got - want)).toBeLessThanOrEqual(rel * Math.abs(want));

describe("the Skerry-1 budget", () => {
  const s = recalcSheet(t);
  const r1 = radiusOf(SKERRY_1.rideshareAltitude);
  const r2 = radiusOf(SKERRY_1.missionAltitude);
  const v2 = Math.sqrt(gm / r2);
  const turnDeg = num(s, cellOf("Plane change needed"));

  it("raises by a Hohmann transfer and turns the plane at the mission orbit's circular speed", () => {
    // Hohmann total: sqrt(mu/r1)(sqrt(2 r2/(r1+r2)) - 1) + sqrt(mu/r2)(1 - sqrt(2 r1/(r1+r2)))
    // and a pure plane change 2 v sin(di/2) (Curtis, Orbital Mechanics for Engineering Students,
    // 3rd ed., ch. 6, the Hohmann transfer and plane change sections; from memory).
    const hohmann = Math.sqrt(gm / r1) * (Math.sqrt((2 * r2) / (r1 + r2)) - 1) + v2 * (1 - Math.sqrt((2 * r1) / (r1 + r2)));
    close(num(s, cellOf("Raise to the mission orbit (Hohmann, two burns)")), hohmann, 1e-10);
    close(num(s, cellOf("Plane change to sun-synchronous, at the mission orbit")), 2 * v2 * Math.sin(((turnDeg * Math.PI) / 180) / 2), 1e-10);
    expect(turnDeg).toBeCloseTo(num(s, cellOf("Sun-synchronous inclination at the mission orbit")) - SKERRY_1.rideshareInclination, 12);
  });

  it("lowers the perigee by the circular speed minus the ellipse's apogee speed (vis-viva)", () => {
    const rp = radiusOf(SKERRY_1.disposalPerigee);
    const a = (rp + r2) / 2;
    // vis-viva: v² = mu (2/r - 1/a) (Curtis 3rd ed., ch. 2; from memory).
    close(num(s, cellOf("Disposal: lower the perigee")), v2 - Math.sqrt(gm * (2 / r2 - 1 / a)), 1e-10);
  });

  it("adds the margin to every burn and carries the mass through the rocket equation burn by burn", () => {
    // Tsiolkovsky: m_after = m_before exp(-dv / (g0 Isp)) (Curtis 3rd ed. Eq. 6.1; from memory).
    let m: number = SKERRY_1.wetMass;
    let propellant = 0;
    for (const label of ["Raise to the mission orbit (Hohmann, two burns)", "Plane change to sun-synchronous, at the mission orbit", STATION_KEEPING, "Disposal: lower the perigee"]) {
      const dv = num(s, cellOf(label)) * (1 + SKERRY_1.margin);
      close(num(s, cellOf(label, "C")), dv);
      const after = m * Math.exp((-dv * 1000) / (G0 * SKERRY_1.isp));
      close(num(s, cellOf(label, "G")), after, 1e-12);
      propellant += m - after;
      m = after;
    }
    close(num(s, BUDGET_CELLS.propellant), propellant, 1e-12);
    close(num(s, BUDGET_CELLS.leftOver), m - SKERRY_1.dryMass, 1e-10);
  });

  it("holds station by the drag make-up delta-v: the drag deceleration over the station-keeping years, at high solar activity", () => {
    // B = m / (C_D A) and the drag deceleration (1/2) rho v² / B (Vallado, Fundamentals of
    // Astrodynamics and Applications, 4th ed., ch. 8, the atmospheric drag section; from memory), v = sqrt(mu/r) on the
    // circular orbit; a Julian year is 365.25 days of 86400 s (IAU). The density is the
    // function's own model (NRLMSISE-00 global mean at daily Ap 15) through the bundle: this
    // checks the sheet's wiring and the make-up formula, not the atmosphere.
    const B = SKERRY_1.wetMass / (SKERRY_1.dragCoefficient * SKERRY_1.dragArea);
    close(num(s, BUDGET_CELLS.ballistic), B, 1e-15);
    const flux = SOLAR_ACTIVITY.high;
    const rho = (builtBundle().functions.get("ATMOSPHERE_DENSITY")!([[SKERRY_1.missionAltitude]], [[flux]], [[flux]], [[15]]) as number[][])[0][0];
    const seconds = SKERRY_1.stationKeepingYears * 365.25 * 86_400;
    const decel = 0.5 * rho * (v2 * 1000) ** 2 / B; // m/s²
    expect(BUDGET_CELLS.stationKeeping).toBe(cellOf(STATION_KEEPING));
    close(num(s, BUDGET_CELLS.stationKeeping), (decel * seconds) / 1000, 1e-12);
    // The budget carries the high-activity level, the largest make-up of the lifetime sheet's three.
    const lifetime = recalcSheet(SCENARIO.find((x) => x.id === "lifetime")!);
    const levels = LIFETIME_CELLS.makeupKms.map((ref) => num(lifetime, ref));
    expect(num(s, BUDGET_CELLS.stationKeeping)).toBe(levels[2]);
    expect(Math.max(...levels)).toBe(levels[2]);
  });
});

describe("the Skerry-1E block: electric raise and inspection", () => {
  const s = recalcSheet(t);
  const r1 = radiusOf(SKERRY_1.rideshareAltitude);
  const r2 = radiusOf(SKERRY_1.missionAltitude);
  const n = Math.sqrt(gm / r2 ** 3);
  const T = SKERRY_1E.transferTime;

  it("raises the orbit by Edelbaum's delta-v, with the firing time of a constant-thrust engine", () => {
    // Edelbaum (ARS Journal 31, 1961) in Kechichian's closed form (JGCD 20(5), 1997):
    // dv = sqrt(v0² - 2 v0 v1 cos(pi/2 di) + v1²), di in radians.
    const v0 = Math.sqrt(gm / r1);
    const v1 = Math.sqrt(gm / r2);
    const di = (num(s, cellOf("Plane change needed")) * Math.PI) / 180;
    const dv = Math.sqrt(v0 * v0 - 2 * v0 * v1 * Math.cos((Math.PI / 2) * di) + v1 * v1);
    close(num(s, BUDGET_CELLS.lowDv), dv, 1e-12);
    // Constant thrust F at Isp: mass flow F/(g0 Isp), so t = m0 (1 - exp(-dv/(g0 Isp))) g0 Isp / F
    // (the ideal rocket equation, Curtis 3rd ed. Eq. 6.1, with a constant mass flow; from memory).
    const c = G0 * SKERRY_1E.isp; // m/s
    const propellant = SKERRY_1.wetMass * (1 - Math.exp((-dv * 1000) / c));
    close(num(s, cellOf("Firing time")), (propellant * c) / SKERRY_1E.thrust, 1e-10);
    close(num(s, cellOf("Firing time", "B", 1)), (propellant * c) / SKERRY_1E.thrust / 86_400, 1e-10);
    close(num(s, cellOf("Electric raise: masses", "C")), propellant, 1e-10);
  });

  it("starts the chaser on its own circular orbit and coasts it by the Clohessy–Wiltshire solution", () => {
    const start = ["B", "C", "D", "E", "F", "G"].map((c) => num(s, cellOf("Start, on its own circular orbit", c)));
    // A co-circular orbit dx below drifts at vy = -(3/2) n x (Curtis 3rd ed. §7.4, from memory).
    close(start[4], 1.5 * n * SKERRY_1E.below, 1e-10);
    expect(start.slice(0, 4)).toEqual([-SKERRY_1E.below, -SKERRY_1E.behind, SKERRY_1E.crossTrack, 0]);
    // The closed-form solution of the CW equations (Curtis 3rd ed. §7.4, Eqs. 7.53).
    const [x0, y0, z0, vx0, vy0, vz0] = start;
    const th = n * T;
    const [sn, cs] = [Math.sin(th), Math.cos(th)];
    const want = [
      (4 - 3 * cs) * x0 + (sn / n) * vx0 + (2 / n) * (1 - cs) * vy0,
      6 * (sn - th) * x0 + y0 - (2 / n) * (1 - cs) * vx0 + ((4 * sn - 3 * th) / n) * vy0,
      cs * z0 + (sn / n) * vz0,
    ];
    const got = ["B", "C", "D"].map((c) => num(s, cellOf("Coast without burns, after the transfer time", c)));
    got.forEach((g, k) => expect(Math.abs(g - want[k])).toBeLessThan(1e-12));
  });

  it("rendezvous burns reach the hold point in the linear theory; flown in two-body motion, the miss shrinks with the square of the hop", () => {
    // Burn 1 put on the start velocity, then the CW solution over the transfer time: the hold point.
    const start = ["B", "C", "D", "E", "F", "G"].map((c) => num(s, cellOf("Start, on its own circular orbit", c)));
    const burn1 = ["B", "C", "D"].map((c) => num(s, cellOf("Two burns to the hold point", c)));
    const [x0, y0, z0] = start;
    const [vx0, vy0, vz0] = [start[3] + burn1[0], start[4] + burn1[1], start[5] + burn1[2]];
    const th = n * T;
    const [sn, cs] = [Math.sin(th), Math.cos(th)];
    expect(Math.abs((4 - 3 * cs) * x0 + (sn / n) * vx0 + (2 / n) * (1 - cs) * vy0)).toBeLessThan(1e-12);
    expect(Math.abs(6 * (sn - th) * x0 + y0 - (2 / n) * (1 - cs) * vx0 + ((4 * sn - 3 * th) / n) * vy0 + SKERRY_1E.hold)).toBeLessThan(1e-12);
    expect(Math.abs(cs * z0 + (sn / n) * vz0)).toBeLessThan(1e-12);

    // The linearisation drops terms of second order in separation over radius (Curtis 3rd ed.
    // §7.4), so halving every offset of the inspection quarters the miss of the exact flight.
    const miss = num(s, BUDGET_CELLS.miss);
    expect(miss).toBeGreaterThan(0.5);
    expect(miss).toBeLessThan(10);
    const layout = layoutSheet(t);
    const halved = layout.formulas.map((row) => row.slice());
    for (const label of ["Start: below the companion", "Start: behind the companion", "Start: cross-track offset", "Hold point: behind the companion"]) {
      const at = parseCell(cellOf(label))!;
      halved[at.row][at.col] = (halved[at.row][at.col] as number) / 2;
    }
    const ratio = num(recalcSheet(t, halved), BUDGET_CELLS.miss) / miss;
    expect(ratio).toBeGreaterThan(0.2);
    expect(ratio).toBeLessThan(0.3);
  });

  it("says the 20 mN engine cannot fly the approach burns as impulses, and costs them on the monopropellant thruster", () => {
    const massAfterRaise = num(s, cellOf("Electric raise: masses", "D"));
    const c = G0 * SKERRY_1E.isp;
    for (const [label, sizeCol] of [["Burn 1 on the electric thruster: firing time", "H"], ["Burn 2 on the electric thruster: firing time", "I"]] as const) {
      const dv = num(s, cellOf("Two burns to the hold point", sizeCol)) * 1000;
      close(num(s, cellOf(label)), (massAfterRaise * (1 - Math.exp(-dv / c)) * c) / SKERRY_1E.thrust, 1e-10);
      expect(num(s, cellOf(label))).toBeGreaterThan(T);
    }
    expect(s.value(cellOf("Can the electric thruster fly these burns as impulses?"))).toMatch(/^No: /);
    const total = num(s, BUDGET_CELLS.approach) * 1000;
    close(num(s, cellOf("Approach on the monopropellant thruster: masses", "C")), massAfterRaise * (1 - Math.exp(-total / (G0 * SKERRY_1.isp))), 1e-10);
  });
});
