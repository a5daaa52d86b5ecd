/** Validation of one raw compound entry into a typed Compound. */
import { isHazardClassId } from '../hazards/hazard-classes.js';
import { H_STATEMENTS } from '../hazards/h-statements.js';
import { isPictogramCode } from '../hazards/pictograms.js';
import type { CompoundHazards, GhsClassification, PictogramCode } from '../hazards/types.js';
import { isValidCas } from './cas.js';
import { arr, asFields, fail, num, oneOf, optStr, source, str, type Fields } from './read-fields.js';
import type { Band, BandIntensity, Compound, CompoundGroup, Fundamental, Geometry, MatterPhase, ReferenceSpectrum } from './types.js';

/** Band positions the library accepts, in cm⁻¹: the span handheld IR and Raman instruments cover. */
export const BAND_RANGE_CM1 = { min: 50, max: 4000 } as const;

const PHASES: readonly MatterPhase[] = ['gas', 'liquid', 'solid'];
const INTENSITIES: readonly BandIntensity[] = ['vs', 's', 'm', 'w', 'vw'];
const GROUPS: readonly CompoundGroup[] = ['toxic-industrial', 'gas', 'solvent-fuel', 'oxidiser-energetic', 'acid-base', 'look-alike'];
const SLUG = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;

function optIntensity(f: Fields, key: string): BandIntensity | undefined {
  return f.o[key] === undefined ? undefined : oneOf(f, key, INTENSITIES);
}

function optWidth(f: Fields): number | undefined {
  return f.o.widthCm1 === undefined ? undefined : num(f, 'widthCm1', 1, 1000);
}

function fundamental(raw: unknown, where: string, sources: ReadonlySet<string>, hasDefault: boolean): Fundamental {
  const f = asFields(raw, where);
  const cm1f = asFields(f.o.cm1, `${where}.cm1`);
  const cm1: Partial<Record<MatterPhase, number>> = {};
  for (const key of Object.keys(cm1f.o)) {
    if (!(PHASES as readonly string[]).includes(key)) fail(`${where}.cm1`, `unknown phase "${key}"`);
    cm1[key as MatterPhase] = num(cm1f, key, BAND_RANGE_CM1.min, BAND_RANGE_CM1.max);
  }
  if (Object.keys(cm1).length === 0) fail(`${where}.cm1`, 'needs a value for at least one phase');
  if (f.o.source === undefined && !hasDefault) fail(where, 'has no source and the entry has no fundamentalsSource');
  if (f.o.matchable !== undefined && typeof f.o.matchable !== 'boolean') fail(`${where}.matchable`, 'must be true or false');
  return {
    mode: str(f, 'mode'),
    label: str(f, 'label'),
    cm1,
    ...(optIntensity(f, 'ir') !== undefined ? { ir: optIntensity(f, 'ir') } : {}),
    ...(optIntensity(f, 'raman') !== undefined ? { raman: optIntensity(f, 'raman') } : {}),
    assignment: str(f, 'assignment'),
    ...(f.o.matchable === false ? { matchable: false } : {}),
    ...(optWidth(f) !== undefined ? { widthCm1: optWidth(f) } : {}),
    ...(f.o.source !== undefined ? { source: source(f.o.source, `${where}.source`, sources) } : {}),
  };
}

function band(raw: unknown, where: string, sources: ReadonlySet<string>, hasDefault: boolean): Band {
  const f = asFields(raw, where);
  if (f.o.source === undefined && !hasDefault) fail(where, 'has no source and the entry has no bandsSource');
  const label = optStr(f, 'label');
  const width = optWidth(f);
  return {
    technique: oneOf(f, 'technique', ['ir', 'raman'] as const),
    cm1: num(f, 'cm1', BAND_RANGE_CM1.min, BAND_RANGE_CM1.max),
    phase: oneOf(f, 'phase', PHASES),
    intensity: oneOf(f, 'intensity', INTENSITIES),
    assignment: str(f, 'assignment'),
    ...(label !== undefined ? { label } : {}),
    ...(width !== undefined ? { widthCm1: width } : {}),
    ...(f.o.source !== undefined ? { source: source(f.o.source, `${where}.source`, sources) } : {}),
  };
}

function hazards(raw: unknown, where: string, sources: ReadonlySet<string>): CompoundHazards {
  const f = asFields(raw, where);
  const classifications = arr(f, 'classifications').map((c, i): GhsClassification => {
    const cf = asFields(c, `${where}.classifications[${i}]`);
    const hazardClass = str(cf, 'hazardClass');
    if (!isHazardClassId(hazardClass)) fail(`${cf.where}.hazardClass`, `"${hazardClass}" is not a GHS hazard class id`);
    return { hazardClass, category: str(cf, 'category') };
  });
  const hStatements = arr(f, 'hStatements').map((h, i) => {
    if (typeof h !== 'string' || !(h in H_STATEMENTS)) fail(`${where}.hStatements[${i}]`, `"${String(h)}" is not a known H-statement`);
    return h;
  });
  const pictograms = arr(f, 'pictograms').map((p, i): PictogramCode => {
    if (typeof p !== 'string' || !isPictogramCode(p)) fail(`${where}.pictograms[${i}]`, `"${String(p)}" is not GHS01–GHS09`);
    return p;
  });
  const flags = arr(f, 'flags').map((x, i) => {
    if (typeof x !== 'string') fail(`${where}.flags[${i}]`, 'must be a string');
    return x;
  });
  const signal = f.o.signalWord;
  if (signal !== null && signal !== 'Danger' && signal !== 'Warning') fail(`${where}.signalWord`, 'must be "Danger", "Warning" or null');
  const un = f.o.unNumber;
  if (un !== null && (typeof un !== 'string' || !/^\d{4}$/.test(un))) fail(`${where}.unNumber`, 'must be four digits or null');
  if (classifications.length > 0 && hStatements.length === 0) fail(where, 'classified but lists no H-statement');
  return { signalWord: signal, classifications, hStatements, pictograms, flags, unNumber: un, source: source(f.o.source, `${where}.source`, sources) };
}

function geometry(raw: unknown, where: string, sources: ReadonlySet<string>): Geometry {
  const f = asFields(raw, where);
  const xyz = str(f, 'xyz');
  const convention = f.o.planarConvention === undefined ? undefined : oneOf(f, 'planarConvention', ['yz', 'xz'] as const);
  return { xyz, source: source(f.o.source, `${where}.source`, sources), ...(convention !== undefined ? { planarConvention: convention } : {}) };
}

function referenceSpectrum(raw: unknown, where: string, sources: ReadonlySet<string>): ReferenceSpectrum {
  const f = asFields(raw, where);
  const xCm1 = arr(f, 'xCm1', true);
  const y = arr(f, 'y', true);
  if (xCm1.length !== y.length || xCm1.length < 10) fail(where, 'xCm1 and y must be lists of the same length, at least 10 points');
  xCm1.forEach((x, i) => {
    if (typeof x !== 'number' || x < BAND_RANGE_CM1.min || x > BAND_RANGE_CM1.max || (i > 0 && x <= (xCm1[i - 1] as number))) {
      fail(`${where}.xCm1[${i}]`, `must ascend within ${BAND_RANGE_CM1.min}..${BAND_RANGE_CM1.max}`);
    }
  });
  y.forEach((v, i) => {
    if (typeof v !== 'number' || !Number.isFinite(v)) fail(`${where}.y[${i}]`, 'must be a finite number');
  });
  return {
    technique: oneOf(f, 'technique', ['ir', 'raman'] as const),
    phase: oneOf(f, 'phase', PHASES),
    xCm1: xCm1 as number[],
    y: y as number[],
    source: source(f.o.source, `${where}.source`, sources),
  };
}

/** Validate one raw compound entry; throws a TypeError naming the entry and field at fault. */
export function validateCompound(raw: unknown, sources: ReadonlySet<string>): Compound {
  const f0 = asFields(raw, 'compound');
  const id = str(f0, 'id');
  const f = asFields(raw, id);
  if (!SLUG.test(id)) fail(id, 'id must be a lower-case slug');
  const cas = str(f, 'cas');
  if (!isValidCas(cas)) fail(`${id}.cas`, `"${cas}" fails the CAS RN check digit`);
  const fundamentalsSource = f.o.fundamentalsSource === undefined ? undefined : source(f.o.fundamentalsSource, `${id}.fundamentalsSource`, sources);
  const bandsSource = f.o.bandsSource === undefined ? undefined : source(f.o.bandsSource, `${id}.bandsSource`, sources);
  const fundamentals = f.o.fundamentals === undefined ? undefined : arr(f, 'fundamentals', true).map((x, i) => fundamental(x, `${id}.fundamentals[${i}]`, sources, fundamentalsSource !== undefined));
  const bands = f.o.bands === undefined ? undefined : arr(f, 'bands', true).map((x, i) => band(x, `${id}.bands[${i}]`, sources, bandsSource !== undefined));
  const geo = f.o.geometry === undefined ? undefined : geometry(f.o.geometry, `${id}.geometry`, sources);
  if (geo !== undefined && fundamentals === undefined) fail(id, 'a geometry needs its fundamentals');
  if (fundamentals !== undefined && geo === undefined) fail(id, 'fundamentals need a geometry (activity comes from the symmetry engine)');
  if (fundamentals === undefined && bands === undefined) fail(id, 'needs fundamentals or bands');
  const phases = arr(f, 'phases', true).map((p, i) => {
    if (typeof p !== 'string' || !(PHASES as readonly string[]).includes(p)) fail(`${id}.phases[${i}]`, `"${String(p)}" is not gas, liquid or solid`);
    return p as MatterPhase;
  });
  const synonyms = arr(f, 'synonyms').map((s, i) => {
    if (typeof s !== 'string') fail(`${id}.synonyms[${i}]`, 'must be a string');
    return s;
  });
  const notes = f.o.notes === undefined ? undefined : arr(f, 'notes').map((s, i) => {
    if (typeof s !== 'string') fail(`${id}.notes[${i}]`, 'must be a string');
    return s;
  });
  const solutionOf = optStr(f, 'solutionOf');
  const references = f.o.referenceSpectra === undefined ? undefined : arr(f, 'referenceSpectra', true).map((r, i) => referenceSpectrum(r, `${id}.referenceSpectra[${i}]`, sources));
  return {
    id,
    name: str(f, 'name'),
    synonyms,
    cas,
    casSource: source(f.o.casSource, `${id}.casSource`, sources),
    ...(solutionOf !== undefined ? { solutionOf } : {}),
    formula: str(f, 'formula'),
    group: oneOf(f, 'group', GROUPS),
    phases,
    ...(geo !== undefined ? { geometry: geo } : {}),
    ...(fundamentalsSource !== undefined ? { fundamentalsSource } : {}),
    ...(fundamentals !== undefined ? { fundamentals } : {}),
    ...(bandsSource !== undefined ? { bandsSource } : {}),
    ...(bands !== undefined ? { bands } : {}),
    hazards: hazards(f.o.hazards, `${id}.hazards`, sources),
    ...(references !== undefined ? { referenceSpectra: references } : {}),
    ...(notes !== undefined ? { notes } : {}),
  };
}
