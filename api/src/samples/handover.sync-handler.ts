import type { SyncHandler } from '../sync/sync-handler';
import { HandoverDataDto } from './dto/handover-data.dto';
import { Handover } from './handover.entity';
import { writableSample } from './sample-parent';

/** Hand-overs through sync: appended to the chain of custody, never changed or deleted. */
export const handoverSyncHandler: SyncHandler<Handover, HandoverDataDto> = {
  entity: 'handover',
  target: Handover,
  dataClass: HandoverDataDto,
  caseColumn: 'caseId',
  appendOnly: true,

  async authorize(ctx, _id, data, existing) {
    const sample = await writableSample(ctx, existing?.sampleId ?? (data as HandoverDataDto).sampleId);
    return sample.caseId;
  },

  assign(_ctx, row, data, { caseId }) {
    row.sampleId = data.sampleId;
    row.caseId = caseId;
    row.fromParty = data.from;
    row.toParty = data.to;
    row.handedOverAt = new Date(data.at);
    row.sealNumber = data.sealNumber ?? null;
    row.note = data.note ?? null;
  },

  toData: (row) => ({
    sampleId: row.sampleId,
    caseId: row.caseId,
    from: row.fromParty,
    to: row.toParty,
    at: row.handedOverAt.toISOString(),
    sealNumber: row.sealNumber,
    note: row.note,
  }),
};
