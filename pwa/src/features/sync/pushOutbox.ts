import type { SitebandDb } from '../../db/db';
import type { OutboxRow } from '../../db/outboxTable';
import type { ApiClient } from '../api/client';
import { applyResult } from './applyResult';
import { captureScope, tableFor } from './captureTables';
import { refusalReason } from './refusal';
import { refreshSyncState } from './syncState';
import { MAX_BATCH, type ChangeEnvelope, type ChangeResult } from './syncTypes';

/** The changes of a batch sent to the server and not yet acted on: their records wait out of later batches. */
export interface InFlight {
  /** `entity:id` of each record the batch changes. */
  records: ReadonlySet<string>;
  changeIds: ReadonlySet<string>;
}

const recordKey = (entry: Pick<OutboxRow, 'entity' | 'id'>) => `${entry.entity}:${entry.id}`;

/**
 * The next batch: outbox order (the order the inspector made the changes, so a case comes before
 * its samples and a submit after the samples it covers), at most one change per record, since a
 * record's next change needs the version the previous one gets. With a batch in flight, its changes
 * are left out and the new batch ends before the first later change of one of its records: nothing
 * reaches the server ahead of a change it came after that still waits for its turn.
 */
export async function nextBatch(db: SitebandDb, limit = MAX_BATCH, inFlight?: InFlight): Promise<OutboxRow[]> {
  const seen = new Set<string>();
  const batch: OutboxRow[] = [];
  let cut = false;
  // Read only as far as the batch fills: what lies beyond waits for a later batch anyway.
  await db.outbox
    .orderBy('seq')
    .until(() => cut || batch.length >= limit)
    .each((entry) => {
      const key = recordKey(entry);
      if (inFlight?.records.has(key)) {
        if (!inFlight.changeIds.has(entry.changeId)) cut = true;
        return;
      }
      if (seen.has(key)) return;
      seen.add(key);
      if (entry.status === 'pending' || entry.status === 'sending') batch.push(entry);
    });
  return batch;
}

/** A batch ready to go: its outbox entries and, in the same order, the envelopes sent for them. */
interface Prepared {
  batch: OutboxRow[];
  changes: ChangeEnvelope[];
}

/**
 * Fixes each change's base version when it is first sent and marks it sending, so a re-send after a
 * lost answer carries exactly the same envelope and the server answers `duplicate`.
 */
async function prepare(db: SitebandDb, inFlight?: InFlight): Promise<Prepared> {
  const batch = await nextBatch(db, MAX_BATCH, inFlight);
  if (batch.length === 0) return { batch, changes: [] };
  const changes = await db.transaction('rw', captureScope(db), async () => {
    const sending: OutboxRow[] = [];
    for (const entry of batch) {
      const baseVersion = entry.status === 'pending' ? ((await tableFor(db, entry.entity).get(entry.id))?.version ?? null) : entry.baseVersion;
      sending.push({ ...entry, status: 'sending', baseVersion, attempts: entry.attempts + 1 });
    }
    // The entries in hand, written back in one go (an update of each would read it again first).
    await db.outbox.bulkPut(sending);
    for (const entry of sending) await refreshSyncState(db, entry.entity, entry.id);
    return sending.map(({ changeId, entity, op, id, baseVersion, data }): ChangeEnvelope => ({ changeId, entity, op, id, baseVersion, ...(op === 'upsert' ? { data } : {}) }));
  });
  return { batch, changes };
}

/** What the server said of one change; a change it refused as a request (too large, malformed) is answered rejected. */
interface Answer {
  entry: OutboxRow;
  result: ChangeResult;
}

/** Notes a failed delivery on the changes of the batch; they stay sending, to be re-sent unchanged. */
async function noteFailure(db: SitebandDb, batch: OutboxRow[], message: string): Promise<void> {
  await db.outbox.bulkUpdate(batch.map((entry) => ({ key: entry.seq!, changes: { lastError: message } })));
}

/**
 * Sends one batch and collects the answers. When the server refuses the batch as a whole (400, 413:
 * one change too large or malformed), the batch is split in halves, in order, until the refused
 * change is alone: it is answered refused with the server's reason and every other change goes through.
 * A passing failure (no connection, 5xx) notes the error on the changes not answered, which stay sending, and is thrown.
 */
async function send(db: SitebandDb, api: ApiClient, clientId: string, { batch, changes }: Prepared, answers: Answer[]): Promise<void> {
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
      answers.push({ entry: batch[0], result: { changeId: batch[0].changeId, status: 'rejected', reason } });
      return;
    }
    const half = Math.ceil(batch.length / 2);
    await send(db, api, clientId, { batch: batch.slice(0, half), changes: changes.slice(0, half) }, answers);
    await send(db, api, clientId, { batch: batch.slice(half), changes: changes.slice(half) }, answers);
    return;
  }
  const byChange = new Map(results.map((r) => [r.changeId, r]));
  for (const entry of batch) {
    const result = byChange.get(entry.changeId);
    if (result) answers.push({ entry, result });
  }
}

/**
 * Acts on the answers in one transaction (each record's own step stays all or nothing within it) and
 * returns how many there were. Changes the server left out stay sending; sending them again at once
 * would loop for as long as the server keeps leaving them out, so that is thrown.
 */
async function act(db: SitebandDb, answers: Answer[], sent: number): Promise<number> {
  await db.transaction('rw', captureScope(db), async () => {
    for (const answer of answers) {
      await applyResult(db, answer.entry, answer.result);
    }
  });
  if (answers.length < sent) throw new Error(`The server answered ${answers.length} of ${sent} changes; the others are sent again later`);
  return answers.length;
}

/** Sends a prepared batch; what was answered before a passing failure is acted on before the failure is thrown. */
async function deliver(db: SitebandDb, api: ApiClient, clientId: string, prepared: Prepared): Promise<Answer[]> {
  const answers: Answer[] = [];
  try {
    await send(db, api, clientId, prepared, answers);
  } catch (error) {
    if (answers.length > 0) await act(db, answers, answers.length);
    throw error;
  }
  return answers;
}

/**
 * Pushes the outbox in batches until nothing sendable is left; returns how many changes were answered.
 * Batches reach the server one after the other, in order; while the server works on one, the tablet acts
 * on the answer to the one before and readies the next, so neither side waits on the other's work.
 */
export async function pushOutbox(db: SitebandDb, api: ApiClient, clientId: string): Promise<number> {
  let answered = 0;
  // Acting on the previous answer; the batch after next is readied only once it is done.
  let acting: Promise<void> = Promise.resolve();
  let current = await prepare(db);
  while (current.batch.length > 0) {
    const { batch } = current;
    const inFlight: InFlight = { records: new Set(batch.map(recordKey)), changeIds: new Set(batch.map((e) => e.changeId)) };
    const [sent, following] = await Promise.allSettled([deliver(db, api, clientId, current), acting.then(() => prepare(db, inFlight))]);
    if (sent.status === 'rejected') throw sent.reason;
    if (following.status === 'rejected') {
      // The answer in hand is kept before the earlier failure is thrown.
      await act(db, sent.value, batch.length).catch(() => undefined);
      throw following.reason;
    }
    acting = act(db, sent.value, batch.length).then((n) => {
      answered += n;
    });
    current = following.value;
    if (current.batch.length === 0) {
      // Nothing could go beside the batch in flight (what is left waits on its records): once it is
      // acted on, look again.
      await acting;
      acting = Promise.resolve();
      current = await prepare(db);
    }
  }
  await acting;
  return answered;
}
