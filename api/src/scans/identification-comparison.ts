import { asArray, asNumber, asObject } from './json-reading';
import { jsonDifferences, type ValueDifference } from './json-differences';
import type { ParametersSource } from './recompute-request';

/** Likely compounds compared by id and order, best first. */
export const COMPARED_CANDIDATES = 5;
/** Band agreements further apart than this disagree: the same code on the same bytes gives the same number. */
export const SCORE_TOLERANCE = 1e-6;
/** Peak positions further apart than this disagree, cm⁻¹ (well below any instrument's resolution). */
export const PEAK_POSITION_TOLERANCE_CM1 = 0.01;
/** Processing settings listed at most when the server's differ from the tablet's. */
const MAX_PROCESSING_DIFFERENCES = 20;

/** How the server's recomputation of a scan differs from the tablet's result (stored as the scan's `mismatch`). */
export interface ResultComparison {
  parametersFrom: ParametersSource;
  /** One sentence per disagreement, for the supervisor; empty when the results agree. */
  differences: string[];
  /** Remarks that are not disagreements by themselves (defaults used, settings not applied). */
  notes: string[];
  /** Set when the two ranked against different compound libraries; then candidates and scores are not compared. */
  libraryVersion: { tablet: string | null; server: string | null } | null;
  methodVersion: { tablet: string | null; server: string | null } | null;
  candidates: { tablet: (string | null)[]; server: (string | null)[] } | null;
  scores: { id: string; tablet: number | null; server: number | null }[];
  peaks: { tabletCount: number; serverCount: number; moved: { tabletCm1: number | null; serverCm1: number | null }[] } | null;
  /** The tablet's recorded processing settings where the server's run used other values. */
  processing: ValueDifference[];
}

/** The comparison, and the flag: true on any disagreement, null when the tablet sent no result to compare. */
export interface ComparisonOutcome {
  mismatch: boolean | null;
  comparison: ResultComparison;
}

/**
 * Compares the tablet's identification of a scan with the server's: library and ranking-method
 * versions, the top likely compounds in order, their band agreements and the peak list. Another
 * library is reported as such (a note and `libraryVersion`), not as a disagreement. It only
 * describes; the tablet's result is never replaced.
 */
export function compareIdentifications(
  tablet: Record<string, unknown> | null,
  server: Record<string, unknown>,
  parametersFrom: ParametersSource,
): ComparisonOutcome {
  const comparison: ResultComparison = {
    parametersFrom,
    differences: [],
    notes: [],
    libraryVersion: null,
    methodVersion: null,
    candidates: null,
    scores: [],
    peaks: null,
    processing: [],
  };
  if (parametersFrom === 'defaults') comparison.notes.push('The tablet recorded no processing settings: the server used the pipeline defaults');
  if (!tablet) {
    comparison.notes.push('The tablet sent no result: there is nothing to compare');
    return { mismatch: null, comparison };
  }
  const sameLibrary = compareVersions(tablet, server, comparison);
  // Likely compounds ranked against different libraries differ for that reason alone: reported as
  // another library, not as a mismatch of the identification. The peaks do not depend on the library.
  if (sameLibrary) compareCandidates(tablet, server, comparison);
  comparePeaks(tablet, server, comparison);
  if (parametersFrom === 'tablet') {
    comparison.processing = jsonDifferences(tablet.processing, server.processing, MAX_PROCESSING_DIFFERENCES);
    if (comparison.processing.length > 0) {
      const paths = comparison.processing.map((d) => d.path).join(', ');
      comparison.notes.push(`The server's processing differs from the tablet's recorded settings at: ${paths}`);
    }
  }
  return { mismatch: comparison.differences.length > 0, comparison };
}

/** Compares the library and ranking-method versions; false when the two name different libraries (candidates are then not compared). */
function compareVersions(tablet: Record<string, unknown>, server: Record<string, unknown>, out: ResultComparison): boolean {
  const library = { tablet: libraryLabel(tablet.libraryVersion), server: libraryLabel(server.libraryVersion) };
  const unrecorded = library.tablet === null || library.server === null;
  if (unrecorded) {
    // A result that does not say which library ranked it cannot be told apart from another library.
    out.libraryVersion = library;
    out.differences.push(`Compound library not recorded: tablet ${library.tablet ?? 'not recorded'}, server ${library.server ?? 'not recorded'}`);
  } else if (library.tablet !== library.server) {
    out.libraryVersion = library;
    out.notes.push(`Compound library differs: tablet ${library.tablet}, server ${library.server}; the likely compounds were ranked against different libraries and are not compared`);
  }
  const method = { tablet: methodVersion(tablet), server: methodVersion(server) };
  if (method.tablet !== method.server) {
    out.methodVersion = method;
    out.differences.push(`Ranking method version differs: tablet ${method.tablet ?? 'not recorded'}, server ${method.server ?? 'not recorded'}`);
  }
  return unrecorded || library.tablet === library.server;
}

function compareCandidates(tablet: Record<string, unknown>, server: Record<string, unknown>, out: ResultComparison): void {
  const tabletTop = topCandidates(tablet);
  const serverAll = asArray(server.candidates).map(asObject);
  const serverTop = topCandidates(server);
  const ids = { tablet: tabletTop.map((c) => candidateId(c)), server: serverTop.map((c) => candidateId(c)) };
  if (ids.tablet.length !== ids.server.length || ids.tablet.some((id, i) => id !== ids.server[i])) {
    out.candidates = ids;
    out.differences.push(`Top likely compounds differ: tablet ${listed(ids.tablet)}; server ${listed(ids.server)}`);
  }
  for (const candidate of tabletTop) {
    const id = candidateId(candidate);
    const match = serverAll.find((c) => id !== null && candidateId(c) === id);
    if (id === null || !match) continue;
    const scores = { tablet: asNumber(candidate?.score), server: asNumber(match.score) };
    if (scores.tablet === null || scores.server === null || Math.abs(scores.tablet - scores.server) > SCORE_TOLERANCE) {
      out.scores.push({ id, ...scores });
      out.differences.push(`Band agreement of ${id} differs: tablet ${scores.tablet ?? 'not recorded'}, server ${scores.server ?? 'not recorded'}`);
    }
  }
}

function comparePeaks(tablet: Record<string, unknown>, server: Record<string, unknown>, out: ResultComparison): void {
  const tabletX = asArray(tablet.peaks).map((p) => asNumber(asObject(p)?.x));
  const serverX = asArray(server.peaks).map((p) => asNumber(asObject(p)?.x));
  if (tabletX.length !== serverX.length) {
    out.peaks = { tabletCount: tabletX.length, serverCount: serverX.length, moved: [] };
    out.differences.push(`Peak count differs: tablet ${tabletX.length}, server ${serverX.length}`);
    return;
  }
  const moved = tabletX
    .map((x, i) => ({ tabletCm1: x, serverCm1: serverX[i] }))
    .filter(({ tabletCm1, serverCm1 }) => tabletCm1 === null || serverCm1 === null || Math.abs(tabletCm1 - serverCm1) > PEAK_POSITION_TOLERANCE_CM1);
  if (moved.length > 0) {
    out.peaks = { tabletCount: tabletX.length, serverCount: serverX.length, moved };
    out.differences.push(`${moved.length} peak position(s) differ by more than ${PEAK_POSITION_TOLERANCE_CM1} cm⁻¹`);
  }
}

/** A library version as one comparable label: a plain string, or `version (contentHash)` of the shared record. */
function libraryLabel(value: unknown): string | null {
  if (typeof value === 'string') return value;
  const record = asObject(value);
  if (typeof record?.version !== 'string') return null;
  return typeof record.contentHash === 'string' ? `${record.version} (${record.contentHash})` : record.version;
}

function methodVersion(result: Record<string, unknown>): string | null {
  const version = asObject(result.parameters)?.methodVersion;
  return typeof version === 'string' ? version : null;
}

function topCandidates(result: Record<string, unknown>): (Record<string, unknown> | null)[] {
  return asArray(result.candidates).slice(0, COMPARED_CANDIDATES).map(asObject);
}

function candidateId(candidate: Record<string, unknown> | null): string | null {
  return typeof candidate?.id === 'string' ? candidate.id : null;
}

function listed(ids: (string | null)[]): string {
  return ids.length ? ids.map((id) => id ?? '(no id)').join(', ') : 'none';
}
