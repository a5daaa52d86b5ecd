import type { DataSource } from 'typeorm';
import { RECOMPUTE_QUIET_MS, ScanRecomputeQueue } from './scan-recompute.queue';
import type { ScanRecomputeService } from './scan-recompute.service';

describe('ScanRecomputeQueue', () => {
  beforeEach(() => jest.useFakeTimers());
  afterEach(() => jest.useRealTimers());

  /** A queue whose recomputation only records which scan ran (the identification itself is covered end to end). */
  function queue() {
    const ran: string[] = [];
    const recompute = { run: async (id: string) => void ran.push(id) } as unknown as ScanRecomputeService;
    return { queue: new ScanRecomputeQueue({} as DataSource, recompute), ran };
  }

  it('recomputes only once pushes, pulls and uploads have stopped for the quiet time, each queued scan once', async () => {
    const { queue: q, ran } = queue();
    q.enqueue('scan-1', 'scan-2');
    await jest.advanceTimersByTimeAsync(RECOMPUTE_QUIET_MS - 100);
    expect(ran).toEqual([]);
    // The sync goes on: a photo upload finishes, a push queues scan-1 again, a pull reads a page.
    await q.enqueueRawFileOwner({ id: 'photo-1', kind: 'photo', ownerType: 'scan', ownerId: 'scan-1' });
    await jest.advanceTimersByTimeAsync(RECOMPUTE_QUIET_MS - 100);
    q.enqueue('scan-1');
    await jest.advanceTimersByTimeAsync(RECOMPUTE_QUIET_MS - 100);
    q.syncActivity();
    await jest.advanceTimersByTimeAsync(RECOMPUTE_QUIET_MS - 100);
    expect(ran).toEqual([]);
    await jest.advanceTimersByTimeAsync(200);
    expect(ran).toEqual(['scan-1', 'scan-2']);
    await q.idle();
  });

  it('lets waiting scans go when the application stops during the quiet time', async () => {
    const { queue: q, ran } = queue();
    q.enqueue('scan-1');
    await jest.advanceTimersByTimeAsync(10);
    const stopping = q.beforeApplicationShutdown();
    await jest.advanceTimersByTimeAsync(RECOMPUTE_QUIET_MS);
    await stopping;
    expect(ran).toEqual([]);
  });
});
