import 'reflect-metadata';
import { SampleDataDto } from '../samples/dto/sample-data.dto';
import { MAX_SCAN_JSON_CHARS, ScanDataDto } from '../scans/dto/scan-data.dto';
import { createValidationPipe } from '../common/validation';
import { ChangeEnvelopeDto } from './dto/change-envelope.dto';
import { PushRequestDto } from './dto/push-request.dto';
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

  it('takes free-form JSON as sent, and still checks it', () => {
    const scan = { sampleId: sample.caseId, technique: 'ir', phase: 'condensed', recordedAt: '2026-11-30T08:55:00.000Z' };
    const result = { codeVersion: '1', libraryVersion: 'a', parameters: { windowCm1: 8 }, candidates: [{ id: 'c1', bands: [[1, 2]] }] };
    const validated = validateData(ScanDataDto, { ...scan, result });
    expect(validated.ok && validated.value.result).toBe(result);
    expect(validateData(ScanDataDto, { ...scan, parsedSummary: { note: 'x'.repeat(MAX_SCAN_JSON_CHARS) } })).toEqual({
      ok: false,
      problems: `parsedSummary must serialise to at most ${MAX_SCAN_JSON_CHARS} characters of JSON`,
    });
  });

  it('hands a change its data as sent, checked as an object, and none when none was sent', () => {
    const change = { changeId: '0b5a7c1e-4d3f-4e2a-9b8c-1d2e3f4a5b6c', entity: 'note', op: 'upsert', id: sample.caseId, baseVersion: null };
    const data = { caseId: sample.caseId, text: 'Drum 4 leaking', observations: [{ at: 'gate' }] };
    const upsert = validateData(ChangeEnvelopeDto, { ...change, data });
    expect(upsert.ok && upsert.value.data).toBe(data);
    expect(validateData(ChangeEnvelopeDto, { ...change, data: 'text' })).toEqual({ ok: false, problems: 'data must be an object' });
    const remove = validateData(ChangeEnvelopeDto, { ...change, op: 'delete', baseVersion: 2 });
    expect(remove.ok && remove.value.data).toBeUndefined();
  });

  it('lets the global pipe hand a batch its changes as sent, and still check them', async () => {
    const pipe = createValidationPipe();
    const body = { clientId: 'tablet-1', batchId: '0b5a7c1e-4d3f-4e2a-9b8c-1d2e3f4a5b6c', changes: [{ changeId: 'x', data: { result: { peaks: [1, 2] } } }] };
    const batch = (await pipe.transform(body, { type: 'body', metatype: PushRequestDto })) as PushRequestDto;
    expect(batch).toBeInstanceOf(PushRequestDto);
    expect(batch.changes).toBe(body.changes);
    await expect(pipe.transform({ ...body, changes: ['x'] }, { type: 'body', metatype: PushRequestDto })).rejects.toThrow('each value in changes must be an object');
  });
});
