import { photoCaptionOf, photoCaptionProblem } from '@siteband/shared';
import { writableCase } from '../cases/case-access';
import { writableSample } from '../samples/sample-parent';
import { Sample } from '../samples/sample.entity';
import { scanLinkRefs, scanLinks } from '../scans/scan-links';
import { refsOf } from '../sync/batch-rows';
import { ChangeRejected, type ChangeContext, type SyncHandler } from '../sync/sync-handler';
import { contentTypeProblem, mediaType, sizeProblem } from './attachment-limits';
import { Attachment } from './attachment.entity';
import { AttachmentDataDto } from './dto/attachment-data.dto';

/** Attachment metadata through sync. The bytes go through `PUT /api/attachments/:id/content`. */
export const attachmentSyncHandler: SyncHandler<Attachment, AttachmentDataDto> = {
  entity: 'attachment',
  target: Attachment,
  dataClass: AttachmentDataDto,
  caseColumn: 'caseId',
  appendOnly: false,

  parentsOf: (data) => (data.ownerType === 'scan' ? scanLinkRefs([data.ownerId]) : data.ownerType === 'sample' ? refsOf(Sample, [data.ownerId]) : []),

  async authorize(ctx, id, data, existing) {
    if (existing && data && (data.ownerType !== existing.ownerType || data.ownerId !== existing.ownerId)) {
      throw new ChangeRejected(`Attachment ${id} belongs to ${existing.ownerType} ${existing.ownerId}; it cannot move`);
    }
    if (data) checkFile(data, existing);
    const caseId = await ownerCaseId(ctx, existing ?? (data as AttachmentDataDto));
    if (data?.kind === 'raw-scan') {
      const scan = await scanLinks(ctx, data.ownerId);
      if (scan?.rawAttachmentId === id && scan.rawSha256 !== data.sha256) {
        throw new ChangeRejected(`sha256 differs from the rawSha256 of scan ${scan.id}`);
      }
    }
    return caseId;
  },

  async checkDelete(_ctx, existing) {
    if (existing.kind === 'raw-scan') throw new ChangeRejected('A raw scan file is a permanent record: it cannot be deleted');
  },

  assign(_ctx, row, data, { caseId, isNew }) {
    if (isNew) {
      row.receivedBytes = 0;
      row.storageKey = null;
      row.uploadedAt = null;
    }
    row.ownerType = data.ownerType;
    row.ownerId = data.ownerId;
    row.caseId = caseId;
    row.kind = data.kind;
    row.fileName = data.fileName;
    row.contentType = mediaType(data.contentType);
    row.size = data.size;
    row.sha256 = data.sha256;
    row.caption = photoCaptionOf(data.caption);
  },

  toData: (row) => ({
    ownerType: row.ownerType,
    ownerId: row.ownerId,
    caseId: row.caseId,
    kind: row.kind,
    fileName: row.fileName,
    contentType: row.contentType,
    size: row.size,
    sha256: row.sha256,
    caption: row.caption,
    receivedBytes: row.receivedBytes,
    uploadedAt: row.uploadedAt?.toISOString() ?? null,
  }),
};

/** Kind, type, size and caption within the limits; and no change of the file itself once bytes have arrived. */
function checkFile(data: AttachmentDataDto, existing: Attachment | null): void {
  const caption = photoCaptionOf(data.caption);
  const problem = contentTypeProblem(data.kind, data.contentType) ?? sizeProblem(data.kind, data.size) ?? photoCaptionProblem(caption);
  if (problem) throw new ChangeRejected(problem);
  if (data.kind === 'raw-scan' && data.ownerType !== 'scan') throw new ChangeRejected('A raw-scan attachment must belong to a scan');
  if (data.kind === 'raw-scan' && caption !== null) throw new ChangeRejected('Only photos take a caption; a raw scan file has none');
  const started = existing && (existing.receivedBytes > 0 || existing.uploadedAt !== null);
  if (
    started &&
    (data.kind !== existing.kind || data.size !== existing.size || data.sha256 !== existing.sha256 || mediaType(data.contentType) !== existing.contentType)
  ) {
    throw new ChangeRejected('The file of this attachment is already being uploaded: kind, contentType, size and sha256 can no longer change');
  }
}

/** The case of the attachment's owner, when the user may write there. */
async function ownerCaseId(ctx: ChangeContext, owner: { ownerType: string; ownerId: string }): Promise<string> {
  if (owner.ownerType === 'case') return (await writableCase(ctx, owner.ownerId)).id;
  if (owner.ownerType === 'sample') return (await writableSample(ctx, owner.ownerId)).caseId;
  const scan = await scanLinks(ctx, owner.ownerId);
  if (!scan) throw new ChangeRejected(`Scan ${owner.ownerId} is not on the server: push the scan first`);
  if (scan.deletedAt) throw new ChangeRejected(`Scan ${owner.ownerId} was deleted`);
  return (await writableCase(ctx, scan.caseId)).id;
}
