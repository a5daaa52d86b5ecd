import { DEFAULT_ATR } from './atr.js';
import type { ProcessOptions } from './process-options.js';

/**
 * A recorded processing record (a scan's `processing`, the pipeline's ProcessParameters after a JSON
 * round trip) that cannot be turned back into the settings that produced it: malformed, incomplete,
 * holding an unknown setting or a value outside its bounds. The message names the setting.
 */
export class ProcessingRecordError extends RangeError {
  constructor(message: string) {
    super(message);
    this.name = 'ProcessingRecordError';
  }
}

/**
 * Bounds a recorded setting must keep to be reproduced. They are wider than any sensible tuning and
 * exist so that a record from elsewhere cannot make the pipeline run without end (an engineering
 * choice; the pipeline's own checks still apply).
 */
export const RECORDED_PROCESSING_BOUNDS = {
  gridStepCm1: { min: 1e-3, max: 100 },
  pointCount: { min: 1, max: 200_000 },
  atrReferenceCm1: { min: 1, max: 10_000 },
  spikeThreshold: { min: 0, max: 1_000 },
  spikeMaxWidthPoints: { min: 1, max: 50 },
  saturationMinRunPoints: { min: 1, max: 10_000 },
  /** Baseline stiffness at a 1 cm⁻¹ grid, arPLS and airPLS. */
  baselineLambda: { min: 1e-3, max: 1e15 },
  baselineMaxIterations: { min: 1, max: 1_000 },
  baselineMaxPoints: { min: 16, max: 200_000 },
  /** Savitzky–Golay windows, in points (odd): smoothing and the peak picker's derivative. */
  windowPoints: { min: 5, max: 51 },
  polynomialOrder: { min: 1, max: 10 },
  /** Peak threshold, as a multiple of the noise σ. */
  thresholdSigma: { min: 0, max: 100 },
  widthCm1: { min: 0, max: 1_000 },
  snr: { min: 0, max: 1e6 },
  minPeaks: { min: 0, max: 1_000 },
} as const;

type Bound = { readonly min: number; readonly max: number };
type Json = Record<string, unknown>;

/** Reads one record with exactly the expected keys; every read names its path in errors. */
class Reader {
  private readonly seen = new Set<string>();

  constructor(
    private readonly record: Json,
    private readonly path: string,
  ) {}

  static of(value: unknown, path: string): Reader {
    if (value === null || typeof value !== 'object' || Array.isArray(value)) throw new ProcessingRecordError(`${path || 'processing'} must be an object, got ${describe(value)}`);
    return new Reader(value as Json, path);
  }

  private take(key: string): unknown {
    this.seen.add(key);
    if (!Object.prototype.hasOwnProperty.call(this.record, key)) throw new ProcessingRecordError(`${this.name(key)} is missing`);
    return this.record[key];
  }

  name(key: string): string {
    return this.path ? `${this.path}.${key}` : key;
  }

  child(key: string): Reader {
    return Reader.of(this.take(key), this.name(key));
  }

  /** A finite number in [min, max]; `above` makes the lower end exclusive. */
  number(key: string, bound: Bound, above = false): number {
    const value = this.take(key);
    const ok = typeof value === 'number' && Number.isFinite(value) && (above ? value > bound.min : value >= bound.min) && value <= bound.max;
    if (!ok) throw new ProcessingRecordError(`${this.name(key)} must be a number ${above ? 'above' : 'from'} ${bound.min} ${above ? 'and at most' : 'to'} ${bound.max}, got ${describe(value)}`);
    return value;
  }

  integer(key: string, bound: Bound, odd = false): number {
    const value = this.take(key);
    const ok = typeof value === 'number' && Number.isInteger(value) && value >= bound.min && value <= bound.max && (!odd || value % 2 === 1);
    if (!ok) throw new ProcessingRecordError(`${this.name(key)} must be ${odd ? 'an odd' : 'a'} whole number from ${bound.min} to ${bound.max}, got ${describe(value)}`);
    return value;
  }

  boolean(key: string): boolean {
    const value = this.take(key);
    if (typeof value !== 'boolean') throw new ProcessingRecordError(`${this.name(key)} must be true or false, got ${describe(value)}`);
    return value;
  }

  oneOf<T extends string>(key: string, allowed: readonly T[]): T {
    const value = this.take(key);
    if (!allowed.includes(value as T)) throw new ProcessingRecordError(`${this.name(key)} must be one of ${allowed.join(', ')}, got ${describe(value)}`);
    return value as T;
  }

  /** A [from, to] wavenumber window with from < to, or null. */
  windowOrNull(key: string): readonly [number, number] | null {
    const value = this.take(key);
    if (value === null) return null;
    const ok = Array.isArray(value) && value.length === 2 && value.every((v) => typeof v === 'number' && Number.isFinite(v) && v >= 0) && value[0] < value[1];
    if (!ok) throw new ProcessingRecordError(`${this.name(key)} must be null or [from, to] in cm⁻¹ with from < to, got ${describe(value)}`);
    return [value[0], value[1]];
  }

  /** Refuses any key that was not read: a setting this code does not know cannot be reproduced. */
  done(): void {
    const unknown = Object.keys(this.record).filter((k) => !this.seen.has(k));
    if (unknown.length > 0) throw new ProcessingRecordError(`unknown setting${unknown.length > 1 ? 's' : ''} ${unknown.map((k) => this.name(k)).join(', ')}`);
  }
}

function describe(value: unknown): string {
  if (value === undefined) return 'nothing';
  const text = JSON.stringify(value) ?? String(value);
  return text.length > 40 ? `${text.slice(0, 40)}…` : text;
}

const B = RECORDED_PROCESSING_BOUNDS;
const UNIT: Bound = { min: 0, max: 1 };

/**
 * The pipeline options that reproduce a recorded processing record: processScan run with them on the
 * same scan records the same parameters again. Every setting must be present, known and within
 * RECORDED_PROCESSING_BOUNDS; otherwise a ProcessingRecordError names the first one that is not,
 * and nothing falls back to a default. The outcomes in the record (pointCount, baseline.iterations,
 * peaks.noiseSigma, peaks.threshold) are checked for shape only: they are compared, not applied.
 */
export function processOptionsFromRecord(record: unknown): ProcessOptions {
  const root = Reader.of(record, '');
  const technique = root.oneOf('technique', ['ir', 'raman'] as const);
  const phase = root.oneOf('phase', ['condensed', 'gas'] as const);
  const gridStepCm1 = root.number('gridStepCm1', B.gridStepCm1);
  root.integer('pointCount', B.pointCount);
  const transmittanceFloor = root.number('transmittanceFloor', UNIT, true);
  if (transmittanceFloor >= 1) throw new ProcessingRecordError(`transmittanceFloor must be below 1, got ${transmittanceFloor}`);

  const atr = root.child('atr');
  const atrEnabled = atr.boolean('enabled');
  const referenceCm1 = atr.number('referenceCm1', B.atrReferenceCm1);
  atr.done();
  if (atrEnabled && technique !== 'ir') throw new ProcessingRecordError('atr.enabled applies to IR scans only');
  if (!atrEnabled && referenceCm1 !== DEFAULT_ATR.referenceCm1) throw new ProcessingRecordError(`atr.referenceCm1 ${referenceCm1} was recorded without ATR: it cannot have been used`);

  const spikesRecord = root.child('spikes');
  const spikesEnabled = spikesRecord.boolean('enabled');
  const spikes = { threshold: spikesRecord.number('threshold', B.spikeThreshold, true), maxWidthPoints: spikesRecord.integer('maxWidthPoints', B.spikeMaxWidthPoints) };
  spikesRecord.done();
  if (spikesEnabled !== (technique === 'raman')) throw new ProcessingRecordError(`spikes.enabled must be ${technique === 'raman'} for ${technique === 'raman' ? 'a Raman' : 'an IR'} scan (cosmic-ray removal runs on Raman scans only)`);

  const saturationRecord = root.child('saturation');
  const saturation = {
    minRunPoints: saturationRecord.integer('minRunPoints', B.saturationMinRunPoints),
    relativeTolerance: saturationRecord.number('relativeTolerance', UNIT),
  };
  saturationRecord.done();

  const baselineRecord = root.child('baseline');
  const baseline = {
    method: baselineRecord.oneOf('method', ['arpls', 'airpls'] as const),
    lambda: baselineRecord.number('lambda', B.baselineLambda),
    maxIterations: baselineRecord.integer('maxIterations', B.baselineMaxIterations),
    tolerance: baselineRecord.number('tolerance', UNIT, true),
    maxPoints: baselineRecord.integer('maxPoints', B.baselineMaxPoints),
    broadBandWindowCm1: baselineRecord.windowOrNull('broadBandWindowCm1'),
    broadBandLambda: baselineRecord.number('broadBandLambda', B.baselineLambda),
  };
  baselineRecord.integer('iterations', { min: 0, max: baseline.maxIterations });
  baselineRecord.done();

  const smoothingRecord = root.child('smoothing');
  const windowSize = smoothingRecord.integer('windowSize', B.windowPoints, true);
  const smoothing = { windowSize, polynomial: smoothingRecord.integer('polynomial', { min: B.polynomialOrder.min, max: Math.min(B.polynomialOrder.max, windowSize - 1) }) };
  smoothingRecord.done();

  const peaksRecord = root.child('peaks');
  const derivativeWindow = peaksRecord.integer('derivativeWindow', B.windowPoints, true);
  const peaks = {
    thresholdSigma: peaksRecord.number('thresholdSigma', B.thresholdSigma, true),
    derivativeWindow,
    derivativePolynomial: peaksRecord.integer('derivativePolynomial', { min: B.polynomialOrder.min, max: Math.min(B.polynomialOrder.max, derivativeWindow - 1) }),
    detection: peaksRecord.oneOf('detection', ['first', 'second'] as const),
  };
  peaksRecord.number('noiseSigma', { min: 0, max: Number.MAX_VALUE });
  peaksRecord.number('threshold', { min: 0, max: Number.MAX_VALUE });
  peaksRecord.done();

  const interferenceRecord = root.child('interference');
  const interference = {
    gasLineMaxWidthCm1: interferenceRecord.number('gasLineMaxWidthCm1', B.widthCm1),
    gasCo2MinRelativeHeight: interferenceRecord.number('gasCo2MinRelativeHeight', UNIT),
    condensedBandMinRelativeHeight: interferenceRecord.number('condensedBandMinRelativeHeight', UNIT),
    condensedBandMinWidthCm1: interferenceRecord.number('condensedBandMinWidthCm1', B.widthCm1),
  };
  interferenceRecord.done();

  const qualityRecord = root.child('quality');
  const quality = {
    minSnr: qualityRecord.number('minSnr', B.snr),
    minPeaks: qualityRecord.integer('minPeaks', B.minPeaks),
    singlePeakMinSnr: qualityRecord.number('singlePeakMinSnr', B.snr),
  };
  qualityRecord.done();
  root.done();

  return {
    technique,
    phase,
    atr: atrEnabled ? { referenceCm1 } : false,
    gridStepCm1,
    transmittanceFloor,
    baseline,
    smoothing,
    peaks,
    // Recorded for IR too (not applied there), so passed back unchanged.
    spikes,
    saturation,
    interference,
    quality,
  };
}
