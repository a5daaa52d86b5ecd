import { ApiProperty } from '@nestjs/swagger';

/** GET /api/health. */
export class HealthDto {
  @ApiProperty({ enum: ['ok', 'degraded'] })
  status: 'ok' | 'degraded';

  @ApiProperty({ enum: ['up', 'down'] })
  database: 'up' | 'down';

  @ApiProperty({ example: '0.1.0' })
  version: string;
}
