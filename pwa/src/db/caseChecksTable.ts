import type { CaptureRow } from './captureRecord';

/** An instrument check as the tablet sends it (PROTOCOL.md, entity `instrumentCheck`). */
export interface CaseCheckData {
  caseId: string;
  standardId: string;
  performedAt: string;
  passed: boolean;
  /** One object per reference band: expected and found position, offset, tolerance and its source. */
  offsets: Record<string, unknown>[];
}

/**
 * One row of the `caseChecks` table: a check from `instrumentChecks` (which is not tied to a case)
 * as recorded in the case whose scans relied on it. The server keeps checks per case, so one
 * tablet check becomes one synced record per case.
 */
export interface CaseCheckRow extends CaptureRow<CaseCheckData> {
  /** The `instrumentChecks` row it copies; absent for a check pulled from the server. */
  localCheckId?: number;
}
