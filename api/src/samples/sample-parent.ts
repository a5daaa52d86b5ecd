import type { EntityManager } from 'typeorm';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { writableCase } from '../cases/case-access';
import { ChangeRejected } from '../sync/sync-handler';
import { Sample } from './sample.entity';

/** The sample a record below it points to, when it is live and its case is writable by the user. */
export async function writableSample(manager: EntityManager, sampleId: string, user: AuthenticatedUser): Promise<Sample> {
  const sample = await manager.findOneBy(Sample, { id: sampleId });
  if (!sample) throw new ChangeRejected(`Sample ${sampleId} is not on the server: push the sample first`);
  await writableCase(manager, sample.caseId, user);
  if (sample.deletedAt) throw new ChangeRejected(`Sample ${sampleId} was deleted`);
  return sample;
}
