import type { Technique } from './types.js';
import type { XUnit, YUnit } from './units.js';

/** Default largest file accepted: 20 MiB, far above any handheld scan (a few hundred kB). */
export const DEFAULT_MAX_IMPORT_BYTES = 20 * 1024 * 1024;

/** Default fewest points a scan must have to be worth processing. */
export const DEFAULT_MIN_POINTS = 16;

/** Options of importSpectrum; everything may be omitted. */
export interface ImportOptions {
  /** Name of the file, used to tell JCAMP-DX (.jdx, .dx, .jcamp) from delimited text. */
  fileName?: string;
  /** Technique the scan is expected to be; a file of the other technique is refused. */
  technique?: Technique;
  /** Raman excitation wavelength in nm; needed when the axis is a wavelength or absolute wavenumber. */
  excitationNm?: number;
  /** Largest input accepted, in bytes (characters for text). Default 20 MiB. */
  maxBytes?: number;
  /** Fewest points accepted. Default 16 (peak tables are exempt). */
  minPoints?: number;
  /** Force the x unit instead of reading it from the header or XUNITS. */
  xUnit?: XUnit;
  /** Force the y unit instead of reading it from the header or YUNITS. */
  yUnit?: YUnit;
  /** 0-based index of the JCAMP-DX block to take; default the first block that fits the technique. */
  block?: number;
}
