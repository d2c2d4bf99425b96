/** Deterministic pseudo-random numbers for reproducible test sweeps (mulberry32). */
export function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Log-uniform in [lo, hi]. */
export const logUniform = (rand: () => number, lo: number, hi: number): number => Math.exp(Math.log(lo) + rand() * (Math.log(hi) - Math.log(lo)));
