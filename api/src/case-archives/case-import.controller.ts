import { BadRequestException, Controller, HttpCode, Post, UploadedFile } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiBody,
  ApiConsumes,
  ApiForbiddenResponse,
  ApiOkResponse,
  ApiOperation,
  ApiPayloadTooLargeResponse,
  ApiTags,
  ApiUnauthorizedResponse,
  ApiUnprocessableEntityResponse,
  ApiUnsupportedMediaTypeResponse,
} from '@nestjs/swagger';
import { DEFAULT_CASE_ARCHIVE_LIMITS } from '@siteband/shared';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { CurrentUser } from '../auth/current-user.decorator';
import { Roles } from '../auth/roles.decorator';
import { CASE_WRITER_ROLES } from '../cases/case-access';
import { ErrorResponseDto } from '../common/error-response.dto';
import { SingleFileUpload } from '../common/single-file-upload';
import { CaseImportService } from './case-import.service';
import { CaseImportResultDto } from './dto/case-import-result.dto';

/** Case archives made on a tablet (shared/src/case-archive/SPEC.md), imported by the case's own inspector. */
@ApiTags('cases')
@ApiBearerAuth()
@ApiUnauthorizedResponse({ type: ErrorResponseDto })
@Controller('cases')
export class CaseImportController {
  constructor(private readonly imports: CaseImportService) {}

  @Post('import')
  @HttpCode(200)
  @Roles(...CASE_WRITER_ROLES)
  @SingleFileUpload(DEFAULT_CASE_ARCHIVE_LIMITS.maxArchiveBytes)
  @ApiOperation({
    summary: 'Import a case archive exported from a tablet',
    description:
      'Multipart field `file`: the .zip. Every file is checked against its SHA-256 before anything is written; the records are applied ' +
      'by the same rules as sync (an archive imported twice changes nothing) and the files stored as verified attachments.',
  })
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', required: ['file'], properties: { file: { type: 'string', format: 'binary' } } } })
  @ApiOkResponse({ type: CaseImportResultDto, description: 'What became of each record and file' })
  @ApiBadRequestResponse({ type: ErrorResponseDto, description: 'No file in field `file`' })
  @ApiForbiddenResponse({ type: ErrorResponseDto, description: 'Not an inspector, or the archive was exported by someone else' })
  @ApiPayloadTooLargeResponse({ type: ErrorResponseDto, description: 'The archive, or what it unpacks to, is over the limits' })
  @ApiUnsupportedMediaTypeResponse({ type: ErrorResponseDto, description: 'The file is not a ZIP' })
  @ApiUnprocessableEntityResponse({ type: ErrorResponseDto, description: 'Not a valid case archive: a file missing or not matching its SHA-256, an unknown format or version (the message names the entry)' })
  async import(@UploadedFile() file: { buffer: Buffer } | undefined, @CurrentUser() user: AuthenticatedUser): Promise<CaseImportResultDto> {
    if (!file) throw new BadRequestException('Send the case archive as multipart field "file"');
    return this.imports.import(file.buffer, user);
  }
}
