/**
 * The one rule for analysing a parsed structure: detect the point group, symmetrise onto it, then
 * reduce Γvib on the exact positions. Used by checkStructure and by the compound library, so noisy
 * geometries that detection accepts never fail the tighter vibrational analysis.
 */
import { detectPointGroup, type PointGroupDetection } from '../symmetry/detect/index.js';
import { analyseVibrations, type VibrationalAnalysis } from '../symmetry/analyse.js';
import type { PlanarConvention, Structure } from '../symmetry/types.js';

export interface AnalyseStructureOptions {
  /** Å, default 0.1: how far an atom may sit from its symmetric position. */
  readonly tolerance?: number;
  /** Plane of a planar C2v or D2h molecule: `yz` (Mulliken 1955, default) or `xz`. */
  readonly convention?: PlanarConvention;
}

/** Detection and vibrational analysis of one structure. */
export interface AnalysedStructure {
  readonly detection: PointGroupDetection;
  readonly analysis: VibrationalAnalysis;
}

/** Detects, symmetrises and analyses a structure; throws RangeError/TypeError on bad input or a group that does not hold. */
export function analyseStructure(structure: Structure, options: AnalyseStructureOptions = {}): AnalysedStructure {
  const detection = detectPointGroup(structure, {
    ...(options.tolerance !== undefined ? { tolerance: options.tolerance } : {}),
    ...(options.convention !== undefined ? { convention: options.convention } : {}),
    // Exact positions let the vibrational analysis use its tight default tolerance on noisy input.
    symmetrise: true,
  });
  const analysis = analyseVibrations(detection.pointGroup, detection.oriented, {
    ...(structure.bonds ? { bonds: structure.bonds } : {}),
  });
  return { detection, analysis };
}
