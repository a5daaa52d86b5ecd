import Papa from 'papaparse';

/** One cell of a table written as CSV. */
export type CsvCell = string | number | boolean | null;

/**
 * A table as CSV (RFC 4180: comma separated, CRLF line ends, fields quoted where needed) through
 * papaparse's `unparse`. Cells starting with `=`, `+`, `-`, `@`, tab or carriage return get a leading
 * `'` (papaparse's `escapeFormulae`), so a spreadsheet opening the file does not run them as formulas
 * (OWASP "CSV Injection", from memory).
 */
export function toCsv(fields: readonly string[], rows: readonly (readonly CsvCell[])[]): string {
  for (const [i, row] of rows.entries()) {
    if (row.length !== fields.length) throw new RangeError(`CSV row ${i + 1} has ${row.length} cells for ${fields.length} columns`);
  }
  return Papa.unparse(
    { fields: [...fields], data: rows.map((row) => row.map((cell) => cell ?? '')) },
    { newline: '\r\n', escapeFormulae: true },
  );
}
