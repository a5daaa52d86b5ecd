import type { CaptureRow } from './captureRecord';

/** An attachment's metadata as the tablet sends it (PROTOCOL.md, entity `attachment`): a photo, or a scan's raw file. */
export interface PhotoData {
  ownerType: 'case' | 'sample' | 'scan';
  ownerId: string;
  kind: 'photo' | 'raw-scan';
  fileName: string;
  contentType: string;
  size: number;
  /** Lower-case hex SHA-256 of `bytes`. */
  sha256: string;
  /** What a photo shows, in the inspector's words (`photoCaptionOf` in shared); absent in records made before captions. */
  caption?: string | null;
}

/** One row of the `photos` table, which holds every attachment (photos and raw scan files); the file itself is in `attachmentBytes`. */
export interface PhotoRow extends CaptureRow<PhotoData> {
  /** The file is on this tablet (in `attachmentBytes`); absent for a photo another device took (only its metadata arrives by pull). */
  bytesHeld?: true;
  /** How many bytes the server holds; the upload resumes from here. */
  receivedBytes: number;
  /** ISO time the server verified the whole file; null until then. */
  uploadedAt: string | null;
  /** Why the server refused the bytes for good (too large, wrong type, hash mismatch); not retried. */
  uploadRefused?: string;
}
