import { useLiveQuery } from 'dexie-react-hooks';
import type { EscalationNoteRow } from '../../db/escalationNotesTable';
import type { EscalationRow } from '../../db/escalationsTable';
import type { SampleRow } from '../../db/samplesTable';
import type { ScanRow } from '../../db/scansTable';
import { captureDb } from './captureDb';
import { reviewOutcome, type ReviewOutcome } from './reviewOutcome';

/** A case's review and escalation outcomes as the tablet last pulled them. */
export interface CaseOutcome {
  review: ReviewOutcome;
  escalations: { row: EscalationRow; notes: EscalationNoteRow[] }[];
  scans: ScanRow[];
  samples: SampleRow[];
}

/** Live, offline: the case's decisions read with its status, escalations with their notes, and the scans and samples they name. */
export function useCaseOutcome(caseId: string): CaseOutcome | undefined {
  return useLiveQuery(async () => {
    const db = captureDb();
    const [caseRow, decisions, escalations, notes, scans, samples] = await Promise.all([
      db.cases.get(caseId),
      db.decisions.where('caseId').equals(caseId).toArray(),
      db.escalations.where('caseId').equals(caseId).toArray(),
      db.escalationNotes.where('caseId').equals(caseId).toArray(),
      db.scans.where('caseId').equals(caseId).toArray(),
      db.samples.where('caseId').equals(caseId).toArray(),
    ]);
    if (!caseRow) return undefined;
    return {
      review: reviewOutcome(decisions, caseRow.data.status),
      escalations: escalations
        .sort((a, b) => b.data.raisedAt.localeCompare(a.data.raisedAt))
        .map((row) => ({ row, notes: notes.filter((n) => n.escalationId === row.id).sort((a, b) => a.at.localeCompare(b.at)) })),
      scans,
      samples,
    };
  }, [caseId]);
}
