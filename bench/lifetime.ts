/**
 * Benchmark of the orbital lifetime as a sheet computes it: ONE lifted call of the BUILT bundle's
 * ORBIT_LIFETIME with a column of 50 perigee altitudes from 300 to 800 km against a row of 20
 * ballistic coefficients from 10 to 200 kg/m^2 (log-spaced), NRLMSISE-00, so that lifetimes run
 * from days to past the 200-year cap (those cells are #N/A, and cost the integration up to the
 * cap). Timed in the same run, each a median of interleaved repetitions:
 *   - the circular table (apogee = perigee) at a constant 150 sfu, the density profile built;
 *   - the first such call of the session, which also builds the 150 sfu profile;
 *   - the eccentric table (apogee 300 km above perigee), 150 sfu;
 *   - the circular and the eccentric tables against a solar-flux forecast range (a synthetic,
 *     smoothly varying cycle of 70-200 sfu, monthly rows over 30 years: benchmark input, not a
 *     forecast), shared by every case, after its profiles are built;
 *   - the circular table by the core directly (orbitLifetime in a loop), for the adaptor's share;
 *   - 1,000 Kepler solves as the cost unit: the bundle's SOLVE_ECCENTRIC_ANOMALY over a
 *     1,000-row column (one lifted call) and the core's solveKeplerElliptic in a loop.
 * Goal: the 1,000-case table in under 1 s on the project's 2-core machine, so a sheet stays
 * interactive. Run directly with `npx tsx bench/lifetime.ts` (after `npm run build`).
 */
import { resolve } from "node:path";
import { solveKeplerElliptic } from "../src/core/kepler";
import { isDomainError } from "../src/core/domain";
import { orbitLifetime } from "../src/core/lifetime";
import { BODIES } from "../src/catalogue/bodies";
import { isCellError, loadBundle } from "../src/runner/host";
import { seeded } from "../test/support/random";

const earth = BODIES.find((b) => b.name === "Earth")!;
const GM = earth.gm.value;
const R = earth.equatorialRadius.value;
const ALTITUDES = Array.from({ length: 50 }, (_, i) => 300 + (500 * i) / 49);
const BS = Array.from({ length: 20 }, (_, j) => 10 * 20 ** (j / 19));
const FLUX = 150;

const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[xs.length >> 1];
const msOf = (fn: () => unknown): [number, unknown] => {
  const t0 = process.hrtime.bigint();
  const out = fn();
  return [Number(process.hrtime.bigint() - t0) / 1e6, out];
};

/** Synthetic monthly flux rows (Excel serials from 2027-01-01, 30 years): a smooth 11-year cycle between 70 and 200 sfu. */
function syntheticForecast(): number[][] {
  const rows: number[][] = [];
  for (let m = 0; m < 360; m++) rows.push([46388 + m * 30.4375, 135 - 65 * Math.cos((2 * Math.PI * m) / 132)]);
  return rows;
}

export async function benchLifetime(): Promise<Record<string, number | string>> {
  const bundle = loadBundle(resolve(process.cwd(), "dist"));
  const lifetime = bundle.functions.get("ORBIT_LIFETIME")!;
  const kepler = bundle.functions.get("SOLVE_ECCENTRIC_ANOMALY")!;
  const perigees = ALTITUDES.map((h) => [h]);
  const apogees = ALTITUDES.map((h) => [h + 300]);
  const bRow = [BS];
  const flux = [[FLUX]];
  const forecast = syntheticForecast();
  const start = [[46388]];

  // nothing earlier in this bundle has used the density model, so the first call builds its profile
  const [coldMs, first] = msOf(() => lifetime(perigees, perigees, bRow, flux));
  const table = first as unknown[][];
  let capped = 0;
  let longest = 0;
  let bad = 0;
  for (const r of table)
    for (const c of r) {
      if (isCellError(c)) capped++;
      else if (typeof c === "number" && Number.isFinite(c)) longest = Math.max(longest, c);
      else bad++;
    }
  lifetime(perigees, perigees, bRow, forecast, start); // builds the forecast's profiles

  const rand = seeded(1401);
  const column = Array.from({ length: 1000 }, () => [rand() * 360]);
  const eccs = Array.from({ length: 1000 }, () => [rand() * 0.999]);
  const M = Float64Array.from(column, (r) => (r[0] * Math.PI) / 180);
  const e = Float64Array.from(eccs, (r) => r[0]);

  const circ: number[] = [];
  const ecc: number[] = [];
  const fore: number[] = [];
  const foreEcc: number[] = [];
  const core: number[] = [];
  const keplerLifted: number[] = [];
  const keplerCore: number[] = [];
  let sink = 0;
  for (let rep = 0; rep < 5; rep++) {
    circ.push(msOf(() => lifetime(perigees, perigees, bRow, flux))[0]);
    ecc.push(msOf(() => lifetime(perigees, apogees, bRow, flux))[0]);
    fore.push(msOf(() => lifetime(perigees, perigees, bRow, forecast, start))[0]);
    foreEcc.push(msOf(() => lifetime(perigees, apogees, bRow, forecast, start))[0]);
    core.push(
      msOf(() => {
        for (const h of ALTITUDES)
          for (const b of BS) {
            const r = orbitLifetime(GM, R, h, h, b, FLUX, null, null, null);
            if (!isDomainError(r)) sink += r;
          }
      })[0],
    );
    for (let k = 0; k < 20; k++) {
      keplerLifted.push(msOf(() => kepler(column, eccs))[0]);
      keplerCore.push(
        msOf(() => {
          for (let i = 0; i < 1000; i++) sink += solveKeplerElliptic(M[i], e[i]);
        })[0],
      );
    }
  }
  const circMs = median(circ);
  const eccMs = median(ecc);
  const keplerMs = median(keplerLifted.slice(20));
  return {
    "cases (50 perigee altitudes 300-800 km x 20 B 10-200 kg/m^2, NRLMSISE-00, 150 sfu), one lifted call": table.length * (table[0]?.length ?? 0),
    "circular table, ms (median of 5, profile built) (goal < 1000)": Number(circMs.toFixed(1)),
    "eccentric table, apogee 300 km above perigee, ms (median of 5) (goal < 1000)": Number(eccMs.toFixed(1)),
    "first circular call of a session, ms (includes building the 150 sfu profile)": Number(coldMs.toFixed(1)),
    "circular table against a 360-row forecast range, ms (median of 5, profiles built)": Number(median(fore).toFixed(1)),
    "eccentric table against the same forecast, ms (median of 5)": Number(median(foreEcc).toFixed(1)),
    "circular table by the core directly, ms (median of 5)": Number(median(core).toFixed(1)),
    "us per lifetime case (circular / eccentric)": `${circMs.toFixed(0)} / ${eccMs.toFixed(0)}`,
    "cells past the 200-year cap (#N/A)": capped,
    "longest lifetime in the table, years": Number((longest / 365.25).toFixed(1)),
    "1,000 Kepler solves, one lifted call of SOLVE_ECCENTRIC_ANOMALY, ms": Number(keplerMs.toFixed(3)),
    "1,000 Kepler solves, core loop, ms": Number(median(keplerCore.slice(20)).toFixed(4)),
    "circular table / 1,000 lifted Kepler solves": Math.round(circMs / keplerMs),
    "eccentric table / 1,000 lifted Kepler solves": Math.round(eccMs / keplerMs),
    checksum: bad === 0 && Number.isFinite(sink) ? "ok" : "non-finite or unexpected cells",
  };
}

if (process.argv[1] && /bench[\\/]lifetime\.ts$/.test(process.argv[1])) {
  benchLifetime().then((r) => {
    for (const [k, v] of Object.entries(r)) console.log(`${k.padEnd(90)} ${v}`);
  });
}
