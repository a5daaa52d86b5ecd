/** Principal moments of inertia and which principal axis each Cartesian axis lies along. */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import type { Atom, Vec3 } from './types.js';
import type { CartesianComponent } from './group-types.js';

/** Principal moments (u·Å², ascending: a ≤ b ≤ c) and the inertial axis nearest to each of x, y, z. */
export interface PrincipalAxes {
  readonly moments: readonly [number, number, number];
  readonly axisOf: Readonly<Record<CartesianComponent, 'a' | 'b' | 'c'>>;
}

/** Eigenvalues (u·Å², ascending) and unit eigenvectors of the inertia tensor of positions already about their centre of mass. */
export function inertiaEigen(centred: readonly (readonly number[])[], masses: readonly number[]): { values: [number, number, number]; axes: [Vec3, Vec3, Vec3] } {
  const t = Matrix.zeros(3, 3);
  centred.forEach((r, i) => {
    const r2 = r[0] ** 2 + r[1] ** 2 + r[2] ** 2;
    for (let p = 0; p < 3; p++) for (let q = 0; q < 3; q++) t.set(p, q, t.get(p, q) + masses[i] * ((p === q ? r2 : 0) - r[p] * r[q]));
  });
  const eig = new EigenvalueDecomposition(t, { assumeSymmetric: true });
  // ml-matrix's getters copy on every access: read them once.
  const values = eig.realEigenvalues;
  const vectors = eig.eigenvectorMatrix;
  const order = [0, 1, 2].sort((p, q) => values[p] - values[q]);
  return {
    values: order.map((c) => values[c]) as [number, number, number],
    axes: order.map((c): Vec3 => [vectors.get(0, c), vectors.get(1, c), vectors.get(2, c)]) as [Vec3, Vec3, Vec3],
  };
}

/** Inertia tensor about the centre of mass, diagonalised; `massOf` gives each atom's mass in u. */
export function principalAxes(atoms: readonly Atom[], massOf: (atom: Atom) => number): PrincipalAxes {
  const masses = atoms.map((a, i) => {
    const m = massOf(a);
    if (!(m > 0)) throw new RangeError(`atom ${i + 1} (${a.element}): no mass known`);
    return m;
  });
  const total = masses.reduce((s, m) => s + m, 0);
  const com = [0, 1, 2].map((k) => atoms.reduce((s, a, i) => s + masses[i] * a.position[k], 0) / total);
  const { values, axes } = inertiaEigen(
    atoms.map((a) => [0, 1, 2].map((k) => a.position[k] - com[k])),
    masses,
  );
  const names = ['a', 'b', 'c'] as const;
  // The inertial axis with the largest projection on Cartesian axis k.
  const nearest = (k: number) => {
    const w = axes.map((axis) => Math.abs(axis[k]));
    return names[w.indexOf(Math.max(...w))];
  };
  return { moments: values, axisOf: { x: nearest(0), y: nearest(1), z: nearest(2) } };
}
