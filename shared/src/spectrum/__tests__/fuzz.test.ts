/**
 * Fuzz test of the importer (and of processing on whatever it accepts): 1,000 seeded mutations
 * of valid files. Each must give a valid Spectrum or a SpectrumImportError, never another
 * error; processing an accepted scan may only refuse it with a RangeError or TypeError.
 */
import { fromJSON } from 'convert-to-jcamp';
import { describe, expect, it } from 'vitest';
import { importSpectrum } from '../import.js';
import { SpectrumImportError } from '../import-error.js';
import { processScan } from '../process-scan.js';
import type { Spectrum, Technique } from '../types.js';
import { fixtureText } from './fixtures.js';
import { seededRandom } from './synthetic.js';

const random = seededRandom(20261201);
const pick = <T>(list: readonly T[]): T => list[Math.floor(random() * list.length)];
const int = (n: number) => Math.floor(random() * n);

function seeds(): { text: string; technique: Technique }[] {
  const x = Array.from({ length: 300 }, (_, i) => 4000 - i * 11);
  const y = x.map((v) => 0.05 + 0.8 / (1 + ((v - 1700) / 10) ** 2) + 0.4 / (1 + ((v - 2950) / 15) ** 2));
  const info = { title: 'synthetic (invented)', dataType: 'INFRARED SPECTRUM', xUnits: '1/CM', yUnits: 'ABSORBANCE' };
  return [
    { text: fixtureText('spectra/synthetic-ir-percent-t.csv'), technique: 'ir' },
    { text: fixtureText('spectra/synthetic-raman-semicolon.csv'), technique: 'raman' },
    { text: fixtureText('spectra/synthetic-ir-headerless.txt'), technique: 'ir' },
    { text: fixtureText('spectra/synthetic-two-blocks.jdx'), technique: 'raman' },
    ...(['DIF', 'SQZ', 'DIFDUP', 'PAC', ''] as const).map((xyEncoding) => ({ text: fromJSON({ x, y }, { info, xyEncoding }), technique: 'ir' as const })),
  ];
}

const GARBAGE = ['\u0000', '\uFFFD', '💥', '##', '\r', ',,,', ';', '\t', 'e', '-', '.', '1e999', '�', '"', '\\'];
const MUTATIONS: ReadonlyArray<(text: string) => string> = [
  (t) => t.slice(0, int(t.length)),
  (t) => {
    const at = int(t.length);
    return t.slice(0, at) + Array.from({ length: 1 + int(20) }, () => pick(GARBAGE)).join('') + t.slice(at);
  },
  (t) => t.replace(/cm-1|1\/CM|Raman Shift/i, pick(['Time (s)', 'furlongs', 'nm', 'µm', ''])),
  (t) => t.replace(/Absorbance|ABSORBANCE|Intensity|%T|ARBITRARY UNITS/, pick(['Counts', 'Reflectance', '%T', 'ABSORBANCE', ''])),
  (t) => {
    const lines = t.split('\n');
    const i = int(lines.length);
    lines[i] = lines[i].replace(/[0-9.]+/, pick(['NaN', 'Infinity', '-Infinity', 'nan', 'inf']));
    return lines.join('\n');
  },
  (t) => t.replace(/##XYDATA=\(X\+\+\(Y\.\.Y\)\)\n[\s\S]*?##END=/, '##XYDATA=(X++(Y..Y))\n##END='),
  (t) => {
    const lines = t.split('\n');
    const i = 3 + int(Math.max(1, lines.length - 4));
    lines.splice(i, 0, lines[i - 1] ?? '', lines[i - 1] ?? '');
    return lines.join('\n');
  },
  (t) => {
    const lines = t.split('\n');
    for (let k = 0; k < 20; k++) {
      const a = int(lines.length);
      const b = int(lines.length);
      [lines[a], lines[b]] = [lines[b], lines[a]];
    }
    return lines.join('\n');
  },
  (t) => t.split('\n').filter(() => random() > 0.5).join('\n'),
  (t) => t.replace(/[0-9]/g, (d) => (random() < 0.02 ? pick(['x', '', '99999999', '-']) : d)),
  (t) => t.replace(/,/g, () => (random() < 0.5 ? '.' : ',')),
  () => '',
  () => Array.from({ length: 200 }, () => String.fromCharCode(int(65536))).join(''),
];

/** Index of the first point breaking the Spectrum contract (finite, strictly ascending), or −1. */
function firstInvalidPoint(s: Spectrum): number {
  if (s.xCm1.length !== s.y.length || s.xCm1.length === 0) return 0;
  for (let i = 0; i < s.xCm1.length; i++) {
    if (!Number.isFinite(s.xCm1[i]) || !Number.isFinite(s.y[i]) || (i > 0 && !(s.xCm1[i] > s.xCm1[i - 1]))) return i;
  }
  return -1;
}

describe('importer fuzz (seeded)', () => {
  it('gives a valid scan or a SpectrumImportError for 1,000 mutated files', { timeout: 240_000 }, () => {
    const bases = seeds();
    const outcomes = { accepted: 0, refused: 0 };
    for (let n = 0; n < 1000; n++) {
      const base = pick(bases);
      let text = base.text;
      for (let k = 1 + int(3); k > 0; k--) text = pick(MUTATIONS)(text);
      const technique = random() < 0.7 ? base.technique : undefined;
      const input = random() < 0.3 ? new TextEncoder().encode(text) : text;
      let spectrum: Spectrum | undefined;
      try {
        spectrum = importSpectrum(input, { ...(technique ? { technique } : {}), ...(random() < 0.2 ? { excitationNm: 785 } : {}) });
      } catch (error) {
        if (!(error instanceof SpectrumImportError)) throw new Error(`mutation ${n} threw ${String(error)}`);
        expect(error.message.length).toBeGreaterThan(10);
        outcomes.refused++;
        continue;
      }
      outcomes.accepted++;
      expect(firstInvalidPoint(spectrum)).toBe(-1);
      if (!spectrum.technique) continue;
      try {
        processScan(spectrum, { technique: spectrum.technique, phase: 'condensed' });
      } catch (error) {
        if (!(error instanceof RangeError || error instanceof TypeError)) throw new Error(`processing mutation ${n} threw ${String(error)}`);
      }
    }
    // Both outcomes must occur, or the mutations are not exercising anything.
    expect(outcomes.accepted).toBeGreaterThan(50);
    expect(outcomes.refused).toBeGreaterThan(200);
  });

  it('refuses 50 MB inputs quickly by size, as text and as bytes', () => {
    const big = fixtureText('spectra/synthetic-ir-headerless.txt').repeat(Math.ceil((50 * 1024 * 1024) / 16000));
    expect(() => importSpectrum(big)).toThrow(SpectrumImportError);
    expect(() => importSpectrum(new Uint8Array(50 * 1024 * 1024))).toThrow(/limit is 20\.0 MB/);
  });
});
