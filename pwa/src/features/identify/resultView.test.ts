import { describe, expect, it } from 'vitest';
import { GENERAL_CAUTIONS, identifySpectrum, importSpectrum, type IdentifyResult } from '@siteband/shared';
import { cautionsFor, resultView } from './resultView';
import { fixtureScan } from './testFixtures';

function identify(file: string, technique: 'ir' | 'raman', excitationNm?: number): IdentifyResult {
  const scan = fixtureScan(file);
  const spectrum = importSpectrum(new Uint8Array(scan.bytes), { fileName: file, technique, ...(excitationNm ? { excitationNm } : {}) });
  return identifySpectrum(spectrum, { process: { technique, phase: 'condensed' } }).result;
}

const ethanolScan = identify('synthetic-ir-ethanol-liquid.csv', 'ir');
const nitrateScan = identify('synthetic-raman-ammonium-nitrate-785.csv', 'raman', 785);

describe('resultView', () => {
  it('gives every hazardous candidate its caution card, and lists the cards for acknowledgement', () => {
    for (const result of [ethanolScan, nitrateScan]) {
      const view = resultView(result);
      if (view.status !== 'ranked') throw new Error('expected a ranking');
      const hazardous = result.candidates.filter((c) => c.hazards.some((h) => h.hazardous));
      expect(hazardous.length).toBeGreaterThan(0);
      for (const c of hazardous) {
        const shown = view.candidates.find((v) => v.candidate.id === c.id)!;
        expect(shown.hazardous).toBe(true);
        expect(shown.cautionCard?.compoundId).toBe(c.id);
        expect(view.cautionCards).toContain(shown.cautionCard);
      }
    }
  });

  it('always shows the general cautions, even if a result arrived without them', () => {
    const stripped: IdentifyResult = { ...ethanolScan, cautions: [] };
    expect(cautionsFor(stripped)).toEqual([...GENERAL_CAUTIONS]);
    const view = resultView(nitrateScan);
    for (const caution of GENERAL_CAUTIONS) expect(view.cautions).toContain(caution);
    // The Raman result's own cautions (the laser) are kept too, each once.
    expect(view.cautions.some((c) => /Raman lasers/.test(c))).toBe(true);
    expect(new Set(view.cautions).size).toBe(view.cautions.length);
  });

  it('shows no ranking at all for an unreliable scan, only the reasons', () => {
    const unreliable: IdentifyResult = { ...ethanolScan, reliable: false, reasons: ['signal-to-noise 3 is below 10'] };
    const view = resultView(unreliable);
    expect(view).toMatchObject({ status: 'no-reliable-result', reasons: ['signal-to-noise 3 is below 10'] });
    expect('candidates' in view).toBe(false);
  });

  it('carries the escalation and the expected bands of each candidate for the plot overlay', () => {
    const view = resultView(nitrateScan);
    if (view.status !== 'ranked') throw new Error('expected a ranking');
    expect(view.escalation.required).toBe(true);
    const top = view.candidates[0]!;
    expect(top.candidate.name).toBe('Ammonium nitrate');
    expect(top.expectedCm1).toEqual([...top.expectedCm1].sort((a, b) => a - b));
    expect(top.expectedCm1).toContain(top.candidate.explained[0]!.expectedCm1);
  });
});
