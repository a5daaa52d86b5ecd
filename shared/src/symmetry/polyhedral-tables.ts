/**
 * The rotation groups T, O and I: class columns in the standard orientation of `types.ts` and their
 * characters as printed in Cotton, *Chemical Applications of Group Theory*, 3rd ed., Appendix IIA
 * (from memory; the catalogue tests check orthogonality and the x, y, z bases against the matrices).
 */
import type { Mat3 } from './types.js';
import type { Complex } from './group-types.js';
import type { ClassSpec, IrrepSpec } from './group-spec.js';
import { rotation } from './mat3.js';

const PHI = (1 + Math.sqrt(5)) / 2;
const C3_AXIS = [1, 1, 1] as const;
/** A five-fold axis of I in the standard orientation: (0, 1, φ). */
const C5_AXIS = [0, 1, PHI] as const;
const Z = [0, 0, 1] as const;

const c3 = rotation(C3_AXIS, (2 * Math.PI) / 3);
const c3sq = rotation(C3_AXIS, (4 * Math.PI) / 3);
const c2z = rotation(Z, Math.PI);

/** Irreps from printed rows, one number per class column. */
function rows(table: readonly (readonly [string, readonly number[]])[]): IrrepSpec[] {
  return table.map(([label, chars]) => ({ label, character: (_op: Mat3, c: number) => chars[c] }));
}

/** T: E, 4C3, 4C3², 3C2 (C3 about (1,1,1) taken anticlockwise). */
export const T_CLASSES: readonly ClassSpec[] = [
  { label: 'E', size: 1, representative: rotation(Z, 0) },
  { label: '4C3', size: 4, representative: c3 },
  { label: '4C3²', size: 4, representative: c3sq },
  { label: '3C2', size: 3, representative: c2z },
];

const EPS3: Complex = { re: -0.5, im: Math.sqrt(3) / 2 };
const conj = (z: Complex): Complex => ({ re: z.re, im: -z.im });
const ONE: Complex = { re: 1, im: 0 };
const T_E_PAIR: readonly [readonly Complex[], readonly Complex[]] = [
  [ONE, EPS3, conj(EPS3), ONE],
  [ONE, conj(EPS3), EPS3, ONE],
];

/** T's irreps: A, E (the complex pair 1, ε, ε*, 1 combined), T. */
export const T_IRREPS: readonly IrrepSpec[] = [
  ...rows([['A', [1, 1, 1, 1]]]),
  {
    label: 'E',
    character: (_op, c) => [2, -1, -1, 2][c],
    complex: (_op, c) => [T_E_PAIR[0][c], T_E_PAIR[1][c]],
  },
  ...rows([['T', [3, 0, 0, -1]]]),
];

/** O: E, 8C3, 6C2 (face diagonals), 6C4, 3C2 (= C4², along x, y, z). */
export const O_CLASSES: readonly ClassSpec[] = [
  { label: 'E', size: 1, representative: rotation(Z, 0) },
  { label: '8C3', size: 8, representative: c3 },
  { label: '6C2', size: 6, representative: rotation([1, 1, 0], Math.PI) },
  { label: '6C4', size: 6, representative: rotation(Z, Math.PI / 2) },
  { label: '3C2', size: 3, representative: c2z },
];

export const O_IRREPS: readonly IrrepSpec[] = rows([
  ['A1', [1, 1, 1, 1, 1]],
  ['A2', [1, 1, -1, -1, 1]],
  ['E', [2, -1, 0, 0, 2]],
  ['T1', [3, 0, -1, 1, -1]],
  ['T2', [3, 0, 1, -1, -1]],
]);

/** I: E, 12C5, 12C5², 20C3, 15C2. */
export const I_CLASSES: readonly ClassSpec[] = [
  { label: 'E', size: 1, representative: rotation(Z, 0) },
  { label: '12C5', size: 12, representative: rotation(C5_AXIS, (2 * Math.PI) / 5) },
  { label: '12C5²', size: 12, representative: rotation(C5_AXIS, (4 * Math.PI) / 5) },
  { label: '20C3', size: 20, representative: c3 },
  { label: '15C2', size: 15, representative: c2z },
];

export const I_IRREPS: readonly IrrepSpec[] = rows([
  ['A', [1, 1, 1, 1, 1]],
  ['T1', [3, PHI, 1 - PHI, 0, -1]],
  ['T2', [3, 1 - PHI, PHI, 0, -1]],
  ['G', [4, -1, -1, 1, 0]],
  ['H', [5, 0, 0, -1, 1]],
]);
