import { CanActivate, ExecutionContext, ForbiddenException, Injectable, UnauthorizedException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Role } from '@siteband/shared';
import type { ApiRequest } from './authenticated-user';
import { ROLES_KEY } from './roles.decorator';

/** Runs after the JWT guard: a route marked `@Roles(...)` admits only those roles (403 for the others). */
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const targets = [context.getHandler(), context.getClass()];
    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets);
    if (!roles || roles.length === 0) return true;
    const user = context.switchToHttp().getRequest<ApiRequest>().user;
    // A role-limited route marked @Public() by mistake has no user here: fail closed.
    if (!user) throw new UnauthorizedException('Sign in first: this route needs an access token');
    if (!roles.includes(user.role)) {
      throw new ForbiddenException(`This needs the role ${roles.join(' or ')}; you are signed in as ${user.role}`);
    }
    return true;
  }
}
