import { identificationResultProblem } from './identification-result.validator';

describe('identificationResultProblem', () => {
  const base = { codeVersion: '1.0.0', parameters: {} };

  it('accepts a library version as a string or as the shared result’s version record', () => {
    expect(identificationResultProblem({ ...base, libraryVersion: 'demo-1' })).toBeNull();
    expect(identificationResultProblem({ ...base, libraryVersion: { version: '1.0.0', date: '2026-12-01', contentHash: 'sha256:abc' } })).toBeNull();
  });

  it('refuses an empty or shapeless library version', () => {
    for (const libraryVersion of ['', { version: '' }, { date: '2026-12-01' }, ['1.0.0'], null, undefined]) {
      expect(identificationResultProblem({ ...base, libraryVersion })).toMatch(/^needs libraryVersion/);
    }
  });
});
