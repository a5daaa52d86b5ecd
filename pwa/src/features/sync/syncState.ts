import type { SitebandDb } from '../../db/db';
import type { CaptureEntity, CaptureRow, SyncState } from '../../db/captureRecord';
import type { OutboxRow } from '../../db/outboxTable';
import type { PhotoRow } from '../../db/photosTable';
import { tableFor } from './captureTables';

/**
 * The state a record shows, from its outbox entries (PROTOCOL.md "Sync states on the tablet"):
 * conflict wins, then anything in flight, then anything never answered; a rejected change leaves
 * the record on server in its earlier version, or local only when the server never had it.
 */
export function deriveSyncState(row: Pick<CaptureRow<unknown>, 'version'>, entries: readonly OutboxRow[], bytes: 'none' | 'pending' | 'refused' = 'none'): SyncState {
  if (entries.some((e) => e.status === 'conflict')) return 'conflict';
  if (entries.some((e) => e.status === 'sending')) return 'sending';
  if (entries.some((e) => e.status === 'pending')) return 'local';
  if (row.version === null || bytes === 'refused') return 'local';
  return bytes === 'pending' ? 'sending' : 'server';
}

/** Where an attachment's bytes stand: still to upload, refused by the server, or nothing waiting. */
function bytesState(photo: PhotoRow): 'none' | 'pending' | 'refused' {
  if (photo.uploadedAt !== null || !photo.bytesHeld) return 'none';
  return photo.uploadRefused === undefined ? 'pending' : 'refused';
}

/** The outbox entries of one record, oldest first. */
export function entriesFor(db: SitebandDb, entity: CaptureEntity, id: string): Promise<OutboxRow[]> {
  return db.outbox.where('[entity+id]').equals([entity, id]).sortBy('seq');
}

/** Recomputes and stores a record's sync state; call inside the transaction that changed its outbox. */
export async function refreshSyncState(db: SitebandDb, entity: CaptureEntity, id: string): Promise<void> {
  const table = tableFor(db, entity);
  const row = await table.get(id);
  if (!row) return;
  const entries = await entriesFor(db, entity, id);
  // A photo is on server only once its bytes are there too, not just its metadata.
  const photo = entity === 'attachment' ? (row as PhotoRow) : undefined;
  const rejected = entries.find((e) => e.status === 'rejected')?.lastError ?? photo?.uploadRefused;
  await table.update(id, { sync: deriveSyncState(row, entries, photo ? bytesState(photo) : 'none'), rejectedReason: rejected ?? undefined });
}

/** True when nothing the tablet holds waits for the server (no outbox entry, no photo bytes left to upload). */
export async function everythingSynced(db: SitebandDb): Promise<boolean> {
  if ((await db.outbox.count()) > 0) return false;
  return (await db.photos.filter((p) => p.bytesHeld === true && p.uploadedAt === null).count()) === 0;
}
