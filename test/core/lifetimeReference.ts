import Decimal from "decimal.js";
import { EXPONENTIAL_TABLE } from "../../src/core/exponentialatmosphere";

/**
 * Independent routes to orbital lifetimes for test/core/lifetime.test.ts, sharing no code with
 * src/core beyond the exponential table itself (the model under test).
 */

const D = Decimal.clone({ precision: 40 });
type Dec = InstanceType<typeof D>;

/** Gauss-Legendre nodes and weights on [-1, 1] in 40-digit decimal arithmetic (Newton on the Legendre recurrence). */
function gaussLegendreDecimal(n: number): { x: Dec[]; w: Dec[] } {
  const x: Dec[] = [];
  const w: Dec[] = [];

  for (let i = 0; i < n; i++) {
    let z = new D(Math.cos((Math.PI * (i + 0.75)) / (n + 0.5)));
    let dp = new D(1);
    for (let it = 0; it < 60; it++) {
      let p1 = new D(1);
      let p2 = new D(0);
      for (let j = 1; j <= n; j++) {
        const p3 = p2;
        p2 = p1;
        p1 = z.times(2 * j - 1).times(p2).minus(p3.times(j - 1)).div(j);
      }
      dp = z.times(p1).minus(p2).times(n).div(z.times(z).minus(1));
      const step = p1.div(dp);
      z = z.minus(step);
      if (step.abs().lt(new D(10).pow(-38))) break;
    }
    x.push(z);
    w.push(new D(2).div(new D(1).minus(z.times(z)).times(dp).times(dp)));
  }

  return { x, w };
}

/**
 * Lifetime (days) of a circular orbit in Vallado's exponential model, from the decay integral:
 * da/dt = -(rho(a)/B) sqrt(mu a) (rho/B in 1/m, times 1000 per km) gives
 * t = int_{h_end}^{h_0} B / (1000 rho(h) sqrt(mu (R + h))) dh, summed band by band (rho is one
 * exponential inside each band) with `nodes`-point Gauss-Legendre in 40-digit arithmetic on
 * sub-intervals of at most 10 km. Two node counts agreeing to 1e-15 show the sum is converged far
 * past the 1e-8 asked of it.
 */
export function circularLifetimeDecimal(mu: number, radius: number, startAltitude: number, endAltitude: number, ballisticCoefficient: number, nodes = 16): Decimal {
  const { x, w } = gaussLegendreDecimal(nodes);
  const muD = new D(mu);
  const RD = new D(radius);
  const k = new D(ballisticCoefficient).div(1000);
  const edges = EXPONENTIAL_TABLE.map((r) => r[0]).filter((h) => h > endAltitude && h < startAltitude);
  const cuts = [endAltitude, ...edges, startAltitude];
  let total = new D(0);
  for (let i = 0; i + 1 < cuts.length; i++) {
    const bandLo = cuts[i];
    const band = EXPONENTIAL_TABLE.filter((r) => r[0] <= bandLo).pop()!;
    const [h0, rho0, H] = band.map((v) => new D(v));
    const pieces = Math.max(1, Math.ceil((cuts[i + 1] - cuts[i]) / 10));
    for (let p = 0; p < pieces; p++) {
      const lo = new D(cuts[i]).plus(new D(cuts[i + 1] - cuts[i]).times(p).div(pieces));
      const hi = new D(cuts[i]).plus(new D(cuts[i + 1] - cuts[i]).times(p + 1).div(pieces));
      const mid = lo.plus(hi).div(2);
      const half = hi.minus(lo).div(2);
      for (let j = 0; j < nodes; j++) {
        const h = mid.plus(half.times(x[j]));
        const rho = rho0.times(D.exp(h.minus(h0).neg().div(H)));
        total = total.plus(w[j].times(half).times(k).div(rho.times(muD.times(RD.plus(h)).sqrt())));
      }
    }
  }
  return new Decimal(total.div(86400));
}

/**
 * Lifetime (days) from a numerical integration of the full two-body equations of motion with
 * drag, r'' = -mu r / r^3 - (1/2) (rho / B) |v| v (an atmosphere at rest, rho(|r| - R) from
 * `density`), by the classical fourth-order Runge-Kutta method with a fixed step `dt` (s),
 * started at perigee; the end is the first moment the osculating perigee altitude a (1 - e) - R
 * falls to endAltitude, interpolated linearly between steps.
 */
export function equationsOfMotionLifetime(mu: number, radius: number, perigeeAltitude: number, apogeeAltitude: number, ballisticCoefficient: number, density: (h: number) => number, endAltitude: number, dt: number): number {
  const rp = radius + perigeeAltitude;
  const ra = radius + apogeeAltitude;
  const a0 = (rp + ra) / 2;
  const y = [rp, 0, 0, 0, Math.sqrt((mu * (2 / rp - 1 / a0))), 0];
  const deriv = (s: number[]): number[] => {
    const r = Math.hypot(s[0], s[1], s[2]);
    const v = Math.hypot(s[3], s[4], s[5]);
    const g = -mu / (r * r * r);
    const drag = (-500 * density(r - radius) * v) / ballisticCoefficient;
    return [s[3], s[4], s[5], g * s[0] + drag * s[3], g * s[1] + drag * s[4], g * s[2] + drag * s[5]];
  };
  const perigeeAlt = (s: number[]): number => {
    const r = Math.hypot(s[0], s[1], s[2]);
    const v2 = s[3] * s[3] + s[4] * s[4] + s[5] * s[5];
    const a = 1 / (2 / r - v2 / mu);
    const h = s[0] * s[4] - s[1] * s[3];
    const e = Math.sqrt(Math.max(0, 1 - (h * h) / (mu * a)));
    return a * (1 - e) - radius;
  };
  let t = 0;
  let prev = perigeeAlt(y);
  for (let step = 0; step < 1e8; step++) {
    const k1 = deriv(y);
    const k2 = deriv(y.map((v, i) => v + 0.5 * dt * k1[i]));
    const k3 = deriv(y.map((v, i) => v + 0.5 * dt * k2[i]));
    const k4 = deriv(y.map((v, i) => v + dt * k3[i]));
    for (let i = 0; i < 6; i++) y[i] += (dt / 6) * (k1[i] + 2 * k2[i] + 2 * k3[i] + k4[i]);
    t += dt;
    const now = perigeeAlt(y);
    if (now <= endAltitude) return (t - dt + (dt * (prev - endAltitude)) / (prev - now)) / 86400;
    prev = now;
  }
  return Number.NaN;
}
