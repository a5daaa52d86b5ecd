/** Formats a number in the reader's language with at most `digits` decimals. */
export function formatNumber(value: number, language: string, digits = 0): string {
  return new Intl.NumberFormat(language, { maximumFractionDigits: digits }).format(value);
}
