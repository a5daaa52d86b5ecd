import type { CaptureEntity, ServerRecord } from '../../db/captureRecord';

/** One change as `POST /api/sync/push` takes it. */
export interface ChangeEnvelope {
  changeId: string;
  entity: CaptureEntity;
  op: 'upsert' | 'delete';
  id: string;
  baseVersion: number | null;
  data?: Record<string, unknown>;
}

/** The server's answer to one change (PROTOCOL.md "Push"). */
export interface ChangeResult {
  changeId: string;
  status: 'applied' | 'duplicate' | 'conflict' | 'rejected';
  firstStatus?: 'applied' | 'conflict' | 'rejected';
  version?: number;
  reason?: string;
  server?: ServerRecord;
}

/** `GET /api/sync/pull` answer. */
export interface PullResponse {
  changes: ServerRecord[];
  cursor: string;
  hasMore: boolean;
}

/** `GET /api/attachments/:id/status` and upload answers. */
export interface AttachmentStatus {
  id: string;
  size: number;
  receivedBytes: number;
  complete: boolean;
  sha256: string;
  uploadedAt: string | null;
}

/** Most changes one push may carry (the server's MAX_CHANGES_PER_BATCH). */
export const MAX_BATCH = 200;
