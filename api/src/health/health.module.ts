import { Module } from '@nestjs/common';
import { HealthController } from './health.controller';

/** GET /api/health. */
@Module({ controllers: [HealthController] })
export class HealthModule {}
