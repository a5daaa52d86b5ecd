import { AxisOrderError, xyAscending } from './axis.js';
import { SpectrumImportError, type SpectrumImportErrorLocation } from './import-error.js';
import type { OrdinateKind, Spectrum, Technique } from './types.js';
import {
  nmToCm1,
  ramanShiftFromAbsoluteCm1,
  ramanShiftFromWavelengthNm,
  umToCm1,
  type XUnit,
  type YUnit,
} from './units.js';

/** Raw columns read from a file, before unit conversion. */
export interface RawColumns {
  readonly x: ArrayLike<number>;
  readonly y: ArrayLike<number>;
  readonly xUnit: XUnit;
  readonly yUnit: YUnit;
  readonly technique?: Technique;
  readonly excitationNm?: number;
  readonly title?: string;
  readonly meta?: Record<string, string>;
  readonly minPoints: number;
  readonly where?: SpectrumImportErrorLocation;
}

// Plausible ranges (cm⁻¹) of each technique's axis once converted; values outside mean the
// units were misread (e.g. a wavelength file labelled as wavenumbers). Common practice bounds:
// IR from far-IR to near-IR, Raman shifts including the anti-Stokes side.
const PLAUSIBLE_CM1: Record<Technique, readonly [number, number]> = {
  ir: [10, 15000],
  raman: [-5000, 5000],
};

/** Turn raw columns into a validated Spectrum: units converted, ascending, finite, enough points. */
export function assembleSpectrum(raw: RawColumns): Spectrum {
  const where = raw.where ?? {};
  const technique = raw.technique ?? inferTechnique(raw.xUnit, raw.yUnit);
  checkTechnique(technique, raw.xUnit, raw.yUnit, where);
  if (raw.x.length < raw.minPoints) {
    throw new SpectrumImportError(
      'too-few-points',
      `the scan has ${raw.x.length} points; at least ${raw.minPoints} are needed`,
      where,
    );
  }
  const x = convertX(raw.x, raw.xUnit, technique, raw.excitationNm, where);
  const { y, ordinate } = convertY(raw.y, raw.yUnit, where);
  let sorted: { x: Float64Array; y: Float64Array };
  try {
    sorted = xyAscending(x, y);
  } catch (error) {
    if (error instanceof AxisOrderError) {
      throw new SpectrumImportError('duplicate-x', `${error.message}, so it cannot be sorted`, where);
    }
    throw error;
  }
  if (technique) {
    const [lo, hi] = PLAUSIBLE_CM1[technique];
    const first = sorted.x[0];
    const last = sorted.x[sorted.x.length - 1];
    if (first < lo || last > hi) {
      throw new SpectrumImportError(
        'implausible-axis',
        `the ${technique === 'ir' ? 'wavenumber' : 'Raman shift'} axis runs ${first.toFixed(2)}–${last.toFixed(2)} cm⁻¹, ` +
          `outside ${lo}–${hi} cm⁻¹; check the x units`,
        where,
      );
    }
  }
  return {
    xCm1: sorted.x,
    y: sorted.y,
    ordinate,
    ...(technique ? { technique } : {}),
    ...(raw.excitationNm !== undefined ? { excitationNm: raw.excitationNm } : {}),
    ...(raw.title ? { title: raw.title } : {}),
    ...(raw.meta && Object.keys(raw.meta).length > 0 ? { meta: raw.meta } : {}),
  };
}

function inferTechnique(xUnit: XUnit, yUnit: YUnit): Technique | undefined {
  if (xUnit === 'raman-shift-cm-1') return 'raman';
  if (yUnit === 'absorbance' || yUnit.startsWith('transmittance')) return 'ir';
  return undefined;
}

function checkTechnique(technique: Technique | undefined, xUnit: XUnit, yUnit: YUnit, where: SpectrumImportErrorLocation): void {
  if (technique === 'ir' && xUnit === 'raman-shift-cm-1') {
    throw new SpectrumImportError('technique-mismatch', 'the file holds a Raman shift axis but an IR scan was expected', where);
  }
  if (technique === 'ir' && yUnit === 'intensity') {
    throw new SpectrumImportError(
      'technique-mismatch',
      'an IR scan must be absorbance or transmittance, but the file holds intensity or counts (a Raman or single-beam file?)',
      where,
    );
  }
  if (technique === 'raman' && yUnit !== 'intensity') {
    throw new SpectrumImportError(
      'technique-mismatch',
      `a Raman scan must be intensity or counts, but the file holds ${yUnit.replace('-', ' ')} (an IR file?)`,
      where,
    );
  }
}

function convertX(
  x: ArrayLike<number>,
  unit: XUnit,
  technique: Technique | undefined,
  excitationNm: number | undefined,
  where: SpectrumImportErrorLocation,
): Float64Array {
  const out = new Float64Array(x.length);
  const ramanFromLight = technique === 'raman' && (unit === 'wavelength-nm' || unit === 'absolute-cm-1' || unit === 'wavelength-um');
  if (ramanFromLight && !(excitationNm !== undefined && excitationNm > 0)) {
    throw new SpectrumImportError(
      'missing-excitation',
      'the Raman axis is a wavelength or absolute wavenumber; give the excitation wavelength (nm) to compute the Raman shift',
      where,
    );
  }
  for (let i = 0; i < x.length; i++) {
    const v = x[i];
    if (!Number.isFinite(v)) throw new SpectrumImportError('non-finite', `x value ${i + 1} is ${v}`, where);
    if ((unit === 'wavelength-nm' || unit === 'wavelength-um') && !(v > 0)) {
      throw new SpectrumImportError('implausible-axis', `wavelength ${v} at point ${i + 1} is not positive`, where);
    }
    let cm1: number;
    if (unit === 'wavelength-nm') cm1 = nmToCm1(v);
    else if (unit === 'wavelength-um') cm1 = umToCm1(v);
    else cm1 = v;
    if (ramanFromLight) {
      cm1 = unit === 'wavelength-nm' ? ramanShiftFromWavelengthNm(v, excitationNm!) : ramanShiftFromAbsoluteCm1(cm1, excitationNm!);
    }
    out[i] = cm1;
  }
  return out;
}

function convertY(y: ArrayLike<number>, unit: YUnit, where: SpectrumImportErrorLocation): { y: Float64Array; ordinate: OrdinateKind } {
  const out = new Float64Array(y.length);
  let max = -Infinity;
  for (let i = 0; i < y.length; i++) {
    const v = y[i];
    if (!Number.isFinite(v)) throw new SpectrumImportError('non-finite', `y value ${i + 1} is ${v}`, where);
    out[i] = v;
    if (v > max) max = v;
  }
  // "Transmittance" without a % sign is often still given in percent: values above 1.5
  // cannot be a fraction (common practice threshold, allowing for noise above 100 %).
  if (unit === 'transmittance-percent' || (unit === 'transmittance-fraction' && max > 1.5)) {
    for (let i = 0; i < out.length; i++) out[i] /= 100;
  }
  const ordinate: OrdinateKind = unit === 'absorbance' ? 'absorbance' : unit === 'intensity' ? 'intensity' : 'transmittance';
  return { y: out, ordinate };
}
