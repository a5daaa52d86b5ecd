import { describe, expect, it } from 'vitest';
import { cautionCard, loadLibrary } from '@siteband/shared';
import { hasBandsFor, searchCompounds } from './searchCompounds';

const { compounds } = loadLibrary();

describe('searchCompounds', () => {
  it('finds a compound by name, synonym, CAS RN or formula, ignoring case', () => {
    const chlorine = compounds.find((c) => c.id === 'chlorine')!;
    expect(searchCompounds(compounds, { text: 'CHLORINE' }).map((c) => c.id)).toContain('chlorine');
    expect(searchCompounds(compounds, { text: chlorine.cas }).map((c) => c.id)).toEqual(['chlorine']);
    expect(searchCompounds(compounds, { text: chlorine.formula }).map((c) => c.id)).toContain('chlorine');
    const withSynonym = compounds.find((c) => c.synonyms.length > 0)!;
    expect(searchCompounds(compounds, { text: withSynonym.synonyms[0].toUpperCase() }).map((c) => c.id)).toContain(withSynonym.id);
  });

  it('returns nothing for text no compound carries', () => {
    expect(searchCompounds(compounds, { text: 'no-such-substance-zz' })).toEqual([]);
  });

  it('keeps only hazardous compounds as the caution card judges them', () => {
    const hazardous = searchCompounds(compounds, { hazardousOnly: true });
    expect(hazardous.length).toBeGreaterThan(0);
    expect(hazardous.length).toBeLessThan(compounds.length);
    expect(hazardous.every((c) => cautionCard(c).hazardous)).toBe(true);
  });

  it('keeps only compounds with a geometry, and only those with bands of the technique', () => {
    const withGeometry = searchCompounds(compounds, { withGeometryOnly: true });
    expect(withGeometry.every((c) => c.geometry !== undefined)).toBe(true);
    expect(withGeometry.length).toBe(compounds.filter((c) => c.geometry).length);
    const raman = searchCompounds(compounds, { technique: 'raman' });
    expect(raman.every((c) => hasBandsFor(c, 'raman'))).toBe(true);
  });

  it('combines filters and sorts by name', () => {
    const list = searchCompounds(compounds, { hazardousOnly: true, withGeometryOnly: true });
    const names = list.map((c) => c.name);
    expect(names).toEqual([...names].sort((a, b) => a.localeCompare(b, 'en')));
    expect(list.every((c) => c.geometry && cautionCard(c).hazardous)).toBe(true);
  });
});
