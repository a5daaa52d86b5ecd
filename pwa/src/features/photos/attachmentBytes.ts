import type { SitebandDb } from '../../db/db';

/** An attachment's file as kept on this tablet; undefined when only its metadata is here (another device's photo). */
export async function heldBytes(db: SitebandDb, id: string): Promise<ArrayBuffer | undefined> {
  return (await db.attachmentBytes.get(id))?.bytes;
}
