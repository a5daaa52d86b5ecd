import type { CaptureRow } from './captureRecord';

/** A site note's fields as the tablet sends them (PROTOCOL.md, entity `note`). */
export interface NoteData {
  caseId: string;
  sampleId: string | null;
  text: string;
  recordedAt: string;
}

/** One row of the `notes` table. */
export type NoteRow = CaptureRow<NoteData>;
