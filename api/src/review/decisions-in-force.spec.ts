import { decisionsInForce, type RevisedDecision } from './decisions-in-force';

const on = (revision: number, scanId: string | null, kind: RevisedDecision['kind']): RevisedDecision => ({ revision, scanId, kind });

describe('decisionsInForce', () => {
  const firstRound = [on(1, 'a', 'accept'), on(2, 'b', 'needs_lab'), on(3, null, 'return')];

  it('takes the highest revision of each scan when the case was never returned', () => {
    const { current, isEarlier } = decisionsInForce([on(2, 'a', 'replace'), on(1, 'a', 'accept'), on(3, 'b', 'accept')], 'in_review');
    expect([...current].map(([scan, d]) => [scan, d.revision])).toEqual([['a', 2], ['b', 3]]);
    expect(isEarlier(on(1, 'a', 'accept'))).toBe(false);
  });

  it('keeps the returned submission in force while the case is with the inspector', () => {
    for (const status of ['returned', 'open'] as const) {
      const { current, isEarlier } = decisionsInForce(firstRound, status);
      expect([...current.keys()]).toEqual(['a', 'b']);
      expect(firstRound.map(isEarlier)).toEqual([false, false, false]);
    }
  });

  it('makes every decision up to the return earlier once the case is submitted again', () => {
    const { current, isEarlier } = decisionsInForce([...firstRound, on(4, 'b', 'accept')], 'in_review');
    expect([...current].map(([scan, d]) => [scan, d.revision])).toEqual([['b', 4]]);
    expect(firstRound.map(isEarlier)).toEqual([true, true, true]);
    expect(decisionsInForce(firstRound, 'submitted').current.size).toBe(0);
  });

  it('counts from the latest answered return when there were several', () => {
    const twice = [...firstRound, on(4, 'a', 'accept'), on(5, null, 'return'), on(6, 'b', 'accept')];
    expect([...decisionsInForce(twice, 'submitted').current.keys()]).toEqual(['b']);
    expect([...decisionsInForce(twice.slice(0, 5), 'returned').current.keys()]).toEqual(['a']);
  });
});
