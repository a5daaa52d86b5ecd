import type { EscalationNote } from '../features/escalations/types';

/** A note a safety officer or supervisor added to an escalation (entity `escalationNote`, pulled only), with its server version. */
export interface EscalationNoteRow extends EscalationNote {
  version: number;
}

/** Dexie index spec: id, the case and the escalation. */
export const escalationNotesSchema = 'id, caseId, escalationId';
