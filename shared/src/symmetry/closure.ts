/** Builds a finite matrix group from generators and splits it into conjugacy classes. */
import type { Mat3 } from './types.js';
import { IDENTITY, matKey, mul, transpose } from './mat3.js';

/** Largest group order the catalogue needs (Ih has 120); anything beyond means a wrong generator. */
const MAX_ORDER = 240;

/** All products of the generators (the group they generate), identity first. */
export function closeGroup(generators: readonly Mat3[]): Mat3[] {
  const elements: Mat3[] = [IDENTITY];
  const seen = new Set([matKey(IDENTITY)]);
  // Breadth-first: multiply every element found so far by every generator until nothing new appears.
  for (let i = 0; i < elements.length; i++) {
    for (const g of generators) {
      const p = mul(g, elements[i]);
      const key = matKey(p);
      if (!seen.has(key)) {
        seen.add(key);
        elements.push(p);
        if (elements.length > MAX_ORDER) throw new RangeError('generators do not form a finite point group');
      }
    }
  }
  return elements;
}

/** Conjugacy classes as lists of element indices, each class in order of first appearance. */
export function conjugacyClasses(elements: readonly Mat3[]): number[][] {
  const index = new Map(elements.map((m, i) => [matKey(m), i]));
  const classOf = new Array<number>(elements.length).fill(-1);
  const classes: number[][] = [];
  elements.forEach((x, i) => {
    if (classOf[i] >= 0) return;
    const members = new Set<number>();
    for (const g of elements) {
      // Orthogonal matrices: g⁻¹ = gᵀ.
      const j = index.get(matKey(mul(mul(g, x), transpose(g))));
      if (j === undefined) throw new RangeError('element set is not closed under conjugation');
      members.add(j);
    }
    const list = [...members].sort((a, b) => a - b);
    list.forEach((j) => (classOf[j] = classes.length));
    classes.push(list);
  });
  return classes;
}
