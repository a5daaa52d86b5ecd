import { queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../api/client';
import type { AdminUser, CreateUserInput, InviteUserInput, UpdateUserInput } from './types';

/** Query keys of the users feature. */
export const usersKeys = {
  all: ['users'] as const,
  list: () => [...usersKeys.all, 'list'] as const,
};

/** The admin's list of all users. */
export function usersListQuery(client: ApiClient) {
  return queryOptions({
    queryKey: usersKeys.list(),
    queryFn: ({ signal }) => client.request<AdminUser[]>('/api/users', { signal }),
  });
}

/** Creates a user with a first password. */
export function createUser(client: ApiClient, input: CreateUserInput): Promise<AdminUser> {
  return client.request<AdminUser>('/api/users', { method: 'POST', body: input });
}

/** Invites a person by e-mail: the server mails them a single-use link to set their password. */
export function inviteUser(client: ApiClient, input: InviteUserInput): Promise<unknown> {
  return client.request<unknown>('/api/users/invitations', { method: 'POST', body: input });
}

/** Changes a user's name, role or active flag. */
export function updateUser(client: ApiClient, id: string, input: UpdateUserInput): Promise<AdminUser> {
  return client.request<AdminUser>(`/api/users/${encodeURIComponent(id)}`, { method: 'PATCH', body: input });
}
