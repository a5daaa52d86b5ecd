import type { SitebandDb } from '../../db/db';
import type { CaptureEntity } from '../../db/captureRecord';
import { serverCheckOf } from '../scans/serverCheck';
import { captureScope, tableFor, tabletData } from './captureTables';
import { entriesFor, refreshSyncState } from './syncState';

/**
 * Settles a conflict with the inspector's choice. "mine" sends the local record (or its delete) again
 * as a new change (new changeId) built on the server's version; "server" takes the server's record
 * and drops the local edit or delete. Either way the old conflicting change leaves the outbox. A scan is
 * kept or taken whole: its result always travels with its own copy's acknowledgement, never the other's.
 */
export async function resolveConflict(db: SitebandDb, entity: CaptureEntity, id: string, choice: 'mine' | 'server', now = Date.now()): Promise<void> {
  const table = tableFor(db, entity);
  await db.transaction('rw', captureScope(db), async () => {
    const row = await table.get(id);
    const server = row?.conflictServer;
    if (!row || !server) throw new Error(`No conflict to settle on ${entity} ${id}: pull again to fetch the server's copy`);
    const entries = await entriesFor(db, entity, id);
    await db.outbox.bulkDelete(entries.map((e) => e.seq!));
    if (choice === 'server') {
      // A scan taken from the server comes with the server's recomputation of that result, as a pull stores it.
      const extra = entity === 'scan' ? { serverCheck: serverCheckOf(server.data) } : {};
      await table.put({ ...row, ...extra, data: tabletData(entity, server.data), version: server.version, conflictServer: undefined, deletePending: undefined, editedAt: now });
    } else {
      await table.put({ ...row, version: server.version, conflictServer: undefined, editedAt: now });
      const deleting = row.deletePending === true;
      await db.outbox.add({
        changeId: crypto.randomUUID(),
        entity,
        op: deleting ? 'delete' : 'upsert',
        id,
        // Pending: sent with the record's version, which is now the server's.
        baseVersion: null,
        data: deleting ? {} : (row.data as Record<string, unknown>),
        status: 'pending',
        attempts: 0,
        lastError: null,
        createdAt: now,
      });
    }
    await refreshSyncState(db, entity, id);
  });
}
