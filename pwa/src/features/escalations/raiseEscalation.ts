import { isHazardClassId } from '@siteband/shared';
import type { SitebandDb } from '../../db/db';
import type { EscalationData } from '../../db/escalationsTable';
import { recordUpsert } from '../sync/recordChange';

/** The longest reason the server keeps (PROTOCOL.md, entity `escalation`). */
export const ESCALATION_REASON_MAX = 2000;

/**
 * Raises an escalation by hand, offline too: stored on the tablet with its change for the server in
 * one transaction, like the escalations a scan raises. Hazard classes are optional (the inspector may
 * not know them yet) but must be ones the product knows. Returns the new escalation's id.
 */
export async function raiseEscalation(
  db: SitebandDb,
  caseId: string,
  input: { reason: string; hazardClasses: readonly string[]; scanId?: string | null },
  at = new Date(),
): Promise<string> {
  const reason = input.reason.trim();
  if (!reason) throw new RangeError('An escalation needs a reason');
  if (reason.length > ESCALATION_REASON_MAX) throw new RangeError(`An escalation's reason holds at most ${ESCALATION_REASON_MAX} characters`);
  const unknown = input.hazardClasses.filter((id) => !isHazardClassId(id));
  if (unknown.length > 0) throw new RangeError(`Unknown hazard class: ${unknown.join(', ')}`);
  const id = crypto.randomUUID();
  const data: EscalationData = { caseId, scanId: input.scanId ?? null, raisedAt: at.toISOString(), reason, hazardClasses: [...new Set(input.hazardClasses)] };
  await recordUpsert(db, { entity: 'escalation', id, caseId, data });
  return id;
}
