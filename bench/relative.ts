/**
 * Benchmark of the relative-motion and low-thrust core (src/core/localframe.ts, relativemotion.ts,
 * rendezvous.ts, lowthrust.ts, firingtime.ts). Over 100,000 seeded random cases about a 690 km
 * circular target (separations up to 20 km, transfer times from 1 minute to 3 periods) it times
 * each validating core call, as the median of 7 repetitions, in ns per call:
 *   - Clohessy-Wiltshire propagation, and beside it the exact route it stands in for (both craft
 *     propagated by universal variables and differenced in the target's frame);
 *   - the two-impulse rendezvous;
 *   - the inertial <-> local conversions;
 *   - Edelbaum's dv and the constant-thrust firing time.
 * No speed goal is set for these; the figures say what a 10,000-row column of each costs in core
 * time. Run directly with `npx tsx bench/relative.ts`. Timings depend on the machine and its load.
 */
import { stateFromElements } from "../src/core/elements";
import { chaserState, relativeState } from "../src/core/localframe";
import { lowThrustTime } from "../src/core/firingtime";
import { lowThrustDv } from "../src/core/lowthrust";
import { propagateState } from "../src/core/propagate";
import { relativeStateAtTime } from "../src/core/relativemotion";
import { relativeRendezvous } from "../src/core/rendezvous";
import { seeded } from "../test/support/random";
import { medianNsPer } from "./stats";

const N = 100_000;
const GM = 398600.4418;
const A = 6378.137 + 690;
const MEAN_MOTION = Math.sqrt(GM / A ** 3);
const PERIOD = (2 * Math.PI) / MEAN_MOTION;

interface Case {
  rel: number[];
  aim: number[];
  time: number;
  chaser: number[];
}

function cases(): { target: number[]; list: Case[] } {
  const rand = seeded(1616);
  const target = stateFromElements(GM, A, 0, 98.2, 30, 0, 10) as number[];
  const list: Case[] = [];
  for (let k = 0; k < N; k++) {
    const rel = [0, 0, 0, 0, 0, 0].map((_, j) => (2 * rand() - 1) * 20 * (j < 3 ? 1 : 0.1 * MEAN_MOTION));
    const aim = [0, 0, 0].map(() => (2 * rand() - 1) * 2);
    const time = 60 + rand() * 3 * PERIOD;
    list.push({ rel, aim, time, chaser: chaserState(GM, target, rel) as number[] });
  }
  return { target, list };
}

/** First value of a row result; NaN for an error, so a failure spoils the checksum. */
const first = (r: unknown): number => (Array.isArray(r) ? (r[0] as number) : NaN);
const value = (r: unknown): number => (typeof r === "number" ? r : NaN);

export async function benchRelative(): Promise<Record<string, number | string>> {
  const { target, list } = cases();
  // One loop literal per function, so each is compiled for its own call site (a shared loop over
  // a callback turned megamorphic and tripled some figures).
  const loops: [string, () => number][] = [
    ["RELATIVE_STATE_AT_TIME (Clohessy-Wiltshire), ns/call", () => { let s = 0; for (const c of list) s += first(relativeStateAtTime(GM, A, c.rel, c.time)); return s; }],
    ["exact route: 2 universal-variable propagations + RELATIVE_STATE, ns/case", () => { let s = 0; for (const c of list) s += first(relativeState(GM, propagateState(GM, target, c.time) as number[], propagateState(GM, c.chaser, c.time) as number[])); return s; }],
    ["RELATIVE_RENDEZVOUS, ns/call", () => { let s = 0; for (const c of list) s += first(relativeRendezvous(GM, A, c.rel, c.aim, c.time)); return s; }],
    ["RELATIVE_STATE, ns/call", () => { let s = 0; for (const c of list) s += first(relativeState(GM, target, c.chaser)); return s; }],
    ["CHASER_STATE, ns/call", () => { let s = 0; for (const c of list) s += first(chaserState(GM, target, c.rel)); return s; }],
    ["LOW_THRUST_DV (Edelbaum), ns/call", () => { let s = 0; for (const c of list) s += value(lowThrustDv(GM, A, A + 1000 * Math.abs(c.aim[0]), 10 * Math.abs(c.aim[1]))); return s; }],
    ["LOW_THRUST_TIME, ns/call", () => { let s = 0; for (const c of list) s += value(lowThrustTime(Math.abs(c.aim[0]), 0.02, 180, 1500)); return s; }],
  ];
  const table: Record<string, number | string> = { cases: N };
  let allFinite = true;
  const times: number[] = [];
  for (const [label, loop] of loops) {
    allFinite = allFinite && Number.isFinite(loop());
    const ns = medianNsPer(loop, N);
    times.push(ns);
    table[label] = Number(ns.toFixed(1));
  }
  table["exact route / Clohessy-Wiltshire"] = Number((times[1] / times[0]).toFixed(1));
  table["all results finite"] = allFinite ? "yes" : "NO";
  return table;
}

if (process.argv[1] && /bench[\\/]relative\.ts$/.test(process.argv[1])) {
  benchRelative().then((table) => {
    for (const [key, value] of Object.entries(table)) console.log(`${key.padEnd(72)} ${value}`);
  });
}
