/** Small fixed-size helpers for 3×3 operation matrices (row-major, acting on column vectors). */
import type { Mat3, Vec3 } from './types.js';

/** The identity matrix. */
export const IDENTITY: Mat3 = [1, 0, 0, 0, 1, 0, 0, 0, 1];

/** Matrix product a·b (apply b first, then a). */
export function mul(a: Mat3, b: Mat3): Mat3 {
  const r: number[] = new Array(9);
  for (let i = 0; i < 3; i++) {
    for (let j = 0; j < 3; j++) {
      r[3 * i + j] = a[3 * i] * b[j] + a[3 * i + 1] * b[3 + j] + a[3 * i + 2] * b[6 + j];
    }
  }
  return r as unknown as Mat3;
}

/** Transpose (the inverse of an orthogonal matrix). */
export function transpose(m: Mat3): Mat3 {
  return [m[0], m[3], m[6], m[1], m[4], m[7], m[2], m[5], m[8]];
}

/** Scalar multiple s·m. */
export function scale(m: Mat3, s: number): Mat3 {
  return m.map((v) => v * s) as unknown as Mat3;
}

/** Trace. */
export function trace(m: Mat3): number {
  return m[0] + m[4] + m[8];
}

/** Determinant. */
export function det(m: Mat3): number {
  return (
    m[0] * (m[4] * m[8] - m[5] * m[7]) - m[1] * (m[3] * m[8] - m[5] * m[6]) + m[2] * (m[3] * m[7] - m[4] * m[6])
  );
}

/** m·v. */
export function apply(m: Mat3, v: Vec3): Vec3 {
  return [
    m[0] * v[0] + m[1] * v[1] + m[2] * v[2],
    m[3] * v[0] + m[4] * v[1] + m[5] * v[2],
    m[6] * v[0] + m[7] * v[1] + m[8] * v[2],
  ];
}

/** Largest absolute entry difference between two matrices. */
export function maxDiff(a: Mat3, b: Mat3): number {
  let d = 0;
  for (let i = 0; i < 9; i++) d = Math.max(d, Math.abs(a[i] - b[i]));
  return d;
}

/** Unit vector along v. */
export function normalize(v: Vec3): Vec3 {
  const n = Math.hypot(v[0], v[1], v[2]);
  if (n === 0) throw new RangeError('cannot normalise a zero vector');
  return [v[0] / n, v[1] / n, v[2] / n];
}

/** Proper rotation by angle (radians, right-handed) about axis (Rodrigues' formula). */
export function rotation(axis: Vec3, angle: number): Mat3 {
  const [x, y, z] = normalize(axis);
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  const t = 1 - c;
  return [
    t * x * x + c, t * x * y - s * z, t * x * z + s * y,
    t * x * y + s * z, t * y * y + c, t * y * z - s * x,
    t * x * z - s * y, t * y * z + s * x, t * z * z + c,
  ];
}

/** Reflection through the plane with the given normal. */
export function reflection(normal: Vec3): Mat3 {
  const [x, y, z] = normalize(normal);
  return [1 - 2 * x * x, -2 * x * y, -2 * x * z, -2 * x * y, 1 - 2 * y * y, -2 * y * z, -2 * x * z, -2 * y * z, 1 - 2 * z * z];
}

/** Improper rotation S(angle): rotation about axis followed by reflection through the plane normal to it. */
export function improper(axis: Vec3, angle: number): Mat3 {
  return mul(reflection(axis), rotation(axis, angle));
}

/** The inversion −1. */
export const INVERSION: Mat3 = [-1, 0, 0, 0, -1, 0, 0, 0, -1];

/** Canonical string key of a matrix, rounding away floating-point noise (entries are cosines and sines). */
export function matKey(m: Mat3): string {
  return m.map((v) => (Math.abs(v) < 5e-7 ? 0 : Math.round(v * 1e6))).join(',');
}
