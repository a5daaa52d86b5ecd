import { findDeleteBlock, type DeleteBlock, type HeldEntity, type HoldingKindOf } from '@siteband/shared';
import { isLive } from '../../db/captureRecord';
import type { SitebandDb } from '../../db/db';
import type { ScanRow } from '../../db/scansTable';
import { captureScope, tableFor } from './captureTables';
import { dropNeverSent, recordDelete } from './recordChange';

/** Counts the live records of one holding kind below a record, among its case's rows. */
type Counter = (db: SitebandDb, id: string, caseId: string) => Promise<number>;

/**
 * Where the tablet finds each holding kind (the kinds and their order are the shared `HOLDING_RECORDS`,
 * which the server counts in MariaDB). Only live rows count: one the inspector deleted is on its way out.
 */
const ON_TABLET: { readonly [E in HeldEntity]: Readonly<Record<HoldingKindOf<E>, Counter>> } = {
  case: {
    sample: (db, id) => db.samples.where('caseId').equals(id).filter(isLive).count(),
    siteNote: (db, id) => db.notes.where('caseId').equals(id).filter(isLive).count(),
    photo: (db, id) => db.photos.where('caseId').equals(id).filter((p) => isLive(p) && p.data.kind === 'photo').count(),
    rawScanFile: (db, id) => db.photos.where('caseId').equals(id).filter((p) => isLive(p) && p.data.kind === 'raw-scan').count(),
    instrumentCheck: (db, id) => db.caseChecks.where('caseId').equals(id).filter(isLive).count(),
    escalation: (db, id) => db.escalations.where('caseId').equals(id).filter(isLive).count(),
  },
  sample: {
    handover: (db, id, caseId) => db.handovers.where('caseId').equals(caseId).filter((h) => isLive(h) && h.data.sampleId === id).count(),
    scan: (db, id, caseId) => db.scans.where('caseId').equals(caseId).filter((s) => isLive(s) && s.data.sampleId === id).count(),
    siteNote: (db, id, caseId) => db.notes.where('caseId').equals(caseId).filter((n) => isLive(n) && n.data.sampleId === id).count(),
    photo: (db, id, caseId) =>
      db.photos.where('caseId').equals(caseId).filter((p) => isLive(p) && p.data.kind === 'photo' && p.data.ownerType === 'sample' && p.data.ownerId === id).count(),
  },
  scan: {
    escalation: (db, id, caseId) => db.escalations.where('caseId').equals(caseId).filter((e) => isLive(e) && e.data.scanId === id).count(),
    decision: (db, id, caseId) => db.decisions.where('caseId').equals(caseId).filter((d) => d.scanId === id).count(),
    photo: (db, id, caseId) =>
      db.photos.where('caseId').equals(caseId).filter((p) => isLive(p) && p.data.kind === 'photo' && p.data.ownerType === 'scan' && p.data.ownerId === id).count(),
  },
};

/** What keeps a case, sample or scan on this tablet from being deleted now, or null when nothing does. */
export async function deleteBlockOnTablet<E extends HeldEntity>(db: SitebandDb, entity: E, id: string): Promise<DeleteBlock | null> {
  const row = await tableFor(db, entity).get(id);
  if (!row) throw new Error(`There is no ${entity} ${id} on this tablet to delete`);
  const counters: Readonly<Record<HoldingKindOf<E>, Counter>> = ON_TABLET[entity];
  return findDeleteBlock(entity, (kind) => counters[kind](db, id, row.caseId));
}

/** Thrown for a delete that records below still hold; nothing was written. */
export class DeleteHeldError extends Error {
  constructor(
    readonly entity: HeldEntity,
    readonly block: DeleteBlock,
  ) {
    super(`This ${entity} holds ${block.held.map((h) => `${h.kind}: ${h.count}`).join(', ')}: it cannot be deleted now`);
    this.name = 'DeleteHeldError';
  }
}

/**
 * Deletes a case, sample or scan once nothing live holds it, checked in the same transaction as the
 * delete, so the tablet never queues a delete the server would refuse for what is below it. A scan's raw
 * file is a permanent record and stays (it syncs and uploads as before); only when the scan itself never
 * reached the server does its raw file go with it, since neither exists anywhere else and the server
 * would refuse a raw file without its scan.
 */
export async function deleteUnheld(db: SitebandDb, entity: HeldEntity, id: string, now = Date.now()): Promise<void> {
  await db.transaction('rw', [...captureScope(db), db.decisions], async () => {
    const block = await deleteBlockOnTablet(db, entity, id);
    if (block) throw new DeleteHeldError(entity, block);
    const scan = entity === 'scan' ? ((await db.scans.get(id)) as ScanRow) : undefined;
    await recordDelete(db, entity, id, now);
    if (scan && !(await db.scans.get(id))) await dropNeverSent(db, 'attachment', scan.data.rawAttachmentId);
  });
}
