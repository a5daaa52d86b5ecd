import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module';
import { ReviewModule } from '../review/review.module';
import { ScansModule } from '../scans/scans.module';
import { CaseReportService } from './case-report.service';
import { ReportsController } from './reports.controller';
import { ScanExportService } from './scan-export.service';

/** What leaves the system as files: the case report (PDF) and the JCAMP-DX export of a scan. */
@Module({
  imports: [ScansModule, ReviewModule, AuditModule],
  controllers: [ReportsController],
  providers: [ScanExportService, CaseReportService],
})
export class ReportsModule {}
