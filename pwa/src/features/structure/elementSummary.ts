/** A symmetry element kind found in the structure, with how many of it there are. */
export interface ElementTally {
  readonly label: string;
  readonly count: number;
}

/** Tallies symmetry elements by label, in the order the engine found them (`C3`, then `3 σv`). */
export function elementSummary(elements: readonly { readonly label: string }[]): ElementTally[] {
  const counts = new Map<string, number>();
  for (const e of elements) counts.set(e.label, (counts.get(e.label) ?? 0) + 1);
  return [...counts].map(([label, count]) => ({ label, count }));
}
