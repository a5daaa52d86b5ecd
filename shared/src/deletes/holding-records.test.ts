import { describe, expect, it } from 'vitest';
import { deleteRefusal, findDeleteBlock, HOLDING_KINDS, HOLDING_RECORDS } from './holding-records.js';

describe('what holds a record from being deleted', () => {
  it('finds nothing when every holding kind counts none, asking about each kind once', async () => {
    const asked: string[] = [];
    const block = await findDeleteBlock('sample', async (kind) => {
      asked.push(kind);
      return 0;
    });
    expect(block).toBeNull();
    expect(asked).toEqual(['handover', 'scan', 'siteNote', 'photo']);
  });

  it('lists the kinds found, in order, and which of them are permanent', async () => {
    const counts: Record<string, number> = { handover: 1, scan: 2, siteNote: 0, photo: 3 };
    const block = await findDeleteBlock('sample', async (kind) => counts[kind]);
    expect(block).toEqual({
      held: [
        { kind: 'handover', count: 1 },
        { kind: 'scan', count: 2 },
        { kind: 'photo', count: 3 },
      ],
      permanent: ['handover'],
    });
    expect(deleteRefusal('Sample S-1', block!)).toBe('Sample S-1 cannot be deleted while it holds hand-overs: 1, scans: 2, photos: 3: delete those first (permanent records are never deleted)');
  });

  it('leaves a case held only by records that can go without a permanent one', async () => {
    const block = await findDeleteBlock('case', async (kind) => (kind === 'sample' || kind === 'siteNote' ? 1 : 0));
    expect(block?.permanent).toEqual([]);
    expect(block?.held.map((h) => h.kind)).toEqual(['sample', 'siteNote']);
  });

  it('never lets a scan be held by its own raw file, which stays when the scan goes', () => {
    expect(HOLDING_RECORDS.scan).not.toContain('rawScanFile');
    expect(HOLDING_KINDS.rawScanFile.permanent).toBe(true);
    expect(HOLDING_RECORDS.case).toContain('rawScanFile');
  });

  it('refuses a count that is not a whole number of at least 0', async () => {
    await expect(findDeleteBlock('scan', async () => -1)).rejects.toThrow('A count of escalation must be a whole number of at least 0, not -1');
    await expect(findDeleteBlock('scan', async () => Number.NaN)).rejects.toThrow(RangeError);
  });
});
