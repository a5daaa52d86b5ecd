import type { CaseData } from '../../db/casesTable';

/** The case form's fields as typed (text), before they become a case record. */
export interface CaseDraft {
  siteName: string;
  address: string;
  latitude: string;
  longitude: string;
  accuracyM: string;
  enteredByHand: boolean;
  startedAt: string;
  weatherNotes: string;
  accessNotes: string;
}

/** A local `datetime-local` value for an instant. */
export function localDateTimeValue(date: Date): string {
  const local = new Date(date.getTime() - date.getTimezoneOffset() * 60_000);
  return local.toISOString().slice(0, 16);
}

/** An empty form for a visit starting now. */
export function emptyCaseDraft(now = new Date()): CaseDraft {
  return { siteName: '', address: '', latitude: '', longitude: '', accuracyM: '', enteredByHand: false, startedAt: localDateTimeValue(now), weatherNotes: '', accessNotes: '' };
}

/** The form for an existing case. */
export function draftOf(data: CaseData): CaseDraft {
  const text = (n: number | null) => (n === null ? '' : String(n));
  return {
    siteName: data.siteName,
    address: data.address ?? '',
    latitude: text(data.latitude),
    longitude: text(data.longitude),
    accuracyM: text(data.locationAccuracyM),
    enteredByHand: data.locationEnteredByHand,
    startedAt: localDateTimeValue(new Date(data.startedAt)),
    weatherNotes: data.weatherNotes ?? '',
    accessNotes: data.accessNotes ?? '',
  };
}

function numberOrNull(text: string): number | null {
  const trimmed = text.trim().replace(',', '.');
  return trimmed === '' ? null : Number(trimmed);
}

function textOrNull(text: string): string | null {
  return text.trim() === '' ? null : text.trim();
}

/** The case record of a filled form (validated by saveCase). */
export function caseDataOf(draft: CaseDraft, status: CaseData['status']): CaseData {
  const started = new Date(draft.startedAt);
  return {
    siteName: draft.siteName.trim(),
    address: textOrNull(draft.address),
    latitude: numberOrNull(draft.latitude),
    longitude: numberOrNull(draft.longitude),
    locationAccuracyM: draft.enteredByHand ? null : numberOrNull(draft.accuracyM),
    locationEnteredByHand: draft.enteredByHand,
    startedAt: Number.isNaN(started.getTime()) ? draft.startedAt : started.toISOString(),
    weatherNotes: textOrNull(draft.weatherNotes),
    accessNotes: textOrNull(draft.accessNotes),
    status,
  };
}
