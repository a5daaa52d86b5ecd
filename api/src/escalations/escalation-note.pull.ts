import type { PulledKind } from '../sync/sync-handler';
import { EscalationNote } from './escalation-note.entity';

/** Escalation notes in pulls (entity `escalationNote`); they are written through the escalations routes, never pushed. */
export const escalationNotePull: PulledKind<EscalationNote> = {
  entity: 'escalationNote',
  target: EscalationNote,
  caseColumn: 'caseId',
  toData: (row) => ({
    escalationId: row.escalationId,
    caseId: row.caseId,
    text: row.text,
    authorId: row.authorId,
    authorName: row.authorName,
    at: row.at.toISOString(),
  }),
};
