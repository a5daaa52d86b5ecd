/** Checks on identifyScan's input and the choice of the match tolerance. */
import { DEFAULT_TOLERANCE_CONDENSED_CM1, DEFAULT_TOLERANCE_GAS_CM1 } from './constants.js';
import type { IdentifyInput, IdentifyParameters } from './types.js';

/** Largest match window accepted, ±cm⁻¹: wider would let almost any band match. */
export const MAX_TOLERANCE_CM1 = 50;

/** Throw a TypeError/RangeError naming the first fault of the input; nothing is changed. */
export function validateIdentifyInput(input: IdentifyInput): void {
  if (typeof input !== 'object' || input === null) throw new TypeError('identifyScan needs an input object');
  if (input.technique !== 'ir' && input.technique !== 'raman') throw new RangeError(`technique must be "ir" or "raman", got ${JSON.stringify(input.technique)}`);
  if (input.phase !== 'condensed' && input.phase !== 'gas') throw new RangeError(`phase must be "condensed" or "gas", got ${JSON.stringify(input.phase)}`);
  if (!Array.isArray(input.peaks)) throw new TypeError('peaks must be a list of { x, height, widthCm1, relativeHeight }');
  input.peaks.forEach((p, i) => {
    if (typeof p !== 'object' || p === null) throw new TypeError(`peaks[${i}] must be an object`);
    if (typeof p.x !== 'number' || !Number.isFinite(p.x) || p.x <= 0) throw new RangeError(`peaks[${i}].x must be a positive wavenumber in cm⁻¹, got ${String(p.x)}`);
    if (typeof p.height !== 'number' || !Number.isFinite(p.height) || p.height < 0) throw new RangeError(`peaks[${i}].height must be a finite number ≥ 0, got ${String(p.height)}`);
  });
  for (const key of ['toleranceCm1', 'resolutionCm1'] as const) {
    const v = input[key];
    if (v !== undefined && (typeof v !== 'number' || !(v > 0) || v > MAX_TOLERANCE_CM1)) {
      throw new RangeError(`${key} must be a number in (0, ${MAX_TOLERANCE_CM1}] cm⁻¹, got ${String(v)}`);
    }
  }
  if (input.quality !== undefined && typeof input.quality.reliable !== 'boolean') throw new TypeError('quality.reliable must be true or false');
  const s = input.spectrum;
  if (s !== undefined && (s === null || typeof s !== 'object' || s.xCm1?.length === undefined || s.xCm1.length !== s.y?.length)) {
    throw new TypeError('spectrum must hold xCm1 and y of the same length');
  }
}

/** The match tolerance: the caller's, else the phase default, widened to the resolution if coarser. */
export function resolveTolerance(input: IdentifyInput): Pick<IdentifyParameters, 'toleranceCm1' | 'toleranceFrom'> {
  if (input.toleranceCm1 !== undefined) return { toleranceCm1: input.toleranceCm1, toleranceFrom: 'input' };
  const byPhase = input.phase === 'gas' ? DEFAULT_TOLERANCE_GAS_CM1 : DEFAULT_TOLERANCE_CONDENSED_CM1;
  if (input.resolutionCm1 !== undefined && input.resolutionCm1 > byPhase) return { toleranceCm1: input.resolutionCm1, toleranceFrom: 'resolution' };
  return { toleranceCm1: byPhase, toleranceFrom: 'phase default' };
}
