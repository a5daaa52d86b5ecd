import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { ApiRequest, AuthenticatedUser } from './authenticated-user';

/** The signed-in user of the request (set by the JWT guard). */
export const CurrentUser = createParamDecorator(
  (_data: unknown, context: ExecutionContext): AuthenticatedUser | undefined =>
    context.switchToHttp().getRequest<ApiRequest>().user,
);
