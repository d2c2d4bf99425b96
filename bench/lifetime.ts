/**
 * Benchmark of the orbital lifetime (src/core/lifetime.ts) for the lifetime table a sheet builds
 * in one formula: 50 circular starts from 300 to 800 km against 20 ballistic coefficients from 10
 * to 200 kg/m^2 (log-spaced), NRLMSISE-00 at a constant 150 sfu, so lifetimes run from days to
 * past the 200-year cap. Timed in the same run: the table with the density profile already built
 * (median of 5), the first table including the profile's construction, the same table with
 * eccentric starts (apogee 300 km above perigee), and 1,000 elliptic Kepler solves
 * (solveKeplerElliptic, the solver of bench/kepler.ts) as the cost unit. Goal: the 1,000-case
 * table in under 1 s on the project's 2-core machine. Run directly with `npx tsx bench/lifetime.ts`.
 */
import { solveKeplerElliptic } from "../src/core/kepler";
import { isDomainError } from "../src/core/domain";
import { orbitLifetime } from "../src/core/lifetime";
import { BODIES } from "../src/catalogue/bodies";
import { seeded } from "../test/support/random";

const earth = BODIES.find((b) => b.name === "Earth")!;
const GM = earth.gm.value;
const R = earth.equatorialRadius.value;
const ALTITUDES = Array.from({ length: 50 }, (_, i) => 300 + (500 * i) / 49);
const BS = Array.from({ length: 20 }, (_, j) => 10 * 20 ** (j / 19));
const FLUX = 150;

function table(apogeeAbove: number): { ms: number; capped: number; longest: number; sink: number } {
  const t0 = process.hrtime.bigint();
  let capped = 0;
  let longest = 0;
  let sink = 0;
  for (const h of ALTITUDES)
    for (const b of BS) {
      const r = orbitLifetime(GM, R, h, h + apogeeAbove, b, FLUX, null, null, null);
      if (isDomainError(r)) capped++;
      else {
        sink += r;
        if (r > longest) longest = r;
      }
    }
  return { ms: Number(process.hrtime.bigint() - t0) / 1e6, capped, longest, sink };
}

const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[xs.length >> 1];

export async function benchLifetime(): Promise<Record<string, number | string>> {
  // no earlier benchmark uses the density model, so the first table builds its profile
  const cold = table(0);
  const warm = [1, 2, 3, 4, 5].map(() => table(0));
  const ecc = [1, 2, 3].map(() => table(300));

  const rand = seeded(1401);
  const M = Float64Array.from({ length: 1000 }, () => rand() * 2 * Math.PI);
  const e = Float64Array.from({ length: 1000 }, () => rand() * 0.999);
  const keplerMs: number[] = [];
  let ks = 0;
  for (let rep = 0; rep < 200; rep++) {
    const t0 = process.hrtime.bigint();
    for (let i = 0; i < 1000; i++) ks += solveKeplerElliptic(M[i], e[i]);
    keplerMs.push(Number(process.hrtime.bigint() - t0) / 1e6);
  }
  const tableMs = median(warm.map((w) => w.ms));
  const kepler = median(keplerMs.slice(20));
  return {
    "cases (50 altitudes 300-800 km x 20 B 10-200 kg/m^2, circular, 150 sfu)": 1000,
    "lifetime table, ms (median of 5, profile built) (goal < 1000)": Number(tableMs.toFixed(1)),
    "first table, ms (includes building the NRLMSISE-00 profile)": Number(cold.ms.toFixed(1)),
    "us per lifetime case": Number(tableMs.toFixed(1)),
    "cases past the 200-year cap (#N/A)": warm[0].capped,
    "longest lifetime in the table, years": Number((warm[0].longest / 365.25).toFixed(1)),
    "eccentric table (apogee 300 km above perigee), ms (median of 3)": Number(median(ecc.map((x) => x.ms)).toFixed(1)),
    "1,000 Kepler solves, ms": Number(kepler.toFixed(4)),
    "lifetime table / 1,000 Kepler solves": Math.round(tableMs / kepler),
    checksum: Number.isFinite(warm[0].sink + ks) ? "ok" : "NaN in results",
  };
}

if (process.argv[1] && /bench[\\/]lifetime\.ts$/.test(process.argv[1])) {
  benchLifetime().then((r) => {
    for (const [k, v] of Object.entries(r)) console.log(`${k.padEnd(72)} ${v}`);
  });
}
