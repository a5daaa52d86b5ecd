/**
 * The worker's work, kept apart from the worker's message plumbing so tests can run it directly:
 * import, process and rank a scan, or check an instrument, and answer with a typed response.
 */
import {
  identifySpectrum,
  importSpectrum,
  referenceStandard,
  runInstrumentCheck,
  SpectrumImportError,
  warmUpIdentification,
  type FlaggedPeak,
  type Library,
  type Peak,
  type Spectrum,
} from '@siteband/shared';
import type { PlotData, WorkerError, WorkerRequest, WorkerResponse } from './protocol';
import { toProcessOptions, validateScanSettings } from './scanSettings';

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
        validateScanSettings(scan, processing);
        const spectrum = importSpectrum(new Uint8Array(file.bytes), {
          fileName: file.name,
          technique: scan.technique,
          ...(scan.technique === 'raman' ? { excitationNm: scan.excitationNm } : {}),
        });
        const library = libraryFor(request.library);
        const { processed, result } = identifySpectrum(spectrum, { process: toProcessOptions(scan, processing), ...(library ? { library } : {}) });
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
