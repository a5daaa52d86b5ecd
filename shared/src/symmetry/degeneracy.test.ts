/**
 * An independent check of Γvib that uses no character table: a spring between every pair of atoms
 * (stiffness depending only on distance and the two elements, so it has the molecule's symmetry) gives
 * a Hessian whose non-zero eigenvalues come in degenerate sets of exactly the irreps' dimensions.
 * Planar and linear molecules are left out: in-plane springs give no out-of-plane stiffness.
 */
import { describe, expect, it } from 'vitest';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { analyseVibrations } from './analyse.js';
import { pointGroup } from './catalogue.js';
import { irrepByLabel } from './representation.js';
import { MOLECULES } from './__tests__/molecules.js';
import type { Atom } from './types.js';

function springHessian(atoms: readonly Atom[]): Matrix {
  const n = atoms.length;
  const h = Matrix.zeros(3 * n, 3 * n);
  const code = (e: string) => [...e].reduce((s, c) => s + c.charCodeAt(0), 0);
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const d = [0, 1, 2].map((k) => atoms[j].position[k] - atoms[i].position[k]);
      const r = Math.hypot(...d);
      const u = d.map((x) => x / r);
      const k = Math.exp(-r) * (1 + Math.sqrt(code(atoms[i].element) * code(atoms[j].element)) / 97);
      for (let p = 0; p < 3; p++) {
        for (let q = 0; q < 3; q++) {
          const v = k * u[p] * u[q];
          h.set(3 * i + p, 3 * i + q, h.get(3 * i + p, 3 * i + q) + v);
          h.set(3 * j + p, 3 * j + q, h.get(3 * j + p, 3 * j + q) + v);
          h.set(3 * i + p, 3 * j + q, h.get(3 * i + p, 3 * j + q) - v);
          h.set(3 * j + p, 3 * i + q, h.get(3 * j + p, 3 * i + q) - v);
        }
      }
    }
  }
  return h;
}

/** Sizes of the sets of equal non-zero eigenvalues, sorted. */
function degeneracies(atoms: readonly Atom[]): number[] {
  const values = new EigenvalueDecomposition(springHessian(atoms), { assumeSymmetric: true }).realEigenvalues.sort((a, b) => a - b);
  const top = values[values.length - 1];
  const nonZero = values.filter((v) => v > 1e-8 * top);
  const sets: number[] = [];
  let run = 1;
  for (let i = 1; i <= nonZero.length; i++) {
    if (i < nonZero.length && nonZero[i] - nonZero[i - 1] < 1e-7 * top) run++;
    else [sets[sets.length], run] = [run, 1];
  }
  return sets.sort((a, b) => a - b);
}

describe('Γvib against the degeneracy pattern of a symmetric spring model', () => {
  it.each(['CH4', 'SF6', 'NH3', 'CHCl3', 'allene', 'cyclohexane', 'S8', 'ferrocene', 'cubane', 'IF7', 'PCl5', 'Ni(CO)4', 'Cr(CO)6', 'C60', 'ethane (staggered)'])(
    '%s',
    (name) => {
      const { group, atoms } = MOLECULES[name];
      const g = pointGroup(group);
      const gamma = analyseVibrations(group, atoms).vibrations.gamma;
      const expected = Object.entries(gamma)
        .flatMap(([label, count]) => Array<number>(count).fill(irrepByLabel(g, label).dimension))
        .sort((a, b) => a - b);
      expect(degeneracies(atoms)).toEqual(expected);
    },
  );
});
