import type { Band, BandIntensity, MatterPhase, Technique } from '@siteband/shared';
import { numberOrText, textOf } from './numberOrText';
import { sourceDraftOf, sourceFromDraft, type SourceDraft } from './sourceDraft';

/** Relative intensities in the library's words, strongest first. */
export const BAND_INTENSITIES: readonly BandIntensity[] = ['vs', 's', 'm', 'w', 'vw'];

/** One editable characteristic band; numbers as typed. A blank source ref means the entry's band source. */
export interface BandDraft {
  technique: Technique;
  cm1: string;
  phase: MatterPhase;
  intensity: BandIntensity;
  widthCm1: string;
  assignment: string;
  label: string;
  source: SourceDraft;
}

/** A new band row: IR, medium, in the compound's usual phase. */
export function blankBand(phase: MatterPhase): BandDraft {
  return { technique: 'ir', cm1: '', phase, intensity: 'm', widthCm1: '', assignment: '', label: '', source: sourceDraftOf(undefined) };
}

/** The form state of a stored band. */
export function bandDraftOf(band: Band): BandDraft {
  return {
    technique: band.technique,
    cm1: textOf(band.cm1),
    phase: band.phase,
    intensity: band.intensity,
    widthCm1: textOf(band.widthCm1),
    assignment: band.assignment,
    label: band.label ?? '',
    source: sourceDraftOf(band.source),
  };
}

/** The raw band to send; optional fields left empty are left out. */
export function bandFromDraft(draft: BandDraft): Record<string, unknown> {
  const label = draft.label.trim();
  const source = sourceFromDraft(draft.source);
  return {
    technique: draft.technique,
    cm1: numberOrText(draft.cm1),
    phase: draft.phase,
    intensity: draft.intensity,
    assignment: draft.assignment.trim(),
    ...(label !== '' ? { label } : {}),
    ...(draft.widthCm1.trim() !== '' ? { widthCm1: numberOrText(draft.widthCm1) } : {}),
    ...(source ? { source } : {}),
  };
}
