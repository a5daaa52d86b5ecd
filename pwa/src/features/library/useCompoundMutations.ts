import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useApiClient } from '../api/ApiClientContext';
import { addCompound, libraryKeys, retireCompound, updateCompound } from './libraryApi';

/** Saves a compound (a new one or a change), then reloads the library so every screen shows it. */
export function useSaveCompound() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, entry, isNew }: { id: string; entry: object; isNew: boolean }) =>
      isNew ? addCompound(client, entry) : updateCompound(client, id, entry),
    onSettled: () => queryClient.invalidateQueries({ queryKey: libraryKeys.all }),
  });
}

/** Retires a compound, then reloads the library. */
export function useRetireCompound() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => retireCompound(client, id),
    onSettled: () => queryClient.invalidateQueries({ queryKey: libraryKeys.all }),
  });
}
