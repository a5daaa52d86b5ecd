import type { SourceBasis, SourceRef } from '@siteband/shared';

/** A source as the form holds it: a key of the library's source list (empty for none), the basis and a note. */
export interface SourceDraft {
  ref: string;
  basis: SourceBasis;
  note: string;
}

/** The bases a supervisor can pick, in the library's own words. */
export const SOURCE_BASES: readonly SourceBasis[] = ['read', 'from memory', 'common practice', 'computed', 'invented'];

/** The form state of a source (a blank one when the entry has none). */
export function sourceDraftOf(source: SourceRef | undefined): SourceDraft {
  return { ref: source?.ref ?? '', basis: source?.basis ?? 'from memory', note: source?.note ?? '' };
}

/** The raw source to send, or undefined when no key was chosen (validation then names what is missing). */
export function sourceFromDraft(draft: SourceDraft): Record<string, string> | undefined {
  if (draft.ref === '') return undefined;
  const note = draft.note.trim();
  return { ref: draft.ref, basis: draft.basis, ...(note !== '' ? { note } : {}) };
}
