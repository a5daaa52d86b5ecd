/**
 * Types shared by the spectrum pipeline and the identification: a spectrum on a wavenumber
 * axis, the peaks picked from it, and the quality verdict that gates any ranking.
 */

/** The two techniques a handheld instrument offers. */
export type Technique = 'ir' | 'raman';

/** Where the sample was measured: a liquid, solid or film, or a gas cell. */
export type Phase = 'condensed' | 'gas';

/** What the ordinate means once imported. */
export type OrdinateKind = 'absorbance' | 'transmittance' | 'intensity';

/**
 * A spectrum on a wavenumber axis in cm⁻¹ (IR: wavenumber; Raman: Raman shift), ascending and
 * finite. The importer converts every other axis and unit into this form.
 */
export interface Spectrum {
  readonly xCm1: Float64Array;
  readonly y: Float64Array;
  readonly ordinate: OrdinateKind;
  readonly technique?: Technique;
  /** Raman excitation wavelength in nm, carried with the scan (e.g. 785 or 1064). */
  readonly excitationNm?: number;
  readonly title?: string;
  /** Free metadata from the file (instrument, date, resolution…), as read. */
  readonly meta?: Readonly<Record<string, string>>;
}

/** One picked peak: position in cm⁻¹, height above the baseline, full width at half maximum in cm⁻¹. */
export interface Peak {
  readonly x: number;
  readonly height: number;
  readonly widthCm1: number;
  /** Height relative to the tallest peak of the scan, 0–1. */
  readonly relativeHeight: number;
}

/** Why a peak is kept apart from the sample's bands. */
export type PeakFlag = 'atmospheric-co2' | 'water-vapour' | 'atr-diamond';

/** A peak that is probably not the sample's own: atmospheric residue or the ATR crystal. */
export interface FlaggedPeak extends Peak {
  readonly flag: PeakFlag;
  /** A sentence saying why, for the scan view. */
  readonly reason: string;
}

/** Whether a processed scan can be trusted for identification, and why not. */
export interface ScanQuality {
  /** Tallest sample peak divided by the robust noise level. */
  readonly snr: number;
  /** The detector clipped (flat top at the maximum). */
  readonly saturated: boolean;
  /** Cosmic-ray spikes replaced (Raman only; 0 for IR). */
  readonly spikesRemoved: number;
  /** False when the scan is too weak, saturated or shows too few peaks; reasons say which. */
  readonly reliable: boolean;
  readonly reasons: readonly string[];
}
