/**
 * The worker's work, kept apart from the worker's message plumbing so tests can run it directly:
 * import, process and rank a scan, or check an instrument, and answer with a typed response.
 */
import {
  identifySpectrum,
  importSpectrum,
  processOptionsFromRecord,
  referenceStandard,
  runInstrumentCheck,
  SpectrumImportError,
  warmUpIdentification,
  type FlaggedPeak,
  type Library,
  type Peak,
  type ProcessOptions,
  type Spectrum,
} from '@siteband/shared';
import type { PlotData, RecordedProcessing, WorkerError, WorkerRequest, WorkerResponse } from './protocol';
import { DEFAULT_PROCESSING, toProcessOptions, validateScanSettings, type ProcessingSettings, type ScanSettings } from './scanSettings';

function plotData(spectrum: Spectrum, peaks: readonly Peak[], flagged: readonly FlaggedPeak[]): PlotData {
  return {
    xCm1: spectrum.xCm1,
    y: spectrum.y,
    peaksCm1: peaks.map((p) => p.x),
    flaggedPeaks: flagged.map((p) => ({ x: p.x, reason: p.reason })),
  };
}

/** Sorts a thrown value into the error the screen shows; an import error keeps its own message. */
export function toWorkerError(error: unknown): WorkerError {
  if (error instanceof SpectrumImportError) return { code: 'import', message: error.message };
  if (error instanceof RangeError || error instanceof TypeError) return { code: 'settings', message: error.message };
  return { code: 'internal', message: error instanceof Error ? error.message : String(error) };
}

/** The pipeline's options: the screen's settings, or a saved scan's recorded processing as it was. */
function processOptionsOf(scan: ScanSettings, processing: ProcessingSettings | RecordedProcessing): ProcessOptions {
  if (!('recorded' in processing)) {
    validateScanSettings(scan, processing);
    return toProcessOptions(scan, processing);
  }
  validateScanSettings(scan, DEFAULT_PROCESSING);
  const process = processOptionsFromRecord(processing.recorded);
  if (process.technique !== scan.technique || process.phase !== scan.phase) {
    throw new RangeError(`The recorded processing is for technique ${process.technique}, phase ${process.phase}, but the scan is technique ${scan.technique}, phase ${scan.phase}`);
  }
  return process;
}

let kept: Library | undefined;

/**
 * The library a request ranks against. The same content arrives as a fresh copy with every message,
 * so it is kept by content hash: the ranking's indices are built once per library version.
 */
function libraryFor(sent: Library | undefined): Library | undefined {
  if (sent === undefined) return undefined;
  if (kept?.version.contentHash !== sent.version.contentHash) kept = sent;
  return kept;
}

/** Runs one request and answers it; never throws, so every request gets its answer. */
export function handleRequest(request: WorkerRequest): WorkerResponse {
  try {
    switch (request.kind) {
      case 'warm-up':
        warmUpIdentification();
        return { id: request.id, ok: true, kind: 'warm-up' };
      case 'identify': {
        const { scan, processing, file } = request;
        const process = processOptionsOf(scan, processing);
        const spectrum = importSpectrum(new Uint8Array(file.bytes), {
          fileName: file.name,
          technique: scan.technique,
          ...(scan.technique === 'raman' ? { excitationNm: scan.excitationNm } : {}),
        });
        const library = libraryFor(request.library);
        const { processed, result } = identifySpectrum(spectrum, { process, ...(library ? { library } : {}) });
        return {
          id: request.id,
          ok: true,
          kind: 'identify',
          outcome: {
            plot: plotData(processed.spectrum, processed.peaks, processed.flaggedPeaks),
            processed: { quality: processed.quality, parameters: processed.parameters },
            result,
            title: spectrum.title ?? null,
          },
        };
      }
      case 'instrument-check': {
        const standard = referenceStandard(request.standardId);
        const spectrum = importSpectrum(new Uint8Array(request.file.bytes), {
          fileName: request.file.name,
          technique: standard.technique,
          ...(request.excitationNm !== undefined ? { excitationNm: request.excitationNm } : {}),
        });
        const check = runInstrumentCheck(spectrum, standard.id);
        const found = check.bands.flatMap((b) => (b.foundCm1 === null ? [] : [{ x: b.foundCm1, height: 0, widthCm1: 0, relativeHeight: 0 }]));
        return { id: request.id, ok: true, kind: 'instrument-check', check, plot: plotData(spectrum, found, []) };
      }
    }
  } catch (error) {
    return { id: request.id, ok: false, error: toWorkerError(error) };
  }
}
