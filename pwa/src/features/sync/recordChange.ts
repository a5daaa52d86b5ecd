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
 * True when the edit moves a case to another status than its unsent change carries. Such a move is a
 * change of its own, queued after whatever the inspector did in between: absorbing it would send a
 * reopen-then-resubmit as one submit (refused from returned), or a new case as already submitted
 * before its samples (refused too, since only open cases take records).
 */
function movesCaseStatus(edit: RecordEdit<object>, unsentData: Record<string, unknown> | undefined): boolean {
  return edit.entity === 'case' && unsentData?.status !== (edit.data as { status?: unknown }).status;
}

/**
 * Saves a record and its change for the server in ONE transaction: if the tab closes or the
 * battery dies between the two writes, the tablet would otherwise hold an edit the server never
 * hears of (or a change for a record that is not there). A change not yet sent absorbs the new
 * edit, because upserts carry the whole record and the server must not see two changes built on
 * the same base version (the sender takes one change per record per batch, so a queued status move
 * gets the version of the change before it).
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
    const unsent = entries.findLast((e) => e.status === 'pending');
    if (unsent && !movesCaseStatus(edit, unsent.data)) {
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
