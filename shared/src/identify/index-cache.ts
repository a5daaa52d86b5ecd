/** One LibraryIndex per library, symmetry analyser, technique and phase, built on first use. */
import type { Library } from '../library/validate-library.js';
import type { SymmetryAnalyser } from '../library/symmetry-source.js';
import type { Phase, Technique } from '../spectrum/types.js';
import { buildLibraryIndex, type LibraryIndex } from './library-index.js';

const cache = new WeakMap<Library, WeakMap<SymmetryAnalyser, Map<string, LibraryIndex>>>();

/** The cached index of a library for a technique and phase. */
export function libraryIndexFor(library: Library, analyser: SymmetryAnalyser, technique: Technique, phase: Phase): LibraryIndex {
  let byAnalyser = cache.get(library);
  if (byAnalyser === undefined) {
    byAnalyser = new WeakMap();
    cache.set(library, byAnalyser);
  }
  let byKey = byAnalyser.get(analyser);
  if (byKey === undefined) {
    byKey = new Map();
    byAnalyser.set(analyser, byKey);
  }
  const key = `${technique}/${phase}`;
  let index = byKey.get(key);
  if (index === undefined) {
    index = buildLibraryIndex(library.compounds, technique, phase, analyser);
    byKey.set(key, index);
  }
  return index;
}
