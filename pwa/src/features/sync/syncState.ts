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

/**
 * Recomputes and stores a record's sync state, with `changes` to its row written in the same update (one
 * write per step, none when nothing differs); call inside the transaction that changed its outbox.
 */
export async function refreshSyncState(db: SitebandDb, entity: CaptureEntity, id: string, changes: Record<string, unknown> = {}): Promise<void> {
  const table = tableFor(db, entity);
  const stored = await table.get(id);
  if (!stored) return;
  const row = { ...stored, ...changes } as CaptureRow<unknown>;
  const entries = await entriesFor(db, entity, id);
  // A photo is on server only once its bytes are there too, not just its metadata.
  const photo = entity === 'attachment' ? (row as PhotoRow) : undefined;
  const sync = deriveSyncState(row, entries, photo ? bytesState(photo) : 'none');
  const rejectedReason = entries.find((e) => e.status === 'rejected')?.lastError ?? photo?.uploadRefused ?? undefined;
  const unchanged = (Object.keys(changes) as (keyof typeof stored)[]).every((key) => sameValue(stored[key], changes[key]));
  if (unchanged && stored.sync === sync && stored.rejectedReason === rejectedReason) return;
  // A put of the row in hand rather than an update, which would read it again.
  await table.put({ ...row, sync, rejectedReason });
}

/** True when a stored field already holds the value (compared as JSON: the values are plain data). */
function sameValue(a: unknown, b: unknown): boolean {
  return a === b || JSON.stringify(a) === JSON.stringify(b);
}

/** True when nothing the tablet holds waits for the server (no outbox entry, no photo bytes left to upload). */
export async function everythingSynced(db: SitebandDb): Promise<boolean> {
  if ((await db.outbox.count()) > 0) return false;
  return (await db.photos.filter((p) => p.bytesHeld === true && p.uploadedAt === null).count()) === 0;
}
