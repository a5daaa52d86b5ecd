import type { CaptureRow } from './captureRecord';

/** A hand-over's fields as the tablet sends them (PROTOCOL.md, entity `handover`); append-only. */
export interface HandoverData {
  sampleId: string;
  from: string;
  to: string;
  at: string;
  sealNumber: string | null;
  note: string | null;
}

/** One row of the `handovers` table. */
export type HandoverRow = CaptureRow<HandoverData>;
