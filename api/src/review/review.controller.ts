import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Post, Query, Res } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiConflictResponse,
  ApiForbiddenResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiProduces,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { Response } from 'express';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { CurrentUser } from '../auth/current-user.decorator';
import { Roles } from '../auth/roles.decorator';
import { CASE_READER_ROLES, QUEUE_READER_ROLES, REVIEWER_ROLES } from '../cases/case-access';
import { ErrorResponseDto } from '../common/error-response.dto';
import { CaseBundleDto } from './dto/case-bundle.dto';
import { DecisionRequestDto } from './dto/decision-request.dto';
import { DecisionResultDto } from './dto/decision.dto';
import { QueuePageDto, QueueQueryDto } from './dto/queue.dto';
import { ReviewQueueService } from './review-queue.service';
import { ReviewService } from './review.service';

/** The supervisor's review: the queue of synced cases, a case on one page, and decisions. */
@ApiTags('review')
@ApiBearerAuth()
@ApiUnauthorizedResponse({ type: ErrorResponseDto })
@ApiForbiddenResponse({ type: ErrorResponseDto, description: 'Not a role of this route (administrators have no case access)' })
@Controller('review')
export class ReviewController {
  constructor(
    private readonly review: ReviewService,
    private readonly queue: ReviewQueueService,
  ) {}

  @Get('queue')
  @Roles(...QUEUE_READER_ROLES)
  @ApiOperation({ summary: 'The review queue: cases that left the tablet, filtered, sorted and paged' })
  @ApiOkResponse({ type: QueuePageDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  queuePage(@Query() query: QueueQueryDto): Promise<QueuePageDto> {
    return this.queue.page(query);
  }

  @Get('queue.csv')
  @Roles(...QUEUE_READER_ROLES)
  @ApiOperation({ summary: 'Every matching queue row as CSV (same filters and order; no paging)' })
  @ApiProduces('text/csv')
  @ApiOkResponse({ schema: { type: 'string' } })
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  async queueCsv(@Query() query: QueueQueryDto, @Res({ passthrough: true }) response: Response): Promise<string> {
    const csv = await this.queue.csv(query);
    // Set only once the CSV exists, so an error keeps the JSON error shape and type.
    response.setHeader('Content-Type', 'text/csv; charset=utf-8');
    response.setHeader('Content-Disposition', 'attachment; filename="review-queue.csv"');
    return csv;
  }

  @Get('cases/:caseId')
  @Roles(...CASE_READER_ROLES)
  @ApiOperation({ summary: 'Everything of a case on one page, with every review decision' })
  @ApiOkResponse({ type: CaseBundleDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto, description: 'No such case, or not yours' })
  bundle(@Param('caseId', new ParseUUIDPipe()) caseId: string, @CurrentUser() user: AuthenticatedUser): Promise<CaseBundleDto> {
    return this.review.bundle(caseId, user);
  }

  @Post('cases/:caseId/decisions')
  @HttpCode(201)
  @Roles(...REVIEWER_ROLES)
  @ApiOperation({ summary: 'Append a decision: accept, replace or needs_lab on a scan; return, sign_off or reopen the case' })
  @ApiOkResponse({ type: DecisionResultDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto, description: 'Stale baseVersion, or the case is not in a status this decision applies to' })
  decide(
    @Param('caseId', new ParseUUIDPipe()) caseId: string,
    @Body() body: DecisionRequestDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<DecisionResultDto> {
    return this.review.decide(caseId, body, user);
  }
}
