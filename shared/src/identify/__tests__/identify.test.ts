/** identifyScan on hand-made peak lists: evidence against, reliability gate, cautions, input checks. */
import { describe, expect, it } from 'vitest';
import { GENERAL_CAUTIONS, NO_RELIABLE_RESULT_CAUTION, RAMAN_LASER_CAUTION } from '../../hazards/general-cautions.js';
import { loadLibrary } from '../../library/load.js';
import type { Peak } from '../../spectrum/types.js';
import { DEFAULT_TOLERANCE_CONDENSED_CM1, DEFAULT_TOLERANCE_GAS_CM1 } from '../constants.js';
import { identifyScan } from '../identify-scan.js';

const peaks = (...list: [number, number][]): Peak[] => list.map(([x, height]) => ({ x, height, widthCm1: 8, relativeHeight: height }));
const candidate = (r: ReturnType<typeof identifyScan>, id: string) => r.candidates.find((c) => c.id === id);
const candidateOf = candidate;

describe('evidence against from the selection rules', () => {
  it('a Raman scan of CO2 with a band at the IR-only ν3 position lists it against CO2', () => {
    // CO2 Raman Fermi dyad 1285.41/1388.18 (Álvarez et al. 2024); ν3 2349 is Σu+ (Shimanouchi 1972), IR-only.
    const r = identifyScan({ technique: 'raman', phase: 'gas', peaks: peaks([1285.5, 0.6], [1388, 1], [2349, 0.8]) });
    const co2 = candidate(r, 'carbon-dioxide')!;
    expect(co2.against.map((a) => [a.x, a.forbiddenCm1, a.label])).toEqual([[2349, 2349, 'Σu+']]);
    expect(co2.parts.againstShare).toBeGreaterThan(0);
  });

  it('a Raman scan of liquid benzene with a strong peak at the IR-only 675 (A2u) lists it against benzene', () => {
    // Liquid benzene Raman 992 (vs), 3062, 1178, 606 (project check values §2.2); ν11 A2u 673 IR-only.
    const clean = identifyScan({ technique: 'raman', phase: 'condensed', peaks: peaks([992, 1], [3062, 0.5], [1178, 0.3], [606, 0.3], [3047, 0.3]) });
    const dirty = identifyScan({ technique: 'raman', phase: 'condensed', peaks: peaks([992, 1], [3062, 0.5], [1178, 0.3], [606, 0.3], [3047, 0.3], [675, 0.6]) });
    expect(candidate(clean, 'benzene')!.against).toEqual([]);
    expect(candidate(dirty, 'benzene')!.against.map((a) => a.label)).toEqual(['A2u']);
    expect(candidate(dirty, 'benzene')!.score).toBeLessThan(candidate(clean, 'benzene')!.score);
  });

  it('gives explained peaks with the mode’s symmetry label and missing strong bands', () => {
    // SO2 gas IR: ν3 1362 (B2, strongest), ν1 1151 (A1), ν2 518 (A1) — NIST CCCBDB, read.
    const r = identifyScan({ technique: 'ir', phase: 'gas', peaks: peaks([1362, 1], [1151, 0.3]) });
    const so2 = r.candidates[0]!;
    expect(so2.id).toBe('sulfur-dioxide');
    expect(so2.explained.map((e) => [e.expectedCm1, e.label, e.mode])).toEqual([[1151, 'A1', 'ν1'], [1362, 'B2', 'ν3']]);
    expect(so2.missing.map((m) => m.expectedCm1)).toEqual([518]);
  });
});

describe('reliability, cautions and escalation', () => {
  it('a scan the pipeline calls unreliable gives no ranking, the reasons and the general cautions', () => {
    const r = identifyScan({ technique: 'raman', phase: 'condensed', peaks: peaks([1003, 1]), quality: { reliable: false, reasons: ['signal-to-noise 3 < 10'] } });
    expect(r.reliable).toBe(false);
    expect(r.candidates).toEqual([]);
    expect(r.mixture).toBeNull();
    expect(r.reasons).toEqual(['signal-to-noise 3 < 10']);
    expect(r.cautions).toEqual([...GENERAL_CAUTIONS, RAMAN_LASER_CAUTION, NO_RELIABLE_RESULT_CAUTION]);
  });

  it('no peaks at all is no reliable result, not "nothing found"', () => {
    const r = identifyScan({ technique: 'ir', phase: 'condensed', peaks: [] });
    expect(r.reliable).toBe(false);
    expect(r.reasons).toContain('no peaks were picked from the scan');
  });

  it('always carries the general cautions; the laser caution only on Raman', () => {
    const ir = identifyScan({ technique: 'ir', phase: 'condensed', peaks: peaks([1715, 1], [1363, 0.6], [1220, 0.6]) });
    const raman = identifyScan({ technique: 'raman', phase: 'condensed', peaks: peaks([787, 1], [2925, 0.6]) });
    for (const c of GENERAL_CAUTIONS) {
      expect(ir.cautions).toContain(c);
      expect(raman.cautions).toContain(c);
    }
    expect(ir.cautions).not.toContain(RAMAN_LASER_CAUTION);
    expect(raman.cautions).toContain(RAMAN_LASER_CAUTION);
  });

  it('shows a plausible hazardous candidate that is not first with its caution card, and escalates it', () => {
    // Sodium bicarbonate Raman 1046 (vs), 1269, 686 (Nakamoto 2009, from memory); ammonium nitrate ν1 1043.
    const r = identifyScan({ technique: 'raman', phase: 'condensed', peaks: peaks([1046, 1], [1269, 0.3], [686, 0.3]) });
    expect(r.candidates[0]!.id).toBe('sodium-bicarbonate');
    const an = candidate(r, 'ammonium-nitrate')!;
    expect(an.hazards[0]!.hazardous).toBe(true);
    expect(an.hazards[0]!.cautions.length).toBeGreaterThan(0);
    expect(r.escalation.triggers.some((t) => t.compoundId === 'ammonium-nitrate')).toBe(true);
    expect(r.cautions.some((c) => c.includes('Ammonium nitrate'))).toBe(true);
  });

  it('records the library version and the parameters used', () => {
    const r = identifyScan({ technique: 'ir', phase: 'gas', peaks: peaks([2143, 1]) });
    expect(r.libraryVersion).toEqual(loadLibrary().version);
    expect(r.parameters.toleranceCm1).toBe(DEFAULT_TOLERANCE_GAS_CM1);
    expect(r.parameters.libraryCompounds).toBe(loadLibrary().compounds.length);
    expect(r.candidates[0]!.id).toBe('carbon-monoxide');
  });
});

describe('gas cells', () => {
  it('reads an unresolved CO band from its P and R maxima', () => {
    // CO band origin 2143.27 (NIST SP 821); Δν(P–R) = 2.358·√(B·T) = 56.25 cm⁻¹ at 296 K (project check values §4.2, computed).
    const r = identifyScan({ technique: 'ir', phase: 'gas', peaks: peaks([2143.27 - 28.1, 1], [2143.27 + 28.1, 0.9]) });
    expect(r.candidates[0]!.id).toBe('carbon-monoxide');
    expect(r.candidates[0]!.explained.map((e) => e.assignment)).toEqual([
      expect.stringContaining('P branch'),
      expect.stringContaining('R branch'),
    ]);
  });
  it('does not pair peaks in a condensed-phase scan', () => {
    const r = identifyScan({ technique: 'ir', phase: 'condensed', peaks: peaks([2143.27 - 28.1, 1], [2143.27 + 28.1, 0.9]) });
    expect(candidateOf(r, 'carbon-monoxide')).toBeUndefined();
  });
});

describe('tolerance', () => {
  const input = { technique: 'ir' as const, phase: 'condensed' as const, peaks: peaks([1715, 1]) };
  it('defaults by phase, widens to a coarser resolution, and obeys the caller', () => {
    expect(identifyScan(input).parameters).toMatchObject({ toleranceCm1: DEFAULT_TOLERANCE_CONDENSED_CM1, toleranceFrom: 'phase default' });
    expect(identifyScan({ ...input, resolutionCm1: 16 }).parameters).toMatchObject({ toleranceCm1: 16, toleranceFrom: 'resolution' });
    expect(identifyScan({ ...input, toleranceCm1: 4 }).parameters).toMatchObject({ toleranceCm1: 4, toleranceFrom: 'input' });
  });
  it('a band just outside the window is not matched', () => {
    // CO band origin 2143 (Huber & Herzberg 1979); ±6 in a gas cell.
    const near = identifyScan({ technique: 'ir', phase: 'gas', peaks: peaks([2148, 1]) });
    const far = identifyScan({ technique: 'ir', phase: 'gas', peaks: peaks([2150, 1]) });
    expect(candidate(near, 'carbon-monoxide')).toBeDefined();
    expect(candidate(far, 'carbon-monoxide')).toBeUndefined();
  });
});

describe('bad input gets a clear error', () => {
  const ok = { technique: 'ir' as const, phase: 'condensed' as const, peaks: peaks([1000, 1]) };
  it('names the fault', () => {
    expect(() => identifyScan({ ...ok, technique: 'uv' as never })).toThrow(/technique must be "ir" or "raman"/);
    expect(() => identifyScan({ ...ok, phase: 'liquid' as never })).toThrow(/phase must be "condensed" or "gas"/);
    expect(() => identifyScan({ ...ok, peaks: peaks([Number.NaN, 1]) })).toThrow(/peaks\[0\]\.x must be a positive wavenumber/);
    expect(() => identifyScan({ ...ok, peaks: peaks([1000, -1]) })).toThrow(/peaks\[0\]\.height must be a finite number ≥ 0/);
    expect(() => identifyScan({ ...ok, toleranceCm1: 0 })).toThrow(/toleranceCm1 must be a number in \(0, 50\]/);
    expect(() => identifyScan({ ...ok, spectrum: { xCm1: new Float64Array(3), y: new Float64Array(2), ordinate: 'absorbance' } })).toThrow(/spectrum must hold xCm1 and y of the same length/);
  });
  it('leaves the input untouched', () => {
    const input = { ...ok, peaks: peaks([1715, 0.5], [1363, 1]) };
    const before = JSON.stringify(input);
    identifyScan(input);
    expect(JSON.stringify(input)).toBe(before);
  });
});
