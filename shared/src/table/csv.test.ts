import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { toCsv } from './csv.js';

describe('toCsv', () => {
  it('writes a header and rows with CRLF and quotes fields that need it', () => {
    const csv = toCsv(['site', 'samples', 'note'], [
      ['Quay 7, drum store', 2, 'said "leaking"'],
      ['Bay 3', 0, null],
    ]);
    expect(csv).toBe('site,samples,note\r\n"Quay 7, drum store",2,"said ""leaking"""\r\nBay 3,0,');
    expect(Papa.parse(csv, { header: true }).data).toEqual([
      { site: 'Quay 7, drum store', samples: '2', note: 'said "leaking"' },
      { site: 'Bay 3', samples: '0', note: '' },
    ]);
  });

  it('defuses cells a spreadsheet would run as a formula', () => {
    const csv = toCsv(['a', 'b'], [['=HYPERLINK("x")', '-2+3'], ['@SUM(A1)', 'plain']]);
    const rows = Papa.parse<string[]>(csv).data;
    expect(rows[1]).toEqual(["'=HYPERLINK(\"x\")", "'-2+3"]);
    expect(rows[2]).toEqual(["'@SUM(A1)", 'plain']);
  });

  it('refuses a row with the wrong number of cells', () => {
    expect(() => toCsv(['a', 'b'], [['only one']])).toThrow('CSV row 1 has 1 cells for 2 columns');
  });
});
