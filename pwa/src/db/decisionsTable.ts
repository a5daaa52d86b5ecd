/** The kinds of review decision (CONTRACT: supervisor's decisions; `return`, `sign_off`, `reopen` are about the whole case). */
export type DecisionKind = 'accept' | 'replace' | 'needs_lab' | 'return' | 'sign_off' | 'reopen';

/** One review decision as pulled (entity `decision`, written by supervisors, never pushed): append-only, numbered per case. */
export interface DecisionRow {
  id: string;
  caseId: string;
  /** Null for a decision about the whole case. */
  scanId: string | null;
  kind: DecisionKind;
  compoundId: string | null;
  compoundName: string | null;
  reason: string | null;
  comment: string | null;
  /** 1, 2, 3… per case; the current decision of a scan is its highest revision. */
  revision: number;
  decidedBy: string;
  decidedByName: string;
  decidedAt: string;
  version: number;
}

/** Dexie index spec: id, and the case for one lookup per case page. */
export const decisionsSchema = 'id, caseId';
