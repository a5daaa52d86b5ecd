import { loadLibrary, validateCompound } from '@siteband/shared';
import { unknownFields } from './unknown-fields';

const library = loadLibrary();
const sources = new Set(Object.keys(library.sources));
const raw = (id: string) => JSON.parse(JSON.stringify(library.compounds.find((c) => c.id === id)));

describe('unknownFields', () => {
  it('finds none in a bundled entry', () => {
    for (const id of ['ammonia', 'carbon-dioxide', 'polystyrene', 'ethanol']) expect(unknownFields(raw(id), validateCompound(raw(id), sources))).toEqual([]);
  });

  it('names misspelt fields at any depth, and ignores the default matchable: true', () => {
    const entry = raw('ammonia');
    entry.synonym = ['NH3'];
    entry.fundamentals[1].intensityIr = 'vs';
    entry.fundamentals[2].matchable = true;
    entry.hazards.pictogram = 'GHS06';
    expect(unknownFields(entry, validateCompound(entry, sources))).toEqual(['compound.fundamentals[1].intensityIr', 'compound.hazards.pictogram', 'compound.synonym']);
  });
});
