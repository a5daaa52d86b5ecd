import { Module } from '@nestjs/common';
import { AttachmentsModule } from '../attachments/attachments.module';
import { SyncModule } from '../sync/sync.module';
import { CaseImportController } from './case-import.controller';
import { CaseImportService } from './case-import.service';

/** Import of case archives (one case in a ZIP) through sync and the attachment upload path. */
@Module({
  imports: [SyncModule, AttachmentsModule],
  controllers: [CaseImportController],
  providers: [CaseImportService],
})
export class CaseArchivesModule {}
