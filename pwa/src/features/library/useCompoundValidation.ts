import { geometryProblems, validateCompound, type Compound, type Library } from '@siteband/shared';
import { useDebounced } from '../structure/useDebounced';
import { useStructureCheck } from '../structure/useStructureCheck';
import { entryFromDraft, hasGeometry, type CompoundDraft } from './compoundDraft';
import { analyserFromCheck } from './workerAnalyser';

/** Pause after the last key before the geometry is checked again. */
const TYPING_PAUSE_MS = 400;

/**
 * Everything the editor checks before a save: the library's own entry validation, and for a
 * geometry the structure check with the fundamentals' labels against its Γvib. `base` is the
 * stored entry being changed, or undefined for a compound typed from a blank form.
 */
export function useCompoundValidation(draft: CompoundDraft | undefined, base: Compound | undefined, library: Library | undefined) {
  const xyz = useDebounced(draft?.xyz ?? '', TYPING_PAUSE_MS);
  const withGeometry = draft !== undefined && hasGeometry(draft);
  const structure = useStructureCheck(withGeometry && xyz.trim() !== '' ? { text: xyz, convention: draft.convention } : undefined);
  if (!draft || !library) return { entry: undefined, entryError: null, structure, problems: [] as string[], ready: false };
  const entry = entryFromDraft(draft, base);
  let entryError: string | null = null;
  let validated: Compound | undefined;
  try {
    validated = validateCompound(entry, new Set(Object.keys(library.sources)));
  } catch (error) {
    entryError = error instanceof Error ? error.message : String(error);
  }
  const current = xyz === draft.xyz;
  const problems = validated && withGeometry && structure.data && current ? geometryProblems(validated, analyserFromCheck(structure.data.check)) : [];
  const geometryOk = !withGeometry || (structure.data !== undefined && !structure.isError && current);
  return { entry, entryError, structure, problems, ready: entryError === null && problems.length === 0 && geometryOk };
}
