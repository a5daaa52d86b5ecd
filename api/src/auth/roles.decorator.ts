import { SetMetadata } from '@nestjs/common';
import type { Role } from '@siteband/shared';

export const ROLES_KEY = 'siteband:roles';

/** Limits a route (or a controller) to users holding one of these roles; checked by `RolesGuard`. */
export const Roles = (...roles: Role[]): MethodDecorator & ClassDecorator => SetMetadata(ROLES_KEY, roles);
