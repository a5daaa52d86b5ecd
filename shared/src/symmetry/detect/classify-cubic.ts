/** The cubic and icosahedral branch: T, Td, Th, O, Oh, I, Ih from three perpendicular C2 axes. */
import type { Vec3 } from '../types.js';
import { reflection } from '../mat3.js';
import { confirmRotation } from './element-search.js';
import type { AtomMatcher } from '../atom-matcher.js';
import type { Classification } from './classify.js';
import { cross, dot, unit } from './vec.js';

const PHI = (1 + Math.sqrt(5)) / 2;
const PERPENDICULAR = Math.sin(0.1);

/** A vector given by its components in the frame (x, y, z), written in the input frame. */
const inFrame = (x: Vec3, y: Vec3, z: Vec3, c: Vec3): Vec3 =>
  [0, 1, 2].map((k) => c[0] * x[k] + c[1] * y[k] + c[2] * z[k]) as unknown as Vec3;

/**
 * Looks for three mutually perpendicular C2 axes with a C3 along their (1, 1, 1) diagonal; these
 * exist in every cubic and icosahedral group and in no other. Returns undefined if there are none.
 */
export function cubicGroup(m: AtomMatcher, c2: readonly Vec3[], inversion: boolean): Classification | undefined {
  for (let i = 0; i < c2.length; i++) {
    for (let j = i + 1; j < c2.length; j++) {
      if (Math.abs(dot(c2[i], c2[j])) > PERPENDICULAR) continue;
      const x = c2[i];
      const y = unit(cross(cross(x, c2[j]), x))!;
      const z = cross(x, y);
      if (!c2.some((a) => Math.abs(dot(a, z)) > Math.cos(0.1))) continue;
      if (!confirmRotation(m, inFrame(x, y, z, [1, 1, 1]), 3)) continue;
      return family(m, x, y, z, inversion);
    }
  }
  return undefined;
}

function family(m: AtomMatcher, x: Vec3, y: Vec3, z: Vec3, inversion: boolean): Classification {
  if (confirmRotation(m, z, 4)) return { name: inversion ? 'Oh' : 'O', x, y, z };
  const fivefold = (a: Vec3, b: Vec3) => confirmRotation(m, inFrame(a, b, cross(a, b), [0, 1, PHI]), 5) !== undefined;
  if (fivefold(x, y)) return { name: inversion ? 'Ih' : 'I', x, y, z };
  // The other icosahedral setting: swapping x and y (and turning z over) puts the C5 at (0, 1, φ).
  if (fivefold(y, x)) return { name: inversion ? 'Ih' : 'I', x: y, y: x, z: cross(y, x) };
  if (inversion) return { name: 'Th', x, y, z };
  const sigmaD = m.holds(reflection(inFrame(x, y, z, [1, -1, 0])));
  return { name: sigmaD ? 'Td' : 'T', x, y, z };
}
