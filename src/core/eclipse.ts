import { toRadians } from "./angles";
import { badArgument, firstError, positive, within, type Result } from "./domain";
import { meanMotion } from "./twobody";

/**
 * Time a circular orbit spends in the body's shadow per revolution, s, for a Sun at beta angle
 * `betaAngle` (deg) from the orbit plane. Cylindrical shadow (the Sun taken at infinity, no
 * penumbra, spherical body): the orbit is in shadow while its distance from the Sun line is
 * below R on the night side, which gives the eclipse fraction of the period
 *   f = (1/pi) acos( sqrt(r^2 - R^2) / (r cos beta) ),   0 when |beta| >= beta* = asin(R/r)
 * (with r = R + h this is the common form acos(sqrt(h^2 + 2Rh) / ((R + h) cos beta)) / 180 deg;
 * e.g. Wertz and Larson, Space Mission Analysis and Design, 3rd ed., ch. 5, and the usual
 * spacecraft thermal texts). The period is the two-body one, 2 pi / sqrt(GM / r^3).
 * Accuracy: the geometry is exact for a cylinder; against the real conical umbra plus penumbra
 * it differs by well under a minute in low Earth orbit (the Sun's 0.27 deg radius moves the
 * shadow edges by about 10 s each); atmospheric refraction and the body's oblateness are
 * ignored. For preliminary thermal and power budgets only.
 */
export function eclipseDuration(bodyRadius: number, gm: number, radius: number, betaAngle: number): Result<number> {
  const bad = firstError(
    positive("body_radius", bodyRadius, "km"),
    positive("body", gm, "km3/s2 (GM)"),
    positive("radius", radius, "km (orbit radius from the body's centre)"),
    within("beta_angle", betaAngle, -90, 90, "a beta angle from -90 to 90 deg"),
  );
  if (bad) return bad;
  if (radius <= bodyRadius)
    return badArgument("radius", radius, `an orbit radius above the body radius ${bodyRadius} km (radius is measured from the centre, not an altitude)`);
  const period = (2 * Math.PI) / meanMotion(gm, radius);
  return period * eclipseFractionKernel(bodyRadius / radius, toRadians(betaAngle));
}

/**
 * Kernel: fraction of a circular orbit in a cylindrical shadow, given R/r and beta (rad).
 * The shadow half-angle h has cos h = sqrt(1 - (R/r)^2) / cos beta and
 * sin h = sqrt((R/r)^2 - sin^2 beta) / cos beta; taking atan2 of the two keeps full accuracy
 * near the grazing edge |beta| = asin(R/r), where the arc-cosine form loses half its digits.
 */
export function eclipseFractionKernel(radiusRatio: number, betaRad: number): number {
  const sinBeta = Math.abs(Math.sin(betaRad));
  if (sinBeta >= radiusRatio) return 0;
  const chord = Math.sqrt((1 - radiusRatio) * (1 + radiusRatio));
  return Math.atan2(Math.sqrt((radiusRatio - sinBeta) * (radiusRatio + sinBeta)), chord) / Math.PI;
}
