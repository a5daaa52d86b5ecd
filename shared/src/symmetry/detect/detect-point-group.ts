/** The structure check's first step: which point group a structure has, and the structure in its standard orientation. */
import type { Atom, Mat3, PlanarConvention, Structure, Vec3 } from '../types.js';
import { orientAndVerify } from './orient.js';
import { prepareStructure } from './prepare.js';
import { AtomMatcher } from '../atom-matcher.js';
import { classify } from './classify.js';
import { standardOperations } from './group-operations.js';
import { linearElements, symmetryElements, type SymmetryElement } from './symmetry-elements.js';
import { symmetrisePositions } from './symmetrise.js';
import { topType, type TopType } from './top-type.js';

/** Default distance (Å) within which an operation must bring every atom onto an equivalent one. */
export const DEFAULT_DETECTION_TOLERANCE = 0.1;

export interface DetectOptions {
  /** Å, default 0.1: how far an atom may sit from its symmetric position. */
  readonly tolerance?: number;
  /** Plane of a planar C2v or D2h molecule: `yz` (Mulliken 1955, default) or `xz`. */
  readonly convention?: PlanarConvention;
  /** Replace the oriented positions by their average over the group (exact symmetry); default false. */
  readonly symmetrise?: boolean;
}

/** What detectPointGroup found (JSON-serialisable except `order` = Infinity for linear groups). */
export interface PointGroupDetection {
  /** Schoenflies name: `C1`, `Cs`, `Ci`, `C2v`, `D3h`, `S4`, `Td`, `Oh`, `Ih`, `C∞v`, `D∞h`, ... */
  readonly pointGroup: string;
  /** Number of operations; Infinity for C∞v and D∞h. */
  readonly order: number;
  /** Symmetry elements in the standard frame. */
  readonly elements: readonly SymmetryElement[];
  /** Every operation matrix in the standard frame (linear groups: the catalogue's finite model group). */
  readonly operations: readonly Mat3[];
  /** The atoms in the standard orientation (centre of mass at the origin), in input order. */
  readonly oriented: readonly Atom[];
  /** Rotation from the input frame to the standard frame: oriented = rotation · (position − centre). */
  readonly rotation: Mat3;
  /** Centre of mass in the input frame (Å). */
  readonly centre: Vec3;
  /** Principal moments of inertia, ascending (u·Å²). */
  readonly principalMoments: readonly [number, number, number];
  readonly topType: TopType;
  readonly tolerance: number;
  readonly convention: PlanarConvention;
  /** Largest distance (Å) between an operated atom and its partner, before any symmetrisation. */
  readonly maxDeviation: number;
  readonly symmetrised: boolean;
}

function checkOptions(options: DetectOptions): { tolerance: number; convention: PlanarConvention } {
  const tolerance = options.tolerance ?? DEFAULT_DETECTION_TOLERANCE;
  if (typeof tolerance !== 'number' || !(tolerance > 0 && tolerance <= 1)) {
    throw new RangeError(`tolerance must be a distance in Å above 0 and at most 1, got ${String(tolerance)}`);
  }
  const convention = options.convention ?? 'yz';
  if (convention !== 'yz' && convention !== 'xz') throw new RangeError(`convention must be "yz" or "xz", got ${String(convention)}`);
  return { tolerance, convention };
}

/**
 * Detects the point group of a structure, rotates it into the standard orientation of types.ts
 * and checks that every operation of the group maps the oriented structure onto itself.
 */
export function detectPointGroup(structure: Structure, options: DetectOptions = {}): PointGroupDetection {
  const { tolerance, convention } = checkOptions(options);
  if (!structure?.atoms?.length) throw new RangeError('the structure has no atoms');
  if (structure.atoms.length < 2) throw new RangeError('a single atom has no point group of a molecule (it has no vibrations)');
  const prepared = prepareStructure(structure, tolerance);
  const matcher = new AtomMatcher(prepared.positions, prepared.kinds, tolerance, prepared.classes.flat());
  const { name, x, y, z } = classify(prepared, matcher, convention);
  const ops = standardOperations(name);
  const matrices = ops.map((o) => o.matrix);
  const frame: Mat3 = [...x, ...y, ...z] as unknown as Mat3;
  const { rotation, positions: orientedPositions, permutations, maxDeviation } = orientAndVerify(prepared.positions, prepared.kinds, frame, matrices, name, tolerance);
  const symmetrised = options.symmetrise === true;
  const finalPositions = symmetrised ? symmetrisePositions(orientedPositions, matrices, permutations) : orientedPositions;
  const linear = name === 'C∞v' || name === 'D∞h';

  return {
    pointGroup: name,
    order: linear ? Infinity : ops.length,
    elements: linear ? linearElements(name === 'D∞h') : symmetryElements(ops, !/^(C1|Cs|Ci|T|Td|Th|O|Oh|I|Ih)$/.test(name)),
    operations: matrices,
    oriented: prepared.atoms.map((a, i) => ({ ...a, position: finalPositions[i] })),
    rotation,
    centre: prepared.centre,
    principalMoments: prepared.moments,
    topType: topType(name, prepared.moments, z, prepared),
    tolerance,
    convention,
    maxDeviation,
    symmetrised,
  };
}
