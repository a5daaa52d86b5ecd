/** Number formats of the identification screens, in the reader's language. */

/** A wavenumber or Raman shift in cm⁻¹: never grouped ("3060", not "3,060"), fixed decimals. */
export function formatCm1(value: number, language: string, decimals = 0): string {
  return new Intl.NumberFormat(language, { useGrouping: false, minimumFractionDigits: decimals, maximumFractionDigits: decimals }).format(value);
}

/** An offset in cm⁻¹ with its sign shown ("+0.4", "-1.2"); one that rounds to zero has none ("0.0"). */
export function formatOffsetCm1(value: number, language: string, decimals = 1): string {
  return new Intl.NumberFormat(language, {
    useGrouping: false,
    signDisplay: 'exceptZero',
    minimumFractionDigits: decimals,
    maximumFractionDigits: decimals,
  }).format(value);
}

/** A 0..1 fraction as a whole percentage ("46 %" in the reader's style). */
export function formatShare(fraction: number, language: string): string {
  return new Intl.NumberFormat(language, { style: 'percent', maximumFractionDigits: 0 }).format(fraction);
}

/** Band agreement, 0..1, with two decimals (it is a measure, not a percentage of certainty). */
export function formatAgreement(score: number, language: string): string {
  return new Intl.NumberFormat(language, { minimumFractionDigits: 2, maximumFractionDigits: 2 }).format(score);
}

/** A plain number such as a signal-to-noise ratio, at most one decimal. */
export function formatNumber(value: number, language: string, maximumFractionDigits = 1): string {
  return new Intl.NumberFormat(language, { maximumFractionDigits }).format(value);
}
