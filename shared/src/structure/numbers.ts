const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eEdD][+-]?\d+)?$/;

/** A coordinate field as a finite number, or a description of why it is not one. */
export function parseCoordinate(field: string): number | string {
  if (/^[+-]?(nan|inf|infinity)$/i.test(field)) return `"${field}" is not a finite number`;
  // Fortran programs write exponents with D (1.0D-03).
  if (!DECIMAL.test(field)) return `"${field}" is not a number`;
  const value = Number(field.replace(/[dD]/, 'e'));
  return Number.isFinite(value) ? value : `"${field}" is not a finite number`;
}
