import { Module } from '@nestjs/common';
import { ScansModule } from '../scans/scans.module';
import { StorageModule } from '../storage/storage.module';
import { AttachmentUploadsService } from './attachment-uploads.service';
import { AttachmentsController } from './attachments.controller';

/** Attachment bytes in object storage. */
@Module({
  imports: [StorageModule, ScansModule],
  controllers: [AttachmentsController],
  providers: [AttachmentUploadsService],
  exports: [AttachmentUploadsService],
})
export class AttachmentsModule {}
