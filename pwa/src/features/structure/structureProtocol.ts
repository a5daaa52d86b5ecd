import { checkStructure, pointGroup, type StructureCheck } from '@siteband/shared';

/** What the page asks the structure worker: one structure text with its options. */
export interface StructureRequest {
  readonly id: number;
  readonly text: string;
  readonly tolerance?: number;
  readonly convention?: 'yz' | 'xz';
}

/** One row of the group's character table, as the page shows it. */
export interface CharacterRow {
  readonly label: string;
  readonly display: string;
  readonly characters: readonly number[];
  readonly translations: readonly string[];
  readonly rotations: readonly string[];
  readonly quadratics: readonly string[];
}

/** The group's character table (of the model group for a linear molecule). */
export interface CharacterTable {
  readonly group: string;
  readonly classes: readonly string[];
  readonly rows: readonly CharacterRow[];
  readonly reference: string;
}

/** A refused structure: the reader's message, and its 1-based line when it names one. */
export interface StructureProblem {
  readonly message: string;
  readonly line: number | null;
}

/** The worker's answer, matched to its request by id. */
export type StructureReply =
  | { readonly id: number; readonly ok: true; readonly check: StructureCheck; readonly table: CharacterTable }
  | { readonly id: number; readonly ok: false; readonly problem: StructureProblem };

/** Builds the character table of a group of the catalogue for display. */
export function characterTableOf(groupName: string): CharacterTable {
  const group = pointGroup(groupName);
  return {
    group: group.linear ? group.linear.modelGroup : group.name,
    classes: group.classes.map((c) => c.label),
    rows: group.irreps.map((irrep) => ({
      label: irrep.label,
      display: irrep.display,
      characters: irrep.characters,
      translations: irrep.translations,
      rotations: irrep.rotations,
      quadratics: irrep.quadratics,
    })),
    reference: group.reference,
  };
}

function problemOf(error: unknown): StructureProblem {
  if (error instanceof Error) {
    // StructureError carries the line; RangeError (tolerance, unknown element, …) has none.
    const line = 'line' in error && typeof error.line === 'number' ? error.line : null;
    return { message: error.message, line };
  }
  return { message: String(error), line: null };
}

/** Answers one request: the structure check and its group's table, or the problem that stopped it. */
export function answerStructureRequest(request: StructureRequest): StructureReply {
  try {
    const check = checkStructure(request.text, {
      ...(request.tolerance !== undefined ? { tolerance: request.tolerance } : {}),
      ...(request.convention !== undefined ? { convention: request.convention } : {}),
    });
    return { id: request.id, ok: true, check, table: characterTableOf(check.pointGroup) };
  } catch (error) {
    return { id: request.id, ok: false, problem: problemOf(error) };
  }
}
