import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, renderHook, waitFor } from '@testing-library/react';
import type { ReactNode } from 'react';
import { describe, expect, it } from 'vitest';
import { ApiClientProvider } from '../api/ApiClientContext';
import { ApiError } from '../api/apiError';
import type { ApiClient, RequestOptions } from '../api/client';
import { usersKeys } from './usersApi';
import { useUpdateUser } from './useUserMutations';
import type { AdminUser } from './types';

const people: AdminUser[] = [
  { id: 'a1', email: 'admin.one@example.test', displayName: 'Admin One', role: 'admin', active: true },
  { id: 'i1', email: 'inspector.one@example.test', displayName: 'Inspector One', role: 'inspector', active: true },
];

/** An API client over an in-memory user list; PATCH succeeds or is refused as the test says. */
function memoryUsersApi(refuse: boolean) {
  let stored = people.map((p) => ({ ...p }));
  const client: ApiClient = {
    async request<T>(path: string, options: RequestOptions = {}): Promise<T> {
      if (path === '/api/users' && (options.method ?? 'GET') === 'GET') return stored.map((p) => ({ ...p })) as T;
      const id = path.split('/').pop();
      if (options.method === 'PATCH') {
        if (refuse) throw new ApiError('http', 409, 'An admin cannot change their own role', { error: 'Conflict' });
        stored = stored.map((p) => (p.id === id ? { ...p, ...(options.body as Partial<AdminUser>) } : p));
        return stored.find((p) => p.id === id) as T;
      }
      throw new Error(`unexpected ${options.method} ${path}`);
    },
    authorizedFetch: () => Promise.reject(new Error('the users screens read JSON only')),
  };
  return client;
}

function setup(refuse: boolean) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  queryClient.setQueryData(usersKeys.list(), people);
  const client = memoryUsersApi(refuse);
  const wrapper = ({ children }: { children: ReactNode }) => (
    <QueryClientProvider client={queryClient}>
      <ApiClientProvider client={client}>{children}</ApiClientProvider>
    </QueryClientProvider>
  );
  const { result } = renderHook(() => useUpdateUser(), { wrapper });
  return { queryClient, result };
}

const listOf = (queryClient: QueryClient) => queryClient.getQueryData<AdminUser[]>(usersKeys.list());

describe('useUpdateUser', () => {
  it('shows the change at once and keeps it when the server accepts', async () => {
    const { queryClient, result } = setup(false);
    act(() => result.current.mutate({ id: 'i1', input: { role: 'supervisor' } }));
    await waitFor(() => expect(listOf(queryClient)?.find((p) => p.id === 'i1')?.role).toBe('supervisor'));
    await waitFor(() => expect(result.current.isSuccess).toBe(true));
    expect(listOf(queryClient)?.find((p) => p.id === 'i1')?.role).toBe('supervisor');
  });

  it('puts the list back as it was when the server refuses', async () => {
    const { queryClient, result } = setup(true);
    act(() => result.current.mutate({ id: 'a1', input: { active: false } }));
    await waitFor(() => expect(result.current.isError).toBe(true));
    expect(result.current.error).toMatchObject({ status: 409 });
    expect(listOf(queryClient)?.find((p) => p.id === 'a1')?.active).toBe(true);
  });
});
