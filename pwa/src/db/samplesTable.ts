import type { CaptureRow } from './captureRecord';

/** Physical states a collector can record (the server's list). */
export const SAMPLE_STATES = ['solid', 'powder', 'liquid', 'paste', 'gas', 'mixed', 'unknown'] as const;
export type SampleState = (typeof SAMPLE_STATES)[number];

/** What the collector saw. There is no odour field: unknown substances are never sniffed. */
export interface SampleObservations {
  colour?: string;
  state?: SampleState;
  notes?: string;
}

/** A sample's fields as the tablet sends them (PROTOCOL.md, entity `sample`). */
export interface SampleData {
  caseId: string;
  label: string;
  container: string | null;
  description: string | null;
  locationOnSite: string | null;
  observations: SampleObservations;
  collectedBy: string;
  collectedAt: string;
  sealNumber: string | null;
}

/** One row of the `samples` table. */
export type SampleRow = CaptureRow<SampleData>;
