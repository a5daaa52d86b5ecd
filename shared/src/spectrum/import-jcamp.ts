import { convert, type Entry } from 'jcampconverter';
import { assembleSpectrum } from './assemble.js';
import { SpectrumImportError } from './import-error.js';
import type { ImportOptions } from './import-options.js';
import type { Spectrum, Technique } from './types.js';
import { detectXUnit, detectYUnit } from './units.js';

/** One spectrum block of a JCAMP-DX file, with how its data were written. */
export interface JcampBlock {
  readonly index: number;
  readonly form: 'xydata' | 'peak-table';
  readonly dataType: string;
  readonly spectrum: Spectrum;
}

/** What reading a JCAMP-DX file gave: the usable blocks and why the others were refused. */
export interface JcampImport {
  readonly blocks: JcampBlock[];
  readonly refused: { readonly index: number; readonly error: SpectrumImportError }[];
}

/**
 * Read every spectrum block of a JCAMP-DX text (XYDATA in any of its compressed forms, or a
 * PEAK TABLE; LINK files are flattened). Blocks are numbered from 0 in file order; each is
 * validated like a single file, and a bad block is refused without losing the others.
 */
export function importJcampBlocks(input: string, options: ImportOptions, minPoints: number): JcampImport {
  let entries: Entry[];
  try {
    entries = convert(input, { keepRecordsRegExp: /.*/, canonicDataLabels: true }).flatten;
  } catch (error) {
    throw new SpectrumImportError('unrecognised-format', `the JCAMP-DX text could not be read: ${(error as Error).message}`);
  }
  const blocks: JcampBlock[] = [];
  const refused: { index: number; error: SpectrumImportError }[] = [];
  entries
    .filter((entry) => entry.spectra?.[0] !== undefined)
    .forEach((entry, index) => {
      try {
        blocks.push(readBlock(entry, index, options, minPoints));
      } catch (error) {
        if (!(error instanceof SpectrumImportError)) throw error;
        refused.push({ index, error });
      }
    });
  if (blocks.length === 0) {
    if (refused.length > 0) throw refused[0].error;
    throw new SpectrumImportError('no-spectrum-block', 'no XYDATA or PEAK TABLE block with data was found in the JCAMP-DX text');
  }
  return { blocks, refused };
}

function readBlock(entry: Entry, index: number, options: ImportOptions, minPoints: number): JcampBlock {
  const page = entry.spectra[0];
  const x = page.data?.x ?? [];
  const y = page.data?.y ?? [];
  const where = { block: index };
  if (x.length === 0) throw new SpectrumImportError('empty', 'the block declares data but holds no points', where);
  if (x.length !== y.length) {
    throw new SpectrumImportError('not-numeric', `the block holds ${x.length} x values but ${y.length} y values`, where);
  }
  const declaredPoints = Number(entry.info?.NPOINTS ?? page.nbPoints);
  if (Number.isInteger(declaredPoints) && declaredPoints > 0 && declaredPoints !== x.length) {
    throw new SpectrumImportError(
      'not-numeric',
      `the block declares ${declaredPoints} points but ${x.length} could be read (truncated or corrupted data?)`,
      { ...where, field: 'NPOINTS' },
    );
  }
  const form = page.isPeaktable ? 'peak-table' : 'xydata';
  const dataType = String(entry.dataType ?? entry.info?.DATATYPE ?? '');
  const xLabel = String(page.xUnits ?? entry.info?.XUNITS ?? '');
  const yLabel = String(page.yUnits ?? entry.info?.YUNITS ?? '');
  // The block's own DATA TYPE decides its technique; the caller's choice only picks among blocks.
  const technique = techniqueOf(dataType) ?? options.technique;
  const xUnit = options.xUnit ?? detectXUnit(xLabel);
  const yUnit = options.yUnit ?? detectYUnit(yLabel);
  if (xUnit === undefined) {
    throw new SpectrumImportError('unknown-units', `unknown XUNITS "${xLabel}"; expected 1/CM, NANOMETERS or MICROMETERS`, {
      ...where,
      field: 'XUNITS',
    });
  }
  if (yUnit === undefined) {
    throw new SpectrumImportError(
      'unknown-units',
      `unknown YUNITS "${yLabel}"; expected ABSORBANCE, TRANSMITTANCE, or an intensity or counts label`,
      { ...where, field: 'YUNITS' },
    );
  }
  const excitationNm = options.excitationNm ?? excitationOf(entry);
  const meta = stringMeta(entry);
  meta['form'] = form;
  const spectrum = assembleSpectrum({
    x,
    y,
    xUnit,
    yUnit,
    minPoints: form === 'peak-table' ? 1 : minPoints,
    where,
    meta,
    ...(technique ? { technique } : {}),
    ...(excitationNm !== undefined ? { excitationNm } : {}),
    ...(entry.title ? { title: String(entry.title) } : {}),
  });
  return { index, form, dataType, spectrum };
}

/** Pick the block to use: the one asked for, else the first continuous block of the technique. */
export function pickJcampBlock(read: JcampImport, options: ImportOptions): JcampBlock {
  const { blocks } = read;
  if (options.block !== undefined) {
    const chosen = blocks.find((b) => b.index === options.block);
    if (chosen) return chosen;
    const refusal = read.refused.find((r) => r.index === options.block);
    if (refusal) throw refusal.error;
    throw new SpectrumImportError(
      'no-spectrum-block',
      `block ${options.block} is not a spectrum block; spectrum blocks are ${blocks.map((b) => b.index).join(', ')}`,
    );
  }
  const fits = blocks.filter((b) => !options.technique || b.spectrum.technique === options.technique || !b.spectrum.technique);
  if (fits.length === 0) {
    throw new SpectrumImportError(
      'technique-mismatch',
      `no ${options.technique === 'ir' ? 'IR' : 'Raman'} block in the file; its blocks are ${blocks.map((b) => b.dataType || 'untyped').join(', ')}`,
    );
  }
  return fits.find((b) => b.form === 'xydata') ?? fits[0];
}

function techniqueOf(dataType: string): Technique | undefined {
  if (/raman/i.test(dataType)) return 'raman';
  if (/infrared|\bir\b/i.test(dataType)) return 'ir';
  return undefined;
}

// JCAMP-DX has no standard label for the laser line; vendors use private ##$ labels.
function excitationOf(entry: Entry): number | undefined {
  for (const [key, value] of Object.entries({ ...entry.info, ...entry.meta })) {
    if (/laser|excitation/i.test(key)) {
      const nm = Number.parseFloat(String(value));
      if (Number.isFinite(nm) && nm > 100 && nm < 2000) return nm;
    }
  }
  return undefined;
}

function stringMeta(entry: Entry): Record<string, string> {
  const meta: Record<string, string> = {};
  for (const [key, value] of Object.entries({ ...entry.info, ...entry.meta })) {
    if (value !== undefined && String(value).length <= 20000) meta[key] = String(value);
  }
  return meta;
}
