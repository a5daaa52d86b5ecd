import { Injectable, Logger, type BeforeApplicationShutdown, type OnApplicationBootstrap } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { Attachment } from '../attachments/attachment.entity';
import { ScanRecomputeService } from './scan-recompute.service';
import { Scan } from './scan.entity';

/**
 * How long the queue waits after the last push, pull or finished upload before the next identification: a
 * tablet's sync comes in bursts of requests, and each identification holds the process's one thread, so
 * the burst is answered first and the scans are recomputed once it is over.
 */
export const RECOMPUTE_QUIET_MS = 500;

/**
 * An in-process queue of scans to recompute, worked one at a time after the request that queued them
 * has been answered (a push or an upload never waits for an identification), and only once no push,
 * pull or upload has come in for `RECOMPUTE_QUIET_MS`. Nothing is lost on a restart: at start-up every scan
 * whose raw file is complete and that has no recomputation yet is queued again.
 */
@Injectable()
export class ScanRecomputeQueue implements OnApplicationBootstrap, BeforeApplicationShutdown {
  private readonly logger = new Logger('ScanRecompute');
  /** Scan ids waiting; a scan queued twice before its turn runs once. */
  private readonly waiting = new Set<string>();
  private working: Promise<void> | null = null;
  private stopped = false;
  /** Date.now() of the last push, pull or finished upload. */
  private lastSync = 0;

  constructor(
    private readonly dataSource: DataSource,
    private readonly recompute: ScanRecomputeService,
  ) {}

  /** A push, pull or upload came in: the next identification waits until the sync has been quiet for a while. */
  syncActivity(): void {
    this.lastSync = Date.now();
  }

  /** Queues scans for recomputation (none: a push changed no scan) and returns at once; a sync is going on. */
  enqueue(...scanIds: string[]): void {
    this.syncActivity();
    if (this.stopped) return;
    for (const id of scanIds) this.waiting.add(id);
    if (!this.working && this.waiting.size > 0) {
      // setImmediate: the answer of the request that queued the scans is written first.
      this.working = new Promise<void>((resolve) => setImmediate(resolve)).then(() => this.drain());
    }
  }

  /**
   * Queues the scan whose raw file this attachment is, if any (called when an upload completes). Never
   * throws: the upload is already stored, and a scan missed here is queued at the next start-up.
   */
  async enqueueRawFileOwner(attachment: Pick<Attachment, 'id' | 'kind' | 'ownerType' | 'ownerId'>): Promise<void> {
    // Any finished upload (a photo too) is part of a sync.
    this.syncActivity();
    if (attachment.kind !== 'raw-scan' || attachment.ownerType !== 'scan') return;
    try {
      const scan = await this.dataSource.getRepository(Scan).findOne({ select: { id: true }, where: { id: attachment.ownerId, rawAttachmentId: attachment.id } });
      if (scan) this.enqueue(scan.id);
    } catch (error) {
      this.logger.error(`Attachment ${attachment.id}: its scan was not queued: ${error instanceof Error ? error.message : String(error)}`);
    }
  }

  /** Queues every live scan with a complete raw file and no recomputation yet; returns how many. */
  async enqueuePending(): Promise<number> {
    const rows: { id: string }[] = await this.dataSource
      .getRepository(Scan)
      .createQueryBuilder('s')
      .select('s.id', 'id')
      .innerJoin(Attachment, 'a', 'a.id = s.rawAttachmentId AND a.ownerId = s.id')
      .where('s.deletedAt IS NULL AND s.serverRecomputedAt IS NULL')
      .andWhere('a.deletedAt IS NULL AND a.uploadedAt IS NOT NULL')
      .getRawMany();
    this.enqueue(...rows.map((row) => row.id));
    return rows.length;
  }

  /** Resolves once the queue is empty and nothing is running. */
  async idle(): Promise<void> {
    while (this.working) await this.working;
  }

  async onApplicationBootstrap(): Promise<void> {
    const queued = await this.enqueuePending();
    if (queued > 0) this.logger.log(`Queued ${queued} scan(s) whose recomputation was still pending`);
  }

  /** Lets the running recomputation finish before the database closes; the rest waits for the next start-up. */
  async beforeApplicationShutdown(): Promise<void> {
    this.stopped = true;
    this.waiting.clear();
    await this.idle();
  }

  /** Resolves once no push, pull or upload has come in for RECOMPUTE_QUIET_MS, or the queue stops. */
  private async quiet(): Promise<void> {
    for (let wait = this.lastSync + RECOMPUTE_QUIET_MS - Date.now(); wait > 0 && !this.stopped; wait = this.lastSync + RECOMPUTE_QUIET_MS - Date.now()) {
      await new Promise((resolve) => setTimeout(resolve, wait));
    }
  }

  private async drain(): Promise<void> {
    try {
      for (let next = first(this.waiting); next !== undefined && !this.stopped; next = first(this.waiting)) {
        await this.quiet();
        // Stopped meanwhile: the waiting scans were let go for the next start-up.
        if (this.stopped) break;
        this.waiting.delete(next);
        try {
          await this.recompute.run(next);
        } catch (error) {
          // Only database faults reach here; the scan stays pending for the next start-up.
          this.logger.error(`Scan ${next}: recomputation not stored: ${error instanceof Error ? error.message : String(error)}`);
        }
      }
    } finally {
      this.working = null;
    }
  }
}

function first(ids: Set<string>): string | undefined {
  return ids.values().next().value;
}
