/**
 * Messages between the screens and the identification worker. Every request carries an id; the
 * worker answers each with the same id, either with its result or with a readable error, so the
 * caller never waits on a request that failed.
 */
import type { IdentifyResult, InstrumentCheckResult, Library, ProcessedScan } from '@siteband/shared';
import type { ProcessingSettings, ScanSettings } from './scanSettings';

/** The instrument's exported file as read from the picker. */
export interface ScanFile {
  readonly name: string;
  readonly bytes: ArrayBuffer;
}

/** Build the compound library's indices ahead of the first scan. */
export interface WarmUpRequest {
  readonly id: number;
  readonly kind: 'warm-up';
}

/**
 * A saved scan's processing exactly as its result recorded it (`result.processing`), run again
 * through the shared processOptionsFromRecord, the mapping the server's recomputation uses too.
 */
export interface RecordedProcessing {
  readonly recorded: unknown;
}

/** Import, process and rank one scan. */
export interface IdentifyRequest {
  readonly id: number;
  readonly kind: 'identify';
  readonly file: ScanFile;
  readonly scan: ScanSettings;
  readonly processing: ProcessingSettings | RecordedProcessing;
  /** The library in force as the tablet last received it; absent: the bundled library. */
  readonly library?: Library;
}

/** Import a scan of a reference standard and check it. */
export interface InstrumentCheckRequest {
  readonly id: number;
  readonly kind: 'instrument-check';
  readonly file: ScanFile;
  readonly standardId: string;
  readonly excitationNm?: number;
}

export type WorkerRequest = WarmUpRequest | IdentifyRequest | InstrumentCheckRequest;

/** What the plot needs of a processed scan (typed arrays survive structured cloning). */
export interface PlotData {
  readonly xCm1: Float64Array;
  readonly y: Float64Array;
  readonly peaksCm1: readonly number[];
  readonly flaggedPeaks: readonly { readonly x: number; readonly reason: string }[];
}

/** The outcome of an identify request. */
export interface IdentifyOutcome {
  readonly plot: PlotData;
  readonly processed: Pick<ProcessedScan, 'quality' | 'parameters'>;
  readonly result: IdentifyResult;
  readonly title: string | null;
}

/** Kinds of failure: the file could not be read, the settings were refused, or something else broke. */
export type WorkerErrorCode = 'import' | 'settings' | 'internal';

export interface WorkerError {
  readonly code: WorkerErrorCode;
  readonly message: string;
}

export type WorkerResponse =
  | { readonly id: number; readonly ok: true; readonly kind: 'warm-up' }
  | { readonly id: number; readonly ok: true; readonly kind: 'identify'; readonly outcome: IdentifyOutcome }
  | { readonly id: number; readonly ok: true; readonly kind: 'instrument-check'; readonly check: InstrumentCheckResult; readonly plot: PlotData }
  | { readonly id: number; readonly ok: false; readonly error: WorkerError };
