import type { ApiClient } from '../api/client';

/** One compound as the server keeps it: the entry, where it comes from and its latest save. */
export interface CompoundRecord {
  compound: Record<string, unknown>;
  origin: 'bundled' | 'edited' | 'added';
  retired: boolean;
  version: number;
  editedBy: string | null;
  editedAt: string | null;
}

/** Query keys of the compound library. */
export const libraryKeys = {
  all: ['library'] as const,
  current: () => [...libraryKeys.all, 'current'] as const,
};

/** The library in force on the server (bundled entries with supervisors' edits), unvalidated. */
export function fetchLibrary(client: ApiClient, signal?: AbortSignal): Promise<unknown> {
  return client.request<unknown>('/api/library', { signal });
}

/** Replaces a compound's entry; the server validates it and answers 400 with every reason. */
export function updateCompound(client: ApiClient, id: string, entry: object): Promise<CompoundRecord> {
  return client.request<CompoundRecord>(`/api/library/${encodeURIComponent(id)}`, { method: 'PUT', body: entry });
}

/** Adds a compound under a new id. */
export function addCompound(client: ApiClient, entry: object): Promise<CompoundRecord> {
  return client.request<CompoundRecord>('/api/library', { method: 'POST', body: entry });
}

/** Retires a compound: it leaves the library in force and keeps its history. */
export function retireCompound(client: ApiClient, id: string): Promise<CompoundRecord> {
  return client.request<CompoundRecord>(`/api/library/${encodeURIComponent(id)}`, { method: 'DELETE' });
}
