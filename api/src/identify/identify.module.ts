import { Module } from '@nestjs/common';
import { LibraryModule } from '../library/library.module';
import { IdentifyController } from './identify.controller';
import { IdentifyService } from './identify.service';

/** Likely compounds for a scan, against the compound library in force. */
@Module({
  imports: [LibraryModule],
  controllers: [IdentifyController],
  providers: [IdentifyService],
})
export class IdentifyModule {}
