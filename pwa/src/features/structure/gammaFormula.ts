/** One species of Γvib with how often it occurs. */
export interface SpeciesCount {
  readonly display: string;
  readonly count: number;
}

/** Writes Γvib as chemists do, species in table order, counts of 1 omitted: `2A1 + 2E`. */
export function gammaFormula(modes: readonly SpeciesCount[]): string {
  const terms = modes.filter((m) => m.count > 0).map((m) => `${m.count === 1 ? '' : m.count}${m.display}`);
  return terms.length === 0 ? '0' : terms.join(' + ');
}
