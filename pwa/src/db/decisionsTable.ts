import type { Decision } from '../features/review/types';

/** One review decision as pulled (entity `decision`, written by supervisors, never pushed), with the server's row version. */
export interface DecisionRow extends Decision {
  version: number;
}

/** Dexie index spec: id, and the case for one lookup per case page. */
export const decisionsSchema = 'id, caseId';
