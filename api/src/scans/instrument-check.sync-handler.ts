import { writableCase } from '../cases/case-access';
import type { SyncHandler } from '../sync/sync-handler';
import { InstrumentCheckDataDto } from './dto/instrument-check-data.dto';
import { InstrumentCheck } from './instrument-check.entity';

/** Instrument checks through sync: a measurement record, created once. */
export const instrumentCheckSyncHandler: SyncHandler<InstrumentCheck, InstrumentCheckDataDto> = {
  entity: 'instrumentCheck',
  target: InstrumentCheck,
  dataClass: InstrumentCheckDataDto,
  caseColumn: 'caseId',
  appendOnly: true,

  async authorize(ctx, _id, data, existing) {
    const caseId = existing?.caseId ?? (data as InstrumentCheckDataDto).caseId;
    await writableCase(ctx, caseId);
    return caseId;
  },

  assign(ctx, row, data, { caseId }) {
    row.caseId = caseId;
    row.standardId = data.standardId;
    row.performedAt = new Date(data.performedAt);
    row.passed = data.passed;
    row.offsets = data.offsets;
    row.performedBy = ctx.user.id;
  },

  toData: (row) => ({
    caseId: row.caseId,
    standardId: row.standardId,
    performedAt: row.performedAt.toISOString(),
    passed: row.passed,
    offsets: row.offsets,
    performedBy: row.performedBy,
  }),
};
