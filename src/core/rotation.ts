import type { Vec3 } from "./vector3";

/**
 * 3x3 rotation matrices on plain row-major arrays, in the convention of Vallado, Fundamentals of
 * Astrodynamics and Applications, 4th ed., §3.7 (ROT1, ROT2, ROT3 rotate the frame, not the
 * vector, by a positive angle about the x, y, z axis):
 *   ROT3(a) = [[cos a, sin a, 0], [-sin a, cos a, 0], [0, 0, 1]], and likewise for ROT1, ROT2.
 */
export type Mat3 = readonly [Vec3, Vec3, Vec3];

export function rot1(a: number): Mat3 {
  const c = Math.cos(a), s = Math.sin(a);
  return [[1, 0, 0], [0, c, s], [0, -s, c]];
}

export function rot2(a: number): Mat3 {
  const c = Math.cos(a), s = Math.sin(a);
  return [[c, 0, -s], [0, 1, 0], [s, 0, c]];
}

export function rot3(a: number): Mat3 {
  const c = Math.cos(a), s = Math.sin(a);
  return [[c, s, 0], [-s, c, 0], [0, 0, 1]];
}

/** Matrix product a b. */
export function multiply(a: Mat3, b: Mat3): Mat3 {
  const row = (i: number): Vec3 => [
    a[i][0] * b[0][0] + a[i][1] * b[1][0] + a[i][2] * b[2][0],
    a[i][0] * b[0][1] + a[i][1] * b[1][1] + a[i][2] * b[2][1],
    a[i][0] * b[0][2] + a[i][1] * b[1][2] + a[i][2] * b[2][2],
  ];
  return [row(0), row(1), row(2)];
}

/** Product of several matrices, left to right. */
export const chain = (...ms: Mat3[]): Mat3 => ms.reduce((p, m) => multiply(p, m));

export const transpose = (m: Mat3): Mat3 => [
  [m[0][0], m[1][0], m[2][0]],
  [m[0][1], m[1][1], m[2][1]],
  [m[0][2], m[1][2], m[2][2]],
];

/** m v. */
export const apply = (m: Mat3, v: Vec3): [number, number, number] => [
  m[0][0] * v[0] + m[0][1] * v[1] + m[0][2] * v[2],
  m[1][0] * v[0] + m[1][1] * v[1] + m[1][2] * v[2],
  m[2][0] * v[0] + m[2][1] * v[1] + m[2][2] * v[2],
];
