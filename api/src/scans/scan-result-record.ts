import type { IdentifyAnswer } from '../identify/identify.service';

/**
 * A scan's identification in the form a scan's `result` and `serverResult` take: the shared
 * identification result with the pipeline's `quality` and `processing`, plus `codeVersion` (the ranking
 * method's version, which the sync protocol requires). The uploaded file's name is left out: the
 * attachment record holds it. Passed through JSON so that what is stored is exactly what is compared.
 */
export function scanResultRecord(answer: IdentifyAnswer): Record<string, unknown> {
  const { file: _file, ...result } = answer;
  return JSON.parse(JSON.stringify({ ...result, codeVersion: answer.parameters.methodVersion })) as Record<string, unknown>;
}
