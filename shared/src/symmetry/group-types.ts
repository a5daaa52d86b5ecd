/** Types of the point-group catalogue: classes, irreducible representations and operations. */
import type { Mat3, Vec3 } from './types.js';

/** A complex number (characters of separably degenerate pairs). */
export interface Complex {
  readonly re: number;
  readonly im: number;
}

/** Geometric description of one symmetry operation. */
export interface OperationElement {
  /** E identity, C proper rotation, S improper rotation, σ reflection, i inversion. */
  readonly kind: 'E' | 'C' | 'S' | 'σ' | 'i';
  /** n of Cn / Sn (rotation angle 2π·power/n); absent for E, σ and i. */
  readonly order?: number;
  readonly power?: number;
  /** Unit rotation axis (C, S) or unit plane normal (σ). */
  readonly axis?: Vec3;
}

/** One class of conjugate operations, in the column order of the published table. */
export interface SymmetryClass {
  /** Published label with its count, e.g. `2C3`, `3σv`, `σv′(yz)`, `S6⁵`. */
  readonly label: string;
  readonly size: number;
  readonly element: OperationElement;
  /** The operation used as the class's column in reductions (any member gives the same character). */
  readonly representative: Mat3;
}

export type CartesianComponent = 'x' | 'y' | 'z';
export type RotationComponent = 'Rx' | 'Ry' | 'Rz';

/** One irreducible representation (real form: separably degenerate complex pairs are combined into one E). */
export interface Irrep {
  /**
   * Mulliken label in ASCII, the key used in every result: primes as apostrophes (`A1'`, `A2''`, `E'`),
   * linear groups as `Σ+`, `Σ-`, `Σg+`, `Σu-`, `Π`, `Πu`, `Δg`, …
   */
  readonly label: string;
  /** The same label with typographic primes (`A1′`, `A2″`) for display. */
  readonly display: string;
  readonly dimension: number;
  /** Real characters per class, in class order. */
  readonly characters: readonly number[];
  /** For a separably degenerate E (Cn, Cnh, S2n, T, Th): the two complex one-dimensional characters per class. */
  readonly complexCharacters?: readonly [readonly Complex[], readonly Complex[]];
  /** Which of x, y, z (translations, dipole components) span this irrep. */
  readonly translations: readonly CartesianComponent[];
  readonly rotations: readonly RotationComponent[];
  /** Quadratic functions (polarisability components) that transform as this irrep, e.g. `x²+y²`, `z²`. */
  readonly quadratics: readonly string[];
  /** Linear groups only: |Λ|, the angular momentum about the axis (Σ 0, Π 1, Δ 2, …). */
  readonly lambda?: number;
}

/** One operation of the group with its class. */
export interface GroupOperation {
  readonly matrix: Mat3;
  readonly classIndex: number;
}

/** A point group of the catalogue in the standard orientation of `types.ts`. */
export interface PointGroup {
  /** Schoenflies name: `C2v`, `D3h`, `Td`, `C∞v`, `D∞h`. */
  readonly name: string;
  readonly order: number;
  readonly classes: readonly SymmetryClass[];
  readonly irreps: readonly Irrep[];
  readonly operations: readonly GroupOperation[];
  readonly hasInversion: boolean;
  /** Where the labels and class order follow a published table. */
  readonly reference: string;
  /**
   * Linear groups are computed on a finite model group (C13v for C∞v, D13d for D∞h) whose irreps up to
   * |Λ| = maxLambda restrict one-to-one from the infinite group; the classes are the model's.
   */
  readonly linear?: { readonly modelGroup: string; readonly maxLambda: number };
}
