import { Module } from '@nestjs/common';
import { LibraryModule } from '../library/library.module';
import { IdentifyController } from './identify.controller';
import { IdentifyService } from './identify.service';

/** Likely compounds for a scan, against the compound library in force. */
@Module({
  imports: [LibraryModule],
  controllers: [IdentifyController],
  providers: [IdentifyService],
  // For the server-side recomputation of a synced scan's result.
  exports: [IdentifyService],
})
export class IdentifyModule {}
