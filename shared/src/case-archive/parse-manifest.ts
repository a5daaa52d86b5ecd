import { CaseArchiveError } from './case-archive-error.js';
import {
  ARCHIVE_ENTITIES,
  CASE_ARCHIVE_FORMAT,
  CASE_ARCHIVE_VERSION,
  FILES_FOLDER,
  MANIFEST_ENTRY,
  type ArchiveEntity,
  type ArchiveFile,
  type ArchiveRecord,
  type CaseArchiveManifest,
} from './format.js';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const SHA256 = /^[0-9a-f]{64}$/;

type Json = Record<string, unknown>;

function bad(field: string, problem: string): never {
  throw new CaseArchiveError('bad-manifest', `${field} ${problem}`, MANIFEST_ENTRY);
}

function object(value: unknown, field: string): Json {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) bad(field, 'must be an object');
  return value as Json;
}

function text(value: unknown, field: string): string {
  if (typeof value !== 'string' || value.length === 0) bad(field, 'must be a non-empty string');
  return value;
}

function uuid(value: unknown, field: string): string {
  if (typeof value !== 'string' || !UUID.test(value)) bad(field, 'must be a UUID');
  return value.toLowerCase();
}

function isoTime(value: unknown, field: string): string {
  if (typeof value !== 'string' || Number.isNaN(Date.parse(value))) bad(field, 'must be an ISO 8601 time');
  return value;
}

function record(value: unknown, field: string): ArchiveRecord {
  const raw = object(value, field);
  if (!(ARCHIVE_ENTITIES as readonly unknown[]).includes(raw.entity)) bad(`${field}.entity`, `must be one of ${ARCHIVE_ENTITIES.join(', ')}`);
  const version = raw.version;
  if (version !== null && !(Number.isInteger(version) && (version as number) >= 1)) bad(`${field}.version`, 'must be null or a whole number ≥ 1');
  if (typeof raw.pending !== 'boolean') bad(`${field}.pending`, 'must be true or false');
  const changeId = raw.changeId === null ? null : uuid(raw.changeId, `${field}.changeId`);
  if (changeId !== null && !raw.pending) bad(`${field}.changeId`, 'must be null for a record with no change waiting');
  return {
    entity: raw.entity as ArchiveEntity,
    id: uuid(raw.id, `${field}.id`),
    version: version as number | null,
    pending: raw.pending,
    changeId,
    data: object(raw.data, `${field}.data`),
  };
}

function file(value: unknown, field: string): ArchiveFile {
  const raw = object(value, field);
  const attachmentId = uuid(raw.attachmentId, `${field}.attachmentId`);
  if (raw.path !== `${FILES_FOLDER}${attachmentId}`) bad(`${field}.path`, `must be ${FILES_FOLDER}${attachmentId}`);
  if (!Number.isInteger(raw.size) || (raw.size as number) < 0) bad(`${field}.size`, 'must be a whole number of bytes');
  if (typeof raw.sha256 !== 'string' || !SHA256.test(raw.sha256)) bad(`${field}.sha256`, 'must be 64 lower-case hex digits');
  return { attachmentId, path: raw.path as string, size: raw.size as number, sha256: raw.sha256 };
}

function list<T>(value: unknown, field: string, each: (item: unknown, field: string) => T): T[] {
  if (!Array.isArray(value)) bad(field, 'must be a list');
  return value.map((item, i) => each(item, `${field}[${i}]`));
}

/**
 * Checks the manifest's format, version and shape, and that it is one whole case: the case first, each
 * record once, every file belonging to an attachment record that declares the same size and SHA-256.
 * The records' own fields are checked where they are applied (the sync rules), not here.
 */
export function parseManifest(json: unknown): CaseArchiveManifest {
  const raw = object(json, 'the manifest');
  if (raw.format !== CASE_ARCHIVE_FORMAT) {
    throw new CaseArchiveError('unknown-format', `format is ${JSON.stringify(raw.format)}, not ${CASE_ARCHIVE_FORMAT}: not a case archive`, MANIFEST_ENTRY);
  }
  if (raw.formatVersion !== CASE_ARCHIVE_VERSION) {
    throw new CaseArchiveError(
      'unsupported-version',
      `formatVersion ${JSON.stringify(raw.formatVersion)} is not one this app reads (it reads ${CASE_ARCHIVE_VERSION}): update the app that imports it`,
      MANIFEST_ENTRY,
    );
  }
  const author = object(raw.exportedBy, 'exportedBy');
  const caseId = uuid(raw.caseId, 'caseId');
  const records = list(raw.records, 'records', record);
  const files = list(raw.files, 'files', file);

  if (records[0]?.entity !== 'case' || records[0].id !== caseId) bad('records[0]', `must be the case ${caseId}`);
  const keys = new Set<string>();
  records.forEach((r, i) => {
    if (i > 0 && r.entity === 'case') bad(`records[${i}]`, 'is a second case: an archive holds one');
    const key = `${r.entity}:${r.id}`;
    if (keys.has(key)) bad(`records[${i}]`, `repeats ${r.entity} ${r.id}`);
    keys.add(key);
  });
  const attachments = new Map(records.filter((r) => r.entity === 'attachment').map((r) => [r.id, r.data]));
  const listed = new Set<string>();
  files.forEach((f, i) => {
    const data = attachments.get(f.attachmentId);
    if (!data) bad(`files[${i}]`, `has no attachment record ${f.attachmentId}`);
    if (listed.has(f.attachmentId)) bad(`files[${i}]`, `repeats attachment ${f.attachmentId}`);
    listed.add(f.attachmentId);
    if (data.size !== f.size || data.sha256 !== f.sha256) bad(`files[${i}]`, `size or sha256 differs from attachment ${f.attachmentId}'s record`);
  });
  return {
    format: CASE_ARCHIVE_FORMAT,
    formatVersion: CASE_ARCHIVE_VERSION,
    exportedAt: isoTime(raw.exportedAt, 'exportedAt'),
    exportedBy: { id: uuid(author.id, 'exportedBy.id'), email: text(author.email, 'exportedBy.email'), displayName: text(author.displayName, 'exportedBy.displayName') },
    appVersion: text(raw.appVersion, 'appVersion'),
    codeVersion: text(raw.codeVersion, 'codeVersion'),
    caseId,
    records,
    files,
  };
}
