import { importSpectrum, processScan, type ProcessOptions } from '@siteband/shared';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { recomputeRequest } from './recompute-request';

const FILE = 'synthetic-ir-ethanol-liquid.csv';
const scan = importSpectrum(new Uint8Array(readFileSync(join(__dirname, '..', '..', '..', 'fixtures', 'spectra', FILE))), { fileName: FILE, technique: 'ir' });
/** A processing record as a tablet stores it, from the shared pipeline (JSON of sync). */
const recorded = (options: Partial<ProcessOptions> = {}): Record<string, any> =>
  JSON.parse(JSON.stringify(processScan(scan, { technique: 'ir', phase: 'condensed', ...options }).parameters));

describe('recomputeRequest', () => {
  const ir = { technique: 'ir' as const, phase: 'condensed' as const, excitationNm: null };

  it('runs every setting the tablet recorded, and a hand-set match window', () => {
    const processing = recorded({ atr: true, baseline: { method: 'airpls' }, smoothing: { windowSize: 15 }, peaks: { thresholdSigma: 3 } });
    const request = recomputeRequest({ ...ir, result: { processing, parameters: { toleranceCm1: 7, toleranceFrom: 'input' } } });
    expect(request).toMatchObject({ parametersFrom: 'tablet', cannotReproduce: null, run: { toleranceCm1: 7 } });
    expect(request.run?.process).toMatchObject({
      technique: 'ir',
      phase: 'condensed',
      atr: { referenceCm1: 1000 },
      gridStepCm1: processing.gridStepCm1,
      baseline: { method: 'airpls', lambda: processing.baseline.lambda },
      smoothing: { windowSize: 15 },
      peaks: { thresholdSigma: 3 },
    });
  });

  it('leaves a match window from the phase default to the server, so it follows the same rule', () => {
    const request = recomputeRequest({ ...ir, result: { processing: recorded(), parameters: { toleranceCm1: 10, toleranceFrom: 'phase default' } } });
    expect(request.run).not.toHaveProperty('toleranceCm1');
  });

  it('passes a Raman scan’s laser line', () => {
    const request = recomputeRequest({ technique: 'raman', phase: 'gas', excitationNm: 785, result: null });
    expect(request.run).toEqual({ process: { technique: 'raman', phase: 'gas' }, excitationNm: 785 });
  });

  it('uses the defaults, and says so, when the tablet recorded no processing', () => {
    expect(recomputeRequest({ ...ir, result: { parameters: {} } }).parametersFrom).toBe('defaults');
    expect(recomputeRequest({ ...ir, result: null })).toEqual({ run: { process: { technique: 'ir', phase: 'condensed' } }, parametersFrom: 'defaults', cannotReproduce: null });
  });

  it('cannot reproduce a malformed or unknown setting, and says which, instead of using a default', () => {
    const unknown = { ...recorded(), resampling: 'spline' };
    expect(recomputeRequest({ ...ir, result: { processing: unknown } })).toEqual({ run: null, parametersFrom: 'tablet', cannotReproduce: 'recorded processing: unknown setting resampling' });
    const bad = recorded();
    bad.smoothing.windowSize = 'wide';
    expect(recomputeRequest({ ...ir, result: { processing: bad } }).cannotReproduce).toBe('recorded processing: smoothing.windowSize must be an odd whole number from 5 to 51, got "wide"');
    expect(recomputeRequest({ ...ir, result: { processing: 'defaults' } }).cannotReproduce).toBe('recorded processing: processing must be an object, got "defaults"');
  });

  it('cannot reproduce processing recorded for another technique or phase, or a malformed match window', () => {
    expect(recomputeRequest({ ...ir, phase: 'gas', result: { processing: recorded() } }).cannotReproduce).toBe(
      'the processing was recorded for technique ir, phase condensed, but the scan is technique ir, phase gas',
    );
    expect(recomputeRequest({ ...ir, result: { processing: recorded(), parameters: { toleranceFrom: 'input', toleranceCm1: 500 } } }).cannotReproduce).toBe(
      'the hand-set match window parameters.toleranceCm1 must be a number above 0 and at most 50 cm⁻¹, got 500',
    );
  });
});
