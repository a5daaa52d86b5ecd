import { fromJSON } from 'convert-to-jcamp';
import { isUniform } from './axis.js';
import type { Spectrum } from './types.js';

const JCAMP_Y_UNITS = { absorbance: 'ABSORBANCE', transmittance: 'TRANSMITTANCE', intensity: 'ARBITRARY UNITS' } as const;
const CSV_Y_HEADER = { absorbance: 'Absorbance', transmittance: 'Transmittance (fraction)', intensity: 'Intensity' } as const;

/**
 * Write a scan as JCAMP-DX 4.24 text, XYDATA in DIFDUP compression (the axis must be uniform,
 * as processScan's output is). Extra entries (e.g. the processing parameters as JSON) become
 * private ##$ labels.
 */
export function spectrumToJcamp(spectrum: Spectrum, extraMeta: Readonly<Record<string, string>> = {}): string {
  if (!isUniform(spectrum.xCm1)) {
    throw new RangeError('JCAMP-DX XYDATA needs a uniform axis; resample the scan first (resampleUniform)');
  }
  const raman = spectrum.technique === 'raman';
  const meta: Record<string, string> = { ...extraMeta };
  if (spectrum.excitationNm !== undefined) meta['LASER WAVELENGTH'] = String(spectrum.excitationNm);
  return fromJSON(
    { x: Array.from(spectrum.xCm1), y: Array.from(spectrum.y) },
    {
      info: {
        title: spectrum.title ?? 'Siteband scan',
        dataType: raman ? 'RAMAN SPECTRUM' : 'INFRARED SPECTRUM',
        xUnits: '1/CM',
        yUnits: JCAMP_Y_UNITS[spectrum.ordinate],
      },
      meta,
      xyEncoding: 'DIFDUP',
    },
  );
}

/** Write a scan as comma-separated text with a header our importer reads back. */
export function spectrumToCsv(spectrum: Spectrum): string {
  const xHeader = spectrum.technique === 'raman' ? 'Raman shift (cm-1)' : 'Wavenumber (cm-1)';
  const lines = [`${xHeader},${CSV_Y_HEADER[spectrum.ordinate]}`];
  // Shortest round-trip representation of each double, so nothing is lost on re-import.
  for (let i = 0; i < spectrum.xCm1.length; i++) lines.push(`${spectrum.xCm1[i]},${spectrum.y[i]}`);
  return `${lines.join('\n')}\n`;
}
