import type { CaptureRow } from './captureRecord';

/** An escalation as the tablet raises it (PROTOCOL.md, entity `escalation`). */
export interface EscalationData {
  caseId: string;
  scanId: string | null;
  raisedAt: string;
  reason: string;
  hazardClasses: string[];
}

/** One row of the `escalations` table; the status stays `raised` until the safety officer's workflow. */
export type EscalationRow = CaptureRow<EscalationData>;
