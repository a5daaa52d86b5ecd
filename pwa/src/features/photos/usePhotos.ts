import { useLiveQuery } from 'dexie-react-hooks';
import { isLive } from '../../db/captureRecord';
import type { PhotoRow } from '../../db/photosTable';
import { captureDb } from '../cases/captureDb';

/** Live: the photos of one owner (a case or a sample), in the order they were taken; deleted ones left out. */
export function usePhotos(ownerId: string): PhotoRow[] | undefined {
  return useLiveQuery(async () => (await captureDb().photos.filter((p) => p.data.ownerId === ownerId && isLive(p)).toArray()).sort((a, b) => a.editedAt - b.editedAt), [ownerId]);
}

/** The photos of a case, grouped: the case's own first (owner = the case), then each sample's in collection order. */
export interface PhotoGroup {
  owner: { type: 'case' } | { type: 'sample'; id: string; label: string };
  photos: PhotoRow[];
}

/** Live: every photo of a case from the tablet, grouped by what it shows; deleted ones and raw scan files left out. */
export function useCasePhotos(caseId: string): PhotoGroup[] | undefined {
  return useLiveQuery(async () => {
    const db = captureDb();
    const [photos, samples] = await Promise.all([
      db.photos.where('caseId').equals(caseId).filter((p) => p.data.kind === 'photo' && isLive(p)).toArray(),
      db.samples.where('caseId').equals(caseId).filter(isLive).toArray(),
    ]);
    photos.sort((a, b) => a.editedAt - b.editedAt);
    const groups: PhotoGroup[] = [];
    const own = photos.filter((p) => p.data.ownerType === 'case');
    if (own.length > 0) groups.push({ owner: { type: 'case' }, photos: own });
    samples.sort((a, b) => a.data.collectedAt.localeCompare(b.data.collectedAt));
    for (const sample of samples) {
      const of = photos.filter((p) => p.data.ownerType === 'sample' && p.data.ownerId === sample.id);
      if (of.length > 0) groups.push({ owner: { type: 'sample', id: sample.id, label: sample.data.label }, photos: of });
    }
    return groups;
  }, [caseId]);
}
