import { describe, expect, it } from 'vitest';
import { DEFAULT_PROCESSING, DEFAULT_SCAN_SETTINGS, toProcessOptions, validateScanSettings } from './scanSettings';

describe('scan settings', () => {
  it('passes only the parameters the inspector changed, and ATR only for IR', () => {
    expect(toProcessOptions(DEFAULT_SCAN_SETTINGS, DEFAULT_PROCESSING)).toEqual({ technique: 'ir', phase: 'condensed', atr: true });
    expect(toProcessOptions({ ...DEFAULT_SCAN_SETTINGS, technique: 'raman' }, { ...DEFAULT_PROCESSING, smoothingWindow: 11 })).toEqual({
      technique: 'raman',
      phase: 'condensed',
      atr: false,
      smoothing: { windowSize: 11 },
    });
  });

  it('refuses each unusable value with a message naming it', () => {
    const raman = { ...DEFAULT_SCAN_SETTINGS, technique: 'raman' as const };
    expect(() => validateScanSettings({ ...raman, excitationNm: 50 }, DEFAULT_PROCESSING)).toThrow(/excitation wavelength/);
    expect(() => validateScanSettings(DEFAULT_SCAN_SETTINGS, { ...DEFAULT_PROCESSING, smoothingWindow: 8 })).toThrow(/smoothing window/);
    expect(() => validateScanSettings(DEFAULT_SCAN_SETTINGS, { ...DEFAULT_PROCESSING, baselineLambda: -1 })).toThrow(/baseline stiffness/);
    expect(() => validateScanSettings(DEFAULT_SCAN_SETTINGS, { ...DEFAULT_PROCESSING, peakThresholdSigma: 0 })).toThrow(/peak threshold/);
    expect(() => validateScanSettings({ ...raman, excitationNm: 1064 }, { baselineLambda: 1e5, smoothingWindow: 9, peakThresholdSigma: 4 })).not.toThrow();
  });
});
