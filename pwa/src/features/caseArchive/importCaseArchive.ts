import { archiveChangeId, archiveOwnerProblem, CaseArchiveError, readCaseArchive, type ArchiveEntity, type ArchiveRecord } from '@siteband/shared';
import type { SitebandDb } from '../../db/db';
import type { CaptureRow } from '../../db/captureRecord';
import { captureScope, tableFor } from '../sync/captureTables';
import { refreshSyncState } from '../sync/syncState';

/** What became of one record: added to the tablet, already here as it is, or kept as the tablet has it. */
export type ImportOutcome = 'imported' | 'unchanged' | 'keptLocal';

/** One record's outcome, for the summary the inspector sees. */
export interface ImportedRecord {
  entity: ArchiveEntity;
  id: string;
  outcome: ImportOutcome;
}

/** The result of reading a file: refused as a whole (with the reason), or each record's outcome. */
export type CaseImportResult =
  | { ok: true; caseId: string; siteName: string; records: ImportedRecord[]; files: number }
  | { ok: false; reason: string };

/** True when two JSON values hold the same content, whatever the key order. */
function sameJson(a: unknown, b: unknown): boolean {
  const canonical = (value: unknown): unknown =>
    Array.isArray(value)
      ? value.map(canonical)
      : value && typeof value === 'object'
        ? Object.fromEntries(Object.keys(value).sort().map((key) => [key, canonical((value as Record<string, unknown>)[key])]))
        : value;
  return JSON.stringify(canonical(a)) === JSON.stringify(canonical(b));
}

/**
 * Adds a case archive's records and files to the tablet so they show and sync like any other, with their
 * own ids (no duplicates). A record the tablet already holds is never overwritten by a file: the same content
 * is left alone (`unchanged`), a different one is kept as the tablet has it (`keptLocal`), because what
 * the inspector has on this tablet may be newer work; the server settles any difference at the next sync.
 * A record the tablet lacks is added with its server version, and when the archive says a change waits,
 * with that change (the tablet's own changeId from the archive, or the one the server's import derives).
 */
export async function importCaseArchive(db: SitebandDb, bytes: Uint8Array, userId: string, now = Date.now()): Promise<CaseImportResult> {
  let archive;
  try {
    archive = await readCaseArchive(bytes);
  } catch (error) {
    if (error instanceof CaseArchiveError) return { ok: false, reason: error.message };
    throw error;
  }
  const { manifest, files } = archive;
  const ownerProblem = archiveOwnerProblem(manifest, userId);
  if (ownerProblem) return { ok: false, reason: ownerProblem };
  const changeIds = new Map<ArchiveRecord, string>();
  for (const record of manifest.records) if (record.pending) changeIds.set(record, await archiveChangeId(userId, record));

  const records = await db.transaction('rw', captureScope(db), async () => {
    const outcomes: ImportedRecord[] = [];
    for (const record of manifest.records) {
      const table = tableFor(db, record.entity);
      const local = await table.get(record.id);
      if (local) {
        // The same content is the same record, whichever of the two copies the server has confirmed since.
        outcomes.push({ entity: record.entity, id: record.id, outcome: sameJson(local.data, record.data) ? 'unchanged' : 'keptLocal' });
        continue;
      }
      const file = files.get(record.id);
      const row: CaptureRow<unknown> & Record<string, unknown> = {
        id: record.id,
        caseId: manifest.caseId,
        data: record.data,
        version: record.version,
        sync: 'local',
        editedAt: now,
        ...(record.entity === 'attachment' ? { receivedBytes: 0, uploadedAt: null, ...(file ? { bytesHeld: true } : {}) } : {}),
      };
      await table.add(row);
      if (record.entity === 'attachment' && file) await db.attachmentBytes.put({ id: record.id, bytes: file.slice().buffer });
      const changeId = changeIds.get(record);
      if (changeId) {
        // Sending, not pending: a later edit must become a change of its own, never be folded into this changeId.
        await db.outbox.add({ changeId, entity: record.entity, op: 'upsert', id: record.id, baseVersion: record.version, data: record.data, status: 'sending', attempts: 0, lastError: null, createdAt: now });
      }
      await refreshSyncState(db, record.entity, record.id);
      outcomes.push({ entity: record.entity, id: record.id, outcome: 'imported' });
    }
    return outcomes;
  });
  const caseData = manifest.records[0].data;
  return { ok: true, caseId: manifest.caseId, siteName: String(caseData.siteName ?? ''), records, files: files.size };
}
