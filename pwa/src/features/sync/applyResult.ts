import type { SitebandDb } from '../../db/db';
import type { OutboxRow } from '../../db/outboxTable';
import { captureScope, removeRecord } from './captureTables';
import { refreshSyncState } from './syncState';
import type { ChangeResult } from './syncTypes';

/**
 * Acts on the server's answer to one change, in one transaction with the record. A duplicate is
 * treated as the first answer it stands for. Only an applied change leaves the outbox, and an applied
 * delete takes the record with it.
 */
export async function applyResult(db: SitebandDb, entry: OutboxRow, result: ChangeResult): Promise<void> {
  const status = result.status === 'duplicate' ? (result.firstStatus ?? 'applied') : result.status;
  await db.transaction('rw', captureScope(db), async () => {
    if (status === 'applied' && entry.op === 'delete') {
      // The server confirmed the delete: only now does the record leave the tablet.
      await db.outbox.delete(entry.seq!);
      await removeRecord(db, entry.entity, entry.id);
      return;
    } else if (status === 'applied') {
      await db.outbox.delete(entry.seq!);
      await refreshSyncState(db, entry.entity, entry.id, result.version !== undefined ? { version: result.version } : {});
    } else if (status === 'conflict') {
      await db.outbox.update(entry.seq!, { status: 'conflict', lastError: result.reason ?? null });
      // A duplicate of a conflict carries no server copy: the next pull brings it.
      await refreshSyncState(db, entry.entity, entry.id, result.server ? { conflictServer: result.server } : {});
    } else {
      await db.outbox.update(entry.seq!, { status: 'rejected', lastError: result.reason ?? 'Refused by the server' });
      // A refused delete brings the record back, with the reason shown on it.
      await refreshSyncState(db, entry.entity, entry.id, entry.op === 'delete' ? { deletePending: undefined } : {});
    }
  });
}
