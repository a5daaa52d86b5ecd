/** The operation matrices of a detected group in the standard orientation, with their class labels. */
import type { Mat3 } from '../types.js';
import { pointGroup, pointGroupNames } from '../catalogue.js';
import { closeGroup } from '../closure.js';
import { improper, reflection, rotation } from '../mat3.js';

/** One operation in the standard frame; `classLabel` is the catalogue's class label (e.g. `3σv`) when the catalogue has the group. */
export interface StandardOperation {
  readonly matrix: Mat3;
  readonly classLabel?: string;
}

const Z: readonly [number, number, number] = [0, 0, 1];
const X: readonly [number, number, number] = [1, 0, 0];

/** Generators of an axial group outside the catalogue (e.g. C7v, D10h), in the standard frame. */
function axialGenerators(name: string): Mat3[] {
  const match = /^([CDS])(\d+)([vhd]?)$/.exec(name);
  if (!match) throw new RangeError(`no generators known for point group "${name}"`);
  const [, kind, digits, suffix] = match;
  const n = Number(digits);
  if (kind === 'S') return [improper(Z, (2 * Math.PI) / n)];
  const gens = [rotation(Z, (2 * Math.PI) / n)];
  if (kind === 'D') gens.push(rotation(X, Math.PI));
  if (suffix === 'v') gens.push(reflection([0, 1, 0]));
  if (suffix === 'h') gens.push(reflection(Z));
  // σd bisects neighbouring C2′ axes: the vertical plane at π/2n from x.
  if (suffix === 'd') gens.push(reflection([-Math.sin(Math.PI / (2 * n)), Math.cos(Math.PI / (2 * n)), 0]));
  return gens;
}

/** Whether the engine's catalogue (character tables) has this group. */
export const inCatalogue = (name: string): boolean => pointGroupNames().includes(name);

/**
 * All operations of `name` in the standard orientation. Catalogue groups use the catalogue's own
 * matrices (for C∞v and D∞h those of its finite model group); other axial groups are generated here.
 */
export function standardOperations(name: string): StandardOperation[] {
  if (inCatalogue(name)) {
    const group = pointGroup(name);
    return group.operations.map((o) => ({ matrix: o.matrix, classLabel: group.classes[o.classIndex].label }));
  }
  return closeGroup(axialGenerators(name)).map((matrix) => ({ matrix }));
}
