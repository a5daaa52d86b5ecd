import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiForbiddenResponse, ApiOkResponse, ApiOperation, ApiTags, ApiUnauthorizedResponse } from '@nestjs/swagger';
import { Roles } from '../auth/roles.decorator';
import { ErrorResponseDto } from '../common/error-response.dto';
import { AuditService } from './audit.service';
import { AuditListDto, AuditListQueryDto, AuditVerifyDto } from './dto/audit.dto';

/** The audit trail: administrators only. */
@ApiTags('audit')
@ApiBearerAuth()
@ApiUnauthorizedResponse({ type: ErrorResponseDto })
@ApiForbiddenResponse({ type: ErrorResponseDto, description: 'Signed in, but not as an admin' })
@Roles('admin')
@Controller('audit')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  @Get()
  @ApiOperation({ summary: 'Audit entries, newest first, filtered by record or case' })
  @ApiOkResponse({ type: AuditListDto })
  list(@Query() query: AuditListQueryDto): Promise<AuditListDto> {
    return this.audit.list(query);
  }

  @Get('verify')
  @ApiOperation({ summary: 'Walk the hash chain and name the first broken link' })
  @ApiOkResponse({ type: AuditVerifyDto })
  verify(): Promise<AuditVerifyDto> {
    return this.audit.verify();
  }
}
