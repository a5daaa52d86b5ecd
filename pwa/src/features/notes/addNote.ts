import type { SitebandDb } from '../../db/db';
import type { NoteRow } from '../../db/notesTable';
import { recordUpsert } from '../sync/recordChange';

/** A note's text as stored: trimmed, not empty, at most 5000 characters (throws otherwise). */
function noteText(text: string): string {
  const trimmed = text.trim();
  if (!trimmed) throw new RangeError('A site note needs some text');
  if (trimmed.length > 5000) throw new RangeError('A site note holds at most 5000 characters');
  return trimmed;
}

/** Adds a timestamped site note to a case, or to one of its samples. */
export async function addNote(db: SitebandDb, caseId: string, sampleId: string | null, text: string, at = new Date()): Promise<string> {
  const id = crypto.randomUUID();
  await recordUpsert(db, { entity: 'note', id, caseId, data: { caseId, sampleId, text: noteText(text), recordedAt: at.toISOString() } });
  return id;
}

/** Replaces a site note's text; it keeps its time, case and sample. */
export async function editNote(db: SitebandDb, note: NoteRow, text: string): Promise<void> {
  await recordUpsert(db, { entity: 'note', id: note.id, caseId: note.caseId, data: { ...note.data, text: noteText(text) } });
}
