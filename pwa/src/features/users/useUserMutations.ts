import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useApiClient } from '../api/ApiClientContext';
import { createUser, inviteUser, updateUser, usersKeys } from './usersApi';
import type { AdminUser, CreateUserInput, InviteUserInput, UpdateUserInput } from './types';

/** Creates a user, then reloads the list. */
export function useCreateUser() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateUserInput) => createUser(client, input),
    onSettled: () => queryClient.invalidateQueries({ queryKey: usersKeys.all }),
  });
}

/** Invites a person by e-mail, then reloads the list (the invited person is listed at once). */
export function useInviteUser() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InviteUserInput) => inviteUser(client, input),
    onSettled: () => queryClient.invalidateQueries({ queryKey: usersKeys.all }),
  });
}

/** Changes a user; the list shows the change at once and rolls back if the server refuses it. */
export function useUpdateUser() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, input }: { id: string; input: UpdateUserInput }) => updateUser(client, id, input),
    onMutate: async ({ id, input }) => {
      await queryClient.cancelQueries({ queryKey: usersKeys.list() });
      const previous = queryClient.getQueryData<AdminUser[]>(usersKeys.list());
      queryClient.setQueryData<AdminUser[]>(usersKeys.list(), (users) => users?.map((u) => (u.id === id ? { ...u, ...input } : u)));
      return { previous };
    },
    onError: (_error, _variables, context) => {
      if (context?.previous) queryClient.setQueryData(usersKeys.list(), context.previous);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: usersKeys.all }),
  });
}
