import { Module } from '@nestjs/common';
import { ObjectStorageService } from './object-storage.service';

/** Object storage (S3) for attachment bytes. */
@Module({
  providers: [ObjectStorageService],
  exports: [ObjectStorageService],
})
export class StorageModule {}
