import { PHOTO_TYPES } from '../photos/photoTypes';

/**
 * Files shared to the app from another app, as the service worker kept them (public/share-target-sw.js,
 * whose names these must match: sharedFiles.test.ts checks it).
 */
export const SHARE_TARGET_PATH = '/share-target';
export const SHARED_FILES_CACHE = 'siteband-shared-files';
export const SHARED_FILE_PREFIX = '/shared-files/';
export const SHARED_FILES_PAGE = '/tabs/capture/shared';

/** Extensions and types the share target accepts: the raw scan exports the import reads, and photos. */
export const SHARE_SCAN_EXTENSIONS = ['.jdx', '.dx', '.jcamp', '.csv', '.tsv', '.txt'] as const;
export const SHARE_SCAN_TYPES = ['chemical/x-jcamp-dx', 'text/csv', 'text/tab-separated-values', 'text/plain'] as const;

export interface SharedFile {
  id: string;
  name: string;
  contentType: string;
  size: number;
  /** ISO time the service worker received it. */
  sharedAt: string;
  /** A photo goes to a sample's photos; everything else is imported as a scan. */
  kind: 'photo' | 'scan';
}

function kindOf(contentType: string): SharedFile['kind'] {
  return (PHOTO_TYPES as readonly string[]).includes(contentType) ? 'photo' : 'scan';
}

function describe(key: Request, response: Response, size: number): SharedFile {
  const contentType = response.headers.get('Content-Type') ?? 'application/octet-stream';
  return {
    id: new URL(key.url).pathname.slice(SHARED_FILE_PREFIX.length),
    name: decodeURIComponent(response.headers.get('X-Siteband-File-Name') ?? 'shared-file'),
    contentType,
    size,
    sharedAt: response.headers.get('X-Siteband-Shared-At') ?? '',
    kind: kindOf(contentType),
  };
}

/** The shared files waiting on this tablet, oldest first. */
export async function listSharedFiles(): Promise<SharedFile[]> {
  if (typeof caches === 'undefined') return [];
  const cache = await caches.open(SHARED_FILES_CACHE);
  const keys = await cache.keys();
  const files: SharedFile[] = [];
  for (const key of keys) {
    const response = await cache.match(key);
    if (response) files.push(describe(key, response, (await response.blob()).size));
  }
  return files.sort((a, b) => a.sharedAt.localeCompare(b.sharedAt));
}

/** The bytes of one shared file, or undefined when it is no longer kept. */
export async function readSharedFile(id: string): Promise<{ file: SharedFile; bytes: ArrayBuffer } | undefined> {
  const cache = await caches.open(SHARED_FILES_CACHE);
  const key = new Request(`${SHARED_FILE_PREFIX}${id}`);
  const response = await cache.match(key);
  if (!response) return undefined;
  const bytes = await response.arrayBuffer();
  return { file: describe(key, response, bytes.byteLength), bytes };
}

/** Forgets a shared file once it is filed with a sample (or the inspector removes it). */
export async function discardSharedFile(id: string): Promise<void> {
  const cache = await caches.open(SHARED_FILES_CACHE);
  await cache.delete(`${SHARED_FILE_PREFIX}${id}`);
}
