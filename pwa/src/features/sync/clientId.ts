import type { SitebandDb } from '../../db/db';

/** This browser profile's stable id for the push envelope, made once and kept. */
export async function clientId(db: SitebandDb): Promise<string> {
  const stored = await db.syncMeta.get('clientId');
  if (stored) return stored.value;
  const value = `tablet-${crypto.randomUUID()}`;
  await db.syncMeta.put({ key: 'clientId', value });
  return value;
}
