import { loadLibrary, validateLibrary, type Compound } from '@siteband/shared';
import type { CurrentEdit } from './library-version';
import { mergeLibrary } from './merge-library';

const bundled = loadLibrary();
const entry = (id: string): Compound => bundled.compounds.find((c) => c.id === id)!;
const at = new Date('2026-11-30T10:00:00Z');
const edit = (compoundId: string, document: unknown, retired = false, version = 1): CurrentEdit => ({
  compoundId,
  version,
  document: document as Record<string, unknown>,
  retired,
  editedAt: at,
});

describe('mergeLibrary: the bundled library with supervisors’ edits', () => {
  it('is the bundled library, version included, without edits', () => {
    const { library, retired } = mergeLibrary(bundled, []);
    expect(library.version).toEqual(bundled.version);
    expect(library.compounds.map((c) => c.id)).toEqual(bundled.compounds.map((c) => c.id));
    expect(retired).toEqual([]);
  });

  it('replaces an edited entry in place, appends an added one and drops a retired one', () => {
    const renamed = { ...entry('acetone'), name: 'Acetone (edited)' };
    const added = { ...entry('toluene'), id: 'toluene-technical', name: 'Toluene, technical grade', cas: '108-88-3', solutionOf: 'toluene' };
    const { library, retired } = mergeLibrary(bundled, [edit('acetone', renamed), edit('toluene-technical', added), edit('chloroform', entry('chloroform'), true, 2)]);
    const ids = library.compounds.map((c) => c.id);
    expect(ids.indexOf('acetone')).toBe(bundled.compounds.findIndex((c) => c.id === 'acetone'));
    expect(library.compounds.find((c) => c.id === 'acetone')!.name).toBe('Acetone (edited)');
    expect(ids[ids.length - 1]).toBe('toluene-technical');
    expect(ids).not.toContain('chloroform');
    expect(retired).toEqual(['chloroform']);
    expect(library.compounds).toHaveLength(bundled.compounds.length);
  });

  it('gives a new version for every change, the same one for the same edits', () => {
    const a = mergeLibrary(bundled, [edit('acetone', { ...entry('acetone'), name: 'A' })]).library.version;
    const b = mergeLibrary(bundled, [edit('acetone', { ...entry('acetone'), name: 'B' })]).library.version;
    const again = mergeLibrary(bundled, [edit('acetone', { ...entry('acetone'), name: 'A' })]).library.version;
    expect(a.version).toMatch(new RegExp(`^${bundled.version.version.replace(/\./g, '\\.')}\\+edits\\.[0-9a-f]{12}$`));
    expect(a.contentHash).toMatch(/^[0-9a-f]{64}$/);
    expect(a.date).toBe('2026-11-30');
    expect(b.version).not.toBe(a.version);
    expect(again).toEqual(a);
  });

  it('refuses a library that no longer validates as a whole (a CAS RN used twice)', () => {
    const copy = { ...entry('acetone'), id: 'acetone-copy' };
    expect(() => mergeLibrary(bundled, [edit('acetone-copy', copy)])).toThrow(/acetone-copy\.cas: CAS RN 67-64-1 is also acetone/);
  });

  it('refuses to retire a compound another entry is a solution of', () => {
    const parent = bundled.compounds.find((c) => bundled.compounds.some((s) => s.solutionOf === c.id))!;
    expect(() => mergeLibrary(bundled, [edit(parent.id, parent, true)])).toThrow(/solutionOf: ".+" is not in the library/);
  });

  it('answers in the raw form validateLibrary reads, so a tablet can validate the download', () => {
    const { library } = mergeLibrary(bundled, [edit('acetone', { ...entry('acetone'), name: 'Acetone (edited)' })]);
    const downloaded = validateLibrary(JSON.parse(JSON.stringify(library)));
    expect(downloaded).toEqual(library);
  });
});
