import type { SitebandDb } from '../../db/db';
import type { ApiClient } from '../api/client';
import { mergePulled } from './mergePulled';
import type { PullResponse } from './syncTypes';

/** Pulls everything after the stored cursor; the cursor moves only after a page is saved locally. */
export async function pullChanges(db: SitebandDb, api: ApiClient): Promise<number> {
  let merged = 0;
  for (;;) {
    const cursor = (await db.syncMeta.get('pullCursor'))?.value ?? '0';
    const page = await api.request<PullResponse>(`/api/sync/pull?cursor=${encodeURIComponent(cursor)}&limit=500`);
    for (const record of page.changes) await mergePulled(db, record);
    merged += page.changes.length;
    await db.syncMeta.put({ key: 'pullCursor', value: page.cursor });
    if (!page.hasMore) return merged;
  }
}
