import type { CaptureRow } from './captureRecord';

/** A photo's metadata as the tablet sends it (PROTOCOL.md, entity `attachment`, kind `photo`). */
export interface PhotoData {
  ownerType: 'case' | 'sample';
  ownerId: string;
  kind: 'photo';
  fileName: string;
  contentType: string;
  size: number;
  /** Lower-case hex SHA-256 of `bytes`. */
  sha256: string;
}

/**
 * One row of the `photos` table. The bytes are an ArrayBuffer rather than a Blob: every IndexedDB
 * implementation clones ArrayBuffers, while Blob support differs (the test database has none).
 */
export interface PhotoRow extends CaptureRow<PhotoData> {
  /** Absent for a photo another device took (only its metadata arrives by pull). */
  bytes?: ArrayBuffer;
  /** How many bytes the server holds; the upload resumes from here. */
  receivedBytes: number;
  /** ISO time the server verified the whole file; null until then. */
  uploadedAt: string | null;
}
