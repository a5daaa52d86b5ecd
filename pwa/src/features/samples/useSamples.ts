import { useLiveQuery } from 'dexie-react-hooks';
import { isLive, liveOrNull } from '../../db/captureRecord';
import type { HandoverRow } from '../../db/handoversTable';
import type { SampleRow } from '../../db/samplesTable';
import { captureDb } from '../cases/captureDb';

/** Live: the samples of a case in the order they were collected. */
export function useSamples(caseId: string): SampleRow[] | undefined {
  return useLiveQuery(async () => (await captureDb().samples.where('caseId').equals(caseId).filter(isLive).toArray()).sort((a, b) => a.data.collectedAt.localeCompare(b.data.collectedAt)), [caseId]);
}

/** Live: one sample; null when the tablet has none with that id (or it was deleted here). */
export function useSample(id: string | undefined): SampleRow | null | undefined {
  return useLiveQuery(async () => liveOrNull(id ? await captureDb().samples.get(id) : undefined), [id]);
}

/** Live: the hand-overs of a sample, oldest first (the chain of custody in order). */
export function useHandovers(sampleId: string): HandoverRow[] | undefined {
  return useLiveQuery(async () => {
    const rows = await captureDb().handovers.filter((h) => h.data.sampleId === sampleId).toArray();
    return rows.sort((a, b) => a.data.at.localeCompare(b.data.at));
  }, [sampleId]);
}
