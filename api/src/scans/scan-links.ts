import type { FindOptionsSelect } from 'typeorm';
import { refsOf, type RowRef } from '../sync/batch-rows';
import type { ChangeContext } from '../sync/sync-handler';
import { Scan } from './scan.entity';

/** What a record below a scan is checked against: its case, its tombstone and its raw file; not the scan's large JSON. */
const SCAN_LINK_COLUMNS = { id: true, caseId: true, deletedAt: true, rawAttachmentId: true, rawSha256: true } as const satisfies FindOptionsSelect<Scan>;

export type ScanLinks = Pick<Scan, keyof typeof SCAN_LINK_COLUMNS>;

/** A scan as the parent of a change (an attachment, an escalation), as read in the change's batch; null when not on the server. */
export function scanLinks(ctx: ChangeContext, id: string): Promise<ScanLinks | null> {
  return ctx.rows.findOne(Scan, id, SCAN_LINK_COLUMNS);
}

/** What `scanLinks` reads, for the parents of a batch read together (the ids that are UUIDs). */
export function scanLinkRefs(ids: readonly unknown[]): RowRef<Scan>[] {
  return refsOf(Scan, ids, SCAN_LINK_COLUMNS);
}
