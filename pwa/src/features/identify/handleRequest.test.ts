import { describe, expect, it } from 'vitest';
import { loadLibrary, type Library } from '@siteband/shared';
import { handleRequest } from './handleRequest';
import { DEFAULT_PROCESSING, DEFAULT_SCAN_SETTINGS } from './scanSettings';
import { fixtureScan, textScan } from './testFixtures';

const ir = { ...DEFAULT_SCAN_SETTINGS, technique: 'ir' as const, atr: false };

describe('handleRequest (the worker side of the protocol)', () => {
  it('answers an identify request with the plot, the quality and the ranked result under the same id', () => {
    const response = handleRequest({ id: 7, kind: 'identify', file: fixtureScan('synthetic-ir-ethanol-liquid.csv'), scan: ir, processing: DEFAULT_PROCESSING });
    expect(response.id).toBe(7);
    if (!response.ok || response.kind !== 'identify') throw new Error(`expected an identify answer, got ${JSON.stringify(response)}`);
    const { plot, processed, result } = response.outcome;
    expect(plot.xCm1).toBeInstanceOf(Float64Array);
    expect(plot.xCm1.length).toBe(plot.y.length);
    expect(plot.peaksCm1.length).toBe(result.peaks.length);
    expect(processed.quality.reliable).toBe(true);
    // The example scan's bands are ethanol's (fixtures/spectra/synthetic-ir-ethanol-liquid.csv).
    expect(result.candidates[0]!.name).toBe('Ethanol');
    expect(result.candidates[0]!.explained.length).toBeGreaterThan(3);
  });

  it('applies the processing parameters it is given', () => {
    const file = fixtureScan('synthetic-ir-ethanol-liquid.csv');
    const strict = handleRequest({ id: 1, kind: 'identify', file, scan: ir, processing: { ...DEFAULT_PROCESSING, peakThresholdSigma: 40 } });
    const loose = handleRequest({ id: 2, kind: 'identify', file, scan: ir, processing: DEFAULT_PROCESSING });
    if (!strict.ok || strict.kind !== 'identify' || !loose.ok || loose.kind !== 'identify') throw new Error('both runs should succeed');
    expect(strict.outcome.processed.parameters.peaks.thresholdSigma).toBe(40);
    expect(strict.outcome.plot.peaksCm1.length).toBeLessThan(loose.outcome.plot.peaksCm1.length);
  });

  it('runs a saved scan again with its recorded processing, tuned settings included', () => {
    const file = fixtureScan('synthetic-ir-ethanol-liquid.csv');
    const tuned = handleRequest({ id: 1, kind: 'identify', file, scan: ir, processing: { baselineLambda: 1e5, smoothingWindow: 15, peakThresholdSigma: 3 } });
    if (!tuned.ok || tuned.kind !== 'identify') throw new Error('the tuned run should succeed');
    const recorded = JSON.parse(JSON.stringify(tuned.outcome.processed.parameters));
    const again = handleRequest({ id: 2, kind: 'identify', file, scan: ir, processing: { recorded } });
    if (!again.ok || again.kind !== 'identify') throw new Error(`the recorded run should succeed, got ${JSON.stringify(again)}`);
    expect(JSON.parse(JSON.stringify(again.outcome.processed.parameters))).toEqual(recorded);
    expect(again.outcome.plot.peaksCm1).toEqual(tuned.outcome.plot.peaksCm1);
    const defaults = handleRequest({ id: 3, kind: 'identify', file, scan: ir, processing: DEFAULT_PROCESSING });
    if (!defaults.ok || defaults.kind !== 'identify') throw new Error('the default run should succeed');
    expect(defaults.outcome.processed.parameters.smoothing.windowSize).not.toBe(15);
  });

  it('refuses a recorded processing it cannot run, naming the setting', () => {
    const file = fixtureScan('synthetic-ir-ethanol-liquid.csv');
    const first = handleRequest({ id: 1, kind: 'identify', file, scan: ir, processing: DEFAULT_PROCESSING });
    if (!first.ok || first.kind !== 'identify') throw new Error('the first run should succeed');
    const recorded = { ...JSON.parse(JSON.stringify(first.outcome.processed.parameters)), resampling: 'spline' };
    expect(handleRequest({ id: 2, kind: 'identify', file, scan: ir, processing: { recorded } })).toEqual({
      id: 2,
      ok: false,
      error: { code: 'settings', message: 'unknown setting resampling' },
    });
    expect(handleRequest({ id: 3, kind: 'identify', file, scan: { ...ir, phase: 'gas' }, processing: { recorded: first.outcome.processed.parameters } })).toMatchObject({
      ok: false,
      error: { code: 'settings', message: 'The recorded processing is for technique ir, phase condensed, but the scan is technique ir, phase gas' },
    });
  });

  it('answers a malformed file with an import error that says what is wrong', () => {
    const response = handleRequest({ id: 3, kind: 'identify', file: textScan('broken.csv', 'this is not,a spectrum\nat,all\n'), scan: ir, processing: DEFAULT_PROCESSING });
    expect(response).toMatchObject({ id: 3, ok: false, error: { code: 'import' } });
    if (response.ok) throw new Error('expected a failure');
    expect(response.error.message.length).toBeGreaterThan(10);
  });

  it('refuses settings the pipeline cannot use, naming the field', () => {
    const response = handleRequest({
      id: 4,
      kind: 'identify',
      file: fixtureScan('synthetic-raman-semicolon.csv'),
      scan: { ...DEFAULT_SCAN_SETTINGS, technique: 'raman', excitationNm: Number.NaN },
      processing: DEFAULT_PROCESSING,
    });
    expect(response).toMatchObject({ id: 4, ok: false, error: { code: 'settings' } });
    if (response.ok) throw new Error('expected a failure');
    expect(response.error.message).toMatch(/excitation wavelength/);
  });

  it('passes the instrument check on the synthetic polystyrene film and reports every band', () => {
    const response = handleRequest({ id: 5, kind: 'instrument-check', file: fixtureScan('synthetic-ir-polystyrene-film.csv'), standardId: 'ir-polystyrene-ep-ft' });
    if (!response.ok || response.kind !== 'instrument-check') throw new Error(`expected a check, got ${JSON.stringify(response)}`);
    expect(response.check.pass).toBe(true);
    expect(response.check.bands.map((b) => b.status)).toEqual(Array(7).fill('pass'));
    expect(response.plot.peaksCm1).toHaveLength(7);
  });

  it('fails the instrument check on a scan that is not the standard', () => {
    const response = handleRequest({ id: 6, kind: 'instrument-check', file: fixtureScan('synthetic-ir-ethanol-liquid.csv'), standardId: 'ir-polystyrene-ep-ft' });
    if (!response.ok || response.kind !== 'instrument-check') throw new Error('expected a check');
    expect(response.check.pass).toBe(false);
    expect(response.check.reason).toMatch(/not found/);
  });

  it('refuses an unknown standard with a settings error', () => {
    expect(handleRequest({ id: 8, kind: 'instrument-check', file: fixtureScan('synthetic-ir-ethanol-liquid.csv'), standardId: 'nope' })).toMatchObject({
      ok: false,
      error: { code: 'settings' },
    });
  });

  it('ranks against the library in force it is sent: a compound retired there is no longer a candidate', () => {
    const bundled = loadLibrary();
    const file = fixtureScan('synthetic-ir-ethanol-liquid.csv');
    const withoutEthanol: Library = {
      ...bundled,
      version: { ...bundled.version, version: `${bundled.version.version}+edits.test`, contentHash: 'test-without-ethanol' },
      compounds: bundled.compounds.filter((c) => c.id !== 'ethanol'),
    };
    const inForce = handleRequest({ id: 9, kind: 'identify', file, scan: ir, processing: DEFAULT_PROCESSING, library: withoutEthanol });
    const plain = handleRequest({ id: 10, kind: 'identify', file, scan: ir, processing: DEFAULT_PROCESSING });
    if (!inForce.ok || inForce.kind !== 'identify' || !plain.ok || plain.kind !== 'identify') throw new Error('both runs should succeed');
    expect(plain.outcome.result.candidates[0]!.id).toBe('ethanol');
    expect(inForce.outcome.result.candidates.map((c) => c.id)).not.toContain('ethanol');
    expect(inForce.outcome.result.libraryVersion.contentHash).toBe('test-without-ethanol');
  });
});
