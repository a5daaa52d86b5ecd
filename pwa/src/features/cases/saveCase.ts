import type { SitebandDb } from '../../db/db';
import type { CaseData } from '../../db/casesTable';
import { recordUpsert } from '../sync/recordChange';

/** Checks a case before it is stored; returns the problems as i18n keys (empty when fine). */
export function caseProblems(data: CaseData): string[] {
  const problems: string[] = [];
  if (!data.siteName.trim()) problems.push('capture.case.errors.siteName');
  if ((data.latitude === null) !== (data.longitude === null)) problems.push('capture.case.errors.bothCoordinates');
  if (data.latitude !== null && !(Math.abs(data.latitude) <= 90)) problems.push('capture.case.errors.latitude');
  if (data.longitude !== null && !(Math.abs(data.longitude) <= 180)) problems.push('capture.case.errors.longitude');
  if (Number.isNaN(Date.parse(data.startedAt))) problems.push('capture.case.errors.startedAt');
  return problems;
}

/** Stores a new or edited case with its change for the server; throws on invalid data (nothing is written). */
export async function saveCase(db: SitebandDb, id: string, data: CaseData): Promise<void> {
  const problems = caseProblems(data);
  if (problems.length > 0) throw new RangeError(`The case cannot be saved: ${problems.join(', ')}`);
  await recordUpsert(db, { entity: 'case', id, caseId: id, data });
}

/**
 * The status the inspector may move a case to from this one: submit an open case, take a submitted
 * one back, reopen a returned one to fix it. In review and accepted cases are the supervisor's.
 */
export function inspectorNextStatus(status: CaseData['status']): 'open' | 'submitted' | null {
  if (status === 'open') return 'submitted';
  if (status === 'submitted' || status === 'returned') return 'open';
  return null;
}

/** Only open cases take new records (the server freezes a submitted case). */
export function caseIsOpen(data: Pick<CaseData, 'status'>): boolean {
  return data.status === 'open';
}
