import { recomputeRequest } from './recompute-request';

describe('recomputeRequest', () => {
  const ir = { technique: 'ir' as const, phase: 'condensed' as const, excitationNm: null };

  it('takes the ATR flag and a hand-set match window from what the tablet recorded', () => {
    const result = { processing: { atr: { enabled: true, referenceCm1: 1000 } }, parameters: { toleranceCm1: 7, toleranceFrom: 'input' } };
    expect(recomputeRequest({ ...ir, result })).toEqual({
      request: { technique: 'ir', phase: 'condensed', atr: true, toleranceCm1: 7 },
      parametersFrom: 'tablet',
    });
  });

  it('leaves a match window from the phase default to the server, so it follows the same rule', () => {
    const result = { processing: { atr: { enabled: false } }, parameters: { toleranceCm1: 10, toleranceFrom: 'phase default' } };
    expect(recomputeRequest({ ...ir, result }).request).toEqual({ technique: 'ir', phase: 'condensed' });
  });

  it('passes a Raman scan’s laser line and never an ATR flag', () => {
    const result = { processing: { atr: { enabled: true } }, parameters: {} };
    expect(recomputeRequest({ technique: 'raman', phase: 'gas', excitationNm: 785, result }).request).toEqual({
      technique: 'raman',
      phase: 'gas',
      excitationNm: 785,
    });
  });

  it('uses the defaults, and says so, when the tablet recorded no processing', () => {
    expect(recomputeRequest({ ...ir, result: { parameters: {} } }).parametersFrom).toBe('defaults');
    expect(recomputeRequest({ ...ir, result: null })).toEqual({ request: { technique: 'ir', phase: 'condensed' }, parametersFrom: 'defaults' });
  });
});
