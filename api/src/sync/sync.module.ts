import { Module } from '@nestjs/common';
import { ChangeApplier } from './change-applier';
import { SyncController } from './sync.controller';
import { SyncRegistry } from './sync-registry';
import { SyncService } from './sync.service';

/** Push and pull of cases, samples, hand-overs, scans, instrument checks, notes, escalations and attachment metadata. */
@Module({
  controllers: [SyncController],
  providers: [SyncService, ChangeApplier, SyncRegistry],
})
export class SyncModule {}
