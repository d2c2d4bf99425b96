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
 * For the lifetime integration, whose flux stands for both F10.7 and its 81-day mean, profiles
 * are kept at the nodes F10.7 = F10.7A = 40, 50, ..., 500 sfu and ln(rho) between them
 * interpolated in flux by a cubic through the four nearest nodes, good to 0.05 % (same test):
 * for a flux that changes with time, node by node as it goes; for a constant flux off the nodes,
 * once, into a blended profile. So a sheet asking for many flux values builds at most the 47
 * node profiles, not one per value. Profiles are built on first use (84 altitudes x 144 model
 * runs, some 50-100 ms each) and kept, the most recent 48 of them.
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
/** Cells of the table (one fewer than its altitudes). */
const TABLE_CELLS = Math.round((TABLE_TOP - PROFILE_FLOOR) / TABLE_STEP);
const BREAK_CELLS = (() => {
  const flags = new Uint8Array(Math.round((TABLE_TOP - PROFILE_FLOOR) / TABLE_STEP) + 1);
  for (const b of BREAKS) flags[Math.floor((b - PROFILE_FLOOR) / TABLE_STEP)] = 1;
  return flags;
})();

// Cubic Hermite basis (value, slope x step, value, slope x step) of the last cell found.
const basis = new Float64Array(4);

/** The table cell holding altitude h, with its Hermite basis written to `basis`; -1 in a cell holding a break or outside the table. */
function hermiteCell(h: number): number {
  const u = (h - PROFILE_FLOOR) / TABLE_STEP;
  const i = Math.floor(u);
  if (!(i >= 0 && i < TABLE_CELLS) || BREAK_CELLS[i] === 1) return -1;
  const t = u - i;
  const t2 = t * t;
  const t3 = t2 * t;
  basis[0] = 2 * t3 - 3 * t2 + 1;
  basis[1] = (t3 - 2 * t2 + t) * TABLE_STEP;
  basis[2] = 3 * t2 - 2 * t3;
  basis[3] = (t3 - t2) * TABLE_STEP;
  return i;
}

/**
 * ln(rho) read from a table of values and slopes every TABLE_STEP km by cubic Hermite
 * interpolation; NaN in a cell holding a break or outside the table, where the caller falls back
 * to the splines.
 */
function tabulated(v: Float64Array, d: Float64Array, h: number): number {
  const i = hermiteCell(h);
  return i < 0 ? Number.NaN : basis[0] * v[i] + basis[1] * d[i] + basis[2] * v[i + 1] + basis[3] * d[i + 1];
}

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
  // (read directly by the blends of profiles below)
  tableValue = new Float64Array(0);
  tableSlope = new Float64Array(0);
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
    const v = tabulated(this.tableValue, this.tableSlope, h);
    return v === v ? v : this.piece(h).value(h);
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
const LAST_START = (FLUX_NODE_LAST - FLUX_NODE_FIRST) / FLUX_NODE_STEP - 3;

/**
 * Cubic Lagrange interpolation in flux through four neighbouring node profiles (the two that
 * bracket the flux and one either side; the end four at the ends of the node range): writes the
 * four weights and returns the index of the first node. At a node the weights are exactly 0, 1, 0, 0.
 */
function nodeWeights(flux: number, weights: Float64Array): number {
  const u = (Math.min(Math.max(flux, FLUX_NODE_FIRST), FLUX_NODE_LAST) - FLUX_NODE_FIRST) / FLUX_NODE_STEP;
  const k = Math.min(Math.max(Math.floor(u) - 1, 0), LAST_START);
  const t = u - k;
  weights[0] = (-(t - 1) * (t - 2) * (t - 3)) / 6;
  weights[1] = (t * (t - 2) * (t - 3)) / 2;
  weights[2] = (-t * (t - 1) * (t - 3)) / 2;
  weights[3] = (t * (t - 1) * (t - 2)) / 6;
  return k;
}

const nodeFlux = (k: number): number => FLUX_NODE_FIRST + k * FLUX_NODE_STEP;

/** A profile between the nodes: ln(rho) and its slope the weighted sums of four node profiles', tabulated once. */
class BlendedProfile implements DensityProfile {
  readonly breaks = BREAKS;
  private readonly tableValue = new Float64Array(TABLE_CELLS + 1);
  private readonly tableSlope = new Float64Array(TABLE_CELLS + 1);
  constructor(
    private readonly nodes: readonly SplineProfile[],
    private readonly weights: Float64Array,
  ) {
    for (let j = 0; j < 4; j++) {
      const v = nodes[j].tableValue;
      const d = nodes[j].tableSlope;
      for (let i = 0; i <= TABLE_CELLS; i++) {
        this.tableValue[i] += weights[j] * v[i];
        this.tableSlope[i] += weights[j] * d[i];
      }
    }
  }
  logDensity(h: number): number {
    const v = tabulated(this.tableValue, this.tableSlope, h);
    if (v === v) return v;
    const w = this.weights;
    const p = this.nodes;
    return w[0] * p[0].logDensity(h) + w[1] * p[1].logDensity(h) + w[2] * p[2].logDensity(h) + w[3] * p[3].logDensity(h);
  }
  logSlope(h: number): number {
    const w = this.weights;
    const p = this.nodes;
    return w[0] * p[0].logSlope(h) + w[1] * p[1].logSlope(h) + w[2] * p[2].logSlope(h) + w[3] * p[3].logSlope(h);
  }
  readonly density = (h: number): number => Math.exp(this.logDensity(h));
  readonly scaleHeight = (h: number): number => -1 / this.logSlope(h);
}

const blends = new Map<string, BlendedProfile>();

/**
 * The profile a lifetime at a constant flux follows (F10.7 = F10.7A = flux, sfu in [40, 500], daily
 * Ap `ap`): a node profile itself when the flux is a node, else the blend of the four nodes around
 * it (cached, the most recent 48).
 */
export function constantFluxProfile(model: AtmosphereModelName, flux: number, ap: number): DensityProfile {
  if (model === "exponential") return EXPONENTIAL_PROFILE;
  const weights = new Float64Array(4);
  const k = nodeWeights(flux, weights);
  for (let j = 0; j < 4; j++) if (weights[j] === 1) return cachedProfile(nodeFlux(k + j), nodeFlux(k + j), ap);
  const key = `${flux}|${ap}`;
  let p = blends.get(key);
  if (p) blends.delete(key);
  else {
    p = new BlendedProfile([0, 1, 2, 3].map((j) => cachedProfile(nodeFlux(k + j), nodeFlux(k + j), ap)), weights);
    if (blends.size >= CACHE_SIZE) blends.delete(blends.keys().next().value!);
  }
  blends.set(key, p);
  return p;
}

/** The model's density for a flux that varies with time (F10.7 = F10.7A = flux, sfu in [40, 500]), at daily Ap `ap`. */
export function fluxDependentDensity(model: AtmosphereModelName, ap: number): FluxDependentDensity {
  if (model === "exponential") return { density: (h) => EXPONENTIAL_PROFILE.density(h), scaleHeight: (h) => EXPONENTIAL_PROFILE.scaleHeight(h), breaks: EXPONENTIAL_PROFILE.breaks };
  const weights = new Float64Array(4);
  // The node profiles, fetched from the cache on first use and held here; and the four in use
  // with their weights for the flux asked last (an integration asks for one flux hundreds of
  // times in a row: every density along the orbit at one instant).
  const held: (SplineProfile | undefined)[] = new Array(LAST_START + 4);
  const inUse: SplineProfile[] = new Array(4);
  let lastFlux = Number.NaN;
  const nodes = (flux: number): SplineProfile[] => {
    if (flux === lastFlux) return inUse;
    const k = nodeWeights(flux, weights);
    for (let j = 0; j < 4; j++) inUse[j] = held[k + j] ??= cachedProfile(nodeFlux(k + j), nodeFlux(k + j), ap);
    lastFlux = flux;
    return inUse;
  };
  return {
    breaks: BREAKS,
    density(h, flux) {
      const p = nodes(flux);
      // the four profiles share their table's cells: one Hermite basis serves them all
      const i = hermiteCell(h);
      if (i < 0) return Math.exp(weights[0] * p[0].logDensity(h) + weights[1] * p[1].logDensity(h) + weights[2] * p[2].logDensity(h) + weights[3] * p[3].logDensity(h));
      let sum = 0;
      for (let j = 0; j < 4; j++) {
        const v = p[j].tableValue;
        const d = p[j].tableSlope;
        sum += weights[j] * (basis[0] * v[i] + basis[1] * d[i] + basis[2] * v[i + 1] + basis[3] * d[i + 1]);
      }
      return Math.exp(sum);
    },
    scaleHeight(h, flux) {
      const p = nodes(flux);
      return -1 / (weights[0] * p[0].logSlope(h) + weights[1] * p[1].logSlope(h) + weights[2] * p[2].logSlope(h) + weights[3] * p[3].logSlope(h));
    },
  };
}
