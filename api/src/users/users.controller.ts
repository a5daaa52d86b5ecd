import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post } from '@nestjs/common';
import {
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
import { CreateUserDto } from './dto/create-user.dto';
import { InviteUserDto } from './dto/invite-user.dto';
import { UpdateUserDto } from './dto/update-user.dto';
import { UserDto } from './dto/user.dto';
import { UsersService } from './users.service';

/** User administration: administrators only. */
@ApiTags('users')
@ApiBearerAuth()
@ApiUnauthorizedResponse({ type: ErrorResponseDto })
@ApiForbiddenResponse({ type: ErrorResponseDto, description: 'Signed in, but not as an admin' })
@Roles('admin')
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @ApiOperation({ summary: 'List every user' })
  @ApiOkResponse({ type: UserDto, isArray: true })
  async list(): Promise<UserDto[]> {
    return (await this.users.list()).map((user) => UserDto.fromEntity(user));
  }

  @Post()
  @ApiOperation({ summary: 'Add a user' })
  @ApiCreatedResponse({ type: UserDto })
  @ApiConflictResponse({ type: ErrorResponseDto, description: 'The email is taken' })
  async create(@Body() dto: CreateUserDto, @CurrentUser() actingUser: AuthenticatedUser): Promise<UserDto> {
    return UserDto.fromEntity(await this.users.create(dto, actingUser));
  }

  @Post('invitations')
  @ApiOperation({ summary: 'Invite someone by e-mail: a user without a password, and a single-use set-password link by mail' })
  @ApiCreatedResponse({ type: UserDto })
  @ApiConflictResponse({ type: ErrorResponseDto, description: 'The email is taken' })
  async invite(@Body() dto: InviteUserDto, @CurrentUser() actingUser: AuthenticatedUser): Promise<UserDto> {
    return UserDto.fromEntity(await this.users.invite(dto, actingUser));
  }

  @Patch(':id')
  @ApiOperation({ summary: "Change a user's display name, role or active flag" })
  @ApiOkResponse({ type: UserDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto, description: 'An admin tried to deactivate or demote themselves' })
  async update(
    @Param('id', new ParseUUIDPipe()) id: string,
    @Body() dto: UpdateUserDto,
    @CurrentUser() actingUser: AuthenticatedUser,
  ): Promise<UserDto> {
    return UserDto.fromEntity(await this.users.update(id, dto, actingUser));
  }
}
