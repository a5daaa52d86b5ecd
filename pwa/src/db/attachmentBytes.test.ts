import Dexie from 'dexie';
import { afterEach, describe, expect, it } from 'vitest';
import { openDb, type SitebandDb } from './db';
import { heldBytes } from '../features/photos/attachmentBytes';

const opened: SitebandDb[] = [];
afterEach(async () => {
  for (const d of opened.splice(0)) await d.delete();
});

describe('version 8 of the tablet database', () => {
  it('moves each attachment file out of its row, byte for byte, and leaves rows without a file as they were', async () => {
    const name = `attachment-bytes-upgrade-${Date.now()}`;
    // The database as version 7 left it: files inside their attachment rows.
    const old = new Dexie(name);
    old.version(7).stores({ session: 'key', syncMeta: 'key', photos: 'id, caseId, editedAt', outbox: '++seq, &changeId, [entity+id], status' });
    await old.open();
    const file = new Uint8Array(3000).map((_, i) => (i * 31) % 256);
    const row = { caseId: 'case-1', data: { kind: 'photo', fileName: 'bay.jpg', sha256: 'ab' }, version: 2, sync: 'sending', editedAt: 1, receivedBytes: 0, uploadedAt: null };
    await old.table('photos').put({ ...row, id: 'held', bytes: file.buffer });
    await old.table('photos').put({ ...row, id: 'pulled', sync: 'server' });
    old.close();

    const d = await openDb(name);
    opened.push(d);
    expect(d.verno).toBe(8);
    const held = await d.photos.get('held');
    expect(held).toEqual({ ...row, id: 'held', bytesHeld: true });
    expect(new Uint8Array((await heldBytes(d, 'held'))!)).toEqual(file);
    expect(await d.photos.get('pulled')).toEqual({ ...row, id: 'pulled', sync: 'server' });
    expect(await heldBytes(d, 'pulled')).toBeUndefined();
  });
});
