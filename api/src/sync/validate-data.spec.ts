import 'reflect-metadata';
import { SampleDataDto } from '../samples/dto/sample-data.dto';
import { ScanDataDto } from '../scans/dto/scan-data.dto';
import { validateData } from './validate-data';

const sample = {
  caseId: '6f1c2c55-8f0a-4a43-9d0e-3c4d7b9a1e20',
  label: 'S-01',
  observations: { colour: 'white', state: 'powder' },
  collectedBy: 'R. Ashdown',
  collectedAt: '2026-11-30T08:40:00.000Z',
};

describe('validateData', () => {
  it('returns an instance of the class for valid data', () => {
    const result = validateData(SampleDataDto, sample);
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.value).toBeInstanceOf(SampleDataDto);
  });

  it('lists every problem in one sentence, with the path of nested fields', () => {
    const result = validateData(SampleDataDto, { ...sample, label: 7, collectedAt: 'yesterday', observations: { odour: 'sharp', state: 'plasma' }, colour: 'x' });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.problems.split('; ').sort()).toEqual(
      [
        'property colour should not exist',
        'label must be a string',
        'label must be longer than or equal to 1 and shorter than or equal to 120 characters',
        'collectedAt must be a valid ISO 8601 date string',
        'observations.odour: property odour should not exist',
        'observations.state: state must be one of solid, powder, liquid, paste, gas, mixed, unknown',
      ].sort(),
    );
  });

  it('refuses what is not an object', () => {
    for (const value of [null, 'text', [1], undefined]) expect(validateData(SampleDataDto, value)).toEqual({ ok: false, problems: 'must be an object' });
  });

  it('checks a scan result carries what is needed to reproduce it', () => {
    const scan = { sampleId: sample.caseId, technique: 'ir', phase: 'condensed', recordedAt: '2026-11-30T08:55:00.000Z' };
    expect(validateData(ScanDataDto, { ...scan, result: { codeVersion: '1', libraryVersion: 'a', parameters: {} } }).ok).toBe(true);
    expect(validateData(ScanDataDto, { ...scan, result: { libraryVersion: 'a', parameters: {} } })).toEqual({
      ok: false,
      problems: 'result needs codeVersion (the shared code version that computed it)',
    });
    expect(validateData(ScanDataDto, { ...scan, result: { codeVersion: '1', libraryVersion: 'a', parameters: [] } })).toEqual({
      ok: false,
      problems: 'result needs parameters (the processing parameters, as an object)',
    });
  });
});
