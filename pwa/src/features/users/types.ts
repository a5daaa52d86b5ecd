import type { Role } from '@siteband/shared';
import type { SessionUser } from '../session/types';

/** A user as the admin API lists them. */
export interface AdminUser extends SessionUser {
  active: boolean;
}

/** Body of POST /api/users. */
export interface CreateUserInput {
  email: string;
  displayName: string;
  role: Role;
  password: string;
}

/** Body of POST /api/users/invitations. */
export type InviteUserInput = Omit<CreateUserInput, 'password'>;

/** Body of PATCH /api/users/:id. */
export interface UpdateUserInput {
  displayName?: string;
  role?: Role;
  active?: boolean;
}
