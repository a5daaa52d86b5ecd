/** The whole compound library: schema, sources, CAS RNs, uniqueness, coverage and freshness of the bundle. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildLibraryData, OUTPUT, renderLibraryModule } from '../../../scripts/build-library.mjs';
import { isValidCas } from './cas.js';
import { loadLibrary } from './load.js';
import { validateLibrary } from './validate-library.js';
import { BAND_RANGE_CM1 } from './validate-compound.js';

const library = loadLibrary();
const raw = () => JSON.parse(JSON.stringify(buildLibraryData())) as { compounds: Record<string, unknown>[] };

describe('compound library', () => {
  it('holds at least 80 compounds, including the ones field teams meet most', () => {
    expect(library.compounds.length).toBeGreaterThanOrEqual(80);
    const ids = new Set(library.compounds.map((c) => c.id));
    const required = [
      'ammonia', 'chlorine', 'sulfur-dioxide', 'hydrogen-sulfide', 'phosgene', 'hydrogen-chloride', 'carbon-monoxide',
      'nitrogen-dioxide', 'phosphorus-trichloride', 'phosphorus-oxychloride', 'hydrogen-cyanide', 'hydrogen-fluoride',
      'methanol', 'ethanol', 'isopropanol', 'acetone', 'toluene', 'benzene', 'o-xylene', 'm-xylene', 'p-xylene', 'n-hexane',
      'cyclohexane', 'dichloromethane', 'chloroform', 'carbon-tetrachloride', 'carbon-disulfide', 'acetonitrile', 'nitromethane',
      'tetrachloroethylene', 'trichloroethylene', 'kerosene', 'diesel-fuel', 'ethyl-acetate', 'hydrogen-peroxide',
      'ammonium-nitrate', 'potassium-chlorate', 'potassium-perchlorate', 'urea-nitrate', 'sodium-nitrate', 'tnt',
      'sulfuric-acid', 'nitric-acid', 'hydrochloric-acid', 'acetic-acid', 'sodium-hydroxide', 'ammonia-solution', 'water',
      'carbon-dioxide', 'sucrose', 'glucose', 'sodium-bicarbonate', 'calcium-carbonate', 'talc', 'cellulose', 'starch',
      'sodium-chloride', 'polyethylene', 'polypropylene', 'polystyrene', 'pet', 'pvc', 'ptfe', 'nylon-66', 'pdms',
      'paraffin-wax', 'urea', 'citric-acid', 'paracetamol', 'methane', 'ethane', 'propane', 'ethylene', 'acetylene',
      'nitrous-oxide', 'sulfur-hexafluoride',
    ];
    expect(required.filter((id) => !ids.has(id))).toEqual([]);
  });

  it('has valid CAS check digits and unique ids and CAS RNs (solutions share their solute’s)', () => {
    expect(library.compounds.filter((c) => !isValidCas(c.cas)).map((c) => c.id)).toEqual([]);
    expect(new Set(library.compounds.map((c) => c.id)).size).toBe(library.compounds.length);
    const own = library.compounds.filter((c) => c.solutionOf === undefined);
    expect(new Set(own.map((c) => c.cas)).size).toBe(own.length);
  });

  it('names a source for every number: CAS RN, geometry, each fundamental and band, hazards', () => {
    const known = new Set(Object.keys(library.sources));
    const unsourced: string[] = [];
    for (const c of library.compounds) {
      const refs = [c.casSource, c.hazards.source, c.geometry?.source];
      for (const f of c.fundamentals ?? []) refs.push(f.source ?? c.fundamentalsSource ?? (unsourced.push(`${c.id} ${f.mode}`), undefined));
      for (const b of c.bands ?? []) refs.push(b.source ?? c.bandsSource ?? (unsourced.push(`${c.id} ${b.cm1}`), undefined));
      for (const r of refs) if (r !== undefined && (!known.has(r.ref) || r.basis.length === 0)) unsourced.push(`${c.id} ${r.ref}`);
    }
    expect(unsourced).toEqual([]);
  });

  it('keeps every band within 50–4000 cm⁻¹', () => {
    const values = library.compounds.flatMap((c) => [
      ...(c.fundamentals ?? []).flatMap((f) => Object.values(f.cm1) as number[]),
      ...(c.bands ?? []).map((b) => b.cm1),
    ]);
    expect(Math.min(...values)).toBeGreaterThanOrEqual(BAND_RANGE_CM1.min);
    expect(Math.max(...values)).toBeLessThanOrEqual(BAND_RANGE_CM1.max);
  });

  it('records a version with a content hash', () => {
    expect(library.version.version).toMatch(/^\d+\.\d+\.\d+$/);
    expect(library.version.date).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    expect(library.version.contentHash).toMatch(/^sha256:[0-9a-f]{64}$/);
  });

  it('bundles exactly what fixtures/library holds (data.generated.ts is up to date)', () => {
    expect(readFileSync(OUTPUT, 'utf8')).toBe(renderLibraryModule());
  });
});

describe('library validation rejects bad entries with a precise message', () => {
  const mutate = (id: string, change: (c: Record<string, unknown>) => void) => {
    const data = raw();
    change(data.compounds.find((c) => c.id === id)!);
    return () => validateLibrary(data);
  };
  it('a wrong CAS check digit', () => {
    expect(mutate('water', (c) => (c.cas = '7732-18-4'))).toThrow(/water\.cas: "7732-18-4" fails the CAS RN check digit/);
  });
  it('a source that is not in the source list', () => {
    expect(mutate('acetone', (c) => ((c.bandsSource as Record<string, unknown>).ref = 'nowhere'))).toThrow(/acetone\.bandsSource\.ref: "nowhere" is not in the library's source list/);
  });
  it('a band outside 50–4000 cm⁻¹', () => {
    expect(mutate('acetone', (c) => ((c.bands as Record<string, unknown>[])[0]!.cm1 = 4500))).toThrow(/acetone\.bands\[0\]\.cm1: must be a number in 50\.\.4000/);
  });
  it('fundamentals without a geometry', () => {
    expect(mutate('ammonia', (c) => delete c.geometry)).toThrow(/ammonia: fundamentals need a geometry/);
  });
  it('an unknown H-statement', () => {
    expect(mutate('phosgene', (c) => ((c.hazards as Record<string, unknown>).hStatements = ['H999']))).toThrow(/phosgene\.hazards\.hStatements\[0\]: "H999"/);
  });
  it('a reference spectrum whose axis does not ascend', () => {
    const ref = { technique: 'raman', phase: 'liquid', xCm1: [100, 90, 120, 130, 140, 150, 160, 170, 180, 190], y: [0, 1, 0, 1, 0, 1, 0, 1, 0, 1], source: { ref: 'siteband-demo', basis: 'invented' } };
    expect(mutate('toluene', (c) => (c.referenceSpectra = [ref]))).toThrow(/toluene\.referenceSpectra\[0\]\.xCm1\[1\]: must ascend/);
  });
  it('a repeated CAS RN', () => {
    expect(mutate('ethanol', (c) => (c.cas = '67-56-1'))).toThrow(/CAS RN 67-56-1 is also/);
  });
});
