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
import type { StructureCheck } from '@siteband/shared';
import { ErrorResponseDto } from '../common/error-response.dto';
import { SingleFileUpload } from '../common/single-file-upload';
import { MAX_STRUCTURE_BYTES, StructureCheckRequestDto } from './dto/structure-check-request.dto';
import { StructureCheckDto } from './dto/structure-check.dto';
import { SymmetryService, type UploadedStructureFile } from './symmetry.service';

/** The structure check: any signed-in user. */
@ApiTags('symmetry')
@ApiBearerAuth()
@ApiUnauthorizedResponse({ type: ErrorResponseDto })
@ApiExtraModels(StructureCheckRequestDto)
@Controller('symmetry')
export class SymmetryController {
  constructor(private readonly symmetry: SymmetryService) {}

  @Post()
  @HttpCode(200)
  @SingleFileUpload(MAX_STRUCTURE_BYTES)
  @ApiOperation({
    summary: 'Structure check: point group, Γvib and IR/Raman activity of a structure',
    description: 'JSON `{ structure, format?, tolerance?, convention? }`, or the file as multipart field `file` with the same options as fields.',
  })
  @ApiConsumes('application/json', 'multipart/form-data')
  @ApiBody({
    schema: {
      oneOf: [
        { $ref: getSchemaPath(StructureCheckRequestDto) },
        {
          type: 'object',
          required: ['file'],
          properties: {
            file: { type: 'string', format: 'binary', description: `XYZ or MOL V2000, at most ${MAX_STRUCTURE_BYTES} bytes` },
            format: { type: 'string', enum: ['xyz', 'mol'] },
            tolerance: { type: 'number' },
            convention: { type: 'string', enum: ['yz', 'xz'] },
          },
        },
      ],
    },
  })
  @ApiOkResponse({ type: StructureCheckDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto, description: 'The structure cannot be read (the message names the line) or checked' })
  @ApiPayloadTooLargeResponse({ type: ErrorResponseDto, description: 'The file is over the size limit' })
  check(@UploadedFile() file: UploadedStructureFile | undefined, @Body() request: StructureCheckRequestDto): StructureCheck {
    if (file && request.structure !== undefined) throw new BadRequestException('Send the structure as a file or as text, not both');
    if (file) return this.symmetry.checkFile(file, request);
    if (request.structure === undefined) throw new BadRequestException('Send a structure (JSON field "structure" or multipart field "file")');
    return this.symmetry.checkText(request.structure, request);
  }
}
