/**
 * Small 3-vector helpers on plain arrays [x, y, z]. Each is a handful of float64 operations,
 * correctly rounded per operation; `norm` uses a plain sum of squares (no scaling), which is
 * exact to a few ulp for every state vector of the trade (components far from 1e±150).
 */
export type Vec3 = readonly [number, number, number];

export const dot = (a: Vec3, b: Vec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];

export const cross = (a: Vec3, b: Vec3): [number, number, number] => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];

export const norm = (a: Vec3): number => Math.sqrt(a[0] * a[0] + a[1] * a[1] + a[2] * a[2]);

/** s·a + t·b, the linear combination the f and g functions and the element rotations need. */
export const combine = (s: number, a: Vec3, t: number, b: Vec3): [number, number, number] => [
  s * a[0] + t * b[0],
  s * a[1] + t * b[1],
  s * a[2] + t * b[2],
];

/** Signed angle from a to b (rad, in (-π, π]) about the unit vector `normal` (right-hand rule); atan2 keeps full accuracy near 0 and π, where acos loses half the digits. */
export const signedAngle = (a: Vec3, b: Vec3, normal: Vec3): number => Math.atan2(dot(cross(a, b), normal), dot(a, b));
