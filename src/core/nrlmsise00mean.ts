import { newMsisOutput, nrlmsise00, nrlmsise00Altitudes, STANDARD_SWITCHES, type MsisInput } from "./nrlmsise00";
import { gaussLegendre } from "./quadrature";

/**
 * The global mean of the NRLMSISE-00 drag density at one altitude: the model's "effective total
 * mass density for drag" (GTD7D, anomalous oxygen included) averaged over the sphere (equal
 * area), over local solar time and over the year, for given F10.7, 81-day mean F10.7 and daily
 * Ap. This is the density a first-order lifetime estimate wants: over months an orbit's perigee
 * sweeps through latitudes, local times and seasons, so the mean, not one place, sets the
 * decay. A sun-synchronous orbit keeps one local time and so meets a density up to a factor of
 * about two from this mean at 400-800 km; the mean does not describe it (a caution, not
 * modelled).
 *
 * Quadrature: 6-point Gauss-Legendre in the sine of latitude (area weighting), 6 equally spaced
 * local times and 4 equally spaced days of the year (the trapezoid rule, exact for the
 * model's periodic harmonics up to the 5th and 3rd). The model's UT and longitude terms (switch
 * 10) are off: with no longitude given they have no meaning, and their mean is zero to first
 * order. Against a 16 x 24 x 4 rule the mean agrees to 0.2 % from 100 to 1000 km
 * (test/core/nrlmsise00mean.test.ts), far inside the model's own 15 % or so.
 * Cost: 144 model runs, about 1 ms.
 */

const LATITUDES = (() => {
  const { nodes, weights } = gaussLegendre(6);
  return { lat: Array.from(nodes, (mu) => (Math.asin(mu) * 180) / Math.PI), w: Array.from(weights, (w) => w / 2) };
})();
const LOCAL_TIMES = [0, 4, 8, 12, 16, 20];
const DAYS = [0.5, 1.5, 2.5, 3.5].map((q) => (365.25 * q) / 4);
const MEAN_SWITCHES: readonly number[] = STANDARD_SWITCHES.map((s, i) => (i === 10 ? 0 : s));

const out = newMsisOutput();
const input: MsisInput = { doy: 0, sec: 0, alt: 0, gLat: 0, gLong: 0, lst: 0, f107A: 150, f107: 150, ap: 4 };

/** Global, diurnal and annual mean NRLMSISE-00 drag density, kg/m^3 (inputs taken as checked: altitude 0-1000 km, fluxes in sfu, Ap). */
export function nrlmsise00MeanDensity(altitude: number, f107: number, f107A: number, ap: number): number {
  input.alt = altitude;
  input.f107 = f107;
  input.f107A = f107A;
  input.ap = ap;
  let sum = 0;
  for (const doy of DAYS) {
    input.doy = doy;
    for (let i = 0; i < LATITUDES.lat.length; i++) {
      input.gLat = LATITUDES.lat[i];
      let s = 0;
      for (const lst of LOCAL_TIMES) {
        input.lst = lst;
        s += nrlmsise00(input, out, true, MEAN_SWITCHES).d[5];
      }
      sum += LATITUDES.w[i] * s;
    }
  }
  return sum / (LOCAL_TIMES.length * DAYS.length);
}

/** The same mean at each of `altitudes` (km), into a new array: one model sweep per quadrature node, so several times cheaper than altitude by altitude. */
export function nrlmsise00MeanDensities(altitudes: ArrayLike<number>, f107: number, f107A: number, ap: number): Float64Array {
  const sum = new Float64Array(altitudes.length);
  const rho = new Float64Array(altitudes.length);
  input.f107 = f107;
  input.f107A = f107A;
  input.ap = ap;
  for (const doy of DAYS) {
    input.doy = doy;
    for (let i = 0; i < LATITUDES.lat.length; i++) {
      input.gLat = LATITUDES.lat[i];
      for (const lst of LOCAL_TIMES) {
        input.lst = lst;
        nrlmsise00Altitudes(input, altitudes, rho, true, MEAN_SWITCHES);
        for (let k = 0; k < rho.length; k++) sum[k] += LATITUDES.w[i] * rho[k];
      }
    }
  }
  const n = LOCAL_TIMES.length * DAYS.length;
  for (let k = 0; k < sum.length; k++) sum[k] /= n;
  return sum;
}
