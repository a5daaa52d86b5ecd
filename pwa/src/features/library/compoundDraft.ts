import type { Compound, MatterPhase } from '@siteband/shared';

/** One editable fundamental: positions per phase as typed. */
export interface FundamentalDraft {
  mode: string;
  label: string;
  cm1: Record<MatterPhase, string>;
  assignment: string;
}

/** The editor's form state: the main fields as text, the rest of the entry kept as it was. */
export interface CompoundDraft {
  id: string;
  name: string;
  /** One synonym per line. */
  synonyms: string;
  cas: string;
  formula: string;
  xyz: string;
  convention: 'yz' | 'xz';
  fundamentals: FundamentalDraft[];
}

const PHASES: readonly MatterPhase[] = ['gas', 'liquid', 'solid'];

/** The form state of an existing compound. */
export function draftOf(compound: Compound): CompoundDraft {
  return {
    id: compound.id,
    name: compound.name,
    synonyms: compound.synonyms.join('\n'),
    cas: compound.cas,
    formula: compound.formula,
    xyz: compound.geometry?.xyz ?? '',
    convention: compound.geometry?.planarConvention ?? 'yz',
    fundamentals: (compound.fundamentals ?? []).map((f) => ({
      mode: f.mode,
      label: f.label,
      cm1: { gas: text(f.cm1.gas), liquid: text(f.cm1.liquid), solid: text(f.cm1.solid) },
      assignment: f.assignment,
    })),
  };
}

function text(value: number | undefined): string {
  return value === undefined ? '' : String(value);
}

/** A typed number, or the text itself so validation names the field that is not a number. */
function numberOrText(value: string): number | string {
  const n = Number(value.trim());
  return value.trim() !== '' && Number.isFinite(n) ? n : value;
}

/**
 * The raw entry to validate and send: the draft's fields laid over the base compound, so sources,
 * hazards, bands and intensities the form does not edit are kept exactly.
 */
export function entryFromDraft(draft: CompoundDraft, base: Compound): Record<string, unknown> {
  const synonyms = draft.synonyms.split('\n').map((s) => s.trim()).filter((s) => s !== '');
  const entry: Record<string, unknown> = { ...base, id: draft.id.trim(), name: draft.name.trim(), synonyms, cas: draft.cas.trim(), formula: draft.formula.trim() };
  if (base.geometry) {
    // yz is the default: an entry that never named a convention keeps not naming it.
    const { planarConvention: previous, ...geometry } = base.geometry;
    const named = previous !== undefined || draft.convention !== 'yz';
    entry.geometry = { ...geometry, xyz: draft.xyz, ...(named ? { planarConvention: draft.convention } : {}) };
    entry.fundamentals = draft.fundamentals.map((f, i) => {
      const cm1: Record<string, number | string> = {};
      for (const phase of PHASES) if (f.cm1[phase].trim() !== '') cm1[phase] = numberOrText(f.cm1[phase]);
      return { ...(base.fundamentals?.[i] ?? {}), mode: f.mode.trim(), label: f.label.trim(), cm1, assignment: f.assignment.trim() };
    });
  }
  return entry;
}
