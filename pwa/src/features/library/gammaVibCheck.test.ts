import { describe, expect, it } from 'vitest';
import { gammaVibProblems } from './gammaVibCheck';

// Γvib of a C3v pyramid such as ammonia: 2A1 + 2E, every species IR and Raman active.
const C3V = [
  { label: 'A1', count: 2, ir: true, raman: true },
  { label: 'E', count: 2, ir: true, raman: true },
];
// Γvib of a tetrahedral XY4: A1 + E + 2T2, only T2 IR active.
const TD = [
  { label: 'A1', count: 1, ir: false, raman: true },
  { label: 'E', count: 1, ir: false, raman: true },
  { label: 'T2', count: 2, ir: true, raman: true },
];

describe('gammaVibProblems', () => {
  it('accepts fundamentals that match Γvib species by species', () => {
    const listed = [
      { mode: 'ν1', label: 'A1', ir: 'm' as const },
      { mode: 'ν2', label: 'A1' },
      { mode: 'ν3', label: 'E' },
      { mode: 'ν4', label: 'E', raman: 'w' as const },
    ];
    expect(gammaVibProblems(listed, C3V)).toEqual([]);
  });

  it('reports a species listed too few or too many times', () => {
    const listed = [{ mode: 'ν1', label: 'A1' }, { mode: 'ν2', label: 'E' }, { mode: 'ν3', label: 'E' }, { mode: 'ν4', label: 'E' }];
    expect(gammaVibProblems(listed, C3V)).toEqual([
      { kind: 'count', label: 'A1', expected: 2, listed: 1 },
      { kind: 'count', label: 'E', expected: 2, listed: 3 },
    ]);
  });

  it('reports a label outside Γvib and an IR intensity for an IR-inactive species', () => {
    const listed = [
      { mode: 'ν1', label: 'A1', ir: 's' as const },
      { mode: 'ν2', label: 'E' },
      { mode: 'ν3', label: 'T2' },
      { mode: 'ν4', label: 'T1' },
    ];
    expect(gammaVibProblems(listed, TD)).toEqual([
      { kind: 'inactive', mode: 'ν1', label: 'A1', technique: 'ir' },
      { kind: 'unknown-label', mode: 'ν4', label: 'T1' },
      { kind: 'count', label: 'T2', expected: 2, listed: 1 },
    ]);
  });
});
