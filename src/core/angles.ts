/**
 * Degree/radian conversion and angle reduction. Sheet angles are degrees (DEVELOPERS.md, "Conventions"); the
 * kernels work in radians, converted once at their entry. Inverse trigonometry is clamped so that
 * rounding a hair outside [-1, 1] gives the boundary angle rather than NaN (the d3-geo habit).
 */
export const DEG_PER_RAD = 180 / Math.PI;
export const RAD_PER_DEG = Math.PI / 180;
export const TWO_PI = 2 * Math.PI;

export const toRadians = (deg: number): number => deg * RAD_PER_DEG;
export const toDegrees = (rad: number): number => rad * DEG_PER_RAD;

/** Reduces to [0, 360). */
export function wrapDegrees360(deg: number): number {
  const r = deg % 360;
  const w = r < 0 ? r + 360 : r;
  return w >= 360 ? 0 : w;
}

/** Reduces to [-180, 180). */
export function wrapDegrees180(deg: number): number {
  return wrapDegrees360(deg + 180) - 180;
}

/** Reduces to [0, 2π). */
export function wrapRadians(rad: number): number {
  const r = rad % TWO_PI;
  const w = r < 0 ? r + TWO_PI : r;
  return w >= TWO_PI ? 0 : w;
}

export const clampedAcos = (x: number): number => (x >= 1 ? 0 : x <= -1 ? Math.PI : Math.acos(x));
export const clampedAsin = (x: number): number => (x >= 1 ? Math.PI / 2 : x <= -1 ? -Math.PI / 2 : Math.asin(x));

/**
 * The rest of deg after whole turns, |rest| <= 180, exactly (fmod is exact), so deg - rest is
 * the whole turns, exactly a multiple of 360. One number, not a pair: the anomaly kernels call
 * it once per case in a lifted column.
 */
export function halfTurnRest(deg: number): number {
  // Within one and a half turns a single exact subtraction does (Sterbenz: deg -+ 360 is exact
  // for |deg| in [180, 720]), sparing the slower fmod on the common inputs.
  if (deg >= -180 && deg <= 180) return deg;
  if (deg > 180 && deg <= 540) return deg - 360;
  if (deg < -180 && deg >= -540) return deg + 360;
  let rest = deg % 360;
  if (rest > 180) rest -= 360;
  else if (rest < -180) rest += 360;
  return rest;
}
