import type { SitebandDb } from '../../db/db';
import type { ApiClient } from '../api/client';
import { captureScope } from './captureTables';
import { mergePulled } from './mergePulled';
import { serverWrittenTables } from './serverWritten';
import type { PullResponse } from './syncTypes';

/**
 * Pulls everything after the stored cursor; the cursor moves only with the page it follows, saved locally.
 * The next page travels while one is being saved.
 */
export async function pullChanges(db: SitebandDb, api: ApiClient): Promise<number> {
  const fetchPage = (cursor: string) => api.request<PullResponse>(`/api/sync/pull?cursor=${encodeURIComponent(cursor)}&limit=500`);
  let merged = 0;
  let page = await fetchPage((await db.syncMeta.get('pullCursor'))?.value ?? '0');
  for (;;) {
    const next = page.hasMore ? fetchPage(page.cursor) : undefined;
    // Should saving fail, that failure is the one thrown; the page fetched meanwhile is let go.
    next?.catch(() => undefined);
    // The page and the cursor after it in one transaction: a page is saved whole or not at all.
    await db.transaction('rw', [...captureScope(db), ...serverWrittenTables(db), db.syncMeta], async () => {
      for (const record of page.changes) await mergePulled(db, record);
      await db.syncMeta.put({ key: 'pullCursor', value: page.cursor });
    });
    merged += page.changes.length;
    if (!next) return merged;
    page = await next;
  }
}
