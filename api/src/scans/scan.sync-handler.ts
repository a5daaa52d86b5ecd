import { isDeepStrictEqual } from 'node:util';
import { Attachment } from '../attachments/attachment.entity';
import { writableSample } from '../samples/sample-parent';
import { ReviewDecision } from '../review/review-decision.entity';
import { Sample } from '../samples/sample.entity';
import { refsOf } from '../sync/batch-rows';
import { dependents, refuseWhileHeld } from '../sync/delete-guards';
import { ChangeRejected, type ChangeContext, type SyncHandler } from '../sync/sync-handler';
import { Escalation } from './escalation.entity';
import { ScanDataDto } from './dto/scan-data.dto';
import { InstrumentCheck } from './instrument-check.entity';
import { Scan } from './scan.entity';
import { scanFinding } from './scan-finding';

/** Scans through sync: linked to a sample, an instrument check of the same case, and a raw-scan attachment. */
export const scanSyncHandler: SyncHandler<Scan, ScanDataDto> = {
  entity: 'scan',
  target: Scan,
  dataClass: ScanDataDto,
  caseColumn: 'caseId',
  appendOnly: false,

  parentsOf: (data) => [...refsOf(Sample, [data.sampleId]), ...refsOf(InstrumentCheck, [data.instrumentCheckId]), ...refsOf(Attachment, [data.rawAttachmentId])],

  async authorize(ctx, id, data, existing) {
    if (existing && data && data.sampleId !== existing.sampleId) {
      throw new ChangeRejected(`Scan ${id} belongs to sample ${existing.sampleId}; a scan cannot move to another sample`);
    }
    const sample = await writableSample(ctx, existing?.sampleId ?? (data as ScanDataDto).sampleId);
    if (data) await checkLinks(ctx, id, data, sample.caseId);
    return sample.caseId;
  },

  /** Its raw file stays on the server (a permanent record); an escalation or a decision keeps the scan too. */
  async checkDelete(ctx, existing) {
    await refuseWhileHeld(ctx.manager, 'scan', `Scan ${existing.id}`, {
      escalation: dependents(Escalation, { scanId: existing.id }),
      decision: dependents(ReviewDecision, { scanId: existing.id }),
      photo: dependents(Attachment, { ownerType: 'scan', ownerId: existing.id, kind: 'photo' }),
    });
  },

  assign(_ctx, row, data, { caseId, isNew }) {
    if (data.technique === 'ir' && data.excitationNm != null) {
      throw new ChangeRejected('excitationNm is only for Raman scans; leave it out for IR');
    }
    const before = isNew ? null : recomputeInputs(row);
    row.sampleId = data.sampleId;
    row.caseId = caseId;
    row.technique = data.technique;
    row.phase = data.phase;
    row.excitationNm = data.excitationNm ?? null;
    row.recordedAt = new Date(data.recordedAt);
    row.instrumentCheckId = data.instrumentCheckId ?? null;
    row.rawAttachmentId = data.rawAttachmentId ?? null;
    row.rawSha256 = data.rawSha256 ?? null;
    row.parsedSummary = data.parsedSummary ?? null;
    row.result = data.result ?? null;
    Object.assign(row, scanFinding(row.result));
    row.inspectorAcknowledgedAt = data.inspectorAcknowledgedAt ? new Date(data.inspectorAcknowledgedAt) : null;
    // An earlier recomputation stands only while what it was computed from is unchanged (an
    // acknowledgement alone keeps it); otherwise it is cleared and the sync service queues a new one.
    if (!before || !isDeepStrictEqual(before, recomputeInputs(row))) {
      row.serverResult = null;
      row.resultMismatch = null;
      row.mismatch = null;
      row.serverRecomputedAt = null;
      row.serverRecomputeError = null;
    }
  },

  toData: (row) => ({
    sampleId: row.sampleId,
    caseId: row.caseId,
    technique: row.technique,
    phase: row.phase,
    excitationNm: row.excitationNm,
    recordedAt: row.recordedAt.toISOString(),
    instrumentCheckId: row.instrumentCheckId,
    rawAttachmentId: row.rawAttachmentId,
    rawSha256: row.rawSha256,
    parsedSummary: row.parsedSummary,
    result: row.result,
    inspectorAcknowledgedAt: row.inspectorAcknowledgedAt?.toISOString() ?? null,
    serverResult: row.serverResult,
    resultMismatch: row.resultMismatch,
    serverRecomputedAt: row.serverRecomputedAt?.toISOString() ?? null,
    mismatch: row.mismatch,
    serverRecomputeError: row.serverRecomputeError,
  }),
};

/**
 * The instrument check must be of the same case. The raw attachment may arrive after the scan (it is
 * owned by the scan), so it is checked only when already on the server.
 */
async function checkLinks(ctx: ChangeContext, id: string, data: ScanDataDto, caseId: string): Promise<void> {
  if (data.instrumentCheckId) {
    const check = await ctx.rows.findOne(InstrumentCheck, data.instrumentCheckId);
    if (!check || check.caseId !== caseId) {
      throw new ChangeRejected(`Instrument check ${data.instrumentCheckId} is not in case ${caseId}: push it first`);
    }
  }
  if (data.rawAttachmentId) {
    const raw = await ctx.rows.findOne(Attachment, data.rawAttachmentId);
    if (raw && (raw.ownerType !== 'scan' || raw.ownerId !== id || raw.kind !== 'raw-scan')) {
      throw new ChangeRejected(`Attachment ${raw.id} is not a raw-scan attachment of scan ${id}`);
    }
    if (raw && raw.sha256 !== data.rawSha256) {
      throw new ChangeRejected(`rawSha256 differs from the SHA-256 declared for attachment ${raw.id}`);
    }
  }
}

/** What a server recomputation is computed from. */
function recomputeInputs(row: Scan) {
  return { technique: row.technique, phase: row.phase, excitationNm: row.excitationNm, raw: row.rawAttachmentId, sha: row.rawSha256, result: row.result };
}
