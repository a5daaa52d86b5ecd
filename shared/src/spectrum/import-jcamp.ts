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

/**
 * Read every spectrum block of a JCAMP-DX text (XYDATA in any of its compressed forms, or a
 * PEAK TABLE; LINK files are flattened). Each block is validated like a single file.
 */
export function importJcampBlocks(input: string | Uint8Array | ArrayBuffer, options: ImportOptions, minPoints: number): JcampBlock[] {
  let entries: Entry[];
  try {
    entries = convert(input, { keepRecordsRegExp: /.*/, canonicDataLabels: true }).flatten;
  } catch (error) {
    throw new SpectrumImportError('unrecognised-format', `the JCAMP-DX text could not be read: ${(error as Error).message}`);
  }
  const blocks: JcampBlock[] = [];
  entries.forEach((entry, index) => {
    const page = entry.spectra?.[0];
    if (!page) return;
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
    const technique = options.technique ?? techniqueOf(dataType);
    const xUnit = options.xUnit ?? detectXUnit(xLabel);
    // A bare "1/CM" in a Raman file is a shift; in IR it is a wavenumber.
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
    const declared = techniqueOf(dataType);
    if (options.technique && declared && declared !== options.technique) {
      throw new SpectrumImportError(
        'technique-mismatch',
        `the block is a ${dataType} but a ${options.technique === 'ir' ? 'IR' : 'Raman'} scan was expected`,
        { ...where, field: 'DATA TYPE' },
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
    blocks.push({ index, form, dataType, spectrum });
  });
  if (blocks.length === 0) {
    throw new SpectrumImportError('no-spectrum-block', 'no XYDATA or PEAK TABLE block with data was found in the JCAMP-DX text');
  }
  return blocks;
}

/** Pick the block to use: the one asked for, else the first continuous block of the technique. */
export function pickJcampBlock(blocks: readonly JcampBlock[], options: ImportOptions): JcampBlock {
  if (options.block !== undefined) {
    const chosen = blocks.find((b) => b.index === options.block);
    if (!chosen) {
      throw new SpectrumImportError(
        'no-spectrum-block',
        `block ${options.block} is not a spectrum block; spectrum blocks are ${blocks.map((b) => b.index).join(', ')}`,
      );
    }
    return chosen;
  }
  const fits = (b: JcampBlock) => !options.technique || b.spectrum.technique === options.technique;
  return blocks.find((b) => fits(b) && b.form === 'xydata') ?? blocks.find(fits) ?? blocks[0];
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
    if (value !== undefined && String(value).length <= 500) meta[key] = String(value);
  }
  return meta;
}
