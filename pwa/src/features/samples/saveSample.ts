import type { SitebandDb } from '../../db/db';
import type { HandoverData } from '../../db/handoversTable';
import type { SampleData } from '../../db/samplesTable';
import { recordUpsert } from '../sync/recordChange';

/** Stores a new or edited sample; throws when the label or the collector is missing (nothing is written). */
export async function saveSample(db: SitebandDb, id: string, data: SampleData): Promise<void> {
  if (!data.label.trim()) throw new RangeError('A sample needs a label');
  if (!data.collectedBy.trim()) throw new RangeError('A sample needs the name of who collected it');
  await recordUpsert(db, { entity: 'sample', id, caseId: data.caseId, data });
}

/** Adds a hand-over of a sample. Hand-overs are append-only: there is no edit. */
export async function addHandover(db: SitebandDb, caseId: string, data: HandoverData): Promise<string> {
  if (!data.from.trim() || !data.to.trim()) throw new RangeError('A hand-over needs who handed the sample over and who took it');
  const id = crypto.randomUUID();
  await recordUpsert(db, { entity: 'handover', id, caseId, data });
  return id;
}
