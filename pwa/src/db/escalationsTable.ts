import type { EscalationAction, EscalationStatus, PpeLevel } from '../features/escalations/types';
import type { CaptureRow } from './captureRecord';

/** An escalation as the tablet raises it (PROTOCOL.md, entity `escalation`). */
export interface EscalationData {
  caseId: string;
  scanId: string | null;
  raisedAt: string;
  reason: string;
  hazardClasses: string[];
}

/** What the safety officer's workflow wrote on the server (kept apart from the tablet's data). */
export interface EscalationServerState {
  status: EscalationStatus;
  acknowledgedByName: string | null;
  acknowledgedAt: string | null;
  actionTaken: EscalationAction | null;
  ppeLevel: PpeLevel | null;
  ackComment: string | null;
  closedAt: string | null;
  closeComment: string | null;
}

/** One row of the `escalations` table. */
export interface EscalationRow extends CaptureRow<EscalationData> {
  /** Absent until a pull brought the server's copy. */
  serverState?: EscalationServerState;
}
