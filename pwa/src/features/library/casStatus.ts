import { CAS_PATTERN, isValidCas } from '@siteband/shared';

/** What the live CAS RN check says about the text typed so far. */
export type CasStatus = 'empty' | 'malformed' | 'bad-check-digit' | 'valid';

/** The live check of a typed CAS RN: its shape first, then the shared check-digit rule. */
export function casStatus(text: string): CasStatus {
  const cas = text.trim();
  if (cas === '') return 'empty';
  if (!CAS_PATTERN.test(cas)) return 'malformed';
  return isValidCas(cas) ? 'valid' : 'bad-check-digit';
}
