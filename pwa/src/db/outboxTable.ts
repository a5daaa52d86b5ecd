import type { CaptureEntity } from './captureRecord';

/**
 * pending: never sent, may still be folded into by a later edit; sending: sent at least once and
 * not answered (re-sent with the same changeId); conflict / rejected: answered, kept until the
 * inspector acts, never re-sent under the same changeId.
 */
export type OutboxStatus = 'pending' | 'sending' | 'conflict' | 'rejected';

/** One change waiting for the server's answer. Removed only once the server applied it. */
export interface OutboxRow {
  seq?: number;
  changeId: string;
  entity: CaptureEntity;
  op: 'upsert' | 'delete';
  id: string;
  /** Fixed when the change is first sent; null for a record the server never confirmed. */
  baseVersion: number | null;
  data: Record<string, unknown>;
  status: OutboxStatus;
  attempts: number;
  lastError: string | null;
  /** Epoch milliseconds. */
  createdAt: number;
}

/** Dexie index spec: sequence (the order changes were made), changeId, and the record it changes. */
export const outboxSchema = '++seq, &changeId, [entity+id], status';
