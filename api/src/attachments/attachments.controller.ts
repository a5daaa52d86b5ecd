import { Controller, Get, Headers, HttpCode, Param, ParseUUIDPipe, Put, Req, StreamableFile } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiConflictResponse,
  ApiConsumes,
  ApiForbiddenResponse,
  ApiHeader,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiPayloadTooLargeResponse,
  ApiTags,
  ApiUnauthorizedResponse,
  ApiUnprocessableEntityResponse,
  ApiUnsupportedMediaTypeResponse,
} from '@nestjs/swagger';
import type { Request } from 'express';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { CurrentUser } from '../auth/current-user.decorator';
import { Roles } from '../auth/roles.decorator';
import { CASE_READER_ROLES, CASE_WRITER_ROLES } from '../cases/case-access';
import { ErrorResponseDto } from '../common/error-response.dto';
import { AttachmentUploadsService } from './attachment-uploads.service';
import { AttachmentStatusDto } from './dto/attachment-status.dto';

/** Attachment bytes: resumable upload, upload state and download. The metadata travels through sync. */
@ApiTags('attachments')
@ApiBearerAuth()
@ApiUnauthorizedResponse({ type: ErrorResponseDto })
@ApiForbiddenResponse({ type: ErrorResponseDto })
@ApiNotFoundResponse({ type: ErrorResponseDto, description: 'No such attachment, or not in a case you may see' })
@Controller('attachments')
export class AttachmentsController {
  constructor(private readonly uploads: AttachmentUploadsService) {}

  @Put(':id/content')
  @HttpCode(200)
  @Roles(...CASE_WRITER_ROLES)
  @ApiOperation({ summary: 'Upload the file, whole or one chunk at a time (Content-Range), verified against the declared SHA-256' })
  @ApiConsumes('image/jpeg', 'image/png', 'image/webp', 'chemical/x-jcamp-dx', 'text/csv', 'text/tab-separated-values', 'text/plain')
  @ApiHeader({ name: 'Content-Range', required: false, description: 'bytes <start>-<end>/<size>; start must be the received offset' })
  @ApiOkResponse({ type: AttachmentStatusDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto, description: 'The chunk does not start at the received offset' })
  @ApiPayloadTooLargeResponse({ type: ErrorResponseDto })
  @ApiUnsupportedMediaTypeResponse({ type: ErrorResponseDto })
  @ApiUnprocessableEntityResponse({ type: ErrorResponseDto, description: 'SHA-256 mismatch: nothing kept, start again' })
  upload(
    @Param('id', new ParseUUIDPipe()) id: string,
    @Headers('content-type') contentType: string | undefined,
    @Headers('content-range') contentRange: string | undefined,
    @Req() request: Request,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<AttachmentStatusDto> {
    return this.uploads.receive(id, user, { contentType, contentRange, body: request });
  }

  @Get(':id/status')
  @Roles(...CASE_READER_ROLES)
  @ApiOperation({ summary: 'How many bytes have arrived (the resume offset) and whether the upload is complete' })
  @ApiOkResponse({ type: AttachmentStatusDto })
  status(@Param('id', new ParseUUIDPipe()) id: string, @CurrentUser() user: AuthenticatedUser): Promise<AttachmentStatusDto> {
    return this.uploads.status(id, user);
  }

  @Get(':id/content')
  @Roles(...CASE_READER_ROLES)
  @ApiOperation({ summary: 'Download the verified file' })
  @ApiOkResponse({ description: 'The file, with its declared content type' })
  @ApiConflictResponse({ type: ErrorResponseDto, description: 'The upload is not complete' })
  content(@Param('id', new ParseUUIDPipe()) id: string, @CurrentUser() user: AuthenticatedUser): Promise<StreamableFile> {
    return this.uploads.content(id, user);
  }
}
