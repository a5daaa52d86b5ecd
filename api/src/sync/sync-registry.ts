import { Injectable } from '@nestjs/common';
import { attachmentSyncHandler } from '../attachments/attachment.sync-handler';
import { caseSyncHandler } from '../cases/case.sync-handler';
import { siteNoteSyncHandler } from '../notes/site-note.sync-handler';
import { handoverSyncHandler } from '../samples/handover.sync-handler';
import { sampleSyncHandler } from '../samples/sample.sync-handler';
import { escalationSyncHandler } from '../scans/escalation.sync-handler';
import { instrumentCheckSyncHandler } from '../scans/instrument-check.sync-handler';
import { scanSyncHandler } from '../scans/scan.sync-handler';
import type { SyncEntityName, SyncHandler } from './sync-handler';

/** Every handler, parents before children. */
const HANDLERS = [
  caseSyncHandler,
  sampleSyncHandler,
  handoverSyncHandler,
  instrumentCheckSyncHandler,
  scanSyncHandler,
  siteNoteSyncHandler,
  escalationSyncHandler,
  attachmentSyncHandler,
] satisfies SyncHandler[] as SyncHandler[];

/** Finds the handler of each kind of synced record. */
@Injectable()
export class SyncRegistry {
  private readonly byEntity = new Map<SyncEntityName, SyncHandler>(HANDLERS.map((handler) => [handler.entity, handler]));

  /** The handler of one kind of record. */
  get(entity: SyncEntityName): SyncHandler {
    const handler = this.byEntity.get(entity);
    if (!handler) throw new Error(`No sync handler for ${entity}`);
    return handler;
  }

  /** Every handler. */
  all(): readonly SyncHandler[] {
    return HANDLERS;
  }
}
