/**
 * Gas-phase rotational band types of IR fundamentals: the kind of top, and whether the dipole change is
 * parallel or perpendicular to the unique axis with the branches that follow. Rules as summarised from
 * Herzberg, *Infrared and Raman Spectra of Polyatomic Molecules* (1945) (from memory; see
 * REFERENCES.md §4.3).
 */
import type { CartesianComponent, PointGroup } from './group-types.js';
import { irrepByLabel } from './representation.js';

export type TopKind = 'linear' | 'symmetric top' | 'spherical top' | 'asymmetric top';
export type Branch = 'P' | 'Q' | 'R';

/** The expected contour of one IR fundamental in the gas phase. */
export interface BandType {
  readonly top: TopKind;
  /** parallel: dipole along the unique axis z; perpendicular: in the xy plane; for asymmetric tops the inertial axis type. */
  readonly type: 'parallel' | 'perpendicular' | 'parallel and perpendicular' | 'spherical top' | 'A-type' | 'B-type' | 'C-type' | 'undetermined' | 'not IR-active';
  readonly branches: readonly Branch[];
  readonly note: string;
}

const CUBIC = new Set(['T', 'Td', 'Th', 'O', 'Oh', 'I', 'Ih']);

/** The kind of top a molecule of this group is by symmetry (an asymmetric-top group can still be an accidental symmetric top). */
export function topFromGroup(group: PointGroup): TopKind {
  if (group.linear) return 'linear';
  if (CUBIC.has(group.name)) return 'spherical top';
  // A Cn (n ≥ 3) or S4 axis makes two principal moments equal.
  const symmetric = group.classes.some(
    (c) => (c.element.kind === 'C' && (c.element.order ?? 0) >= 3) || (c.element.kind === 'S' && (c.element.order ?? 0) >= 4),
  );
  return symmetric ? 'symmetric top' : 'asymmetric top';
}

/** The kind of top from principal moments of inertia (any units), equal when within relTolerance. */
export function topFromMoments(moments: readonly [number, number, number], relTolerance = 0.01): TopKind {
  const [a, b, c] = [...moments].sort((p, q) => p - q);
  if (!(a >= 0) || !(c > 0)) throw new RangeError('principal moments must be non-negative and not all zero');
  const eq = (p: number, q: number) => Math.abs(p - q) <= relTolerance * c;
  if (a <= relTolerance * c && eq(b, c)) return 'linear';
  if (eq(a, b) && eq(b, c)) return 'spherical top';
  if (eq(a, b) || eq(b, c)) return 'symmetric top';
  return 'asymmetric top';
}

/**
 * Band type of the IR fundamental of this irrep. `inertialAxes` (asymmetric tops only) names which
 * principal axis of inertia (a: smallest moment, c: largest) each of x, y, z lies along; `top`
 * overrides the kind of top read from the group (a linear molecule analysed in D2h).
 */
export function bandType(
  group: PointGroup,
  irrepLabel: string,
  inertialAxes?: Readonly<Record<CartesianComponent, 'a' | 'b' | 'c'>>,
  top: TopKind = topFromGroup(group),
): BandType {
  const components = irrepByLabel(group, irrepLabel).translations;
  if (components.length === 0) return { top, type: 'not IR-active', branches: [], note: 'No dipole component: no IR band.' };
  const parallel = components.includes('z');
  const perpendicular = components.includes('x') || components.includes('y');
  if (top === 'linear') {
    return parallel
      ? { top, type: 'parallel', branches: ['P', 'R'], note: 'Σ–Σ band: P and R branches only, no Q branch; a gap of about 4B at the centre.' }
      : { top, type: 'perpendicular', branches: ['P', 'Q', 'R'], note: 'Π–Σ band: P, Q and R branches with a strong, sharp Q branch at the centre.' };
  }
  if (top === 'spherical top') {
    return { top, type: 'spherical top', branches: ['P', 'Q', 'R'], note: 'Triply degenerate fundamental: P, Q and R branches, line spacing modified by Coriolis coupling (≈ 2B(1−ζ)).' };
  }
  if (top === 'symmetric top') {
    if (parallel && perpendicular) {
      return { top, type: 'parallel and perpendicular', branches: ['P', 'Q', 'R'], note: 'Dipole components both along and across the axis: a superposition of both band types.' };
    }
    return parallel
      ? { top, type: 'parallel', branches: ['P', 'Q', 'R'], note: 'ΔK = 0: P, Q and R branches; the Q branch is present but weak when K is small.' }
      : { top, type: 'perpendicular', branches: ['P', 'Q', 'R'], note: 'ΔK = ±1: a series of sub-bands, each with P, Q and R branches; the Q branches stand out, spaced about 2[A(1−ζ) − B] (prolate).' };
  }
  if (!inertialAxes || components.length !== 1) {
    return { top, type: 'undetermined', branches: [], note: 'Asymmetric top: the band type (A, B or C) depends on which principal axis of inertia the dipole change lies along; give the principal moments to decide.' };
  }
  const axis = inertialAxes[components[0]];
  if (axis === 'b') return { top, type: 'B-type', branches: ['P', 'R'], note: 'Dipole along the intermediate axis: P and R branches with no central Q branch.' };
  return {
    top,
    type: axis === 'a' ? 'A-type' : 'C-type',
    branches: ['P', 'Q', 'R'],
    note: `Dipole along the ${axis === 'a' ? 'least' : 'greatest'}-moment axis: P, Q and R branches with a central Q branch.`,
  };
}
