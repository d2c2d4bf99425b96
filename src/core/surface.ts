import { TWO_PI, toRadians } from "./angles";
import { badArgument, firstError, positive, within, type Result } from "./domain";

/**
 * Eastward speed of a point on the body's surface due to its rotation, km/s:
 *   v = 2 pi R cos(lat) / T
 * with R the body radius (km, a sphere), T the sidereal rotation period (s) and lat the latitude
 * (deg, north positive). A negative period means retrograde rotation (Venus, Uranus, Pluto) and
 * gives a negative speed, i.e. the surface moves west. Exact on the sphere apart from rounding
 * (a few ulp). On an oblate body the distance from the axis at geodetic latitude is
 * a cos(lat) / sqrt(1 - e^2 sin^2 lat); with Earth's equatorial radius the sphere is low by
 * 0.17 % at 45 deg and at most 0.34 % (near the poles, where the speed is small anyway).
 */
export function surfaceRotationSpeed(bodyRadius: number, rotationPeriod: number, latitude: number): Result<number> {
  const bad = firstError(
    positive("body_radius", bodyRadius, "km"),
    Number.isFinite(rotationPeriod) && rotationPeriod !== 0
      ? undefined
      : badArgument("rotation_period", rotationPeriod, "the body's sidereal rotation period in s, nonzero (negative for retrograde rotation)"),
    within("latitude", latitude, -90, 90, "a latitude from -90 (south) to 90 (north) deg"),
  );
  if (bad) return bad;
  return equatorialRotationSpeed(bodyRadius, rotationPeriod) * cosDegreesExactAtPoles(latitude);
}

/** Kernel: 2 pi R / T, km/s (no validation). */
export const equatorialRotationSpeed = (bodyRadius: number, rotationPeriod: number): number => (TWO_PI * bodyRadius) / rotationPeriod;

/** cos(lat) written as sin(90 - |lat|) so the poles give exactly 0 rather than 6e-17. */
const cosDegreesExactAtPoles = (latitude: number): number => Math.sin(toRadians(90 - Math.abs(latitude)));
