/**
 * The library's analyser follows the structure check's composition: a geometry that detection
 * accepts only within its tolerance (misses of 0.05–0.1 Å) is symmetrised before Γvib, so it gets
 * the same answer as the clean geometry instead of failing the analysis' tighter tolerance.
 */
import { describe, expect, it } from 'vitest';
import { parseXyz } from '../structure/xyz.js';
import { detectPointGroup } from '../symmetry/detect/index.js';
import { DEFAULT_SYMMETRY_TOLERANCE } from '../symmetry/atom-mapping.js';
import { engineAnalyser } from './engine-analyser.js';
import { loadLibrary } from './load.js';

const library = loadLibrary();
const geometry = (id: string) => library.compounds.find((c) => c.id === id)!.geometry!.xyz;

/** Moves atom k by 0.04 Å along a direction that turns with k: synthetic noise, the same on every run. */
function jiggle(xyz: string): string {
  const [count, title, ...lines] = xyz.trim().split('\n');
  const moved = lines.map((line, k) => {
    const [element, ...coordinates] = line.trim().split(/\s+/);
    const a = 1.3 * k + 0.4;
    const d = [Math.cos(a), Math.sin(a), Math.cos(2 * a)];
    const n = Math.hypot(...d);
    return [element, ...coordinates.map((x, c) => (Number(x) + (0.04 * d[c]) / n).toFixed(6))].join(' ');
  });
  return [count, title, ...moved].join('\n') + '\n';
}

describe('engineAnalyser on noisy geometries', () => {
  for (const [id, group] of [['ammonia', 'C3v'], ['methane', 'Td'], ['benzene', 'D6h'], ['sulfur-hexafluoride', 'Oh']] as const) {
    it(`${id}: misses between the analysis and detection tolerances still give the clean ${group} answer`, () => {
      const noisy = jiggle(geometry(id));
      const detection = detectPointGroup(parseXyz(noisy));
      expect(detection.pointGroup).toBe(group);
      // The noise is large enough to fail an unsymmetrised analysis, small enough for detection.
      expect(detection.maxDeviation).toBeGreaterThan(DEFAULT_SYMMETRY_TOLERANCE);
      expect(detection.maxDeviation).toBeLessThanOrEqual(detection.tolerance);
      expect(engineAnalyser(noisy)).toEqual(engineAnalyser(geometry(id)));
    });
  }
});
