import { clampedAcos, clampedAsin, toDegrees, toRadians, TWO_PI } from "./angles";
import { badArgument, firstError, positive, within, type DomainError, type Result } from "./domain";
import { slantRangeKernel } from "./geodesy";
import { apsidalRateKernel, j2RateFactor, meanAnomalyRateKernel, nodalRateKernel } from "./j2";
import { meanMotion } from "./twobody";
import { WGS84_A, WGS84_GM, WGS84_J2, WGS84_OMEGA } from "./wgs84";

/**
 * Coverage of a circular orbit over a spherical Earth, in the closed forms of the mission-geometry
 * texts: Wertz and Larson (eds.), Space Mission Analysis and Design, 3rd ed. (1999), §5.2 ("Earth
 * geometry viewed from space") and §5.3 ("apparent motion of satellites for an observer on the
 * Earth"); equation numbers from memory (5-16 to 5-19 for the viewing geometry, the pass duration
 * of §5.3):
 *   angular radius of the Earth  sin(rho) = R / (R + h)
 *   nadir angle                  sin(eta) = cos(eps) sin(rho)          (eps: elevation at the site)
 *   Earth central angle          lambda   = 90 deg - eps - eta
 *   slant range                  D        = R sin(lambda) / sin(eta)
 *   pass duration                T        = (P / 180 deg) acos(cos(lambda_max) / cos(lambda_min))
 * with P the two-body period, lambda_max the central angle at the minimum elevation and lambda_min
 * the smallest central angle between the site and the ground track. The Earth is a sphere of the
 * WGS 84 equatorial radius (6378.137 km) and GM 398600.4418 km^3/s^2 (src/core/wgs84.ts); the
 * Earth's rotation during the pass is ignored (it shortens or lengthens a low-orbit pass by up to
 * a few percent). Planning values: for real passes use the pass search (src/core/passes.ts).
 */

const R = WGS84_A;

function checkAltitude(altitude: number): DomainError | undefined {
  return positive("altitude", altitude, "km above the surface (a circular orbit)");
}

const checkElevation = (parameter: string, elevation: number): DomainError | undefined =>
  within(parameter, elevation, 0, 90, "an elevation from 0 (horizon) to 90 (overhead) deg");

/** Kernel: Earth central angle lambda (rad) at elevation eps (deg) for altitude h (km) on a sphere of radius r. */
export function centralAngleAtElevation(bodyRadius: number, altitude: number, elevation: number): number {
  const eps = toRadians(elevation);
  const eta = clampedAsin(Math.cos(eps) * (bodyRadius / (bodyRadius + altitude)));
  return Math.max(0, Math.PI / 2 - eps - eta);
}

/**
 * Distance (km) from a ground site to a satellite at `altitude` km seen at `elevation` deg: the
 * SMAD D = R sin(lambda) / sin(eta), evaluated in the cancellation-free form of horizonRange
 * (src/core/geodesy.ts). Sphere of the WGS 84 equatorial radius unless `bodyRadius` is given.
 */
export function slantRange(altitude: number, elevation: number, bodyRadius?: number | null): Result<number> {
  const radius = bodyRadius ?? R;
  const bad = firstError(
    bodyRadius === null || bodyRadius === undefined ? undefined : positive("body", bodyRadius, "km (the body's radius)"),
    Number.isFinite(altitude) && altitude >= 0 ? undefined : badArgument("altitude", altitude, "an altitude of 0 km or more above the surface"),
    checkElevation("elevation", elevation),
  );
  if (bad) return bad;
  return slantRangeKernel(radius, altitude, elevation);
}

/** Earth central angle (deg) of the coverage circle of a satellite at `altitude` km for a minimum elevation (deg): lambda = 90 - eps - eta. */
export function coverageHalfAngle(altitude: number, minElevation: number): Result<number> {
  const bad = firstError(checkAltitude(altitude), checkElevation("min_elevation", minElevation));
  if (bad) return bad;
  return toDegrees(centralAngleAtElevation(R, altitude, minElevation));
}

/** Width (km, along the ground) of the strip that sees the satellite above the minimum elevation: 2 lambda R. */
export function swathWidth(altitude: number, minElevation: number): Result<number> {
  const bad = firstError(checkAltitude(altitude), checkElevation("min_elevation", minElevation));
  if (bad) return bad;
  return 2 * R * centralAngleAtElevation(R, altitude, minElevation);
}

const periodOf = (altitude: number): number => TWO_PI / meanMotion(WGS84_GM, R + altitude);

/** Longest pass (s) over a site, straight overhead, above the minimum elevation: T = P 2 lambda_max / 360 deg. */
export function maxPassDuration(altitude: number, minElevation: number): Result<number> {
  const bad = firstError(checkAltitude(altitude), checkElevation("min_elevation", minElevation));
  if (bad) return bad;
  return (periodOf(altitude) * centralAngleAtElevation(R, altitude, minElevation)) / Math.PI;
}

/**
 * Duration (s) of a pass above the minimum elevation whose ground track passes `offset` deg (Earth
 * central angle) from the site: T = (P / 180 deg) acos(cos lambda_max / cos lambda_min); 0 when
 * the offset is at or beyond the coverage half-angle (no pass).
 */
export function passDuration(altitude: number, minElevation: number, offset: number): Result<number> {
  const bad = firstError(checkAltitude(altitude), checkElevation("min_elevation", minElevation), within("offset", offset, 0, 90, "an Earth central angle from 0 to 90 deg between the ground track and the site"));
  if (bad) return bad;
  const lambdaMax = centralAngleAtElevation(R, altitude, minElevation);
  const lambdaMin = toRadians(offset);
  if (lambdaMin >= lambdaMax) return 0;
  return (periodOf(altitude) / Math.PI) * clampedAcos(Math.cos(lambdaMax) / Math.cos(lambdaMin));
}

/**
 * Distance (km, along the equator) between the ground tracks of successive ascending passes of a
 * circular orbit: the Earth turns under the orbit by (w_E - dRAAN/dt) T between node crossings.
 * Without `inc`, T is the two-body period and the node is fixed (SMAD 3rd ed. §5.3: the shift is
 * 360 deg x P / 1436 min). With `inc` (deg), the J2 secular rates (src/core/j2.ts, WGS 84 J2) give
 * the node drift and the nodal period 2 pi / (n + dM/dt + dargp/dt). w_E is the WGS 84 rotation
 * rate 7.292115e-5 rad/s. A first-order value: within about 0.1 % of a full propagation.
 */
export function groundTrackSpacing(altitude: number, inc?: number | null): Result<number> {
  const bad = firstError(checkAltitude(altitude), inc === null || inc === undefined ? undefined : within("inc", inc, 0, 180, "an inclination from 0 to 180 deg"));
  if (bad) return bad;
  const sma = R + altitude;
  const n = meanMotion(WGS84_GM, sma);
  if (inc === null || inc === undefined) return R * WGS84_OMEGA * (TWO_PI / n);
  const f = j2RateFactor(WGS84_GM, R, WGS84_J2, sma, 0);
  const i = toRadians(inc);
  const nodal = TWO_PI / (n + meanAnomalyRateKernel(f, 0, i) + apsidalRateKernel(f, i));
  return R * (WGS84_OMEGA - nodalRateKernel(f, i)) * nodal;
}
