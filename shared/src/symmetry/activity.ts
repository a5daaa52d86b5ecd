/** IR and Raman activity of fundamentals from the irreps' bases, with the counts a structure check shows. */
import type { CartesianComponent, PointGroup } from './group-types.js';
import { irrepByLabel, type Decomposition } from './representation.js';

/** Activity of one irrep as a fundamental (transition from the ground state). */
export interface IrrepActivity {
  /** IR-allowed: the irrep contains a dipole component x, y or z. */
  readonly ir: boolean;
  readonly irComponents: readonly CartesianComponent[];
  /** Raman-allowed: the irrep contains a polarisability component (a quadratic function). */
  readonly raman: boolean;
  readonly ramanComponents: readonly string[];
}

/** Counts of distinct fundamentals (a degenerate set counts once). */
export interface ActivityCounts {
  /** Number of vibrational degrees of freedom (3N−6, or 3N−5 for a line). */
  readonly total: number;
  /** Number of distinct fundamentals (degenerate sets once). */
  readonly fundamentals: number;
  readonly irActive: number;
  readonly ramanActive: number;
  /** Active in both: the bands expected at the same position in IR and Raman. */
  readonly coincident: number;
  readonly silent: number;
  /** The group has an inversion centre, so no fundamental is both IR- and Raman-active. */
  readonly mutualExclusion: boolean;
  readonly notes: readonly string[];
}

/** IR and Raman activity of the irrep with this label. */
export function irrepActivity(group: PointGroup, label: string): IrrepActivity {
  const ir = irrepByLabel(group, label);
  return {
    ir: ir.translations.length > 0,
    irComponents: ir.translations,
    raman: ir.quadratics.length > 0,
    ramanComponents: ir.quadratics,
  };
}

/** Counts over a Γvib decomposition, with the rule of mutual exclusion stated for centrosymmetric groups. */
export function activityCounts(group: PointGroup, gammaVib: Decomposition): ActivityCounts {
  let total = 0;
  let fundamentals = 0;
  let irActive = 0;
  let ramanActive = 0;
  let coincident = 0;
  for (const [label, n] of Object.entries(gammaVib)) {
    const a = irrepActivity(group, label);
    total += n * irrepByLabel(group, label).dimension;
    fundamentals += n;
    if (a.ir) irActive += n;
    if (a.raman) ramanActive += n;
    if (a.ir && a.raman) coincident += n;
  }
  const silent = fundamentals - irActive - ramanActive + coincident;
  const notes = [
    'Selection rules say which fundamentals may appear; an allowed band can still be too weak to see.',
  ];
  if (group.hasInversion) {
    notes.push(
      `${group.name} has a centre of inversion: by the rule of mutual exclusion no fundamental is both IR- and Raman-active (g modes Raman only, u modes IR only).`,
    );
  }
  if (silent > 0) notes.push(`${silent} fundamental${silent > 1 ? 's are' : ' is'} silent: neither IR- nor Raman-active.`);
  return { total, fundamentals, irActive, ramanActive, coincident, silent, mutualExclusion: group.hasInversion, notes };
}
