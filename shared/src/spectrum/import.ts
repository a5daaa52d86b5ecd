import { importDelimited } from './import-delimited.js';
import { SpectrumImportError } from './import-error.js';
import { checkJcampExpansion } from './jcamp-expansion.js';
import { importJcampBlocks, pickJcampBlock, type JcampImport } from './import-jcamp.js';
import { DEFAULT_MAX_IMPORT_BYTES, DEFAULT_MIN_POINTS, type ImportOptions } from './import-options.js';
import type { Spectrum } from './types.js';

const JCAMP_NAME = /\.(jdx|dx|jcamp|jcm)$/i;

/**
 * Import one scan from JCAMP-DX or delimited text into an ascending cm⁻¹ Spectrum. Throws
 * only SpectrumImportError, whose message says what was wrong and where.
 */
export function importSpectrum(input: string | Uint8Array | ArrayBuffer, options: ImportOptions = {}): Spectrum {
  const text = prepareText(input, options);
  if (isJcamp(text, options.fileName)) return pickJcampBlock(readJcamp(text, options), options).spectrum;
  return guard(() => importDelimited(text, options, minPointsOf(options)));
}

/** Import every spectrum block of a JCAMP-DX file (multi-block and LINK files), with the refused ones and why. */
export function importJcampAll(input: string | Uint8Array | ArrayBuffer, options: ImportOptions = {}): JcampImport {
  return readJcamp(prepareText(input, options), options);
}

function readJcamp(text: string, options: ImportOptions): JcampImport {
  checkJcampExpansion(text);
  return guard(() => importJcampBlocks(text, options, minPointsOf(options)));
}

function minPointsOf(options: ImportOptions): number {
  const n = options.minPoints ?? DEFAULT_MIN_POINTS;
  if (!Number.isInteger(n) || n < 2) throw new SpectrumImportError('invalid-option', `minPoints must be an integer ≥ 2, got ${n}`);
  return n;
}

function prepareText(input: string | Uint8Array | ArrayBuffer, options: ImportOptions): string {
  const maxBytes = options.maxBytes ?? DEFAULT_MAX_IMPORT_BYTES;
  if (!(maxBytes > 0)) throw new SpectrumImportError('invalid-option', `maxBytes must be positive, got ${maxBytes}`);
  if (options.excitationNm !== undefined && !(options.excitationNm > 0 && Number.isFinite(options.excitationNm))) {
    throw new SpectrumImportError('invalid-option', `excitationNm must be a positive wavelength in nm, got ${options.excitationNm}`);
  }
  let text: string;
  if (typeof input === 'string') {
    if (input.length > maxBytes) throw tooLarge(input.length, maxBytes);
    text = input;
  } else if (input instanceof Uint8Array || input instanceof ArrayBuffer) {
    if (input.byteLength > maxBytes) throw tooLarge(input.byteLength, maxBytes);
    text = new TextDecoder('utf-8').decode(input);
  } else {
    throw new SpectrumImportError('invalid-option', 'input must be a string, Uint8Array or ArrayBuffer');
  }
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  if (text.trim() === '') throw new SpectrumImportError('empty', 'the file is empty');
  if (text.includes('\u0000')) {
    throw new SpectrumImportError('unrecognised-format', 'the file holds binary data; export the scan as JCAMP-DX or CSV text');
  }
  return text;
}

function tooLarge(size: number, maxBytes: number): SpectrumImportError {
  return new SpectrumImportError('too-large', `the file is ${(size / 1048576).toFixed(1)} MB; the limit is ${(maxBytes / 1048576).toFixed(1)} MB`);
}

function isJcamp(text: string, fileName: string | undefined): boolean {
  return (fileName !== undefined && JCAMP_NAME.test(fileName)) || /^\s*##/.test(text);
}

// Library code below us may throw plain errors on odd input; the caller gets one error type.
function guard<T>(run: () => T): T {
  try {
    return run();
  } catch (error) {
    if (error instanceof SpectrumImportError) throw error;
    throw new SpectrumImportError('unrecognised-format', `the file could not be read: ${(error as Error)?.message ?? String(error)}`);
  }
}
