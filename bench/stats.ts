/** Median wall time of `reps` runs of `fn`, in ns per `count` items, after one warm-up run. */
export function medianNsPer(fn: () => unknown, count: number, reps = 7): number {
  fn();
  const times: number[] = [];
  for (let r = 0; r < reps; r++) {
    const t0 = process.hrtime.bigint();
    sink = fn();
    times.push(Number(process.hrtime.bigint() - t0) / count);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

/** Keeps results alive so the optimiser cannot drop the work being timed. */
export let sink: unknown;
