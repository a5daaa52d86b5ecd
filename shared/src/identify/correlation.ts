/**
 * Full-spectrum correlation against a library reference spectrum: Pearson's r between the
 * processed scan and the reference interpolated linearly onto the scan's axis, over their overlap.
 */
import type { ReferenceSpectrum } from '../library/types.js';
import type { Phase, Spectrum, Technique } from '../spectrum/types.js';
import { lowerBound } from './scoring.js';

/** Fewest overlapping scan points for a correlation to mean anything. */
export const MIN_CORRELATION_POINTS = 20;

/** The reference of a compound that fits the scan's technique and phase, if the library holds one. */
export function referenceFor(references: readonly ReferenceSpectrum[] | undefined, technique: Technique, phase: Phase): ReferenceSpectrum | undefined {
  return references?.find((r) => r.technique === technique && (phase === 'gas' ? r.phase === 'gas' : r.phase !== 'gas'));
}

/** Pearson's r of scan and reference over their overlap, or null when they overlap too little. */
export function spectrumCorrelation(scan: Spectrum, reference: ReferenceSpectrum): number | null {
  const rx = reference.xCm1;
  const lo = rx[0]!;
  const hi = rx[rx.length - 1]!;
  const a: number[] = [];
  const b: number[] = [];
  for (let i = lowerBound(scan.xCm1, lo); i < scan.xCm1.length && scan.xCm1[i]! <= hi; i++) {
    const x = scan.xCm1[i]!;
    const k = Math.min(Math.max(lowerBound(rx, x), 1), rx.length - 1);
    const t = (x - rx[k - 1]!) / (rx[k]! - rx[k - 1]!);
    a.push(scan.y[i]!);
    b.push(reference.y[k - 1]! + t * (reference.y[k]! - reference.y[k - 1]!));
  }
  if (a.length < MIN_CORRELATION_POINTS) return null;
  const mean = (v: number[]) => v.reduce((s, x) => s + x, 0) / v.length;
  const ma = mean(a);
  const mb = mean(b);
  let sab = 0;
  let saa = 0;
  let sbb = 0;
  for (let i = 0; i < a.length; i++) {
    sab += (a[i]! - ma) * (b[i]! - mb);
    saa += (a[i]! - ma) ** 2;
    sbb += (b[i]! - mb) ** 2;
  }
  return saa > 0 && sbb > 0 ? sab / Math.sqrt(saa * sbb) : null;
}
