import { Injectable } from '@nestjs/common';
import { DataSource } from 'typeorm';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { whereCaseVisible } from '../cases/case-access';
import { ScanRecomputeQueue } from '../scans/scan-recompute.queue';
import { ChangeApplier } from './change-applier';
import type { PushResponseDto } from './dto/change-result.dto';
import { DEFAULT_PULL_LIMIT, type PullQueryDto, type PullResponseDto } from './dto/pull.dto';
import type { PushRequestDto } from './dto/push-request.dto';
import { SyncRecordDto } from './dto/sync-record.dto';
import { SyncRegistry } from './sync-registry';

/** Push (apply a batch of changes, each exactly once) and pull (what changed since a cursor). */
@Injectable()
export class SyncService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly registry: SyncRegistry,
    private readonly applier: ChangeApplier,
    private readonly recompute: ScanRecomputeQueue,
  ) {}

  /** Applies the changes in order, in one transaction; one bad change does not stop the others. */
  async push(batch: PushRequestDto, user: AuthenticatedUser): Promise<PushResponseDto> {
    const results = await this.applier.applyBatch(batch.changes, { clientId: batch.clientId, batchId: batch.batchId }, user);
    const changedScans = batch.changes.flatMap((change, i) =>
      results[i].status === 'applied' && change.entity === 'scan' && change.op === 'upsert' ? [String(change.id)] : [],
    );
    // The batch has committed: the server recomputes those scans after this answer (when their raw file is in).
    this.recompute.enqueue(...changedScans);
    return { results };
  }

  /** The records visible to the user written after the cursor, oldest write first, at most `limit`. */
  async pull(query: PullQueryDto, user: AuthenticatedUser): Promise<PullResponseDto> {
    // The tablet is syncing: its pages come before the server's recomputation of scans.
    this.recompute.syncActivity();
    const cursor = Number(query.cursor ?? '0');
    const limit = query.limit ?? DEFAULT_PULL_LIMIT;
    // One snapshot for all tables: otherwise a write committed between two table reads could be
    // skipped when the cursor moves past its sequence number.
    const records = await this.dataSource.transaction('REPEATABLE READ', async (manager) => {
      const found: SyncRecordDto[] = [];
      for (const handler of this.registry.all()) {
        const query = manager
          .getRepository(handler.target)
          .createQueryBuilder('r')
          .where('r.syncSeq > :cursor', { cursor })
          .orderBy('r.syncSeq', 'ASC')
          .limit(limit + 1);
        const rows = await whereCaseVisible(query, `r.${handler.caseColumn}`, user).getMany();
        found.push(...rows.map((row) => SyncRecordDto.of(handler, row)));
      }
      return found;
    });
    records.sort((a, b) => a.syncSeq - b.syncSeq);
    const changes = records.slice(0, limit);
    return {
      changes,
      cursor: String(changes.length ? changes[changes.length - 1].syncSeq : cursor),
      hasMore: records.length > limit,
    };
  }
}
