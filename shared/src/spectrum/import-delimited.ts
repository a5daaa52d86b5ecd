import Papa from 'papaparse';
import { assembleSpectrum } from './assemble.js';
import { SpectrumImportError } from './import-error.js';
import type { ImportOptions } from './import-options.js';
import type { Spectrum } from './types.js';
import { detectXUnit, detectYUnit, type XUnit, type YUnit } from './units.js';

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const NON_FINITE = /^[+-]?(nan|inf|infinity)$/i;

/**
 * Read a delimited text scan (CSV, TSV, semicolon or whitespace separated, decimal commas
 * allowed) with an optional header line naming the columns and their units.
 */
export function importDelimited(text: string, options: ImportOptions, minPoints: number): Spectrum {
  const delimiter = guessDelimiter(text);
  const parsed = Papa.parse<string[]>(text, { delimiter, skipEmptyLines: false });
  const rows = parsed.data.map((row) => (delimiter === ' ' ? row.filter((c) => c.trim() !== '') : row).map((c) => c.trim()));
  // A comma cannot be both the delimiter and the decimal mark; elsewhere "1,5" means 1.5.
  const decimalComma = delimiter !== ',';

  const header: string[] = [];
  const meta: Record<string, string> = {};
  let firstData = -1;
  for (let i = 0; i < rows.length; i++) {
    const cells = rows[i];
    if (isBlankOrComment(cells)) continue;
    if (isDataRow(cells, decimalComma)) {
      firstData = i;
      break;
    }
    if (cells.length >= 2 && cells.filter((c) => c !== '').length >= 2) {
      header.splice(0, header.length, ...cells);
    }
  }
  if (firstData < 0) throw new SpectrumImportError('not-numeric', 'no line with two numeric columns was found');

  const [xCol, yCol] = pickColumns(header);
  const xUnit: XUnit = options.xUnit ?? xUnitFromHeader(header[xCol]);
  const yUnit: YUnit = options.yUnit ?? yUnitFromHeader(header[yCol], options.technique);
  const x: number[] = [];
  const y: number[] = [];
  for (let i = firstData; i < rows.length; i++) {
    const cells = rows[i];
    if (isBlankOrComment(cells)) continue;
    if (cells.length <= Math.max(xCol, yCol)) {
      throw new SpectrumImportError('not-numeric', `expected at least ${Math.max(xCol, yCol) + 1} columns, found ${cells.length}`, {
        line: i + 1,
      });
    }
    x.push(parseNumber(cells[xCol], decimalComma, i + 1, header[xCol] ?? `column ${xCol + 1}`));
    y.push(parseNumber(cells[yCol], decimalComma, i + 1, header[yCol] ?? `column ${yCol + 1}`));
  }
  if (header.length > 0) {
    meta['x column'] = header[xCol];
    meta['y column'] = header[yCol];
  } else {
    meta['units'] = `assumed ${xUnit}, ${yUnit} (no header line)`;
  }
  return assembleSpectrum({
    x,
    y,
    xUnit,
    yUnit,
    minPoints,
    meta,
    ...(options.technique ? { technique: options.technique } : {}),
    ...(options.excitationNm !== undefined ? { excitationNm: options.excitationNm } : {}),
    ...(options.fileName ? { title: options.fileName } : {}),
  });
}

/**
 * Choose the delimiter from the first lines: tab, then semicolon, then comma, else runs of
 * spaces. Papaparse's own guess prefers the comma in "1001,4;3000,5" (decimal commas), so the
 * order of preference is fixed here instead.
 */
function guessDelimiter(text: string): string {
  const sample = text.slice(0, 20000).split(/\r?\n/).filter((l) => l.trim() !== '' && !l.trimStart().startsWith('#'));
  for (const candidate of ['\t', ';', ',']) if (sample.some((l) => l.includes(candidate))) return candidate;
  return ' ';
}

function isBlankOrComment(cells: readonly string[]): boolean {
  return cells.length === 0 || (cells.length === 1 && cells[0] === '') || cells[0].startsWith('#');
}

function isDataRow(cells: string[], decimalComma: boolean): boolean {
  const filled = cells.filter((c) => c !== '');
  return filled.length >= 2 && filled.slice(0, 2).every((c) => NUMBER.test(normalise(c, decimalComma)) || NON_FINITE.test(c));
}

function normalise(cell: string, decimalComma: boolean): string {
  return decimalComma ? cell.replace(',', '.') : cell;
}

function parseNumber(cell: string, decimalComma: boolean, line: number, field: string): number {
  const text = normalise(cell, decimalComma);
  // The plain-number test first: it passes for almost every cell, so one regex per cell.
  if (NUMBER.test(text)) return Number(text);
  if (NON_FINITE.test(text)) {
    throw new SpectrumImportError('non-finite', `"${cell}" is not a finite number`, { line, field });
  }
  throw new SpectrumImportError('not-numeric', `expected a number, found "${cell.slice(0, 40)}"`, { line, field });
}

/** Choose the x and y columns: by header words when present, else the first two. */
function pickColumns(header: string[]): [number, number] {
  if (header.length < 2) return [0, 1];
  const xCol = header.findIndex((h) => detectXUnit(h) !== undefined);
  const yCol = header.findIndex((h, i) => i !== xCol && detectYUnit(h) !== undefined);
  return [xCol >= 0 ? xCol : 0, yCol >= 0 ? yCol : xCol === 1 ? 0 : 1];
}

/** The x unit named by a header cell; headerless files are taken as cm⁻¹. */
function xUnitFromHeader(label: string | undefined): XUnit {
  if (label === undefined) return 'wavenumber-cm-1';
  const unit = detectXUnit(label);
  if (unit === undefined) {
    throw new SpectrumImportError(
      'unknown-units',
      'unknown x units; expected a wavenumber (cm-1), Raman shift, or wavelength in nm or µm',
      { field: label },
    );
  }
  return unit;
}

/** The y unit named by a header cell; headerless files get the technique's usual ordinate. */
function yUnitFromHeader(label: string | undefined, technique: ImportOptions['technique']): YUnit {
  if (label === undefined) return technique === 'raman' ? 'intensity' : 'absorbance';
  const unit = detectYUnit(label);
  if (unit === undefined) {
    throw new SpectrumImportError(
      'unknown-units',
      'unknown y units; expected absorbance, transmittance (%T or 0–1), intensity or counts',
      { field: label },
    );
  }
  return unit;
}
