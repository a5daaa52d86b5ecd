import type { SitebandDb } from '../../db/db';
import type { CaptureEntity, CaptureRow } from '../../db/captureRecord';
import { captureScope, tableFor } from './captureTables';
import { entriesFor, refreshSyncState } from './syncState';

/** What a screen hands over when the inspector saves a record. */
export interface RecordEdit<D> {
  entity: CaptureEntity;
  id: string;
  caseId: string;
  data: D;
  /** Extra columns of the row (a photo's bytes); not sent in the change. */
  extra?: Record<string, unknown>;
}

/**
 * Saves a record and its change for the server in ONE transaction: if the tab closes or the
 * battery dies between the two writes, the tablet would otherwise hold an edit the server never
 * hears of (or a change for a record that is not there). A change not yet sent absorbs the new
 * edit, because upserts carry the whole record and the server must not see two changes built on
 * the same base version.
 */
export async function recordUpsert<D extends object>(db: SitebandDb, edit: RecordEdit<D>, now = Date.now()): Promise<void> {
  const table = tableFor(db, edit.entity);
  await db.transaction('rw', captureScope(db), async () => {
    const existing = await table.get(edit.id);
    const row: CaptureRow<D> = {
      id: edit.id,
      caseId: edit.caseId,
      data: edit.data,
      version: existing?.version ?? null,
      sync: 'local',
      editedAt: now,
      ...(existing?.conflictServer ? { conflictServer: existing.conflictServer } : {}),
      ...edit.extra,
    };
    await table.put({ ...existing, ...row } as CaptureRow<unknown>);
    const entries = await entriesFor(db, edit.entity, edit.id);
    // A refused change is superseded by this whole-record edit; its reason goes with it.
    await db.outbox.bulkDelete(entries.filter((e) => e.status === 'rejected').map((e) => e.seq!));
    const unsent = entries.find((e) => e.status === 'pending');
    if (unsent) {
      await db.outbox.update(unsent.seq!, { data: edit.data as Record<string, unknown> });
    } else {
      await db.outbox.add({
        changeId: crypto.randomUUID(),
        entity: edit.entity,
        op: 'upsert',
        id: edit.id,
        baseVersion: null,
        data: edit.data as Record<string, unknown>,
        status: 'pending',
        attempts: 0,
        lastError: null,
        createdAt: now,
      });
    }
    await refreshSyncState(db, edit.entity, edit.id);
  });
}
