import { describe, expect, it } from 'vitest';
import { caseActions, currentDecisionOf, decisionHistory, earlierDecisionOf, handoversOf, rawScanInputOf, storedIdentifyResult } from './caseReview';
import type { BundleDecision, CaseBundle } from './types';

function decision(revision: number, scanId: string | null, kind: BundleDecision['kind'], earlier = false): BundleDecision {
  return {
    earlier,
    id: `d-${revision}`, caseId: 'c-1', scanId, kind, compoundId: null, compoundName: null, reason: null, comment: null, revision,
    decidedBy: 'u-s', decidedByName: 'Supervisor', decidedAt: `2026-11-0${revision}T10:00:00.000Z`,
  };
}

function bundle(status: CaseBundle['case']['status'], decisions: BundleDecision[], current: BundleDecision[]): CaseBundle {
  return {
    case: { id: 'c-1', version: 4, siteName: 'Dock 4', status, startedAt: '2026-11-01T08:00:00.000Z' },
    samples: [
      {
        id: 's-1',
        version: 1,
        label: 'A',
        handovers: [
          { id: 'h-2', version: 1, sampleId: 's-1', at: '2026-11-01T12:00:00.000Z' },
          { id: 'h-1', version: 1, sampleId: 's-1', at: '2026-11-01T09:00:00.000Z' },
        ],
      },
    ],
    scans: [
      { id: 'scan-1', version: 1, sampleId: 's-1' },
      { id: 'scan-2', version: 1, sampleId: 's-1' },
    ],
    notes: [],
    attachments: [],
    escalations: [],
    decisions,
    currentDecisions: Object.fromEntries(current.map((d) => [d.scanId, d])),
  };
}

describe('case review', () => {
  it('lets a submitted case be decided and returned, but signed off only once every scan has a decision', () => {
    const one = decision(1, 'scan-1', 'accept');
    const partly = caseActions(bundle('submitted', [one], [one]));
    expect(partly).toMatchObject({ decideScans: true, returnCase: true, signOff: false, reopen: false, undecidedScanIds: ['scan-2'] });
    const two = decision(2, 'scan-2', 'needs_lab');
    expect(caseActions(bundle('in_review', [one, two], [one, two])).signOff).toBe(true);
  });

  it('offers only reopening on an accepted case, and nothing while the case is with the inspector', () => {
    expect(caseActions(bundle('accepted', [], []))).toMatchObject({ decideScans: false, returnCase: false, signOff: false, reopen: true });
    for (const status of ['returned', 'open'] as const) {
      expect(caseActions(bundle(status, [], []))).toMatchObject({ decideScans: false, returnCase: false, signOff: false, reopen: false });
    }
  });

  it('keeps a scan decided only on an earlier submission undecided, and shows that earlier decision', () => {
    const before = decision(1, 'scan-1', 'accept', true);
    const returned = decision(2, null, 'return', true);
    const fresh = decision(3, 'scan-2', 'needs_lab');
    const b = bundle('in_review', [before, returned, fresh], [fresh]);
    expect(caseActions(b)).toMatchObject({ signOff: false, undecidedScanIds: ['scan-1'] });
    expect(earlierDecisionOf(b, 'scan-1')).toBe(before);
    expect(earlierDecisionOf(b, 'scan-2')).toBeNull();
  });

  it("reads the server's current decision per scan", () => {
    const latest = decision(3, 'scan-1', 'replace');
    const b = bundle('in_review', [], [latest]);
    expect(currentDecisionOf(b, 'scan-1')).toBe(latest);
    expect(currentDecisionOf(b, 'scan-2')).toBeNull();
  });

  it('lists the decision history newest first and the hand-overs of a sample in time order', () => {
    const b = bundle('in_review', [decision(1, 'scan-1', 'accept'), decision(3, null, 'return'), decision(2, 'scan-1', 'replace')], []);
    expect(decisionHistory(b).map((d) => d.revision)).toEqual([3, 2, 1]);
    expect(handoversOf(b.samples[0]).map((h) => h.id)).toEqual(['h-1', 'h-2']);
  });

  it('reads a raw scan with its ATR flag, and takes no stored result that lacks the fields the panel needs', () => {
    expect(rawScanInputOf({ id: 'x', version: 1, rawAttachmentId: 'a-1', technique: 'raman', phase: 'condensed', excitationNm: 785, result: {} })).toEqual({
      rawAttachmentId: 'a-1', technique: 'raman', phase: 'condensed', excitationNm: 785, atr: false, processing: null,
    });
    expect(rawScanInputOf({ id: 'x', version: 1, rawAttachmentId: 'a-2', technique: 'ir', phase: 'condensed', result: { processing: { atr: { enabled: true } } } })?.atr).toBe(true);
    expect(rawScanInputOf({ id: 'x', version: 1, rawAttachmentId: null })).toBeNull();
    expect(storedIdentifyResult({ candidates: [] })).toBeNull();
    expect(storedIdentifyResult(null)).toBeNull();
  });
});
