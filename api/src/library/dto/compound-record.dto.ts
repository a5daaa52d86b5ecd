import { ApiProperty } from '@nestjs/swagger';
import type { CompoundRecord } from '../library.service';

/** One compound with where it comes from and its latest save. */
export class CompoundRecordDto {
  @ApiProperty({ type: 'object', additionalProperties: true, description: 'The compound entry in the library format (fixtures/library/README.md)' })
  compound: Record<string, unknown>;

  @ApiProperty({ enum: ['bundled', 'edited', 'added'], description: 'bundled: as shipped; edited: a bundled entry changed by a supervisor; added: new' })
  origin: CompoundRecord['origin'];

  @ApiProperty({ description: 'Retired compounds are out of the library in force but keep their history' })
  retired: boolean;

  @ApiProperty({ example: 2, description: 'Edit version of this compound; 0 when it was never edited' })
  version: number;

  @ApiProperty({ type: String, format: 'uuid', nullable: true })
  editedBy: string | null;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  editedAt: string | null;

  /** The record as the API answers it. */
  static from(record: CompoundRecord): CompoundRecordDto {
    return Object.assign(new CompoundRecordDto(), {
      compound: record.compound as unknown as Record<string, unknown>,
      origin: record.origin,
      retired: record.retired,
      version: record.version,
      editedBy: record.editedBy,
      editedAt: record.editedAt?.toISOString() ?? null,
    });
  }
}
