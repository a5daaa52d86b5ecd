import { ChangeRejected, type SyncHandler } from '../sync/sync-handler';
import { assertOwnCase } from './case-access';
import { Case } from './case.entity';
import { CaseDataDto } from './dto/case-data.dto';

/** Cases through sync: created by the pushing inspector, who alone changes them while open or submitted. */
export const caseSyncHandler: SyncHandler<Case, CaseDataDto> = {
  entity: 'case',
  target: Case,
  dataClass: CaseDataDto,
  caseColumn: 'id',
  appendOnly: false,

  async authorize(ctx, id, _data, existing) {
    if (existing) {
      assertOwnCase(existing, ctx.user);
      if (existing.status !== 'open' && existing.status !== 'submitted') {
        throw new ChangeRejected(`Case ${id} is ${existing.status}: it is with the supervisors and cannot be changed from the tablet`);
      }
    } else if (ctx.user.role !== 'inspector') {
      throw new ChangeRejected('Only inspectors create cases');
    }
    return id;
  },

  assign(ctx, row, data, { isNew }) {
    if (isNew) row.inspectorId = ctx.user.id;
    row.siteName = data.siteName;
    row.address = data.address ?? null;
    row.latitude = data.latitude ?? null;
    row.longitude = data.longitude ?? null;
    row.locationAccuracyM = data.locationAccuracyM ?? null;
    row.locationEnteredByHand = data.locationEnteredByHand ?? false;
    row.startedAt = new Date(data.startedAt);
    row.weatherNotes = data.weatherNotes ?? null;
    row.accessNotes = data.accessNotes ?? null;
    row.status = data.status;
  },

  toData: (row) => ({
    siteName: row.siteName,
    address: row.address,
    latitude: row.latitude,
    longitude: row.longitude,
    locationAccuracyM: row.locationAccuracyM,
    locationEnteredByHand: row.locationEnteredByHand,
    startedAt: row.startedAt.toISOString(),
    weatherNotes: row.weatherNotes,
    accessNotes: row.accessNotes,
    status: row.status,
    inspectorId: row.inspectorId,
  }),
};
