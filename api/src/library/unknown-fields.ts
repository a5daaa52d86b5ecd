/**
 * Paths of fields in a raw compound entry that its validated form does not carry — misspelt or unknown
 * fields, which the shared validation skips. A save refuses them rather than silently dropping what a
 * supervisor typed.
 */
export function unknownFields(raw: unknown, validated: unknown, path = 'compound'): string[] {
  if (Array.isArray(raw) && Array.isArray(validated)) {
    return raw.flatMap((item, i) => unknownFields(item, validated[i], `${path}[${i}]`));
  }
  if (!isObject(raw) || !isObject(validated)) return [];
  return Object.entries(raw).flatMap(([key, value]) => {
    if (key in validated) return unknownFields(value, validated[key], `${path}.${key}`);
    // Absent values and the default `matchable: true` carry nothing the validated entry lacks.
    if (value === undefined || (key === 'matchable' && value === true)) return [];
    return [`${path}.${key}`];
  });
}

function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}
