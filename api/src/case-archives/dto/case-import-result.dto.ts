import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ARCHIVE_ENTITIES, type ArchiveEntity } from '@siteband/shared';

export const RECORD_OUTCOMES = ['imported', 'unchanged', 'conflict', 'refused'] as const;
export type RecordOutcome = (typeof RECORD_OUTCOMES)[number];

export const FILE_OUTCOMES = ['stored', 'unchanged', 'skipped', 'refused'] as const;
export type FileOutcome = (typeof FILE_OUTCOMES)[number];

/** What became of one record of the archive. */
export class ImportedRecordDto {
  @ApiProperty({ enum: ARCHIVE_ENTITIES })
  entity: ArchiveEntity;

  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({
    enum: RECORD_OUTCOMES,
    description:
      'imported: written now; unchanged: the server already had it (synced, or imported before); conflict: the server holds another version, which was kept; refused: not written, see reason',
  })
  outcome: RecordOutcome;

  @ApiPropertyOptional({ description: 'The server version after the import, when the record is on the server' })
  version?: number;

  @ApiPropertyOptional({ description: 'Why it was refused or conflicted, or what the server already had' })
  reason?: string;
}

/** What became of one file of the archive. */
export class ImportedFileDto {
  @ApiProperty({ format: 'uuid' })
  attachmentId: string;

  @ApiProperty({
    enum: FILE_OUTCOMES,
    description: 'stored: verified and stored now; unchanged: already on the server; skipped: its attachment record was not imported; refused: see reason',
  })
  outcome: FileOutcome;

  @ApiPropertyOptional()
  reason?: string;
}

/** The answer to an import: one entry per record and per file, in the archive's order. */
export class CaseImportResultDto {
  @ApiProperty({ format: 'uuid' })
  caseId: string;

  @ApiProperty({ type: ImportedRecordDto, isArray: true })
  records: ImportedRecordDto[];

  @ApiProperty({ type: ImportedFileDto, isArray: true })
  files: ImportedFileDto[];
}
