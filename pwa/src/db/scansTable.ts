import type { Phase, Technique } from '@siteband/shared';
import type { CaptureRow } from './captureRecord';

/** A scan as the tablet sends it (PROTOCOL.md, entity `scan`). */
export interface ScanData {
  sampleId: string;
  technique: Technique;
  phase: Phase;
  /** Laser line in nm; null for IR. */
  excitationNm: number | null;
  recordedAt: string;
  instrumentCheckId: string | null;
  rawAttachmentId: string;
  /** Lower-case hex SHA-256 of the raw file, the same value its attachment declares. */
  rawSha256: string;
  /** `{ ...identifyResult, quality, processing, codeVersion }`, the form the server recomputes. */
  result: Record<string, unknown>;
  /** When the inspector acknowledged the caution cards; null until then. */
  inspectorAcknowledgedAt: string | null;
}

/** What the server adds after recomputing the scan from its raw file (kept apart from the tablet's data). */
export interface ScanServerCheck {
  resultMismatch: boolean | null;
  serverRecomputedAt: string | null;
  serverRecomputeError: string | null;
  /** One sentence per difference, as the server wrote them. */
  differences: string[];
  /** The two compound libraries' versions when the server ranked against another one (then the likely compounds are not compared). */
  otherLibrary?: { tablet: string | null; server: string | null };
}

/** One row of the `scans` table. */
export interface ScanRow extends CaptureRow<ScanData> {
  /** Absent until a pull brought the server's recomputation. */
  serverCheck?: ScanServerCheck;
}
