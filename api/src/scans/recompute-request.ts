import { MAX_TOLERANCE_CM1, processOptionsFromRecord, ProcessingRecordError } from '@siteband/shared';
import type { FileRun } from '../identify/identify.service';
import type { Scan } from './scan.entity';
import { asNumber, asObject } from './json-reading';

/** Where the processing settings of a recomputation came from. */
export type ParametersSource = 'tablet' | 'defaults';

/**
 * What the server runs to recompute a scan and where its settings came from, or why the tablet's
 * run cannot be reproduced (a recorded setting that is malformed, unknown or out of bounds).
 */
export type RecomputeRequest = { run: FileRun; parametersFrom: ParametersSource; cannotReproduce: null } | { run: null; parametersFrom: 'tablet'; cannotReproduce: string };

/**
 * The run that reproduces the tablet's: the scan's technique, phase and laser line, every processing
 * setting the tablet recorded (`result.processing`, through the shared processOptionsFromRecord, the
 * same mapping the tablet's own code relies on) and its match window when it was set by hand
 * (`result.parameters.toleranceFrom === 'input'`). Without recorded processing the pipeline's
 * defaults are used, and the source says so; a recorded record that cannot be used is never replaced
 * by defaults.
 */
export function recomputeRequest(scan: Pick<Scan, 'technique' | 'phase' | 'excitationNm' | 'result'>): RecomputeRequest {
  const recorded = scan.result?.processing;
  const ranking = asObject(scan.result?.parameters);
  let toleranceCm1: number | undefined;
  if (ranking?.toleranceFrom === 'input') {
    const tolerance = asNumber(ranking.toleranceCm1);
    if (tolerance === null || !(tolerance > 0) || tolerance > MAX_TOLERANCE_CM1) {
      return cannot(`the hand-set match window parameters.toleranceCm1 must be a number above 0 and at most ${MAX_TOLERANCE_CM1} cm⁻¹, got ${JSON.stringify(ranking.toleranceCm1) ?? 'nothing'}`);
    }
    toleranceCm1 = tolerance;
  }
  const laser = scan.technique === 'raman' && scan.excitationNm !== null ? { excitationNm: scan.excitationNm } : {};
  const tolerance = toleranceCm1 !== undefined ? { toleranceCm1 } : {};
  if (recorded === undefined || recorded === null) {
    return { run: { process: { technique: scan.technique, phase: scan.phase }, ...laser, ...tolerance }, parametersFrom: 'defaults', cannotReproduce: null };
  }
  try {
    const process = processOptionsFromRecord(recorded);
    if (process.technique !== scan.technique || process.phase !== scan.phase) {
      return cannot(`the processing was recorded for technique ${process.technique}, phase ${process.phase}, but the scan is technique ${scan.technique}, phase ${scan.phase}`);
    }
    return { run: { process, ...laser, ...tolerance }, parametersFrom: 'tablet', cannotReproduce: null };
  } catch (error) {
    if (error instanceof ProcessingRecordError) return cannot(`recorded processing: ${error.message}`);
    throw error;
  }
}

function cannot(reason: string): RecomputeRequest {
  return { run: null, parametersFrom: 'tablet', cannotReproduce: reason };
}
