import { Body, Controller, Get, HttpCode, HttpStatus, Param, ParseUUIDPipe, Post, Query } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { CurrentUser } from '../auth/current-user.decorator';
import { Roles } from '../auth/roles.decorator';
import { ErrorResponseDto } from '../common/error-response.dto';
import {
  AcknowledgeEscalationDto,
  AddEscalationNoteDto,
  CloseEscalationDto,
  EscalationDetailDto,
  EscalationListDto,
  EscalationListQueryDto,
  EscalationNoteDto,
} from './dto/escalation.dto';
import { EscalationsService } from './escalations.service';

/** The escalation inbox: safety officers act on escalations, supervisors read them and add notes. */
@ApiTags('escalations')
@ApiBearerAuth()
@ApiUnauthorizedResponse({ type: ErrorResponseDto })
@ApiForbiddenResponse({ type: ErrorResponseDto, description: 'Not a safety officer (or, for reading and notes, a supervisor)' })
@Controller('escalations')
export class EscalationsController {
  constructor(private readonly escalations: EscalationsService) {}

  @Get()
  @Roles('safety_officer', 'supervisor')
  @ApiOperation({ summary: 'Escalations, raised first, newest arrival first, one page at a time' })
  @ApiOkResponse({ type: EscalationListDto })
  list(@Query() query: EscalationListQueryDto, @CurrentUser() user: AuthenticatedUser): Promise<EscalationListDto> {
    return this.escalations.list(query, user);
  }

  @Get(':id')
  @Roles('safety_officer', 'supervisor')
  @ApiOperation({ summary: 'An escalation with its notes and a summary of its case' })
  @ApiOkResponse({ type: EscalationDetailDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  detail(@Param('id', new ParseUUIDPipe()) id: string, @CurrentUser() user: AuthenticatedUser): Promise<EscalationDetailDto> {
    return this.escalations.detail(id, user);
  }

  @Post(':id/acknowledge')
  @HttpCode(HttpStatus.OK)
  @Roles('safety_officer')
  @ApiOperation({ summary: 'Acknowledge with the action taken (stops the reminders)' })
  @ApiOkResponse({ type: EscalationDetailDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto, description: 'baseVersion is stale, or the escalation is no longer raised' })
  acknowledge(
    @Param('id', new ParseUUIDPipe()) id: string,
    @Body() dto: AcknowledgeEscalationDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<EscalationDetailDto> {
    return this.escalations.acknowledge(id, dto, user);
  }

  @Post(':id/notes')
  @Roles('safety_officer', 'supervisor')
  @ApiOperation({ summary: 'Add a note (tablets pull it as escalationNote)' })
  @ApiCreatedResponse({ type: EscalationNoteDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  addNote(
    @Param('id', new ParseUUIDPipe()) id: string,
    @Body() dto: AddEscalationNoteDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<EscalationNoteDto> {
    return this.escalations.addNote(id, dto, user);
  }

  @Post(':id/close')
  @HttpCode(HttpStatus.OK)
  @Roles('safety_officer')
  @ApiOperation({ summary: 'Close an acknowledged escalation' })
  @ApiOkResponse({ type: EscalationDetailDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto, description: 'baseVersion is stale, or the escalation is not acknowledged' })
  close(
    @Param('id', new ParseUUIDPipe()) id: string,
    @Body() dto: CloseEscalationDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<EscalationDetailDto> {
    return this.escalations.close(id, dto, user);
  }
}
