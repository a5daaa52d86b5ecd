import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module';
import { CasesModule } from '../cases/cases.module';
import { LibraryModule } from '../library/library.module';
import { ReviewQueueService } from './review-queue.service';
import { ReviewController } from './review.controller';
import { ReviewService } from './review.service';

/** The supervisor's review of synced cases. Decisions reach tablets through sync pulls (`decision`). */
@Module({
  imports: [AuditModule, CasesModule, LibraryModule],
  controllers: [ReviewController],
  providers: [ReviewService, ReviewQueueService],
  exports: [ReviewService],
})
export class ReviewModule {}
