import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, Length, Min, ValidateIf } from 'class-validator';
import { ESCALATION_ACTIONS, ESCALATION_STATUSES, PPE_LEVELS, type EscalationAction, type EscalationStatus, type PpeLevel } from '../../scans/escalation.entity';
import { PageQuery, type PageLimits } from '../../common/page-query';

/** `GET /api/escalations` pages: 25 escalations unless asked, at most 100. */
export const ESCALATIONS_PAGE: PageLimits = { defaultPageSize: 25, maxPageSize: 100 };

const trimmed = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);

/** `GET /api/escalations` query. */
export class EscalationListQueryDto extends PageQuery(ESCALATIONS_PAGE) {
  @ApiPropertyOptional({ description: `Comma-separated statuses (${ESCALATION_STATUSES.join(', ')}); all when left out`, example: 'raised,acknowledged' })
  @IsOptional()
  @Transform(({ value }) => (typeof value === 'string' ? value.split(',').map((part) => part.trim()).filter(Boolean) : value))
  @IsIn(ESCALATION_STATUSES, { each: true, message: `status must be a comma-separated list of ${ESCALATION_STATUSES.join(', ')}` })
  status?: EscalationStatus[];
}

/** `POST /api/escalations/:id/acknowledge`. */
export class AcknowledgeEscalationDto {
  @ApiProperty({ enum: ESCALATION_ACTIONS })
  @IsIn(ESCALATION_ACTIONS, { message: `actionTaken must be one of ${ESCALATION_ACTIONS.join(', ')}` })
  actionTaken: EscalationAction;

  @ApiPropertyOptional({ enum: PPE_LEVELS, description: 'Required with ppe_required, refused otherwise (US EPA levels of protection A–D)' })
  @ValidateIf((dto: AcknowledgeEscalationDto) => dto.actionTaken === 'ppe_required' || dto.ppeLevel !== undefined)
  @IsIn(PPE_LEVELS, { message: 'ppeLevel must be A, B, C or D when actionTaken is ppe_required' })
  ppeLevel?: PpeLevel;

  @ApiPropertyOptional({ maxLength: 2000 })
  @IsOptional()
  @Transform(trimmed)
  @IsString()
  @Length(1, 2000)
  comment?: string;

  @ApiProperty({ minimum: 1, description: 'The escalation version you saw; 409 when it has changed since' })
  @IsInt()
  @Min(1)
  baseVersion: number;
}

/** `POST /api/escalations/:id/close`. */
export class CloseEscalationDto {
  @ApiProperty({ minLength: 1, maxLength: 2000 })
  @Transform(trimmed)
  @IsString()
  @Length(1, 2000)
  comment: string;

  @ApiProperty({ minimum: 1, description: 'The escalation version you saw; 409 when it has changed since' })
  @IsInt()
  @Min(1)
  baseVersion: number;
}

/** `POST /api/escalations/:id/notes`. */
export class AddEscalationNoteDto {
  @ApiProperty({ minLength: 1, maxLength: 4000 })
  @Transform(trimmed)
  @IsString()
  @Length(1, 4000)
  text: string;
}

/** A note on an escalation (also pulled as `escalationNote`). */
export class EscalationNoteDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ format: 'uuid' }) escalationId: string;
  @ApiProperty({ format: 'uuid' }) caseId: string;
  @ApiProperty() text: string;
  @ApiProperty({ format: 'uuid' }) authorId: string;
  @ApiProperty() authorName: string;
  @ApiProperty({ type: String, format: 'date-time' }) at: string;
}

/** The person a record names. */
export class PersonDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() displayName: string;
}

/** An escalation with what a safety officer needs to judge it. */
export class EscalationDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ description: 'Send as baseVersion to acknowledge or close' }) version: number;
  @ApiProperty({ enum: ESCALATION_STATUSES }) status: EscalationStatus;
  @ApiProperty({ format: 'uuid' }) caseId: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) scanId: string | null;
  @ApiProperty() siteName: string;
  @ApiProperty({ type: String, nullable: true }) address: string | null;
  @ApiProperty({ type: PersonDto, description: 'The inspector who raised it' }) inspector: PersonDto;
  @ApiProperty({ type: String, format: 'date-time', description: 'On the tablet (may be long before arrival when raised offline)' }) raisedAt: string;
  @ApiProperty({ type: String, format: 'date-time', description: 'When it reached the server' }) receivedAt: string;
  @ApiProperty() reason: string;
  @ApiProperty({ type: String, isArray: true }) hazardClasses: string[];
  @ApiProperty({ type: String, isArray: true, description: 'Likely compounds of the escalated scan, best first' }) compounds: string[];
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) acknowledgedBy: string | null;
  @ApiProperty({ type: String, nullable: true }) acknowledgedByName: string | null;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) acknowledgedAt: string | null;
  @ApiProperty({ enum: ESCALATION_ACTIONS, nullable: true }) actionTaken: EscalationAction | null;
  @ApiProperty({ enum: PPE_LEVELS, nullable: true }) ppeLevel: PpeLevel | null;
  @ApiProperty({ type: String, nullable: true }) ackComment: string | null;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) closedBy: string | null;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) closedAt: string | null;
  @ApiProperty({ type: String, nullable: true }) closeComment: string | null;
  @ApiProperty({ description: 'Rounds of mail to the safety officers so far (arrival + reminders)' }) notifiedCount: number;
  @ApiProperty({ type: String, format: 'date-time', nullable: true, description: 'Next reminder while raised' }) nextNotifyAt: string | null;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) secondContactNotifiedAt: string | null;
}

/** One page of escalations. */
export class EscalationListDto {
  @ApiProperty({ type: EscalationDto, isArray: true }) items: EscalationDto[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
}

/** The case an escalation belongs to, in brief. */
export class EscalationCaseSummaryDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() siteName: string;
  @ApiProperty({ type: String, nullable: true }) address: string | null;
  @ApiProperty() status: string;
  @ApiProperty({ type: String, format: 'date-time' }) startedAt: string;
  @ApiProperty({ type: Number, nullable: true }) latitude: number | null;
  @ApiProperty({ type: Number, nullable: true }) longitude: number | null;
  @ApiProperty({ type: PersonDto }) inspector: PersonDto;
}

/** An escalation with its notes and its case. */
export class EscalationDetailDto extends EscalationDto {
  @ApiProperty({ type: EscalationNoteDto, isArray: true, description: 'Oldest first' }) notes: EscalationNoteDto[];
  @ApiProperty({ type: EscalationCaseSummaryDto }) case: EscalationCaseSummaryDto;
}
