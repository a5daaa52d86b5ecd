/**
 * The structure check: structure text → point group, symmetry elements, standard orientation,
 * Γvib with IR/Raman activity. The one composition used by the CLI, the API and the PWA, so
 * the three can never disagree.
 */
import { parseStructure, type StructureFormat } from '../structure/index.js';
import type { PointGroupDetection, SymmetryElement } from '../symmetry/detect/index.js';
import type { VibrationalAnalysis } from '../symmetry/analyse.js';
import type { Atom, PlanarConvention } from '../symmetry/types.js';
import { analyseStructure, type AnalyseStructureOptions } from './analyse-structure.js';

export interface StructureCheckOptions extends AnalyseStructureOptions {
  /** Structure format; detected from the text when absent. */
  readonly format?: StructureFormat;
}

/** A symmetry element as JSON: `order` is null for the infinite axis of a linear molecule. */
export interface StructureCheckElement extends Omit<SymmetryElement, 'order'> {
  readonly order?: number | null;
}

/** The JSON object of `cli symmetry --json` and `POST /api/symmetry`. */
export interface StructureCheck extends Omit<VibrationalAnalysis, 'pointGroup' | 'atoms'> {
  readonly title: string | null;
  readonly pointGroup: string;
  /** Number of operations; null for C∞v and D∞h. */
  readonly order: number | null;
  readonly atoms: number;
  readonly formula: string;
  readonly elements: readonly StructureCheckElement[];
  readonly topType: PointGroupDetection['topType'];
  readonly principalMoments: PointGroupDetection['principalMoments'];
  readonly orientation: {
    readonly convention: PlanarConvention;
    readonly tolerance: number;
    /** Largest distance (Å) between an operated atom and its partner before symmetrisation. */
    readonly maxDeviation: number;
    /** Centre of mass in the input frame, Å. */
    readonly centre: PointGroupDetection['centre'];
    /** Row-major rotation from the input frame to the standard frame (principal axis z). */
    readonly rotation: PointGroupDetection['rotation'];
    /** The atoms in the standard orientation, symmetrised to the ideal group. */
    readonly atoms: readonly Atom[];
  };
}

/** Runs the whole structure check on structure text (XYZ or MOL V2000); throws StructureError or RangeError on bad input. */
export function checkStructure(text: string, options: StructureCheckOptions = {}): StructureCheck {
  const structure = parseStructure(text, options.format);
  const { detection, analysis: full } = analyseStructure(structure, options);
  const { pointGroup, atoms, ...analysis } = full;
  return {
    title: structure.title ?? null,
    pointGroup,
    order: Number.isFinite(detection.order) ? detection.order : null,
    atoms,
    formula: hillFormula(structure.atoms),
    elements: detection.elements.map((e) => (e.order === Infinity ? { ...e, order: null } : e)),
    topType: detection.topType,
    principalMoments: detection.principalMoments,
    orientation: {
      convention: detection.convention,
      tolerance: detection.tolerance,
      maxDeviation: detection.maxDeviation,
      centre: detection.centre,
      rotation: detection.rotation,
      atoms: detection.oriented,
    },
    ...analysis,
  };
}

/** Hill-order formula (C, then H, then the rest alphabetically), isotopes counted with their element. */
export function hillFormula(atoms: readonly Atom[]): string {
  const counts = new Map<string, number>();
  for (const a of atoms) counts.set(a.element, (counts.get(a.element) ?? 0) + 1);
  const order = [...counts.keys()].sort((a, b) => a.localeCompare(b));
  const keys = counts.has('C') ? ['C', ...(counts.has('H') ? ['H'] : []), ...order.filter((k) => k !== 'C' && k !== 'H')] : order;
  return keys.map((k) => `${k}${counts.get(k) === 1 ? '' : counts.get(k)}`).join('');
}
