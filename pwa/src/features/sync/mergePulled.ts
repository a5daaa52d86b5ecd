import type { SitebandDb } from '../../db/db';
import type { CaptureRow, ServerRecord } from '../../db/captureRecord';
import { caseIdOf, captureScope, isCaptureEntity, removeRecord, tableFor, tabletData } from './captureTables';
import { entriesFor, refreshSyncState } from './syncState';
import { serverCheckOf } from '../scans/serverCheck';
import { escalationServerStateOf, isServerWrittenEntity, mergeServerWritten, serverWrittenTables } from './serverWritten';

/**
 * Merges one pulled record. A local record with changes the server has not applied is never
 * overwritten: a newer server version becomes a conflict the inspector settles. Returns what happened.
 */
export async function mergePulled(db: SitebandDb, record: ServerRecord, now = Date.now()): Promise<'stored' | 'same' | 'conflict' | 'skipped'> {
  const entity = record.entity;
  if (isServerWrittenEntity(entity)) return db.transaction('rw', serverWrittenTables(db), () => mergeServerWritten(db, entity, record));
  if (!isCaptureEntity(entity)) return 'skipped';
  const table = tableFor(db, entity);
  return db.transaction('rw', captureScope(db), async () => {
    const local = await table.get(record.id);
    const entries = await entriesFor(db, entity, record.id);
    if (local && local.version === record.version && !record.deleted) {
      // Our own write coming back (or an upload finishing): only the upload time may be new,
      // ...or the server's recomputation of a scan, written with a new syncSeq at the same version,
      // ...or a safety officer's acknowledgement, if the server keeps the version for it.
      const changes: Record<string, unknown> = {};
      if (entity === 'attachment' && typeof record.data.uploadedAt === 'string') changes.uploadedAt = record.data.uploadedAt;
      if (entity === 'scan') changes.serverCheck = serverCheckOf(record.data);
      if (entity === 'escalation') changes.serverState = escalationServerStateOf(record.data);
      await refreshSyncState(db, entity, record.id, changes);
      return 'same';
    }
    if (local?.deletePending && record.deleted) {
      // Deleted on the server as on the tablet (our delete, its answer lost): nothing left to send.
      await db.outbox.bulkDelete(entries.map((e) => e.seq!));
      await removeRecord(db, entity, record.id);
      return 'stored';
    }
    if (local && entries.length > 0) {
      for (const entry of entries) await db.outbox.update(entry.seq!, { status: 'conflict', lastError: 'Changed on the server meanwhile' });
      await table.update(record.id, { conflictServer: record });
      await refreshSyncState(db, entity, record.id);
      return 'conflict';
    }
    if (record.deleted) {
      await removeRecord(db, entity, record.id);
      return 'stored';
    }
    const caseId = (await caseIdOf(db, entity, record.id, record.data)) ?? String(record.data.caseId ?? '');
    const row: CaptureRow<unknown> & Record<string, unknown> = {
      ...local,
      id: record.id,
      caseId,
      data: tabletData(entity, record.data),
      version: record.version,
      sync: 'server',
      editedAt: local?.editedAt ?? now,
    };
    delete row.conflictServer;
    delete row.rejectedReason;
    if (entity === 'attachment') {
      row.uploadedAt = typeof record.data.uploadedAt === 'string' ? record.data.uploadedAt : null;
      row.receivedBytes = Number(record.data.receivedBytes ?? 0);
    }
    if (entity === 'scan') row.serverCheck = serverCheckOf(record.data);
    if (entity === 'escalation') row.serverState = escalationServerStateOf(record.data);
    await table.put(row);
    return 'stored';
  });
}
