import { describe, expect, it } from 'vitest';
import { parseMolV2000, parseStructure, detectStructureFormat, StructureError } from './index.js';

// Hand-written in the CTfile V2000 layout: 10.4 coordinates, symbol from column 32, 3-character bond fields.
const atomLine = (x: number, y: number, z: number, el: string) =>
  `${x.toFixed(4).padStart(10)}${y.toFixed(4).padStart(10)}${z.toFixed(4).padStart(10)} ${el.padEnd(3)} 0  0  0  0  0  0  0  0  0  0  0  0`;
const bondLine = (a: number, b: number, order = 1) => `${String(a).padStart(3)}${String(b).padStart(3)}${String(order).padStart(3)}  0`;
const counts = (atoms: number, bonds: number) => `${String(atoms).padStart(3)}${String(bonds).padStart(3)}  0  0  0  0  0  0  0  0999 V2000`;

const METHANE_D = [
  'deuteromethane', '  demo', '',
  counts(5, 4),
  atomLine(0, 0, 0, 'C'), atomLine(0.6276, 0.6276, 0.6276, 'H'), atomLine(0.6276, -0.6276, -0.6276, 'H'),
  atomLine(-0.6276, 0.6276, -0.6276, 'H'), atomLine(-0.6276, -0.6276, 0.6276, 'H'),
  bondLine(1, 2), bondLine(1, 3), bondLine(1, 4), bondLine(1, 5),
  'M  ISO  1   2   2',
  'M  END',
].join('\n');

function failure(text: string): StructureError {
  try {
    parseMolV2000(text);
  } catch (e) {
    if (e instanceof StructureError) return e;
    throw e;
  }
  throw new Error('no error thrown');
}

describe('parseMolV2000', () => {
  it('reads atoms, bonds (0-based) and M  ISO isotopes', () => {
    const s = parseMolV2000(METHANE_D);
    expect(s.title).toBe('deuteromethane');
    expect(s.atoms).toHaveLength(5);
    expect(s.atoms[1]).toEqual({ element: 'H', isotope: 2, position: [0.6276, 0.6276, 0.6276] });
    expect(s.bonds).toEqual([[0, 1], [0, 2], [0, 3], [0, 4]]);
  });

  it('reads bond fields by column when atom numbers run together', () => {
    const atoms = Array.from({ length: 101 }, (_, i) => atomLine(1.5 * i, 0, 0, 'C'));
    const text = ['chain', '', '', counts(101, 1), ...atoms, '100101  1  0', 'M  END'].join('\n');
    expect(parseMolV2000(text).bonds).toEqual([[99, 100]]);
  });

  it('names the line of each problem', () => {
    const lines = METHANE_D.split('\n');
    const edit = (i: number, text: string) => lines.map((l, k) => (k === i ? text : l)).join('\n');
    const cases: [string, number, RegExp][] = [
      ['', 1, /empty/],
      ['t\n\n', 3, /ends before the counts line/],
      [edit(3, counts(5, 4).replace('V2000', 'V3000')), 4, /V3000 is not supported/],
      [edit(3, '  5  4'), 4, /counts line ending in V2000/],
      [edit(3, counts(6, 4)), 10, /announces 6 atoms but the atom block has 5/],
      [edit(3, counts(5, 5)), 14, /announces 5 bonds but the bond block has 4/],
      [edit(5, atomLine(0.6276, 0.6276, 0.6276, 'Zz')), 6, /unknown element "Zz"/],
      [edit(5, '    0.6276    abcdef    0.6276 H   0  0'), 6, /y coordinate "abcdef" is not a number/],
      [edit(9, bondLine(1, 7)), 10, /bond names atom 7, but there are 5 atoms/],
      [edit(6, atomLine(0.6276, 0.6276, 0.6296, 'H')), 7, /same position as the atom on line 6/],
      [edit(13, 'M  ISO  1   9   2'), 14, /M  ISO names atom 9/],
      [edit(13, 'M  ISO  1   1  99'), 14, /mass number 99 is impossible for C/],
    ];
    for (const [text, line, message] of cases) {
      const e = failure(text);
      expect(e.message, text.slice(0, 80)).toMatch(message);
      expect(e.line, e.message).toBe(line);
    }
  });
});

describe('parseStructure', () => {
  it('tells MOL from XYZ and honours a hint', () => {
    expect(detectStructureFormat(METHANE_D)).toBe('mol');
    expect(detectStructureFormat('1\n\nHe 0 0 0\n')).toBe('xyz');
    expect(parseStructure(METHANE_D).atoms).toHaveLength(5);
    expect(parseStructure('2\nx\nH 0 0 0\nH 0.74 0 0\n').atoms).toHaveLength(2);
    expect(() => parseStructure(METHANE_D, 'xyz')).toThrow(StructureError);
  });

  it('explains a text that is neither format', () => {
    expect(() => parseStructure('hello\nworld\n')).toThrow(/line 1: not an XYZ file .* nor a MOL file/);
    expect(() => parseStructure('')).toThrow(/line 1: the file is empty/);
  });
});
