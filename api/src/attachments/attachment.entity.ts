import { PHOTO_CAPTION_MAX_LENGTH } from '@siteband/shared';
import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Case } from '../cases/case.entity';
import { SyncedRecord } from '../sync/synced-record';
import { ATTACHMENT_KINDS, type AttachmentKind } from './attachment-limits';

/** What an attachment can belong to. */
export const ATTACHMENT_OWNER_TYPES = ['case', 'sample', 'scan'] as const;
export type AttachmentOwnerType = (typeof ATTACHMENT_OWNER_TYPES)[number];

/**
 * A file's metadata. The bytes live in object storage (never in MariaDB), under `storageKey` once the
 * upload is complete and its SHA-256 verified.
 */
@Entity({ name: 'attachments' })
@Index('IDX_attachments_syncSeq', ['syncSeq'])
@Index('IDX_attachments_caseId', ['caseId'])
@Index('IDX_attachments_owner', ['ownerType', 'ownerId'])
export class Attachment extends SyncedRecord {
  @Column({ type: 'enum', enum: ATTACHMENT_OWNER_TYPES })
  ownerType: AttachmentOwnerType;

  @Column({ type: 'uuid' })
  ownerId: string;

  /** The owner's case, set by the server for visibility filters. */
  @Column({ type: 'uuid' })
  caseId: string;

  @ManyToOne(() => Case, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'caseId', foreignKeyConstraintName: 'FK_attachments_case' })
  parentCase?: Case;

  @Column({ type: 'enum', enum: ATTACHMENT_KINDS })
  kind: AttachmentKind;

  @Column({ type: 'varchar', length: 255 })
  fileName: string;

  @Column({ type: 'varchar', length: 100 })
  contentType: string;

  /** What a photo shows, in the inspector's words; null when none was written (raw scan files have none). */
  @Column({ type: 'varchar', length: PHOTO_CAPTION_MAX_LENGTH, nullable: true })
  caption: string | null;

  /** Declared size in bytes. */
  @Column({ type: 'int' })
  size: number;

  /** Declared lower-case hex SHA-256; the upload is verified against it. */
  @Column({ type: 'char', length: 64 })
  sha256: string;

  /** Bytes received so far (the resume offset). */
  @Column({ type: 'int', default: 0 })
  receivedBytes: number;

  /** Object key of the verified file; null until the upload is complete. */
  @Column({ type: 'varchar', length: 300, nullable: true })
  storageKey: string | null;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  uploadedAt: Date | null;
}
