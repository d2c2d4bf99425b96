/**
 * Benchmark of Lambert's problem (src/core/lambert.ts, Izzo 2015) and the transfer grid
 * (src/core/transferwindow.ts). Over 20,000 seeded random geometries about the Earth (radii
 * 6,600-80,000 km, both directions, flight times log-uniform from 0.1 to 1000 times the parabolic
 * time) it times the no-validation kernel as the median of 7 repetitions:
 *   - single-revolution solves per second (goal: >= 300,000 on one core),
 *   - multi-revolution solves per second (1-3 turns, both branches, flight times from just above
 *     the minimum to 20 times it), which also find the minimum time each call,
 *   - a 100 x 100 Earth-Mars TRANSFER_GRID core call over 2028-29 (goal: < 0.1 s), median and the
 *     first (cold, before the JIT has warmed the grid path) call.
 * Run directly with `npx tsx bench/lambert.ts`. Timings depend on the machine and its load.
 */
import { lambertKernel, lambertMinimumTime } from "../src/core/lambert";
import { julianDateFromCalendar } from "../src/core/julian";
import { transferGrid } from "../src/core/transferwindow";
import { BODIES } from "../src/catalogue/bodies";

const GM_SUN = BODIES.find((b) => b.kind === "star")!.gm.value;
import { logUniform, seeded } from "../test/support/random";
import { medianNsPer } from "./stats";

const N = 20_000;
const GM = 398600.4418;

interface Case {
  r1: Float64Array;
  r2: Float64Array;
  tof: number;
  revs: number;
  longWay: boolean;
  high: boolean;
}

function randomPosition(rand: () => number): Float64Array {
  const u = [rand() * 2 - 1, rand() * 2 - 1, rand() * 2 - 1];
  const s = logUniform(rand, 6600, 80000) / Math.hypot(u[0], u[1], u[2]);
  return Float64Array.from(u, (x) => x * s);
}

function parabolicTime(r1: Float64Array, r2: Float64Array, longWay: boolean): number {
  const c = Math.hypot(r2[0] - r1[0], r2[1] - r1[1], r2[2] - r1[2]);
  const s = (Math.hypot(r1[0], r1[1], r1[2]) + Math.hypot(r2[0], r2[1], r2[2]) + c) / 2;
  const lambda = Math.sqrt(1 - c / s) * (longWay ? -1 : 1);
  return ((2 / 3) * (1 - lambda ** 3)) / Math.sqrt((2 * GM) / s ** 3);
}

function cases(multi: boolean): Case[] {
  const rand = seeded(multi ? 4242 : 2424);
  const list: Case[] = [];
  for (let k = 0; k < N; k++) {
    const r1 = randomPosition(rand);
    const r2 = randomPosition(rand);
    const longWay = rand() < 0.5;
    const high = rand() < 0.5;
    const revs = multi ? 1 + Math.floor(rand() * 3) : 0;
    const tof = multi ? lambertMinimumTime(GM, r1, r2, revs, longWay) * (1 + logUniform(rand, 1e-4, 20)) : parabolicTime(r1, r2, longWay) * logUniform(rand, 0.1, 1000);
    list.push({ r1, r2, tof, revs, longWay, high });
  }
  return list;
}

function solveAll(list: Case[]): number {
  const out = new Float64Array(6);
  let s = 0;
  let failures = 0;
  for (const c of list) {
    if (lambertKernel(GM, c.r1, c.r2, c.tof, c.revs, c.longWay, c.high, out) === 0) s += out[0];
    else failures++;
  }
  return failures > 0 ? NaN : s;
}

// The core takes Julian dates (UTC): 2028-08-01 0h.
const grid = () => transferGrid(GM_SUN, "Earth", "Mars", julianDateFromCalendar(2028, 8, 1), 2, 100, 120, 3, 100, "c3");

/** The grid gives a number in every cell (so its timing times real work, not a refusal). */
function gridOk(): boolean {
  const g = grid();
  return Array.isArray(g) && g.length === 100 && g.every((r) => r.length === 100 && r.every((c) => typeof c === "number" && Number.isFinite(c)));
}

export async function benchLambert(): Promise<Record<string, number | string>> {
  const t0 = process.hrtime.bigint();
  grid();
  const coldMs = Number(process.hrtime.bigint() - t0) / 1e6;

  const single = cases(false);
  const multi = cases(true);
  const singleOk = Number.isFinite(solveAll(single));
  const multiOk = Number.isFinite(solveAll(multi));
  const nsSingle = medianNsPer(() => solveAll(single), N);
  const nsMulti = medianNsPer(() => solveAll(multi), N);
  const gridMs = medianNsPer(grid, 1) / 1e6;

  return {
    "geometries per set": N,
    "single-revolution solves per second (median of 7)": Math.round(1e9 / nsSingle),
    "multi-revolution solves per second (median of 7)": Math.round(1e9 / nsMulti),
    "100 x 100 transfer grid, ms (median of 7)": Number(gridMs.toFixed(1)),
    "100 x 100 transfer grid, first call, ms": Number(coldMs.toFixed(1)),
    "all solves succeeded": singleOk && multiOk ? "yes" : "NO",
    "every grid cell a finite C3": gridOk() ? "yes" : "NO",
  };
}

if (process.argv[1] && /bench[\\/]lambert\.ts$/.test(process.argv[1])) {
  benchLambert().then((table) => {
    for (const [key, value] of Object.entries(table)) console.log(`${key.padEnd(54)} ${value}`);
  });
}
