/**
 * Benchmark of the pass search (src/core/passes.ts) over the capped 31-day window, for the
 * invented Skerry-1 element set (SGP4) and for a J2000 state under the J2 secular model, from the
 * invented Skerry Ground station (both in src/scenario/story.ts): median wall time of 5 runs each, and
 * the number of passes found. Run directly with `npx tsx bench/passes.ts`.
 */
import { isDomainError } from "../src/core/domain";
import { passes, readPassSource, type PassSource } from "../src/core/passes";
import { tleState } from "../src/core/tlestate";
import { SKERRY_1_TLE, SKERRY_GROUND as SKERRY_STATION } from "../src/scenario/story";
import { SKERRY_EPOCH_JD } from "../test/support/skerry";
import { medianNsPer } from "./stats";

const { line1: SKERRY_LINE1, line2: SKERRY_LINE2 } = SKERRY_1_TLE;

export async function benchPasses(): Promise<Record<string, number | string>> {
  const { latitude, longitude, height } = SKERRY_STATION;
  const tle: PassSource = { kind: "tle", line1: SKERRY_LINE1, line2: SKERRY_LINE2 };
  const state = tleState(SKERRY_LINE1, SKERRY_LINE2, SKERRY_EPOCH_JD);
  if (isDomainError(state)) throw new Error(state.message);
  const j2 = readPassSource([...state, SKERRY_EPOCH_JD]);
  if (isDomainError(j2)) throw new Error(j2.message);
  const run = (source: PassSource) => passes(source, latitude, longitude, height, SKERRY_EPOCH_JD, SKERRY_EPOCH_JD + 31, 5);
  const count = (source: PassSource) => {
    const r = run(source);
    return isDomainError(r) ? r.message : r.length;
  };
  return {
    "31 days, TLE (SGP4), ms": Number((medianNsPer(() => run(tle), 1, 5) / 1e6).toFixed(0)),
    "31 days, TLE (SGP4), passes": count(tle),
    "31 days, J2000 state (J2 secular), ms": Number((medianNsPer(() => run(j2), 1, 5) / 1e6).toFixed(0)),
    "31 days, J2000 state (J2 secular), passes": count(j2),
  };
}

// Run alone (npx tsx bench/passes.ts); bundled into bench/run.ts this module is not the entry.
if (process.argv[1] && /bench[\\/]passes\.ts$/.test(process.argv[1])) benchPasses().then((r) => console.log(r));
