import { strFromU8, unzipSync, type UnzipFileInfo } from 'fflate';
import { CaseArchiveError } from './case-archive-error.js';
import { DEFAULT_CASE_ARCHIVE_LIMITS, FILES_FOLDER, MANIFEST_ENTRY, type CaseArchive, type CaseArchiveLimits } from './format.js';
import { parseManifest } from './parse-manifest.js';
import { sha256Hex } from './sha256-hex.js';

/**
 * Reads and verifies an archive: the size limits before anything is unpacked, the manifest's format,
 * version and shape, and every listed file's size and SHA-256. Throws only `CaseArchiveError`, naming
 * the entry at fault; never returns a partly checked archive.
 */
export async function readCaseArchive(bytes: Uint8Array, limits: CaseArchiveLimits = DEFAULT_CASE_ARCHIVE_LIMITS): Promise<CaseArchive> {
  if (bytes.byteLength > limits.maxArchiveBytes) {
    throw new CaseArchiveError('too-large', `The archive has ${bytes.byteLength} bytes; at most ${limits.maxArchiveBytes} are accepted`);
  }
  const entries = unpack(bytes, limits);
  const manifestBytes = entries.get(MANIFEST_ENTRY);
  if (!manifestBytes) throw new CaseArchiveError('missing-manifest', `The archive has no ${MANIFEST_ENTRY}: it is not a case archive`);
  let json: unknown;
  try {
    json = JSON.parse(strFromU8(manifestBytes));
  } catch (error) {
    throw new CaseArchiveError('bad-manifest', `not readable JSON (${error instanceof Error ? error.message : String(error)})`, MANIFEST_ENTRY);
  }
  const manifest = parseManifest(json);

  const files = new Map<string, Uint8Array>();
  for (const file of manifest.files) {
    const content = entries.get(file.path);
    if (!content) throw new CaseArchiveError('missing-file', 'listed in the manifest but not in the archive', file.path);
    if (content.byteLength !== file.size) {
      throw new CaseArchiveError('size-mismatch', `has ${content.byteLength} bytes; the manifest lists ${file.size}`, file.path);
    }
    const actual = await sha256Hex(content);
    if (actual !== file.sha256) throw new CaseArchiveError('hash-mismatch', `has SHA-256 ${actual}; the manifest lists ${file.sha256}`, file.path);
    files.set(file.attachmentId, content);
  }
  for (const name of entries.keys()) {
    if (name !== MANIFEST_ENTRY && !manifest.files.some((file) => file.path === name)) {
      throw new CaseArchiveError('unexpected-entry', 'not listed in the manifest', name);
    }
  }
  return { manifest, files };
}

/** Unpacks the entries after checking every declared size against the limits (the zip bomb guard). */
function unpack(bytes: Uint8Array, limits: CaseArchiveLimits): Map<string, Uint8Array> {
  const seen = new Set<string>();
  let unpacked = 0;
  const check = (info: UnzipFileInfo): true => {
    const { name, originalSize } = info;
    if (seen.has(name)) throw new CaseArchiveError('unexpected-entry', 'appears twice in the archive', name);
    seen.add(name);
    if (seen.size > limits.maxEntries) throw new CaseArchiveError('too-large', `The archive has more than ${limits.maxEntries} entries`);
    if (name !== MANIFEST_ENTRY && !name.startsWith(FILES_FOLDER)) {
      throw new CaseArchiveError('unexpected-entry', `a case archive holds only ${MANIFEST_ENTRY} and ${FILES_FOLDER}<attachmentId>`, name);
    }
    const max = name === MANIFEST_ENTRY ? limits.maxManifestBytes : limits.maxFileBytes;
    if (originalSize > max) throw new CaseArchiveError('too-large', `unpacks to ${originalSize} bytes; at most ${max} are accepted`, name);
    unpacked += originalSize;
    if (unpacked > limits.maxUnpackedBytes) {
      throw new CaseArchiveError('too-large', `The archive unpacks to more than ${limits.maxUnpackedBytes} bytes`);
    }
    return true;
  };
  try {
    return new Map(Object.entries(unzipSync(bytes, { filter: check })));
  } catch (error) {
    if (error instanceof CaseArchiveError) throw error;
    throw new CaseArchiveError('not-a-zip', `The file is not a readable ZIP archive (${error instanceof Error ? error.message : String(error)})`);
  }
}
