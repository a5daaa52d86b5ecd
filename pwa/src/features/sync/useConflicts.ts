import { useLiveQuery } from 'dexie-react-hooks';
import type { CaptureEntity, CaptureRow } from '../../db/captureRecord';
import { captureDb } from '../cases/captureDb';
import { tableFor } from './captureTables';

/** A record of a case waiting for the inspector's choice between their copy and the server's. */
export interface ConflictItem {
  entity: CaptureEntity;
  row: CaptureRow<unknown>;
}

const ENTITIES: readonly CaptureEntity[] = ['case', 'sample', 'handover', 'note', 'attachment', 'scan'];

/** Live: the conflicts of a case, across all its records. */
export function useConflicts(caseId: string): ConflictItem[] | undefined {
  return useLiveQuery(async () => {
    const db = captureDb();
    const found: ConflictItem[] = [];
    for (const entity of ENTITIES) {
      const rows = await tableFor(db, entity).where('caseId').equals(caseId).toArray();
      for (const row of rows) if (row.sync === 'conflict') found.push({ entity, row });
    }
    return found;
  }, [caseId]);
}
