import { describe, expect, it } from 'vitest';
import { serverCheckOf } from './serverCheck';

describe('serverCheckOf', () => {
  it('is undefined until the server has recomputed the scan', () => {
    expect(serverCheckOf({ serverRecomputedAt: null, serverRecomputeError: null })).toBeUndefined();
  });

  it('keeps a cannot-reproduce answer with its reason', () => {
    const reason = "Cannot reproduce the tablet's processing: recorded processing: unknown setting resampling";
    expect(serverCheckOf({ serverRecomputedAt: '2026-12-02T01:00:00.000Z', serverRecomputeError: reason, resultMismatch: null, mismatch: null })).toEqual({
      resultMismatch: null,
      serverRecomputedAt: '2026-12-02T01:00:00.000Z',
      serverRecomputeError: reason,
      differences: [],
    });
  });

  it('names another compound library apart from the differences', () => {
    const check = serverCheckOf({
      serverRecomputedAt: '2026-12-02T01:00:00.000Z',
      serverRecomputeError: null,
      resultMismatch: false,
      mismatch: { differences: [], libraryVersion: { tablet: '1.0.0 (sha256:old)', server: '1.1.0 (sha256:new)' } },
    });
    expect(check).toMatchObject({ resultMismatch: false, differences: [], otherLibrary: { tablet: '1.0.0 (sha256:old)', server: '1.1.0 (sha256:new)' } });
    expect(serverCheckOf({ serverRecomputedAt: '2026-12-02T01:00:00.000Z', resultMismatch: false, mismatch: { differences: [], libraryVersion: null } })).not.toHaveProperty('otherLibrary');
  });
});
