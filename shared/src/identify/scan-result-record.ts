import type { ProcessedScan } from '../spectrum/process-scan.js';
import type { IdentifyResult } from './types.js';

/**
 * A scan's identification as stored on the scan and synced (a scan's `result`, and the server's
 * `serverResult`): the identification result, the pipeline's `quality` and `processing` (its
 * ProcessParameters, which processOptionsFromRecord turns back into the settings that reproduce it),
 * and `codeVersion`, the ranking method's version, so a change of the shared code shows up as such.
 * Passed through JSON, so what is kept locally is exactly what survives sync and is compared.
 */
export function scanResultRecord(result: IdentifyResult, processed: Pick<ProcessedScan, 'quality' | 'parameters'>): Record<string, unknown> {
  const record = { ...result, quality: processed.quality, processing: processed.parameters, codeVersion: result.parameters.methodVersion };
  return JSON.parse(JSON.stringify(record)) as Record<string, unknown>;
}
