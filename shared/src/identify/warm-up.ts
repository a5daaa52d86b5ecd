/** Prepare the ranking ahead of the first scan (validation, symmetry analysis, band index). */
import { engineAnalyser } from '../library/engine-analyser.js';
import { loadLibrary } from '../library/load.js';
import type { Phase, Technique } from '../spectrum/types.js';
import { libraryIndexFor } from './index-cache.js';
import type { IdentifyOptions } from './identify-scan.js';

/**
 * Build the cached library indices for every technique and phase, so the first identifyScan is
 * as fast as the next ones (about 0.7 s of work on a 2-core machine; call it when the app is idle).
 */
export function warmUpIdentification(options: IdentifyOptions = {}): void {
  const library = options.library ?? loadLibrary();
  for (const technique of ['ir', 'raman'] as Technique[]) {
    for (const phase of ['condensed', 'gas'] as Phase[]) libraryIndexFor(library, options.analyser ?? engineAnalyser, technique, phase);
  }
}
