import Dexie, { type EntityTable } from 'dexie';
import { sessionSchema, type SessionRow } from './sessionTable';

/** Siteband's on-device database; each later version bump adds its own upgrade step here. */
export class SitebandDb extends Dexie {
  session!: EntityTable<SessionRow, 'key'>;

  constructor(name = 'siteband') {
    super(name);
    // Version 1: only the signed-in session. Cases, samples and scans arrive with their issues.
    this.version(1).stores({ session: sessionSchema });
  }
}

/** Opens the named database (tests pass a fresh name each). */
export async function openDb(name?: string): Promise<SitebandDb> {
  const db = new SitebandDb(name);
  await db.open();
  return db;
}
