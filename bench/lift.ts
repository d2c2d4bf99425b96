import { resolve } from "node:path";
import { loadBundle } from "../src/runner/host";
import { orbitalSpeed } from "../src/core/twobody";
import { medianNsPer } from "./stats";

/**
 * Cost of lifting: one call of the BUILT bundle's function over a 100,000-row column, against a
 * bare loop of the same core function over the same inputs writing into a Float64Array. The
 * ratio is the adaptor's overhead per case (argument reading, error checks, Excel's row arrays).
 */
export async function benchLift(rows = 100_000): Promise<Record<string, number | string>> {
  const bundle = loadBundle(resolve(process.cwd(), "dist"));
  const out: Record<string, number | string> = {};
  const radii = Array.from({ length: rows }, (_, i) => 6578 + (i % 1000));
  const column = radii.map((r) => [r]);
  const gm = 398600.4418;

  const cases: { id: string; core?: (r: number) => unknown; args: (col: unknown[][]) => unknown[] }[] = [
    { id: "ORBITAL_SPEED", core: (r) => orbitalSpeed(gm, r, 2 * r), args: (col) => [[[gm]], col, col.map((c) => [2 * (c[0] as number)])] },
  ];
  // Kepler's equation is the typical heavier kernel; measured when the family is built.
  const trueFromMean = bundle.functions.get("TRUE_ANOMALY_FROM_MEAN");
  if (trueFromMean) {
    const anomalies = import("../src/core/anomalies").catch(() => null);
    const mod = await anomalies;
    if (mod && "trueAnomalyFromMean" in mod) {
      const core = (mod as { trueAnomalyFromMean: (m: number, e: number) => unknown }).trueAnomalyFromMean;
      cases.push({ id: "TRUE_ANOMALY_FROM_MEAN", core: (m) => core(m % 360, 0.3), args: (col) => [col.map((c) => [(c[0] as number) % 360]), [[0.3]]] });
    }
  }

  for (const c of cases) {
    const fn = bundle.functions.get(c.id);
    if (!fn || !c.core) continue;
    const args = c.args(column);
    const inputs = Float64Array.from(radii);
    const core = c.core;
    // Bare core into a typed array: the pure arithmetic cost.
    const bare = medianNsPer(() => {
      const res = new Float64Array(rows);
      for (let i = 0; i < rows; i++) res[i] = core(inputs[i]) as number;
      return res;
    }, rows);
    // Bare core into the result Excel needs (an array of one-cell rows): what any adaptor must build.
    const bareRows = medianNsPer(() => {
      const res = new Array(rows);
      for (let i = 0; i < rows; i++) res[i] = [core(inputs[i])];
      return res;
    }, rows);
    const lifted = medianNsPer(() => fn(...args), rows);
    out[`${c.id}: lifted call, ns/row`] = Number(lifted.toFixed(1));
    out[`${c.id}: bare core loop into Float64Array, ns/row`] = Number(bare.toFixed(1));
    out[`${c.id}: bare core loop into Excel's row arrays, ns/row`] = Number(bareRows.toFixed(1));
    out[`${c.id}: lifted / bare core loop (goal <= 1.5)`] = Number((lifted / bare).toFixed(2));
    out[`${c.id}: lifted / bare loop building the same rows`] = Number((lifted / bareRows).toFixed(2));
  }
  return out;
}

if (require.main === module) benchLift().then((r) => console.table(r));
