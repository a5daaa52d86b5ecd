import { writableCase } from '../cases/case-access';
import { writableSample } from '../samples/sample-parent';
import { ChangeRejected, type SyncHandler } from '../sync/sync-handler';
import { SiteNoteDataDto } from './dto/site-note-data.dto';
import { SiteNote } from './site-note.entity';

/** Site notes through sync: on a case, optionally about one of its samples. */
export const siteNoteSyncHandler: SyncHandler<SiteNote, SiteNoteDataDto> = {
  entity: 'note',
  target: SiteNote,
  dataClass: SiteNoteDataDto,
  caseColumn: 'caseId',
  appendOnly: false,

  async authorize(ctx, id, data, existing) {
    if (existing && data && data.caseId !== existing.caseId) {
      throw new ChangeRejected(`Note ${id} belongs to case ${existing.caseId}; it cannot move to another case`);
    }
    const caseId = existing?.caseId ?? (data as SiteNoteDataDto).caseId;
    await writableCase(ctx, caseId);
    if (data?.sampleId) {
      const sample = await writableSample(ctx, data.sampleId);
      if (sample.caseId !== caseId) throw new ChangeRejected(`Sample ${sample.id} is not in case ${caseId}`);
    }
    return caseId;
  },

  assign(ctx, row, data, { caseId, isNew }) {
    if (isNew) row.authorId = ctx.user.id;
    row.caseId = caseId;
    row.sampleId = data.sampleId ?? null;
    row.text = data.text;
    row.recordedAt = new Date(data.recordedAt);
  },

  toData: (row) => ({
    caseId: row.caseId,
    sampleId: row.sampleId,
    text: row.text,
    recordedAt: row.recordedAt.toISOString(),
    authorId: row.authorId,
  }),
};
