import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, IsString, IsUUID, Length, Max, Min } from 'class-validator';
import type { AuditEntry } from '../audit-entry.entity';

export const MAX_AUDIT_PAGE_SIZE = 200;

/** `GET /api/audit` query. */
export class AuditListQueryDto {
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

  @ApiPropertyOptional({ minimum: 1, default: 1 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  page?: number;

  @ApiPropertyOptional({ minimum: 1, maximum: MAX_AUDIT_PAGE_SIZE, default: 50 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(MAX_AUDIT_PAGE_SIZE)
  pageSize?: number;
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
