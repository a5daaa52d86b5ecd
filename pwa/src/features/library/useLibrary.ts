import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Compound, Library } from '@siteband/shared';
import { useApiClient } from '../api/ApiClientContext';
import type { ApiClient } from '../api/client';
import { useOnlineStatus } from '../network/onlineStatus';
import { libraryKeys } from './libraryApi';
import { appLibraryCache } from './libraryDb';
import { readLibrary } from './readLibrary';

/** The library the screens show: server, else the tablet's copy, else the bundled one. */
export function libraryQuery(client: ApiClient, online: boolean) {
  return queryOptions({
    queryKey: [...libraryKeys.current(), online] as const,
    queryFn: async ({ signal }) => readLibrary({ client, cache: await appLibraryCache(), online, signal }),
    // Offline the query still runs: it answers from the tablet.
    networkMode: 'always',
    staleTime: 60_000,
  });
}

/** The compound library in use, refetched when the connection comes back. */
export function useLibrary() {
  const client = useApiClient();
  const online = useOnlineStatus();
  return useQuery(libraryQuery(client, online));
}

/** The library in force as the tablet last received it, to rank scans against; undefined while only the bundled one is at hand (the worker holds that). */
export function useLibraryInForce(): Library | undefined {
  const library = useLibrary().data;
  return library?.source === 'bundled' ? undefined : library?.library;
}

/** One compound of the library in use (undefined while loading or when the id is unknown). */
export function useCompound(id: string): { compound: Compound | undefined; query: ReturnType<typeof useLibrary> } {
  const query = useLibrary();
  return { compound: query.data?.library.compounds.find((c) => c.id === id), query };
}
