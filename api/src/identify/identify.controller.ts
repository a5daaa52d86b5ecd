import { BadRequestException, Body, Controller, HttpCode, Post, UploadedFile } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiBody,
  ApiConsumes,
  ApiExtraModels,
  ApiOkResponse,
  ApiOperation,
  ApiPayloadTooLargeResponse,
  ApiTags,
  ApiUnauthorizedResponse,
  getSchemaPath,
} from '@nestjs/swagger';
import { DEFAULT_MAX_IMPORT_BYTES } from '@siteband/shared';
import { ErrorResponseDto } from '../common/error-response.dto';
import { SingleFileUpload } from '../common/single-file-upload';
import { IdentifyRequestDto, PHASES, TECHNIQUES } from './dto/identify-request.dto';
import { IdentifyResultDto } from './dto/identify-result.dto';
import { IdentifyService, type IdentifyAnswer, type UploadedScanFile } from './identify.service';

/** Likely compounds for a scan: any signed-in user. */
@ApiTags('identify')
@ApiBearerAuth()
@ApiUnauthorizedResponse({ type: ErrorResponseDto })
@ApiExtraModels(IdentifyRequestDto)
@Controller('identify')
export class IdentifyController {
  constructor(private readonly identify: IdentifyService) {}

  @Post()
  @HttpCode(200)
  @SingleFileUpload(DEFAULT_MAX_IMPORT_BYTES)
  @ApiOperation({
    summary: 'Likely compounds for a scan',
    description:
      'Upload the instrument’s file (JCAMP-DX, CSV, TSV or text) as multipart field `file`, or send JSON with a `spectrum` ' +
      'or a `peaks` list. Ranked against the compound library in force. Identification is presumptive: confirm by ' +
      'laboratory analysis and follow the SDS, agency procedures and local codes.',
  })
  @ApiConsumes('multipart/form-data', 'application/json')
  @ApiBody({
    schema: {
      oneOf: [
        {
          type: 'object',
          required: ['file', 'technique', 'phase'],
          properties: {
            file: { type: 'string', format: 'binary', description: `At most ${DEFAULT_MAX_IMPORT_BYTES} bytes` },
            technique: { type: 'string', enum: [...TECHNIQUES] },
            phase: { type: 'string', enum: [...PHASES] },
            atr: { type: 'boolean' },
            excitationNm: { type: 'number' },
            toleranceCm1: { type: 'number' },
          },
        },
        { $ref: getSchemaPath(IdentifyRequestDto) },
      ],
    },
  })
  @ApiOkResponse({ type: IdentifyResultDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto, description: 'Unreadable file, invalid spectrum or peaks, wrong technique or phase' })
  @ApiPayloadTooLargeResponse({ type: ErrorResponseDto, description: 'The file is over the size limit' })
  async rank(@UploadedFile() file: UploadedScanFile | undefined, @Body() request: IdentifyRequestDto): Promise<IdentifyAnswer> {
    const given = [file && 'file', request.spectrum && 'spectrum', request.peaks && 'peaks'].filter(Boolean);
    if (given.length !== 1) {
      throw new BadRequestException(
        given.length === 0 ? 'Send a file (multipart field "file"), a spectrum or a peak list' : `Send one of file, spectrum or peaks, not ${given.join(' and ')}`,
      );
    }
    if (file) return this.identify.identifyFile(file, request);
    if (request.spectrum) return this.identify.identifyJsonSpectrum(request.spectrum, request);
    return this.identify.identifyPeaks(request.peaks!, request);
  }
}
