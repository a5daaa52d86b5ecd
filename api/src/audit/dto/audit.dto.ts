import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsString, IsUUID, Length } from 'class-validator';
import type { AuditEntry } from '../audit-entry.entity';
import { PageQuery, type PageLimits } from '../../common/page-query';

/** `GET /api/audit` pages: 50 entries unless asked, at most 200. */
export const AUDIT_PAGE: PageLimits = { defaultPageSize: 50, maxPageSize: 200 };

/** `GET /api/audit` query. */
export class AuditListQueryDto extends PageQuery(AUDIT_PAGE) {
  @ApiPropertyOptional({ description: 'Kind of record: case, sample, handover, scan, note, instrumentCheck, escalation, attachment, decision, user…' })
  @IsOptional()
  @IsString()
  @Length(1, 40)
  entity?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @Length(1, 64)
  entityId?: string;

  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID()
  caseId?: string;
}

/** One audit entry as the admin sees it. */
export class AuditEntryDto {
  @ApiProperty()
  seq: number;

  @ApiProperty({ format: 'date-time' })
  at: string;

  @ApiProperty({ type: String, nullable: true, description: 'null for the server itself' })
  actorId: string | null;

  @ApiProperty({ type: String, nullable: true })
  actorRole: string | null;

  @ApiProperty()
  entity: string;

  @ApiProperty()
  entityId: string;

  @ApiProperty({ type: String, nullable: true })
  caseId: string | null;

  @ApiProperty()
  action: string;

  @ApiProperty({ type: Object, nullable: true, description: 'The record before the change; null when created' })
  before: unknown;

  @ApiProperty({ type: Object, nullable: true, description: 'The record after the change; null when deleted' })
  after: unknown;

  @ApiProperty()
  prevHash: string;

  @ApiProperty()
  hash: string;

  static of(row: AuditEntry): AuditEntryDto {
    return {
      seq: row.seq,
      at: row.at.toISOString(),
      actorId: row.actorId,
      actorRole: row.actorRole,
      entity: row.entity,
      entityId: row.entityId,
      caseId: row.caseId,
      action: row.action,
      before: row.before === null ? null : JSON.parse(row.before),
      after: row.after === null ? null : JSON.parse(row.after),
      prevHash: row.prevHash,
      hash: row.hash,
    };
  }
}

/** One page of audit entries, newest first. */
export class AuditListDto {
  @ApiProperty({ type: AuditEntryDto, isArray: true })
  items: AuditEntryDto[];

  @ApiProperty()
  total: number;

  @ApiProperty()
  page: number;

  @ApiProperty()
  pageSize: number;
}

/** The first broken link of the chain. */
export class BrokenLinkDto {
  @ApiProperty({ description: 'The seq where the chain breaks' })
  seq: number;

  @ApiProperty({ description: 'content hash mismatch, prevHash mismatch, gap in seq…' })
  reason: string;
}

/** The answer of a walk along the whole chain. */
export class AuditVerifyDto {
  @ApiProperty()
  ok: boolean;

  @ApiProperty({ description: 'Entries checked before the first broken link (all of them when ok)' })
  checked: number;

  @ApiPropertyOptional({ type: BrokenLinkDto })
  firstBroken?: BrokenLinkDto;
}
