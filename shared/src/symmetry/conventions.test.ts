/**
 * Labels, class orders and rows against published character tables: Cotton, Chemical Applications of
 * Group Theory, 3rd ed., Appendix IIA (from memory), with the axis conventions stated in types.ts.
 * Cross-checks READ on online character-table collections: the D4h rows and the D3h class order on
 * G. Katzer's character-table pages, the D5d class order and E1g/E1u rows on webqc.org's D5d table.
 */
import { describe, expect, it } from 'vitest';
import { pointGroup } from './catalogue.js';
import { irrepByLabel } from './representation.js';

const PHI = (1 + Math.sqrt(5)) / 2;
const classes = (name: string) => pointGroup(name).classes.map((c) => c.label);
const row = (name: string, label: string) => irrepByLabel(pointGroup(name), label).characters;
const basis = (name: string, label: string) => {
  const ir = irrepByLabel(pointGroup(name), label);
  return [...ir.translations, ...ir.rotations, ...ir.quadratics];
};

describe('published table conventions (Cotton App. IIA, from memory)', () => {
  it('C2v: E, C2, σv(xz), σv′(yz); B1 ∋ x, B2 ∋ y', () => {
    expect(classes('C2v')).toEqual(['E', 'C2', 'σv(xz)', 'σv′(yz)']);
    expect(pointGroup('C2v').irreps.map((i) => i.label)).toEqual(['A1', 'A2', 'B1', 'B2']);
    expect(basis('C2v', 'B1')).toEqual(['x', 'Ry', 'xz']);
    expect(basis('C2v', 'B2')).toEqual(['y', 'Rx', 'yz']);
    expect(basis('C2v', 'A2')).toEqual(['Rz', 'xy']);
  });

  it('D2h: B1u ∋ z, B2u ∋ y, B3u ∋ x; class order E C2(z) C2(y) C2(x) i σ(xy) σ(xz) σ(yz)', () => {
    expect(classes('D2h')).toEqual(['E', 'C2(z)', 'C2(y)', 'C2(x)', 'i', 'σ(xy)', 'σ(xz)', 'σ(yz)']);
    expect(basis('D2h', 'B1u')).toEqual(['z']);
    expect(basis('D2h', 'B2u')).toEqual(['y']);
    expect(basis('D2h', 'B3u')).toEqual(['x']);
    expect(basis('D2h', 'B1g')).toEqual(['Rz', 'xy']);
  });

  it('D4h: C2′ along x and y, B1g ∋ x²−y², B2g ∋ xy', () => {
    expect(classes('D4h')).toEqual(['E', '2C4', 'C2', '2C2′', '2C2″', 'i', '2S4', 'σh', '2σv', '2σd']);
    expect(basis('D4h', 'B1g')).toEqual(['x²−y²']);
    expect(basis('D4h', 'B2g')).toEqual(['xy']);
    expect(row('D4h', 'B2u')).toEqual([1, -1, 1, -1, 1, -1, 1, -1, 1, -1]);
    expect(row('D4h', 'B1g')).toEqual([1, -1, 1, 1, -1, 1, -1, 1, 1, -1]);
    expect(row('D4h', 'Eu')).toEqual([2, 0, -2, 0, 0, -2, 0, 2, 0, 0]);
    expect(basis('D4h', 'Eu')).toEqual(['x', 'y']);
  });

  it('D6h: class order with 3σd before 3σv, E1u ∋ (x, y), E2g ∋ (x²−y², xy)', () => {
    expect(classes('D6h')).toEqual(['E', '2C6', '2C3', 'C2', '3C2′', '3C2″', 'i', '2S3', '2S6', 'σh', '3σd', '3σv']);
    expect(row('D6h', 'B1g')).toEqual([1, -1, 1, -1, 1, -1, 1, -1, 1, -1, 1, -1]);
    expect(basis('D6h', 'E1u')).toEqual(['x', 'y']);
    expect(basis('D6h', 'E2g')).toEqual(['x²−y²', 'xy']);
    expect(basis('D6h', 'A2u')).toEqual(['z']);
  });

  it("D3h: primes as ASCII apostrophes, A2'' ∋ z, E' ∋ (x, y), E'' ∋ (Rx, Ry)", () => {
    expect(pointGroup('D3h').irreps.map((i) => i.label)).toEqual(["A1'", "A2'", "E'", "A1''", "A2''", "E''"]);
    expect(irrepByLabel(pointGroup('D3h'), "A2''").display).toBe('A2″');
    expect(classes('D3h')).toEqual(['E', '2C3', '3C2', 'σh', '2S3', '3σv']);
    expect(row('D3h', "A2''")).toEqual([1, 1, -1, -1, -1, 1]);
    expect(basis('D3h', "E'")).toEqual(['x', 'y', 'x²−y²', 'xy']);
    expect(basis('D3h', "E''")).toEqual(['Rx', 'Ry', 'xz', 'yz']);
  });

  it('D2d: B2 ∋ z, B1 ∋ x²−y² (C2′ along x and y)', () => {
    expect(classes('D2d')).toEqual(['E', '2S4', 'C2', '2C2′', '2σd']);
    expect(row('D2d', 'B2')).toEqual([1, -1, 1, -1, 1]);
    expect(basis('D2d', 'B2')).toEqual(['z', 'xy']);
    expect(basis('D2d', 'B1')).toEqual(['x²−y²']);
  });

  it('D3d and D5d class orders; D5d lists 2S10³ before 2S10', () => {
    expect(classes('D3d')).toEqual(['E', '2C3', '3C2', 'i', '2S6', '3σd']);
    expect(classes('D5d')).toEqual(['E', '2C5', '2C5²', '5C2', 'i', '2S10³', '2S10', '5σd']);
    const e1u = row('D5d', 'E1u');
    const c72 = 2 * Math.cos((2 * Math.PI) / 5);
    const c144 = 2 * Math.cos((4 * Math.PI) / 5);
    [2, c72, c144, 0, -2, -c72, -c144, 0].forEach((x, i) => expect(e1u[i]).toBeCloseTo(x, 12));
    expect(basis('D3d', 'A2u')).toEqual(['z']);
    expect(basis('D3d', 'Eu')).toEqual(['x', 'y']);
  });

  it('D4d: E1 ∋ (x, y), E2 ∋ (x²−y², xy), E3 ∋ (Rx, Ry), B2 ∋ z', () => {
    expect(classes('D4d')).toEqual(['E', '2S8', '2C4', '2S8³', 'C2', '4C2′', '4σd']);
    expect(basis('D4d', 'B2')).toEqual(['z']);
    expect(basis('D4d', 'E1')).toEqual(['x', 'y']);
    expect(basis('D4d', 'E3')).toEqual(['Rx', 'Ry', 'xz', 'yz']);
    expect(row('D4d', 'E1')[1]).toBeCloseTo(Math.SQRT2, 12);
  });

  it('Cn, Cnh and S2n: real E rows with the complex pair kept (C3: 1, ε, ε*)', () => {
    const e = irrepByLabel(pointGroup('C3'), 'E');
    expect(e.characters).toEqual([2, -1, -1]);
    expect(e.complexCharacters![0][1].re).toBeCloseTo(-0.5, 12);
    expect(e.complexCharacters![0][1].im).toBeCloseTo(Math.sqrt(3) / 2, 12);
    expect(classes('C6h')).toEqual(['E', 'C6', 'C3', 'C2', 'C3²', 'C6⁵', 'i', 'S3⁵', 'S6⁵', 'σh', 'S6', 'S3']);
    expect(classes('S6')).toEqual(['E', 'C3', 'C3²', 'i', 'S6⁵', 'S6']);
    expect(basis('S4', 'B')).toEqual(['z', 'x²−y²', 'xy']);
  });

  it('Td: S4 along x, y, z, T2 ∋ (x, y, z), T1 ∋ rotations', () => {
    expect(classes('Td')).toEqual(['E', '8C3', '3C2', '6S4', '6σd']);
    expect(row('Td', 'T2')).toEqual([3, 0, -1, -1, 1]);
    expect(basis('Td', 'T2')).toEqual(['x', 'y', 'z', 'xy', 'xz', 'yz']);
    expect(basis('Td', 'E')).toEqual(['2z²−x²−y²', 'x²−y²']);
  });

  it('Oh: class order and T1u row', () => {
    expect(classes('Oh')).toEqual(['E', '8C3', '6C2', '6C4', '3C2', 'i', '6S4', '8S6', '3σh', '6σd']);
    expect(row('Oh', 'T1u')).toEqual([3, 0, -1, 1, -1, -3, -1, 0, 1, 1]);
    expect(basis('Oh', 'T2g')).toEqual(['xy', 'xz', 'yz']);
  });

  it('Ih: T1u ∋ (x, y, z), Hg holds the five quadratic functions, φ in the C5 columns', () => {
    expect(classes('Ih')).toEqual(['E', '12C5', '12C5²', '20C3', '15C2', 'i', '12S10', '12S10³', '20S6', '15σ']);
    const t1g = row('Ih', 'T1g');
    [3, PHI, 1 - PHI, 0, -1, 3, 1 - PHI, PHI, 0, -1].forEach((x, i) => expect(t1g[i]).toBeCloseTo(x, 12));
    expect(basis('Ih', 'T1u')).toEqual(['x', 'y', 'z']);
    expect(irrepByLabel(pointGroup('Ih'), 'Hg').quadratics).toHaveLength(5);
  });

  it('D∞h and C∞v (Herzberg 1945, from memory): Σu+ ∋ z, Πu ∋ (x, y), Πg ∋ (Rx, Ry), Σ- ∋ Rz', () => {
    expect(basis('D∞h', 'Σu+')).toEqual(['z']);
    expect(basis('D∞h', 'Πu')).toEqual(['x', 'y']);
    expect(basis('D∞h', 'Πg')).toEqual(['Rx', 'Ry', 'xz', 'yz']);
    expect(basis('D∞h', 'Σg+')).toEqual(['z²', 'x²+y²']);
    expect(basis('D∞h', 'Δg')).toEqual(['x²−y²', 'xy']);
    expect(basis('C∞v', 'Σ+')).toEqual(['z', 'z²', 'x²+y²']);
    expect(basis('C∞v', 'Σ-')).toEqual(['Rz']);
    expect(pointGroup('D∞h').irreps.slice(0, 3).map((i) => i.label)).toEqual(['Σg+', 'Σg-', 'Πg']);
  });
});
