import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module';
import { ScansModule } from '../scans/scans.module';
import { ChangeApplier } from './change-applier';
import { SyncController } from './sync.controller';
import { SyncRegistry } from './sync-registry';
import { SyncService } from './sync.service';

/** Push and pull of cases, samples, hand-overs, scans, instrument checks, notes, escalations and attachment metadata. */
@Module({
  imports: [ScansModule, AuditModule],
  controllers: [SyncController],
  providers: [SyncService, ChangeApplier, SyncRegistry],
  exports: [SyncService, SyncRegistry],
})
export class SyncModule {}
