import { Module } from '@nestjs/common';
import { ScansModule } from '../scans/scans.module';
import { ScanExportController } from './scan-export.controller';
import { ScanExportService } from './scan-export.service';

/** What leaves the system as files: the JCAMP-DX export of a scan and the case report. */
@Module({
  imports: [ScansModule],
  controllers: [ScanExportController],
  providers: [ScanExportService],
})
export class ReportsModule {}
