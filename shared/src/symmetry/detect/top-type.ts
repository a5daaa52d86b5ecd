/** Rotor type of a molecule, read from its point group so that noise cannot split a degenerate pair. */
import type { Vec3 } from '../types.js';
import type { PreparedStructure } from './prepare.js';
import { momentAbout } from './orientation-rules.js';

export type TopType = 'linear' | 'spherical' | 'symmetric-prolate' | 'symmetric-oblate' | 'asymmetric';

/**
 * Linear groups → linear; cubic and icosahedral → spherical; groups with a degenerate irrep (a Cn
 * with n ≥ 3, or an S4 axis) → symmetric top, prolate when the moment about the axis is the small
 * one; everything else → asymmetric (an accidental degeneracy is not symmetry).
 */
export function topType(group: string, moments: readonly [number, number, number], z: Vec3, s: PreparedStructure): TopType {
  if (group === 'C∞v' || group === 'D∞h') return 'linear';
  if (/^(T|Td|Th|O|Oh|I|Ih)$/.test(group)) return 'spherical';
  const n = Number(/^[CDS](\d+)/.exec(group)?.[1] ?? 1);
  const symmetric = group.startsWith('S') ? n >= 4 : n >= 3 || group === 'D2d';
  if (!symmetric) return 'asymmetric';
  const axial = momentAbout(s, z);
  const mean = (moments[0] + moments[1] + moments[2]) / 3;
  return axial < mean ? 'symmetric-prolate' : 'symmetric-oblate';
}
