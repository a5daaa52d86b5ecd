import type { SampleData, SampleState } from '../../db/samplesTable';
import { localDateTimeValue } from '../cases/caseDraft';

/** The sample form's fields as typed. */
export interface SampleDraft {
  label: string;
  container: string;
  description: string;
  locationOnSite: string;
  colour: string;
  state: SampleState | '';
  observationNotes: string;
  collectedBy: string;
  collectedAt: string;
  sealNumber: string;
}

/** An empty form for a sample collected now by the signed-in person. */
export function emptySampleDraft(collectedBy: string, now = new Date()): SampleDraft {
  return { label: '', container: '', description: '', locationOnSite: '', colour: '', state: '', observationNotes: '', collectedBy, collectedAt: localDateTimeValue(now), sealNumber: '' };
}

/** The form for a stored sample. */
export function sampleDraftOf(data: SampleData): SampleDraft {
  return {
    label: data.label,
    container: data.container ?? '',
    description: data.description ?? '',
    locationOnSite: data.locationOnSite ?? '',
    colour: data.observations.colour ?? '',
    state: data.observations.state ?? '',
    observationNotes: data.observations.notes ?? '',
    collectedBy: data.collectedBy,
    collectedAt: localDateTimeValue(new Date(data.collectedAt)),
    sealNumber: data.sealNumber ?? '',
  };
}

const orNull = (text: string) => (text.trim() === '' ? null : text.trim());

/** The sample record of a filled form (validated by saveSample). */
export function sampleDataOf(caseId: string, draft: SampleDraft): SampleData {
  const observations: SampleData['observations'] = {};
  if (draft.colour.trim()) observations.colour = draft.colour.trim();
  if (draft.state) observations.state = draft.state;
  if (draft.observationNotes.trim()) observations.notes = draft.observationNotes.trim();
  const collected = new Date(draft.collectedAt);
  if (Number.isNaN(collected.getTime())) throw new RangeError('The collection time is not a valid date and time');
  return {
    caseId,
    label: draft.label.trim(),
    container: orNull(draft.container),
    description: orNull(draft.description),
    locationOnSite: orNull(draft.locationOnSite),
    observations,
    collectedBy: draft.collectedBy.trim(),
    collectedAt: collected.toISOString(),
    sealNumber: orNull(draft.sealNumber),
  };
}
