/** A typed number, or the text itself so validation names the field that is not a number. */
export function numberOrText(value: string): number | string {
  const n = Number(value.trim());
  return value.trim() !== '' && Number.isFinite(n) ? n : value;
}

/** A number as the form shows it: empty for none. */
export function textOf(value: number | undefined): string {
  return value === undefined ? '' : String(value);
}
