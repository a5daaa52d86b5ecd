/** Characters of (reducible) representations: reduction, direct products, symmetric powers, power maps. */
import type { Mat3 } from './types.js';
import type { Irrep, PointGroup } from './group-types.js';
import { classIndexOf } from './group-lookup.js';
import { mul } from './mat3.js';
import { cleanNumber } from './numeric.js';

/** Multiplicities per irrep label, listing only irreps that occur, in table order. */
export type Decomposition = Record<string, number>;

/** A representation by its characters per class, with its reduction. */
export interface Representation {
  readonly characters: readonly number[];
  readonly decomposition: Decomposition;
}

/** (1/h) Σ_classes g_c a(c) b(c): the character inner product (characters here are real). */
export function characterInnerProduct(group: PointGroup, a: readonly number[], b: readonly number[]): number {
  return group.classes.reduce((s, c, i) => s + c.size * a[i] * b[i], 0) / group.order;
}

/** The irrep with this label; throws RangeError naming the group's labels otherwise. */
export function irrepByLabel(group: PointGroup, label: string): Irrep {
  const ir = group.irreps.find((i) => i.label === label);
  if (!ir) throw new RangeError(`${group.name} has no irrep "${label}"; its irreps are ${group.irreps.map((i) => i.label).join(', ')}`);
  return ir;
}

/**
 * Reduces characters to irrep multiplicities n_i = ⟨χ, χ_i⟩ / ⟨χ_i, χ_i⟩ (the denominator is 2 for a
 * combined separably degenerate E, 1 otherwise). Throws RangeError(`failure`) when a multiplicity is not
 * a non-negative integer, which means the characters are not those of a representation of the group.
 */
export function reduceCharacters(group: PointGroup, characters: readonly number[], failure?: string): Decomposition {
  if (characters.length !== group.classes.length) {
    throw new RangeError(`${group.name} has ${group.classes.length} classes, got ${characters.length} characters`);
  }
  const out: Decomposition = {};
  for (const ir of group.irreps) {
    const n = characterInnerProduct(group, characters, ir.characters) / characterInnerProduct(group, ir.characters, ir.characters);
    const r = Math.round(n);
    if (Math.abs(n - r) > 1e-6 || r < 0) {
      throw new RangeError(failure ?? `characters do not reduce to whole multiplicities in ${group.name} (${ir.label}: ${n.toFixed(3)})`);
    }
    if (r > 0) out[ir.label] = r;
  }
  return out;
}

/** Characters of the direct product of representations (class by class). */
export function directProduct(...factors: readonly (readonly number[])[]): number[] {
  if (factors.length === 0) throw new RangeError('direct product of nothing');
  return factors.reduce<number[]>((acc, f) => acc.map((x, i) => x * f[i]), factors[0].map(() => 1));
}

const powerCache = new WeakMap<PointGroup, Map<string, number>>();

/** Class index of R^k for R in class c (R^k is in one class whichever member R is). */
export function powerClass(group: PointGroup, classIndex: number, k: number): number {
  let cache = powerCache.get(group);
  if (!cache) powerCache.set(group, (cache = new Map()));
  const key = `${classIndex}^${k}`;
  const hit = cache.get(key);
  if (hit !== undefined) return hit;
  const rep = group.classes[classIndex].representative;
  let p: Mat3 = rep;
  for (let j = 1; j < k; j++) p = mul(p, rep);
  const c = k === 0 ? 0 : classIndexOf(group, p);
  cache.set(key, c);
  return c;
}

/**
 * Characters of the v-th symmetric power of a representation: the symmetry of v quanta in a degenerate
 * mode. Newton's identity h_v(R) = (1/v) Σ_{k=1..v} χ(R^k) h_{v−k}(R), h_0 = 1; for v = 2 this is
 * ½[χ(R)² + χ(R²)].
 */
export function symmetricPower(group: PointGroup, characters: readonly number[], v: number): number[] {
  if (!Number.isInteger(v) || v < 0) throw new RangeError(`number of quanta must be a whole number ≥ 0, got ${v}`);
  const h: number[][] = [group.classes.map(() => 1)];
  for (let n = 1; n <= v; n++) {
    h.push(
      group.classes.map((_, c) => {
        let s = 0;
        for (let k = 1; k <= n; k++) s += characters[powerClass(group, c, k)] * h[n - k][c];
        return s / n;
      }),
    );
  }
  return h[v].map(cleanNumber);
}
