import type { Role } from '@siteband/shared';
import type { ObjectLiteral, SelectQueryBuilder } from 'typeorm';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { ChangeRejected, type ChangeContext } from '../sync/sync-handler';
import { Case } from './case.entity';

/**
 * Who may see cases: inspectors their own, supervisors and safety officers all of them. Administrators
 * manage users only and see no cases. The one place these rules live.
 */
export const CASE_READER_ROLES = ['inspector', 'supervisor', 'safety_officer'] as const satisfies readonly Role[];

/** Only inspectors change cases (and everything below them) through sync. */
export const CASE_WRITER_ROLES = ['inspector'] as const satisfies readonly Role[];

/** Supervisors decide in the review (decisions, return, sign-off, reopen). */
export const REVIEWER_ROLES = ['supervisor'] as const satisfies readonly Role[];

/** The review queue is read by supervisors, and by safety officers following dangerous findings. */
export const QUEUE_READER_ROLES = ['supervisor', 'safety_officer'] as const satisfies readonly Role[];

/** True when the user sees every case, not just their own. */
export function readsAllCases(user: AuthenticatedUser): boolean {
  return user.role === 'supervisor' || user.role === 'safety_officer';
}

/** Limits a query to rows of cases the user may see; `caseColumn` is the aliased column holding the case id. */
export function whereCaseVisible<T extends ObjectLiteral>(
  query: SelectQueryBuilder<T>,
  caseColumn: string,
  user: AuthenticatedUser,
): SelectQueryBuilder<T> {
  if (readsAllCases(user)) return query;
  if (user.role !== 'inspector') return query.andWhere('1 = 0');
  return query.andWhere(`${caseColumn} IN (SELECT c.id FROM cases c WHERE c.inspectorId = :visibleTo)`, { visibleTo: user.id });
}

/** True when this case is one the user may see. */
export function canSeeCase(user: AuthenticatedUser, row: Case): boolean {
  return readsAllCases(user) || (user.role === 'inspector' && row.inspectorId === user.id);
}

/**
 * The case a change below it belongs to, when the user may write there: their own, not deleted, and open
 * (a submitted case is frozen until the inspector reopens it).
 */
export async function writableCase(ctx: ChangeContext, caseId: string): Promise<Case> {
  const row = await ctx.rows.findOne(Case, caseId);
  if (!row) throw new ChangeRejected(`Case ${caseId} is not on the server: push the case before what belongs to it`);
  assertOwnCase(row, ctx.user);
  if (row.deletedAt) throw new ChangeRejected(`Case ${caseId} was deleted`);
  if (row.status !== 'open') throw new ChangeRejected(`Case ${caseId} is ${row.status}: reopen it before changing what belongs to it`);
  return row;
}

/** Refuses a write to someone else's case. */
export function assertOwnCase(row: Case, user: AuthenticatedUser): void {
  if (user.role !== 'inspector' || row.inspectorId !== user.id) {
    throw new ChangeRejected(`Case ${row.id} belongs to another inspector: only its own inspector can change it`);
  }
}
