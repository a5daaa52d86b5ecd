import { writableCase } from '../cases/case-access';
import { ChangeRejected, type ChangeContext } from '../sync/sync-handler';
import { Sample } from './sample.entity';

/** The sample a record below it points to, when it is live and its case is writable by the user. */
export async function writableSample(ctx: ChangeContext, sampleId: string): Promise<Sample> {
  const sample = await ctx.rows.findOne(Sample, sampleId);
  if (!sample) throw new ChangeRejected(`Sample ${sampleId} is not on the server: push the sample first`);
  await writableCase(ctx, sample.caseId);
  if (sample.deletedAt) throw new ChangeRejected(`Sample ${sampleId} was deleted`);
  return sample;
}
