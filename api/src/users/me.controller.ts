import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiOperation, ApiTags, ApiUnauthorizedResponse } from '@nestjs/swagger';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { CurrentUser } from '../auth/current-user.decorator';
import { ErrorResponseDto } from '../common/error-response.dto';
import { UserSummaryDto } from './dto/user.dto';

/** The signed-in user (any role). */
@ApiTags('users')
@ApiBearerAuth()
@Controller('me')
export class MeController {
  @Get()
  @ApiOperation({ summary: 'Who am I: the signed-in user as of now' })
  @ApiOkResponse({ type: UserSummaryDto })
  @ApiUnauthorizedResponse({ type: ErrorResponseDto })
  me(@CurrentUser() user: AuthenticatedUser): UserSummaryDto {
    return Object.assign(new UserSummaryDto(), user);
  }
}
