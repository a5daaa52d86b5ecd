import { afterEach, describe, expect, it } from 'vitest';
import { loadLibrary } from '@siteband/shared';
import { openDb, type SitebandDb } from '../../db/db';
import { ApiError } from '../api/apiError';
import type { ApiClient } from '../api/client';
import { createLibraryCache } from './libraryCache';
import { readLibrary } from './readLibrary';

const bundled = loadLibrary();
let db: SitebandDb | undefined;
let dbCount = 0;

async function freshCache() {
  db = await openDb(`library-test-${++dbCount}-${Date.now()}`);
  return createLibraryCache(db.libraryCache);
}

afterEach(async () => {
  await db?.delete();
});

/** A server library: the bundled one with one synonym changed, as a supervisor's edit would. */
function serverBody() {
  const copy = JSON.parse(JSON.stringify(bundled)) as { version: { version: string }; compounds: { id: string; synonyms: string[] }[] };
  copy.version.version = `${copy.version.version}+edits.test`;
  copy.compounds.find((c) => c.id === 'chlorine')!.synonyms.push('edited synonym');
  return copy;
}

function client(answer: () => Promise<unknown>): ApiClient {
  return { request: <T,>() => answer() as Promise<T>, authorizedFetch: () => Promise.reject(new Error('readLibrary reads JSON only')) };
}

describe('readLibrary', () => {
  it('takes the server library and keeps it on the tablet for offline use', async () => {
    const cache = await freshCache();
    const view = await readLibrary({ client: client(async () => serverBody()), cache, online: true, now: () => 1234 });
    expect(view.source).toBe('server');
    expect(view.library.version.version).toMatch(/\+edits\.test$/);

    const offline = await readLibrary({ client: client(async () => { throw new Error('must not be called'); }), cache, online: false });
    expect(offline.source).toBe('tablet');
    expect(offline.receivedAt).toBe(1234);
    expect(offline.library.compounds.find((c) => c.id === 'chlorine')!.synonyms).toContain('edited synonym');
  });

  it('falls back to the bundled library when the server was never reached', async () => {
    const cache = await freshCache();
    const view = await readLibrary({ client: client(async () => { throw ApiError.network('/api/library', new Error('offline')); }), cache, online: true });
    expect(view.source).toBe('bundled');
    expect(view.library.version).toEqual(bundled.version);
    expect(view.problem).toBeNull();
  });

  it('refuses a server answer that fails validation, says why, and keeps the previous copy', async () => {
    const cache = await freshCache();
    await readLibrary({ client: client(async () => serverBody()), cache, online: true });
    const broken = serverBody();
    (broken.compounds[0] as { cas?: string }).cas = '123-45-0';
    const view = await readLibrary({ client: client(async () => broken), cache, online: true });
    expect(view.source).toBe('tablet');
    expect(view.problem).toMatch(/CAS/);
  });
});
