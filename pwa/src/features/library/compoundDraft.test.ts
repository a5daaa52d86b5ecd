import { describe, expect, it } from 'vitest';
import { loadLibrary, validateCompound } from '@siteband/shared';
import { draftOf, entryFromDraft } from './compoundDraft';

const library = loadLibrary();
const sources = new Set(Object.keys(library.sources));
const withGeometry = library.compounds.find((c) => c.geometry && c.fundamentals)!;

describe('compound drafts', () => {
  it('gives back an entry equal to the compound when nothing was changed', () => {
    const entry = entryFromDraft(draftOf(withGeometry), withGeometry);
    expect(validateCompound(entry, sources)).toEqual(validateCompound(withGeometry, sources));
  });

  it('reads synonyms one per line, dropping blank lines and edge spaces', () => {
    const draft = { ...draftOf(withGeometry), synonyms: '  first name \n\n second name' };
    expect(entryFromDraft(draft, withGeometry).synonyms).toEqual(['first name', 'second name']);
  });

  it('keeps what the form does not edit (hazards, intensities, sources)', () => {
    const draft = draftOf(withGeometry);
    draft.fundamentals[0].cm1 = { gas: '1234.5', liquid: '', solid: '' };
    const entry = entryFromDraft(draft, withGeometry) as { hazards: unknown; fundamentals: { cm1: object; ir?: string; source?: unknown }[] };
    expect(entry.hazards).toEqual(withGeometry.hazards);
    expect(entry.fundamentals[0].cm1).toEqual({ gas: 1234.5 });
    expect(entry.fundamentals[0].ir).toBe(withGeometry.fundamentals![0].ir);
  });

  it('passes a position that is not a number on as text, so validation refuses it by name', () => {
    const draft = draftOf(withGeometry);
    draft.fundamentals[0].cm1 = { gas: '12x', liquid: '', solid: '' };
    expect(() => validateCompound(entryFromDraft(draft, withGeometry), sources)).toThrow(/fundamentals\[0\]\.cm1/);
  });
});
