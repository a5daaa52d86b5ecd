import { cautionCard, type Compound } from '@siteband/shared';

/** What the library list is narrowed to. */
export interface CompoundFilter {
  /** Matched against name, synonyms, CAS RN and formula, ignoring case. */
  readonly text?: string;
  readonly hazardousOnly?: boolean;
  readonly withGeometryOnly?: boolean;
  /** Only compounds with expected bands for this technique. */
  readonly technique?: 'ir' | 'raman';
}

function fold(value: string): string {
  return value.normalize('NFKD').toLowerCase().replace(/\s+/g, ' ').trim();
}

/** True when the compound lists bands or active fundamentals for the technique. */
export function hasBandsFor(compound: Compound, technique: 'ir' | 'raman'): boolean {
  return (
    (compound.bands ?? []).some((b) => b.technique === technique) ||
    (compound.fundamentals ?? []).some((f) => (technique === 'ir' ? f.ir : f.raman) !== undefined)
  );
}

/** The compounds that pass the filter, sorted by name in the reader's language. */
export function searchCompounds(compounds: readonly Compound[], filter: CompoundFilter, language = 'en'): Compound[] {
  const text = fold(filter.text ?? '');
  return compounds
    .filter((c) => {
      if (text && ![c.name, ...c.synonyms, c.cas, c.formula].some((field) => fold(field).includes(text))) return false;
      // The caution card decides what counts as hazardous, so the list and the card never disagree.
      if (filter.hazardousOnly && !cautionCard(c).hazardous) return false;
      if (filter.withGeometryOnly && c.geometry === undefined) return false;
      if (filter.technique && !hasBandsFor(c, filter.technique)) return false;
      return true;
    })
    .sort((a, b) => a.name.localeCompare(b.name, language));
}
