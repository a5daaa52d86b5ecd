import { Injectable, Logger, type BeforeApplicationShutdown } from '@nestjs/common';
import { Observable, Subject, filter } from 'rxjs';
import { DataSource } from 'typeorm';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { readsAllCases } from '../cases/case-access';
import { Poller } from '../common/poller';
import { SYNC_COUNTER_ID, SyncCounter } from '../sync/sync-counter.entity';

/** The kinds of live event (`GET /api/events`). */
export const LIVE_EVENT_TYPES = ['escalation.raised', 'escalation.acknowledged', 'escalation.closed', 'case.submitted', 'case.decided'] as const;
export type LiveEventType = (typeof LIVE_EVENT_TYPES)[number];

/** One live event: a hint that something changed, for open dashboards to reload. */
export interface LiveEvent {
  type: LiveEventType;
  /** The escalation's id, or the case's for case events. */
  id: string;
  caseId: string;
  at: string;
}

/** An event with the inspector whose case it is, for the visibility filter. */
interface RoutedEvent {
  event: LiveEvent;
  inspectorId: string;
  syncSeq: number;
}

/** How often an instance with listeners looks for new writes (common practice for dashboards: about a second). */
const POLL_MS = 1000;

/**
 * Live events that work with several API instances: each instance reads the new writes from MariaDB by
 * the global sync sequence (escalation rows, submitted cases, review decisions), whichever instance
 * made them, and hands them to its own listeners, filtered by case visibility. It polls only while
 * someone listens.
 */
@Injectable()
export class LiveEventsService implements BeforeApplicationShutdown {
  private readonly logger = new Logger('LiveEvents');
  private readonly subject = new Subject<RoutedEvent>();
  private readonly poller = new Poller('Live events round', POLL_MS, () => this.readNew(), this.logger);
  /** The sync sequence read up to; null while nobody listens. */
  private lastSeq: number | null = null;
  private listeners = 0;

  constructor(private readonly dataSource: DataSource) {}

  /** The events the user may see, from the moment of subscribing. */
  async streamFor(user: AuthenticatedUser): Promise<Observable<LiveEvent>> {
    this.lastSeq ??= await this.currentSeq();
    const visible = (routed: RoutedEvent) => readsAllCases(user) || (user.role === 'inspector' && routed.inspectorId === user.id);
    return new Observable<LiveEvent>((subscriber) => {
      if (this.listeners++ === 0) this.poller.start();
      const inner = this.subject.pipe(filter(visible)).subscribe((routed) => subscriber.next(routed.event));
      return () => {
        inner.unsubscribe();
        if (--this.listeners === 0) {
          void this.poller.stop();
          this.lastSeq = null;
        }
      };
    });
  }

  async beforeApplicationShutdown(): Promise<void> {
    await this.poller.stop();
    this.subject.complete();
  }

  private async currentSeq(): Promise<number> {
    const counter = await this.dataSource.getRepository(SyncCounter).findOneBy({ id: SYNC_COUNTER_ID });
    return counter?.value ?? 0;
  }

  /**
   * Reads the writes after `lastSeq` in one snapshot and emits them in write order. As for pulls, every
   * synced write holds the sequence counter until it commits, so no lower sequence number can appear later.
   */
  private async readNew(): Promise<void> {
    if (this.lastSeq === null) return;
    const after = this.lastSeq;
    const routed = await this.dataSource.transaction('REPEATABLE READ', async (manager) => {
      const escalations: { id: string; caseId: string; status: string; syncSeq: string; at: Date; inspectorId: string }[] = await manager.query(
        'SELECT e.id, e.caseId, e.status, e.syncSeq, e.updatedAt AS at, c.inspectorId FROM escalations e JOIN cases c ON c.id = e.caseId ' +
          'WHERE e.syncSeq > ? AND e.deletedAt IS NULL',
        [after],
      );
      const cases: { id: string; syncSeq: string; at: Date; inspectorId: string }[] = await manager.query(
        "SELECT id, syncSeq, updatedAt AS at, inspectorId FROM cases WHERE syncSeq > ? AND status = 'submitted' AND deletedAt IS NULL",
        [after],
      );
      const decisions: { caseId: string; syncSeq: string; at: Date; inspectorId: string }[] = await manager.query(
        'SELECT d.caseId, d.syncSeq, d.decidedAt AS at, c.inspectorId FROM review_decisions d JOIN cases c ON c.id = d.caseId WHERE d.syncSeq > ?',
        [after],
      );
      const routedOf = (type: LiveEventType, id: string, row: { caseId?: string; syncSeq: string; at: Date; inspectorId: string }): RoutedEvent => ({
        event: { type, id, caseId: row.caseId ?? id, at: new Date(row.at).toISOString() },
        inspectorId: row.inspectorId,
        syncSeq: Number(row.syncSeq),
      });
      return [
        ...escalations.map((row) => routedOf(`escalation.${row.status}` as LiveEventType, row.id, row)),
        ...cases.map((row) => routedOf('case.submitted', row.id, row)),
        ...decisions.map((row) => routedOf('case.decided', row.caseId, row)),
      ].sort((a, b) => a.syncSeq - b.syncSeq);
    });
    for (const item of routed) {
      if (this.lastSeq === null) return;
      this.lastSeq = Math.max(this.lastSeq, item.syncSeq);
      this.subject.next(item);
    }
  }
}
