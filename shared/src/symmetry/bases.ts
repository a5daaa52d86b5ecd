/**
 * Which translations, rotations and quadratic functions transform as each irrep, found by projection
 * operators on the group's own matrices (so the listed bases cannot disagree with the characters).
 */
import type { Mat3 } from './types.js';
import type { CartesianComponent, RotationComponent } from './group-types.js';
import { det, mul, transpose } from './mat3.js';

/** What the projector needs to know about one irrep. */
export interface ProjectionIrrep {
  /** Character of each operation (same order as `ops`). */
  readonly characterOfOp: readonly number[];
  /** d/h prefactor numerator: the dimension, or 1 for a combined separably degenerate pair. */
  readonly weight: number;
}

type Vec = readonly number[];

/** Quadratic functions tried in this order; a function is listed when it is pure in the irrep and new. */
const QUADRATICS: readonly (readonly [string, Mat3])[] = [
  ['x²', [1, 0, 0, 0, 0, 0, 0, 0, 0]],
  ['y²', [0, 0, 0, 0, 1, 0, 0, 0, 0]],
  ['z²', [0, 0, 0, 0, 0, 0, 0, 0, 1]],
  ['x²+y²', [1, 0, 0, 0, 1, 0, 0, 0, 0]],
  ['x²+y²+z²', [1, 0, 0, 0, 1, 0, 0, 0, 1]],
  ['2z²−x²−y²', [-1, 0, 0, 0, -1, 0, 0, 0, 2]],
  ['x²−y²', [1, 0, 0, 0, -1, 0, 0, 0, 0]],
  ['xy', [0, 1, 0, 1, 0, 0, 0, 0, 0]],
  ['xz', [0, 0, 1, 0, 0, 0, 1, 0, 0]],
  ['yz', [0, 0, 0, 0, 0, 1, 0, 1, 0]],
];

const AXES: readonly (readonly [number, number, number])[] = [
  [1, 0, 0],
  [0, 1, 0],
  [0, 0, 1],
];

/** Projects a vector through the group action `act`, with the irrep's characters. */
function project(ops: readonly Mat3[], irrep: ProjectionIrrep, v: Vec, act: (op: Mat3, v: Vec) => Vec): Vec {
  const out = new Array<number>(v.length).fill(0);
  ops.forEach((op, k) => {
    const chi = irrep.characterOfOp[k];
    if (chi === 0) return;
    act(op, v).forEach((x, i) => (out[i] += chi * x));
  });
  return out.map((x) => (x * irrep.weight) / ops.length);
}

const isSame = (a: Vec, b: Vec) => a.every((x, i) => Math.abs(x - b[i]) < 1e-8);

const vectorAct = (op: Mat3, v: Vec): Vec => [0, 1, 2].map((i) => op[3 * i] * v[0] + op[3 * i + 1] * v[1] + op[3 * i + 2] * v[2]);
const pseudoAct = (op: Mat3, v: Vec): Vec => vectorAct(op, v).map((x) => det(op) * x);
// f(r) = rᵀQr becomes f(R⁻¹r) = rᵀ(R Q Rᵀ)r.
const quadraticAct = (op: Mat3, v: Vec): Vec => mul(mul(op, v as unknown as Mat3), transpose(op));

/** The components among x, y, z whose projection onto the irrep is the function itself. */
export function translationBasis(ops: readonly Mat3[], irrep: ProjectionIrrep): CartesianComponent[] {
  const names: CartesianComponent[] = ['x', 'y', 'z'];
  return names.filter((_, i) => isSame(project(ops, irrep, AXES[i], vectorAct), AXES[i]));
}

/** The rotations Rx, Ry, Rz (axial vectors: det R · R) that transform as the irrep. */
export function rotationBasis(ops: readonly Mat3[], irrep: ProjectionIrrep): RotationComponent[] {
  const names: RotationComponent[] = ['Rx', 'Ry', 'Rz'];
  return names.filter((_, i) => isSame(project(ops, irrep, AXES[i], pseudoAct), AXES[i]));
}

/** Quadratic functions pure in the irrep, skipping those that are combinations of ones already listed. */
export function quadraticBasis(ops: readonly Mat3[], irrep: ProjectionIrrep): string[] {
  const accepted: string[] = [];
  const orthonormal: Vec[] = [];
  for (const [name, q] of QUADRATICS) {
    if (!isSame(project(ops, irrep, q, quadraticAct), q)) continue;
    // Gram–Schmidt against the functions already listed: keep only a genuinely new direction.
    let r = [...q];
    for (const e of orthonormal) {
      const d = r.reduce((s, x, i) => s + x * e[i], 0);
      r = r.map((x, i) => x - d * e[i]);
    }
    const n = Math.hypot(...r);
    if (n < 1e-8) continue;
    orthonormal.push(r.map((x) => x / n));
    accepted.push(name);
  }
  return accepted;
}
