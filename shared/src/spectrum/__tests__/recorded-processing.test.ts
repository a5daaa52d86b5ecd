import { describe, expect, it } from 'vitest';
import { importSpectrum } from '../import.js';
import { processScan } from '../process-scan.js';
import type { ProcessOptions } from '../process-options.js';
import { processOptionsFromRecord, ProcessingRecordError } from '../recorded-processing.js';
import { fixtureBytes } from './fixtures.js';

const IR_FILE = 'spectra/synthetic-ir-ethanol-liquid.csv';
const RAMAN_FILE = 'spectra/synthetic-raman-ammonium-nitrate-785.csv';
const irScan = importSpectrum(fixtureBytes(IR_FILE), { fileName: IR_FILE, technique: 'ir' });
const ramanScan = importSpectrum(fixtureBytes(RAMAN_FILE), { fileName: RAMAN_FILE, technique: 'raman', excitationNm: 785 });

/** The processing record a tablet stores: processScan's parameters after the JSON of sync. */
const recorded = (scan: typeof irScan, options: ProcessOptions): Record<string, any> => JSON.parse(JSON.stringify(processScan(scan, options).parameters));

describe('processOptionsFromRecord: round trip', () => {
  const cases: [string, typeof irScan, ProcessOptions][] = [
    ['IR defaults', irScan, { technique: 'ir', phase: 'condensed' }],
    ['IR on ATR, airPLS baseline, window 15, threshold 3.5', irScan, {
      technique: 'ir',
      phase: 'condensed',
      atr: { referenceCm1: 1200 },
      baseline: { method: 'airpls', lambda: 1e5 },
      smoothing: { windowSize: 15, polynomial: 2 },
      peaks: { thresholdSigma: 3.5, detection: 'first' },
    }],
    ['IR on a coarser grid with tuned interference and quality', irScan, {
      technique: 'ir',
      phase: 'gas',
      gridStepCm1: 3,
      transmittanceFloor: 1e-3,
      interference: { gasLineMaxWidthCm1: 4 },
      quality: { minSnr: 5, minPeaks: 1 },
      saturation: { minRunPoints: 6 },
    }],
    ['Raman defaults', ramanScan, { technique: 'raman', phase: 'condensed' }],
    ['Raman with stiffer baseline, no broad-band window, other spike threshold', ramanScan, {
      technique: 'raman',
      phase: 'condensed',
      baseline: { lambda: 1e5, broadBandWindowCm1: null, maxPoints: 512 },
      spikes: { threshold: 10, maxWidthPoints: 2 },
      smoothing: { windowSize: 7 },
    }],
  ];

  it.each(cases)('%s: processing again with the mapped options records the same parameters and peaks', (_name, scan, options) => {
    const first = processScan(scan, options);
    const record = JSON.parse(JSON.stringify(first.parameters));
    const again = processScan(scan, processOptionsFromRecord(record));
    expect(JSON.parse(JSON.stringify(again.parameters))).toEqual(record);
    expect(again.peaks).toEqual(first.peaks);
    expect(again.quality).toEqual(first.quality);
  });

  it('gives tuned settings back, not the defaults', () => {
    const options = processOptionsFromRecord(recorded(irScan, { technique: 'ir', phase: 'condensed', baseline: { method: 'airpls' }, smoothing: { windowSize: 13 }, peaks: { thresholdSigma: 4 } }));
    expect(options.baseline?.method).toBe('airpls');
    expect(options.smoothing?.windowSize).toBe(13);
    expect(options.peaks?.thresholdSigma).toBe(4);
    // And the tuned run differs from a default one, so the mapping is what makes them agree.
    const tuned = processScan(irScan, options).parameters;
    const defaults = processScan(irScan, { technique: 'ir', phase: 'condensed' }).parameters;
    expect(tuned.smoothing.windowSize).not.toBe(defaults.smoothing.windowSize);
    expect(tuned.peaks.threshold).not.toBe(defaults.peaks.threshold);
  });
});

describe('processOptionsFromRecord: refused records', () => {
  const base = () => recorded(irScan, { technique: 'ir', phase: 'condensed' });
  const refused = (change: (r: Record<string, any>) => void): string => {
    const record = base();
    change(record);
    try {
      processOptionsFromRecord(record);
    } catch (error) {
      expect(error).toBeInstanceOf(ProcessingRecordError);
      return (error as Error).message;
    }
    throw new Error('the record was accepted');
  };

  it('refuses something that is not a record', () => {
    for (const value of [null, 'arpls', 42, [1, 2], undefined]) expect(() => processOptionsFromRecord(value)).toThrow(ProcessingRecordError);
    expect(() => processOptionsFromRecord([])).toThrow('processing must be an object, got []');
  });

  it('refuses unknown settings, at the top and inside a step', () => {
    expect(refused((r) => (r.resample = 'cubic'))).toBe('unknown setting resample');
    expect(refused((r) => (r.baseline.order = 2))).toBe('unknown setting baseline.order');
    expect(refused((r) => ((r.smoothing.mode = 'edge'), (r.smoothing.deriv = 1)))).toBe('unknown settings smoothing.mode, smoothing.deriv');
  });

  it('refuses missing settings instead of using a default', () => {
    expect(refused((r) => delete r.smoothing.windowSize)).toBe('smoothing.windowSize is missing');
    expect(refused((r) => delete r.interference)).toBe('interference is missing');
    expect(refused((r) => (r.quality = null))).toBe('quality must be an object, got null');
  });

  it('refuses values out of bounds or of the wrong kind, naming the setting and the value', () => {
    expect(refused((r) => (r.smoothing.windowSize = 4))).toBe('smoothing.windowSize must be an odd whole number from 5 to 51, got 4');
    expect(refused((r) => (r.smoothing.windowSize = 10_001))).toBe('smoothing.windowSize must be an odd whole number from 5 to 51, got 10001');
    expect(refused((r) => (r.smoothing.polynomial = 9))).toMatch(/^smoothing.polynomial must be a whole number from 1 to \d+, got 9$/);
    expect(refused((r) => (r.peaks.thresholdSigma = 0))).toBe('peaks.thresholdSigma must be a number above 0 and at most 100, got 0');
    expect(refused((r) => (r.peaks.thresholdSigma = '5'))).toBe('peaks.thresholdSigma must be a number above 0 and at most 100, got "5"');
    expect(refused((r) => (r.baseline.method = 'rolling-ball'))).toBe('baseline.method must be one of arpls, airpls, got "rolling-ball"');
    expect(refused((r) => (r.baseline.maxIterations = 1e9))).toBe('baseline.maxIterations must be a whole number from 1 to 1000, got 1000000000');
    expect(refused((r) => (r.baseline.broadBandWindowCm1 = [3800, 2800]))).toBe('baseline.broadBandWindowCm1 must be null or [from, to] in cm⁻¹ with from < to, got [3800,2800]');
    expect(refused((r) => (r.gridStepCm1 = 0))).toBe('gridStepCm1 must be a number from 0.001 to 100, got 0');
    expect(refused((r) => (r.transmittanceFloor = 1))).toBe('transmittanceFloor must be below 1, got 1');
    expect(refused((r) => (r.technique = 'uv'))).toBe('technique must be one of ir, raman, got "uv"');
  });

  it('refuses settings the pipeline cannot have used together', () => {
    expect(refused((r) => (r.spikes.enabled = true))).toBe('spikes.enabled must be false for an IR scan (cosmic-ray removal runs on Raman scans only)');
    expect(refused((r) => (r.atr.referenceCm1 = 1500))).toBe('atr.referenceCm1 1500 was recorded without ATR: it cannot have been used');
    const raman = recorded(ramanScan, { technique: 'raman', phase: 'condensed' });
    raman.atr.enabled = true;
    expect(() => processOptionsFromRecord(raman)).toThrow('atr.enabled applies to IR scans only');
  });
});
