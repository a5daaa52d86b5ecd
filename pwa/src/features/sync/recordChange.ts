import type { SitebandDb } from '../../db/db';
import type { CaptureEntity, CaptureRow } from '../../db/captureRecord';
import { captureScope, removeRecord, tableFor } from './captureTables';
import { entriesFor, refreshSyncState } from './syncState';

/** What a screen hands over when the inspector saves a record. */
export interface RecordEdit<D> {
  entity: CaptureEntity;
  id: string;
  caseId: string;
  data: D;
  /** Extra columns of the row (an attachment's upload state); not sent in the change. */
  extra?: Record<string, unknown>;
  /** An attachment's file, kept in `attachmentBytes` beside the row; never sent in the change. */
  bytes?: ArrayBuffer;
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
      ...(edit.bytes ? { bytesHeld: true } : {}),
    };
    await table.put({ ...existing, ...row } as CaptureRow<unknown>);
    if (edit.bytes) await db.attachmentBytes.put({ id: edit.id, bytes: edit.bytes });
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

/** Records the tablet never deletes (PROTOCOL.md): the chain of custody, instrument checks and escalations. */
const PERMANENT: ReadonlySet<CaptureEntity> = new Set(['handover', 'instrumentCheck', 'escalation']);

/** Thrown for a delete the tablet refuses before anything is written (a permanent record, a raw scan file). */
export class PermanentRecordError extends Error {
  constructor(entity: CaptureEntity) {
    super(`Permanent record (${entity === 'attachment' ? 'raw scan file' : entity}): it is never deleted`);
    this.name = 'PermanentRecordError';
  }
}

/**
 * Deletes a record on the tablet, in one transaction with its change. A record the server never had
 * (no confirmed version, nothing sent) simply goes. Otherwise the record stays, hidden and marked
 * `deletePending`, with a delete change queued after whatever is in flight: it leaves Dexie only when
 * the server confirms the delete, and a refused delete brings it back with the reason. Unsent edits of
 * it are dropped (a delete supersedes them); a conflict is settled in favour of the delete, from the
 * server's version.
 */
export async function recordDelete(db: SitebandDb, entity: CaptureEntity, id: string, now = Date.now()): Promise<void> {
  const table = tableFor(db, entity);
  await db.transaction('rw', captureScope(db), async () => {
    const row = await table.get(id);
    if (!row) throw new Error(`There is no ${entity} ${id} on this tablet to delete`);
    if (PERMANENT.has(entity) || (entity === 'attachment' && (row.data as { kind?: string }).kind === 'raw-scan')) throw new PermanentRecordError(entity);
    if (await dropNeverSent(db, entity, id)) return;
    const entries = await entriesFor(db, entity, id);
    await db.outbox.bulkDelete(entries.filter((e) => e.status !== 'sending').map((e) => e.seq!));
    const version = row.conflictServer?.version ?? row.version;
    await table.put({ ...row, version, conflictServer: undefined, deletePending: true, editedAt: now });
    await db.outbox.add({
      changeId: crypto.randomUUID(),
      entity,
      op: 'delete',
      id,
      baseVersion: null,
      data: {},
      status: 'pending',
      attempts: 0,
      lastError: null,
      createdAt: now,
    });
    await refreshSyncState(db, entity, id);
  });
}

/**
 * Drops a record the server never had (no confirmed version, no change in flight) with its unsent changes,
 * in one transaction; true when it went. Nothing of it is kept, since nothing of it exists anywhere else.
 */
export async function dropNeverSent(db: SitebandDb, entity: CaptureEntity, id: string): Promise<boolean> {
  const table = tableFor(db, entity);
  return db.transaction('rw', captureScope(db), async () => {
    const row = await table.get(id);
    const entries = await entriesFor(db, entity, id);
    if (!row || row.version !== null || entries.some((e) => e.status === 'sending')) return false;
    await db.outbox.bulkDelete(entries.map((e) => e.seq!));
    await removeRecord(db, entity, id);
    return true;
  });
}
