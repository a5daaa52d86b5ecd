import { scanFinding } from './scan-finding';

describe('scanFinding', () => {
  const candidate = (id: string, signalWord: string | null) => ({ id, name: `Name of ${id}`, hazards: [{ signalWord }] });

  it('takes the first likely compound and its signal word', () => {
    const result = { candidates: [candidate('acetone', 'Danger'), candidate('water', null)], escalation: { required: false } };
    expect(scanFinding(result)).toEqual({ likelyCompoundId: 'acetone', likelyCompoundName: 'Name of acetone', hazardRank: 2 });
    expect(scanFinding({ candidates: [candidate('x', 'Warning')] }).hazardRank).toBe(1);
    expect(scanFinding({ candidates: [candidate('x', null)] }).hazardRank).toBe(0);
  });

  it('ranks an escalating scan 3', () => {
    expect(scanFinding({ candidates: [candidate('phosgene', 'Danger')], escalation: { required: true } }).hazardRank).toBe(3);
  });

  it('gives nothing for a result without a ranking or a malformed one', () => {
    const none = { likelyCompoundId: null, likelyCompoundName: null, hazardRank: 0 };
    expect(scanFinding(null)).toEqual(none);
    expect(scanFinding({ reliable: false, candidates: [] })).toEqual(none);
    expect(scanFinding({ candidates: [{ id: 42, hazards: 'Danger' }] })).toEqual(none);
    expect(scanFinding({ candidates: 'acetone' })).toEqual(none);
  });
});
