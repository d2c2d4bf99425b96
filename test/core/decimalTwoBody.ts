import Decimal from "decimal.js";

/**
 * High-precision reference for the two-body tests: decimal.js 10.6.0 at 50 significant digits,
 * a different route from the float64 code under test. Elements come from Vallado's RV2COE in its
 * original acos-plus-quadrant-test form (4th ed., Alg. 9); propagation goes through the classical
 * eccentric or hyperbolic anomaly and Kepler's equation (Vallado 4th ed. §2.2-2.3, Curtis 3rd ed.
 * §3.4-3.5) instead of universal variables, and the perifocal frame P, Q, W built from the
 * eccentricity and angular-momentum vectors. Inputs are the exact float64 values, so the result
 * is the true answer (to ~1e-45) for exactly the numbers the float code received.
 */
const D = Decimal.clone({ precision: 50 });
type V = [Decimal, Decimal, Decimal];
const PI = D.acos(-1);

/**
 * The exact value of a float64 (to the 50 digits kept). `new Decimal(x)` would read x's shortest
 * decimal string instead, an input perturbation of up to half an ulp: enough to move the answer of
 * an ill-conditioned case (a near-parabola, a long arc) by its whole sensitivity.
 */
export function exact(x: number): Decimal {
  if (x === 0 || !Number.isFinite(x)) return new D(x);
  let k = Math.floor(Math.log2(Math.abs(x))) - 52;
  while (!Number.isInteger(x / 2 ** k)) k -= 1;
  return new D(x / 2 ** k).mul(new D(2).pow(k));
}
const vec = (a: readonly number[]): V => [exact(a[0]), exact(a[1]), exact(a[2])];
const dot = (a: V, b: V) => a[0].mul(b[0]).plus(a[1].mul(b[1])).plus(a[2].mul(b[2]));
const cross = (a: V, b: V): V => [
  a[1].mul(b[2]).minus(a[2].mul(b[1])),
  a[2].mul(b[0]).minus(a[0].mul(b[2])),
  a[0].mul(b[1]).minus(a[1].mul(b[0])),
];
const mag = (a: V) => dot(a, a).sqrt();
const scale = (s: Decimal, a: V): V => [a[0].mul(s), a[1].mul(s), a[2].mul(s)];
const add = (a: V, b: V): V => [a[0].plus(b[0]), a[1].plus(b[1]), a[2].plus(b[2])];
const deg = (x: Decimal) => x.mul(180).div(PI);

interface Orbit {
  mu: Decimal;
  r: V;
  v: V;
  h: V;
  e: V;
  ecc: Decimal;
  sma: Decimal;
}

function orbit(gm: number, state: readonly number[]): Orbit {
  const mu = exact(gm);
  const r = vec(state.slice(0, 3));
  const v = vec(state.slice(3, 6));
  const h = cross(r, v);
  const rn = mag(r);
  const e = add(scale(new D(1).div(mu), cross(v, h)), scale(new D(-1).div(rn), r));
  const energy = dot(v, v).div(2).minus(mu.div(rn));
  return { mu, r, v, h, e, ecc: mag(e), sma: mu.neg().div(energy.mul(2)) };
}

/** [sma, ecc, inc, raan, arg_periapsis, nu] in degrees, 50-digit RV2COE, rounded to float64 at the end. General case only (not circular, not equatorial). */
export function referenceElements(gm: number, state: readonly number[]): number[] {
  const o = orbit(gm, state);
  const hn = mag(o.h);
  const n: V = [o.h[1].neg(), o.h[0], new D(0)];
  const nn = mag(n);
  const rn = mag(o.r);
  const inc = D.acos(o.h[2].div(hn));
  let raan = D.acos(n[0].div(nn));
  if (n[1].isNegative()) raan = PI.mul(2).minus(raan);
  let argPeriapsis = D.acos(dot(n, o.e).div(nn.mul(o.ecc)));
  if (o.e[2].isNegative()) argPeriapsis = PI.mul(2).minus(argPeriapsis);
  let nu = D.acos(D.max(-1, D.min(1, dot(o.e, o.r).div(o.ecc.mul(rn)))));
  if (dot(o.r, o.v).isNegative()) nu = PI.mul(2).minus(nu);
  return [o.sma, o.ecc, deg(inc), deg(raan), deg(argPeriapsis), deg(nu)].map((x) => x.toNumber());
}

/**
 * A float64 root of g(x) = target on [lo, hi] (g increasing), by bisection-guarded Newton: only a
 * starting value for the 50-digit Newton iteration below, which converges quadratically from it
 * to the true root whatever float error the seed carries.
 */
function floatSeed(g: (x: number) => number, dg: (x: number) => number, target: number, lo: number, hi: number): number {
  let x = (lo + hi) / 2;
  for (let i = 0; i < 200; i++) {
    const f = g(x) - target;
    if (f < 0) lo = x; else hi = x;
    let next = x - f / dg(x);
    if (!(next > lo && next < hi)) next = (lo + hi) / 2;
    if (next === x) break;
    x = next;
  }
  return x;
}

/** Kepler's equation E - e sin E = M (ellipse, M in [-pi, pi]) by Newton with a bisection guard, to 45 digits. */
function solveElliptic(M: Decimal, ecc: Decimal): Decimal {
  let lo = PI.neg(), hi = PI;
  const e = ecc.toNumber();
  let E = new D(floatSeed((x) => x - e * Math.sin(x), (x) => 1 - e * Math.cos(x), M.toNumber(), -Math.PI, Math.PI));
  for (let i = 0; i < 300; i++) {
    const f = E.minus(ecc.mul(E.sin())).minus(M);
    if (f.isNegative()) lo = E; else hi = E;
    let next = E.minus(f.div(new D(1).minus(ecc.mul(E.cos()))));
    if (next.lte(lo) || next.gte(hi)) next = lo.plus(hi).div(2);
    if (next.minus(E).abs().lt(new D(10).pow(-45))) return next;
    E = next;
  }
  throw new Error("reference elliptic Kepler solver did not converge");
}

/** Hyperbolic Kepler's equation e sinh F - F = M by Newton with a bisection guard. */
function solveHyperbolic(M: Decimal, ecc: Decimal): Decimal {
  const sign = M.isNegative() ? -1 : 1;
  const m = M.abs();
  let lo = new D(0), hi = new D(1);
  while (ecc.mul(hi.sinh()).minus(hi).lt(m)) hi = hi.mul(2);
  const e = ecc.toNumber();
  let F = new D(floatSeed((x) => e * Math.sinh(x) - x, (x) => e * Math.cosh(x) - 1, m.toNumber(), 0, hi.toNumber()));
  for (let i = 0; i < 400; i++) {
    const f = ecc.mul(F.sinh()).minus(F).minus(m);
    if (f.isNegative()) lo = F; else hi = F;
    let next = F.minus(f.div(ecc.mul(F.cosh()).minus(1)));
    if (next.lte(lo) || next.gte(hi)) next = lo.plus(hi).div(2);
    if (next.minus(F).abs().lt(new D(10).pow(-45))) return next.mul(sign);
    F = next;
  }
  throw new Error("reference hyperbolic Kepler solver did not converge");
}

/** State dt seconds later by the classical anomaly of the conic (not for circular or exactly parabolic states). */
export function referencePropagate(gm: number, state: readonly number[], dt: number): number[] {
  const o = orbit(gm, state);
  const { mu, ecc, sma } = o;
  const P = scale(new D(1).div(ecc), o.e);
  const W = scale(new D(1).div(mag(o.h)), o.h);
  const Q = cross(W, P);
  const rn = mag(o.r);
  const cosNu = dot(o.r, P).div(rn);
  const sinNu = dot(o.r, Q).div(rn);
  const t = exact(dt);
  let x: Decimal, y: Decimal, vx: Decimal, vy: Decimal;
  if (ecc.lt(1)) {
    const b = new D(1).minus(ecc.mul(ecc)).sqrt();
    const E0 = D.atan2(b.mul(sinNu), ecc.plus(cosNu));
    const M0 = E0.minus(ecc.mul(E0.sin()));
    const n = mu.div(sma.pow(3)).sqrt();
    const twoPi = PI.mul(2);
    let M = M0.plus(n.mul(t)).mod(twoPi);
    if (M.gt(PI)) M = M.minus(twoPi);
    if (M.lt(PI.neg())) M = M.plus(twoPi);
    const E = solveElliptic(M, ecc);
    const cosE = E.cos(), sinE = E.sin();
    const r = sma.mul(new D(1).minus(ecc.mul(cosE)));
    x = sma.mul(cosE.minus(ecc));
    y = sma.mul(b).mul(sinE);
    const k = mu.mul(sma).sqrt().div(r);
    vx = k.mul(sinE).neg();
    vy = k.mul(b).mul(cosE);
  } else {
    const A = sma.neg();
    const b = ecc.mul(ecc).minus(1).sqrt();
    const F0 = D.asinh(b.mul(sinNu).div(new D(1).plus(ecc.mul(cosNu))));
    const M0 = ecc.mul(F0.sinh()).minus(F0);
    const n = mu.div(A.pow(3)).sqrt();
    const F = solveHyperbolic(M0.plus(n.mul(t)), ecc);
    const coshF = F.cosh(), sinhF = F.sinh();
    const r = A.mul(ecc.mul(coshF).minus(1));
    x = A.mul(ecc.minus(coshF));
    y = A.mul(b).mul(sinhF);
    const k = mu.mul(A).sqrt().div(r);
    vx = k.mul(sinhF).neg();
    vy = k.mul(b).mul(coshF);
  }
  const rOut = add(scale(x, P), scale(y, Q));
  const vOut = add(scale(vx, P), scale(vy, Q));
  return [...rOut, ...vOut].map((c) => c.toNumber());
}

/** [x, y, z, vx, vy, vz] from [sma, ecc, inc, raan, arg_periapsis, nu] (degrees), 50-digit COE2RV (Vallado 4th ed. Alg. 10). */
export function referenceState(gm: number, elements: readonly number[]): number[] {
  const [a, e, i, O, w, nu] = elements.map(exact);
  const rad = (x: Decimal) => x.mul(PI).div(180);
  const [ci, si, cO, sO, cw, sw, cn, sn] = [i, i, O, O, w, w, nu, nu].map((x, k) => (k % 2 === 0 ? rad(x).cos() : rad(x).sin()));
  const p = a.mul(new D(1).minus(e.mul(e)));
  const r = p.div(new D(1).plus(e.mul(cn)));
  const k = exact(gm).div(p).sqrt();
  const P: V = [cO.mul(cw).minus(sO.mul(sw).mul(ci)), sO.mul(cw).plus(cO.mul(sw).mul(ci)), sw.mul(si)];
  const Q: V = [cO.neg().mul(sw).minus(sO.mul(cw).mul(ci)), sO.neg().mul(sw).plus(cO.mul(cw).mul(ci)), cw.mul(si)];
  const rv = add(scale(r.mul(cn), P), scale(r.mul(sn), Q));
  const vv = add(scale(k.mul(sn).neg(), P), scale(k.mul(e.plus(cn)), Q));
  return [...rv, ...vv].map((c) => c.toNumber());
}
