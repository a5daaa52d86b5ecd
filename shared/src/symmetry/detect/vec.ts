/** Vector helpers the detection needs beyond the engine's mat3 module. */
import type { Vec3 } from '../types.js';

/** Dot product. */
export const dot = (a: Vec3, b: Vec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];

/** Cross product a × b. */
export const cross = (a: Vec3, b: Vec3): Vec3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];

/** a + s·b. */
export const addScaled = (a: Vec3, b: Vec3, s: number): Vec3 => [a[0] + s * b[0], a[1] + s * b[1], a[2] + s * b[2]];

/** Euclidean length. */
export const norm = (a: Vec3): number => Math.sqrt(a[0] * a[0] + a[1] * a[1] + a[2] * a[2]);

/** Unit vector along a, or undefined when a is (numerically) zero. */
export function unit(a: Vec3, minLength = 1e-8): Vec3 | undefined {
  const n = norm(a);
  return n < minLength ? undefined : [a[0] / n, a[1] / n, a[2] / n];
}

/** Distance from point p to the line through the origin along unit vector u. */
export const distanceFromLine = (p: Vec3, u: Vec3): number => norm(addScaled(p, u, -dot(p, u)));

/** Whether unit vectors a and b are parallel or antiparallel within `angle` radians. */
export const sameLine = (a: Vec3, b: Vec3, angle: number): boolean => Math.abs(dot(a, b)) > Math.cos(angle);

/** Greatest common divisor of non-negative integers. */
export function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}
