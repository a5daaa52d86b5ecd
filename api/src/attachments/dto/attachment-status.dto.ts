import { ApiProperty } from '@nestjs/swagger';
import type { Attachment } from '../attachment.entity';

/** How far the upload of one attachment has come. */
export class AttachmentStatusDto {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ description: 'Declared size in bytes' })
  size: number;

  @ApiProperty({ description: 'Bytes received and kept: resume the upload from this offset' })
  receivedBytes: number;

  @ApiProperty({ description: 'true once all bytes arrived and matched the declared SHA-256' })
  complete: boolean;

  @ApiProperty({ description: 'The declared SHA-256 (lower-case hex)' })
  sha256: string;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  uploadedAt: string | null;

  /** The upload state of an attachment row. */
  static fromEntity(row: Attachment): AttachmentStatusDto {
    return Object.assign(new AttachmentStatusDto(), {
      id: row.id,
      size: row.size,
      receivedBytes: row.receivedBytes,
      complete: row.uploadedAt !== null,
      sha256: row.sha256,
      uploadedAt: row.uploadedAt?.toISOString() ?? null,
    });
  }
}
