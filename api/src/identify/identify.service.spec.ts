import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { BadRequestException, PayloadTooLargeException } from '@nestjs/common';
import { DEFAULT_MAX_IMPORT_BYTES, identifySpectrum, importSpectrum, loadLibrary, type Library } from '@siteband/shared';
import type { LibraryService } from '../library/library.service';
import { mergeLibrary } from '../library/merge-library';
import type { IdentifyRequestDto } from './dto/identify-request.dto';
import { IdentifyService } from './identify.service';

const FIXTURES = join(__dirname, '../../../fixtures/spectra');
const irCsv = readFileSync(join(FIXTURES, 'synthetic-ir-ethanol-liquid.csv'));
const ir = { technique: 'ir', phase: 'condensed' } as IdentifyRequestDto;

/** The service against a fixed library in force (the real merge of the bundled library, no database). */
function serviceWith(library: Library): IdentifyService {
  const current = { library, retired: [] };
  return new IdentifyService({ current: async () => current } as unknown as LibraryService);
}

describe('IdentifyService', () => {
  const bundled = loadLibrary();

  it('answers a file with the command line’s object: the shared result, quality and processing', async () => {
    const answer = await serviceWith(bundled).identifyFile({ originalname: 'synthetic-ir-ethanol-liquid.csv', buffer: irCsv }, ir);
    const { processed, result } = identifySpectrum(importSpectrum(new Uint8Array(irCsv), { fileName: 'synthetic-ir-ethanol-liquid.csv', technique: 'ir' }), {
      process: { technique: 'ir', phase: 'condensed' },
    });
    expect(answer).toEqual(JSON.parse(JSON.stringify({ file: 'synthetic-ir-ethanol-liquid.csv', ...result, quality: processed.quality, processing: processed.parameters })));
    expect(answer.candidates[0]!.id).toBe('ethanol');
  });

  it('ranks against the library in force: a retired compound is no longer a candidate', async () => {
    const ethanol = bundled.compounds.find((c) => c.id === 'ethanol')!;
    const { library } = mergeLibrary(bundled, [
      { compoundId: 'ethanol', version: 1, document: ethanol as unknown as Record<string, unknown>, retired: true, editedAt: new Date() },
    ]);
    const answer = await serviceWith(library).identifyFile({ originalname: 'synthetic-ir-ethanol-liquid.csv', buffer: irCsv }, ir);
    expect(answer.candidates.map((c) => c.id)).not.toContain('ethanol');
    expect(answer.libraryVersion).toEqual(library.version);
    expect(answer.libraryVersion.version).not.toBe(bundled.version.version);
  });

  it('gives the same ranking for the same scan sent as a JSON spectrum with a descending axis', async () => {
    const spectrum = importSpectrum(new Uint8Array(irCsv), { fileName: 'synthetic-ir-ethanol-liquid.csv', technique: 'ir' });
    const service = serviceWith(bundled);
    const fromJson = await service.identifyJsonSpectrum({ xCm1: [...spectrum.xCm1].reverse(), y: [...spectrum.y].reverse(), ordinate: spectrum.ordinate }, ir);
    const fromFile = await service.identifyFile({ originalname: 'synthetic-ir-ethanol-liquid.csv', buffer: irCsv }, ir);
    expect(fromJson.candidates.map((c) => [c.id, c.score])).toEqual(fromFile.candidates.map((c) => [c.id, c.score]));
  });

  it('ranks a peak list, filling relative heights from the tallest peak', async () => {
    const peaks = [1050, 1088, 880, 2973, 2928, 3338].map((x, i) => ({ x, height: 1 - i * 0.1 }));
    const answer = await serviceWith(bundled).identifyPeaks(peaks, ir);
    expect(answer.peaks.find((p) => p.x === 1050)!.relativeHeight).toBe(1);
    expect(answer.peaks.find((p) => p.x === 3338)!.relativeHeight).toBeCloseTo(0.5, 10);
    expect(answer.candidates[0]!.id).toBe('ethanol');
  });

  it('answers 400 with the importer’s message for an unreadable file, and 413 over the size limit', async () => {
    const service = serviceWith(bundled);
    const garbled = Buffer.from('Wavenumber (cm-1),Absorbance\n4000,abc\n3996,0.1\n');
    await expect(service.identifyFile({ originalname: 'bad.csv', buffer: garbled }, ir)).rejects.toBeInstanceOf(BadRequestException);
    await expect(service.identifyFile({ originalname: 'empty.csv', buffer: Buffer.alloc(0) }, ir)).rejects.toThrow('the file is empty');
    const huge = Buffer.alloc(DEFAULT_MAX_IMPORT_BYTES + 1, 0x31);
    await expect(service.identifyFile({ originalname: 'huge.csv', buffer: huge }, ir)).rejects.toBeInstanceOf(PayloadTooLargeException);
  });

  it('answers 400 when the pipeline refuses the scan (an IR file read as Raman intensity)', async () => {
    const service = serviceWith(bundled);
    const raman = { technique: 'raman', phase: 'condensed' } as IdentifyRequestDto;
    await expect(service.identifyJsonSpectrum({ xCm1: Array.from({ length: 40 }, (_, i) => 600 + i * 4), y: Array(40).fill(0.1), ordinate: 'absorbance' }, raman)).rejects.toThrow(
      'a Raman scan must hold intensity, but this one holds absorbance',
    );
  });

  it('refuses options that do not apply to a peak list', async () => {
    await expect(serviceWith(bundled).identifyPeaks([{ x: 1000, height: 1 }], { ...ir, atr: true })).rejects.toThrow('atr and excitationNm apply to a file or a spectrum');
  });
});
