import Dexie, { type EntityTable } from 'dexie';
import { instrumentChecksSchema, type InstrumentCheckRow } from './instrumentChecksTable';
import { sessionSchema, type SessionRow } from './sessionTable';

/** Siteband's on-device database; each later version bump adds its own upgrade step here. */
export class SitebandDb extends Dexie {
  session!: EntityTable<SessionRow, 'key'>;
  instrumentChecks!: EntityTable<InstrumentCheckRow, 'id'>;

  constructor(name = 'siteband') {
    super(name);
    // Version 1: only the signed-in session. Cases, samples and scans arrive with their issues.
    this.version(1).stores({ session: sessionSchema });
    // Version 2: the instrument checks. A new table starts empty, so no existing row needs an
    // upgrade function; the session table is carried over unchanged.
    this.version(2).stores({ session: sessionSchema, instrumentChecks: instrumentChecksSchema });
  }
}

/** Opens the named database (tests pass a fresh name each). */
export async function openDb(name?: string): Promise<SitebandDb> {
  const db = new SitebandDb(name);
  await db.open();
  return db;
}
