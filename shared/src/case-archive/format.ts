/** The name a case archive's manifest carries, so another ZIP is never mistaken for one. */
export const CASE_ARCHIVE_FORMAT = 'siteband-case-archive';

/** The manifest version this code writes and reads (see SPEC.md). */
export const CASE_ARCHIVE_VERSION = 1;

/** The manifest's entry name inside the ZIP. */
export const MANIFEST_ENTRY = 'manifest.json';

/** The folder holding each attachment's bytes, as `files/<attachmentId>`. */
export const FILES_FOLDER = 'files/';

/**
 * The record kinds an archive holds, parents before children, in the order they are applied
 * (the sync protocol's names and order: api/src/sync/PROTOCOL.md, "Push").
 */
export const ARCHIVE_ENTITIES = ['case', 'sample', 'instrumentCheck', 'scan', 'attachment', 'note', 'handover', 'escalation'] as const;
export type ArchiveEntity = (typeof ARCHIVE_ENTITIES)[number];

const MB = 1024 * 1024;

/**
 * Size limits checked before anything is decompressed. A file inside is at most the largest attachment
 * the server takes (a raw scan, 20 MB: api/src/attachments/attachment-limits.ts); the totals leave room for
 * a long day's photos (common practice). The unpacked sizes are the ones the ZIP declares, and fflate never
 * writes more than the declared size, so a ZIP that lies about them fails its SHA-256 check instead of
 * filling memory.
 */
export interface CaseArchiveLimits {
  /** The ZIP file itself. */
  maxArchiveBytes: number;
  /** The sum of the declared unpacked sizes of every entry. */
  maxUnpackedBytes: number;
  /** One attachment's bytes. */
  maxFileBytes: number;
  /** The manifest. */
  maxManifestBytes: number;
  /** Entries in the ZIP. */
  maxEntries: number;
}

export const DEFAULT_CASE_ARCHIVE_LIMITS: Readonly<CaseArchiveLimits> = {
  maxArchiveBytes: 200 * MB,
  maxUnpackedBytes: 400 * MB,
  maxFileBytes: 20 * MB,
  maxManifestBytes: 32 * MB,
  maxEntries: 5000,
};

/** One record as the exporting tablet knew it. */
export interface ArchiveRecord {
  entity: ArchiveEntity;
  id: string;
  /** The server's version the tablet last heard of; null when the server never confirmed the record. */
  version: number | null;
  /** True when the tablet held a change the server had not confirmed yet. */
  pending: boolean;
  /**
   * The tablet's own unanswered change carrying exactly this data, when it had one; importers apply the record
   * under this changeId, so the tablet's later sync and the import cannot both apply it.
   */
  changeId: string | null;
  /** The record's fields as the tablet sends them in a sync change. */
  data: Record<string, unknown>;
}

/** One attachment's bytes in the archive. */
export interface ArchiveFile {
  attachmentId: string;
  /** `files/<attachmentId>`. */
  path: string;
  size: number;
  /** Lower-case hex SHA-256 of the bytes. */
  sha256: string;
}

/** Who made the archive (the signed-in user of the exporting tablet). */
export interface ArchiveAuthor {
  id: string;
  email: string;
  displayName: string;
}

/** `manifest.json`. */
export interface CaseArchiveManifest {
  format: typeof CASE_ARCHIVE_FORMAT;
  formatVersion: typeof CASE_ARCHIVE_VERSION;
  /** ISO 8601. */
  exportedAt: string;
  exportedBy: ArchiveAuthor;
  /** The exporting app's version. */
  appVersion: string;
  /** The identification code's method version in the exporting app. */
  codeVersion: string;
  caseId: string;
  /** The case first, then every record below it, parents before children. */
  records: ArchiveRecord[];
  files: ArchiveFile[];
}

/** A read and verified archive: the manifest and each listed file's bytes by attachment id. */
export interface CaseArchive {
  manifest: CaseArchiveManifest;
  files: Map<string, Uint8Array>;
}
