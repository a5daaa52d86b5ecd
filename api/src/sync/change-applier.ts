import { Inject, Injectable, Optional } from '@nestjs/common';
import { DataSource, In } from 'typeorm';
import { AuditService, type AuditRecordInput } from '../audit/audit.service';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { BatchRows, type RowRef } from './batch-rows';
import { ChangeEnvelopeDto } from './dto/change-envelope.dto';
import type { ChangeResultDto } from './dto/change-result.dto';
import { SyncRecordDto } from './dto/sync-record.dto';
import { SyncChange } from './sync-change.entity';
import { SYNC_COUNTER_ID, SyncCounter } from './sync-counter.entity';
import { ChangeRejected, ENTITY_NOUNS, SYNC_WRITE_LISTENERS, type ChangeContext, type SyncEntityName, type SyncHandler, type SyncWriteListener } from './sync-handler';
import { SyncRegistry } from './sync-registry';
import { lockSyncCounter, nextSyncSeq } from './sync-sequence';
import type { SyncedRecord } from './synced-record';
import { validateData } from './validate-data';

/** The batch a change came in, stored with its outcome for tracing. */
export interface BatchInfo {
  clientId: string;
  batchId: string;
}

/** What an applied change leaves for the end of its batch's transaction. */
interface BatchWrites {
  /** The sync counter, locked for the whole transaction; its new value is written once at the end. */
  counter: SyncCounter;
  /** The audit entries of the applied changes, in order, appended under one lock of the chain head. */
  audit: AuditRecordInput[];
  /** The outcome of every processed change, by changeId, inserted at the end. */
  outcomes: Map<string, SyncChange>;
  /** Rows read before the first change (null: not on the server), by `entity:id`, until a change of this batch writes them. */
  prefetched: Map<string, SyncedRecord | null>;
}

/** Rows of stored outcomes per INSERT. */
const OUTCOMES_PER_INSERT = 500;

/**
 * Applies pushed changes exactly once: the outcome of each is stored under its changeId in the same
 * transaction as its write, so a re-sent change gets the stored outcome back. A batch is applied in
 * order in one transaction under one lock of the sync counter; a refused change writes nothing and
 * the others go on.
 */
@Injectable()
export class ChangeApplier {
  constructor(
    private readonly dataSource: DataSource,
    private readonly registry: SyncRegistry,
    private readonly audit: AuditService,
    @Optional() @Inject(SYNC_WRITE_LISTENERS) private readonly listeners: SyncWriteListener[] = [],
  ) {}

  /** Applies a single change in its own transaction (a batch of one). */
  async apply(raw: Record<string, unknown>, batch: BatchInfo, user: AuthenticatedUser): Promise<ChangeResultDto> {
    const [result] = await this.applyBatch([raw], batch, user);
    return result;
  }

  /**
   * Validates, authorises and applies the changes in order, all in one transaction; answers one result
   * per change. Never throws for a bad change; a server fault rolls the whole batch back.
   */
  async applyBatch(raws: readonly Record<string, unknown>[], batch: BatchInfo, user: AuthenticatedUser): Promise<ChangeResultDto[]> {
    const envelopes = raws.map((raw) => validateData(ChangeEnvelopeDto, raw));
    return this.dataSource.transaction(async (manager) => {
      // Taken before any changeId is looked up, so two deliveries of one change cannot both apply it.
      const counter = await lockSyncCounter(manager);
      const first = counter.value;
      const valid = envelopes.flatMap((envelope) => (envelope.ok ? [envelope.value] : []));
      const ctx: ChangeContext = { manager, user, rows: new BatchRows(manager) };
      const writes: BatchWrites = { counter, audit: [], outcomes: new Map(), prefetched: await this.prefetch(ctx, valid) };
      const stored = valid.length ? await manager.findBy(SyncChange, { changeId: In([...new Set(valid.map((change) => change.changeId))]) }) : [];
      const previous = new Map(stored.map((row) => [row.changeId, row]));

      const results: ChangeResultDto[] = [];
      for (const [i, envelope] of envelopes.entries()) {
        if (!envelope.ok) {
          // Not stored: without a valid envelope there is nothing to key it by; re-sending it fails the same way.
          results.push({ changeId: String(raws[i].changeId ?? ''), status: 'rejected', reason: `Invalid change: ${envelope.problems}` });
          continue;
        }
        const change = envelope.value;
        // A changeId seen before, in an earlier batch or earlier in this one.
        const seen = previous.get(change.changeId) ?? writes.outcomes.get(change.changeId);
        if (seen) {
          results.push(duplicateOf(seen, change.changeId, user));
          continue;
        }
        let result: ChangeResultDto;
        try {
          result = await this.decide(ctx, change, writes);
        } catch (error) {
          if (!(error instanceof ChangeRejected)) throw error;
          result = { changeId: change.changeId, status: 'rejected', reason: error.message };
        }
        writes.outcomes.set(
          change.changeId,
          manager.create(SyncChange, {
            changeId: change.changeId,
            userId: user.id,
            clientId: batch.clientId,
            batchId: batch.batchId,
            entity: change.entity,
            recordId: change.id,
            status: result.status,
            version: result.version ?? null,
            reason: result.reason?.slice(0, 1000) ?? null,
          }),
        );
        results.push(result);
      }

      await ctx.rows.flush();
      if (counter.value !== first) await manager.update(SyncCounter, { id: SYNC_COUNTER_ID }, { value: counter.value });
      // After the sync counter, as every writer takes them.
      await this.audit.recordAll(manager, writes.audit);
      const outcomes = [...writes.outcomes.values()];
      for (let k = 0; k < outcomes.length; k += OUTCOMES_PER_INSERT) {
        await manager.createQueryBuilder().insert().into(SyncChange).values(outcomes.slice(k, k + OUTCOMES_PER_INSERT)).updateEntity(false).execute();
      }
      return results;
    });
  }

  /** The rows the changes name, one query per kind of record; and the parents their data names, into `ctx.rows`. */
  private async prefetch(ctx: ChangeContext, changes: ChangeEnvelopeDto[]): Promise<Map<string, SyncedRecord | null>> {
    const parents: RowRef[] = [];
    const found = new Map<string, SyncedRecord | null>();
    const idsByEntity = new Map<SyncEntityName, Set<string>>();
    for (const change of changes) idsByEntity.set(change.entity, (idsByEntity.get(change.entity) ?? new Set()).add(change.id));
    for (const [entity, ids] of idsByEntity) {
      let handler: SyncHandler;
      try {
        handler = this.registry.get(entity);
      } catch (error) {
        // Refused again, with its reason, when the change itself is decided.
        if (error instanceof ChangeRejected) continue;
        throw error;
      }
      // null: looked up and not on the server (a new record).
      for (const id of ids) found.set(`${entity}:${id}`, null);
      for (const row of await ctx.manager.findBy(handler.target, { id: In([...ids]) })) found.set(`${entity}:${row.id}`, row);
      for (const change of changes) {
        if (change.entity === entity && change.op === 'upsert' && change.data) parents.push(...(handler.parentsOf?.(change.data) ?? []));
      }
    }
    await ctx.rows.prefetch(parents);
    return found;
  }

  /** The current row of a record: as prefetched, or read again once a change of this batch has written it. */
  private async current(ctx: ChangeContext, handler: SyncHandler, id: string, writes: BatchWrites): Promise<SyncedRecord | null> {
    const key = `${handler.entity}:${id}`;
    if (writes.prefetched.has(key)) return writes.prefetched.get(key) ?? null;
    return ctx.rows.reread(handler.target, id);
  }

  private async decide(ctx: ChangeContext, change: ChangeEnvelopeDto, writes: BatchWrites): Promise<ChangeResultDto> {
    const handler = this.registry.get(change.entity);
    const existing = await this.current(ctx, handler, change.id, writes);
    const noun = ENTITY_NOUNS[change.entity];
    const conflict = (row: SyncedRecord): ChangeResultDto => ({
      changeId: change.changeId,
      status: 'conflict',
      reason: `The server has version ${row.version} of this ${noun}; the change was made from ${change.baseVersion ?? 'no version (a new record)'}`,
      server: SyncRecordDto.of(handler, row),
    });

    if (change.op === 'delete') {
      if (!existing) throw new ChangeRejected(`There is no ${noun} ${change.id} on the server to delete`);
      // Authorise before anything about the row is revealed.
      const caseId = await handler.authorize(ctx, change.id, null, existing);
      if (change.baseVersion !== existing.version) return conflict(existing);
      if (handler.appendOnly) throw new ChangeRejected(`Permanent record (${noun}): it cannot be deleted`);
      if (existing.deletedAt) throw new ChangeRejected(`This ${noun} is already deleted`);
      if (handler.checkDelete) {
        // It counts what is below the record, this batch's new rows included.
        await ctx.rows.flush();
        await handler.checkDelete(ctx, existing);
      }
      const before = structuredClone(handler.toData(existing));
      existing.deletedAt = new Date();
      return this.write(ctx, handler, existing, writes, change.changeId, { caseId, action: 'delete', before });
    }

    const data = validateData(handler.dataClass, change.data);
    if (!data.ok) throw new ChangeRejected(`Invalid ${noun}: ${data.problems}`);
    const caseId = await handler.authorize(ctx, change.id, data.value, existing);
    if (!existing) {
      if (change.baseVersion !== null) {
        throw new ChangeRejected(`There is no ${noun} ${change.id} on the server: send it with baseVersion null`);
      }
      const row = ctx.manager.create(handler.target, { id: change.id, version: 0, deletedAt: null });
      await handler.assign(ctx, row, data.value, { caseId, isNew: true });
      return this.write(ctx, handler, row, writes, change.changeId, { caseId, action: 'create', before: null });
    }
    if (change.baseVersion !== existing.version) return conflict(existing);
    if (existing.deletedAt) throw new ChangeRejected(`This ${noun} was deleted on the server; it cannot be changed`);
    if (handler.appendOnly) throw new ChangeRejected(`Permanent record (${noun}): it cannot be changed once sent`);
    const before = structuredClone(handler.toData(existing));
    await handler.assign(ctx, existing, data.value, { caseId, isNew: false });
    return this.write(ctx, handler, existing, writes, change.changeId, { caseId, action: 'update', before });
  }

  /**
   * Bumps the version, takes the next sequence number, writes the row (a new one with the batch's next
   * new rows of its kind), queues its audit entry for the end of the batch and lets the listeners of this
   * kind of record act, all in the batch's transaction.
   */
  private async write(
    ctx: ChangeContext,
    handler: SyncHandler,
    row: SyncedRecord,
    writes: BatchWrites,
    changeId: string,
    audit: { caseId: string; action: 'create' | 'update' | 'delete'; before: Record<string, unknown> | null },
  ): Promise<ChangeResultDto> {
    row.version += 1;
    row.syncSeq = nextSyncSeq(writes.counter);
    if (audit.action === 'create') {
      ctx.rows.insert(handler.target, row);
    } else {
      // The row may now point at a parent this batch has just made.
      await ctx.rows.flush();
      await ctx.manager.save(handler.target, row);
      ctx.rows.forget(handler.target, row.id);
    }
    // Read again if a later change of this batch names the record, or looks it up as a parent.
    writes.prefetched.delete(`${handler.entity}:${row.id}`);
    writes.audit.push({
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
      if (listener.entity !== handler.entity) continue;
      // Listeners work on the stored row.
      await ctx.rows.flush();
      await listener.afterWrite(ctx.manager, row, { isNew: audit.action === 'create' });
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
