import { Body, Controller, Get, HttpCode, Post, Query } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiForbiddenResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { CurrentUser } from '../auth/current-user.decorator';
import { Roles } from '../auth/roles.decorator';
import { CASE_READER_ROLES, CASE_WRITER_ROLES } from '../cases/case-access';
import { ErrorResponseDto } from '../common/error-response.dto';
import { PushResponseDto } from './dto/change-result.dto';
import { PullQueryDto, PullResponseDto } from './dto/pull.dto';
import { PushRequestDto } from './dto/push-request.dto';
import { SyncService } from './sync.service';

/** Offline sync of cases and everything below them (see src/sync/PROTOCOL.md). */
@ApiTags('sync')
@ApiBearerAuth()
@ApiUnauthorizedResponse({ type: ErrorResponseDto })
@ApiForbiddenResponse({ type: ErrorResponseDto, description: 'Signed in with a role that has no case access here' })
@Controller('sync')
export class SyncController {
  constructor(private readonly sync: SyncService) {}

  @Post('push')
  @HttpCode(200)
  @Roles(...CASE_WRITER_ROLES)
  @ApiOperation({ summary: 'Apply a batch of changes; each is answered applied, duplicate, conflict or rejected' })
  @ApiOkResponse({ type: PushResponseDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto, description: 'The batch itself is malformed (not a single change)' })
  push(@Body() batch: PushRequestDto, @CurrentUser() user: AuthenticatedUser): Promise<PushResponseDto> {
    return this.sync.push(batch, user);
  }

  @Get('pull')
  @Roles(...CASE_READER_ROLES)
  @ApiOperation({ summary: 'Records written after the cursor, for the cases this user may see' })
  @ApiOkResponse({ type: PullResponseDto })
  pull(@Query() query: PullQueryDto, @CurrentUser() user: AuthenticatedUser): Promise<PullResponseDto> {
    return this.sync.pull(query, user);
  }
}
