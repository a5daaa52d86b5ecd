import { Body, Controller, HttpCode, HttpStatus, Post, Req, UseGuards } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiTooManyRequestsResponse,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import { InjectThrottlerStorage, ThrottlerGuard } from '@nestjs/throttler';
import { ErrorResponseDto } from '../common/error-response.dto';
import { SetPasswordDto } from '../users/dto/invite-user.dto';
import { UsersService } from '../users/users.service';
import { AuthService } from './auth.service';
import type { ApiRequest, AuthenticatedUser } from './authenticated-user';
import { CurrentUser } from './current-user.decorator';
import { AuthResponseDto } from './dto/auth-response.dto';
import { LoginDto } from './dto/login.dto';
import { RefreshTokenDto } from './dto/refresh-token.dto';
import { Public } from './public.decorator';
import { SignInAttemptStore } from './sign-in-attempt.store';
import { signInThrottleKey, signInTracker } from './sign-in-throttle';

/** Sign-in, token refresh and sign-out. */
@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly users: UsersService,
    @InjectThrottlerStorage() private readonly attempts: SignInAttemptStore,
  ) {}

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('login')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({ summary: 'Sign in with email and password' })
  @ApiOkResponse({ type: AuthResponseDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  @ApiUnauthorizedResponse({ type: ErrorResponseDto, description: 'Email or password is wrong, or the account is deactivated' })
  @ApiTooManyRequestsResponse({ type: ErrorResponseDto, description: 'More than 5 failed attempts per minute for this address and email' })
  async login(@Body() dto: LoginDto, @Req() request: ApiRequest): Promise<AuthResponseDto> {
    const result = await this.auth.signIn(dto.email, dto.password);
    // Only failures add up: a successful sign-in clears the count.
    this.attempts.reset(signInThrottleKey(signInTracker(request)));
    return result;
  }

  @Public()
  @Post('refresh')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({ summary: 'Exchange a refresh token for new tokens (the old refresh token stops working)' })
  @ApiOkResponse({ type: AuthResponseDto })
  @ApiUnauthorizedResponse({ type: ErrorResponseDto })
  refresh(@Body() dto: RefreshTokenDto): Promise<AuthResponseDto> {
    return this.auth.refresh(dto.refreshToken);
  }

  @Public()
  @Post('set-password')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiOperation({ summary: "Set an invited user's password with the token from their link (once, before INVITE_TTL runs out)" })
  @ApiNoContentResponse()
  @ApiBadRequestResponse({ type: ErrorResponseDto, description: 'A weak password, or a link that is used, expired or unknown' })
  async setPassword(@Body() dto: SetPasswordDto): Promise<void> {
    await this.users.setPasswordFromInvitation(dto.token, dto.password);
  }

  @Post('logout')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Sign out: revoke the session of this refresh token' })
  @ApiNoContentResponse()
  @ApiUnauthorizedResponse({ type: ErrorResponseDto })
  async logout(@Body() dto: RefreshTokenDto, @CurrentUser() user: AuthenticatedUser): Promise<void> {
    await this.auth.signOut(dto.refreshToken, user.id);
  }
}
