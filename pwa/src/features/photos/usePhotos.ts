import { useLiveQuery } from 'dexie-react-hooks';
import { isLive } from '../../db/captureRecord';
import type { PhotoRow } from '../../db/photosTable';
import { captureDb } from '../cases/captureDb';

/** Live: the photos of one owner (a case or a sample), in the order they were taken; deleted ones left out. */
export function usePhotos(ownerId: string): PhotoRow[] | undefined {
  return useLiveQuery(async () => (await captureDb().photos.filter((p) => p.data.ownerId === ownerId && isLive(p)).toArray()).sort((a, b) => a.editedAt - b.editedAt), [ownerId]);
}
