import { describe, expect, it } from 'vitest';
import { importSpectrum } from '../../spectrum/import.js';
import { processOptionsFromRecord } from '../../spectrum/recorded-processing.js';
import { fixtureBytes } from '../../spectrum/__tests__/fixtures.js';
import { identifySpectrum } from '../identify-spectrum.js';
import { scanResultRecord } from '../scan-result-record.js';

const FILE = 'spectra/synthetic-ir-ethanol-liquid.csv';
const scan = importSpectrum(fixtureBytes(FILE), { fileName: FILE, technique: 'ir' });

describe('scanResultRecord', () => {
  const { processed, result } = identifySpectrum(scan, { process: { technique: 'ir', phase: 'condensed', smoothing: { windowSize: 11 } } });
  const record = scanResultRecord(result, processed);

  it('is the identification with quality, processing and the code version, in its JSON form', () => {
    expect(record).toEqual(JSON.parse(JSON.stringify({ ...result, quality: processed.quality, processing: processed.parameters, codeVersion: result.parameters.methodVersion })));
    expect(record.codeVersion).toBe(result.parameters.methodVersion);
    expect(record.libraryVersion).toEqual(result.libraryVersion);
    // Typed arrays and undefined do not survive sync; the record holds none.
    expect(JSON.parse(JSON.stringify(record))).toEqual(record);
  });

  it('records processing that identifies the same scan again to the same record', () => {
    const again = identifySpectrum(scan, { process: processOptionsFromRecord(record.processing) });
    expect(scanResultRecord(again.result, again.processed)).toEqual(record);
  });
});
