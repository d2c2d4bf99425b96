import { resolve } from "node:path";
import { eccentricAnomalyFromMean } from "../src/core/anomalies";
import { orbitalSpeed } from "../src/core/twobody";
import { loadBundle } from "../src/runner/host";
import { textbookNewton } from "./kepler";
import { medianNsPer } from "./stats";

/**
 * Cost of lifting, through the BUILT bundle, as Excel calls it:
 *  - SOLVE_ECCENTRIC_ANOMALY over a 200,000-row column of mean anomalies (degrees, uniform in
 *    [0, 360)) with one eccentricity, against one Math.sin + Math.cos per row on the same inputs
 *    (goal: at most 4x) and against a bare textbook Newton-Raphson loop from E0 = M
 *    (bench/kepler.ts) into a Float64Array (goal: the lifted call is faster);
 *  - ORBITAL_SPEED over a 100,000-row column against the bare core loop, into a Float64Array
 *    and into the one-array-per-row result Excel needs (what any adaptor must build).
 * Each figure is the median of interleaved repetitions (the machine is shared).
 */
export async function benchLift(): Promise<Record<string, number | string>> {
  const bundle = loadBundle(resolve(process.cwd(), "dist"));
  const out: Record<string, number | string> = {};

  // Kepler's equation down a column.
  {
    const rows = 200_000;
    const ecc = 0.3;
    let s = 20240602;
    const M = new Float64Array(rows);
    for (let i = 0; i < rows; i++) {
      s = (s * 16807) % 2147483647;
      M[i] = (s / 2147483647) * 360;
    }
    const column = Array.from(M, (m) => [m]);
    const fn = bundle.functions.get("SOLVE_ECCENTRIC_ANOMALY")!;
    const rad = Math.PI / 180;
    const sincos = () => {
      let x = 0;
      for (let i = 0; i < rows; i++) x += Math.sin(M[i]) + Math.cos(M[i]);
      return x;
    };
    const newton = () => {
      const r = new Float64Array(rows);
      for (let i = 0; i < rows; i++) r[i] = textbookNewton(M[i] * rad, ecc);
      return r;
    };
    const lifted = () => fn(column, [[ecc]]);
    // The floor any adaptor has: the same core function in a bare loop, building the one-array-
    // per-row result Excel needs.
    const rowsFloor = () => {
      const r = new Array(rows);
      for (let i = 0; i < rows; i++) r[i] = [eccentricAnomalyFromMean(M[i], ecc)];
      return r;
    };
    const t = { sincos: [] as number[], newton: [] as number[], lifted: [] as number[], floor: [] as number[] };
    // Interleaved, so a stretch of machine load spoils one repetition of each, not one figure.
    for (let rep = 0; rep < 9; rep++) {
      t.sincos.push(medianNsPer(sincos, rows, 3));
      t.newton.push(medianNsPer(newton, rows, 3));
      t.lifted.push(medianNsPer(lifted, rows, 3));
      t.floor.push(medianNsPer(rowsFloor, rows, 3));
    }
    const med = (xs: number[]) => [...xs].sort((a, b) => a - b)[xs.length >> 1];
    const [sc, nw, lf, fl] = [med(t.sincos), med(t.newton), med(t.lifted), med(t.floor)];
    out["SOLVE_ECCENTRIC_ANOMALY, 200,000 rows: lifted call, ns/row"] = Number(lf.toFixed(1));
    out["  one Math.sin + Math.cos per row, ns/row"] = Number(sc.toFixed(1));
    out["  bare textbook Newton loop (E0 = M, to 1e-15), ns/row"] = Number(nw.toFixed(1));
    out["  lifted / sin+cos (goal <= 4)"] = Number((lf / sc).toFixed(2));
    out["  lifted / textbook Newton (goal < 1)"] = Number((lf / nw).toFixed(2));
    out["  bare core loop building Excel's row arrays, ns/row"] = Number(fl.toFixed(1));
    out["  that floor / sin+cos"] = Number((fl / sc).toFixed(2));
  }

  // Vis-viva down a column: the adaptor's share of a cheap kernel.
  {
    const rows = 100_000;
    const gm = 398600.4418;
    const radii = Array.from({ length: rows }, (_, i) => 6578 + (i % 1000));
    const column = radii.map((r) => [r]);
    const smaColumn = radii.map((r) => [2 * r]);
    const inputs = Float64Array.from(radii);
    const fn = bundle.functions.get("ORBITAL_SPEED")!;
    const bare = medianNsPer(() => {
      const res = new Float64Array(rows);
      for (let i = 0; i < rows; i++) res[i] = orbitalSpeed(gm, inputs[i], 2 * inputs[i]) as number;
      return res;
    }, rows);
    const bareRows = medianNsPer(() => {
      const res = new Array(rows);
      for (let i = 0; i < rows; i++) res[i] = [orbitalSpeed(gm, inputs[i], 2 * inputs[i])];
      return res;
    }, rows);
    const lifted = medianNsPer(() => fn([[gm]], column, smaColumn), rows);
    out["ORBITAL_SPEED, 100,000 rows: lifted call, ns/row"] = Number(lifted.toFixed(1));
    out["  bare core loop into a Float64Array, ns/row"] = Number(bare.toFixed(1));
    out["  bare core loop into Excel's row arrays, ns/row"] = Number(bareRows.toFixed(1));
    out["  lifted / bare loop building the same rows"] = Number((lifted / bareRows).toFixed(2));
  }
  return out;
}

// Run alone (npx tsx bench/lift.ts); bundled into bench/run.ts this module is not the entry.
if (process.argv[1] && /bench[\\/]lift\.ts$/.test(process.argv[1])) benchLift().then((r) => console.table(r));
