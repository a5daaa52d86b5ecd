import type { SitebandDb } from '../../db/db';
import { captureScope } from './captureTables';
import { serverWrittenTables } from './serverWritten';
import { everythingSynced } from './syncState';

/** Refusal to sign out while records wait for the server. */
export class UnsyncedWorkError extends Error {
  constructor() {
    super('Some field records have not reached the server yet: sync before signing out');
    this.name = 'UnsyncedWorkError';
  }
}

/**
 * Clears the signed-in person's field records from the tablet, but only once the server has all of
 * them; otherwise throws UnsyncedWorkError and deletes nothing. The check and the clearing share
 * one transaction, so an edit made in between cannot be lost.
 */
export async function clearCaptureDataIfSynced(db: SitebandDb): Promise<void> {
  const tables = [...captureScope(db), ...serverWrittenTables(db), db.syncMeta];
  await db.transaction('rw', tables, async () => {
    if (!(await everythingSynced(db))) throw new UnsyncedWorkError();
    await Promise.all(tables.map((table) => table.clear()));
  });
}
