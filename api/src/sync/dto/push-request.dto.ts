import { ApiProperty } from '@nestjs/swagger';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsObject, IsString, IsUUID, Length } from 'class-validator';
import { TakenAsIs } from '../validate-data';
import { ChangeEnvelopeDto } from './change-envelope.dto';

/** Most changes one push may carry; a client with more sends several batches. */
export const MAX_CHANGES_PER_BATCH = 200;

/**
 * A batch of changes from one device. Each change is validated on its own (see `ChangeEnvelopeDto`), so
 * one bad change is rejected alone and the others still apply.
 */
export class PushRequestDto {
  @ApiProperty({ description: 'Stable id of the device or browser profile', maxLength: 100 })
  @IsString()
  @Length(1, 100)
  clientId: string;

  @ApiProperty({ format: 'uuid', description: 'Client-generated; for tracing (idempotency is per changeId)' })
  @IsUUID()
  batchId: string;

  // Documented as envelopes but validated one by one by the change applier, so one bad change is rejected alone.
  @ApiProperty({ type: ChangeEnvelopeDto, isArray: true, description: 'Applied in order, each on its own', maxItems: MAX_CHANGES_PER_BATCH })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(MAX_CHANGES_PER_BATCH)
  @IsObject({ each: true })
  @TakenAsIs()
  changes: Record<string, unknown>[];
}
