import { Controller, Get, Param, ParseUUIDPipe, StreamableFile } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiConflictResponse,
  ApiForbiddenResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiProduces,
  ApiTags,
  ApiUnauthorizedResponse,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import { attachmentDisposition } from '../attachments/content-disposition';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { CurrentUser } from '../auth/current-user.decorator';
import { Roles } from '../auth/roles.decorator';
import { CASE_READER_ROLES } from '../cases/case-access';
import { ErrorResponseDto } from '../common/error-response.dto';
import { ScanExportService } from './scan-export.service';

/** Scan exports for everyone who may read the scan's case. */
@ApiTags('reports')
@ApiBearerAuth()
@ApiUnauthorizedResponse({ type: ErrorResponseDto })
@ApiForbiddenResponse({ type: ErrorResponseDto, description: 'Administrators have no case access' })
@Roles(...CASE_READER_ROLES)
@Controller('scans')
export class ScanExportController {
  constructor(private readonly exports: ScanExportService) {}

  @Get(':scanId/spectrum.jdx')
  @ApiOperation({ summary: "The scan's raw file as JCAMP-DX 4.24 (read by the shared importer, written by the shared exporter)" })
  @ApiProduces('chemical/x-jcamp-dx')
  @ApiOkResponse({ description: 'JCAMP-DX text' })
  @ApiNotFoundResponse({ type: ErrorResponseDto, description: 'No such scan, not yours, or no raw file on the server' })
  @ApiConflictResponse({ type: ErrorResponseDto, description: 'The raw file is still being uploaded' })
  @ApiUnprocessableEntityResponse({ type: ErrorResponseDto, description: 'The raw file cannot be read as a spectrum' })
  async jcamp(@Param('scanId', new ParseUUIDPipe()) scanId: string, @CurrentUser() user: AuthenticatedUser): Promise<StreamableFile> {
    const { fileName, text } = await this.exports.jcamp(scanId, user);
    return new StreamableFile(Buffer.from(text, 'utf8'), { type: 'chemical/x-jcamp-dx; charset=utf-8', disposition: attachmentDisposition(fileName) });
  }
}
