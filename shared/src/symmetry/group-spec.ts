/** The recipe the catalogue builder turns into a PointGroup: classes by representative, irreps by character function. */
import type { Mat3 } from './types.js';
import type { Complex } from './group-types.js';

/** A class column: its published label, size and one member. */
export interface ClassSpec {
  readonly label: string;
  readonly size: number;
  readonly representative: Mat3;
}

/** An irrep as a character function of the operation matrix (classIndex is the spec's class column). */
export interface IrrepSpec {
  readonly label: string;
  readonly character: (op: Mat3, classIndex: number) => number;
  readonly complex?: (op: Mat3, classIndex: number) => readonly [Complex, Complex];
  readonly lambda?: number;
}

/** Everything needed to build one catalogue group. */
export interface GroupSpec {
  readonly name: string;
  readonly reference: string;
  readonly classes: readonly ClassSpec[];
  readonly irreps: readonly IrrepSpec[];
  readonly linear?: { readonly modelGroup: string; readonly maxLambda: number };
}
