/**
 * A compound id from its name: lower case, accents dropped, every other run of characters a
 * hyphen (the library's id rule is a lower-case slug). Greek letters and the like fall away.
 */
export function slugOf(name: string): string {
  return name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
}
