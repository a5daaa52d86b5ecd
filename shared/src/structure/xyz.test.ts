import { describe, expect, it } from 'vitest';
import { parseXyz, StructureError, MAX_ATOMS } from './index.js';

const WATER = '3\nwater\nO 0.0 0.0 0.1173\nH 0.0 0.7572 -0.4692\nH 0.0 -0.7572 -0.4692\n';

/** The StructureError thrown by parsing `text`. */
function failure(text: string): StructureError {
  try {
    parseXyz(text);
  } catch (e) {
    if (e instanceof StructureError) return e;
    throw e;
  }
  throw new Error('no error thrown');
}

describe('parseXyz', () => {
  it('reads atoms, title and positions', () => {
    const s = parseXyz(WATER);
    expect(s.title).toBe('water');
    expect(s.atoms.map((a) => a.element)).toEqual(['O', 'H', 'H']);
    expect(s.atoms[1].position).toEqual([0, 0.7572, -0.4692]);
    expect(s.bonds).toBeUndefined();
  });

  it('accepts CRLF, extra columns, trailing blank lines, Fortran exponents and element spellings', () => {
    const s = parseXyz('4\r\n\r\nCL 0 0 0 0.1\r\nD 1.0D0 0 0\r\n13C 0 1e0 0\r\n6 0 0 1\r\n\r\n');
    expect(s.title).toBeUndefined();
    expect(s.atoms.map((a) => [a.element, a.isotope])).toEqual([['Cl', undefined], ['H', 2], ['C', 13], ['C', undefined]]);
    expect(s.atoms[1].position[0]).toBe(1);
  });

  it('names the line of each problem', () => {
    const cases: [string, number, RegExp][] = [
      ['', 1, /empty/],
      ['  \n \n', 1, /empty/],
      ['three\nx\nH 0 0 0\n', 1, /number of atoms/],
      ['5\nx\nH 0 0 0\nH 1 0 0\nH 2 0 0\nH 3 0 0\n', 1, /header says 5 atoms but the file has 4/],
      ['2\nx\nH 0 0 0\nH 1 0 0\nH 2 0 0\n', 5, /more atom lines than the 2/],
      ['2\nx\nH 0 0 0\nH 1 zero 0\n', 4, /y coordinate "zero" is not a number/],
      ['2\nx\nH 0 0 0\nH 1 0 NaN\n', 4, /z coordinate "NaN" is not a finite number/],
      ['2\nx\nH 0 0 0\nH Infinity 0 0\n', 4, /x coordinate "Infinity" is not a finite number/],
      ['2\nx\nH 0 0 0\nH 1e999 0 0\n', 4, /not a finite number/],
      ['2\nx\nH 0 0 0\nXx 1 0 0\n', 4, /unknown element "Xx"/],
      ['2\nx\nH 0 0 0\n1C 1 0 0\n', 4, /unknown element "1C"/],
      ['2\nx\nH 0 0 0\nH 1 0\n', 4, /expected "element x y z"/],
      ['3\nx\nO 0 0 0\nH 1 0 0\nH 0.004 0 0\n', 5, /same position as the atom on line 3/],
      [`${MAX_ATOMS + 1}\nx\nH 0 0 0\n`, 1, /more than the limit of 1000/],
      ['0\nx\n', 1, /at least 1/],
    ];
    for (const [text, line, message] of cases) {
      const e = failure(text);
      expect(e.line, text).toBe(line);
      expect(e.message, text).toMatch(message);
      expect(e.message.startsWith(`line ${line}: `)).toBe(true);
    }
  });

  it('takes exactly MAX_ATOMS atoms', () => {
    const lines = Array.from({ length: MAX_ATOMS }, (_, i) => `C ${i * 1.5} 0 0`);
    expect(parseXyz(`${MAX_ATOMS}\nchain\n${lines.join('\n')}\n`).atoms).toHaveLength(MAX_ATOMS);
  });
});
