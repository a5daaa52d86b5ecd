import { Injectable } from '@nestjs/common';
import { attachmentSyncHandler } from '../attachments/attachment.sync-handler';
import { decisionPull } from '../review/review-decision.pull';
import { caseSyncHandler } from '../cases/case.sync-handler';
import { siteNoteSyncHandler } from '../notes/site-note.sync-handler';
import { handoverSyncHandler } from '../samples/handover.sync-handler';
import { sampleSyncHandler } from '../samples/sample.sync-handler';
import { escalationNotePull } from '../escalations/escalation-note.pull';
import { escalationSyncHandler } from '../scans/escalation.sync-handler';
import { instrumentCheckSyncHandler } from '../scans/instrument-check.sync-handler';
import { scanSyncHandler } from '../scans/scan.sync-handler';
import { ChangeRejected, ENTITY_NOUNS, type PulledKind, type SyncEntityName, type SyncHandler } from './sync-handler';

/** Every handler of pushed records, parents before children. */
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

/** Records only the server writes: pulled, never pushed. */
const PULL_ONLY = [decisionPull, escalationNotePull] satisfies PulledKind[] as PulledKind[];

/** Everything a pull reads. */
const PULLED: readonly PulledKind[] = [...HANDLERS, ...PULL_ONLY];

/** Finds the handler of each kind of synced record. */
@Injectable()
export class SyncRegistry {
  private readonly byEntity = new Map<SyncEntityName, SyncHandler>(HANDLERS.map((handler) => [handler.entity, handler]));

  /** The handler of one kind of pushed record; a push of a record only the server writes is rejected. */
  get(entity: SyncEntityName): SyncHandler {
    const handler = this.byEntity.get(entity);
    if (handler) return handler;
    if (PULL_ONLY.some((kind) => kind.entity === entity)) {
      throw new ChangeRejected(`Written by the server only (${ENTITY_NOUNS[entity]}): tablets pull these records and never push them`);
    }
    throw new Error(`No sync handler for ${entity}`);
  }

  /** Every kind of record a pull reads. */
  all(): readonly PulledKind[] {
    return PULLED;
  }
}
