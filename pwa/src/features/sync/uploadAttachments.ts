import type { SitebandDb } from '../../db/db';
import type { PhotoRow } from '../../db/photosTable';
import type { ApiClient } from '../api/client';
import { ApiError } from '../api/apiError';
import { heldBytes } from '../photos/attachmentBytes';
import { refusalReason } from './refusal';
import { refreshSyncState } from './syncState';
import type { AttachmentStatus } from './syncTypes';

/** Sends raw bytes; the JSON API client cannot, so the upload has its own door with the same bearer token. */
export interface ByteSender {
  put(path: string, bytes: ArrayBuffer, headers: Record<string, string>): Promise<Response>;
}

/** Bytes per chunk: small enough that a dropped connection loses little (each chunk is all or nothing). */
export const CHUNK_BYTES = 256 * 1024;

/** Where the server's copy stands; asking through the API client also refreshes an expired token. */
function serverStatus(api: ApiClient, id: string): Promise<AttachmentStatus> {
  return api.request<AttachmentStatus>(`/api/attachments/${id}/status`);
}

async function save(db: SitebandDb, id: string, status: AttachmentStatus): Promise<void> {
  await db.transaction('rw', [db.photos, db.outbox], async () => {
    await refreshSyncState(db, 'attachment', id, { receivedBytes: status.receivedBytes, uploadedAt: status.complete ? status.uploadedAt : null });
  });
}

/** Keeps the server's reason beside the bytes: the file stays on the tablet, shown as not on server, never dropped. */
async function refuse(db: SitebandDb, id: string, reason: string): Promise<void> {
  await db.transaction('rw', [db.photos, db.outbox], async () => {
    await refreshSyncState(db, 'attachment', id, { uploadRefused: reason });
  });
}

/**
 * Uploads one attachment's bytes (a photo or a scan's raw file) in chunks with Content-Range, resuming from the offset the server
 * reports. A 409 (offset moved) or 401 asks the server where it stands and carries on; a 422 (hash
 * mismatch, the server discarded everything) starts over once. A refusal that sending again cannot change
 * (413, 415, a second 422) is stored on the attachment with its reason; any other failure is thrown for backoff.
 */
export async function uploadAttachment(db: SitebandDb, api: ApiClient, sender: ByteSender, attachment: PhotoRow): Promise<void> {
  const bytes = await heldBytes(db, attachment.id);
  if (!bytes) return;
  const size = bytes.byteLength;
  let offset = attachment.receivedBytes;
  let restarts = 0;
  for (let guard = 0; guard < Math.ceil(size / CHUNK_BYTES) + 8; guard += 1) {
    if (offset >= size) offset = (await serverStatus(api, attachment.id)).receivedBytes;
    const end = Math.min(offset + CHUNK_BYTES, size) - 1;
    const response = await sender.put(`/api/attachments/${attachment.id}/content`, bytes.slice(offset, end + 1), {
      'Content-Type': attachment.data.contentType,
      'Content-Range': `bytes ${offset}-${end}/${size}`,
    });
    if (response.ok) {
      const status = (await response.json()) as AttachmentStatus;
      await save(db, attachment.id, status);
      if (status.complete) return;
      offset = status.receivedBytes;
    } else if (response.status === 409 || response.status === 401) {
      const status = await serverStatus(api, attachment.id);
      await save(db, attachment.id, status);
      if (status.complete) return;
      offset = status.receivedBytes;
    } else if (response.status === 422 && restarts === 0) {
      restarts += 1;
      offset = 0;
    } else {
      const error = await ApiError.fromResponse(response);
      const reason = refusalReason(error);
      if (reason === undefined) throw error;
      await refuse(db, attachment.id, reason);
      return;
    }
  }
  throw new Error(`The upload of ${attachment.data.fileName} made no progress`);
}

/**
 * Files in flight at once: while one waits for the server to verify and store it, the next ones travel.
 * Few, so a slow link is not split too thin and the server is not flooded.
 */
export const PARALLEL_UPLOADS = 4;

/**
 * Uploads every attachment whose metadata the server holds and whose bytes it has neither verified nor
 * refused, `PARALLEL_UPLOADS` at a time. After a failure no new file is started; the first failure is
 * thrown once the files in flight have finished.
 */
export async function uploadAttachments(db: SitebandDb, api: ApiClient, sender: ByteSender): Promise<number> {
  const waiting = await db.photos.filter((p) => p.version !== null && p.uploadedAt === null && p.bytesHeld === true && p.uploadRefused === undefined && p.deletePending === undefined).toArray();
  const failures: unknown[] = [];
  let next = 0;
  async function worker(): Promise<void> {
    while (next < waiting.length && failures.length === 0) {
      const attachment = waiting[next];
      next += 1;
      try {
        await uploadAttachment(db, api, sender, attachment);
      } catch (error) {
        failures.push(error);
      }
    }
  }
  await Promise.all(Array.from({ length: Math.min(PARALLEL_UPLOADS, waiting.length) }, worker));
  if (failures.length > 0) throw failures[0];
  return waiting.length;
}
