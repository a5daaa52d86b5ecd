import { writableCase } from '../cases/case-access';
import { Attachment } from '../attachments/attachment.entity';
import { SiteNote } from '../notes/site-note.entity';
import { Scan } from '../scans/scan.entity';
import { dependents, refuseWhileHeld } from '../sync/delete-guards';
import { ChangeRejected, type SyncHandler } from '../sync/sync-handler';
import { Handover } from './handover.entity';
import { SampleDataDto } from './dto/sample-data.dto';
import { Sample } from './sample.entity';

/** Samples through sync: they stay in the case they were created in; one with a hand-over is kept for good. */
export const sampleSyncHandler: SyncHandler<Sample, SampleDataDto> = {
  entity: 'sample',
  target: Sample,
  dataClass: SampleDataDto,
  caseColumn: 'caseId',
  appendOnly: false,

  async authorize(ctx, id, data, existing) {
    const caseId = existing?.caseId ?? (data as SampleDataDto).caseId;
    if (existing && data && data.caseId !== existing.caseId) {
      throw new ChangeRejected(`Sample ${id} belongs to case ${existing.caseId}; a sample cannot move to another case`);
    }
    await writableCase(ctx, caseId);
    return caseId;
  },

  async checkDelete(ctx, existing) {
    await refuseWhileHeld(ctx.manager, 'sample', `Sample ${existing.id}`, {
      handover: dependents(Handover, { sampleId: existing.id }),
      scan: dependents(Scan, { sampleId: existing.id }),
      siteNote: dependents(SiteNote, { sampleId: existing.id }),
      photo: dependents(Attachment, { ownerType: 'sample', ownerId: existing.id, kind: 'photo' }),
    });
  },

  assign(_ctx, row, data, { caseId }) {
    row.caseId = caseId;
    row.label = data.label;
    row.container = data.container ?? null;
    row.description = data.description ?? null;
    row.locationOnSite = data.locationOnSite ?? null;
    row.observations = { ...(data.observations ?? {}) };
    row.collectedBy = data.collectedBy;
    row.collectedAt = new Date(data.collectedAt);
    row.sealNumber = data.sealNumber ?? null;
  },

  toData: (row) => ({
    caseId: row.caseId,
    label: row.label,
    container: row.container,
    description: row.description,
    locationOnSite: row.locationOnSite,
    observations: row.observations,
    collectedBy: row.collectedBy,
    collectedAt: row.collectedAt.toISOString(),
    sealNumber: row.sealNumber,
  }),
};
