/** The written shape of a CAS Registry Number: 2–7 digits, 2 digits, the check digit. */
export const CAS_PATTERN = /^(\d{2,7})-(\d{2})-(\d)$/;

/**
 * CAS Registry Number check: the last digit equals the sum of the other digits, each multiplied
 * by its position counted from the right (1, 2, 3…), modulo 10 (CAS's published rule, from memory).
 */
export function isValidCas(cas: string): boolean {
  const match = CAS_PATTERN.exec(cas);
  if (match === null) return false;
  const body = match[1] + match[2];
  let sum = 0;
  for (let i = 0; i < body.length; i++) sum += Number(body[body.length - 1 - i]) * (i + 1);
  return sum % 10 === Number(match[3]);
}
