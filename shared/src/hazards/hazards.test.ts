/** Caution cards, H-statement texts and escalation rules read from data. */
import { describe, expect, it } from 'vitest';
import { loadLibrary } from '../library/load.js';
import { cautionCard, UNCLASSIFIED_CAUTION } from './caution-card.js';
import { escalationFor, parseEscalationRules, type EscalationRules } from './escalation.js';
import { H_STATEMENTS } from './h-statements.js';
import { HAZARD_CLASSES } from './hazard-classes.js';
import { hazardRank, hazardRankOf } from './hazard-rank.js';

const library = loadLibrary();
const byId = (id: string) => library.compounds.find((c) => c.id === id)!;

describe('caution cards', () => {
  it('every hazardous compound gets H-statement texts, pictogram descriptions and protective cautions', () => {
    for (const c of library.compounds.filter((x) => x.hazards.classifications.length > 0)) {
      const card = cautionCard(c);
      expect(card.hazardous).toBe(true);
      expect(card.cautions.length).toBeGreaterThan(0);
      expect(card.hStatements.every((h) => h.text === H_STATEMENTS[h.code])).toBe(true);
      expect(card.pictograms.every((p) => p.description.length > 0)).toBe(true);
      for (const cl of c.hazards.classifications) {
        for (const caution of HAZARD_CLASSES[cl.hazardClass].cautions) expect(card.cautions).toContain(caution);
      }
    }
  });

  it('phosgene: fatal if inhaled, skull and crossbones, stay-upwind caution', () => {
    const card = cautionCard(byId('phosgene'));
    expect(card.hStatements.map((h) => h.code)).toContain('H330');
    expect(card.pictograms.map((p) => p.code)).toContain('GHS06');
    expect(card.cautions.some((t) => /upwind/.test(t))).toBe(true);
    expect(card.signalWord).toBe('Danger');
  });

  it('an unclassified look-alike still never reads as safe', () => {
    const card = cautionCard(byId('sucrose'));
    expect(card.hazardous).toBe(false);
    expect(card.cautions).toEqual([UNCLASSIFIED_CAUTION]);
  });

  it('explosive precursors carry the precursor caution', () => {
    expect(cautionCard(byId('ammonium-nitrate')).cautions.some((t) => /precursor/i.test(t))).toBe(true);
  });
});

describe('escalation rules are data', () => {
  const rules = library.escalationRules;
  const candidate = (id: string, score: number) => ({ id, name: byId(id).name, score, hazards: byId(id).hazards });

  it('escalates a toxic gas and an explosive, not water', () => {
    expect(escalationFor([candidate('phosgene', 0.9)], rules).triggers.map((t) => t.ruleId)).toContain('fatal-if-inhaled');
    expect(escalationFor([candidate('tnt', 0.9)], rules).triggers.map((t) => t.ruleId)).toEqual(expect.arrayContaining(['explosive', 'energetic']));
    expect(escalationFor([candidate('sulfur-dioxide', 0.9)], rules).triggers.map((t) => t.ruleId)).toEqual(['toxic-gas']);
    expect(escalationFor([candidate('water', 0.99)], rules)).toEqual({ required: false, triggers: [], rulesVersion: rules.version });
  });

  it('ignores candidates below the rules’ minimum band agreement', () => {
    expect(escalationFor([candidate('phosgene', rules.minScore - 0.01)], rules).required).toBe(false);
    expect(escalationFor([candidate('phosgene', rules.minScore)], rules).required).toBe(true);
  });

  it('follows whatever rules it is given', () => {
    const onlyOxidisers: EscalationRules = parseEscalationRules({
      version: 'test',
      minScore: 0.5,
      source: { ref: 'siteband-demo', basis: 'invented' },
      rules: [{ id: 'any-oxidiser', reason: 'oxidiser', when: [{ hazardClass: 'oxidising-solid' }] }],
    });
    expect(escalationFor([candidate('phosgene', 0.9)], onlyOxidisers).required).toBe(false);
    expect(escalationFor([candidate('ammonium-nitrate', 0.9)], onlyOxidisers).triggers.map((t) => t.ruleId)).toEqual(['any-oxidiser']);
  });

  it('rejects malformed rules with a clear message', () => {
    const base = { version: '1', minScore: 0.3, source: { ref: 'x', basis: 'common practice' } };
    expect(() => parseEscalationRules({ ...base, rules: [] })).toThrow(/rules must be a non-empty list/);
    expect(() => parseEscalationRules({ ...base, rules: [{ id: 'a', reason: 'r', when: [{ hazardClass: 'spooky' }] }] })).toThrow(/"spooky" is not a known hazard class/);
    expect(() => parseEscalationRules({ ...base, minScore: 2, rules: [] })).toThrow(/minScore must be a number in 0\.\.1/);
  });
});

describe('hazard rank', () => {
  it('orders escalation above Danger above Warning above none', () => {
    expect(hazardRank({ signalWord: null, escalates: false })).toBe(0);
    expect(hazardRank({ signalWord: 'Warning', escalates: false })).toBe(1);
    expect(hazardRank({ signalWord: 'Danger', escalates: false })).toBe(2);
    expect(hazardRank({ signalWord: null, escalates: true })).toBe(3);
    expect(hazardRank({ signalWord: 'Warning', escalates: true })).toBe(3);
  });

  it('labels each rank and refuses numbers outside 0..3', () => {
    expect([0, 1, 2, 3].map((r) => hazardRankOf(r).label)).toEqual(['none', 'warning', 'danger', 'escalation']);
    expect(() => hazardRankOf(4)).toThrow('A hazard rank is 0 to 3, not 4');
    expect(() => hazardRankOf(1.5)).toThrow(RangeError);
  });
});
