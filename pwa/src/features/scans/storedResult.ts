/** What the screens read of a stored scan result (the record keeps the whole identification). */
export interface StoredCandidate {
  readonly id: string;
  readonly name: string;
  readonly cas: string;
  /** Band agreement, 0..1. */
  readonly score: number;
}

/** The likely compounds of a stored result, best first; empty for a result without a ranking. */
export function storedCandidates(result: Record<string, unknown>): StoredCandidate[] {
  const candidates = result.candidates;
  if (!Array.isArray(candidates)) return [];
  return candidates.filter((c): c is StoredCandidate => typeof c?.name === 'string' && typeof c?.score === 'number');
}

/** The stored result's cautions and whether it was reliable, as the identification said them. */
export function storedVerdict(result: Record<string, unknown>): { reliable: boolean; reasons: string[]; cautions: string[]; escalationRequired: boolean } {
  const strings = (value: unknown) => (Array.isArray(value) ? value.filter((v): v is string => typeof v === 'string') : []);
  const escalation = result.escalation as { required?: unknown } | undefined;
  return { reliable: result.reliable === true, reasons: strings(result.reasons), cautions: strings(result.cautions), escalationRequired: escalation?.required === true };
}
