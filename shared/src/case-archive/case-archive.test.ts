import { strFromU8, strToU8, unzipSync, zipSync, type Zippable } from 'fflate';
import { describe, expect, it } from 'vitest';
import { archiveChangeId } from './archive-change-id.js';
import { archiveOwnerProblem } from './archive-owner.js';
import { buildCaseArchive, type CaseArchiveInput } from './build-case-archive.js';
import { CaseArchiveError, type CaseArchiveErrorCode } from './case-archive-error.js';
import { DEFAULT_CASE_ARCHIVE_LIMITS, type ArchiveRecord, type CaseArchiveManifest } from './format.js';
import { readCaseArchive } from './read-case-archive.js';
import { sha256Hex } from './sha256-hex.js';

// Invented demo case: ids, names and bytes are made up for the test.
const CASE_ID = '0b9f2a1c-6d3e-4f5a-8b7c-1d2e3f4a5b6c';
const SAMPLE_ID = '1c0a3b2d-7e4f-4a6b-9c8d-2e3f4a5b6c7d';
const SCAN_ID = '2d1b4c3e-8f5a-4b7c-8d9e-3f4a5b6c7d8e';
const RAW_ID = '3e2c5d4f-9a6b-4c8d-9e0f-4a5b6c7d8e9f';
const PHOTO_ID = '4f3d6e5a-0b7c-4d9e-8f1a-5b6c7d8e9f0a';
const CHANGE_ID = '5a4e7f6b-1c8d-4e0f-9a2b-6c7d8e9f0a1b';

const raw = strToU8('##TITLE=invented test scan\n##XUNITS=1/CM\n##YUNITS=ABSORBANCE\n3000,0.1\n2900,0.8\n');
// Not a real photo: bytes that must come back unchanged, including every value 0..255.
const photo = Uint8Array.from({ length: 4096 }, (_, i) => (i * 7) % 256);

async function input(): Promise<CaseArchiveInput> {
  const attachment = async (id: string, ownerType: string, ownerId: string, kind: string, contentType: string, bytes: Uint8Array): Promise<ArchiveRecord> => ({
    entity: 'attachment',
    id,
    version: null,
    pending: true,
    changeId: null,
    data: { ownerType, ownerId, kind, fileName: `${kind}.bin`, contentType, size: bytes.byteLength, sha256: await sha256Hex(bytes) },
  });
  return {
    exportedAt: new Date('2026-11-30T16:00:00Z'),
    exportedBy: { id: '6b5f8a7c-2d9e-4f1a-8b3c-7d8e9f0a1b2c', email: 'inspector@example.test', displayName: 'Demo Inspector' },
    appVersion: '0.1.0',
    codeVersion: '1.1.0',
    caseId: CASE_ID,
    records: [
      // Deliberately children first: the builder orders parents before children.
      { entity: 'scan', id: SCAN_ID, version: 2, pending: true, changeId: CHANGE_ID, data: { sampleId: SAMPLE_ID, technique: 'ir', result: { codeVersion: '1.1.0' } } },
      await attachment(RAW_ID, 'scan', SCAN_ID, 'raw-scan', 'chemical/x-jcamp-dx', raw),
      await attachment(PHOTO_ID, 'sample', SAMPLE_ID, 'photo', 'image/jpeg', photo),
      { entity: 'sample', id: SAMPLE_ID, version: 1, pending: false, changeId: null, data: { caseId: CASE_ID, label: 'S-1' } },
      { entity: 'case', id: CASE_ID, version: 3, pending: false, changeId: null, data: { siteName: 'Warehouse 4', status: 'open' } },
    ],
    files: new Map([
      [RAW_ID, raw],
      [PHOTO_ID, photo],
    ]),
  };
}

async function refusal(bytes: Uint8Array, limits = DEFAULT_CASE_ARCHIVE_LIMITS): Promise<CaseArchiveError> {
  try {
    await readCaseArchive(bytes, limits);
  } catch (error) {
    if (error instanceof CaseArchiveError) return error;
    throw error;
  }
  throw new Error('the archive was accepted');
}

async function expectRefused(bytes: Uint8Array, code: CaseArchiveErrorCode, entry?: string, limits = DEFAULT_CASE_ARCHIVE_LIMITS): Promise<CaseArchiveError> {
  const error = await refusal(bytes, limits);
  expect(error.code).toBe(code);
  expect(error.entry).toBe(entry);
  return error;
}

/** The archive's entries re-zipped after `change`, as a tampering tool would. */
function rezip(bytes: Uint8Array, change: (entries: Record<string, Uint8Array>) => void): Uint8Array {
  const entries = unzipSync(bytes);
  change(entries);
  return zipSync(entries as Zippable);
}

function withManifest(bytes: Uint8Array, edit: (manifest: Record<string, unknown>) => void): Uint8Array {
  return rezip(bytes, (entries) => {
    const manifest = JSON.parse(strFromU8(entries['manifest.json']));
    edit(manifest);
    entries['manifest.json'] = strToU8(JSON.stringify(manifest));
  });
}

describe('case archives', () => {
  it('round trip: every record and every byte come back, parents first, each file with its size and SHA-256', async () => {
    const source = await input();
    const { manifest, files } = await readCaseArchive(await buildCaseArchive(source));
    expect(manifest.format).toBe('siteband-case-archive');
    expect(manifest.formatVersion).toBe(1);
    expect(manifest.exportedAt).toBe('2026-11-30T16:00:00.000Z');
    expect(manifest.exportedBy).toEqual(source.exportedBy);
    expect(manifest.records.map((r) => r.entity)).toEqual(['case', 'sample', 'scan', 'attachment', 'attachment']);
    expect(manifest.records.find((r) => r.id === SCAN_ID)).toEqual(source.records[0]);
    expect(manifest.files).toEqual([
      { attachmentId: RAW_ID, path: `files/${RAW_ID}`, size: raw.byteLength, sha256: await sha256Hex(raw) },
      { attachmentId: PHOTO_ID, path: `files/${PHOTO_ID}`, size: photo.byteLength, sha256: await sha256Hex(photo) },
    ]);
    expect(Array.from(files.get(RAW_ID)!)).toEqual(Array.from(raw));
    expect(Array.from(files.get(PHOTO_ID)!)).toEqual(Array.from(photo));
  });

  it('SHA-256 of a known input matches the published test vector (FIPS 180-2, "abc")', async () => {
    expect(await sha256Hex(strToU8('abc'))).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });

  it('keeps an attachment whose bytes the tablet never held as metadata only', async () => {
    const source = await input();
    source.files = new Map([[RAW_ID, raw]]);
    const { manifest, files } = await readCaseArchive(await buildCaseArchive(source));
    expect(manifest.records.some((r) => r.id === PHOTO_ID)).toBe(true);
    expect(manifest.files.map((f) => f.attachmentId)).toEqual([RAW_ID]);
    expect(files.has(PHOTO_ID)).toBe(false);
  });

  it('refuses to build an archive without exactly one case', async () => {
    const source = await input();
    source.records = source.records.filter((r) => r.entity !== 'case');
    await expect(buildCaseArchive(source)).rejects.toThrow(RangeError);
  });

  it('names a tampered file (one byte changed, same length)', async () => {
    const archive = rezip(await buildCaseArchive(await input()), (entries) => {
      entries[`files/${RAW_ID}`] = entries[`files/${RAW_ID}`].slice();
      entries[`files/${RAW_ID}`][10] ^= 1;
    });
    const error = await expectRefused(archive, 'hash-mismatch', `files/${RAW_ID}`);
    expect(error.message).toContain(await sha256Hex(raw));
  });

  it('names a file of another length, a missing file and an entry the manifest does not list', async () => {
    const built = await buildCaseArchive(await input());
    await expectRefused(rezip(built, (e) => (e[`files/${PHOTO_ID}`] = e[`files/${PHOTO_ID}`].slice(1))), 'size-mismatch', `files/${PHOTO_ID}`);
    await expectRefused(rezip(built, (e) => delete e[`files/${PHOTO_ID}`]), 'missing-file', `files/${PHOTO_ID}`);
    await expectRefused(rezip(built, (e) => (e[`files/${CHANGE_ID}`] = photo)), 'unexpected-entry', `files/${CHANGE_ID}`);
    await expectRefused(rezip(built, (e) => (e['../evil.sh'] = photo)), 'unexpected-entry', '../evil.sh');
  });

  it('refuses a manifest whose file list disagrees with the attachment record', async () => {
    const archive = withManifest(await buildCaseArchive(await input()), (m) => {
      const files = m.files as { sha256: string }[];
      files[0].sha256 = '0'.repeat(64);
    });
    const error = await expectRefused(archive, 'bad-manifest', 'manifest.json');
    expect(error.message).toContain('files[0]');
  });

  it('refuses a truncated archive at every cut without any other error', async () => {
    const built = await buildCaseArchive(await input());
    for (const cut of [0, 10, 100, Math.floor(built.length / 2), built.length - 30, built.length - 1]) {
      const error = await refusal(built.slice(0, cut));
      expect(['not-a-zip', 'hash-mismatch', 'size-mismatch', 'missing-manifest']).toContain(error.code);
    }
  });

  it('refuses a file that is not a ZIP, or a ZIP without a manifest', async () => {
    await expectRefused(strToU8('siteName,address\nWarehouse 4,Dock road\n'), 'not-a-zip');
    await expectRefused(zipSync({ 'notes.txt': strToU8('hello') }), 'unexpected-entry', 'notes.txt');
    await expectRefused(zipSync({}), 'missing-manifest');
  });

  it('refuses an unknown format, an unknown version and a manifest that is not JSON', async () => {
    const built = await buildCaseArchive(await input());
    await expectRefused(withManifest(built, (m) => (m.format = 'some-other-zip')), 'unknown-format', 'manifest.json');
    const version = await expectRefused(withManifest(built, (m) => (m.formatVersion = 2)), 'unsupported-version', 'manifest.json');
    expect(version.message).toContain('formatVersion 2');
    await expectRefused(rezip(built, (e) => (e['manifest.json'] = strToU8('{"format":'))), 'bad-manifest', 'manifest.json');
  });

  it('names the field of a malformed manifest', async () => {
    const built = await buildCaseArchive(await input());
    const cases: [(m: CaseArchiveManifest) => void, string][] = [
      [(m) => ((m.records[1] as { id: string }).id = 'not-a-uuid'), 'records[1].id'],
      [(m) => ((m.records[2] as { entity: string }).entity = 'invoice'), 'records[2].entity'],
      [(m) => ((m.records[0] as { version: unknown }).version = 0), 'records[0].version'],
      [(m) => m.records.reverse(), 'records[0]'],
      [(m) => m.records.push({ ...m.records[1] }), 'records[5]'],
      [(m) => ((m as { exportedAt: string }).exportedAt = 'yesterday'), 'exportedAt'],
      [(m) => ((m.files[0] as { path: string }).path = '../../etc/passwd'), 'files[0].path'],
    ];
    for (const [edit, field] of cases) {
      const error = await expectRefused(withManifest(built, (m) => edit(m as unknown as CaseArchiveManifest)), 'bad-manifest', 'manifest.json');
      expect(error.message).toContain(field);
    }
  });

  it('refuses an archive over the size limit before reading it', async () => {
    const built = await buildCaseArchive(await input());
    await expectRefused(built, 'too-large', undefined, { ...DEFAULT_CASE_ARCHIVE_LIMITS, maxArchiveBytes: built.length - 1 });
  });

  it('zip bomb guard: a file declaring more than the limit unpacked is refused before it is inflated', async () => {
    const source = await input();
    const zeros = new Uint8Array(DEFAULT_CASE_ARCHIVE_LIMITS.maxFileBytes + 1);
    const bomb = rezip(await buildCaseArchive(source), (e) => (e[`files/${RAW_ID}`] = zeros));
    expect(bomb.length).toBeLessThan(200_000);
    const error = await expectRefused(bomb, 'too-large', `files/${RAW_ID}`);
    expect(error.message).toContain(String(zeros.length));
    await expectRefused(await buildCaseArchive(source), 'too-large', undefined, { ...DEFAULT_CASE_ARCHIVE_LIMITS, maxUnpackedBytes: 1000 });
    await expectRefused(await buildCaseArchive(source), 'too-large', undefined, { ...DEFAULT_CASE_ARCHIVE_LIMITS, maxEntries: 2 });
  });

  it('zip bomb guard: an entry lying about its unpacked size is cut at the declared size and fails its check', async () => {
    const big = new Uint8Array(1_000_000).fill(65);
    const source = await input();
    const archive = rezip(await buildCaseArchive(source), (e) => (e[`files/${RAW_ID}`] = big));
    // Rewrite the declared unpacked size of that entry in the central directory (signature 0x02014b50, size at +24).
    const view = new DataView(archive.buffer, archive.byteOffset, archive.byteLength);
    let patched = 0;
    for (let i = 0; i + 46 < archive.length; i++) {
      if (view.getUint32(i, true) !== 0x02014b50) continue;
      const nameLength = view.getUint16(i + 28, true);
      if (strFromU8(archive.subarray(i + 46, i + 46 + nameLength)) !== `files/${RAW_ID}`) continue;
      view.setUint32(i + 24, raw.byteLength, true);
      patched++;
    }
    expect(patched).toBe(1);
    const error = await refusal(archive);
    expect(error.code).toBe('hash-mismatch');
  });

  it('derives the same changeId for the same user and record, another for another user or other data; keeps the tablet’s own', async () => {
    const record: ArchiveRecord = { entity: 'note', id: SCAN_ID, version: null, pending: true, changeId: null, data: { text: 'a' } };
    const first = await archiveChangeId('user-a', record);
    expect(first).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-5[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    expect(await archiveChangeId('user-a', { ...record })).toBe(first);
    expect(await archiveChangeId('user-b', record)).not.toBe(first);
    expect(await archiveChangeId('user-a', { ...record, data: { text: 'b' } })).not.toBe(first);
    expect(await archiveChangeId('user-a', { ...record, changeId: CHANGE_ID })).toBe(CHANGE_ID);
  });

  it('lets only the exporting user import the archive', async () => {
    const { manifest } = await readCaseArchive(await buildCaseArchive(await input()));
    expect(archiveOwnerProblem(manifest, manifest.exportedBy.id)).toBeNull();
    expect(archiveOwnerProblem(manifest, 'someone-else')).toContain('inspector@example.test');
  });
});
