/**
 * An attachment's file (a photo or a scan's raw export) as the tablet took or imported it, byte for byte.
 * It is kept apart from the attachment's row in `photos`: that row changes many times during a sync (its
 * state, the upload offset) and every change reads and rewrites the whole row, which must not mean copying
 * the file each time. The bytes are an ArrayBuffer rather than a Blob: every IndexedDB implementation
 * clones ArrayBuffers, while Blob support differs (the test database has none).
 */
export interface AttachmentBytesRow {
  /** The attachment's id (its row in `photos`). */
  id: string;
  bytes: ArrayBuffer;
}

/** Dexie index spec: the attachment's id only. */
export const attachmentBytesSchema = 'id';
