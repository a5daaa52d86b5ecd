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
import { CaseReportService } from './case-report.service';
import { ScanExportService } from './scan-export.service';

/** Files for everyone who may read the case: supervisors, safety officers, the owning inspector. */
@ApiTags('reports')
@ApiBearerAuth()
@ApiUnauthorizedResponse({ type: ErrorResponseDto })
@ApiForbiddenResponse({ type: ErrorResponseDto, description: 'Administrators have no case access' })
@Roles(...CASE_READER_ROLES)
@Controller()
export class ReportsController {
  constructor(
    private readonly exports: ScanExportService,
    private readonly reports: CaseReportService,
  ) {}

  @Get('cases/:caseId/report.pdf')
  @ApiOperation({ summary: 'The case report as PDF: site, samples and chain of custody, scans with spectra, likely compounds, hazards, review, escalations, audit summary' })
  @ApiProduces('application/pdf')
  @ApiOkResponse({ description: 'The PDF' })
  @ApiNotFoundResponse({ type: ErrorResponseDto, description: 'No such case, or not yours' })
  async caseReport(@Param('caseId', new ParseUUIDPipe()) caseId: string, @CurrentUser() user: AuthenticatedUser): Promise<StreamableFile> {
    const { fileName, bytes } = await this.reports.pdf(caseId, user);
    return new StreamableFile(bytes, { type: 'application/pdf', disposition: attachmentDisposition(fileName) });
  }

  @Get('scans/:scanId/spectrum.jdx')
  @ApiOperation({ summary: "The scan's raw file as JCAMP-DX 4.24 (read by the shared importer, written by the shared exporter)" })
  @ApiProduces('chemical/x-jcamp-dx')
  @ApiOkResponse({ description: 'JCAMP-DX text' })
  @ApiNotFoundResponse({ type: ErrorResponseDto, description: 'No such scan, not yours, or no raw file on the server' })
  @ApiConflictResponse({ type: ErrorResponseDto, description: 'The raw file is still being uploaded' })
  @ApiUnprocessableEntityResponse({ type: ErrorResponseDto, description: 'The raw file cannot be read as a spectrum' })
  async spectrumJcamp(@Param('scanId', new ParseUUIDPipe()) scanId: string, @CurrentUser() user: AuthenticatedUser): Promise<StreamableFile> {
    const { fileName, text } = await this.exports.jcamp(scanId, user);
    return new StreamableFile(Buffer.from(text, 'utf8'), { type: 'chemical/x-jcamp-dx; charset=utf-8', disposition: attachmentDisposition(fileName) });
  }
}
