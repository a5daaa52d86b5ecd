/** Γ3N, Γtrans, Γrot and Γvib of an oriented structure in a catalogue group. */
import type { Atom, Mat3, Vec3 } from './types.js';
import type { PointGroup } from './group-types.js';
import { det, trace, apply, normalize } from './mat3.js';
import { isUnmoved } from './atom-mapping.js';
import { reduceCharacters, type Representation } from './representation.js';
import { cleanNumber as clean } from './numeric.js';

/** What one class contributes to Γ3N. */
export interface ClassContribution {
  readonly class: string;
  /** Atoms the class's operations leave in place. */
  readonly unmovedAtoms: number;
  /** tr R: the contribution of each unmoved atom. */
  readonly perAtom: number;
  /** χ3N = unmoved × tr R. */
  readonly character: number;
}

/** Cartesian-displacement representations of a structure. */
export interface Gammas {
  readonly gamma3N: Representation;
  readonly gammaTrans: Representation;
  readonly gammaRot: Representation;
  readonly gammaVib: Representation;
  readonly contributions: readonly ClassContribution[];
  /** True when all atoms lie on one line (3N−5 vibrations). */
  readonly linear: boolean;
}

/** Unit axis of a collinear structure (two or more atoms), or undefined when the atoms are not on one line. */
export function molecularAxis(atoms: readonly Atom[], tolerance: number): Vec3 | undefined {
  if (atoms.length < 2) return undefined;
  const p0 = atoms[0].position;
  const far = atoms.reduce((b, a) => (dist(a.position, p0) > dist(b.position, p0) ? a : b), atoms[0]);
  if (dist(far.position, p0) <= tolerance) return undefined;
  const u = normalize([far.position[0] - p0[0], far.position[1] - p0[1], far.position[2] - p0[2]]);
  const offLine = atoms.some((a) => {
    const d: Vec3 = [a.position[0] - p0[0], a.position[1] - p0[1], a.position[2] - p0[2]];
    const t = d[0] * u[0] + d[1] * u[1] + d[2] * u[2];
    return Math.hypot(d[0] - t * u[0], d[1] - t * u[1], d[2] - t * u[2]) > tolerance;
  });
  return offLine ? undefined : u;
}

const dist = (p: readonly number[], q: readonly number[]) => Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]);

/**
 * Reduces Γ3N (one operation per class: unmoved atoms × tr R) and subtracts translations (tr R) and
 * rotations (det R · tr R; for a linear structure only the two rotations ⟂ its axis a, det R·(tr R − aᵀRa)).
 * The caller must have checked that every operation maps the structure onto itself.
 */
export function cartesianGammas(group: PointGroup, atoms: readonly Atom[], tolerance: number): Gammas {
  const axis = molecularAxis(atoms, tolerance);
  const notOriented = `structure is not in the standard orientation for group ${group.name}`;
  const contributions = group.classes.map((c): ClassContribution => {
    const r = c.representative;
    const unmovedAtoms = atoms.filter((a) => isUnmoved(r, a, tolerance)).length;
    const perAtom = clean(trace(r));
    return { class: c.label, unmovedAtoms, perAtom, character: clean(unmovedAtoms * perAtom) };
  });
  const chi3N = contributions.map((c) => c.character);
  const chiTrans = group.classes.map((c) => clean(trace(c.representative)));
  const chiRot = group.classes.map((c) => clean(rotationCharacter(c.representative, atoms.length, axis)));
  const chiVib = chi3N.map((x, i) => x - chiTrans[i] - chiRot[i]);
  return {
    gamma3N: { characters: chi3N, decomposition: reduceCharacters(group, chi3N, notOriented) },
    gammaTrans: { characters: chiTrans, decomposition: reduceCharacters(group, chiTrans) },
    gammaRot: { characters: chiRot, decomposition: reduceCharacters(group, chiRot) },
    gammaVib: { characters: chiVib, decomposition: reduceCharacters(group, chiVib, notOriented) },
    contributions,
    linear: axis !== undefined,
  };
}

/** Character of the rotational degrees of freedom: none for one atom, two for a line, three otherwise. */
function rotationCharacter(r: Mat3, atomCount: number, axis: Vec3 | undefined): number {
  if (atomCount === 1) return 0;
  const full = det(r) * trace(r);
  if (!axis) return full;
  const ra = apply(r, axis);
  return full - det(r) * (ra[0] * axis[0] + ra[1] * axis[1] + ra[2] * axis[2]);
}

