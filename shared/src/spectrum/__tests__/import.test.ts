import { fromJSON } from 'convert-to-jcamp';
import { describe, expect, it } from 'vitest';
import { importJcampAll, importSpectrum } from '../import.js';
import { SpectrumImportError, type SpectrumImportErrorCode } from '../import-error.js';
import { fixtureBytes, fixtureText } from './fixtures.js';

function expectImportError(run: () => unknown, code: SpectrumImportErrorCode, message?: RegExp): SpectrumImportError {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(SpectrumImportError);
    const e = error as SpectrumImportError;
    expect(e.code).toBe(code);
    if (message) expect(e.message).toMatch(message);
    return e;
  }
  throw new Error(`expected a SpectrumImportError with code ${code}`);
}

const rows = (n: number, f: (i: number) => string) => Array.from({ length: n }, (_, i) => f(i)).join('\n');

describe('delimited text', () => {
  it('reads a %T file with a descending axis into ascending transmittance fractions', () => {
    const s = importSpectrum(fixtureText('spectra/synthetic-ir-percent-t.csv'));
    expect(s.technique).toBe('ir');
    expect(s.ordinate).toBe('transmittance');
    expect(s.xCm1[0]).toBe(600);
    expect(s.xCm1[s.xCm1.length - 1]).toBe(4000);
    expect(Math.max(...s.y)).toBeLessThanOrEqual(1);
    expect(s.meta?.['y column']).toBe('%T');
  });

  it('reads semicolons with decimal commas and a Raman shift header', () => {
    const s = importSpectrum(fixtureBytes('spectra/synthetic-raman-semicolon.csv'));
    expect(s.technique).toBe('raman');
    expect(s.ordinate).toBe('intensity');
    expect(s.xCm1.length).toBe(3001);
    expect(s.xCm1[1]).toBe(201);
    expect(s.y[0]).toBeCloseTo(820.08, 10);
  });

  it('reads a headerless whitespace-separated file as cm⁻¹ against absorbance and says so', () => {
    const s = importSpectrum(fixtureText('spectra/synthetic-ir-headerless.txt'));
    expect(s.ordinate).toBe('absorbance');
    expect(s.xCm1.length).toBe(851);
    expect(s.meta?.['units']).toMatch(/assumed/);
  });

  it('reads tab-separated wavelength files in nm and µm as wavenumbers', () => {
    const nm = importSpectrum(`Wavelength (nm)\tAbsorbance\n${rows(20, (i) => `${2500 + i * 100}\t0.${i}`)}`);
    expect(nm.xCm1[nm.xCm1.length - 1]).toBeCloseTo(4000, 9);
    expect(nm.xCm1[0]).toBeCloseTo(1e7 / 4400, 9);
    const um = importSpectrum(`Wavelength (µm),Absorbance\n${rows(20, (i) => `${2.5 + i * 0.5},0.1`)}`);
    expect(um.xCm1[um.xCm1.length - 1]).toBeCloseTo(4000, 9);
  });

  it('computes Raman shifts from scattered wavelengths given the excitation', () => {
    const text = `Wavelength (nm),Counts\n${rows(20, (i) => `${800 + i},${100 + i}`)}`;
    const s = importSpectrum(text, { technique: 'raman', excitationNm: 785 });
    expect(s.xCm1[0]).toBeCloseTo(1e7 / 785 - 1e7 / 800, 9);
    expect(s.excitationNm).toBe(785);
    expectImportError(() => importSpectrum(text, { technique: 'raman' }), 'missing-excitation', /excitation wavelength/);
  });

  it('computes Raman shifts from absolute wavenumbers of the scattered light', () => {
    const text = `Absolute wavenumber (cm-1),Counts\n${rows(20, (i) => `${11700 + i * 10},${100 + i}`)}`;
    const s = importSpectrum(text, { technique: 'raman', excitationNm: 785 });
    // Stokes light at lower absolute wavenumber has the larger shift, so the order flips.
    expect(s.xCm1[0]).toBeCloseTo(1e7 / 785 - 11890, 9);
    expect(s.xCm1[19]).toBeCloseTo(1e7 / 785 - 11700, 9);
    expect(s.y[19]).toBe(100);
  });

  it('names the line and column of a bad number', () => {
    const text = `Wavenumber (cm-1),Absorbance\n${rows(20, (i) => `${1000 + i},0.1`)}\n1020,abc\n`;
    const e = expectImportError(() => importSpectrum(text), 'not-numeric', /abc/);
    expect(e.line).toBe(22);
    expect(e.field).toBe('Absorbance');
  });

  it.each([
    ['NaN', 'non-finite'],
    ['Infinity', 'non-finite'],
  ] as const)('refuses %s values', (word, code) => {
    const text = `cm-1,Absorbance\n${rows(20, (i) => `${1000 + i},${i === 7 ? word : '0.1'}`)}`;
    expectImportError(() => importSpectrum(text), code);
  });

  it('refuses empty, short, duplicated, unknown-unit and implausible files', () => {
    expectImportError(() => importSpectrum('  \n '), 'empty');
    expectImportError(() => importSpectrum(`cm-1,A\n${rows(5, (i) => `${1000 + i},0.1`)}`), 'too-few-points', /5 points/);
    expectImportError(() => importSpectrum(`cm-1,A\n${rows(20, (i) => `${1000 + (i % 10)},0.1`)}`), 'duplicate-x');
    expectImportError(() => importSpectrum(`Time (s),Absorbance\n${rows(20, (i) => `${i},0.1`)}`), 'unknown-units', /x units/);
    expectImportError(() => importSpectrum(`cm-1,Reflectance\n${rows(20, (i) => `${1000 + i},0.1`)}`), 'unknown-units', /y units/);
    expectImportError(() => importSpectrum(`cm-1,Absorbance\n${rows(20, (i) => `${90000 + i},0.1`)}`), 'implausible-axis');
    expectImportError(() => importSpectrum('hello world\nno numbers here'), 'not-numeric');
  });

  it('sorts a shuffled axis rather than refusing it', () => {
    const order = [5, 3, 9, 0, 1, 8, 2, 7, 6, 4, 15, 12, 11, 10, 14, 13, 19, 16, 17, 18];
    const s = importSpectrum(`cm-1,Absorbance\n${order.map((i) => `${1000 + i},${i / 100}`).join('\n')}`);
    s.xCm1.forEach((x, i) => {
      expect(x).toBe(1000 + i);
      expect(s.y[i]).toBeCloseTo(i / 100, 12);
    });
  });

  it('refuses files of the wrong technique', () => {
    const raman = fixtureText('spectra/synthetic-raman-semicolon.csv');
    expectImportError(() => importSpectrum(raman, { technique: 'ir' }), 'technique-mismatch', /Raman shift/);
    const ir = fixtureText('spectra/synthetic-ir-percent-t.csv');
    expectImportError(() => importSpectrum(ir, { technique: 'raman' }), 'technique-mismatch', /IR file/);
  });

  it('refuses inputs above the size limit, the default or the one given', () => {
    const text = fixtureText('spectra/synthetic-ir-headerless.txt');
    expectImportError(() => importSpectrum(text, { maxBytes: 1000 }), 'too-large', /limit is/);
    expectImportError(() => importSpectrum(new Uint8Array(21 * 1024 * 1024)), 'too-large');
    expectImportError(() => importSpectrum(new Uint8Array([1, 0, 2, 0, 3])), 'unrecognised-format', /binary/);
  });
});

describe('JCAMP-DX', () => {
  const x = Array.from({ length: 64 }, (_, i) => 4000 - i * 50);
  const y = x.map((v) => 0.05 + 0.9 * Math.exp(-(((v - 2500) / 120) ** 2)));
  const info = { title: 'synthetic (invented)', dataType: 'INFRARED SPECTRUM', xUnits: '1/CM', yUnits: 'ABSORBANCE' };

  it.each(['DIF', 'SQZ', 'DIFDUP', 'PAC', 'FIX', ''] as const)('reads XYDATA written with %s encoding (or a PEAK TABLE)', (xyEncoding) => {
    const s = importSpectrum(fromJSON({ x, y }, { info, xyEncoding }));
    expect(s.technique).toBe('ir');
    expect(s.ordinate).toBe('absorbance');
    expect(s.xCm1.length).toBe(64);
    expect(s.xCm1[0]).toBe(850);
    const top = s.y.reduce((best, v, i) => (v > s.y[best] ? i : best), 0);
    expect(s.xCm1[top]).toBe(2500);
    expect(s.y[top]).toBeCloseTo(0.95, 6);
    expect(s.meta?.['form']).toBe(xyEncoding === '' ? 'peak-table' : 'xydata');
  });

  it('lists every block of a LINK file and picks the block of the technique asked for', () => {
    const bytes = fixtureBytes('spectra/synthetic-two-blocks.jdx');
    const all = importJcampAll(bytes);
    expect(all.blocks.map((b) => b.spectrum.technique)).toEqual(['ir', 'raman']);
    expect(all.refused).toEqual([]);
    const raman = importSpectrum(bytes, { technique: 'raman' });
    expect(raman.excitationNm).toBe(785);
    expect(raman.xCm1.length).toBe(1501);
    expect(importSpectrum(bytes).technique).toBe('ir');
    expect(importSpectrum(bytes.buffer as ArrayBuffer, { block: 1 }).technique).toBe('raman');
    expectImportError(() => importSpectrum(bytes, { block: 5 }), 'no-spectrum-block', /block 5/);
  });

  it('refuses a truncated block and a block with corrupted data', () => {
    const text = fromJSON({ x, y }, { info, xyEncoding: 'DIF' });
    expectImportError(() => importSpectrum(text.slice(0, Math.floor(text.length * 0.7))), 'not-numeric', /truncated/);
    expectImportError(() => importSpectrum(text.slice(0, text.indexOf('##XYDATA'))), 'no-spectrum-block');
    const lines = text.split('\n');
    const dataLine = lines.findIndex((l) => l.startsWith('##XYDATA')) + 2;
    lines.splice(dataLine, 1);
    expectImportError(() => importSpectrum(lines.join('\n')), 'not-numeric', /declares 64 points/);
  });

  it('keeps the good block of a LINK file when the other is corrupted, and says why it refused that one', () => {
    const text = fixtureText('spectra/synthetic-two-blocks.jdx');
    const lines = text.split('\n');
    const ramanData = lines.findIndex((l, i) => i > lines.indexOf('##DATA TYPE=RAMAN SPECTRUM') && l.startsWith('##XYDATA')) + 3;
    lines.splice(ramanData, 2);
    const all = importJcampAll(lines.join('\n'));
    expect(all.blocks.map((b) => b.index)).toEqual([0]);
    expect(all.refused.map((r) => [r.index, r.error.code])).toEqual([[1, 'not-numeric']]);
    expectImportError(() => importSpectrum(lines.join('\n'), { technique: 'raman' }), 'technique-mismatch', /no Raman block/);
    expectImportError(() => importSpectrum(lines.join('\n'), { block: 1 }), 'not-numeric', /declares 1501 points/);
  });

  it('refuses a tiny file whose DUP counts would expand to millions of points, before decoding it', () => {
    const text = fromJSON({ x, y }, { info, xyEncoding: 'DIFDUP' }).replace(/##XYDATA=\(X\+\+\(Y\.\.Y\)\)\n(\S+)/, '##XYDATA=(X++(Y..Y))\n850@J1S99999999');
    const e = expectImportError(() => importSpectrum(text), 'too-large', /DUP/);
    expect(e.line).toBeGreaterThan(10);
  });

  it('refuses unknown JCAMP-DX units with the label named', () => {
    const text = fromJSON({ x, y }, { info: { ...info, yUnits: 'KUBELKA-MUNK' }, xyEncoding: 'DIF' });
    const e = expectImportError(() => importSpectrum(text), 'unknown-units');
    expect(e.field).toBe('YUNITS');
  });
});
