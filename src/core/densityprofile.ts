import { CubicSpline } from "./cubicspline";
import { PDL } from "./nrlmsise00data";
import { EXPONENTIAL_TABLE, exponentialDensity, exponentialScaleHeight } from "./exponentialatmosphere";
import { nrlmsise00MeanDensities } from "./nrlmsise00mean";

/**
 * Density as a fast function of altitude for the lifetime integration, which asks for it
 * hundreds of thousands of times per orbit: the exponential model directly, NRLMSISE-00's
 * global mean (nrlmsise00mean.ts) as natural cubic splines through ln(rho) (2.5 km spacing from 60
 * to 130 km, 5 km to 200 km, 20 km to 1000 km; split at the model's own joins at 72.5 and
 * 123.4 km), continued above 1000 km with the 1000 km scale height (a constant-scale-height
 * extrapolation; the drag there is a small fraction of the perigee's for any orbit that decays).
 * The splines reproduce the mean density to 0.05 % above 130 km and 0.4 % from 60 to 130 km
 * (test/core/densityprofile.test.ts).
 *
 * For a solar flux that changes with time, profiles are kept at F10.7 = F10.7A = 40, 50, ...,
 * 500 sfu and ln(rho) interpolated by a cubic through the four nearest, good to 0.05 % (same
 * test). Profiles are built on first use (84 altitudes x 144 model runs, some 50 ms) and kept,
 * the most recent 48 of them.
 */

export type AtmosphereModelName = "exponential" | "nrlmsise-00";

/** Lowest altitude (km) a profile describes; end altitudes below it are refused. */
export const PROFILE_FLOOR = 60;

export interface DensityProfile {
  /** Density, kg/m^3, at altitude km (>= PROFILE_FLOOR). */
  density(altitude: number): number;
  /** Altitudes (km, ascending) where the density has a corner or a small step. */
  readonly breaks: readonly number[];
  /** Local scale height -1 / (d ln rho / dh), km. */
  scaleHeight(altitude: number): number;
}

const EXPONENTIAL_PROFILE: DensityProfile = {
  density: (h) => exponentialDensity(Math.max(h, 0)),
  breaks: EXPONENTIAL_TABLE.map((row) => row[0]),
  scaleHeight: (h) => exponentialScaleHeight(Math.max(h, 0)),
};

// 2.5 km steps to 130 km, 5 km to 200 km, 20 km above. The model's ln(rho) has a kink where its
// lower atmosphere blends in (72.5 km) and at the base of its Bates profile (PDL[1][15] =
// 123.4 km): the spline is split there, one natural spline per piece.
const BREAKS: readonly number[] = [72.5, PDL[1][15]];
const GRID: readonly number[] = (() => {
  const g: number[] = [];
  for (let h = PROFILE_FLOOR; h < 130; h += 2.5) g.push(h);
  for (let h = 130; h < 200; h += 5) g.push(h);
  for (let h = 200; h <= 1000; h += 20) g.push(h);
  for (const b of BREAKS) if (!g.includes(b)) g.push(b);
  return g.sort((a, b) => a - b);
})();

const TABLE_STEP = 0.5;
const TABLE_TOP = 1000;
const BREAK_CELLS = (() => {
  const flags = new Uint8Array(Math.round((TABLE_TOP - PROFILE_FLOOR) / TABLE_STEP) + 1);
  for (const b of BREAKS) flags[Math.floor((b - PROFILE_FLOOR) / TABLE_STEP)] = 1;
  return flags;
})();

class SplineProfile implements DensityProfile {
  readonly breaks = BREAKS;
  private readonly pieces: CubicSpline[];
  constructor(f107: number, f107A: number, ap: number) {
    const lnRho = Array.from(nrlmsise00MeanDensities(GRID, f107, f107A, ap), Math.log);
    const edges = [GRID[0], ...BREAKS, GRID[GRID.length - 1]];
    this.pieces = edges.slice(1).map((hi, i) => {
      const idx = GRID.map((_, k) => k).filter((k) => GRID[k] >= edges[i] && GRID[k] <= hi);
      return new CubicSpline(idx.map((k) => GRID[k]), idx.map((k) => lnRho[k]));
    });
    this.tabulate();
  }
  private piece(h: number): CubicSpline {
    return h < BREAKS[0] ? this.pieces[0] : h < BREAKS[1] ? this.pieces[1] : this.pieces[2];
  }
  // For speed the splines are also tabulated every TABLE_STEP km (value and slope) and read back by
  // cubic Hermite interpolation, which needs no search; its error, step^4 / 384 times the fourth
  // derivative of ln(rho), is below 1e-7 of the density. Cells holding a break use the splines.
  private tableValue = new Float64Array(0);
  private tableSlope = new Float64Array(0);
  private tabulate(): void {
    const n = Math.round((TABLE_TOP - PROFILE_FLOOR) / TABLE_STEP) + 1;
    this.tableValue = new Float64Array(n);
    this.tableSlope = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const h = PROFILE_FLOOR + i * TABLE_STEP;
      this.tableValue[i] = this.piece(h).value(h);
      this.tableSlope[i] = this.piece(h).slope(h);
    }
  }
  /** ln(rho / (kg/m^3)) at altitude h km. */
  logDensity(h: number): number {
    const u = (h - PROFILE_FLOOR) / TABLE_STEP;
    const i = Math.floor(u);
    if (i < 0 || i >= this.tableValue.length - 1 || BREAK_CELLS[i] === 1) return this.piece(h).value(h);
    const t = u - i;
    const t2 = t * t;
    const t3 = t2 * t;
    const v = this.tableValue;
    const d = this.tableSlope;
    return (2 * t3 - 3 * t2 + 1) * v[i] + (t3 - 2 * t2 + t) * TABLE_STEP * d[i] + (3 * t2 - 2 * t3) * v[i + 1] + (t3 - t2) * TABLE_STEP * d[i + 1];
  }
  /** d ln(rho) / dh, 1/km. */
  logSlope(h: number): number {
    return this.piece(h).slope(h);
  }
  // arrow properties, so the methods can be handed on detached from the object
  readonly density = (h: number): number => Math.exp(this.logDensity(h));
  readonly scaleHeight = (h: number): number => -1 / this.logSlope(h);
}

const CACHE_SIZE = 48;
const cache = new Map<string, SplineProfile>();

function cachedProfile(f107: number, f107A: number, ap: number): SplineProfile {
  const key = `${f107}|${f107A}|${ap}`;
  let p = cache.get(key);
  if (p) {
    cache.delete(key);
  } else {
    p = new SplineProfile(f107, f107A, ap);
    if (cache.size >= CACHE_SIZE) cache.delete(cache.keys().next().value!);
  }
  cache.set(key, p);
  return p;
}

/** Density profile of the model at fixed activity (fluxes in sfu, daily Ap); inputs taken as checked. */
export function densityProfile(model: AtmosphereModelName, f107: number, f107A: number, ap: number): DensityProfile {
  return model === "exponential" ? EXPONENTIAL_PROFILE : cachedProfile(f107, f107A, ap);
}

/** Density as a function of altitude and of a flux that stands for both F10.7 and its 81-day mean. */
export interface FluxDependentDensity {
  density(altitude: number, flux: number): number;
  readonly breaks: readonly number[];
  scaleHeight(altitude: number, flux: number): number;
}

export const FLUX_NODE_FIRST = 40;
export const FLUX_NODE_STEP = 10;
export const FLUX_NODE_LAST = 500;

/** The model's density for a flux that varies with time (F10.7 = F10.7A = flux, sfu in [40, 500]), at daily Ap `ap`. */
export function fluxDependentDensity(model: AtmosphereModelName, ap: number): FluxDependentDensity {
  if (model === "exponential") return { density: (h) => EXPONENTIAL_PROFILE.density(h), scaleHeight: (h) => EXPONENTIAL_PROFILE.scaleHeight(h), breaks: EXPONENTIAL_PROFILE.breaks };
  const lastStart = (FLUX_NODE_LAST - FLUX_NODE_FIRST) / FLUX_NODE_STEP - 3;
  const weights = new Float64Array(4);
  // Cubic Lagrange interpolation in flux through four neighbouring profiles (the two that bracket
  // the flux and one either side; the end four at the ends of the node range).
  const nodes = (flux: number): SplineProfile[] => {
    const u = (Math.min(Math.max(flux, FLUX_NODE_FIRST), FLUX_NODE_LAST) - FLUX_NODE_FIRST) / FLUX_NODE_STEP;
    const k = Math.min(Math.max(Math.floor(u) - 1, 0), lastStart);
    const t = u - k;
    weights[0] = (-(t - 1) * (t - 2) * (t - 3)) / 6;
    weights[1] = (t * (t - 2) * (t - 3)) / 2;
    weights[2] = (-t * (t - 1) * (t - 3)) / 2;
    weights[3] = (t * (t - 1) * (t - 2)) / 6;
    const f = (j: number) => FLUX_NODE_FIRST + (k + j) * FLUX_NODE_STEP;
    return [0, 1, 2, 3].map((j) => cachedProfile(f(j), f(j), ap));
  };
  return {
    breaks: BREAKS,
    density(h, flux) {
      const p = nodes(flux);
      return Math.exp(weights[0] * p[0].logDensity(h) + weights[1] * p[1].logDensity(h) + weights[2] * p[2].logDensity(h) + weights[3] * p[3].logDensity(h));
    },
    scaleHeight(h, flux) {
      const p = nodes(flux);
      return -1 / (weights[0] * p[0].logSlope(h) + weights[1] * p[1].logSlope(h) + weights[2] * p[2].logSlope(h) + weights[3] * p[3].logSlope(h));
    },
  };
}
