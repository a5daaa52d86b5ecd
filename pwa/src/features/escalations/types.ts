/** Escalation states (the glossary's raised → acknowledged → closed). */
export const ESCALATION_STATUSES = ['raised', 'acknowledged', 'closed'] as const;
export type EscalationStatus = (typeof ESCALATION_STATUSES)[number];

/** What the safety officer did on acknowledging. */
export const ESCALATION_ACTIONS = ['evacuation_advised', 'ppe_required', 'specialist_team_called', 'no_action'] as const;
export type EscalationAction = (typeof ESCALATION_ACTIONS)[number];

/** US EPA levels of protection (from memory), asked for with `ppe_required`. */
export const PPE_LEVELS = ['A', 'B', 'C', 'D'] as const;
export type PpeLevel = (typeof PPE_LEVELS)[number];

export interface Person {
  id: string;
  displayName: string;
}

/** An escalation as `GET /api/escalations` lists it (api/README.md). */
export interface Escalation {
  id: string;
  /** Send back as baseVersion to acknowledge or close. */
  version: number;
  status: EscalationStatus;
  caseId: string;
  scanId: string | null;
  siteName: string;
  address: string | null;
  inspector: Person;
  raisedAt: string;
  receivedAt: string;
  reason: string;
  hazardClasses: string[];
  /** Names of the escalated scan's likely compounds, best first. */
  compounds: string[];
  acknowledgedBy: string | null;
  acknowledgedByName: string | null;
  acknowledgedAt: string | null;
  actionTaken: EscalationAction | null;
  ppeLevel: PpeLevel | null;
  ackComment: string | null;
  closedBy: string | null;
  closedAt: string | null;
  closeComment: string | null;
  notifiedCount: number;
  nextNotifyAt: string | null;
  secondContactNotifiedAt: string | null;
}

export interface EscalationNote {
  id: string;
  escalationId: string;
  caseId: string;
  text: string;
  authorId: string;
  authorName: string;
  at: string;
}

/** `GET /api/escalations/:id`: the escalation, its notes (oldest first) and its case in brief. */
export interface EscalationDetail extends Escalation {
  notes: EscalationNote[];
  case: {
    id: string;
    siteName: string;
    address: string | null;
    status: string;
    startedAt: string;
    latitude: number | null;
    longitude: number | null;
    inspector: Person;
  };
}

export interface EscalationPage {
  items: Escalation[];
  total: number;
  page: number;
  pageSize: number;
}

export interface AcknowledgeInput {
  actionTaken: EscalationAction;
  ppeLevel?: PpeLevel;
  comment?: string;
  baseVersion: number;
}

export interface CloseInput {
  comment: string;
  baseVersion: number;
}
