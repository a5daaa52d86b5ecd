import { UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';

/**
 * Accepts at most one file, in multipart field `file`, of at most `maxBytes`, beside a few short
 * option fields. Multer reads multipart bodies only: a JSON body passes straight through to the
 * validation pipe, so one route serves both.
 */
export function SingleFileUpload(maxBytes: number): MethodDecorator & ClassDecorator {
  return UseInterceptors(FileInterceptor('file', { limits: { fileSize: maxBytes, files: 1, fields: 10, fieldSize: 1024 } }));
}
