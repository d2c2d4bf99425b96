import { PAVGM, PD, PDL, PDM, PMA, PS, PT, PTL, PTM } from "./nrlmsise00data";

/**
 * The NRLMSISE-00 empirical model of the neutral atmosphere, surface to 1000 km: number densities
 * of He, O, N2, O2, Ar, H, N and anomalous ("hot") oxygen, the total mass density and the
 * temperatures, for a place, a time and the solar and geomagnetic activity.
 *
 * Method: Picone, Hedin, Drob and Aikin, J. Geophys. Res. 107(A12), 1468 (2002), which revises
 * MSISE-90 (Hedin, J. Geophys. Res. 96, 1159, 1991). Bates temperature profile above about
 * 120 km, spline temperature profiles below, diffusive and mixed densities joined at the
 * turbopause, with chemistry and dissociation corrections; the variations with time, place and
 * activity are spherical-harmonic expansions ("G(L)" functions) whose coefficients are the data
 * in nrlmsise00data.ts. Written here in TypeScript from the NRL FORTRAN distribution (public
 * domain), following the routine structure of D. Brodowski's C release (GTD7, GTD7D, GTS7,
 * GLOBE7, GLOB7S, DENSU, DENSM and the Numerical Recipes splines). Each routine below keeps the
 * distribution's name so the two can be read side by side.
 *
 * Accuracy: reproduces the distribution's 17 reference outputs to their printed 7 digits (see
 * test/core/nrlmsise00.test.ts); the model itself describes measured densities to roughly 15 %
 * (1 sigma) in the thermosphere, and much worse during storms.
 *
 * Inputs (NRLMSISE-00 conventions): day of year; UT seconds of the day; altitude km (geodetic);
 * geodetic latitude and longitude deg; local apparent solar time h; F10.7 of the previous day
 * and its 81-day average centred on the day, both in solar flux units (1e-22 W m^-2 Hz^-1) as
 * observed at the Earth's distance (not adjusted to 1 au); daily Ap, or (switch 9 = -1) the
 * 7-value Ap history. Outputs in SI: m^-3 and kg/m^3, kelvin.
 *
 * The routines share working values (the distribution's COMMON blocks); they live in module
 * scratch below and are fully rewritten by each call, so `nrlmsise00` is a pure function of its
 * arguments. It allocates nothing per call.
 */

export interface MsisInput {
  doy: number;
  /** UT, seconds of the day. */
  sec: number;
  /** Altitude, km. */
  alt: number;
  /** Geodetic latitude, deg. */
  gLat: number;
  /** Geodetic longitude, deg. */
  gLong: number;
  /** Local apparent solar time, h. */
  lst: number;
  /** 81-day average F10.7 centred on the day, sfu. */
  f107A: number;
  /** Daily F10.7 of the previous day, sfu. */
  f107: number;
  /** Daily Ap. */
  ap: number;
  /** Ap history (switch 9 = -1): daily Ap, 3-h ap now, 3 h, 6 h and 9 h before, mean of 12-33 h and of 36-57 h before. */
  apArray?: readonly number[];
}

export interface MsisOutput {
  /** Number densities m^-3: [He, O, N2, O2, Ar, total mass (kg/m^3), H, N, anomalous O]. */
  d: Float64Array;
  /** [exospheric temperature, temperature at altitude], K. */
  t: Float64Array;
}

/** The model's 24 switches: index 0 unused here (output is always SI), 1-23 as the distribution documents them (1 on, 0 off, 2 main effect off but cross terms on; switch 9 = -1 takes the Ap history). */
export const STANDARD_SWITCHES: readonly number[] = [0, ...Array<number>(23).fill(1)];

export function newMsisOutput(): MsisOutput {
  return { d: new Float64Array(9), t: new Float64Array(2) };
}

// ---- shared working values (COMMON blocks PARMB, GTS3C, DMIX, MESO7, LPOLY, CSW) ----
let gsurf = 0;
let re = 0;
let dm28 = 0;
const mesoTn1 = new Float64Array(5);
const mesoTn2 = new Float64Array(4);
const mesoTn3 = new Float64Array(5);
const mesoTgn1 = new Float64Array(2);
const mesoTgn2 = new Float64Array(2);
const mesoTgn3 = new Float64Array(2);
let dfa = 0;
const plg = [new Float64Array(9), new Float64Array(9), new Float64Array(9), new Float64Array(9)];
let ctloc = 0;
let stloc = 0;
let c2tloc = 0;
let s2tloc = 0;
let s3tloc = 0;
let c3tloc = 0;
let apdf = 0;
let apt0 = 0;
const sw = new Float64Array(24);
const swc = new Float64Array(24);
const soutput = newMsisOutput();
const splineU = new Float64Array(10);
const xs = new Float64Array(10);
const ys = new Float64Array(10);
const y2out = new Float64Array(10);

const DGTR = 1.74533e-2;
const DR = 1.72142e-2;
const HR = 0.2618;
const SR = 7.2722e-5;
const RGAS = 831.4;

// Number density cm^-3 to m^-3, and the distribution's mass unit 1.66e-24 g per amu.
const CM3_TO_M3 = 1e6;
const AMU_G = 1.66e-24;

function tselec(switches: readonly number[]): void {
  for (let i = 0; i < 24; i++) {
    if (i !== 9) {
      sw[i] = switches[i] === 1 ? 1 : 0;
      swc[i] = switches[i] > 0 ? 1 : 0;
    } else {
      sw[i] = switches[i];
      swc[i] = switches[i];
    }
  }
}

/** Gravity at the latitude (cm/s^2) and the effective Earth radius (km) the model uses. */
function glatf(lat: number): void {
  const c2 = Math.cos(2 * DGTR * lat);
  gsurf = 980.616 * (1 - 0.0026373 * c2);
  re = ((2 * gsurf) / (3.085462e-6 + 2.27e-9 * c2)) * 1e-5;
}

/** Chemistry / dissociation correction. */
function ccor(alt: number, r: number, h1: number, zh: number): number {
  const e = (alt - zh) / h1;
  if (e > 70) return 1;
  if (e < -70) return Math.exp(r);
  return Math.exp(r / (1 + Math.exp(e)));
}

/** Chemistry / dissociation correction with two scale lengths. */
function ccor2(alt: number, r: number, h1: number, zh: number, h2: number): number {
  const e1 = (alt - zh) / h1;
  const e2 = (alt - zh) / h2;
  if (e1 > 70 || e2 > 70) return 1;
  if (e1 < -70 && e2 < -70) return Math.exp(r);
  return Math.exp(r / (1 + 0.5 * (Math.exp(e1) + Math.exp(e2))));
}

function scalh(alt: number, xm: number, temp: number): number {
  const g = gsurf / ((1 + alt / re) * (1 + alt / re));
  return (RGAS * temp) / (g * xm);
}

/** Turbopause correction: joins the diffusive density dd and the fully mixed density dm. */
function dnet(dd: number, dm: number, zhm: number, xmm: number, xm: number): number {
  const a = zhm / (xmm - xm);
  if (!(dm > 0 && dd > 0)) {
    if (dd === 0 && dm === 0) dd = 1;
    if (dm === 0) return dd;
    if (dd === 0) return dm;
  }
  const ylog = a * Math.log(dm / dd);
  if (ylog < -10) return dd;
  if (ylog > 10) return dm;
  return dd * Math.pow(1 + Math.exp(ylog), 1 / a);
}

/** Integral of the cubic spline from xa[0] to x (Numerical Recipes, as adapted by the distribution). */
function splini(xa: Float64Array, ya: Float64Array, y2a: Float64Array, n: number, x: number): number {
  let yi = 0;
  let klo = 0;
  let khi = 1;
  while (x > xa[klo] && khi < n) {
    let xx = x;
    if (khi < n - 1) xx = x < xa[khi] ? x : xa[khi];
    const h = xa[khi] - xa[klo];
    const a = (xa[khi] - xx) / h;
    const b = (xx - xa[klo]) / h;
    const a2 = a * a;
    const b2 = b * b;
    yi += ((1 - a2) * ya[klo] / 2 + (b2 * ya[khi]) / 2 + ((-(1 + a2 * a2) / 4 + a2 / 2) * y2a[klo] + ((b2 * b2) / 4 - b2 / 2) * y2a[khi]) * ((h * h) / 6)) * h;
    klo++;
    khi++;
  }
  return yi;
}

/** Cubic spline value (Numerical Recipes splint). */
function splint(xa: Float64Array, ya: Float64Array, y2a: Float64Array, n: number, x: number): number {
  let klo = 0;
  let khi = n - 1;
  while (khi - klo > 1) {
    const k = (khi + klo) >> 1;
    if (xa[k] > x) khi = k;
    else klo = k;
  }
  const h = xa[khi] - xa[klo];
  const a = (xa[khi] - x) / h;
  const b = (x - xa[klo]) / h;
  return a * ya[klo] + b * ya[khi] + ((a * a * a - a) * y2a[klo] + (b * b * b - b) * y2a[khi]) * ((h * h) / 6);
}

/** Second derivatives of the cubic spline (Numerical Recipes spline); end slopes >= 1e30 mean natural ends. */
function spline(x: Float64Array, y: Float64Array, n: number, yp1: number, ypn: number, y2: Float64Array): void {
  const u = splineU;
  if (yp1 > 0.99e30) {
    y2[0] = 0;
    u[0] = 0;
  } else {
    y2[0] = -0.5;
    u[0] = (3 / (x[1] - x[0])) * ((y[1] - y[0]) / (x[1] - x[0]) - yp1);
  }
  for (let i = 1; i < n - 1; i++) {
    const sig = (x[i] - x[i - 1]) / (x[i + 1] - x[i - 1]);
    const p = sig * y2[i - 1] + 2;
    y2[i] = (sig - 1) / p;
    u[i] = ((6 * ((y[i + 1] - y[i]) / (x[i + 1] - x[i]) - (y[i] - y[i - 1]) / (x[i] - x[i - 1]))) / (x[i + 1] - x[i - 1]) - sig * u[i - 1]) / p;
  }
  let qn = 0;
  let un = 0;
  if (!(ypn > 0.99e30)) {
    qn = 0.5;
    un = (3 / (x[n - 1] - x[n - 2])) * (ypn - (y[n - 1] - y[n - 2]) / (x[n - 1] - x[n - 2]));
  }
  y2[n - 1] = (un - qn * u[n - 2]) / (qn * y2[n - 2] + 1);
  for (let k = n - 2; k >= 0; k--) y2[k] = y2[k] * y2[k + 1] + u[k];
}

/** Geopotential height difference. */
const zeta = (zz: number, zl: number): number => ((zz - zl) * (re + zl)) / (re + zz);

// Results of the last layerTemperature call besides the temperature it returns.
let layerX = 0;
let layerZgdif = 0;
let layerT1 = 0;

/** Temperature at altitude from one spline layer; leaves the spline in xs, ys, y2out for the density integral. */
function layerTemperature(z: number, mn: number, zn: readonly number[], tn: Float64Array, tgn: Float64Array): number {
  const z1 = zn[0];
  const z2 = zn[mn - 1];
  const t1 = tn[0];
  const t2 = tn[mn - 1];
  const zg = zeta(z, z1);
  const zgdif = zeta(z2, z1);
  for (let k = 0; k < mn; k++) {
    xs[k] = zeta(zn[k], z1) / zgdif;
    ys[k] = 1 / tn[k];
  }
  const yd1 = (-tgn[0] / (t1 * t1)) * zgdif;
  const yd2 = (-tgn[1] / (t2 * t2)) * zgdif * ((re + z2) / (re + z1)) ** 2;
  spline(xs, ys, mn, yd1, yd2, y2out);
  layerX = zg / zgdif;
  layerZgdif = zgdif;
  layerT1 = t1;
  return 1 / splint(xs, ys, y2out, mn, layerX);
}

let densmTz = 0;

/** Density d carried through one spline layer ending at altitude z (temperature set in densmTz). */
function densmLayer(z: number, d: number, xm: number, mn: number, zn: readonly number[], tn: Float64Array, tgn: Float64Array): number {
  densmTz = layerTemperature(z, mn, zn, tn, tgn);
  if (xm === 0) return d;
  const glb = gsurf / (1 + zn[0] / re) ** 2;
  const gamm = (xm * glb * layerZgdif) / RGAS;
  const expl = Math.min(gamm * splini(xs, ys, y2out, mn, layerX), 50);
  return d * (layerT1 / densmTz) * Math.exp(-expl);
}

/** Temperature (xm = 0) or density profile of the stratosphere and mesosphere (below 72.5 km). */
function densm(alt: number, d0: number, xm: number, mn3: number, zn3: readonly number[], tn3: Float64Array, tgn3: Float64Array, mn2: number, zn2: readonly number[], tn2: Float64Array, tgn2: Float64Array): number {
  if (alt > zn2[0]) return xm === 0 ? densmTz : d0;
  let d = densmLayer(alt > zn2[mn2 - 1] ? alt : zn2[mn2 - 1], d0, xm, mn2, zn2, tn2, tgn2);
  if (alt <= zn3[0]) d = densmLayer(alt, d, xm, mn3, zn3, tn3, tgn3);
  return xm === 0 ? densmTz : d;
}

let densuTz = 0;
const ZN1 = [120.0, 110.0, 100.0, 90.0, 72.5];

/** Temperature (xm = 0) or density profile of the thermosphere: Bates profile above ZA, spline below. */
function densu(alt: number, dlb: number, tinf: number, tlb: number, xm: number, alpha: number, zlb: number, s2: number, mn1: number, zn1: readonly number[], tn1: Float64Array, tgn1: Float64Array): number {
  const za = zn1[0];
  const z = alt > za ? alt : za;
  const zg2 = zeta(z, zlb);
  const tt = tinf - (tinf - tlb) * Math.exp(-s2 * zg2);
  const ta = tt;
  densuTz = tt;
  let densuTemp = densuTz;
  let x = 0;
  let zgdif = 0;
  let t1 = 0;
  let mn = 0;

  if (alt < za) {
    const dta = (tinf - ta) * s2 * ((re + zlb) / (re + za)) ** 2;
    tgn1[0] = dta;
    tn1[0] = ta;
    const zLower = alt > zn1[mn1 - 1] ? alt : zn1[mn1 - 1];
    mn = mn1;
    densuTz = layerTemperature(zLower, mn, zn1, tn1, tgn1);
    x = layerX;
    zgdif = layerZgdif;
    t1 = layerT1;
    densuTemp = densuTz;
  }
  if (xm === 0) return densuTemp;

  let glb = gsurf / (1 + zlb / re) ** 2;
  const gamma = (xm * glb) / (s2 * RGAS * tinf);
  let expl = Math.exp(-s2 * gamma * zg2);
  if (expl > 50 || tt <= 0) expl = 50;
  const densa = dlb * Math.pow(tlb / tt, 1 + alpha + gamma) * expl;
  densuTemp = densa;
  if (alt >= za) return densuTemp;

  glb = gsurf / (1 + zn1[0] / re) ** 2;
  const gamm = (xm * glb * zgdif) / RGAS;
  expl = gamm * splini(xs, ys, y2out, mn, x);
  if (expl > 50 || densuTz <= 0) expl = 50;
  return densuTemp * Math.pow(t1 / densuTz, 1 + alpha) * Math.exp(-expl);
}

/** 3-hour magnetic activity functions (Hedin 1991 eq. A24a-d). */
function g0(a: number, p: readonly number[]): number {
  const p24 = Math.abs(p[24] < 1e-4 ? 1e-4 : p[24]);
  return a - 4 + (p[25] - 1) * (a - 4 + (Math.exp(-p24 * (a - 4)) - 1) / p24);
}
const sumex = (ex: number): number => 1 + ((1 - ex ** 19) / (1 - ex)) * Math.sqrt(ex);
function sg0(ex: number, p: readonly number[], ap: readonly number[]): number {
  return (g0(ap[1], p) + (g0(ap[2], p) * ex + g0(ap[3], p) * ex * ex + g0(ap[4], p) * ex ** 3 + (g0(ap[5], p) * ex ** 4 + g0(ap[6], p) * ex ** 12) * ((1 - ex ** 8) / (1 - ex)))) / sumex(ex);
}

/** Legendre functions of the latitude and the local-time harmonics, shared by every G(L) of one call. */
function legendreAndLocalTime(input: MsisInput): void {
  const c = Math.sin(input.gLat * DGTR);
  const s = Math.cos(input.gLat * DGTR);
  const c2 = c * c;
  const c4 = c2 * c2;
  const s2 = s * s;
  const [p0, p1, p2, p3] = plg;
  p0[1] = c;
  p0[2] = 0.5 * (3 * c2 - 1);
  p0[3] = 0.5 * (5 * c * c2 - 3 * c);
  p0[4] = (35 * c4 - 30 * c2 + 3) / 8;
  p0[5] = (63 * c2 * c2 * c - 70 * c2 * c + 15 * c) / 8;
  p0[6] = (11 * c * p0[5] - 5 * p0[4]) / 6;
  p1[1] = s;
  p1[2] = 3 * c * s;
  p1[3] = 1.5 * (5 * c2 - 1) * s;
  p1[4] = 2.5 * (7 * c2 * c - 3 * c) * s;
  p1[5] = 1.875 * (21 * c4 - 14 * c2 + 1) * s;
  p1[6] = (11 * c * p1[5] - 6 * p1[4]) / 5;
  p2[2] = 3 * s2;
  p2[3] = 15 * s2 * c;
  p2[4] = 7.5 * (7 * c2 - 1) * s2;
  p2[5] = 3 * c * p2[4] - 2 * p2[3];
  p2[6] = (11 * c * p2[5] - 7 * p2[4]) / 4;
  p2[7] = (13 * c * p2[6] - 8 * p2[5]) / 5;
  p3[3] = 15 * s2 * s;
  p3[4] = 105 * s2 * s * c;
  p3[5] = (9 * c * p3[4] - 7 * p3[3]) / 2;
  p3[6] = (11 * c * p3[5] - 8 * p3[4]) / 3;
  if (!(sw[7] === 0 && sw[8] === 0 && sw[14] === 0)) {
    const tloc = input.lst;
    stloc = Math.sin(HR * tloc);
    ctloc = Math.cos(HR * tloc);
    s2tloc = Math.sin(2 * HR * tloc);
    c2tloc = Math.cos(2 * HR * tloc);
    s3tloc = Math.sin(3 * HR * tloc);
    c3tloc = Math.cos(3 * HR * tloc);
  }
  dfa = input.f107A - 150;
}

const tG = new Float64Array(15);

// While `nrlmsise00Altitudes` sweeps altitude with everything else fixed, the G(L) values do not
// change: each coefficient set's value, and the activity terms globe7 leaves behind for glob7s,
// are kept from the first altitude and reused.
let memoOn = false;
const memo = new Map<readonly number[], { v: number; apdf: number; apt0: number }>();

/** A G(L) value, from the sweep's memo when one is running (restoring the activity terms a GLOBE7 call leaves behind). */
function memoized(terms: (p: readonly number[], input: MsisInput) => number, restoresState: boolean, p: readonly number[], input: MsisInput): number {
  if (!memoOn) return terms(p, input);
  const m = memo.get(p);
  if (m) {
    if (restoresState) {
      apdf = m.apdf;
      apt0 = m.apt0;
    }
    return m.v;
  }
  const v = terms(p, input);
  memo.set(p, { v, apdf, apt0 });
  return v;
}

/** G(L) of the upper thermosphere for the coefficient set p (GLOBE7). */
const globe7 = (p: readonly number[], input: MsisInput): number => memoized(globe7Terms, true, p, input);
/** G(L) of the lower atmosphere (GLOB7S, the 10/26/99 version). */
const glob7s = (p: readonly number[], input: MsisInput): number => memoized(glob7sTerms, false, p, input);

function globe7Terms(p: readonly number[], input: MsisInput): number {
  const t = tG;
  t.fill(0);
  const [p0, p1, p2, p3] = plg;
  const tloc = input.lst;
  const cd32 = Math.cos(DR * (input.doy - p[31]));
  const cd18 = Math.cos(2 * DR * (input.doy - p[17]));
  const cd14 = Math.cos(DR * (input.doy - p[13]));
  const cd39 = Math.cos(2 * DR * (input.doy - p[38]));

  // F10.7 effect
  const df = input.f107 - input.f107A;
  t[0] = p[19] * df * (1 + p[59] * dfa) + p[20] * df * df + p[21] * dfa + p[29] * dfa * dfa;
  const f1 = 1 + (p[47] * dfa + p[19] * df + p[20] * df * df) * swc[1];
  const f2 = 1 + (p[49] * dfa + p[19] * df + p[20] * df * df) * swc[1];
  // time independent
  t[1] = p[1] * p0[2] + p[2] * p0[4] + p[22] * p0[6] + p[14] * p0[2] * dfa * swc[1] + p[26] * p0[1];
  // symmetrical annual, semiannual; asymmetrical annual, semiannual
  t[2] = p[18] * cd32;
  t[3] = (p[15] + p[16] * p0[2]) * cd18;
  t[4] = f1 * (p[9] * p0[1] + p[10] * p0[3]) * cd14;
  t[5] = p[37] * p0[1] * cd39;
  // diurnal, semidiurnal, terdiurnal
  if (sw[7]) {
    const t71 = p[11] * p1[2] * cd14 * swc[5];
    const t72 = p[12] * p1[2] * cd14 * swc[5];
    t[6] = f2 * ((p[3] * p1[1] + p[4] * p1[3] + p[27] * p1[5] + t71) * ctloc + (p[6] * p1[1] + p[7] * p1[3] + p[28] * p1[5] + t72) * stloc);
  }
  if (sw[8]) {
    const t81 = (p[23] * p2[3] + p[35] * p2[5]) * cd14 * swc[5];
    const t82 = (p[33] * p2[3] + p[36] * p2[5]) * cd14 * swc[5];
    t[7] = f2 * ((p[5] * p2[2] + p[41] * p2[4] + t81) * c2tloc + (p[8] * p2[2] + p[42] * p2[4] + t82) * s2tloc);
  }
  if (sw[14]) {
    t[13] =
      f2 *
      ((p[39] * p3[3] + (p[93] * p3[4] + p[46] * p3[6]) * cd14 * swc[5]) * s3tloc +
        (p[40] * p3[3] + (p[94] * p3[4] + p[48] * p3[6]) * cd14 * swc[5]) * c3tloc);
  }
  // magnetic activity: the 3-hour history (switch 9 = -1) or the daily Ap
  if (sw[9] === -1) {
    const ap = input.apArray!;
    if (p[51] !== 0) {
      let exp1 = Math.exp((-10800 * Math.abs(p[51])) / (1 + p[138] * (45 - Math.abs(input.gLat))));
      if (exp1 > 0.99999) exp1 = 0.99999;
      apt0 = sg0(exp1, p, ap);
      if (sw[9]) {
        t[8] =
          apt0 *
          (p[50] + p[96] * p0[2] + p[54] * p0[4] + (p[125] * p0[1] + p[126] * p0[3] + p[127] * p0[5]) * cd14 * swc[5] + (p[128] * p1[1] + p[129] * p1[3] + p[130] * p1[5]) * swc[7] * Math.cos(HR * (tloc - p[131])));
      }
    }
  } else {
    const apd = input.ap - 4;
    const p44 = p[43] < 0 ? 1e-5 : p[43];
    const p45 = p[44];
    apdf = apd + (p45 - 1) * (apd + (Math.exp(-p44 * apd) - 1) / p44);
    if (sw[9]) {
      t[8] =
        apdf *
        (p[32] + p[45] * p0[2] + p[34] * p0[4] + (p[100] * p0[1] + p[101] * p0[3] + p[102] * p0[5]) * cd14 * swc[5] + (p[121] * p1[1] + p[122] * p1[3] + p[123] * p1[5]) * swc[7] * Math.cos(HR * (tloc - p[124])));
    }
  }

  if (sw[10] && input.gLong > -1000) {
    const cl = Math.cos(DGTR * input.gLong);
    const sl = Math.sin(DGTR * input.gLong);
    // longitudinal
    if (sw[11]) {
      t[10] =
        (1 + p[80] * dfa * swc[1]) *
        ((p[64] * p1[2] + p[65] * p1[4] + p[66] * p1[6] + p[103] * p1[1] + p[104] * p1[3] + p[105] * p1[5] + swc[5] * (p[109] * p1[1] + p[110] * p1[3] + p[111] * p1[5]) * cd14) * cl +
          (p[90] * p1[2] + p[91] * p1[4] + p[92] * p1[6] + p[106] * p1[1] + p[107] * p1[3] + p[108] * p1[5] + swc[5] * (p[112] * p1[1] + p[113] * p1[3] + p[114] * p1[5]) * cd14) * sl);
    }
    // UT and mixed UT, longitude
    if (sw[12]) {
      t[11] =
        (1 + p[95] * p0[1]) * (1 + p[81] * dfa * swc[1]) * (1 + p[119] * p0[1] * swc[5] * cd14) * ((p[68] * p0[1] + p[69] * p0[3] + p[70] * p0[5]) * Math.cos(SR * (input.sec - p[71])));
      t[11] += swc[11] * (p[76] * p2[3] + p[77] * p2[5] + p[78] * p2[7]) * Math.cos(SR * (input.sec - p[79]) + 2 * DGTR * input.gLong) * (1 + p[137] * dfa * swc[1]);
    }
    // UT, longitude, magnetic activity
    if (sw[13]) {
      if (sw[9] === -1) {
        if (p[51]) {
          t[12] =
            apt0 * swc[11] * (1 + p[132] * p0[1]) * ((p[52] * p1[2] + p[98] * p1[4] + p[67] * p1[6]) * Math.cos(DGTR * (input.gLong - p[97]))) +
            apt0 * swc[11] * swc[5] * (p[133] * p1[1] + p[134] * p1[3] + p[135] * p1[5]) * cd14 * Math.cos(DGTR * (input.gLong - p[136])) +
            apt0 * swc[12] * (p[55] * p0[1] + p[56] * p0[3] + p[57] * p0[5]) * Math.cos(SR * (input.sec - p[58]));
        }
      } else {
        t[12] =
          apdf * swc[11] * (1 + p[120] * p0[1]) * ((p[60] * p1[2] + p[61] * p1[4] + p[62] * p1[6]) * Math.cos(DGTR * (input.gLong - p[63]))) +
          apdf * swc[11] * swc[5] * (p[115] * p1[1] + p[116] * p1[3] + p[117] * p1[5]) * cd14 * Math.cos(DGTR * (input.gLong - p[118])) +
          apdf * swc[12] * (p[83] * p0[1] + p[84] * p0[3] + p[85] * p0[5]) * Math.cos(SR * (input.sec - p[75]));
      }
    }
  }

  let tinf = p[30];
  for (let i = 0; i < 14; i++) tinf += Math.abs(sw[i + 1]) * t[i];
  return tinf;
}

function glob7sTerms(p: readonly number[], input: MsisInput): number {
  const t = tG;
  t.fill(0);
  const [p0, p1, p2, p3] = plg;
  const cd32 = Math.cos(DR * (input.doy - p[31]));
  const cd18 = Math.cos(2 * DR * (input.doy - p[17]));
  const cd14 = Math.cos(DR * (input.doy - p[13]));
  const cd39 = Math.cos(2 * DR * (input.doy - p[38]));

  t[0] = p[21] * dfa;
  t[1] = p[1] * p0[2] + p[2] * p0[4] + p[22] * p0[6] + p[26] * p0[1] + p[14] * p0[3] + p[59] * p0[5];
  t[2] = (p[18] + p[47] * p0[2] + p[29] * p0[4]) * cd32;
  t[3] = (p[15] + p[16] * p0[2] + p[30] * p0[4]) * cd18;
  t[4] = (p[9] * p0[1] + p[10] * p0[3] + p[20] * p0[5]) * cd14;
  t[5] = p[37] * p0[1] * cd39;
  if (sw[7]) {
    const t71 = p[11] * p1[2] * cd14 * swc[5];
    const t72 = p[12] * p1[2] * cd14 * swc[5];
    t[6] = (p[3] * p1[1] + p[4] * p1[3] + t71) * ctloc + (p[6] * p1[1] + p[7] * p1[3] + t72) * stloc;
  }
  if (sw[8]) {
    const t81 = (p[23] * p2[3] + p[35] * p2[5]) * cd14 * swc[5];
    const t82 = (p[33] * p2[3] + p[36] * p2[5]) * cd14 * swc[5];
    t[7] = (p[5] * p2[2] + p[41] * p2[4] + t81) * c2tloc + (p[8] * p2[2] + p[42] * p2[4] + t82) * s2tloc;
  }
  if (sw[14]) t[13] = p[39] * p3[3] * s3tloc + p[40] * p3[3] * c3tloc;
  if (sw[9]) {
    if (sw[9] === 1) t[8] = apdf * (p[32] + p[45] * p0[2] * swc[2]);
    if (sw[9] === -1) t[8] = p[50] * apt0 + p[96] * p0[2] * apt0 * swc[2];
  }
  if (!(sw[10] === 0 || sw[11] === 0 || input.gLong <= -1000)) {
    t[10] =
      (1 + p0[1] * (p[80] * swc[5] * Math.cos(DR * (input.doy - p[81])) + p[85] * swc[6] * Math.cos(2 * DR * (input.doy - p[86]))) + p[83] * swc[3] * Math.cos(DR * (input.doy - p[84])) + p[87] * swc[4] * Math.cos(2 * DR * (input.doy - p[88]))) *
      ((p[64] * p1[2] + p[65] * p1[4] + p[66] * p1[6] + p[74] * p1[1] + p[75] * p1[3] + p[76] * p1[5]) * Math.cos(DGTR * input.gLong) +
        (p[90] * p1[2] + p[91] * p1[4] + p[92] * p1[6] + p[77] * p1[1] + p[78] * p1[3] + p[79] * p1[5]) * Math.sin(DGTR * input.gLong));
  }
  let tt = 0;
  for (let i = 0; i < 14; i++) tt += Math.abs(sw[i + 1]) * t[i];
  return tt;
}

const ALPHA = [-0.38, 0.0, 0.0, 0.0, 0.17, 0.0, -0.38, 0.0, 0.0];
const ALTL = [200.0, 300.0, 160.0, 250.0, 240.0, 450.0, 320.0, 450.0];
const zn1List: number[] = [...ZN1];

// Lower-boundary temperature and temperature-gradient parameter of the current GTS7 call.
let gtsTlb = 0;
let gtsS = 0;
function densuAt(alt: number, dlb: number, tinf: number, xm: number, alpha: number, tlb = gtsTlb): number {
  return densu(alt, dlb, tinf, tlb, xm, alpha, PTM[5], gtsS, 5, zn1List, mesoTn1, mesoTgn1);
}

/** ZLB density left by the last `diffusive` call, and the mixed ZLB density left by the last `turbopause` call. */
let diffusiveDb = 0;
let mixedDb = 0;

/** Diffusive-equilibrium density at altitude z of the species with coefficients PD[set] and boundary values PDM[row]. */
function diffusive(z: number, set: number, row: number, xm: number, alpha: number, tinf: number, input: MsisInput): number {
  const g = sw[21] * globe7(PD[set], input);
  diffusiveDb = PDM[row][0] * Math.exp(g) * PD[set][0];
  return densuAt(z, diffusiveDb, tinf, xm, alpha);
}

/** The diffusive density d joined to the fully mixed one of a species whose turbopause is at zh. */
function turbopause(z: number, d: number, db: number, tinf: number, xm: number, alpha: number, zh: number, xmm: number, zhm: number): number {
  mixedDb = densuAt(zh, db, tinf, xm - xmm, alpha - 1);
  const dm = densuAt(z, mixedDb, tinf, xmm, 0);
  return dnet(d, dm, zhm, xmm, xm);
}

/** Thermospheric part (GTS7), altitude above 72.5 km; densities in cm^-3 and g/cm^3. */
function gts7(input: MsisInput, out: MsisOutput): void {
  const d = out.d;
  const za = PDL[1][15];
  zn1List[0] = za;
  d.fill(0);
  const z = input.alt;

  const tinf = z > zn1List[0] ? PTM[0] * PT[0] * (1 + sw[16] * globe7(PT, input)) : PTM[0] * PT[0];
  out.t[0] = tinf;
  const g0v = z > zn1List[4] ? PTM[3] * PS[0] * (1 + sw[19] * globe7(PS, input)) : PTM[3] * PS[0];
  const tlb = PTM[1] * (1 + sw[17] * globe7(PD[3], input)) * PD[3][0];
  const s = g0v / (tinf - tlb);

  // lower thermosphere temperature variations matter for the density below 300 km only
  if (z < 300) {
    mesoTn1[1] = (PTM[6] * PTL[0][0]) / (1 - sw[18] * glob7s(PTL[0], input));
    mesoTn1[2] = (PTM[2] * PTL[1][0]) / (1 - sw[18] * glob7s(PTL[1], input));
    mesoTn1[3] = (PTM[7] * PTL[2][0]) / (1 - sw[18] * glob7s(PTL[2], input));
    mesoTn1[4] = (PTM[4] * PTL[3][0]) / (1 - sw[18] * sw[20] * glob7s(PTL[3], input));
    mesoTgn1[1] = (PTM[8] * PMA[8][0] * (1 + sw[18] * sw[20] * glob7s(PMA[8], input)) * mesoTn1[4] * mesoTn1[4]) / (PTM[4] * PTL[3][0]) ** 2;
  } else {
    mesoTn1[1] = PTM[6] * PTL[0][0];
    mesoTn1[2] = PTM[2] * PTL[1][0];
    mesoTn1[3] = PTM[7] * PTL[2][0];
    mesoTn1[4] = PTM[4] * PTL[3][0];
    mesoTgn1[1] = (PTM[8] * PMA[8][0] * mesoTn1[4] * mesoTn1[4]) / (PTM[4] * PTL[3][0]) ** 2;
  }

  gtsTlb = tlb;
  gtsS = s;

  // N2: variation factor, diffusive density at ZLB and at the altitude, turbopause
  const g28 = sw[21] * globe7(PD[2], input);
  const zhf = PDL[1][24] * (1 + sw[5] * PDL[0][24] * Math.sin(DGTR * input.gLat) * Math.cos(DR * (input.doy - PT[13])));
  out.t[0] = tinf;
  const xmm = PDM[2][4];
  const db28 = PDM[2][0] * Math.exp(g28) * PD[2][0];
  d[2] = densuAt(z, db28, tinf, 28, ALPHA[2]);
  const zh28 = PDM[2][2] * zhf;
  const zhm28 = PDM[2][3] * PDL[1][5];
  const xmd = 28 - xmm;
  const b28 = densuAt(zh28, db28, tinf, xmd, ALPHA[2] - 1);
  if (sw[15] && z <= ALTL[2]) {
    dm28 = densuAt(z, b28, tinf, xmm, ALPHA[2]);
    d[2] = dnet(d[2], dm28, zhm28, xmm, 28);
  }

  // He
  d[0] = diffusive(z, 0, 0, 4, ALPHA[0], tinf, input);
  if (sw[15] && z < ALTL[0]) {
    d[0] = turbopause(z, d[0], diffusiveDb, tinf, 4, ALPHA[0], PDM[0][2], xmm, zhm28);
    // correction to the specified mixing ratio at the ground
    d[0] *= ccor(z, Math.log((b28 * PDM[0][1]) / mixedDb), PDM[0][5] * PDL[1][1], PDM[0][4] * PDL[1][0]);
  }

  // O
  d[1] = diffusive(z, 1, 1, 16, ALPHA[1], tinf, input);
  if (sw[15] && z <= ALTL[1]) {
    d[1] = turbopause(z, d[1], diffusiveDb, tinf, 16, ALPHA[1], PDM[1][2], xmm, zhm28);
    const rl = PDM[1][1] * PDL[1][16] * (1 + sw[1] * PDL[0][23] * (input.f107A - 150));
    d[1] *= ccor2(z, rl, PDM[1][5] * PDL[1][3], PDM[1][4] * PDL[1][2], PDM[1][5] * PDL[1][4]);
    // chemistry correction
    d[1] *= ccor(z, PDM[1][3] * PDL[1][14], PDM[1][7] * PDL[1][13], PDM[1][6] * PDL[1][12]);
  }

  // O2
  d[3] = diffusive(z, 4, 3, 32, ALPHA[3], tinf, input);
  if (sw[15]) {
    if (z <= ALTL[3]) {
      d[3] = turbopause(z, d[3], diffusiveDb, tinf, 32, ALPHA[3], PDM[3][2], xmm, zhm28);
      d[3] *= ccor(z, Math.log((b28 * PDM[3][1]) / mixedDb), PDM[3][5] * PDL[1][7], PDM[3][4] * PDL[1][6]);
    }
    // general departure from diffusive equilibrium above ZLB
    const rc32 = PDM[3][3] * PDL[1][23] * (1 + sw[1] * PDL[0][23] * (input.f107A - 150));
    d[3] *= ccor2(z, rc32, PDM[3][7] * PDL[1][22], PDM[3][6] * PDL[1][21], PDM[3][7] * PDL[0][22]);
  }

  // Ar
  d[4] = diffusive(z, 5, 4, 40, ALPHA[4], tinf, input);
  if (sw[15] && z <= ALTL[4]) {
    d[4] = turbopause(z, d[4], diffusiveDb, tinf, 40, ALPHA[4], PDM[4][2], xmm, zhm28);
    d[4] *= ccor(z, Math.log((b28 * PDM[4][1]) / mixedDb), PDM[4][5] * PDL[1][9], PDM[4][4] * PDL[1][8]);
  }

  // H
  d[6] = diffusive(z, 6, 5, 1, ALPHA[6], tinf, input);
  if (sw[15] && z <= ALTL[6]) {
    d[6] = turbopause(z, d[6], diffusiveDb, tinf, 1, ALPHA[6], PDM[5][2], xmm, zhm28);
    d[6] *= ccor(z, Math.log((b28 * PDM[5][1] * Math.abs(PDL[1][17])) / mixedDb), PDM[5][5] * PDL[1][11], PDM[5][4] * PDL[1][10]);
    d[6] *= ccor(z, PDM[5][3] * PDL[1][20], PDM[5][7] * PDL[1][19], PDM[5][6] * PDL[1][18]);
  }

  // N
  d[7] = diffusive(z, 7, 6, 14, ALPHA[7], tinf, input);
  if (sw[15] && z <= ALTL[7]) {
    d[7] = turbopause(z, d[7], diffusiveDb, tinf, 14, ALPHA[7], PDM[6][2], xmm, zhm28);
    d[7] *= ccor(z, Math.log((b28 * PDM[6][1] * Math.abs(PDL[0][2])) / mixedDb), PDM[6][5] * PDL[0][1], PDM[6][4] * PDL[0][0]);
    d[7] *= ccor(z, PDM[6][3] * PDL[0][5], PDM[6][7] * PDL[0][4], PDM[6][6] * PDL[0][3]);
  }

  // anomalous (hot) oxygen
  const g16h = sw[21] * globe7(PD[8], input);
  const db16h = PDM[7][0] * Math.exp(g16h) * PD[8][0];
  const tho = PDM[7][9] * PDL[0][6];
  // the hot-oxygen profile is isothermal: tho is both its exospheric and its lower-boundary temperature
  const dd = densuAt(z, db16h, tho, 16, ALPHA[8], tho);
  const zsht = PDM[7][5];
  const zmho = PDM[7][4];
  const zsho = scalh(zmho, 16, tho);
  d[8] = dd * Math.exp((-zsht / zsho) * (Math.exp(-(z - zmho) / zsht) - 1));

  d[5] = AMU_G * (4 * d[0] + 16 * d[1] + 28 * d[2] + 32 * d[3] + 40 * d[4] + d[6] + 14 * d[7]);

  // temperature at altitude
  densuAt(Math.abs(input.alt), 1, tinf, 0, 0);
  out.t[1] = densuTz;
}

const ZN2 = [72.5, 55.0, 45.0, 32.5];
const ZN3 = [32.5, 20.0, 15.0, 10.0, 0.0];

/** GTD7 (densities in cm^-3, g/cm^3): thermosphere from GTS7, blended into the lower atmosphere below 72.5 km. */
function gtd7(input: MsisInput, out: MsisOutput): void {
  const xlat = sw[2] === 0 ? 45 : input.gLat;
  glatf(xlat);
  const xmm = PDM[2][4];
  const mn3 = 5;
  const mn2 = 4;
  const zmix = 62.5;

  const altGiven = input.alt;
  const altt = altGiven > ZN2[0] ? altGiven : ZN2[0];
  input.alt = altt;
  gts7(input, soutput);
  input.alt = altGiven;
  const dm28m = dm28;
  out.t[0] = soutput.t[0];
  out.t[1] = soutput.t[1];
  if (altGiven >= ZN2[0]) {
    for (let i = 0; i < 9; i++) out.d[i] = soutput.d[i];
    return;
  }

  // lower mesosphere / upper stratosphere: node temperatures and end gradients
  mesoTgn2[0] = mesoTgn1[1];
  mesoTn2[0] = mesoTn1[4];
  mesoTn2[1] = (PMA[0][0] * PAVGM[0]) / (1 - sw[20] * glob7s(PMA[0], input));
  mesoTn2[2] = (PMA[1][0] * PAVGM[1]) / (1 - sw[20] * glob7s(PMA[1], input));
  mesoTn2[3] = (PMA[2][0] * PAVGM[2]) / (1 - sw[20] * sw[22] * glob7s(PMA[2], input));
  mesoTgn2[1] = (PAVGM[8] * PMA[9][0] * (1 + sw[20] * sw[22] * glob7s(PMA[9], input)) * mesoTn2[3] * mesoTn2[3]) / (PMA[2][0] * PAVGM[2]) ** 2;
  mesoTn3[0] = mesoTn2[3];

  if (altGiven <= ZN3[0]) {
    // lower stratosphere and troposphere
    mesoTgn3[0] = mesoTgn2[1];
    for (let k = 1; k <= 4; k++) mesoTn3[k] = (PMA[k + 2][0] * PAVGM[k + 2]) / (1 - sw[22] * glob7s(PMA[k + 2], input));
    mesoTgn3[1] = (PMA[7][0] * PAVGM[7] * (1 + sw[22] * glob7s(PMA[7], input)) * mesoTn3[4] * mesoTn3[4]) / (PMA[6][0] * PAVGM[6]) ** 2;
  }

  // linear transition to full mixing below 72.5 km
  const dmc = altGiven > zmix ? 1 - (ZN2[0] - altGiven) / (ZN2[0] - zmix) : 0;
  const dz28 = soutput.d[2];
  const densmAt = (d0: number, xm: number): number => densm(altGiven, d0, xm, mn3, ZN3, mesoTn3, mesoTgn3, mn2, ZN2, mesoTn2, mesoTgn2);

  out.d[2] = densmAt(dm28m, xmm) * (1 + (soutput.d[2] / dm28m - 1) * dmc);
  // He, O2, Ar in proportion to N2 (PDM[.][1] their mixing ratios); O, H, N and hot O vanish
  for (const [i, row] of [[0, 0], [3, 3], [4, 4]]) out.d[i] = out.d[2] * PDM[row][1] * (1 + (soutput.d[i] / (dz28 * PDM[row][1]) - 1) * dmc);
  out.d[1] = out.d[6] = out.d[7] = out.d[8] = 0;
  out.d[5] = AMU_G * (4 * out.d[0] + 16 * out.d[1] + 28 * out.d[2] + 32 * out.d[3] + 40 * out.d[4] + out.d[6] + 14 * out.d[7]);
  densmAt(1, 0);
  out.t[1] = densmTz;
}

/**
 * Runs NRLMSISE-00 for one place and time; writes number densities (m^-3), the total mass
 * density (kg/m^3) and the temperatures (K) into `out`. `withAnomalousOxygen` selects the
 * distribution's GTD7D total ("effective total mass density for drag", anomalous oxygen
 * included) instead of GTD7's. Inputs are taken as valid: the caller checks ranges. Switch 9 =
 * -1 requires input.apArray.
 */
export function nrlmsise00(input: MsisInput, out: MsisOutput, withAnomalousOxygen: boolean, switches: readonly number[] = STANDARD_SWITCHES): MsisOutput {
  tselec(switches);
  legendreAndLocalTime(input);
  gtd7(input, out);
  const d = out.d;
  if (withAnomalousOxygen) d[5] = AMU_G * (4 * d[0] + 16 * d[1] + 28 * d[2] + 32 * d[3] + 40 * d[4] + d[6] + 14 * d[7] + 16 * d[8]);
  for (let i = 0; i < 9; i++) d[i] = i === 5 ? d[i] * 1000 : d[i] * CM3_TO_M3;
  return out;
}

/**
 * The total mass density (kg/m^3; GTD7D's with anomalous oxygen when `withAnomalousOxygen`) at
 * each of `altitudes` for one place, time and activity: the same numbers as `nrlmsise00` altitude
 * by altitude, computed about twice as fast because the G(L) expansions, which do not depend on
 * altitude, are evaluated once. `input.alt` is left as it was.
 */
export function nrlmsise00Altitudes(input: MsisInput, altitudes: ArrayLike<number>, rho: Float64Array, withAnomalousOxygen: boolean, switches: readonly number[] = STANDARD_SWITCHES): void {
  const out = scratchOutput;
  const altGiven = input.alt;
  memo.clear();
  memoOn = true;
  try {
    for (let k = 0; k < altitudes.length; k++) {
      input.alt = altitudes[k];
      rho[k] = nrlmsise00(input, out, withAnomalousOxygen, switches).d[5];
    }
  } finally {
    memoOn = false;
    memo.clear();
    input.alt = altGiven;
  }
}

const scratchOutput = newMsisOutput();
