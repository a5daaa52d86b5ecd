import { describe, expect, it } from 'vitest';
import { CASE_STATUSES } from './case-status.js';
import { decisionsInForce, type RevisedDecision } from './decisions-in-force.js';

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
    expect(isEarlier(on(4, 'b', 'accept'))).toBe(false);
    expect(decisionsInForce(firstRound, 'submitted').current.size).toBe(0);
  });

  it('counts from the latest answered return when there were several', () => {
    const twice = [...firstRound, on(4, 'a', 'accept'), on(5, null, 'return'), on(6, 'b', 'accept')];
    expect([...decisionsInForce(twice, 'submitted').current.keys()]).toEqual(['b']);
    expect([...decisionsInForce(twice.slice(0, 5), 'returned').current.keys()]).toEqual(['a']);
    expect(twice.map(decisionsInForce(twice, 'submitted').isEarlier)).toEqual([true, true, true, true, true, false]);
  });

  it('keeps the decisions of a signed-off and reopened case in force: only a return starts a new submission', () => {
    const signedOff = [on(1, 'a', 'accept'), on(2, null, 'sign_off'), on(3, null, 'reopen'), on(4, 'a', 'replace')];
    for (const status of ['accepted', 'in_review'] as const) {
      const { current, isEarlier } = decisionsInForce(signedOff, status);
      expect(current.get('a')?.revision).toBe(4);
      expect(signedOff.some(isEarlier)).toBe(false);
    }
  });

  it('never makes a decision on the whole case a current decision, and hands back the caller’s own rows', () => {
    const rows = [{ ...on(1, 'a', 'accept'), note: 'first' }, { ...on(2, null, 'sign_off'), note: 'case' }];
    const { current } = decisionsInForce(rows, 'accepted');
    expect([...current.keys()]).toEqual(['a']);
    expect(current.get('a')).toBe(rows[0]);
  });

  it('reads the same decisions the same way in every status when there was no return', () => {
    const rows = [on(1, 'a', 'accept'), on(2, 'b', 'needs_lab')];
    for (const status of CASE_STATUSES) expect([...decisionsInForce(rows, status).current.keys()]).toEqual(['a', 'b']);
  });
});
