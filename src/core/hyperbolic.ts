import { clampedAsin, toDegrees } from "./angles";
import { badArgument, finiteResult, firstError, isDomainError, noAnswer, nonNegative, positive, type DomainError, type Result } from "./domain";
import { circularSpeed, escapeSpeed } from "./twobody";

/**
 * Escape, capture and flyby on hyperbolic trajectories (patched conics). Sheet units: GM
 * km^3/s^2, radii km, speeds km/s, C3 km^2/s^2, angles deg. Burns are impulsive at periapsis, the
 * planet is a point mass, and the sphere of influence is taken as infinitely far: a first-order
 * budget. Methods: Curtis, Orbital Mechanics for Engineering Students, 2nd ed., ch. 8 (planetary
 * departure, rendezvous and flyby); Vallado 4th ed. §12.2 (patched conics).
 */

const gmCheck = (gm: number): DomainError | undefined => positive("body", gm, "km3/s2 (GM)");

/** Escape speed (twobody.escapeSpeed) for arguments the caller has already checked. */
function escapeAt(gm: number, radius: number): number {
  const v = escapeSpeed(gm, radius);
  return isDomainError(v) ? NaN : v;
}

/**
 * Hyperbolic excess speed v_inf (km/s) of an object at `radius` (km) moving at `speed` (km/s):
 * v_inf^2 = v^2 - 2 GM / r (energy equation), formed as (v - v_esc)(v + v_esc) so speeds
 * just above escape keep their precision. Exactly escape speed gives 0 (parabola); slower is a
 * bound orbit that never reaches infinity, so there is no answer. Accuracy: a few ulp relative
 * to v^2 / v_inf^2, the problem's own conditioning (rounding in v and v_esc is magnified just
 * above escape speed).
 */
export function hyperbolicExcessSpeed(gm: number, radius: number, speed: number): Result<number> {
  const bad = firstError(gmCheck(gm), positive("radius", radius, "km"), nonNegative("speed", speed, "km/s"));
  if (bad) return bad;
  const escape = escapeAt(gm, radius);
  if (speed < escape)
    return noAnswer(
      "speed",
      `${speed} km/s is below the escape speed ${Number(escape.toPrecision(8))} km/s at ${radius} km, so the orbit is bound and has no hyperbolic excess speed`,
    );
  return finiteResult("speed", Math.sqrt((speed - escape) * (speed + escape)));
}

/** Characteristic energy C3 = v_inf^2 (km^2/s^2), twice the specific energy of the escape orbit. */
export function c3Energy(vInfinity: number): Result<number> {
  return nonNegative("v_infinity", vInfinity, "km/s") ?? finiteResult("v_infinity", vInfinity * vInfinity);
}

/**
 * Kernel: the periapsis burn between a hyperbola of excess speed vInf and an ellipse of
 * eccentricity ecc with the same periapsis radius rp (0 = circle). v_hyp = sqrt(v_inf^2 + v_esc^2),
 * v_ell = v_c sqrt(1 + e); their difference is formed as (v_hyp^2 - v_ell^2)/(v_hyp + v_ell) =
 * (v_inf^2 + v_c^2 (1 - e)) / (v_hyp + v_ell), free of cancellation.
 */
export function periapsisBurn(gm: number, rp: number, vInf: number, ecc: number): number {
  const vc = circularSpeed(gm, rp);
  const vHyp = Math.hypot(vInf, escapeAt(gm, rp));
  const vEll = vc * Math.sqrt(1 + ecc);
  return (vInf * vInf + vc * vc * (1 - ecc)) / (vHyp + vEll);
}

/**
 * Dv (km/s) to leave a circular parking orbit of radius `parkingRadius` (km) on a hyperbola
 * of excess speed `vInfinity` (km/s), burning once at periapsis: v_c (sqrt(2 + (v_inf/v_c)^2) - 1)
 * (Curtis 2nd ed. eq. 8.42). Accuracy: a few ulp.
 */
export function departureDv(gm: number, parkingRadius: number, vInfinity: number): Result<number> {
  const bad = firstError(gmCheck(gm), positive("parking_radius", parkingRadius, "km"), nonNegative("v_infinity", vInfinity, "km/s"));
  return bad ?? finiteResult("v_infinity", periapsisBurn(gm, parkingRadius, vInfinity, 0));
}

/**
 * Dv (km/s) to capture from a hyperbola of excess speed `vInfinity` (km/s) into an orbit of
 * periapsis radius `periapsisRadius` (km) and eccentricity `captureEcc` (0 = circular, the
 * default; below 1), burning once at periapsis (Curtis 2nd ed. ch. 8, planetary rendezvous).
 * Accuracy: a few ulp.
 */
export function captureDv(gm: number, periapsisRadius: number, vInfinity: number, captureEcc?: number | null): Result<number> {
  const ecc = captureEcc ?? 0;
  const bad = firstError(
    gmCheck(gm),
    positive("periapsis_radius", periapsisRadius, "km"),
    nonNegative("v_infinity", vInfinity, "km/s"),
    ecc >= 0 && ecc < 1 ? undefined : badArgument("capture_ecc", captureEcc, "an eccentricity from 0 (circular) up to but not including 1"),
  );
  return bad ?? finiteResult("v_infinity", periapsisBurn(gm, periapsisRadius, vInfinity, ecc));
}

/**
 * Turn angle (deg) of the excess velocity in an unpowered flyby with periapsis radius
 * `periapsisRadius` (km) and excess speed `vInfinity` (km/s): delta = 2 asin(1/e), e = 1 +
 * r_p v_inf^2 / GM (Curtis 2nd ed. ch. 8, planetary flyby). Whether the periapsis
 * clears the surface or atmosphere is for the caller to judge. Accuracy: a few ulp.
 */
export function flybyTurnAngle(gm: number, periapsisRadius: number, vInfinity: number): Result<number> {
  const bad = firstError(
    gmCheck(gm),
    positive("periapsis_radius", periapsisRadius, "km"),
    positive("v_infinity", vInfinity, "km/s (a flyby needs a hyperbola; at 0 the path is a parabola)"),
  );
  if (bad) return bad;
  const ecc = 1 + (periapsisRadius * vInfinity * vInfinity) / gm;
  return finiteResult("v_infinity", toDegrees(2 * clampedAsin(1 / ecc)));
}
