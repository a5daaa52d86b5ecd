import { processScan } from '../spectrum/process-scan.js';
import type { ProcessOptions } from '../spectrum/process-options.js';
import type { Peak, ScanQuality, Spectrum } from '../spectrum/types.js';
import type { ReferenceBand, ReferenceStandard } from './standard.js';
import { referenceStandard } from './standards.js';

/** Options of {@link runInstrumentCheck}. */
export interface InstrumentCheckOptions {
  /** One tolerance in cm⁻¹ for every band, replacing the standard's own (e.g. a site's SOP value). */
  tolerance?: number;
  /** Widest search distance from a band, in cm⁻¹. Default: the standard's (8); never more than half the gap to the next band. */
  searchWindowCm1?: number;
  /** Fewest bands that must fall inside the scanned range. Default 3. */
  minBandsInRange?: number;
  /** Processing options passed to processScan (technique and phase come from the standard). */
  processing?: Omit<ProcessOptions, 'technique' | 'phase'>;
}

/** The outcome for one reference band. */
export interface BandCheck {
  readonly expectedCm1: number;
  /** Nearest picked peak within the search window, or null when none was found. */
  readonly foundCm1: number | null;
  /** found − expected, in cm⁻¹. */
  readonly offsetCm1: number | null;
  readonly toleranceCm1: number;
  readonly withinTolerance: boolean;
  readonly status: 'pass' | 'out-of-tolerance' | 'missing' | 'out-of-range';
  readonly band: ReferenceBand;
}

/** The whole instrument check: per-band results and one verdict with its reason. */
export interface InstrumentCheckResult {
  readonly standardId: string;
  readonly standardName: string;
  readonly pass: boolean;
  readonly reason: string;
  readonly bands: readonly BandCheck[];
  /** Where the tolerances came from: the standard's basis, or 'caller' when overridden. */
  readonly toleranceBasis: ReferenceStandard['toleranceBasis'] | 'caller';
  readonly quality: ScanQuality;
  readonly notes: readonly string[];
}

/**
 * Check a scan of a reference standard: pick its peaks, match each reference band to the
 * nearest peak within the search window, and pass only when every band inside the scanned
 * range is found within tolerance and the scan itself is reliable.
 */
export function runInstrumentCheck(spectrum: Spectrum, standardId: string, options: InstrumentCheckOptions = {}): InstrumentCheckResult {
  const standard = referenceStandard(standardId);
  if (options.tolerance !== undefined && !(options.tolerance > 0 && Number.isFinite(options.tolerance))) {
    throw new RangeError(`tolerance must be a positive number of cm⁻¹, got ${options.tolerance}`);
  }
  if (spectrum.technique !== undefined && spectrum.technique !== standard.technique) {
    throw new RangeError(`${standard.name} is a ${standard.technique === 'ir' ? 'IR' : 'Raman'} standard, but the scan is ${spectrum.technique}`);
  }
  const processed = processScan(spectrum, { ...options.processing, technique: standard.technique, phase: 'condensed' });
  // A reference material's own bands may fall in atmospheric regions; they still count here.
  const peaks = [...processed.peaks, ...processed.flaggedPeaks].sort((a, b) => a.x - b.x);
  const from = spectrum.xCm1[0];
  const to = spectrum.xCm1[spectrum.xCm1.length - 1];
  const window = options.searchWindowCm1 ?? standard.searchWindowCm1;
  const positions = standard.bands.map((b) => b.positionCm1);
  const bands = standard.bands.map((band) =>
    checkBand(band, peaks, windowFor(band.positionCm1, positions, window), options.tolerance, from, to),
  );

  const inRange = bands.filter((b) => b.status !== 'out-of-range');
  const minBands = options.minBandsInRange ?? 3;
  const failures: string[] = [];
  if (!processed.quality.reliable) failures.push(`the scan is unreliable (${processed.quality.reasons.join('; ')})`);
  if (inRange.length < minBands) {
    failures.push(`only ${inRange.length} reference bands lie in the scanned range ${from.toFixed(0)}–${to.toFixed(0)} cm⁻¹; at least ${minBands} are needed`);
  }
  const off = bands.filter((b) => b.status === 'out-of-tolerance');
  const missing = bands.filter((b) => b.status === 'missing');
  if (off.length > 0) {
    failures.push(
      `${off.length} band${off.length > 1 ? 's' : ''} outside tolerance: ` +
        off.map((b) => `${b.expectedCm1} (${signed(b.offsetCm1!)} cm⁻¹, allowed ±${b.toleranceCm1})`).join(', '),
    );
  }
  if (missing.length > 0) {
    failures.push(`${missing.length} band${missing.length > 1 ? 's' : ''} not found: ${missing.map((b) => b.expectedCm1).join(', ')}`);
  }
  const pass = failures.length === 0;
  const reason = pass ? passReason(inRange) : failures.join('; ');
  return {
    standardId: standard.id,
    standardName: standard.name,
    pass,
    reason,
    bands,
    toleranceBasis: options.tolerance !== undefined ? 'caller' : standard.toleranceBasis,
    quality: processed.quality,
    notes: standard.notes,
  };
}

// Never so wide that a neighbouring reference band's peak could be taken for this one.
function windowFor(position: number, positions: readonly number[], window: number): number {
  const gap = positions.filter((p) => p !== position).reduce((g, p) => Math.min(g, Math.abs(p - position)), Infinity);
  return Math.min(window, gap / 2);
}

function checkBand(
  band: ReferenceBand,
  peaks: readonly Peak[],
  window: number,
  tolerance: number | undefined,
  from: number,
  to: number,
): BandCheck {
  const toleranceCm1 = tolerance ?? band.toleranceCm1;
  const base = { expectedCm1: band.positionCm1, toleranceCm1, band };
  if (band.positionCm1 < from || band.positionCm1 > to) {
    return { ...base, foundCm1: null, offsetCm1: null, withinTolerance: false, status: 'out-of-range' };
  }
  const distance = (p: Peak) => Math.abs(p.x - band.positionCm1);
  const nearest = peaks.filter((p) => distance(p) <= window).sort((a, b) => distance(a) - distance(b))[0];
  if (!nearest) return { ...base, foundCm1: null, offsetCm1: null, withinTolerance: false, status: 'missing' };
  const offsetCm1 = nearest.x - band.positionCm1;
  const withinTolerance = Math.abs(offsetCm1) <= toleranceCm1;
  return { ...base, foundCm1: nearest.x, offsetCm1, withinTolerance, status: withinTolerance ? 'pass' : 'out-of-tolerance' };
}

function passReason(inRange: readonly BandCheck[]): string {
  const worst = [...inRange].sort((a, b) => Math.abs(b.offsetCm1!) - Math.abs(a.offsetCm1!))[0];
  return `all ${inRange.length} bands in range within tolerance (largest offset ${signed(worst.offsetCm1!)} cm⁻¹ at ${worst.expectedCm1})`;
}

function signed(v: number): string {
  return `${v >= 0 ? '+' : '−'}${Math.abs(v).toFixed(2)}`;
}
