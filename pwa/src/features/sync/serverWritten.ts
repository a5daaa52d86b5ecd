import { DECISION_KINDS } from '@siteband/shared';
import type { SitebandDb } from '../../db/db';
import type { ServerRecord } from '../../db/captureRecord';
import type { DecisionRow } from '../../db/decisionsTable';
import type { EscalationNoteRow } from '../../db/escalationNotesTable';
import type { EscalationServerState } from '../../db/escalationsTable';
import { ESCALATION_ACTIONS, ESCALATION_STATUSES, PPE_LEVELS } from '../escalations/types';

/** Entities only the server writes (the tablet pulls them, never pushes them). */
export type ServerWrittenEntity = 'decision' | 'escalationNote';

export function isServerWrittenEntity(entity: string): entity is ServerWrittenEntity {
  return entity === 'decision' || entity === 'escalationNote';
}

/** The tables of the server-written records: pulled in the same transaction, cleared with the capture data. */
export function serverWrittenTables(db: SitebandDb) {
  return [db.decisions, db.escalationNotes];
}

const text = (value: unknown): string | null => (typeof value === 'string' ? value : null);

function oneOf<T extends string>(values: readonly T[], value: unknown): T | null {
  return values.includes(value as T) ? (value as T) : null;
}

/** Stores (or removes, for a tombstone) one pulled decision or escalation note; a malformed one is skipped. */
export async function mergeServerWritten(db: SitebandDb, entity: ServerWrittenEntity, record: ServerRecord): Promise<'stored' | 'skipped'> {
  const { data } = record;
  if (entity === 'decision') {
    if (record.deleted) {
      await db.decisions.delete(record.id);
      return 'stored';
    }
    const kind = oneOf(DECISION_KINDS, data.kind);
    const caseId = text(data.caseId);
    if (!kind || !caseId || typeof data.revision !== 'number') return 'skipped';
    const row: DecisionRow = {
      id: record.id,
      caseId,
      scanId: text(data.scanId),
      kind,
      compoundId: text(data.compoundId),
      compoundName: text(data.compoundName),
      reason: text(data.reason),
      comment: text(data.comment),
      revision: data.revision,
      decidedBy: text(data.decidedBy) ?? '',
      decidedByName: text(data.decidedByName) ?? '',
      decidedAt: text(data.decidedAt) ?? record.createdAt,
      version: record.version,
    };
    await db.decisions.put(row);
    return 'stored';
  }
  if (record.deleted) {
    await db.escalationNotes.delete(record.id);
    return 'stored';
  }
  const escalationId = text(data.escalationId);
  const caseId = text(data.caseId);
  if (!escalationId || !caseId || typeof data.text !== 'string') return 'skipped';
  const note: EscalationNoteRow = {
    id: record.id,
    escalationId,
    caseId,
    text: data.text,
    authorId: text(data.authorId) ?? '',
    authorName: text(data.authorName) ?? '',
    at: text(data.at) ?? record.createdAt,
    version: record.version,
  };
  await db.escalationNotes.put(note);
  return 'stored';
}

/** The safety officer's fields of a pulled escalation (status `raised` when the server sent none). */
export function escalationServerStateOf(data: Record<string, unknown>): EscalationServerState {
  return {
    status: oneOf(ESCALATION_STATUSES, data.status) ?? 'raised',
    acknowledgedByName: text(data.acknowledgedByName),
    acknowledgedAt: text(data.acknowledgedAt),
    actionTaken: oneOf(ESCALATION_ACTIONS, data.actionTaken),
    ppeLevel: oneOf(PPE_LEVELS, data.ppeLevel),
    ackComment: text(data.ackComment),
    closedAt: text(data.closedAt),
    closeComment: text(data.closeComment),
  };
}
