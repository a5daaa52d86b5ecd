import type { CaseStatus } from '@siteband/shared';
import type { CaptureRow } from './captureRecord';

/** A case's fields as the tablet sends them (PROTOCOL.md, entity `case`). */
export interface CaseData {
  siteName: string;
  address: string | null;
  latitude: number | null;
  longitude: number | null;
  locationAccuracyM: number | null;
  locationEnteredByHand: boolean;
  startedAt: string;
  weatherNotes: string | null;
  accessNotes: string | null;
  status: CaseStatus;
}

/** One row of the `cases` table. */
export type CaseRow = CaptureRow<CaseData>;
