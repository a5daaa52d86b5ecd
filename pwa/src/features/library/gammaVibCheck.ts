import type { Fundamental } from '@siteband/shared';

/** One species of Γvib with its activity, as the structure check reports it. */
export interface SpeciesOfGammaVib {
  readonly label: string;
  readonly count: number;
  readonly ir: boolean;
  readonly raman: boolean;
}

/** A disagreement between the listed fundamentals and Γvib, for the editor to show. */
export type GammaVibProblem =
  | { readonly kind: 'unknown-label'; readonly mode: string; readonly label: string }
  | { readonly kind: 'count'; readonly label: string; readonly expected: number; readonly listed: number }
  | { readonly kind: 'inactive'; readonly mode: string; readonly label: string; readonly technique: 'ir' | 'raman' };

/**
 * Compares a compound's fundamentals with the engine's Γvib before a save: every species as often as
 * Γvib has it, and no intensity for a technique the species is inactive in. The server checks the
 * same on save; this lets the supervisor see it while typing, offline too.
 */
export function gammaVibProblems(fundamentals: readonly Pick<Fundamental, 'mode' | 'label' | 'ir' | 'raman'>[], species: readonly SpeciesOfGammaVib[]): GammaVibProblem[] {
  const byLabel = new Map(species.map((s) => [s.label, s]));
  const listed = new Map<string, number>();
  const problems: GammaVibProblem[] = [];
  for (const f of fundamentals) {
    const s = byLabel.get(f.label);
    if (!s) {
      problems.push({ kind: 'unknown-label', mode: f.mode, label: f.label });
      continue;
    }
    listed.set(f.label, (listed.get(f.label) ?? 0) + 1);
    if (f.ir !== undefined && !s.ir) problems.push({ kind: 'inactive', mode: f.mode, label: f.label, technique: 'ir' });
    if (f.raman !== undefined && !s.raman) problems.push({ kind: 'inactive', mode: f.mode, label: f.label, technique: 'raman' });
  }
  for (const s of species) {
    const n = listed.get(s.label) ?? 0;
    if (n !== s.count) problems.push({ kind: 'count', label: s.label, expected: s.count, listed: n });
  }
  return problems;
}
