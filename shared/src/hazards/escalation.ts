import { isHazardClassId } from './hazard-classes.js';
import type { CompoundHazards, HazardClassId, SourceRef } from './types.js';

/** One condition of a rule: a hazard class (optionally limited to categories) or a field flag. */
export type EscalationCondition =
  | { readonly hazardClass: HazardClassId; readonly categories?: readonly string[] }
  | { readonly flag: string };

/** A rule: a candidate meeting every condition of `when` is escalated to the safety officer. */
export interface EscalationRule {
  readonly id: string;
  readonly reason: string;
  readonly when: readonly EscalationCondition[];
}

/** The escalation policy as data (fixtures/library/escalation-rules.json). */
export interface EscalationRules {
  readonly version: string;
  /** Only candidates with band agreement at or above this are considered. */
  readonly minScore: number;
  readonly rules: readonly EscalationRule[];
  readonly source: SourceRef;
}

/** A candidate as the escalation needs it. */
export interface EscalationCandidate {
  readonly id: string;
  readonly name: string;
  readonly score: number;
  readonly hazards: CompoundHazards;
}

/** Why a scan escalates: which rule fired for which candidate. */
export interface EscalationTrigger {
  readonly ruleId: string;
  readonly reason: string;
  readonly compoundId: string;
  readonly name: string;
  readonly score: number;
}

/** The escalation decision for one scan. */
export interface Escalation {
  readonly required: boolean;
  readonly triggers: readonly EscalationTrigger[];
  readonly rulesVersion: string;
}

function meets(hazards: CompoundHazards, condition: EscalationCondition): boolean {
  if ('flag' in condition) return hazards.flags.includes(condition.flag);
  return hazards.classifications.some(
    (c) =>
      c.hazardClass === condition.hazardClass &&
      (condition.categories === undefined || condition.categories.includes(c.category)),
  );
}

/** Which candidates must be escalated to the safety officer under the given rules. */
export function escalationFor(candidates: readonly EscalationCandidate[], rules: EscalationRules): Escalation {
  const triggers: EscalationTrigger[] = [];
  for (const candidate of candidates) {
    if (!(candidate.score >= rules.minScore)) continue;
    for (const rule of rules.rules) {
      if (rule.when.every((condition) => meets(candidate.hazards, condition))) {
        triggers.push({ ruleId: rule.id, reason: rule.reason, compoundId: candidate.id, name: candidate.name, score: candidate.score });
      }
    }
  }
  return { required: triggers.length > 0, triggers, rulesVersion: rules.version };
}

function fail(message: string): never {
  throw new TypeError(`Escalation rules: ${message}`);
}

function parseCondition(raw: unknown, where: string): EscalationCondition {
  if (typeof raw !== 'object' || raw === null) fail(`${where} must be an object`);
  const o = raw as Record<string, unknown>;
  if (typeof o.flag === 'string') return { flag: o.flag };
  if (typeof o.hazardClass !== 'string' || !isHazardClassId(o.hazardClass)) fail(`${where}.hazardClass "${String(o.hazardClass)}" is not a known hazard class`);
  if (o.categories === undefined) return { hazardClass: o.hazardClass };
  if (!Array.isArray(o.categories) || o.categories.length === 0 || !o.categories.every((c) => typeof c === 'string')) {
    fail(`${where}.categories must be a non-empty list of strings`);
  }
  return { hazardClass: o.hazardClass, categories: o.categories as string[] };
}

/** Check raw JSON against the rules format; throws a TypeError naming the first fault. */
export function parseEscalationRules(raw: unknown): EscalationRules {
  if (typeof raw !== 'object' || raw === null) fail('must be an object');
  const o = raw as Record<string, unknown>;
  if (typeof o.version !== 'string') fail('version must be a string');
  if (typeof o.minScore !== 'number' || !(o.minScore >= 0 && o.minScore <= 1)) fail('minScore must be a number in 0..1');
  if (!Array.isArray(o.rules) || o.rules.length === 0) fail('rules must be a non-empty list');
  const src = o.source as Record<string, unknown> | undefined;
  if (typeof src?.ref !== 'string' || typeof src?.basis !== 'string') fail('source must name ref and basis');
  const ids = new Set<string>();
  const rules = o.rules.map((r: unknown, i: number): EscalationRule => {
    const rule = r as Record<string, unknown>;
    if (typeof rule?.id !== 'string' || rule.id === '') fail(`rules[${i}].id must be a non-empty string`);
    if (ids.has(rule.id)) fail(`rules[${i}].id "${rule.id}" is repeated`);
    ids.add(rule.id);
    if (typeof rule.reason !== 'string' || rule.reason === '') fail(`rules[${i}].reason must be a non-empty string`);
    if (!Array.isArray(rule.when) || rule.when.length === 0) fail(`rules[${i}].when must be a non-empty list`);
    return { id: rule.id, reason: rule.reason, when: rule.when.map((c, j) => parseCondition(c, `rules[${i}].when[${j}]`)) };
  });
  return { version: o.version, minScore: o.minScore, rules, source: src as unknown as SourceRef };
}
