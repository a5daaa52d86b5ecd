import { CanActivate, ExecutionContext, Injectable, UnauthorizedException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { UsersService } from '../users/users.service';
import { ACCOUNT_DEACTIVATED } from './auth.service';
import type { ApiRequest } from './authenticated-user';
import { IS_PUBLIC_KEY } from './public.decorator';
import { TokenService } from './token.service';

export const MISSING_TOKEN = 'Sign in first: this route needs an access token (Authorization: Bearer <token>)';
export const INVALID_TOKEN = 'The access token is invalid or has expired: refresh it or sign in again';

/**
 * Global guard, deny by default: every route needs a valid access token unless marked `@Public()`.
 * The user is read from the database on each request, so a deactivation or a role change applies
 * at the very next request, not when the access token expires.
 */
@Injectable()
export class JwtAuthGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly tokens: TokenService,
    private readonly users: UsersService,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, [context.getHandler(), context.getClass()])) return true;
    if (context.getType() !== 'http') return false;
    const request = context.switchToHttp().getRequest<ApiRequest>();
    const token = bearerToken(request.headers.authorization);
    if (!token) throw new UnauthorizedException(MISSING_TOKEN);

    let userId: string;
    try {
      userId = (await this.tokens.verifyAccessToken(token)).sub;
    } catch {
      throw new UnauthorizedException(INVALID_TOKEN);
    }
    const user = await this.users.findById(userId);
    if (!user) throw new UnauthorizedException(INVALID_TOKEN);
    if (!user.active) throw new UnauthorizedException(ACCOUNT_DEACTIVATED);
    request.user = { id: user.id, email: user.email, displayName: user.displayName, role: user.role };
    return true;
  }
}

/** The token of an `Authorization: Bearer <token>` header, or null. */
export function bearerToken(header: string | undefined): string | null {
  const match = /^Bearer\s+(\S+)\s*$/i.exec(header ?? '');
  return match ? match[1] : null;
}
