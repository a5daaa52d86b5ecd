import { Attachment } from '../attachments/attachment.entity';
import { SiteNote } from '../notes/site-note.entity';
import { Sample } from '../samples/sample.entity';
import { Escalation } from '../scans/escalation.entity';
import { InstrumentCheck } from '../scans/instrument-check.entity';
import { dependents, refuseWhileHeld } from '../sync/delete-guards';
import { ChangeRejected, type SyncHandler } from '../sync/sync-handler';
import { assertOwnCase } from './case-access';
import { Case } from './case.entity';
import { CaseDataDto } from './dto/case-data.dto';

/**
 * Cases through sync: created by the pushing inspector, who alone changes them while open or submitted,
 * and reopens them (status `open`) after a supervisor returned them. Cases in review or accepted are the
 * supervisors' (the review routes); an accepted case is frozen until a supervisor reopens it. Only an
 * open case with nothing below it can be deleted.
 */
export const caseSyncHandler: SyncHandler<Case, CaseDataDto> = {
  entity: 'case',
  target: Case,
  dataClass: CaseDataDto,
  caseColumn: 'id',
  appendOnly: false,

  async authorize(ctx, id, data, existing) {
    if (existing) {
      assertOwnCase(existing, ctx.user);
      if (existing.status === 'returned') {
        if (data?.status !== 'open') {
          throw new ChangeRejected(`Case ${id} was returned by a supervisor: reopen it (status open) to fix it, then submit it again`);
        }
      } else if (existing.status === 'accepted') {
        throw new ChangeRejected(`Case ${id} is accepted and frozen: only a supervisor can reopen it`);
      } else if (existing.status !== 'open' && existing.status !== 'submitted') {
        throw new ChangeRejected(`Case ${id} is ${existing.status}: it is with the supervisors and cannot be changed from the tablet`);
      }
    } else if (ctx.user.role !== 'inspector') {
      throw new ChangeRejected('Only inspectors create cases');
    }
    return id;
  },

  async checkDelete(ctx, existing) {
    if (existing.status !== 'open') throw new ChangeRejected(`Case ${existing.id} is ${existing.status}: only an open case can be deleted`);
    await refuseWhileHeld(ctx.manager, 'case', `Case ${existing.id}`, {
      sample: dependents(Sample, { caseId: existing.id }),
      siteNote: dependents(SiteNote, { caseId: existing.id }),
      photo: dependents(Attachment, { caseId: existing.id, kind: 'photo' }),
      rawScanFile: dependents(Attachment, { caseId: existing.id, kind: 'raw-scan' }),
      instrumentCheck: dependents(InstrumentCheck, { caseId: existing.id }),
      escalation: dependents(Escalation, { caseId: existing.id }),
    });
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
    if (data.status === 'submitted' && row.status !== 'submitted') row.submittedAt = new Date();
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
