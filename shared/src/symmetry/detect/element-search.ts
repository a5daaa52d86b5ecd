/**
 * Finds the symmetry elements of a centred structure: C2 axes, mirror planes, inversion and the
 * highest rotation order about an axis. Candidate directions come from one small set of
 * equivalent atoms only, so the search is linear in that set's size, not cubic in the atoms.
 */
import type { Vec3 } from '../types.js';
import type { Mat3 } from '../types.js';
import { improper, INVERSION, reflection, rotation } from '../mat3.js';
import { LOOSE, type AtomMatcher } from '../atom-matcher.js';
import { refineDirection } from './refine.js';
import type { PreparedStructure } from './prepare.js';
import { addScaled, cross, distanceFromLine, gcd, sameLine, unit } from './vec.js';

/** Two found axes or plane normals closer than this (radians) are the same element. */
export const SAME_DIRECTION = 0.05;

/**
 * The two reference atoms: a0 from the smallest class, a1 well off the line through a0 (by more
 * than the loose match distance, so that noise cannot make an atom on that line look off it),
 * taken from the smallest class that has one.
 */
function referenceAtoms(s: PreparedStructure, tolerance: number): { a0: number; a1: number | undefined } {
  const a0 = s.classes[0][0];
  const u0 = unit(s.positions[a0])!;
  let a1: number | undefined;
  let best = 0;
  for (const members of s.classes) {
    for (const j of members) {
      const off = distanceFromLine(s.positions[j], u0);
      if (off > best) [a1, best] = [j, off];
    }
    if (best > LOOSE * tolerance) break;
  }
  return { a0, a1 };
}

function classOf(s: PreparedStructure, i: number): readonly number[] {
  return s.classes.find((c) => c.includes(i)) ?? [i];
}

function dedupe(directions: Vec3[]): Vec3[] {
  const out: Vec3[] = [];
  for (const d of directions) if (!out.some((o) => sameLine(o, d, SAME_DIRECTION / 5))) out.push(d);
  return out;
}

/**
 * Candidate directions for a C2 axis or a mirror normal. Any C2 sends a0 to a partner b of its
 * class, so the axis runs along a0 + b (or a0 itself); likewise for a1; if both are sent to their
 * opposites the axis is a0 × a1. Mirror normals run along a0 − b, a1 − c, or a0 × a1.
 */
function candidates(s: PreparedStructure, sign: 1 | -1, tolerance: number): Vec3[] {
  const { a0, a1 } = referenceAtoms(s, tolerance);
  const out: Vec3[] = [...s.axes];
  const p0 = s.positions[a0];
  const refs = a1 === undefined ? [a0] : [a0, a1];
  for (const r of refs) {
    const p = s.positions[r];
    if (sign === 1) out.push(p);
    for (const b of classOf(s, r)) {
      const d = unit(addScaled(p, s.positions[b], sign), 1e-3);
      if (d) out.push(d);
    }
  }
  if (a1 !== undefined) {
    const c = unit(cross(p0, s.positions[a1]), 1e-6);
    if (c) out.push(c);
  }
  return dedupe(out.map((d) => unit(d)!).filter(Boolean));
}

/**
 * The direction, refined, if the operation built on it holds. A guess from noisy atoms can miss
 * by more than the tolerance, so the operation is first matched loosely, the matched pairs refine
 * the direction, and the refined operation must then hold at the tolerance itself.
 */
function confirm(m: AtomMatcher, guess: Vec3, make: (d: Vec3) => Mat3, kind: 'axis' | 'normal'): Vec3 | undefined {
  if (!m.holds(make(guess), LOOSE * m.tolerance)) return undefined;
  const { permutation } = m.permutation(make(guess));
  const refined = permutation ? refineDirection(m.positions, permutation, kind, guess) : guess;
  if (m.holds(make(refined))) return refined;
  return m.holds(make(guess)) ? guess : undefined;
}

/** The refined axis if a C_n about (about) `axis` holds; undefined otherwise. */
export const confirmRotation = (m: AtomMatcher, axis: Vec3, n: number): Vec3 | undefined =>
  confirm(m, axis, (d) => rotation(d, (2 * Math.PI) / n), 'axis');

/** The confirmed directions among the candidates, skipping candidates along an element already found. */
function confirmAll(directions: readonly Vec3[], test: (d: Vec3) => Vec3 | undefined): Vec3[] {
  const found: Vec3[] = [];
  for (const d of directions) {
    if (found.some((f) => sameLine(f, d, SAME_DIRECTION))) continue;
    const confirmed = test(d);
    if (confirmed && !found.some((f) => sameLine(f, confirmed, SAME_DIRECTION))) found.push(confirmed);
  }
  return found;
}

/** Every distinct C2 axis of the structure. */
export function findC2Axes(s: PreparedStructure, m: AtomMatcher): Vec3[] {
  return confirmAll(candidates(s, 1, m.tolerance), (d) => confirmRotation(m, d, 2));
}

/** Every distinct mirror plane, as unit normals. */
export function findMirrors(s: PreparedStructure, m: AtomMatcher): Vec3[] {
  return confirmAll(candidates(s, -1, m.tolerance), (d) => confirm(m, d, reflection, 'normal'));
}

/** Whether the centre of mass is a centre of inversion. */
export const hasInversion = (m: AtomMatcher): boolean => m.holds(INVERSION);

/** Whether an S_n about the axis maps the structure onto itself. */
export const hasImproper = (m: AtomMatcher, axis: Vec3, n: number): boolean => m.holds(improper(axis, (2 * Math.PI) / n));

/**
 * Highest n for which C_n about (about) `axis` holds, with the refined axis (n = 1 if none). Every
 * set of equivalent atoms off the axis splits into orbits of n atoms, so only divisors of the sets'
 * sizes are tried.
 */
export function rotationOrder(s: PreparedStructure, m: AtomMatcher, axis: Vec3): { n: number; axis: Vec3 } {
  let g = 0;
  for (const members of s.classes) {
    const off = members.filter((i) => distanceFromLine(s.positions[i], axis) > LOOSE * m.tolerance).length;
    g = gcd(g, off);
  }
  for (let n = g; n >= 2; n--) {
    if (g % n !== 0) continue;
    const refined = confirmRotation(m, axis, n);
    if (refined) return { n, axis: refined };
  }
  return { n: 1, axis };
}
