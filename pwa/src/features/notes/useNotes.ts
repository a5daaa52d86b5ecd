import { useLiveQuery } from 'dexie-react-hooks';
import { isLive } from '../../db/captureRecord';
import type { NoteRow } from '../../db/notesTable';
import { captureDb } from '../cases/captureDb';

/** Live: the site notes of a case (sampleId undefined), or of one sample, newest first; deleted ones left out. */
export function useNotes(caseId: string, sampleId?: string): NoteRow[] | undefined {
  return useLiveQuery(async () => {
    const rows = await captureDb().notes.where('caseId').equals(caseId).toArray();
    return rows.filter((n) => isLive(n) && (sampleId === undefined || n.data.sampleId === sampleId)).sort((a, b) => b.data.recordedAt.localeCompare(a.data.recordedAt));
  }, [caseId, sampleId]);
}
