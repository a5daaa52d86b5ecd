import type { SitebandDb } from '../../db/db';
import { recordUpsert } from '../sync/recordChange';

/** Adds a timestamped site note to a case, or to one of its samples. */
export async function addNote(db: SitebandDb, caseId: string, sampleId: string | null, text: string, at = new Date()): Promise<string> {
  const trimmed = text.trim();
  if (!trimmed) throw new RangeError('A site note needs some text');
  if (trimmed.length > 5000) throw new RangeError('A site note holds at most 5000 characters');
  const id = crypto.randomUUID();
  await recordUpsert(db, { entity: 'note', id, caseId, data: { caseId, sampleId, text: trimmed, recordedAt: at.toISOString() } });
  return id;
}
