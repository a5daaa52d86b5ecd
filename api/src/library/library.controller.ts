import { Body, Controller, Delete, Get, Param, Post, Put } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiBody,
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
import { CompoundRecordDto } from './dto/compound-record.dto';
import { LibraryEditDto } from './dto/library-edit.dto';
import { LibraryDto } from './dto/library.dto';
import { LibraryService } from './library.service';

const COMPOUND_BODY = {
  schema: { type: 'object' as const, additionalProperties: true },
  description:
    'A compound entry in the library format (fixtures/library/README.md). It is validated like the bundled library, ' +
    'and with a geometry its fundamentals per species must equal the symmetry engine’s Γvib.',
};

/** The compound library: everyone reads it; supervisors curate it. */
@ApiTags('library')
@ApiBearerAuth()
@ApiUnauthorizedResponse({ type: ErrorResponseDto })
@Controller('library')
export class LibraryController {
  constructor(private readonly library: LibraryService) {}

  @Get()
  @ApiOperation({ summary: 'The compound library in force (bundled entries with supervisors’ edits)' })
  @ApiOkResponse({ type: LibraryDto })
  async get(): Promise<LibraryDto> {
    return LibraryDto.from(await this.library.current());
  }

  @Get(':id')
  @ApiOperation({ summary: 'One compound, retired ones included' })
  @ApiOkResponse({ type: CompoundRecordDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  async findOne(@Param('id') id: string): Promise<CompoundRecordDto> {
    return CompoundRecordDto.from(await this.library.find(id));
  }

  @Get(':id/history')
  @Roles('supervisor')
  @ApiOperation({ summary: 'Every saved edit of a compound, oldest first' })
  @ApiOkResponse({ type: LibraryEditDto, isArray: true })
  @ApiForbiddenResponse({ type: ErrorResponseDto, description: 'Signed in, but not as a supervisor' })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  async history(@Param('id') id: string): Promise<LibraryEditDto[]> {
    return (await this.library.history(id)).map((edit) => LibraryEditDto.fromEntity(edit));
  }

  @Post()
  @Roles('supervisor')
  @ApiOperation({ summary: 'Add a compound' })
  @ApiBody(COMPOUND_BODY)
  @ApiCreatedResponse({ type: CompoundRecordDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto, description: 'The entry is invalid; details[0].messages lists every reason' })
  @ApiForbiddenResponse({ type: ErrorResponseDto, description: 'Signed in, but not as a supervisor' })
  @ApiConflictResponse({ type: ErrorResponseDto, description: 'The id is taken' })
  async add(@Body() body: Record<string, unknown>, @CurrentUser() user: AuthenticatedUser): Promise<CompoundRecordDto> {
    return CompoundRecordDto.from(await this.library.add(body, user.id));
  }

  @Put(':id')
  @Roles('supervisor')
  @ApiOperation({ summary: 'Replace a compound’s entry (a retired compound is reinstated)' })
  @ApiBody(COMPOUND_BODY)
  @ApiOkResponse({ type: CompoundRecordDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto, description: 'The entry is invalid; details[0].messages lists every reason' })
  @ApiForbiddenResponse({ type: ErrorResponseDto, description: 'Signed in, but not as a supervisor' })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto, description: 'Saved by someone else at the same moment' })
  async update(@Param('id') id: string, @Body() body: Record<string, unknown>, @CurrentUser() user: AuthenticatedUser): Promise<CompoundRecordDto> {
    return CompoundRecordDto.from(await this.library.update(id, body, user.id));
  }

  @Delete(':id')
  @Roles('supervisor')
  @ApiOperation({ summary: 'Retire a compound (kept with its history, out of the library in force)' })
  @ApiOkResponse({ type: CompoundRecordDto })
  @ApiForbiddenResponse({ type: ErrorResponseDto, description: 'Signed in, but not as a supervisor' })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto, description: 'Already retired, or another entry depends on it' })
  async retire(@Param('id') id: string, @CurrentUser() user: AuthenticatedUser): Promise<CompoundRecordDto> {
    return CompoundRecordDto.from(await this.library.retire(id, user.id));
  }
}
