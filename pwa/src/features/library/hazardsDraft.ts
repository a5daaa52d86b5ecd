import { FLAG_CAUTIONS, type CompoundHazards, type PictogramCode } from '@siteband/shared';
import { sourceDraftOf, sourceFromDraft, type SourceDraft } from './sourceDraft';

/** The field markers outside GHS the library knows: those the shared flag cautions cover. */
export const HAZARD_FLAGS: readonly string[] = Object.keys(FLAG_CAUTIONS);

/** The hazard data as the form holds it. */
export interface HazardsDraft {
  classifications: { hazardClass: string; category: string }[];
  hStatements: string[];
  pictograms: PictogramCode[];
  signalWord: '' | 'Danger' | 'Warning';
  flags: string[];
  unNumber: string;
  source: SourceDraft;
}

/** Hazards of a compound not (yet) classified. */
export function blankHazards(): HazardsDraft {
  return { classifications: [], hStatements: [], pictograms: [], signalWord: '', flags: [], unNumber: '', source: sourceDraftOf(undefined) };
}

/** The form state of stored hazard data. */
export function hazardsDraftOf(hazards: CompoundHazards): HazardsDraft {
  return {
    classifications: hazards.classifications.map((c) => ({ hazardClass: c.hazardClass, category: c.category })),
    hStatements: [...hazards.hStatements],
    pictograms: [...hazards.pictograms],
    signalWord: hazards.signalWord ?? '',
    flags: [...hazards.flags],
    unNumber: hazards.unNumber ?? '',
    source: sourceDraftOf(hazards.source),
  };
}

/** The raw hazard data to send: blank signal word and UN number become null, as the library writes them. */
export function hazardsFromDraft(draft: HazardsDraft): Record<string, unknown> {
  const un = draft.unNumber.trim();
  return {
    signalWord: draft.signalWord === '' ? null : draft.signalWord,
    classifications: draft.classifications.map((c) => ({ hazardClass: c.hazardClass, category: c.category.trim() })),
    hStatements: [...draft.hStatements],
    pictograms: [...draft.pictograms],
    flags: [...draft.flags],
    unNumber: un === '' ? null : un,
    source: sourceFromDraft(draft.source),
  };
}
