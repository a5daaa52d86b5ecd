import { isLive } from '../../db/captureRecord';
import { ARCHIVE_ENTITIES, buildCaseArchive, IDENTIFY_METHOD_VERSION, type ArchiveAuthor, type ArchiveRecord } from '@siteband/shared';
import { version as APP_VERSION } from '../../../package.json';
import type { SitebandDb } from '../../db/db';
import { heldBytes } from '../photos/attachmentBytes';
import { captureScope, tableFor } from '../sync/captureTables';
import { entriesFor, refreshSyncState } from '../sync/syncState';

/** The archive of one case, ready to download. */
export interface CaseArchiveFile {
  fileName: string;
  bytes: Uint8Array;
  records: number;
  files: number;
}

/** `<site>-<date>.zip`: the site name in plain letters and digits, and the day of the export. */
export function archiveFileName(siteName: string, exportedAt: Date): string {
  const site = siteName
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60);
  return `${site || 'case'}-${exportedAt.toISOString().slice(0, 10)}.zip`;
}

/**
 * Builds the archive of a case from what the tablet holds, offline. A record with exactly one unanswered
 * change travels with that change's id; a change not sent yet is fixed as it is (marked sending, its base
 * version set), so a later edit becomes a change of its own and the archive's copy and the tablet's
 * sync can never apply different data under one changeId.
 */
export async function exportCaseArchive(db: SitebandDb, caseId: string, author: ArchiveAuthor, now = new Date()): Promise<CaseArchiveFile> {
  const { records, files, siteName } = await db.transaction('rw', captureScope(db), async () => {
    const caseRow = await db.cases.get(caseId);
    if (!caseRow) throw new RangeError(`There is no case ${caseId} on this tablet`);
    const records: ArchiveRecord[] = [];
    const files = new Map<string, Uint8Array>();
    for (const entity of ARCHIVE_ENTITIES) {
      const rows = entity === 'case' ? [caseRow] : await tableFor(db, entity).where('caseId').equals(caseId).toArray();
      for (const row of rows) {
        // A record deleted here travels as its delete through sync, never in an archive as if it stood.
        if (!isLive(row)) continue;
        const entries = await entriesFor(db, entity, row.id);
        const only = entries.length === 1 && (entries[0].status === 'pending' || entries[0].status === 'sending') ? entries[0] : undefined;
        let version = row.version;
        if (only?.status === 'pending') {
          await db.outbox.update(only.seq!, { status: 'sending', baseVersion: row.version });
          await refreshSyncState(db, entity, row.id);
        } else if (only) {
          version = only.baseVersion;
        }
        records.push({
          entity,
          id: row.id,
          version,
          pending: entries.length > 0 || row.version === null,
          changeId: only?.changeId ?? null,
          data: (only?.data ?? row.data) as Record<string, unknown>,
        });
        const bytes = entity === 'attachment' ? await heldBytes(db, row.id) : undefined;
        if (bytes) files.set(row.id, new Uint8Array(bytes));
      }
    }
    return { records, files, siteName: caseRow.data.siteName };
  });
  const bytes = await buildCaseArchive({ exportedAt: now, exportedBy: author, appVersion: APP_VERSION, codeVersion: IDENTIFY_METHOD_VERSION, caseId, records, files });
  return { fileName: archiveFileName(siteName, now), bytes, records: records.length, files: files.size };
}
