import { Module } from '@nestjs/common';
import { EventsController } from './events.controller';
import { LiveEventsService } from './live-events.service';

/** `GET /api/events`: live events read from MariaDB, so every API instance sees every instance's writes. */
@Module({
  controllers: [EventsController],
  providers: [LiveEventsService],
})
export class EventsModule {}
