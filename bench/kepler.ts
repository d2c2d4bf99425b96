/**
 * Benchmark of the elliptic Kepler solver (src/core/kepler.ts). Over 1,000,000 seeded random
 * cases, M uniform in [0, 2 pi) and e uniform in [0, 0.999], it times in the same run, as the
 * median of several interleaved repetitions (taken per block of 10,000 cases and summed, so that
 * a moment of machine load spoils one block of one repetition rather than a whole figure):
 *   - solveKeplerElliptic (Markley 1995),
 *   - Math.sin(M) + Math.cos(M) on the same inputs (the cost unit the goal is stated in),
 *   - a textbook Newton-Raphson from E0 = M, to 1e-15 (textbookNewton below, the baseline),
 * and reports the worst float64 residual |E - e sin E - M| over all cases, and the worst exact residual (70-digit decimal.js)
 * over a 20,000-case subsample. Run directly with `npx tsx bench/kepler.ts`.
 * Timings depend on the machine and its load; the ratios are the figures to compare.
 */
import { solveKeplerElliptic } from "../src/core/kepler";
import { ellipticResidual } from "../test/core/keplerReference";
import { seeded } from "../test/support/random";

/**
 * The baseline: textbook Newton-Raphson from E0 = M, stopping when the step is below 1e-15 rad (at
 * most 100 steps); slow to converge for e near 1. Lives here, not in the core: no product code calls it.
 */
export function textbookNewton(meanAnomaly: number, ecc: number): number {
  let E = meanAnomaly;
  for (let i = 0; i < 100; i++) {
    const step = (E - ecc * Math.sin(E) - meanAnomaly) / (1 - ecc * Math.cos(E));
    E -= step;
    if (Math.abs(step) < 1e-15) break;
  }
  return E;
}

const N = 1_000_000;
const REPETITIONS = 7;
const SUBSAMPLE = 20_000;

function inputs(): { M: Float64Array; e: Float64Array } {
  const rand = seeded(20240601);
  const M = new Float64Array(N);
  const e = new Float64Array(N);
  for (let i = 0; i < N; i++) {
    M[i] = rand() * 2 * Math.PI;
    e[i] = rand() * 0.999;
  }
  return { M, e };
}

const BLOCK = 10_000;

/** Sum of results over cases [lo, hi), returned so the work cannot be optimised away. */
type Kernel = (M: Float64Array, e: Float64Array, lo: number, hi: number) => number;

const kernels: Record<string, Kernel> = {
  markley: (M, e, lo, hi) => {
    let s = 0;
    for (let i = lo; i < hi; i++) s += solveKeplerElliptic(M[i], e[i]);
    return s;
  },
  sincos: (M, _e, lo, hi) => {
    let s = 0;
    for (let i = lo; i < hi; i++) s += Math.sin(M[i]) + Math.cos(M[i]);
    return s;
  },
  naive: (M, e, lo, hi) => {
    let s = 0;
    for (let i = lo; i < hi; i++) s += textbookNewton(M[i], e[i]);
    return s;
  },
};

const median = (xs: number[]): number => {
  const s = [...xs].sort((a, b) => a - b);
  const h = s.length >> 1;
  return s.length % 2 ? s[h] : (s[h - 1] + s[h]) / 2;
};

export async function benchKepler(): Promise<Record<string, number | string>> {
  const { M, e } = inputs();
  const blocks = N / BLOCK;
  // times[name][block][repetition], ns
  const times: Record<string, number[][]> = {};
  for (const name of Object.keys(kernels)) times[name] = Array.from({ length: blocks }, () => []);
  let sink = 0;
  for (const run of Object.values(kernels)) sink += run(M, e, 0, N); // warm-up: let the JIT settle
  for (let r = 0; r < REPETITIONS; r++)
    for (const [name, run] of Object.entries(kernels))
      for (let b = 0; b < blocks; b++) {
        const t0 = process.hrtime.bigint();
        sink += run(M, e, b * BLOCK, (b + 1) * BLOCK);
        times[name][b].push(Number(process.hrtime.bigint() - t0));
      }

  let worstFloatResidual = 0;
  for (let i = 0; i < N; i++) {
    const E = solveKeplerElliptic(M[i], e[i]);
    const res = Math.abs(E - e[i] * Math.sin(E) - M[i]);
    if (res > worstFloatResidual) worstFloatResidual = res;
  }
  let worstExactResidual = 0;
  let worstExactUlps = 0;
  const stride = Math.floor(N / SUBSAMPLE);
  for (let i = 0; i < N; i += stride) {
    const res = Math.abs(ellipticResidual(solveKeplerElliptic(M[i], e[i]), e[i], M[i]));
    if (res > worstExactResidual) worstExactResidual = res;
    const ulps = res / (2 ** -52 * Math.max(1, M[i]));
    if (ulps > worstExactUlps) worstExactUlps = ulps;
  }

  const ns = (name: string) => times[name].reduce((sum, reps) => sum + median(reps), 0) / N;
  return {
    cases: N,
    repetitions: REPETITIONS,
    "ns per solve (Markley)": Number(ns("markley").toFixed(2)),
    "ns per Math.sin + Math.cos": Number(ns("sincos").toFixed(2)),
    "solve / (sin + cos)": Number((ns("markley") / ns("sincos")).toFixed(2)),
    "ns per naive Newton solve": Number(ns("naive").toFixed(2)),
    "naive Newton / Markley": Number((ns("naive") / ns("markley")).toFixed(2)),
    "worst residual, float64 evaluation (all cases)": worstFloatResidual,
    "worst residual, exact 70-digit evaluation (subsample)": worstExactResidual,
    "  same, in units of 2^-52 max(1, |M|)": Number(worstExactUlps.toFixed(2)),
    "subsample size": Math.ceil(N / stride),
    checksum: sink === sink ? "ok" : "NaN in results",
  };
}

if (process.argv[1] && /bench[\\/]kepler\.ts$/.test(process.argv[1])) {
  benchKepler().then((table) => {
    for (const [key, value] of Object.entries(table)) console.log(`${key.padEnd(54)} ${value}`);
  });
}
