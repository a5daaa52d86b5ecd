import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module';
import { EscalationAlerts } from '../escalations/escalation-alerts';
import { EscalationsModule } from '../escalations/escalations.module';
import { ScansModule } from '../scans/scans.module';
import { ChangeApplier } from './change-applier';
import { SYNC_WRITE_LISTENERS, type SyncWriteListener } from './sync-handler';
import { SyncController } from './sync.controller';
import { SyncRegistry } from './sync-registry';
import { SyncService } from './sync.service';

/** Push and pull of cases, samples, hand-overs, scans, instrument checks, notes, escalations and attachment metadata. */
@Module({
  imports: [ScansModule, AuditModule, EscalationsModule],
  controllers: [SyncController],
  providers: [
    SyncService,
    ChangeApplier,
    SyncRegistry,
    // Work that commits with a change: the mails of a new escalation.
    { provide: SYNC_WRITE_LISTENERS, inject: [EscalationAlerts], useFactory: (alerts: EscalationAlerts): SyncWriteListener[] => [alerts] },
  ],
  exports: [SyncService, SyncRegistry],
})
export class SyncModule {}
