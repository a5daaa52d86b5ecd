import { describe, expect, it } from 'vitest';
import { pointGroup, pointGroupNames } from './catalogue.js';
import { classIndexOf, operationIndex } from './group-lookup.js';
import { det, mul, trace, transpose } from './mat3.js';
import { powerClass, reduceCharacters } from './representation.js';
import type { Complex, PointGroup } from './group-types.js';

/** The irreps over ℂ: each combined E split back into its two complex characters. */
function complexRows(g: PointGroup): Complex[][] {
  return g.irreps.flatMap((ir) =>
    ir.complexCharacters ? [...ir.complexCharacters.map((row) => [...row])] : [ir.characters.map((re) => ({ re, im: 0 }))],
  );
}
const dot = (a: Complex, b: Complex) => ({ re: a.re * b.re + a.im * b.im, im: a.im * b.re - a.re * b.im }); // a·b*

const REQUIRED = [
  'C1', 'Cs', 'Ci', 'C2', 'C3', 'C4', 'C5', 'C6', 'C2v', 'C3v', 'C4v', 'C5v', 'C6v', 'C2h', 'C3h', 'C4h', 'C5h', 'C6h',
  'D2', 'D3', 'D4', 'D5', 'D6', 'D2h', 'D3h', 'D4h', 'D5h', 'D6h', 'D8h', 'D2d', 'D3d', 'D4d', 'D5d', 'D6d',
  'S4', 'S6', 'S8', 'T', 'Td', 'Th', 'O', 'Oh', 'I', 'Ih', 'C∞v', 'D∞h',
];

describe('point-group catalogue', () => {
  it('holds every required group', () => {
    expect(pointGroupNames()).toEqual(expect.arrayContaining(REQUIRED));
  });

  it.each(pointGroupNames())('%s passes the character-table invariants', (name) => {
    const g = pointGroup(name);
    const rows = complexRows(g);
    expect(rows.length).toBe(g.classes.length);
    expect(g.classes.reduce((s, c) => s + c.size, 0)).toBe(g.order);
    expect(rows.reduce((s, r) => s + r[0].re ** 2, 0)).toBeCloseTo(g.order, 9);
    // Row orthogonality: (1/h) Σ g_c χi χj* = δij.
    rows.forEach((ri, i) =>
      rows.forEach((rj, j) => {
        const s = g.classes.reduce((acc, c, k) => {
          const p = dot(ri[k], rj[k]);
          return { re: acc.re + c.size * p.re, im: acc.im + c.size * p.im };
        }, { re: 0, im: 0 });
        expect(s.re / g.order).toBeCloseTo(i === j ? 1 : 0, 9);
        expect(s.im / g.order).toBeCloseTo(0, 9);
      }),
    );
    // Column orthogonality: Σ_i χi(c) χi(c′)* = (h / g_c) δcc′.
    g.classes.forEach((c, k) =>
      g.classes.forEach((_, l) => {
        const s = rows.reduce((acc, r) => acc + dot(r[k], r[l]).re, 0);
        expect(s).toBeCloseTo(k === l ? g.order / c.size : 0, 9);
      }),
    );
    // A combined E is the sum of its complex pair.
    for (const ir of g.irreps) {
      if (!ir.complexCharacters) continue;
      ir.characters.forEach((x, k) => expect(ir.complexCharacters![0][k].re + ir.complexCharacters![1][k].re).toBeCloseTo(x, 9));
    }
  });

  it.each(pointGroupNames())('%s operations form a group whose classes are conjugacy classes', (name) => {
    const g = pointGroup(name);
    expect(g.operations.length).toBe(g.order);
    for (const a of g.operations) {
      for (const b of g.operations) {
        expect(operationIndex(g, mul(a.matrix, b.matrix))).toBeDefined();
        expect(classIndexOf(g, mul(mul(b.matrix, a.matrix), transpose(b.matrix)))).toBe(a.classIndex);
      }
    }
    g.classes.forEach((c, k) => expect(g.operations.filter((o) => o.classIndex === k).length).toBe(c.size));
  });

  it.each(pointGroupNames())('%s bases agree with characters computed from the matrices', (name) => {
    const g = pointGroup(name);
    const reps = g.classes.map((c) => c.representative);
    const expected = (count: (ir: PointGroup['irreps'][number]) => number) =>
      Object.fromEntries(g.irreps.filter((ir) => count(ir) > 0).map((ir) => [ir.label, count(ir) / ir.dimension]));
    // Vector representation: χ = tr R.
    expect(reduceCharacters(g, reps.map(trace))).toEqual(expected((ir) => ir.translations.length));
    // Rotations (axial vector): χ = det R · tr R.
    expect(reduceCharacters(g, reps.map((r) => det(r) * trace(r)))).toEqual(expected((ir) => ir.rotations.length));
    // Quadratic functions: symmetric square of the vector representation, ½[χ(R)² + χ(R²)].
    const sym2 = reps.map((r, k) => (trace(r) ** 2 + trace(g.classes[powerClass(g, k, 2)].representative)) / 2);
    expect(reduceCharacters(g, sym2)).toEqual(expected((ir) => ir.quadratics.length));
    expect(g.irreps.flatMap((ir) => ir.translations).sort()).toEqual(['x', 'y', 'z']);
    expect(g.irreps.reduce((s, ir) => s + ir.quadratics.length, 0)).toBe(6);
  });

  it.each(pointGroupNames())('%s class labels describe their representative operation', (name) => {
    const g = pointGroup(name);
    const SUP = '⁰¹²³⁴⁵⁶⁷⁸⁹';
    for (const c of g.classes) {
      const m = /^(\d*)(E|i|σ|C|S)(\d*)([⁰¹²³⁴⁵⁶⁷⁸⁹]*)/.exec(c.label);
      expect(m, c.label).not.toBeNull();
      const [, count, kind, order, power] = m!;
      expect(Number(count || 1)).toBe(c.size);
      expect(c.element.kind).toBe(kind);
      if (kind === 'C' || kind === 'S') {
        const k = power ? Number([...power].map((d) => SUP.indexOf(d)).join('')) : 1;
        const labelled = (2 * Math.PI * k) / Number(order);
        const actual = (2 * Math.PI * c.element.power!) / c.element.order!;
        expect(Math.cos(labelled)).toBeCloseTo(Math.cos(actual), 9);
      }
    }
  });

  it('accepts ASCII spellings of the linear groups and rejects unknown names clearly', () => {
    expect(pointGroup('Dinfh').name).toBe('D∞h');
    expect(pointGroup('C*v').name).toBe('C∞v');
    expect(() => pointGroup('D7q')).toThrow(/unknown point group "D7q"/);
  });
});
