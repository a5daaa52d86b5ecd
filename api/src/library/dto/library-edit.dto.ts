import { ApiProperty } from '@nestjs/swagger';
import type { LibraryEdit } from '../library-edit.entity';

/** One saved edit of a compound, as the history lists it. */
export class LibraryEditDto {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'ammonia' })
  compoundId: string;

  @ApiProperty({ example: 1 })
  version: number;

  @ApiProperty({ type: 'object', additionalProperties: true })
  document: Record<string, unknown>;

  @ApiProperty()
  retired: boolean;

  @ApiProperty({ format: 'uuid' })
  editedBy: string;

  @ApiProperty({ type: String, format: 'date-time' })
  editedAt: string;

  /** The public fields of an edit row. */
  static fromEntity(edit: LibraryEdit): LibraryEditDto {
    return Object.assign(new LibraryEditDto(), {
      id: edit.id,
      compoundId: edit.compoundId,
      version: edit.version,
      document: edit.document,
      retired: edit.retired,
      editedBy: edit.editedBy,
      editedAt: edit.editedAt.toISOString(),
    });
  }
}
