import { describe, expect, it } from 'vitest';
import { loadLibrary, validateCompound } from '@siteband/shared';
import { blankBand } from './bandDraft';
import { blankDraft, draftOf, entryFromDraft } from './compoundDraft';

const library = loadLibrary();
const sources = new Set(Object.keys(library.sources));
const withGeometry = library.compounds.find((c) => c.geometry && c.fundamentals)!;
const withBands = library.compounds.find((c) => c.bands && c.hazards.classifications.length > 0 && c.hazards.flags.length > 0)!;
const demo = { ref: 'siteband-demo', basis: 'invented' as const, note: '' };

/** A blank form filled the way a supervisor would: two IR bands, one GHS class. */
function filledBlank() {
  const draft = blankDraft();
  Object.assign(draft, { id: 'demo-solvent', name: 'Demo solvent', cas: '1234-56-6', formula: 'C4H8O', casSource: demo, bandsSource: demo });
  draft.bands = [
    { ...blankBand('liquid'), cm1: '1715', intensity: 'vs', assignment: 'C=O stretch' },
    { ...blankBand('liquid'), cm1: '2960.5', intensity: 's', widthCm1: '30', assignment: 'C–H stretch' },
  ];
  draft.hazards = {
    ...draft.hazards,
    classifications: [{ hazardClass: 'flammable-liquid', category: '2' }],
    hStatements: ['H225'],
    pictograms: ['GHS02'],
    signalWord: 'Danger',
    unNumber: '1993',
    source: demo,
  };
  return draft;
}

describe('compound drafts', () => {
  it('gives back an entry equal to the compound when nothing was changed', () => {
    const entry = entryFromDraft(draftOf(withGeometry), withGeometry);
    expect(validateCompound(entry, sources)).toEqual(validateCompound(withGeometry, sources));
  });

  it('round-trips bands, hazards and flags of a band compound unchanged', () => {
    const entry = entryFromDraft(draftOf(withBands), withBands);
    expect(validateCompound(entry, sources)).toEqual(withBands);
  });

  it('turns a filled blank form into a valid compound without a geometry', () => {
    const compound = validateCompound(entryFromDraft(filledBlank()), sources);
    expect(compound.geometry).toBeUndefined();
    expect(compound.fundamentals).toBeUndefined();
    expect(compound.bands?.map((b) => [b.technique, b.cm1, b.widthCm1])).toEqual([
      ['ir', 1715, undefined],
      ['ir', 2960.5, 30],
    ]);
    expect(compound.hazards).toEqual({
      signalWord: 'Danger',
      classifications: [{ hazardClass: 'flammable-liquid', category: '2' }],
      hStatements: ['H225'],
      pictograms: ['GHS02'],
      flags: [],
      unNumber: '1993',
      source: { ref: 'siteband-demo', basis: 'invented' },
    });
  });

  it('refuses a blank form as it stands, naming what is missing', () => {
    expect(() => validateCompound(entryFromDraft(blankDraft()), sources)).toThrow(/compound\.id/);
    const noBands = { ...filledBlank(), bands: [] };
    expect(() => validateCompound(entryFromDraft(noBands), sources)).toThrow(/needs fundamentals or bands/);
  });

  it('writes an unset signal word and UN number as null, and drops an empty optional band field', () => {
    const draft = filledBlank();
    draft.hazards = { ...draft.hazards, signalWord: '', unNumber: ' ' };
    const entry = entryFromDraft(draft) as { hazards: { signalWord: unknown; unNumber: unknown }; bands: object[] };
    expect(entry.hazards.signalWord).toBeNull();
    expect(entry.hazards.unNumber).toBeNull();
    expect(entry.bands[0]).not.toHaveProperty('widthCm1');
    expect(entry.bands[0]).not.toHaveProperty('label');
  });

  it('reads synonyms one per line, dropping blank lines and edge spaces', () => {
    const draft = { ...draftOf(withGeometry), synonyms: '  first name \n\n second name' };
    expect(entryFromDraft(draft, withGeometry).synonyms).toEqual(['first name', 'second name']);
  });

  it('sets and clears a fundamental intensity, keeping the fields the form does not edit', () => {
    const draft = draftOf(withGeometry);
    draft.fundamentals[0].cm1 = { gas: '1234.5', liquid: '', solid: '' };
    draft.fundamentals[0].ir = '';
    draft.fundamentals[0].raman = 'vw';
    const entry = entryFromDraft(draft, withGeometry) as { notes?: unknown; fundamentals: Record<string, unknown>[] };
    expect(entry.fundamentals[0].cm1).toEqual({ gas: 1234.5 });
    expect(entry.fundamentals[0]).not.toHaveProperty('ir');
    expect(entry.fundamentals[0].raman).toBe('vw');
    expect(entry.fundamentals[0].widthCm1).toBe(withGeometry.fundamentals![0].widthCm1);
    expect(entry.notes).toEqual(withGeometry.notes);
  });

  it('passes a position that is not a number on as text, so validation refuses it by name', () => {
    const draft = draftOf(withGeometry);
    draft.fundamentals[0].cm1 = { gas: '12x', liquid: '', solid: '' };
    expect(() => validateCompound(entryFromDraft(draft, withGeometry), sources)).toThrow(/fundamentals\[0\]\.cm1/);
    const banded = filledBlank();
    banded.bands[1].cm1 = '4500';
    expect(() => validateCompound(entryFromDraft(banded), sources)).toThrow(/bands\[1\]\.cm1/);
  });
});
