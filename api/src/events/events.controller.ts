import { Controller, Sse, type MessageEvent } from '@nestjs/common';
import { ApiBearerAuth, ApiForbiddenResponse, ApiOkResponse, ApiOperation, ApiTags, ApiUnauthorizedResponse } from '@nestjs/swagger';
import { interval, map, merge, type Observable } from 'rxjs';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { CurrentUser } from '../auth/current-user.decorator';
import { Roles } from '../auth/roles.decorator';
import { CASE_READER_ROLES } from '../cases/case-access';
import { ErrorResponseDto } from '../common/error-response.dto';
import { LiveEventsService } from './live-events.service';

/** A comment line now and then keeps proxies from closing a quiet stream (common practice: under a minute). */
const KEEP_ALIVE_MS = 25_000;

/** Live updates for open dashboards, as server-sent events. */
@ApiTags('events')
@ApiBearerAuth()
@ApiUnauthorizedResponse({ type: ErrorResponseDto })
@ApiForbiddenResponse({ type: ErrorResponseDto, description: 'Administrators have no case access' })
@Roles(...CASE_READER_ROLES)
@Controller('events')
export class EventsController {
  constructor(private readonly events: LiveEventsService) {}

  @Sse()
  @ApiOperation({
    summary:
      'text/event-stream of { type, id, caseId, at } (type also as the event name): escalation.raised|acknowledged|closed, case.submitted, case.decided, for the cases you may see',
  })
  @ApiOkResponse({ description: 'An endless event stream' })
  async stream(@CurrentUser() user: AuthenticatedUser): Promise<Observable<MessageEvent>> {
    const events = (await this.events.streamFor(user)).pipe(map((event): MessageEvent => ({ type: event.type, data: event })));
    return merge(events, interval(KEEP_ALIVE_MS).pipe(map((): MessageEvent => ({ comment: 'keep-alive' }))));
  }
}
