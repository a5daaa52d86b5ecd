import { SitebandDb } from '../../db/db';

let db: SitebandDb | undefined;

/** The app's database for field capture (Dexie opens it on first use). */
export function captureDb(): SitebandDb {
  db ??= new SitebandDb();
  return db;
}
