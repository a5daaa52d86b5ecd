import type { SitebandDb } from '../../db/db';
import type { OutboxRow } from '../../db/outboxTable';
import type { ApiClient } from '../api/client';
import { applyResult } from './applyResult';
import { captureScope, tableFor } from './captureTables';
import { refusalReason } from './refusal';
import { refreshSyncState } from './syncState';
import { MAX_BATCH, type ChangeEnvelope, type ChangeResult } from './syncTypes';

/**
 * The next batch: outbox order (the order the inspector made the changes, so a case comes before
 * its samples and a submit after the samples it covers), at most one change per record, since a
 * record's next change needs the version the previous one gets.
 */
export async function nextBatch(db: SitebandDb, limit = MAX_BATCH): Promise<OutboxRow[]> {
  const seen = new Set<string>();
  const batch: OutboxRow[] = [];
  await db.outbox.orderBy('seq').each((entry) => {
    const key = `${entry.entity}:${entry.id}`;
    if (seen.has(key)) return;
    seen.add(key);
    if (batch.length < limit && (entry.status === 'pending' || entry.status === 'sending')) batch.push(entry);
  });
  return batch;
}

/**
 * Fixes each change's base version when it is first sent and marks it sending, so a re-send after a
 * lost answer carries exactly the same envelope and the server answers `duplicate`.
 */
async function markSending(db: SitebandDb, batch: OutboxRow[]): Promise<ChangeEnvelope[]> {
  return db.transaction('rw', captureScope(db), async () => {
    const envelopes: ChangeEnvelope[] = [];
    for (const entry of batch) {
      let baseVersion = entry.baseVersion;
      if (entry.status === 'pending') baseVersion = (await tableFor(db, entry.entity).get(entry.id))?.version ?? null;
      await db.outbox.update(entry.seq!, { status: 'sending', baseVersion, attempts: entry.attempts + 1 });
      await refreshSyncState(db, entry.entity, entry.id);
      envelopes.push({ changeId: entry.changeId, entity: entry.entity, op: entry.op, id: entry.id, baseVersion, ...(entry.op === 'upsert' ? { data: entry.data } : {}) });
    }
    return envelopes;
  });
}

/** Notes a failed delivery on the changes of the batch; they stay sending, to be re-sent unchanged. */
async function noteFailure(db: SitebandDb, batch: OutboxRow[], message: string): Promise<void> {
  await db.outbox.bulkUpdate(batch.map((entry) => ({ key: entry.seq!, changes: { lastError: message } })));
}

/** Marks a change the server refused as a request (too large, malformed) as rejected, with its reason. */
async function refuse(db: SitebandDb, entry: OutboxRow, reason: string): Promise<void> {
  await db.transaction('rw', captureScope(db), async () => {
    await db.outbox.update(entry.seq!, { status: 'rejected', lastError: reason });
    if (entry.op === 'delete') await tableFor(db, entry.entity).update(entry.id, { deletePending: undefined });
    await refreshSyncState(db, entry.entity, entry.id);
  });
}

/**
 * Sends one batch and acts on the answers. When the server refuses the batch as a whole (400, 413:
 * one change too large or malformed), the batch is split in halves, in order, until the refused
 * change is alone: it is marked rejected with the server's reason and every other change goes through.
 * A passing failure (no connection, 5xx) leaves the batch sending and is thrown, for the engine's backoff.
 */
async function deliver(db: SitebandDb, api: ApiClient, clientId: string, batch: OutboxRow[]): Promise<number> {
  const changes = await markSending(db, batch);
  let results: ChangeResult[];
  try {
    ({ results } = await api.request<{ results: ChangeResult[] }>('/api/sync/push', {
      method: 'POST',
      body: { clientId, batchId: crypto.randomUUID(), changes },
    }));
  } catch (error) {
    const reason = refusalReason(error);
    if (reason === undefined) {
      await noteFailure(db, batch, error instanceof Error ? error.message : String(error));
      throw error;
    }
    if (batch.length === 1) {
      await refuse(db, batch[0], reason);
      return 1;
    }
    const half = Math.ceil(batch.length / 2);
    return (await deliver(db, api, clientId, batch.slice(0, half))) + (await deliver(db, api, clientId, batch.slice(half)));
  }
  const byChange = new Map(results.map((r) => [r.changeId, r]));
  let unanswered = 0;
  for (const entry of batch) {
    const result = byChange.get(entry.changeId);
    if (result) await applyResult(db, entry, result);
    else unanswered += 1;
  }
  // Sending the rest again at once would loop for as long as the server keeps leaving them out.
  if (unanswered > 0) throw new Error(`The server answered ${batch.length - unanswered} of ${batch.length} changes; the others are sent again later`);
  return results.length;
}

/** Pushes the outbox in batches until nothing sendable is left; returns how many changes were answered. */
export async function pushOutbox(db: SitebandDb, api: ApiClient, clientId: string): Promise<number> {
  let answered = 0;
  for (let batch = await nextBatch(db); batch.length > 0; batch = await nextBatch(db)) answered += await deliver(db, api, clientId, batch);
  return answered;
}
