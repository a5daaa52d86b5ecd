import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { DEFAULT_MAX_IMPORT_BYTES, identifySpectrum, importSpectrum, loadLibrary, ROLES, type Role } from '@siteband/shared';
import { DEMO, expectErrorShape, signIn, startTestApp, type TestApp } from './support/test-app';
import { JSON_BODY_LIMIT_BYTES } from '../src/common/body-limit';

const FIXTURES = join(__dirname, '../../fixtures/spectra');
const read = (name: string) => readFileSync(join(FIXTURES, name));
const irExample = read('synthetic-ir-ethanol-liquid.csv');

/** mulberry32: a small seeded PRNG, so every run posts the same mutated files. */
function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

interface Mutant {
  name: string;
  bytes: Buffer;
  fileName: string;
  technique: 'ir' | 'raman';
}

/** Mutated instrument files: truncation, garbage bytes, NaN and text in numbers, wrong units, empty, shuffled, huge. */
function mutants(count: number, seed: number): Mutant[] {
  const random = prng(seed);
  const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)]!;
  const bases = [
    { fileName: 'synthetic-ir-ethanol-liquid.csv', text: irExample.toString('utf8'), technique: 'ir' as const },
    { fileName: 'two-blocks.jdx', text: read('synthetic-two-blocks.jdx').toString('utf8'), technique: 'ir' as const },
    { fileName: 'raman.csv', text: read('synthetic-raman-semicolon.csv').toString('utf8'), technique: 'raman' as const },
    { fileName: 'headerless.txt', text: read('synthetic-ir-headerless.txt').toString('utf8'), technique: 'ir' as const },
  ];
  const mutations: Record<string, (text: string) => string | Buffer> = {
    truncate: (text) => text.slice(0, Math.floor(random() * text.length)),
    garbage: (text) => {
      const bytes = Buffer.from(text);
      for (let k = 0; k < 1 + Math.floor(random() * 40); k++) bytes[Math.floor(random() * bytes.length)] = Math.floor(random() * 256);
      return bytes;
    },
    nan: (text) => text.replace(/-?\d+\.\d+/g, (m) => (random() < 0.05 ? pick(['NaN', 'Infinity', '-', 'abc', '1e999', '']) : m)),
    units: (text) => text.replace(/cm-1|1\/CM|ABSORBANCE|Absorbance|%T|Intensity/g, () => pick(['nm', 'um', 'Hz', 'eV', 'furlongs', 'MICROMETERS', ''])),
    empty: () => pick(['', '\n\n', '   ', '\uFEFF']),
    shuffle: (text) => {
      const lines = text.split('\n');
      for (let k = lines.length - 1; k > 0; k--) {
        const j = Math.floor(random() * (k + 1));
        [lines[k], lines[j]] = [lines[j]!, lines[k]!];
      }
      return lines.join('\n');
    },
    duplicate: (text) => text.split('\n').flatMap((line) => (random() < 0.3 ? [line, line] : [line])).join('\n'),
    scale: (text) => text.replace(/\d+\.\d+/g, (m) => String(Number(m) * pick([1e-9, -1, 1e12, 0]))),
    binary: () => Buffer.from(Array.from({ length: 200 + Math.floor(random() * 2000) }, () => Math.floor(random() * 256))),
    headerOnly: (text) => text.split('\n').slice(0, 3).join('\n'),
  };
  const names = Object.keys(mutations);
  // Two huge files only: each is a 20 MiB upload.
  const huge = (fileName: string): Mutant => ({ name: `huge:${fileName}`, bytes: Buffer.alloc(DEFAULT_MAX_IMPORT_BYTES + 1 + Math.floor(random() * 1000), 0x39), fileName, technique: 'ir' });
  return [huge('synthetic-ir-ethanol-liquid.csv'), huge('two-blocks.jdx')].concat(Array.from({ length: count - 2 }, (_, i) => {
    const base = pick(bases);
    const kind = names[i % names.length]!;
    const out = mutations[kind]!(base.text);
    // A wrong technique now and then: an IR file declared as Raman and the other way round.
    const technique = random() < 0.15 ? (base.technique === 'ir' ? 'raman' : 'ir') : base.technique;
    return { name: `${i}:${kind}:${base.fileName}`, bytes: Buffer.isBuffer(out) ? out : Buffer.from(out), fileName: base.fileName, technique };
  }));
}

describe('Identification (e2e, MariaDB)', () => {
  let t: TestApp;
  const tokens = {} as Record<Role, string>;
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });
  const upload = (role: Role, bytes: Buffer, fileName: string, fields: Record<string, string> = { technique: 'ir', phase: 'condensed' }) => {
    let call = t.http().post('/api/identify').set(as(role));
    for (const [key, value] of Object.entries(fields)) call = call.field(key, value);
    return call.attach('file', bytes, fileName);
  };

  beforeAll(async () => {
    t = await startTestApp();
    for (const role of ROLES) tokens[role] = (await signIn(t, DEMO[role])).accessToken;
  });
  afterAll(async () => {
    await t?.close();
  });

  it('refuses to answer without a token (401)', async () => {
    const response = await t.http().post('/api/identify').field('technique', 'ir').field('phase', 'condensed').attach('file', irExample, 'synthetic-ir-ethanol-liquid.csv');
    expect(response.status).toBe(401);
    expectErrorShape(response.body, 401, '/api/identify');
  });

  it.each(ROLES)('ranks an uploaded IR file for %s, exactly as the shared code does offline', async (role) => {
    const response = await upload(role, irExample, 'synthetic-ir-ethanol-liquid.csv').expect(200);
    const { processed, result } = identifySpectrum(importSpectrum(new Uint8Array(irExample), { fileName: 'synthetic-ir-ethanol-liquid.csv', technique: 'ir' }), {
      process: { technique: 'ir', phase: 'condensed' },
    });
    expect(response.body).toEqual(JSON.parse(JSON.stringify({ file: 'synthetic-ir-ethanol-liquid.csv', ...result, quality: processed.quality, processing: processed.parameters })));
    expect(response.body.candidates.length).toBeGreaterThan(0);
    expect(response.body.candidates[0]).toMatchObject({ id: 'ethanol', rank: 1 });
    expect(response.body.libraryVersion).toEqual(loadLibrary().version);
  });

  it('ranks a JSON peak list and a JSON spectrum', async () => {
    const peaks = await t
      .http()
      .post('/api/identify')
      .set(as('inspector'))
      .send({ technique: 'ir', phase: 'condensed', peaks: [880, 1050, 1088, 2928, 2973, 3338].map((x) => ({ x, height: 1 })) })
      .expect(200);
    expect(peaks.body.candidates[0].id).toBe('ethanol');
    expect(peaks.body.processing).toBeUndefined();

    const spectrum = importSpectrum(new Uint8Array(irExample), { fileName: 'synthetic-ir-ethanol-liquid.csv', technique: 'ir' });
    const json = await t
      .http()
      .post('/api/identify')
      .set(as('inspector'))
      .send({ technique: 'ir', phase: 'condensed', spectrum: { xCm1: [...spectrum.xCm1], y: [...spectrum.y], ordinate: spectrum.ordinate } })
      .expect(200);
    expect(json.body.candidates[0].id).toBe('ethanol');
    expect(json.body.quality.reliable).toBe(true);
  });

  it('validates technique, phase and options (400 naming the field)', async () => {
    const wrong = await upload('inspector', irExample, 'synthetic-ir-ethanol-liquid.csv', { technique: 'uv', phase: 'plasma' }).expect(400);
    expectErrorShape(wrong.body, 400, '/api/identify');
    expect(wrong.body.details.map((d: { field: string }) => d.field).sort()).toEqual(['phase', 'technique']);
    const tolerance = await upload('inspector', irExample, 'synthetic-ir-ethanol-liquid.csv', { technique: 'ir', phase: 'condensed', toleranceCm1: '500' }).expect(400);
    expect(tolerance.body.message).toContain('toleranceCm1 must be at most 50');
    const nothing = await t.http().post('/api/identify').set(as('inspector')).send({ technique: 'ir', phase: 'condensed' }).expect(400);
    expect(nothing.body.message).toContain('Send a file');
    const both = await t.http().post('/api/identify').set(as('inspector')).send({ technique: 'ir', phase: 'condensed', peaks: [{ x: 1000, height: 1 }], spectrum: { xCm1: [], y: [], ordinate: 'absorbance' } });
    expect(both.status).toBe(400);
  });

  it('answers a malformed file with 400 and the importer’s message', async () => {
    const response = await upload('inspector', Buffer.from('Wavenumber (cm-1),Absorbance\n'), 'header-only.csv').expect(400);
    expectErrorShape(response.body, 400, '/api/identify');
    expect(response.body.message.length).toBeGreaterThan(10);
    const empty = await upload('inspector', Buffer.alloc(0), 'empty.csv').expect(400);
    expect(empty.body.message).toBe('the file is empty');
  });

  it('answers a file over the size limit with 413', async () => {
    const huge = Buffer.alloc(DEFAULT_MAX_IMPORT_BYTES + 1, 0x30);
    const response = await upload('inspector', huge, 'huge.csv').expect(413);
    expectErrorShape(response.body, 413, '/api/identify');
    // A JSON spectrum beyond the JSON body limit (at least 10 bytes a point pair).
    const points = Array.from({ length: Math.ceil(JSON_BODY_LIMIT_BYTES / 10) }, (_, i) => 400 + i * 0.0018);
    const json = await t.http().post('/api/identify').set(as('inspector')).send({ technique: 'ir', phase: 'condensed', spectrum: { xCm1: points, y: points, ordinate: 'absorbance' } });
    expect(json.status).toBe(413);
    expectErrorShape(json.body, 413, '/api/identify');
  });

  it('never answers 500 to 1,000 mutated files (seeded)', async () => {
    const statuses: Record<number, number> = {};
    for (const mutant of mutants(1000, 20261201)) {
      const response = await upload('inspector', mutant.bytes, mutant.fileName, { technique: mutant.technique, phase: 'condensed' });
      statuses[response.status] = (statuses[response.status] ?? 0) + 1;
      expect({ mutant: mutant.name, status: [200, 400, 413].includes(response.status) ? 'ok' : response.status, body: response.status >= 500 ? response.body : null }).toEqual({
        mutant: mutant.name,
        status: 'ok',
        body: null,
      });
      if (response.status !== 200) expect(response.body.message.length).toBeGreaterThan(0);
    }
    // The mutations reach both sides: some files still import, many are refused.
    expect(statuses[200]).toBeGreaterThan(0);
    expect(statuses[400]).toBeGreaterThan(100);
    expect(statuses[413]).toBe(2);
    // 1,000 uploads through the whole pipeline: generous on a loaded 2-core machine (no timing is asserted).
  }, 300_000);

  it('uses the library in force: after a supervisor retires the best candidate, it is no longer ranked', async () => {
    await t.http().delete('/api/library/ethanol').set(as('supervisor')).expect(200);
    const response = await upload('inspector', irExample, 'synthetic-ir-ethanol-liquid.csv').expect(200);
    expect(response.body.candidates.map((c: { id: string }) => c.id)).not.toContain('ethanol');
    expect(response.body.libraryVersion.version).not.toBe(loadLibrary().version.version);
    const library = await t.http().get('/api/library').set(as('inspector')).expect(200);
    expect(response.body.libraryVersion).toEqual(library.body.version);
  });
});
