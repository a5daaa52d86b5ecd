import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module';
import { IdentifyModule } from '../identify/identify.module';
import { StorageModule } from '../storage/storage.module';
import { RawScanFiles } from './raw-scan-files';
import { ScanRecomputeQueue } from './scan-recompute.queue';
import { ScanRecomputeService } from './scan-recompute.service';

/** Server-side recomputation of synced scans' identifications (the records themselves travel through sync). */
@Module({
  imports: [AuditModule, IdentifyModule, StorageModule],
  providers: [ScanRecomputeService, ScanRecomputeQueue, RawScanFiles],
  exports: [ScanRecomputeQueue, RawScanFiles],
})
export class ScansModule {}
