import type { IdentifyRequestDto } from '../identify/dto/identify-request.dto';
import type { Scan } from './scan.entity';
import { asNumber, asObject } from './json-reading';

/** Where the processing settings of a recomputation came from. */
export type ParametersSource = 'tablet' | 'defaults';

/** What the server runs to recompute a scan, and where its settings came from. */
export interface RecomputeRequest {
  request: IdentifyRequestDto;
  parametersFrom: ParametersSource;
}

/**
 * The identification request that reproduces the tablet's: the scan's technique, phase and laser line,
 * the ATR flag from the processing the tablet recorded (`result.processing.atr.enabled`), and its match
 * window when it was set by hand (`result.parameters.toleranceFrom === 'input'`). Without recorded
 * processing the pipeline's defaults are used, and the source says so.
 */
export function recomputeRequest(scan: Pick<Scan, 'technique' | 'phase' | 'excitationNm' | 'result'>): RecomputeRequest {
  const processing = asObject(scan.result?.processing);
  const ranking = asObject(scan.result?.parameters);
  const atr = scan.technique === 'ir' && asObject(processing?.atr)?.enabled === true;
  const toleranceCm1 = ranking?.toleranceFrom === 'input' ? asNumber(ranking.toleranceCm1) : null;
  return {
    request: {
      technique: scan.technique,
      phase: scan.phase,
      ...(atr ? { atr: true } : {}),
      ...(scan.technique === 'raman' && scan.excitationNm !== null ? { excitationNm: scan.excitationNm } : {}),
      ...(toleranceCm1 !== null ? { toleranceCm1 } : {}),
    },
    parametersFrom: processing ? 'tablet' : 'defaults',
  };
}
