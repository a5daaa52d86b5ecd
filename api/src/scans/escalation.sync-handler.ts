import { writableCase } from '../cases/case-access';
import { ChangeRejected, type SyncHandler } from '../sync/sync-handler';
import { EscalationDataDto } from './dto/escalation-data.dto';
import { Escalation } from './escalation.entity';
import { scanLinks } from './scan-links';

/**
 * Escalations through sync: raised once from the tablet (then permanent for it); the safety officer's
 * acknowledgement and closing come through the escalations routes and reach the tablet in pulls.
 */
export const escalationSyncHandler: SyncHandler<Escalation, EscalationDataDto> = {
  entity: 'escalation',
  target: Escalation,
  dataClass: EscalationDataDto,
  caseColumn: 'caseId',
  appendOnly: true,

  async authorize(ctx, _id, data, existing) {
    const caseId = existing?.caseId ?? (data as EscalationDataDto).caseId;
    await writableCase(ctx, caseId);
    if (data?.scanId) {
      const scan = await scanLinks(ctx, data.scanId);
      if (!scan || scan.caseId !== caseId) throw new ChangeRejected(`Scan ${data.scanId} is not in case ${caseId}: push it first`);
    }
    return caseId;
  },

  assign(ctx, row, data, { caseId }) {
    row.caseId = caseId;
    row.scanId = data.scanId ?? null;
    row.raisedBy = ctx.user.id;
    row.raisedAt = new Date(data.raisedAt);
    row.reason = data.reason;
    row.hazardClasses = data.hazardClasses;
    row.status = 'raised';
  },

  toData: (row) => ({
    caseId: row.caseId,
    scanId: row.scanId,
    raisedBy: row.raisedBy,
    raisedAt: row.raisedAt.toISOString(),
    reason: row.reason,
    hazardClasses: row.hazardClasses,
    status: row.status,
    acknowledgedBy: row.acknowledgedBy ?? null,
    acknowledgedByName: row.acknowledgedByName ?? null,
    acknowledgedAt: row.acknowledgedAt?.toISOString() ?? null,
    actionTaken: row.actionTaken ?? null,
    ppeLevel: row.ppeLevel ?? null,
    ackComment: row.ackComment ?? null,
    closedBy: row.closedBy ?? null,
    closedAt: row.closedAt?.toISOString() ?? null,
    closeComment: row.closeComment ?? null,
  }),
};
