import { describe, expect, it } from 'vitest';
import { storedCandidates, storedVerdict } from './storedResult';

describe('reading a stored result', () => {
  it('lists the likely compounds in stored order and skips entries without a name or band agreement', () => {
    const result = { candidates: [{ id: 'a', name: 'Alpha', cas: '1-1-1', score: 0.8 }, { id: 'b', score: 0.5 }, { id: 'c', name: 'Gamma', cas: '2-2-2', score: 0.4 }] };
    expect(storedCandidates(result).map((c) => c.name)).toEqual(['Alpha', 'Gamma']);
    expect(storedCandidates({})).toEqual([]);
  });

  it('reads reliability, reasons, cautions and whether an escalation was required', () => {
    expect(storedVerdict({ reliable: false, reasons: ['low signal', 3], cautions: ['Presumptive only'], escalation: { required: true } })).toEqual({
      reliable: false, reasons: ['low signal'], cautions: ['Presumptive only'], escalationRequired: true,
    });
    expect(storedVerdict({}).escalationRequired).toBe(false);
  });
});
