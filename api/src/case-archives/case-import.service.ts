import { randomUUID } from 'node:crypto';
import { Readable } from 'node:stream';
import { ForbiddenException, HttpException, Injectable, PayloadTooLargeException, UnprocessableEntityException, UnsupportedMediaTypeException } from '@nestjs/common';
import {
  archiveChangeId,
  archiveOwnerProblem,
  CaseArchiveError,
  readCaseArchive,
  type ArchiveRecord,
  type CaseArchive,
} from '@siteband/shared';
import { DataSource } from 'typeorm';
import { AttachmentUploadsService } from '../attachments/attachment-uploads.service';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import type { ChangeResultDto } from '../sync/dto/change-result.dto';
import { SyncRegistry } from '../sync/sync-registry';
import { SyncService } from '../sync/sync.service';
import { CaseImportResultDto, type ImportedFileDto, type ImportedRecordDto } from './dto/case-import-result.dto';

/** The client id import changes are traced under (idempotency is per changeId). */
const IMPORT_CLIENT_ID = 'case-archive-import';

/** Local file header or (empty archive) end-of-central-directory signature: "PK\3\4" / "PK\5\6" (PKWARE APPNOTE 4.3.7, 4.3.16; from memory). */
function looksLikeZip(bytes: Buffer): boolean {
  return bytes.length >= 4 && bytes[0] === 0x50 && bytes[1] === 0x4b && ((bytes[2] === 3 && bytes[3] === 4) || (bytes[2] === 5 && bytes[3] === 6));
}

/**
 * Imports a case archive for its own inspector: reads and verifies the whole file first (nothing is written
 * from a refused archive), then applies its records through sync's push (same validation, versions and
 * exactly-once changeIds as a tablet's sync) and stores its files through the attachment upload path.
 */
@Injectable()
export class CaseImportService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly registry: SyncRegistry,
    private readonly sync: SyncService,
    private readonly uploads: AttachmentUploadsService,
  ) {}

  async import(file: Buffer, user: AuthenticatedUser): Promise<CaseImportResultDto> {
    const archive = await this.read(file);
    const ownerProblem = archiveOwnerProblem(archive.manifest, user.id);
    if (ownerProblem) throw new ForbiddenException(ownerProblem);

    const records = await this.applyRecords(archive.manifest.records, user);
    const files: ImportedFileDto[] = [];
    for (const listed of archive.manifest.files) {
      const record = records.find((r) => r.entity === 'attachment' && r.id === listed.attachmentId);
      files.push(await this.storeFile(listed.attachmentId, archive, record, user));
    }
    return Object.assign(new CaseImportResultDto(), { caseId: archive.manifest.caseId, records, files });
  }

  /** The verified archive, or 413 (over a size limit), 415 (not a ZIP) or 422 (naming the entry at fault). */
  private async read(file: Buffer): Promise<CaseArchive> {
    if (!looksLikeZip(file)) throw new UnsupportedMediaTypeException('The file is not a ZIP archive: send a case archive (.zip) exported from Siteband');
    try {
      return await readCaseArchive(new Uint8Array(file.buffer, file.byteOffset, file.byteLength));
    } catch (error) {
      if (!(error instanceof CaseArchiveError)) throw error;
      const message = `Nothing was imported. ${error.message}`;
      throw error.code === 'too-large' ? new PayloadTooLargeException(message) : new UnprocessableEntityException(message);
    }
  }

  /**
   * A record the tablet had on the server with nothing waiting is left as the server has it; everything
   * else is pushed as an upsert from the archived version, under the tablet's own changeId or one derived
   * from the record, so a second import (or the tablet's own later sync) is answered `duplicate`.
   */
  private async applyRecords(archived: readonly ArchiveRecord[], user: AuthenticatedUser): Promise<ImportedRecordDto[]> {
    const outcomes = new Map<string, ImportedRecordDto>();
    const changes: Record<string, unknown>[] = [];
    for (const record of archived) {
      const handler = this.registry.get(record.entity);
      if (!record.pending) {
        const existing = await this.dataSource.getRepository(handler.target).findOneBy({ id: record.id });
        if (existing) {
          outcomes.set(record.id, { entity: record.entity, id: record.id, outcome: 'unchanged', version: existing.version, reason: `On the server already (version ${existing.version})` });
          continue;
        }
      }
      changes.push({ changeId: await archiveChangeId(user.id, record), entity: record.entity, op: 'upsert', id: record.id, baseVersion: record.version, data: record.data });
    }
    const { results } = changes.length ? await this.sync.push({ clientId: IMPORT_CLIENT_ID, batchId: randomUUID(), changes }, user) : { results: [] };
    results.forEach((result, i) => {
      const change = changes[i];
      outcomes.set(String(change.id), { entity: change.entity as ArchiveRecord['entity'], id: String(change.id), ...outcomeOf(result) });
    });
    return archived.map((record) => outcomes.get(record.id)!);
  }

  /** Uploads the rest of an attachment's bytes through the upload path (which checks the SHA-256 again and stores to S3). */
  private async storeFile(attachmentId: string, archive: CaseArchive, record: ImportedRecordDto | undefined, user: AuthenticatedUser): Promise<ImportedFileDto> {
    if (!record || record.outcome === 'refused' || record.outcome === 'conflict') {
      return { attachmentId, outcome: 'skipped', reason: 'Its attachment record was not imported' };
    }
    const bytes = Buffer.from(archive.files.get(attachmentId)!);
    const data = archive.manifest.records.find((r) => r.id === attachmentId)!.data;
    try {
      const status = await this.uploads.status(attachmentId, user);
      if (status.complete) return { attachmentId, outcome: 'unchanged', reason: 'On the server already' };
      if (status.sha256 !== data.sha256) return { attachmentId, outcome: 'skipped', reason: 'The server declares other bytes for this attachment' };
      const start = status.receivedBytes;
      await this.uploads.receive(attachmentId, user, {
        contentType: String(data.contentType),
        contentRange: start > 0 ? `bytes ${start}-${bytes.length - 1}/${bytes.length}` : undefined,
        body: Readable.from([bytes.subarray(start)]),
      });
      return { attachmentId, outcome: 'stored' };
    } catch (error) {
      if (error instanceof HttpException) return { attachmentId, outcome: 'refused', reason: error.message };
      throw error;
    }
  }
}

/** A push answer as an import outcome. */
function outcomeOf(result: ChangeResultDto): Pick<ImportedRecordDto, 'outcome' | 'version' | 'reason'> {
  const version = result.version !== undefined ? { version: result.version } : {};
  switch (result.status) {
    case 'applied':
      return { outcome: 'imported', ...version };
    case 'duplicate':
      if (result.firstStatus === 'applied') return { outcome: 'unchanged', ...version, reason: 'Imported or synced before' };
      return { outcome: result.firstStatus === 'conflict' ? 'conflict' : 'refused', reason: result.reason };
    case 'conflict':
      return { outcome: 'conflict', version: result.server?.version, reason: `${result.reason}: the server's version was kept` };
    default:
      return { outcome: 'refused', reason: result.reason };
  }
}
