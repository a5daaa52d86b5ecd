/** The entities the tablet records in the field and syncs (names as the sync protocol spells them). */
export type CaptureEntity = 'case' | 'sample' | 'handover' | 'note' | 'attachment' | 'scan' | 'escalation' | 'instrumentCheck';

/** A record's sync state as the inspector sees it. */
export type SyncState = 'local' | 'sending' | 'server' | 'conflict';

/** A record as the server holds it (a pull entry, or `server` in a conflict answer). */
export interface ServerRecord {
  entity: string;
  id: string;
  version: number;
  syncSeq: number;
  deleted: boolean;
  createdAt: string;
  updatedAt: string;
  data: Record<string, unknown>;
}

/**
 * The common shape of every field-capture row: the fields the tablet sends (`data`), the last
 * version the server confirmed, and the sync state derived from the outbox. `caseId` is kept
 * beside the data so a case's records are one index lookup (a case's own row holds its id).
 */
export interface CaptureRow<D> {
  id: string;
  caseId: string;
  data: D;
  /** The server's version of the last confirmed change; null until the server confirmed one. */
  version: number | null;
  sync: SyncState;
  /** Why the server refused the latest change, shown on the record until it is fixed. */
  rejectedReason?: string;
  /** The server's copy while a conflict waits for the inspector's choice. */
  conflictServer?: ServerRecord;
  /** Epoch milliseconds of the last local edit. */
  editedAt: number;
  /**
   * Deleted by the inspector, kept (hidden from the lists) until the server confirms the delete: a
   * refused delete brings the record back with the reason.
   */
  deletePending?: true;
}

/** True for a record the inspector has not deleted on the tablet; lists show only these. */
export function isLive(row: Pick<CaptureRow<unknown>, 'deletePending'>): boolean {
  return row.deletePending !== true;
}

/** The row when it is there and live, else null: what a screen showing one record shows. */
export function liveOrNull<R extends Pick<CaptureRow<unknown>, 'deletePending'>>(row: R | undefined): R | null {
  return row && isLive(row) ? row : null;
}

/** Dexie index spec shared by the capture tables: id, the owning case, and edit time for lists. */
export const captureRowSchema = 'id, caseId, editedAt';
