/** The flowchart from found symmetry elements to a Schoenflies group and its standard frame. */
import type { PlanarConvention, Vec3 } from '../types.js';
import type { AtomMatcher } from '../atom-matcher.js';
import type { PreparedStructure } from './prepare.js';
import { findC2Axes, findMirrors, hasImproper, hasInversion, rotationOrder } from './element-search.js';
import { best, inPlane, lineScore, momentAbout, perpendicularTowardAtoms, planeScore } from './orientation-rules.js';
import { cross, distanceFromLine, dot, unit } from './vec.js';
import { cubicGroup } from './classify-cubic.js';

/** A detected group with the standard frame's axes written in the input (centred) frame. */
export interface Classification {
  readonly name: string;
  readonly x: Vec3;
  readonly y: Vec3;
  readonly z: Vec3;
}

/** sin of the largest angle (rad) at which two found elements still count as perpendicular. */
const PERPENDICULAR = Math.sin(0.1);

/** Right-handed frame from z and a direction x (made exactly perpendicular). */
export function frame(name: string, z: Vec3, xApprox: Vec3): Classification {
  const x = unit([xApprox[0] - dot(xApprox, z) * z[0], xApprox[1] - dot(xApprox, z) * z[1], xApprox[2] - dot(xApprox, z) * z[2]])!;
  return { name, x, y: cross(z, x), z };
}

/** Whether all atoms lie within the tolerance of one line through the centre (the smallest-moment axis). */
export function isLinear(s: PreparedStructure, tolerance: number): boolean {
  return s.positions.every((p) => distanceFromLine(p, s.axes[0]) <= tolerance);
}

/** Detects the point group of a prepared (centred) structure and the axes of its standard frame. */
export function classify(s: PreparedStructure, m: AtomMatcher, convention: PlanarConvention): Classification {
  const tol = m.tolerance;
  if (isLinear(s, tol)) {
    const z = s.axes[0];
    return frame(hasInversion(m) ? 'D∞h' : 'C∞v', z, perpendicularTowardAtoms(s, z, [], tol));
  }
  const c2 = findC2Axes(s, m);
  const mirrors = findMirrors(s, m);
  const inversion = hasInversion(m);
  const cubic = c2.length >= 3 ? cubicGroup(m, c2, inversion) : undefined;
  if (cubic) return cubic;

  // The principal axis: the highest-order rotation among the inertia axes and the C2 axes.
  // A Cn with n ≥ 3 is the unique inertia axis; C2 axes are searched for higher orders only when
  // no inertia axis has one (an accidentally degenerate top).
  const principal = s.axes.map((a) => rotationOrder(s, m, a));
  const found = principal.some((f) => f.n >= 3) ? principal : [...principal, ...c2.map((a) => rotationOrder(s, m, a))];
  const n = Math.max(...found.map((f) => f.n));
  if (n === 1) return lowSymmetry(s, mirrors, inversion, tol);
  let main = found.filter((f) => f.n === n).map((f) => f.axis);
  if (n === 2) {
    // D2d and S4: the axis that is also S4 is the principal one; otherwise Mulliken's rule.
    const s4 = main.filter((a) => hasImproper(m, a, 4));
    if (s4.length > 0) main = s4;
  }
  const z = best(main, (a) => [...lineScore(s, a, tol), -momentAbout(s, a)]);
  const perpendicularC2 = c2.filter((a) => Math.abs(dot(a, z)) < PERPENDICULAR);
  const sigmaH = mirrors.some((nrm) => Math.abs(dot(nrm, z)) > Math.cos(0.1));
  const vertical = mirrors.filter((nrm) => Math.abs(dot(nrm, z)) < PERPENDICULAR);

  if (perpendicularC2.length > 0) {
    const name = `D${n}${sigmaH ? 'h' : vertical.length > 0 ? 'd' : ''}`;
    if (n === 2 && sigmaH) return planarPair(s, name, z, vertical, convention, tol);
    return frame(name, z, best(perpendicularC2, (a) => lineScore(s, a, tol)));
  }
  if (sigmaH) return frame(`C${n}h`, z, perpendicularTowardAtoms(s, z, s.classes[0], tol));
  if (vertical.length > 0) {
    if (n === 2) return planarPair(s, 'C2v', z, vertical, convention, tol);
    return frame(`C${n}v`, z, inPlane(z, best(vertical, (nrm) => planeScore(s, nrm, tol))));
  }
  if (hasImproper(m, z, 2 * n)) return frame(`S${2 * n}`, z, perpendicularTowardAtoms(s, z, s.classes[0], tol));
  return frame(`C${n}`, z, perpendicularTowardAtoms(s, z, s.classes[0], tol));
}

/**
 * C2v and D2h: of the two vertical mirrors, the one holding more atoms (the molecular plane of a
 * planar molecule) becomes yz under the `yz` convention (Mulliken 1955) and xz under `xz`.
 */
function planarPair(s: PreparedStructure, name: string, z: Vec3, vertical: readonly Vec3[], convention: PlanarConvention, tol: number): Classification {
  const primary = best(vertical, (nrm) => planeScore(s, nrm, tol));
  return frame(name, z, convention === 'yz' ? primary : inPlane(z, primary));
}

function lowSymmetry(s: PreparedStructure, mirrors: readonly Vec3[], inversion: boolean, tol: number): Classification {
  if (mirrors.length > 0) {
    // Cs: the mirror is xy; x along the in-plane inertia axis of smallest moment.
    const z = mirrors[0];
    const x = s.axes.find((a) => Math.abs(dot(a, z)) < 0.9) ?? perpendicularTowardAtoms(s, z, s.classes[0], tol);
    return frame('Cs', z, x);
  }
  return frame(inversion ? 'Ci' : 'C1', s.axes[2], s.axes[0]);
}
