import { describe, expect, it } from 'vitest';
import { checkStructure, geometryProblems, loadLibrary } from '@siteband/shared';
import { analyserFromCheck } from './workerAnalyser';

const library = loadLibrary();
const withGeometry = library.compounds.filter((c) => c.geometry && c.fundamentals);

describe('analyserFromCheck', () => {
  it('lets the shared Γvib check accept every bundled compound with a geometry, as the engine does', () => {
    for (const compound of withGeometry) {
      const check = checkStructure(compound.geometry!.xyz, { convention: compound.geometry!.planarConvention ?? 'yz' });
      expect(geometryProblems(compound, analyserFromCheck(check)), compound.id).toEqual([]);
    }
  });

  it('reports a fundamental relabelled to a species Γvib does not hold', () => {
    const compound = withGeometry.find((c) => c.fundamentals!.length >= 2)!;
    const check = checkStructure(compound.geometry!.xyz, { convention: compound.geometry!.planarConvention ?? 'yz' });
    const changed = { ...compound, fundamentals: compound.fundamentals!.map((f, i) => (i === 0 ? { ...f, label: 'Q9' } : f)) };
    const problems = geometryProblems(changed, analyserFromCheck(check));
    expect(problems.some((p) => p.includes('"Q9"'))).toBe(true);
    expect(problems.some((p) => p.includes(`Γvib of ${check.pointGroup} has`))).toBe(true);
  });
});
