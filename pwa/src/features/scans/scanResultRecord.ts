import type { IdentifyOutcome } from '../identify/protocol';

/**
 * The result as stored on the scan: the identification plus how it was reached, in the form the
 * server recomputes and compares (PROTOCOL.md "Server recomputation"). The method version is the
 * code version, so a later change of the shared code shows up as a different method.
 */
export function scanResultRecord(outcome: IdentifyOutcome): Record<string, unknown> {
  const { result, processed } = outcome;
  // A JSON round trip keeps exactly what survives sync, so the local copy equals the server's.
  return JSON.parse(JSON.stringify({ ...result, quality: processed.quality, processing: processed.parameters, codeVersion: result.parameters.methodVersion })) as Record<string, unknown>;
}
