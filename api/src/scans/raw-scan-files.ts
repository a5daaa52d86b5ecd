import { createHash } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { importSpectrum, type Spectrum } from '@siteband/shared';
import { DataSource } from 'typeorm';
import { Attachment } from '../attachments/attachment.entity';
import { ObjectStorageService } from '../storage/object-storage.service';
import type { Scan } from './scan.entity';

/** A scan's raw file (its `raw-scan` attachment named by `rawAttachmentId`), as every server reader gets it. */
@Injectable()
export class RawScanFiles {
  constructor(
    private readonly dataSource: DataSource,
    private readonly storage: ObjectStorageService,
  ) {}

  /**
   * The scan's raw-scan attachment, or null when it names none, or one that is deleted or belongs to
   * something else. Its bytes are on the server once `storageKey` is set.
   */
  async attachmentOf(scan: Scan): Promise<Attachment | null> {
    if (!scan.rawAttachmentId) return null;
    const raw = await this.dataSource.getRepository(Attachment).findOneBy({ id: scan.rawAttachmentId });
    if (!raw || raw.deletedAt || raw.kind !== 'raw-scan' || raw.ownerType !== 'scan' || raw.ownerId !== scan.id) return null;
    return raw;
  }

  /** The stored bytes, checked again against the SHA-256 verified on upload (a damaged copy is refused). */
  async read(raw: Attachment): Promise<Buffer> {
    if (!raw.storageKey) throw new Error(`the raw file ${raw.id} is not completely uploaded`);
    const bytes = await this.storage.read(raw.storageKey);
    if (createHash('sha256').update(bytes).digest('hex') !== raw.sha256) throw new Error(`the stored file no longer has SHA-256 ${raw.sha256}`);
    return bytes;
  }
}

/** The raw file read by the shared importer, with the scan's technique and laser line (throws SpectrumImportError). */
export function importRawScan(scan: Pick<Scan, 'technique' | 'excitationNm'>, raw: Pick<Attachment, 'fileName'>, bytes: Buffer): Spectrum {
  return importSpectrum(new Uint8Array(bytes.buffer, bytes.byteOffset, bytes.byteLength), {
    fileName: raw.fileName,
    technique: scan.technique,
    ...(scan.technique === 'raman' && scan.excitationNm !== null ? { excitationNm: scan.excitationNm } : {}),
  });
}
