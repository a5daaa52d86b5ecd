/** Formats an epoch-milliseconds instant as a date and time in the reader's language. */
export function formatDateTime(epochMs: number, language: string): string {
  return new Intl.DateTimeFormat(language, { dateStyle: 'medium', timeStyle: 'short' }).format(epochMs);
}

/** Formats a number of hours with its unit spelled out ("72 hours"). */
export function formatHours(hours: number, language: string): string {
  return new Intl.NumberFormat(language, { style: 'unit', unit: 'hour', unitDisplay: 'long', maximumFractionDigits: 1 }).format(hours);
}

/** The name of a language in that same language ("English"). */
export function languageName(language: string): string {
  return new Intl.DisplayNames([language], { type: 'language' }).of(language) ?? language;
}
