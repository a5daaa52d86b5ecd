import type { StructureCheck, SymmetryAnalyser } from '@siteband/shared';

/**
 * A SymmetryAnalyser that answers with a structure check already computed in the worker, so the
 * shared Γvib check (geometryProblems, the one the server runs on save) never blocks the page.
 */
export function analyserFromCheck(check: StructureCheck): SymmetryAnalyser {
  const answer = {
    pointGroup: check.pointGroup,
    species: check.vibrations.modes.map((m) => ({ label: m.label, count: m.count, ir: m.ir, raman: m.raman })),
  };
  return () => answer;
}
