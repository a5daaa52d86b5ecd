import type { Role } from '@siteband/shared';
import type { Request } from 'express';

/** The signed-in user as the JWT guard found them in the database for this request. */
export interface AuthenticatedUser {
  id: string;
  email: string;
  displayName: string;
  role: Role;
}

/** An Express request after the request logger (id) and the JWT guard (user) have seen it. */
export interface ApiRequest extends Request {
  id: string;
  user?: AuthenticatedUser;
}
