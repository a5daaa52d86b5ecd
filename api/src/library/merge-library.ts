import { validateLibrary, type Library } from '@siteband/shared';
import { mergedVersion, type CurrentEdit } from './library-version';

/** The compound library in force: what identification uses and what tablets download. */
export interface CurrentLibrary {
  readonly library: Library;
  /** Ids of retired compounds (bundled or added), so a tablet can drop them from its copy. */
  readonly retired: readonly string[];
}

/**
 * Applies each compound's current edit to the bundled library — an edit replaces the bundled entry or
 * adds a new one, a retirement removes it — and validates the result as a whole with the shared
 * `validateLibrary` (unique ids and CAS RNs, `solutionOf` targets), throwing its TypeError on a fault.
 */
export function mergeLibrary(bundled: Library, current: readonly CurrentEdit[]): CurrentLibrary {
  const compounds = new Map<string, unknown>(bundled.compounds.map((c) => [c.id, c]));
  const retired: string[] = [];
  for (const edit of current) {
    if (edit.retired) {
      compounds.delete(edit.compoundId);
      retired.push(edit.compoundId);
    } else {
      compounds.set(edit.compoundId, edit.document);
    }
  }
  const library = validateLibrary({
    version: mergedVersion(bundled.version, current),
    sources: bundled.sources,
    compounds: [...compounds.values()],
    escalationRules: bundled.escalationRules,
  });
  return { library, retired: retired.sort() };
}
