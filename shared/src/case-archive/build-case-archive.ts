import { strToU8, zipSync, type Zippable } from 'fflate';
import {
  ARCHIVE_ENTITIES,
  CASE_ARCHIVE_FORMAT,
  CASE_ARCHIVE_VERSION,
  FILES_FOLDER,
  MANIFEST_ENTRY,
  type ArchiveAuthor,
  type ArchiveFile,
  type ArchiveRecord,
  type CaseArchiveManifest,
} from './format.js';
import { sha256Hex } from './sha256-hex.js';

/** What the exporting side hands over: the case's records as it holds them and the attachments' bytes. */
export interface CaseArchiveInput {
  exportedAt: Date;
  exportedBy: ArchiveAuthor;
  appVersion: string;
  codeVersion: string;
  caseId: string;
  /** The case record and every record below it, in any order. */
  records: readonly ArchiveRecord[];
  /** Bytes by attachment id; an attachment whose bytes the tablet never held (taken on another device) has none. */
  files: ReadonlyMap<string, Uint8Array>;
}

/** Photos and other already-compressed files are stored as they are; text (raw scans, the manifest) is deflated. */
const STORED_AS_IS = /^image\//;

/**
 * Builds the archive: `manifest.json` plus `files/<attachmentId>` for every attachment with bytes,
 * each listed with its size and SHA-256. Throws a RangeError when the input is not one whole case.
 */
export async function buildCaseArchive(input: CaseArchiveInput): Promise<Uint8Array> {
  const records = [...input.records].sort((a, b) => ARCHIVE_ENTITIES.indexOf(a.entity) - ARCHIVE_ENTITIES.indexOf(b.entity));
  if (records[0]?.entity !== 'case' || records[0].id !== input.caseId || records.filter((r) => r.entity === 'case').length !== 1) {
    throw new RangeError(`An archive holds exactly one case, ${input.caseId}, with what belongs to it`);
  }
  const zipped: Zippable = {};
  const files: ArchiveFile[] = [];
  for (const record of records) {
    if (record.entity !== 'attachment') continue;
    const bytes = input.files.get(record.id);
    if (!bytes) continue;
    const path = `${FILES_FOLDER}${record.id}`;
    files.push({ attachmentId: record.id, path, size: bytes.byteLength, sha256: await sha256Hex(bytes) });
    zipped[path] = [bytes, { level: STORED_AS_IS.test(String(record.data.contentType)) ? 0 : 6 }];
  }
  const manifest: CaseArchiveManifest = {
    format: CASE_ARCHIVE_FORMAT,
    formatVersion: CASE_ARCHIVE_VERSION,
    exportedAt: input.exportedAt.toISOString(),
    exportedBy: input.exportedBy,
    appVersion: input.appVersion,
    codeVersion: input.codeVersion,
    caseId: input.caseId,
    records,
    files,
  };
  zipped[MANIFEST_ENTRY] = [strToU8(JSON.stringify(manifest, null, 2)), { level: 6 }];
  return zipSync(zipped, { mtime: input.exportedAt });
}
