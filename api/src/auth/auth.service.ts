import { Injectable, UnauthorizedException } from '@nestjs/common';
import { UserSummaryDto } from '../users/dto/user.dto';
import { PasswordService } from '../users/password.service';
import type { User } from '../users/user.entity';
import { UsersService } from '../users/users.service';
import type { AuthResponseDto } from './dto/auth-response.dto';
import { RefreshTokensService } from './refresh-tokens.service';
import { TokenService } from './token.service';

/** Same answer for an unknown email and a wrong password, so the API does not reveal who has an account. */
export const WRONG_CREDENTIALS = 'Email or password is wrong';
export const ACCOUNT_DEACTIVATED = 'This account is deactivated: ask an administrator';

/** Sign-in, refresh and sign-out. */
@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersService,
    private readonly passwords: PasswordService,
    private readonly tokens: TokenService,
    private readonly refreshTokens: RefreshTokensService,
  ) {}

  /** Checks the password and starts a session (a new refresh-token family). */
  async signIn(email: string, password: string): Promise<AuthResponseDto> {
    const user = await this.users.findByEmail(email);
    if (!user || user.passwordHash === null) {
      await this.passwords.verifyDummy(password);
      throw new UnauthorizedException(WRONG_CREDENTIALS);
    }
    if (!(await this.passwords.verify(password, user.passwordHash))) throw new UnauthorizedException(WRONG_CREDENTIALS);
    // Said only to someone who knows the password, so it reveals nothing to a guesser.
    if (!user.active) throw new UnauthorizedException(ACCOUNT_DEACTIVATED);
    return this.respond(user, await this.refreshTokens.issue(user.id));
  }

  /** Rotates the refresh token and issues a fresh access token. */
  async refresh(refreshToken: string): Promise<AuthResponseDto> {
    const rotated = await this.refreshTokens.rotate(refreshToken);
    return this.respond(rotated.user, rotated.refreshToken);
  }

  /** Ends the session the refresh token belongs to. */
  signOut(refreshToken: string, userId: string): Promise<void> {
    return this.refreshTokens.revokeSession(refreshToken, userId);
  }

  private async respond(user: User, refreshToken: string): Promise<AuthResponseDto> {
    return {
      accessToken: await this.tokens.signAccessToken(user),
      refreshToken,
      accessTokenExpiresIn: this.tokens.accessTokenTtlSeconds,
      user: UserSummaryDto.fromEntity(user),
    };
  }
}
