import { Controller, Get, Param, ParseUUIDPipe, Query } from '@nestjs/common';
import {
  ApiBearerAuth,
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
import { CASE_READER_ROLES } from './case-access';
import { CasesService } from './cases.service';
import { CaseDetailDto, CaseListDto, CaseListQueryDto } from './dto/case-list.dto';

/** Read-only case views for the web: inspectors see their own cases, supervisors and safety officers all. */
@ApiTags('cases')
@ApiBearerAuth()
@ApiUnauthorizedResponse({ type: ErrorResponseDto })
@ApiForbiddenResponse({ type: ErrorResponseDto, description: 'Administrators have no case access' })
@Roles(...CASE_READER_ROLES)
@Controller('cases')
export class CasesController {
  constructor(private readonly cases: CasesService) {}

  @Get()
  @ApiOperation({ summary: 'The cases you may see, newest visit first, one page at a time' })
  @ApiOkResponse({ type: CaseListDto })
  list(@Query() query: CaseListQueryDto, @CurrentUser() user: AuthenticatedUser): Promise<CaseListDto> {
    return this.cases.list(query, user);
  }

  @Get(':id')
  @ApiOperation({ summary: 'A case with its samples, hand-overs, instrument checks, scans, notes, escalations and attachment metadata' })
  @ApiOkResponse({ type: CaseDetailDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto, description: 'No such case, or not yours' })
  detail(@Param('id', new ParseUUIDPipe()) id: string, @CurrentUser() user: AuthenticatedUser): Promise<CaseDetailDto> {
    return this.cases.detail(id, user);
  }
}
