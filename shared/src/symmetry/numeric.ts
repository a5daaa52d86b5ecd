/** Rounds values within 1e-9 of an integer to that integer (characters and counts carry float noise). */
export function cleanNumber(x: number): number {
  const r = Math.round(x);
  return Math.abs(x - r) < 1e-9 ? r + 0 : x;
}
