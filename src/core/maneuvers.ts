import { toRadians, TWO_PI } from "./angles";
import { arithmeticFailure, badArgument, finiteResult, firstError, noAnswer, nonNegative, positive, within, type DomainError, type Result } from "./domain";
import { meanMotion, orbitalSpeed } from "./twobody";

/**
 * Impulsive coplanar transfers, plane changes and phasing, all between or on circular orbits.
 * Sheet units: GM km^3/s^2, radii km, speeds km/s, times s, angles deg. Burns are impulsive and
 * tangential (or, for plane changes, at one point): a first-order, two-body budget, not a
 * finite-burn or perturbed analysis. Methods: Vallado, Fundamentals of Astrodynamics and
 * Applications, 4th ed., ch. 6 (Hohmann and bi-elliptic transfers, Alg. 36-37; plane changes;
 * circular coplanar phasing, Alg. 44); Curtis, Orbital Mechanics for Engineering Students, 2nd
 * ed., ch. 6 (Hohmann, bi-elliptic, phasing and plane-change sections). Algorithm numbers are
 * recalled, from memory; the companion code names hohmann, biellip and rendz match them.
 */

const gmCheck = (gm: number): DomainError | undefined => positive("body", gm, "km3/s2 (GM)");

/** A row with any non-finite value becomes #NUM! (overflow for extreme inputs), never NaN. */
export function finiteRow(parameter: string, row: number[]): Result<number[]> {
  return row.every(Number.isFinite) ? row : arithmeticFailure(parameter, "the result overflows float64 for these inputs");
}

/** Vis-viva speed (twobody.orbitalSpeed) for arguments the caller has already checked. */
function speedOn(gm: number, radius: number, sma: number): number {
  const v = orbitalSpeed(gm, radius, sma);
  return typeof v === "number" ? v : NaN;
}

/**
 * Kernel: magnitude of the tangential burn at `radius` that turns an orbit of semi-major axis
 * `smaBefore` into one of `smaAfter` (both with an apse at `radius`). Written as the difference of
 * squares of vis-viva, |v2 - v1| = GM |1/a1 - 1/a2| / (v1 + v2) = GM |a2 - a1| / (a1 a2 (v1 + v2)),
 * with a2 - a1 passed in as `smaChange` so callers form it from radii without cancellation: the
 * burn keeps full relative precision (a few ulp) even when the two orbits nearly coincide.
 */
export function tangentialBurn(gm: number, radius: number, smaBefore: number, smaAfter: number, smaChange: number): number {
  const sum = speedOn(gm, radius, smaBefore) + speedOn(gm, radius, smaAfter);
  if (smaChange === 0) return 0;
  return (((gm / smaBefore) * Math.abs(smaChange)) / smaAfter) / sum;
}

/** Kernel: [burn 1, burn 2, time of flight] of the Hohmann transfer r1 -> r2 (raising or lowering). */
export function hohmannKernel(gm: number, r1: number, r2: number): [number, number, number] {
  const transferSma = r1 / 2 + r2 / 2;
  const half = (r2 - r1) / 2;
  return [
    tangentialBurn(gm, r1, r1, transferSma, half),
    tangentialBurn(gm, r2, transferSma, r2, half),
    Math.PI / meanMotion(gm, transferSma),
  ];
}

/** Kernel: [burn 1, burn 2, burn 3, time of flight] of the bi-elliptic r1 -> rb -> r2. */
function biEllipticKernel(gm: number, r1: number, r2: number, rb: number): [number, number, number, number] {
  const a1 = r1 / 2 + rb / 2;
  const a2 = r2 / 2 + rb / 2;
  return [
    tangentialBurn(gm, r1, r1, a1, (rb - r1) / 2),
    tangentialBurn(gm, rb, a1, a2, (r2 - r1) / 2),
    tangentialBurn(gm, r2, a2, r2, (r2 - rb) / 2),
    Math.PI / meanMotion(gm, a1) + Math.PI / meanMotion(gm, a2),
  ];
}

/**
 * Burns between two coplanar circular orbits: [burn 1, burn 2, burn 3, total, time of flight]
 * (km/s, km/s, km/s, km/s, s). Burn magnitudes are positive whichever way the transfer goes.
 *
 * Without `viaRadius` (null, undefined or 0) this is the Hohmann transfer, burn 3 = 0 and the time
 * is half the transfer ellipse's period (Vallado 4th ed. Alg. 36). With `viaRadius` it is the
 * bi-elliptic transfer through a far apse at that radius: out on one half ellipse, a burn at the
 * far apse, back in on a second half ellipse (Vallado Alg. 37). The far apse must lie at or
 * beyond both circles (decision: a "via" radius between or inside them makes no bi-elliptic
 * transfer, so it is refused rather than silently computed as some other three-burn path); at
 * exactly the larger radius one burn is 0 and the time includes half a revolution on that circle.
 * Lowering uses the same formulas with the radii swapped in role: the costs of r1 -> r2 and
 * r2 -> r1 are equal. 0 is read as "no via radius" because a blank cell in a range arrives as 0.
 *
 * Accuracy: each burn to a few ulp relative (cancellation-free form), time to a few ulp.
 */
export function transferBurns(gm: number, radiusFrom: number, radiusTo: number, viaRadius?: number | null): Result<number[]> {
  const bad = firstError(gmCheck(gm), positive("radius_from", radiusFrom, "km"), positive("radius_to", radiusTo, "km"));
  if (bad) return bad;
  let row: number[];
  if (viaRadius === undefined || viaRadius === null || viaRadius === 0) {
    const [b1, b2, tof] = hohmannKernel(gm, radiusFrom, radiusTo);
    row = [b1, b2, 0, b1 + b2, tof];
  } else {
    const outer = Math.max(radiusFrom, radiusTo);
    if (!(viaRadius >= outer) || !Number.isFinite(viaRadius))
      return badArgument(
        "via_radius",
        viaRadius,
        `a radius of at least ${Number(outer.toPrecision(10))} km (the larger of radius_from and radius_to) for the far apse of a bi-elliptic transfer, or leave it out for a Hohmann transfer`,
      );
    const [b1, b2, b3, tof] = biEllipticKernel(gm, radiusFrom, radiusTo, viaRadius);
    row = [b1, b2, b3, b1 + b2 + b3, tof];
  }
  return finiteRow("radius_to", row);
}

/** Total dv (km/s) of the transfer `transferBurns` describes: the same computation, its 4th value. */
export function transferDv(gm: number, radiusFrom: number, radiusTo: number, viaRadius?: number | null): Result<number> {
  const row = transferBurns(gm, radiusFrom, radiusTo, viaRadius);
  return Array.isArray(row) ? row[3] : row;
}

/**
 * Kernel: |v2 - v1| for two velocity vectors of magnitudes s1, s2 at angle `angleRad` (law of
 * cosines), in the form sqrt((s1 - s2)^2 + 4 s1 s2 sin^2(angle/2)), which keeps full precision
 * for small angles and nearly equal speeds where s1^2 + s2^2 - 2 s1 s2 cos(angle) cancels.
 * `speedDifference` is s1 - s2; a caller whose speeds are themselves rounded results (two
 * circular speeds) passes it formed without cancellation.
 */
export function velocityChange(s1: number, s2: number, angleRad: number, speedDifference = s1 - s2): number {
  const d = speedDifference;
  const h = Math.sin(angleRad / 2);
  return Math.sqrt(d * d + 4 * s1 * s2 * h * h);
}

const angleCheck = (angle: number): DomainError | undefined =>
  within("angle", angle, 0, 180, "an angle between the two planes from 0 to 180 deg");

/**
 * Dv (km/s) of a pure plane change at constant speed: 2 v sin(angle/2) (Vallado 4th ed. ch. 6,
 * inclination-only change with zero flight-path angle; Curtis 2nd ed. ch. 6). `speed` is the
 * speed at the burn point, `angle` the angle between the planes. Accuracy: a few ulp.
 */
export function planeChangeDv(speed: number, angle: number): Result<number> {
  const bad = firstError(nonNegative("speed", speed, "km/s"), angleCheck(angle));
  return bad ?? finiteResult("speed", velocityChange(speed, speed, toRadians(angle)));
}

/**
 * Dv (km/s) of a burn that changes the speed from `speedFrom` to `speedTo` and turns the plane by
 * `angle` at the same time: sqrt(v1^2 + v2^2 - 2 v1 v2 cos(angle)), the law of cosines on the two
 * velocity vectors (Vallado 4th ed. ch. 6, combined changes; Curtis 2nd ed. ch. 6; flight-path
 * angle zero before and after). Accuracy: a few ulp.
 */
export function combinedPlaneChangeDv(speedFrom: number, speedTo: number, angle: number): Result<number> {
  const bad = firstError(nonNegative("speed_from", speedFrom, "km/s"), nonNegative("speed_to", speedTo, "km/s"), angleCheck(angle));
  return bad ?? finiteResult("speed_to", velocityChange(speedFrom, speedTo, toRadians(angle)));
}

/**
 * Phasing on a circular orbit: [phasing period (s), phasing sma (km), total dv of the two burns
 * (km/s)].
 *
 * Chaser and target share the circular orbit of `radius`, both moving prograde (the same way
 * round). `phaseAngle` (deg) is how far the target is ahead of the chaser along the direction of
 * motion; negative means behind. The chaser burns tangentially onto a phasing ellipse through its
 * position, flies `revolutions` whole revolutions, and burns back to the circle as the target
 * arrives. The target must cover 360 k - phase in that time, so
 *   T_phase = T (1 - phase / (360 k)),   a_phase = radius (1 - phase / (360 k))^(2/3)
 * (Vallado 4th ed. §6.6, Alg. 44, with k_tgt = k_int = k and his angle theta = -phase; Curtis
 * 2nd ed. ch. 6, phasing maneuvers).
 * A target ahead needs a shorter, lower phasing orbit (burn retrograde first); behind, a longer,
 * higher one. The two burns are equal, so total dv = 2 |v_phase - v_circular| at `radius`.
 *
 * No answer when the phasing ellipse would need its periapsis at or below the centre
 * (a_phase <= radius / 2): more revolutions spread the catch-up. The core knows no body radius,
 * so a phasing orbit that dips into the atmosphere or the surface is not caught here.
 * Accuracy: a few ulp (a_phase - radius is formed with expm1/log1p, so small phase angles keep
 * their relative precision in the dv).
 */
export function phasingOrbit(gm: number, radius: number, phaseAngle: number, revolutions: number): Result<number[]> {
  const bad = firstError(
    gmCheck(gm),
    positive("radius", radius, "km"),
    within("phase_angle", phaseAngle, -360, 360, "a phase angle from -360 to 360 deg (positive: target ahead)"),
    Number.isInteger(revolutions) && revolutions >= 1 ? undefined : badArgument("revolutions", revolutions, "a whole number of revolutions, 1 or more"),
  );
  if (bad) return bad;
  const fraction = phaseAngle / (360 * revolutions);
  if (!(fraction < 1))
    return noAnswer("phase_angle", `catching a target ${phaseAngle} deg ahead in ${revolutions} revolution(s) would need a phasing period of zero; use more revolutions`);
  const smaExcessRatio = Math.expm1((2 / 3) * Math.log1p(-fraction));
  const sma = radius + radius * smaExcessRatio;
  if (!(sma > radius / 2))
    return noAnswer(
      "phase_angle",
      `catching a target ${phaseAngle} deg ahead in ${revolutions} revolution(s) needs a phasing orbit with sma ${Number(sma.toPrecision(6))} km, whose periapsis would be at or below the centre of the body; use more revolutions`,
    );
  const period = TWO_PI / meanMotion(gm, radius);
  const row = [period - period * fraction, sma, 2 * tangentialBurn(gm, radius, radius, sma, radius * smaExcessRatio)];
  return finiteRow("radius", row);
}
