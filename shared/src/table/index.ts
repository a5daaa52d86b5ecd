/** Tables written out for other programs. */
export { toCsv, type CsvCell } from './csv.js';
