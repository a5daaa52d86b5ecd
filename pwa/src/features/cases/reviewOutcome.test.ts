import { describe, expect, it } from 'vitest';
import type { DecisionRow } from '../../db/decisionsTable';
import { reviewOutcome } from './reviewOutcome';

const caseId = '6f0c0a3e-3d0b-4b8e-9a51-0a6c7f7b2f10';
const scanA = '8b4e2f1d-8a3c-4e55-9d1e-3c2b1a0f9e8d';
const scanB = 'c1d2e3f4-a5b6-4c7d-8e9f-0a1b2c3d4e5f';

const row = (revision: number, over: Partial<DecisionRow>): DecisionRow => ({
  id: `decision-${revision}`, caseId, scanId: null, kind: 'accept', compoundId: null, compoundName: null, reason: null, comment: null,
  revision, decidedBy: 'sup-1', decidedByName: 'Dana Reviewer', decidedAt: '2026-12-01T10:00:00.000Z', version: 1, ...over,
});

// A first submission: scan A accepted, scan B sent to the laboratory, then the case returned.
const firstRound = [
  row(1, { scanId: scanA, kind: 'accept', compoundName: 'Ethanol' }),
  row(2, { scanId: scanB, kind: 'needs_lab', comment: 'Send to the lab' }),
  row(3, { kind: 'return', comment: 'Photograph the seal' }),
];

describe("the inspector's view of a review", () => {
  it("takes each scan's highest revision and the latest decision about the whole case when there was no return", () => {
    const outcome = reviewOutcome(
      [row(1, { scanId: scanA }), row(2, { scanId: scanB, kind: 'needs_lab' }), row(3, { scanId: scanA, kind: 'replace', compoundName: 'Ammonia' }), row(4, { kind: 'sign_off' })],
      'accepted',
    );
    expect(outcome.byScan.get(scanA)?.revision).toBe(3);
    expect(outcome.byScan.get(scanB)?.kind).toBe('needs_lab');
    expect(outcome.earlierByScan.size).toBe(0);
    expect(outcome.caseDecision?.kind).toBe('sign_off');
  });

  it('keeps what was decided on the returned submission current while the case is back with the inspector', () => {
    for (const status of ['returned', 'open'] as const) {
      const outcome = reviewOutcome(firstRound, status);
      expect([...outcome.byScan.keys()].sort()).toEqual([scanA, scanB].sort());
      expect(outcome.earlierByScan.size).toBe(0);
      expect(outcome.caseDecision?.kind).toBe('return');
    }
  });

  it('shows the decisions made before the return as earlier once the case is submitted again', () => {
    const outcome = reviewOutcome(firstRound, 'submitted');
    expect(outcome.byScan.size).toBe(0);
    expect(outcome.earlierByScan.get(scanA)?.revision).toBe(1);
    expect(outcome.earlierByScan.get(scanB)?.revision).toBe(2);
  });

  it('takes a fresh decision on the resubmitted case as current and keeps the other scan earlier', () => {
    const outcome = reviewOutcome([...firstRound, row(4, { scanId: scanB, kind: 'accept', compoundName: 'Acetone' })], 'in_review');
    expect([...outcome.byScan.keys()]).toEqual([scanB]);
    expect(outcome.byScan.get(scanB)?.revision).toBe(4);
    expect([...outcome.earlierByScan.keys()]).toEqual([scanA]);
    expect(outcome.earlierByScan.get(scanA)?.revision).toBe(1);
  });

  it('keeps the newest earlier decision of a scan decided twice before the return', () => {
    const twice = [row(1, { scanId: scanA, kind: 'accept' }), row(2, { scanId: scanA, kind: 'replace', compoundName: 'Ammonia' }), row(3, { kind: 'return' })];
    expect(reviewOutcome(twice, 'submitted').earlierByScan.get(scanA)?.kind).toBe('replace');
  });
});
