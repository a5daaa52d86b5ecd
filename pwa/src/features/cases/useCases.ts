import { useLiveQuery } from 'dexie-react-hooks';
import { isLive, liveOrNull } from '../../db/captureRecord';
import type { CaseRow } from '../../db/casesTable';
import { captureDb } from './captureDb';

/** A case for the list, with its number of samples. */
export interface CaseListItem {
  row: CaseRow;
  sampleCount: number;
}

/** Live: every case on the tablet with its sample count, newest visit first; undefined while loading. */
export function useCaseList(): CaseListItem[] | undefined {
  return useLiveQuery(async () => {
    const db = captureDb();
    const [cases, samples] = await Promise.all([db.cases.filter(isLive).toArray(), db.samples.filter(isLive).toArray()]);
    const counts = new Map<string, number>();
    for (const sample of samples) counts.set(sample.caseId, (counts.get(sample.caseId) ?? 0) + 1);
    return cases
      .map((row) => ({ row, sampleCount: counts.get(row.id) ?? 0 }))
      .sort((a, b) => b.row.data.startedAt.localeCompare(a.row.data.startedAt));
  });
}

/** Live: one case; undefined while loading, null when the tablet has no such case (or it was deleted here). */
export function useCase(id: string | undefined): CaseRow | null | undefined {
  return useLiveQuery(async () => liveOrNull(id ? await captureDb().cases.get(id) : undefined), [id]);
}
