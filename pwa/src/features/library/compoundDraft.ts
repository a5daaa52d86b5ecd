import type { BandIntensity, Compound, CompoundGroup, MatterPhase } from '@siteband/shared';
import { bandDraftOf, bandFromDraft, type BandDraft } from './bandDraft';
import { blankHazards, hazardsDraftOf, hazardsFromDraft, type HazardsDraft } from './hazardsDraft';
import { numberOrText, textOf } from './numberOrText';
import { sourceDraftOf, sourceFromDraft, type SourceDraft } from './sourceDraft';

/** One editable fundamental: positions per phase as typed, intensities empty where none is given. */
export interface FundamentalDraft {
  mode: string;
  label: string;
  cm1: Record<MatterPhase, string>;
  ir: BandIntensity | '';
  raman: BandIntensity | '';
  assignment: string;
}

/** The editor's form state; what the form does not edit (notes, reference spectra, widths of fundamentals) stays in the base. */
export interface CompoundDraft {
  id: string;
  name: string;
  /** One synonym per line. */
  synonyms: string;
  cas: string;
  casSource: SourceDraft;
  formula: string;
  group: CompoundGroup;
  phases: MatterPhase[];
  /** Empty for a compound without a geometry; fundamentals are sent only with one. */
  xyz: string;
  convention: 'yz' | 'xz';
  geometrySource: SourceDraft;
  fundamentals: FundamentalDraft[];
  fundamentalsSource: SourceDraft;
  bands: BandDraft[];
  bandsSource: SourceDraft;
  hazards: HazardsDraft;
}

export const PHASES: readonly MatterPhase[] = ['gas', 'liquid', 'solid'];

/** An empty form for a compound not yet in the library. */
export function blankDraft(): CompoundDraft {
  return {
    id: '',
    name: '',
    synonyms: '',
    cas: '',
    casSource: sourceDraftOf(undefined),
    formula: '',
    group: 'toxic-industrial',
    phases: ['liquid'],
    xyz: '',
    convention: 'yz',
    geometrySource: sourceDraftOf(undefined),
    fundamentals: [],
    fundamentalsSource: sourceDraftOf(undefined),
    bands: [],
    bandsSource: sourceDraftOf(undefined),
    hazards: blankHazards(),
  };
}

/** A new fundamental row, numbered after the last one. */
export function blankFundamental(index: number): FundamentalDraft {
  return { mode: `ν${index + 1}`, label: '', cm1: { gas: '', liquid: '', solid: '' }, ir: '', raman: '', assignment: '' };
}

/** The form state of an existing compound. */
export function draftOf(compound: Compound): CompoundDraft {
  return {
    id: compound.id,
    name: compound.name,
    synonyms: compound.synonyms.join('\n'),
    cas: compound.cas,
    casSource: sourceDraftOf(compound.casSource),
    formula: compound.formula,
    group: compound.group,
    phases: [...compound.phases],
    xyz: compound.geometry?.xyz ?? '',
    convention: compound.geometry?.planarConvention ?? 'yz',
    geometrySource: sourceDraftOf(compound.geometry?.source),
    fundamentals: (compound.fundamentals ?? []).map((f) => ({
      mode: f.mode,
      label: f.label,
      cm1: { gas: textOf(f.cm1.gas), liquid: textOf(f.cm1.liquid), solid: textOf(f.cm1.solid) },
      ir: f.ir ?? '',
      raman: f.raman ?? '',
      assignment: f.assignment,
    })),
    fundamentalsSource: sourceDraftOf(compound.fundamentalsSource),
    bands: (compound.bands ?? []).map(bandDraftOf),
    bandsSource: sourceDraftOf(compound.bandsSource),
    hazards: hazardsDraftOf(compound.hazards),
  };
}

/** Whether the draft describes a molecule with a geometry (and so with fundamentals). */
export function hasGeometry(draft: CompoundDraft): boolean {
  return draft.xyz.trim() !== '';
}

function fundamentalFromDraft(f: FundamentalDraft, kept: object | undefined): Record<string, unknown> {
  const cm1: Record<string, number | string> = {};
  for (const phase of PHASES) if (f.cm1[phase].trim() !== '') cm1[phase] = numberOrText(f.cm1[phase]);
  // Kept fields (width, matchable, own source) come first; intensities are the form's to set or clear.
  const { ir: _ir, raman: _raman, ...rest } = (kept ?? {}) as Record<string, unknown>;
  return {
    ...rest,
    mode: f.mode.trim(),
    label: f.label.trim(),
    cm1,
    ...(f.ir !== '' ? { ir: f.ir } : {}),
    ...(f.raman !== '' ? { raman: f.raman } : {}),
    assignment: f.assignment.trim(),
  };
}

/** A source field that is set only when a key was chosen. */
function optional(key: string, value: unknown): Record<string, unknown> {
  return value === undefined ? {} : { [key]: value };
}

/**
 * The raw entry to validate and send: the draft laid over the base compound (when there is one),
 * so what the form does not edit is kept exactly. Lists the form empties are left out, and
 * validation then says what the entry still needs.
 */
export function entryFromDraft(draft: CompoundDraft, base?: Compound): Record<string, unknown> {
  const synonyms = draft.synonyms.split('\n').map((s) => s.trim()).filter((s) => s !== '');
  const {
    geometry: oldGeometry,
    fundamentals: oldFundamentals,
    fundamentalsSource: _fs,
    bands: _b,
    bandsSource: _bs,
    ...kept
  } = (base ?? {}) as Partial<Compound>;
  const entry: Record<string, unknown> = {
    ...kept,
    id: draft.id.trim(),
    name: draft.name.trim(),
    synonyms,
    cas: draft.cas.trim(),
    casSource: sourceFromDraft(draft.casSource),
    formula: draft.formula.trim(),
    group: draft.group,
    phases: [...draft.phases],
    ...optional('bandsSource', sourceFromDraft(draft.bandsSource)),
    ...(draft.bands.length > 0 ? { bands: draft.bands.map(bandFromDraft) } : {}),
    hazards: hazardsFromDraft(draft.hazards),
  };
  if (hasGeometry(draft)) {
    // yz is the default: an entry that never named a convention keeps not naming it.
    const named = oldGeometry?.planarConvention !== undefined || draft.convention !== 'yz';
    entry.geometry = { xyz: draft.xyz, source: sourceFromDraft(draft.geometrySource), ...(named ? { planarConvention: draft.convention } : {}) };
    Object.assign(entry, optional('fundamentalsSource', sourceFromDraft(draft.fundamentalsSource)));
    entry.fundamentals = draft.fundamentals.map((f, i) => fundamentalFromDraft(f, oldFundamentals?.[i]));
  }
  return entry;
}
