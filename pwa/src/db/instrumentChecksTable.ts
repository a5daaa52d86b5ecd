import type { Technique } from '@siteband/shared';

/** One band of a stored instrument check, as the scan screen and the record need it. */
export interface StoredBandCheck {
  readonly expectedCm1: number;
  readonly foundCm1: number | null;
  readonly offsetCm1: number | null;
  readonly toleranceCm1: number;
  readonly toleranceSource: string;
  readonly status: 'pass' | 'out-of-tolerance' | 'missing' | 'out-of-range';
}

/**
 * One row of the `instrumentChecks` table: a finished check of the instrument against a
 * reference standard. Rows are only added, so the tablet keeps the history; the scan screen
 * reads the latest per technique.
 */
export interface InstrumentCheckRow {
  id?: number;
  readonly technique: Technique;
  readonly standardId: string;
  readonly standardName: string;
  readonly pass: boolean;
  readonly reason: string;
  readonly fileName: string;
  /** Epoch milliseconds. */
  readonly checkedAt: number;
  readonly bands: readonly StoredBandCheck[];
}

/** Dexie index spec: auto id, and technique with time so the latest check per technique is one lookup. */
export const instrumentChecksSchema = '++id, [technique+checkedAt]';
