import { SignInAttemptStore } from './sign-in-attempt.store';

describe('SignInAttemptStore', () => {
  afterEach(() => jest.useRealTimers());

  it('blocks the attempt after the limit, for the block duration, then counts afresh', async () => {
    jest.useFakeTimers({ now: 1_000_000 });
    const store = new SignInAttemptStore();
    for (let attempt = 1; attempt <= 5; attempt++) {
      const record = await store.increment('k', 60_000, 5, 60_000);
      expect(record).toMatchObject({ totalHits: attempt, isBlocked: false });
    }
    const sixth = await store.increment('k', 60_000, 5, 60_000);
    expect(sixth.isBlocked).toBe(true);
    expect(sixth.timeToBlockExpire).toBe(60);

    jest.setSystemTime(1_000_000 + 30_000);
    expect((await store.increment('k', 60_000, 5, 60_000)).isBlocked).toBe(true);

    jest.setSystemTime(1_000_000 + 61_000);
    expect(await store.increment('k', 60_000, 5, 60_000)).toMatchObject({ isBlocked: false, totalHits: 1 });
  });

  it('forgets a key on reset (a successful sign-in)', async () => {
    const store = new SignInAttemptStore();
    for (let attempt = 0; attempt < 5; attempt++) await store.increment('k', 60_000, 5, 60_000);
    store.reset('k');
    expect(await store.increment('k', 60_000, 5, 60_000)).toMatchObject({ totalHits: 1, isBlocked: false });
  });

  it('keeps keys apart', async () => {
    const store = new SignInAttemptStore();
    for (let attempt = 0; attempt < 6; attempt++) await store.increment('a', 60_000, 5, 60_000);
    expect((await store.increment('b', 60_000, 5, 60_000)).isBlocked).toBe(false);
  });
});
