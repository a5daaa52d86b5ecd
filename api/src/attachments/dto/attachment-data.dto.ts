import { IsIn, IsInt, IsOptional, IsString, IsUUID, Length, Matches, Min } from 'class-validator';
import { ATTACHMENT_KINDS, type AttachmentKind } from '../attachment-limits';
import { ATTACHMENT_OWNER_TYPES, type AttachmentOwnerType } from '../attachment.entity';

/** An attachment's metadata as the tablet sends it, before (or while) the bytes are uploaded. */
export class AttachmentDataDto {
  @IsIn(ATTACHMENT_OWNER_TYPES, { message: 'ownerType must be case, sample or scan' })
  ownerType: AttachmentOwnerType;

  @IsUUID()
  ownerId: string;

  @IsIn(ATTACHMENT_KINDS, { message: 'kind must be photo or raw-scan' })
  kind: AttachmentKind;

  /** A plain file name: no folders. */
  @IsString()
  @Length(1, 255)
  @Matches(/^[^/\\\0]+$/, { message: 'fileName must be a plain file name without / or \\' })
  fileName: string;

  @IsString()
  @Length(3, 100)
  contentType: string;

  @IsInt()
  @Min(1)
  size: number;

  @Matches(/^[0-9a-f]{64}$/, { message: 'sha256 must be the lower-case hex SHA-256 of the file (64 characters)' })
  sha256: string;

  /** What a photo shows (at most PHOTO_CAPTION_MAX_LENGTH characters, checked with the file's limits); absent or null for none. */
  @IsOptional()
  @IsString({ message: 'caption must be text' })
  caption?: string | null;
}
