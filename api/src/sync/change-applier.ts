import { Inject, Injectable, Optional } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { ChangeEnvelopeDto } from './dto/change-envelope.dto';
import type { ChangeResultDto } from './dto/change-result.dto';
import { SyncRecordDto } from './dto/sync-record.dto';
import { SyncChange } from './sync-change.entity';
import type { SyncCounter } from './sync-counter.entity';
import { ChangeRejected, SYNC_WRITE_LISTENERS, type ChangeContext, type SyncHandler, type SyncWriteListener } from './sync-handler';
import { SyncRegistry } from './sync-registry';
import { lockSyncCounter, takeSyncSeq } from './sync-sequence';
import type { SyncedRecord } from './synced-record';
import { validateData } from './validate-data';

/** The batch a change came in, stored with its outcome for tracing. */
export interface BatchInfo {
  clientId: string;
  batchId: string;
}

/**
 * Applies one pushed change in its own transaction, exactly once: the outcome is stored under the
 * changeId in the same transaction as the write, so a re-sent change gets the stored outcome back.
 */
@Injectable()
export class ChangeApplier {
  constructor(
    private readonly dataSource: DataSource,
    private readonly registry: SyncRegistry,
    private readonly audit: AuditService,
    @Optional() @Inject(SYNC_WRITE_LISTENERS) private readonly listeners: SyncWriteListener[] = [],
  ) {}

  /** Validates, authorises and applies one change; never throws for a bad change (only for server faults). */
  async apply(raw: Record<string, unknown>, batch: BatchInfo, user: AuthenticatedUser): Promise<ChangeResultDto> {
    const envelope = validateData(ChangeEnvelopeDto, raw);
    if (!envelope.ok) {
      // Not stored: without a valid envelope there is nothing to key it by; re-sending it fails the same way.
      return { changeId: String(raw.changeId ?? ''), status: 'rejected', reason: `Invalid change: ${envelope.problems}` };
    }
    const change = envelope.value;
    return this.dataSource.transaction(async (manager) => {
      // Taken before the changeId is looked up, so two deliveries of one change cannot both apply it.
      const counter = await lockSyncCounter(manager);

      const previous = await manager.findOneBy(SyncChange, { changeId: change.changeId });
      if (previous) return duplicateOf(previous, change.changeId, user);

      let result: ChangeResultDto;
      try {
        result = await this.decide({ manager, user }, change, counter);
      } catch (error) {
        if (!(error instanceof ChangeRejected)) throw error;
        result = { changeId: change.changeId, status: 'rejected', reason: error.message };
      }
      await manager.insert(SyncChange, {
        changeId: change.changeId,
        userId: user.id,
        clientId: batch.clientId,
        batchId: batch.batchId,
        entity: change.entity,
        recordId: change.id,
        status: result.status,
        version: result.version ?? null,
        reason: result.reason?.slice(0, 1000) ?? null,
      });
      return result;
    });
  }

  private async decide(ctx: ChangeContext, change: ChangeEnvelopeDto, counter: SyncCounter): Promise<ChangeResultDto> {
    const handler = this.registry.get(change.entity);
    const existing = await ctx.manager.findOneBy(handler.target, { id: change.id });
    const conflict = (row: SyncedRecord): ChangeResultDto => ({
      changeId: change.changeId,
      status: 'conflict',
      reason: `The server has version ${row.version} of this ${change.entity}; the change was made from ${change.baseVersion ?? 'no version (a new record)'}`,
      server: SyncRecordDto.of(handler, row),
    });

    if (change.op === 'delete') {
      if (!existing) throw new ChangeRejected(`There is no ${change.entity} ${change.id} on the server to delete`);
      // Authorise before anything about the row is revealed.
      const caseId = await handler.authorize(ctx, change.id, null, existing);
      if (change.baseVersion !== existing.version) return conflict(existing);
      if (handler.appendOnly) throw new ChangeRejected(`A ${change.entity} is a permanent record: it cannot be deleted`);
      if (existing.deletedAt) throw new ChangeRejected(`This ${change.entity} is already deleted`);
      const before = structuredClone(handler.toData(existing));
      existing.deletedAt = new Date();
      return this.write(ctx, handler, existing, counter, change.changeId, { caseId, action: 'delete', before });
    }

    const data = validateData(handler.dataClass, change.data);
    if (!data.ok) throw new ChangeRejected(`Invalid ${change.entity}: ${data.problems}`);
    const caseId = await handler.authorize(ctx, change.id, data.value, existing);
    if (!existing) {
      if (change.baseVersion !== null) {
        throw new ChangeRejected(`There is no ${change.entity} ${change.id} on the server: send it with baseVersion null`);
      }
      const row = ctx.manager.create(handler.target, { id: change.id, version: 0, deletedAt: null });
      await handler.assign(ctx, row, data.value, { caseId, isNew: true });
      return this.write(ctx, handler, row, counter, change.changeId, { caseId, action: 'create', before: null });
    }
    if (change.baseVersion !== existing.version) return conflict(existing);
    if (existing.deletedAt) throw new ChangeRejected(`This ${change.entity} was deleted on the server; it cannot be changed`);
    if (handler.appendOnly) throw new ChangeRejected(`A ${change.entity} is a permanent record: it cannot be changed once sent`);
    const before = structuredClone(handler.toData(existing));
    await handler.assign(ctx, existing, data.value, { caseId, isNew: false });
    return this.write(ctx, handler, existing, counter, change.changeId, { caseId, action: 'update', before });
  }

  /**
   * Bumps the version, takes the next sequence number, saves, records the change in the audit trail and
   * lets the listeners of this kind of record act, all in the change's transaction.
   */
  private async write(
    ctx: ChangeContext,
    handler: SyncHandler,
    row: SyncedRecord,
    counter: SyncCounter,
    changeId: string,
    audit: { caseId: string; action: 'create' | 'update' | 'delete'; before: Record<string, unknown> | null },
  ): Promise<ChangeResultDto> {
    row.version += 1;
    row.syncSeq = await takeSyncSeq(ctx.manager, counter);
    await ctx.manager.save(handler.target, row);
    await this.audit.record(ctx.manager, {
      actorId: ctx.user.id,
      actorRole: ctx.user.role,
      entity: handler.entity,
      entityId: row.id,
      caseId: audit.caseId,
      action: audit.action,
      before: audit.before,
      after: audit.action === 'delete' ? null : handler.toData(row),
    });
    for (const listener of this.listeners) {
      if (listener.entity === handler.entity) await listener.afterWrite(ctx.manager, row, { isNew: audit.action === 'create' });
    }
    return { changeId, status: 'applied', version: row.version };
  }
}

/** The stored outcome of a change seen before (only to the user who sent it). */
function duplicateOf(previous: SyncChange, changeId: string, user: AuthenticatedUser): ChangeResultDto {
  if (previous.userId !== user.id) {
    return { changeId, status: 'rejected', reason: 'This changeId was already used by another user: generate a new one' };
  }
  return {
    changeId,
    status: 'duplicate',
    firstStatus: previous.status as 'applied' | 'conflict' | 'rejected',
    ...(previous.version !== null ? { version: previous.version } : {}),
    ...(previous.reason !== null ? { reason: previous.reason } : {}),
  };
}
