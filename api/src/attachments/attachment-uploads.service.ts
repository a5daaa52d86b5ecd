import { createHash } from 'node:crypto';
import type { Readable } from 'node:stream';
import {
  BadRequestException,
  ConflictException,
  Injectable,
  NotFoundException,
  PayloadTooLargeException,
  StreamableFile,
  UnprocessableEntityException,
  UnsupportedMediaTypeException,
} from '@nestjs/common';
import { DataSource } from 'typeorm';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { whereCaseVisible } from '../cases/case-access';
import { ScanRecomputeQueue } from '../scans/scan-recompute.queue';
import { ObjectStorageService } from '../storage/object-storage.service';
import { lockAndTakeSyncSeq, lockSyncCounter } from '../sync/sync-sequence';
import { ATTACHMENT_RULES, mediaType } from './attachment-limits';
import { chunkKey, fileKey, stagingPrefix } from './attachment-storage-keys';
import { attachmentDisposition } from './content-disposition';
import { Attachment } from './attachment.entity';
import { parseContentRange } from './content-range';
import { AttachmentStatusDto } from './dto/attachment-status.dto';
import { readExactly } from './read-body';

/** One chunk of an upload as it arrives: its headers and the request body stream. */
export interface UploadChunk {
  contentType: string | undefined;
  contentRange: string | undefined;
  body: Readable;
}

/**
 * Resumable uploads of attachment bytes into object storage. Each chunk is kept as its own object until
 * the last one arrives; then the file is assembled, checked against the declared SHA-256 and stored
 * once. A chunk is all or nothing, so the resume offset is always a chunk boundary.
 */
@Injectable()
export class AttachmentUploadsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly storage: ObjectStorageService,
    private readonly recompute: ScanRecomputeQueue,
  ) {}

  /** The upload state, for anyone who may see the case. */
  async status(id: string, user: AuthenticatedUser): Promise<AttachmentStatusDto> {
    return AttachmentStatusDto.fromEntity(await this.visible(id, user));
  }

  /** Receives one chunk (or the whole file) and completes the upload when it was the last. */
  async receive(id: string, user: AuthenticatedUser, chunk: UploadChunk): Promise<AttachmentStatusDto> {
    const row = await this.visible(id, user);
    const refuse = (error: Error): never => {
      chunk.body.resume();
      throw error;
    };
    if (row.uploadedAt) {
      // A repeated last chunk whose answer was lost: the upload is already done.
      chunk.body.resume();
      return AttachmentStatusDto.fromEntity(row);
    }
    const type = mediaType(chunk.contentType);
    if (type !== row.contentType) {
      refuse(new UnsupportedMediaTypeException(`Attachment ${id} was declared as ${row.contentType}; this upload is "${chunk.contentType ?? ''}"`));
    }
    const range = parseContentRange(chunk.contentRange, row.size);
    if ('problem' in range) return refuse(new BadRequestException(range.problem));
    const maxBytes = ATTACHMENT_RULES[row.kind].maxBytes;
    if (range.total > maxBytes) refuse(new PayloadTooLargeException(`${row.kind} attachments may have at most ${maxBytes} bytes; this upload declares ${range.total}`));
    if (range.total !== row.size) refuse(new BadRequestException(`Content-Range total ${range.total} differs from the declared size ${row.size}`));
    if (range.start !== row.receivedBytes) {
      refuse(new ConflictException(`The upload of ${id} is at byte ${row.receivedBytes}: send the bytes from there (Content-Range: bytes ${row.receivedBytes}-…/${row.size})`));
    }

    const bytes = await readExactly(chunk.body, range.end - range.start + 1);
    // The last chunk (or the whole file in one) completes the upload at once, without being staged.
    if (range.end + 1 === row.size) return this.complete(row, range.start, bytes);
    await this.storage.put(chunkKey(id, range.start), bytes, 'application/octet-stream');
    const moved = await this.dataSource.transaction(async (manager) => {
      // Under the sync lock, so a metadata change pushed at the same moment cannot write back a stale offset.
      await lockSyncCounter(manager);
      return manager.update(Attachment, { id, receivedBytes: range.start }, { receivedBytes: range.start + bytes.length });
    });
    if (moved.affected !== 1) throw movedOn(id);
    row.receivedBytes = range.start + bytes.length;
    return AttachmentStatusDto.fromEntity(row);
  }

  /** The verified file as a stream, for anyone who may see the case; 409 while the upload is unfinished. */
  async content(id: string, user: AuthenticatedUser): Promise<StreamableFile> {
    const row = await this.visible(id, user);
    if (!row.storageKey) throw new ConflictException(`Attachment ${id} is not uploaded yet (${row.receivedBytes} of ${row.size} bytes)`);
    const { body } = await this.storage.stream(row.storageKey);
    return new StreamableFile(body, {
      type: row.contentType,
      length: row.size,
      disposition: attachmentDisposition(row.fileName),
    });
  }

  /**
   * Assembles the staged chunks before `start` with the last chunk's bytes, checks the SHA-256, stores the
   * file and marks the attachment uploaded in one write (which also moves `receivedBytes` to the end).
   */
  private async complete(row: Attachment, start: number, last: Buffer): Promise<AttachmentStatusDto> {
    const parts: Buffer[] = [];
    // Walk the chunk offsets rather than listing: a chunk whose database update failed is replaced by its retry.
    for (let offset = 0; offset < start; ) {
      const part = await this.storage.read(chunkKey(row.id, offset));
      if (part.length === 0) break;
      parts.push(part);
      offset += part.length;
    }
    const file = Buffer.concat([...parts, last]);
    const actual = createHash('sha256').update(file).digest('hex');
    if (file.length !== row.size || actual !== row.sha256) {
      // A file sent whole was never staged and left receivedBytes at 0: there is nothing to discard.
      if (start > 0) {
        await this.storage.deletePrefix(stagingPrefix(row.id));
        await this.dataSource.transaction(async (manager) => {
          await lockSyncCounter(manager);
          await manager.update(Attachment, { id: row.id }, { receivedBytes: 0 });
        });
        row.receivedBytes = 0;
      }
      throw new UnprocessableEntityException(
        `The received file has SHA-256 ${actual}, not the declared ${row.sha256}: nothing was kept; upload it again from byte 0`,
      );
    }
    const key = fileKey(row.caseId, row.id);
    await this.storage.put(key, file, row.contentType);
    const uploadedAt = new Date();
    const moved = await this.dataSource.transaction(async (manager) => {
      // A new sequence number (not a new version) so other devices pull the upload state; edits are not in conflict with it.
      const syncSeq = await lockAndTakeSyncSeq(manager);
      // Only if nothing moved since the row was read: the offset, and the declared file the bytes were checked against.
      const unchanged = { id: row.id, receivedBytes: start, size: row.size, sha256: row.sha256 };
      return manager.update(Attachment, unchanged, { receivedBytes: row.size, storageKey: key, uploadedAt, syncSeq });
    });
    // A parallel upload of the same last chunk finished first, or the declaration changed before any byte had arrived.
    if (moved.affected !== 1) throw movedOn(row.id);
    Object.assign(row, { receivedBytes: row.size, storageKey: key, uploadedAt });
    if (start > 0) await this.storage.deletePrefix(stagingPrefix(row.id));
    // Committed: a scan's raw file is now on the server, so its identification can be recomputed.
    await this.recompute.enqueueRawFileOwner(row);
    return AttachmentStatusDto.fromEntity(row);
  }

  /** The live attachment, when the user may see its case (inspectors: only their own); 404 otherwise. One query. */
  private async visible(id: string, user: AuthenticatedUser): Promise<Attachment> {
    const query = this.dataSource.getRepository(Attachment).createQueryBuilder('a').where('a.id = :id', { id });
    const row = await whereCaseVisible(query, 'a.caseId', user).getOne();
    if (!row || row.deletedAt) {
      throw new NotFoundException(`No attachment with the id ${id} is visible to you`);
    }
    return row;
  }
}

function movedOn(id: string): ConflictException {
  return new ConflictException(`Another upload of ${id} moved on meanwhile: ask for its status and resume from there`);
}
