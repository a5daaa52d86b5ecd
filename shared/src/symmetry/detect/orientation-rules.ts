/** Choices between symmetry-equivalent-looking axes and planes that the standard orientation leaves to rules. */
import type { Vec3 } from '../types.js';
import type { PreparedStructure } from './prepare.js';
import { cross, distanceFromLine, dot, unit } from './vec.js';

/** Atom count, then mass, on the line along `axis` (Mulliken 1955: z through the most atoms). */
export function lineScore(s: PreparedStructure, axis: Vec3, tolerance: number): [number, number] {
  let count = 0;
  let mass = 0;
  s.positions.forEach((p, i) => {
    if (distanceFromLine(p, axis) <= tolerance) [count, mass] = [count + 1, mass + s.masses[i]];
  });
  return [count, mass];
}

/** Moment of inertia about the axis through the centre along unit vector `axis` (u·Å²). */
export function momentAbout(s: PreparedStructure, axis: Vec3): number {
  return s.positions.reduce((sum, p, i) => sum + s.masses[i] * distanceFromLine(p, axis) ** 2, 0);
}

/** Atom count, then mass, in the plane with unit normal `normal`. */
export function planeScore(s: PreparedStructure, normal: Vec3, tolerance: number): [number, number] {
  let count = 0;
  let mass = 0;
  s.positions.forEach((p, i) => {
    if (Math.abs(dot(p, normal)) <= tolerance) [count, mass] = [count + 1, mass + s.masses[i]];
  });
  return [count, mass];
}

/** The candidate with the highest score (lexicographic, small differences in mass ignored); the first on ties. */
export function best<T>(items: readonly T[], score: (t: T) => readonly number[]): T {
  let top = items[0];
  let topScore = score(top);
  for (const item of items.slice(1)) {
    const sc = score(item);
    for (let k = 0; k < sc.length; k++) {
      if (Math.abs(sc[k] - topScore[k]) <= 1e-6 * Math.max(1, Math.abs(topScore[k]))) continue;
      if (sc[k] > topScore[k]) [top, topScore] = [item, sc];
      break;
    }
  }
  return top;
}

/** A unit vector perpendicular to z: the projection of the first atom off the axis, else any. */
export function perpendicularTowardAtoms(s: PreparedStructure, z: Vec3, order: readonly number[], tolerance: number): Vec3 {
  for (const i of order) {
    const p = s.positions[i];
    if (distanceFromLine(p, z) > tolerance) return unit([p[0] - dot(p, z) * z[0], p[1] - dot(p, z) * z[1], p[2] - dot(p, z) * z[2]])!;
  }
  const helper: Vec3 = Math.abs(z[0]) < 0.9 ? [1, 0, 0] : [0, 1, 0];
  return unit(cross(helper, z))!;
}

/** The in-plane direction perpendicular to z of a vertical plane with unit normal `normal`. */
export const inPlane = (z: Vec3, normal: Vec3): Vec3 => unit(cross(normal, z))!;
