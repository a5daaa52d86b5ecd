import { ForbiddenException, UnauthorizedException, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { ROLES, type Role } from '@siteband/shared';
import type { AuthenticatedUser } from './authenticated-user';
import { Public } from './public.decorator';
import { Roles } from './roles.decorator';
import { RolesGuard } from './roles.guard';

@Roles('admin')
class AdminController {
  list(): void {}
  @Roles('supervisor', 'safety_officer')
  review(): void {}
}

class OpenController {
  anyone(): void {}
  @Public()
  @Roles('admin')
  contradictory(): void {}
}

function contextFor(controller: object, handler: string, user?: AuthenticatedUser): ExecutionContext {
  const type = controller as { prototype: Record<string, () => void> };
  return {
    getHandler: () => type.prototype[handler],
    getClass: () => controller,
    switchToHttp: () => ({ getRequest: () => ({ user }) }),
  } as unknown as ExecutionContext;
}

const userWith = (role: Role): AuthenticatedUser => ({ id: 'u1', email: 'u@demo.test', displayName: 'U', role });

describe('RolesGuard', () => {
  const guard = new RolesGuard(new Reflector());

  it.each(ROLES)('lets %s through a route without @Roles', (role) => {
    expect(guard.canActivate(contextFor(OpenController, 'anyone', userWith(role)))).toBe(true);
  });

  it.each(ROLES)('applies the controller-level @Roles("admin") to %s', (role) => {
    const run = () => guard.canActivate(contextFor(AdminController, 'list', userWith(role)));
    if (role === 'admin') expect(run()).toBe(true);
    else expect(run).toThrow(ForbiddenException);
  });

  it.each(ROLES)('lets a method-level @Roles override the controller for %s', (role) => {
    const run = () => guard.canActivate(contextFor(AdminController, 'review', userWith(role)));
    if (role === 'supervisor' || role === 'safety_officer') expect(run()).toBe(true);
    else expect(run).toThrow(ForbiddenException);
  });

  it('names the needed and the actual role in the 403', () => {
    expect(() => guard.canActivate(contextFor(AdminController, 'list', userWith('inspector')))).toThrow(
      'This needs the role admin; you are signed in as inspector',
    );
  });

  it('refuses (401) a role-limited route when no user was authenticated', () => {
    expect(() => guard.canActivate(contextFor(AdminController, 'list'))).toThrow(UnauthorizedException);
  });

  it('fails closed on a route marked both @Public() and @Roles() (a mistake): roles still apply', () => {
    expect(() => guard.canActivate(contextFor(OpenController, 'contradictory'))).toThrow(UnauthorizedException);
    expect(() => guard.canActivate(contextFor(OpenController, 'contradictory', userWith('inspector')))).toThrow(ForbiddenException);
  });
});
