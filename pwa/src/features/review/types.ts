/** What the review routes send and take (api/README.md, "Review"). */
import type { CaseStatus, DecisionKind } from '@siteband/shared';

/** Hazard rank of a case: 3 escalation, 2 signal word Danger, 1 Warning, 0 none (the rule lives in shared). */
export type HazardRank = 0 | 1 | 2 | 3;

/** One row of the review queue. */
export interface QueueItem {
  caseId: string;
  siteName: string;
  address: string | null;
  status: CaseStatus;
  inspector: { id: string; displayName: string };
  startedAt: string;
  submittedAt: string | null;
  highestHazard: { rank: HazardRank; label: string };
  likelyCompounds: { id: string; name: string }[];
  samples: number;
  scans: number;
  openEscalations: number;
  version: number;
}

/** One page of the queue. */
export interface QueuePage {
  items: QueueItem[];
  total: number;
  page: number;
  pageSize: number;
}

/** A decision as sent. */
export interface DecisionInput {
  kind: DecisionKind;
  scanId?: string;
  compoundId?: string;
  reason?: string;
  comment?: string;
  /** The case's version the supervisor saw; a newer one answers 409. */
  baseVersion: number;
}

/** One revision of the case's decisions (append-only, numbered per case), as the review routes send it and tablets pull it. */
export interface Decision {
  id: string;
  caseId: string;
  /** Null for a decision about the whole case. */
  scanId: string | null;
  kind: DecisionKind;
  compoundId: string | null;
  compoundName: string | null;
  reason: string | null;
  comment: string | null;
  /** 1, 2, 3… per case; which of them are in force is the shared `decisionsInForce`. */
  revision: number;
  decidedBy: string;
  decidedByName: string;
  decidedAt: string;
}

/** A decision in a case's bundle, marked by the server when it was made on an earlier submission. */
export interface BundleDecision extends Decision {
  /** Made before a return the inspector has answered by submitting again: history, it does not count towards sign-off. */
  earlier: boolean;
}

/** The answer to a decision: the decision and the case's new status and version. */
export interface DecisionResult {
  decision: Decision;
  case: { id: string; status: CaseStatus; version: number };
}

/** A server record as the web views send it: id, version, server times and the record's fields in one object. */
export type FlatRecord = Record<string, unknown> & { id: string; version: number };

/** Everything of one case for its review page. */
export interface CaseBundle {
  case: FlatRecord & { siteName: string; status: CaseStatus; startedAt: string; inspectorId?: string };
  /** Samples, each with its hand-overs as `handovers`. */
  samples: FlatRecord[];
  scans: FlatRecord[];
  notes: FlatRecord[];
  attachments: FlatRecord[];
  escalations: FlatRecord[];
  decisions: BundleDecision[];
  /** The current decision of each scan decided on the latest submission (its highest revision since then), by scan id. */
  currentDecisions: Record<string, Decision>;
}
