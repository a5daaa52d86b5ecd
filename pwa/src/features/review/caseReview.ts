/** What the case review page reads from a case bundle, and which decisions the case's status allows. */
import type { IdentifyResult } from '@siteband/shared';
import type { CaseStatus } from '@siteband/shared';
import type { RawScanInput } from './useReview';
import type { BundleDecision, CaseBundle, Decision, FlatRecord } from './types';

/**
 * The tablet's stored result as the shared identification result, when it has the shape the result
 * panel reads; null for a scan without one (or from an older tablet).
 */
export function storedIdentifyResult(result: unknown): IdentifyResult | null {
  if (!result || typeof result !== 'object') return null;
  const r = result as Partial<IdentifyResult>;
  const ok =
    (r.technique === 'ir' || r.technique === 'raman') &&
    Array.isArray(r.candidates) &&
    Array.isArray(r.cautions) &&
    Array.isArray(r.reasons) &&
    typeof r.reliable === 'boolean' &&
    typeof r.escalation === 'object' &&
    typeof r.parameters === 'object' &&
    typeof r.libraryVersion === 'object';
  return ok ? (r as IdentifyResult) : null;
}

/** How to read a scan's raw file again, or null when it has none on the server. */
export function rawScanInputOf(scan: FlatRecord): RawScanInput | null {
  if (typeof scan.rawAttachmentId !== 'string' || !scan.rawAttachmentId) return null;
  const processing = (scan.result as { processing?: { atr?: { enabled?: unknown } } | null } | null | undefined)?.processing ?? null;
  return {
    rawAttachmentId: scan.rawAttachmentId,
    technique: scan.technique === 'raman' ? 'raman' : 'ir',
    phase: scan.phase === 'gas' ? 'gas' : 'condensed',
    excitationNm: typeof scan.excitationNm === 'number' ? scan.excitationNm : null,
    atr: processing?.atr?.enabled === true,
    processing,
  };
}

/** The current decision on a scan as the server says it (its highest revision on the latest submission), if any. */
export function currentDecisionOf(bundle: CaseBundle, scanId: string): Decision | null {
  return bundle.currentDecisions[scanId] ?? null;
}

/** The last decision on a scan made on an earlier submission, shown while the scan awaits a fresh one; null otherwise. */
export function earlierDecisionOf(bundle: CaseBundle, scanId: string): BundleDecision | null {
  if (currentDecisionOf(bundle, scanId)) return null;
  return decisionHistory(bundle).find((d) => d.scanId === scanId && d.earlier) ?? null;
}

/** What the supervisor may do now; the server checks the same rules and answers 409/400 otherwise. */
export interface CaseActions {
  /** Accept / replace / needs laboratory confirmation on each scan. */
  decideScans: boolean;
  returnCase: boolean;
  signOff: boolean;
  reopen: boolean;
  /** Scans without a current decision, which keep the case from being signed off. */
  undecidedScanIds: string[];
}

const UNDER_REVIEW: readonly CaseStatus[] = ['submitted', 'in_review'];

export function caseActions(bundle: CaseBundle): CaseActions {
  const status = bundle.case.status;
  const underReview = UNDER_REVIEW.includes(status);
  const undecidedScanIds = bundle.scans.filter((s) => !s.deleted && !currentDecisionOf(bundle, s.id)).map((s) => s.id);
  return {
    decideScans: underReview,
    returnCase: underReview,
    signOff: underReview && undecidedScanIds.length === 0,
    reopen: status === 'accepted',
    undecidedScanIds,
  };
}

/** Records that belong to one parent, by a field naming it. */
export function childrenOf(records: readonly FlatRecord[], field: string, parentId: string): FlatRecord[] {
  return records.filter((r) => r[field] === parentId && !r.deleted);
}

/** Every decision, newest revision first (the decision history). */
export function decisionHistory(bundle: CaseBundle): BundleDecision[] {
  return [...bundle.decisions].sort((a, b) => b.revision - a.revision);
}

/** A sample's hand-overs (nested in the bundle's sample) in time order. */
export function handoversOf(sample: FlatRecord): FlatRecord[] {
  const handovers = Array.isArray(sample.handovers) ? (sample.handovers as FlatRecord[]) : [];
  return [...handovers].sort((a, b) => String(a.at).localeCompare(String(b.at)));
}
