/** The structure check's vibrational analysis: Γ3N → Γvib, activity, band types and internal coordinates. */
import type { Atom } from './types.js';
import type { PointGroup } from './group-types.js';
import { pointGroup } from './catalogue.js';
import { atomPermutations, DEFAULT_SYMMETRY_TOLERANCE, validateAtoms } from './atom-mapping.js';
import { cartesianGammas, type ClassContribution } from './gamma.js';
import { activityCounts, irrepActivity, type ActivityCounts, type IrrepActivity } from './activity.js';
import { bandType, topFromGroup, type BandType, type TopKind } from './band-type.js';
import { principalAxes } from './inertia.js';
import { deriveBonds, validateBonds, type Bond } from './bonds.js';
import { bondPermutations, stretchCombinations, stretchRepresentation, type StretchCombinations } from './stretches.js';
import { irrepByLabel, type Decomposition, type Representation } from './representation.js';
import { defaultCovalentRadius, defaultMass } from './element-data.js';

export interface AnalyseOptions {
  /** Å within which an operation must send every atom onto an equivalent one (default 0.05). */
  readonly tolerance?: number;
  /** Bonds listed by the structure file (0-based atom indices); otherwise derived from covalent radii. */
  readonly bonds?: readonly Bond[];
  /** Covalent radius in Å for an element symbol (default: Cordero et al. 2008); null to skip internal coordinates. */
  readonly covalentRadius?: ((element: string) => number | undefined) | null;
  /** Mass of an atom in u, for principal moments (default: isotope mass or standard atomic weight). */
  readonly mass?: (atom: Atom) => number;
}

/** One vibrational species of Γvib. */
export interface VibrationalMode extends IrrepActivity {
  readonly label: string;
  readonly display: string;
  /** How many fundamentals of this species (n in n·Γ). */
  readonly count: number;
  readonly degeneracy: number;
  /** One word for the activity table. */
  readonly activity: 'IR and Raman' | 'IR' | 'Raman' | 'silent';
  /** Of those fundamentals, how many are bond stretches and how many deformations; null without bonds. */
  readonly stretches: number | null;
  readonly deformations: number | null;
  /** The same split in words, e.g. `1 stretch + 1 deformation`; null without bonds. */
  readonly composition: string | null;
  /** Gas-phase contour of the IR band; null when the species is IR-inactive. */
  readonly band: BandType | null;
}

export interface InternalCoordinates {
  readonly bonds: readonly Bond[];
  readonly bondSource: 'listed' | 'derived';
  readonly gammaStretch: Representation;
  readonly combinations: readonly StretchCombinations[];
  readonly notes: readonly string[];
}

/** JSON-serialisable result of analyseVibrations. */
export interface VibrationalAnalysis {
  readonly pointGroup: string;
  readonly atoms: number;
  readonly linear: boolean;
  readonly top: TopKind;
  readonly contributions: readonly ClassContribution[];
  readonly gamma3N: Representation;
  readonly gammaTrans: Representation;
  readonly gammaRot: Representation;
  readonly gammaVib: Representation;
  readonly vibrations: ActivityCounts & { readonly gamma: Decomposition; readonly modes: readonly VibrationalMode[] };
  readonly internalCoordinates: InternalCoordinates | null;
  readonly cautions: readonly string[];
}

const CAUTIONS = [
  'Predictions are for the idealised, isolated molecule; in solids and liquids site symmetry and coupling can activate forbidden bands or split degenerate ones.',
  'Any identification built on these predictions is presumptive: confirm by laboratory analysis and follow the SDS, agency procedures and local codes.',
];

/**
 * Analyses the vibrations of atoms already placed in the standard orientation of `groupName`: checks
 * that every operation maps the structure onto itself, reduces Γ3N and reports Γvib with activity.
 */
export function analyseVibrations(groupName: string, atoms: readonly Atom[], options: AnalyseOptions = {}): VibrationalAnalysis {
  const tolerance = options.tolerance ?? DEFAULT_SYMMETRY_TOLERANCE;
  if (!(tolerance > 0)) throw new RangeError(`tolerance must be a positive distance in Å, got ${tolerance}`);
  validateAtoms(atoms);
  const group = pointGroup(groupName);
  const perms = atomPermutations(group, atoms, tolerance);
  const g = cartesianGammas(group, atoms, tolerance);
  const vib = g.gammaVib.decomposition;
  const internal = internalCoordinates(group, atoms, perms, vib, options);
  // A linear structure analysed in a finite subgroup (CO2 in D2h) is still a linear rotor.
  const top = g.linear ? 'linear' : topFromGroup(group);
  const massOf = options.mass ?? defaultMass;
  // Without a mass for every atom the inertial axes are unknown and asymmetric-top band types stay undetermined.
  const axes = top === 'asymmetric top' && atoms.every((a) => massOf(a) > 0) ? principalAxes(atoms, massOf).axisOf : undefined;

  const modes = Object.entries(vib).map(([label, count]): VibrationalMode => {
    const activity = irrepActivity(group, label);
    const nStretch = internal ? Math.min(internal.gammaStretch.decomposition[label] ?? 0, count) : null;
    return {
      label,
      display: irrepByLabel(group, label).display,
      count,
      degeneracy: irrepByLabel(group, label).dimension,
      ...activity,
      activity: activity.ir ? (activity.raman ? 'IR and Raman' : 'IR') : activity.raman ? 'Raman' : 'silent',
      stretches: nStretch,
      deformations: nStretch === null ? null : count - nStretch,
      composition: nStretch === null ? null : describeSplit(nStretch, count - nStretch),
      band: activity.ir ? bandType(group, label, axes, top) : null,
    };
  });

  const counts = activityCounts(group, vib);
  return {
    pointGroup: group.name,
    atoms: atoms.length,
    linear: g.linear,
    top,
    contributions: g.contributions,
    gamma3N: g.gamma3N,
    gammaTrans: g.gammaTrans,
    gammaRot: g.gammaRot,
    gammaVib: g.gammaVib,
    vibrations: { ...counts, notes: [...counts.notes, ...linearNote(group)], gamma: vib, modes },
    internalCoordinates: internal,
    cautions: CAUTIONS,
  };
}

/** For C∞v and D∞h: say that the class columns are those of the finite model group. */
function linearNote(group: PointGroup): string[] {
  if (!group.linear) return [];
  return [
    `${group.name} is computed on its finite model group ${group.linear.modelGroup}: the class columns are the model's, the labels those of ${group.name} (exact up to |Λ| = ${group.linear.maxLambda}).`,
  ];
}

/** `2 stretches + 1 deformation`; a species with neither cannot occur (count ≥ 1). */
function describeSplit(stretches: number, deformations: number): string {
  const parts = [];
  if (stretches) parts.push(`${stretches} ${stretches === 1 ? 'stretch' : 'stretches'}`);
  if (deformations) parts.push(`${deformations} ${deformations === 1 ? 'deformation' : 'deformations'}`);
  return parts.join(' + ');
}

/** Γstretch and its combinations, or null when bonds can be neither read nor derived. */
function internalCoordinates(
  group: PointGroup,
  atoms: readonly Atom[],
  perms: readonly (readonly number[])[],
  vib: Decomposition,
  options: AnalyseOptions,
): InternalCoordinates | null {
  let bonds: readonly Bond[];
  let bondSource: InternalCoordinates['bondSource'];
  if (options.bonds) {
    validateBonds(options.bonds, atoms.length);
    [bonds, bondSource] = [options.bonds, 'listed'];
  } else if (options.covalentRadius) {
    [bonds, bondSource] = [deriveBonds(atoms, options.covalentRadius), 'derived'];
  } else if (options.covalentRadius === undefined && atoms.every((a) => defaultCovalentRadius(a.element) !== undefined)) {
    [bonds, bondSource] = [deriveBonds(atoms, defaultCovalentRadius), 'derived'];
  } else {
    // Turned off, or an element (beyond Cm) has no tabulated radius: no stretch/deformation split.
    return null;
  }
  const notes = ['Deformations are Γvib − Γstretch: bends, torsions and out-of-plane motions together, so angle redundancies in rings never arise.'];
  if (bonds.length === 0) notes.push('No bonds: every vibration counts as a deformation.');
  const bondPerms = bondPermutations(group, bonds, perms);
  const gammaStretch = bonds.length ? stretchRepresentation(group, bondPerms) : { characters: group.classes.map(() => 0), decomposition: {} };
  const excess = Object.entries(gammaStretch.decomposition).filter(([l, n]) => n > (vib[l] ?? 0));
  if (excess.length) {
    notes.push(
      `More bond stretches than vibrations in ${excess.map(([l]) => l).join(', ')}: the stretches are redundant there (a closed cage); their count is capped at the vibrations.`,
    );
  }
  return { bonds, bondSource, gammaStretch, combinations: bonds.length ? stretchCombinations(group, bondPerms, gammaStretch) : [], notes };
}
