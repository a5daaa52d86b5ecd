/** Validation of the whole compound library: every entry, unique ids and CAS RNs, the rules. */
import { parseEscalationRules, type EscalationRules } from '../hazards/escalation.js';
import { asFields, fail, str } from './read-fields.js';
import type { Compound, LibraryVersion } from './types.js';
import { validateCompound } from './validate-compound.js';

/** The loaded compound library. */
export interface Library {
  readonly version: LibraryVersion;
  /** Source keys → full citations. */
  readonly sources: Readonly<Record<string, string>>;
  readonly compounds: readonly Compound[];
  readonly escalationRules: EscalationRules;
}

function checkUnique(compounds: readonly Compound[]): void {
  const ids = new Set<string>();
  const byCas = new Map<string, Compound>();
  for (const c of compounds) {
    if (ids.has(c.id)) fail(c.id, 'id is repeated');
    ids.add(c.id);
  }
  for (const c of compounds) {
    if (c.solutionOf !== undefined) {
      const parent = compounds.find((p) => p.id === c.solutionOf);
      if (parent === undefined) fail(`${c.id}.solutionOf`, `"${c.solutionOf}" is not in the library`);
      if (parent.cas !== c.cas) fail(`${c.id}.cas`, `a solution of ${parent.id} must carry its CAS RN ${parent.cas}`);
      continue;
    }
    const other = byCas.get(c.cas);
    if (other !== undefined) fail(`${c.id}.cas`, `CAS RN ${c.cas} is also ${other.id}`);
    byCas.set(c.cas, c);
  }
}

/** Validate raw library data (as produced by scripts/build-library.mjs); throws on the first fault. */
export function validateLibrary(raw: unknown): Library {
  const root = asFields(raw, 'library');
  const v = asFields(root.o.version, 'library.version');
  const version: LibraryVersion = { version: str(v, 'version'), date: str(v, 'date'), contentHash: str(v, 'contentHash') };
  const s = asFields(root.o.sources, 'library.sources');
  const sources: Record<string, string> = {};
  for (const key of Object.keys(s.o)) sources[key] = str(s, key);
  const keys = new Set(Object.keys(sources));
  if (!Array.isArray(root.o.compounds)) fail('library.compounds', 'must be a list');
  const compounds = root.o.compounds.map((c) => validateCompound(c, keys));
  checkUnique(compounds);
  const escalationRules = parseEscalationRules(root.o.escalationRules);
  if (!keys.has(escalationRules.source.ref)) fail('escalation-rules.source.ref', `"${escalationRules.source.ref}" is not in the library's source list`);
  return { version, sources, compounds, escalationRules };
}
