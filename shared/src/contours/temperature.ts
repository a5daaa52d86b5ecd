import { PR_SEPARATION_CONSTANT } from './constants.js';

/** Classical P–R maximum separation in cm⁻¹ of a parallel band: 2.358·√(B·T) (Herzberg 1945, from memory). */
export function prSeparationCm1(bCm1: number, temperatureK: number): number {
  if (!(bCm1 > 0) || !(temperatureK > 0)) throw new RangeError('B and T must be positive');
  return PR_SEPARATION_CONSTANT * Math.sqrt(bCm1 * temperatureK);
}

/** Temperature in K whose P–R maximum separation would be Δν for rotational constant B: T = (Δν/2.358)²/B. */
export function temperatureFromPrSeparation(separationCm1: number, bCm1: number): number {
  if (!(separationCm1 > 0) || !(bCm1 > 0)) throw new RangeError('separation and B must be positive');
  return (separationCm1 / PR_SEPARATION_CONSTANT) ** 2 / bCm1;
}
