import type { FlaggedPeak, Peak, PeakFlag, Phase, Technique } from './types.js';

/** A wavenumber range where peaks may come from something other than the sample. */
export interface InterferenceRegion {
  readonly flag: PeakFlag;
  readonly fromCm1: number;
  readonly toCm1: number;
  /** Only peaks narrower than this FWHM are flagged (sharp gas lines); Infinity flags all. */
  readonly maxWidthCm1: number;
  /**
   * A peak at least this tall (relative to the scan's tallest) and at least keepWidthCm1 wide
   * is the sample's own band even inside the region. Default: never kept.
   */
  readonly keepRelativeHeight?: number;
  readonly keepWidthCm1?: number;
  readonly reason: string;
}

/** Options of {@link interferenceRegions}. */
export interface InterferenceOptions {
  /** Narrowest FWHM of a condensed-phase band; narrower peaks in water-vapour regions are taken as gas lines. Default 6 cm⁻¹. */
  gasLineMaxWidthCm1?: number;
  /**
   * Gas cells: a peak in a CO2 region at least this tall relative to the tallest is the sample's
   * CO2 (the user is measuring the gas); weaker ones are taken as residue of the air path. Default 0.1.
   */
  gasCo2MinRelativeHeight?: number;
  /**
   * Condensed scans: a peak in the 2280–2400 cm⁻¹ region at least this tall relative to the
   * tallest and at least condensedBandMinWidthCm1 wide is the sample's (a nitrile or isocyanate
   * band reaching in). Default 0.3.
   */
  condensedBandMinRelativeHeight?: number;
  /**
   * Broader than either branch of residual atmospheric CO2 at handheld resolution (each about
   * 10–20 cm⁻¹ wide, common practice). Default 25 cm⁻¹.
   */
  condensedBandMinWidthCm1?: number;
}

/** Interference defaults. */
export const DEFAULT_INTERFERENCE: Required<InterferenceOptions> = {
  gasLineMaxWidthCm1: 6,
  gasCo2MinRelativeHeight: 0.1,
  condensedBandMinRelativeHeight: 0.3,
  condensedBandMinWidthCm1: 25,
};

/**
 * The regions to watch for one IR scan (Raman scans have none here). Ranges are common
 * practice: atmospheric CO2 antisymmetric stretch about 2300–2400 cm⁻¹ (band origin 2349.1,
 * REFERENCES §2.1) and its bend near 667 cm⁻¹; water-vapour rotation–vibration lines about
 * 1300–1900 and 3500–3900 cm⁻¹; diamond ATR crystal absorption about 1900–2300 cm⁻¹.
 * In a gas cell strong CO2 bands are the sample's, so only weak ones are set apart; in a
 * condensed scan a strong band broader than the atmospheric branches is kept as the sample's.
 */
export function interferenceRegions(
  technique: Technique,
  phase: Phase,
  atr: boolean,
  options: InterferenceOptions = {},
): InterferenceRegion[] {
  if (technique !== 'ir') return [];
  const settings = { ...DEFAULT_INTERFERENCE, ...options };
  const { gasLineMaxWidthCm1 } = settings;
  const gas = phase === 'gas';
  const weakInGasCell = { keepRelativeHeight: settings.gasCo2MinRelativeHeight, keepWidthCm1: 0 };
  const regions: InterferenceRegion[] = gas
    ? [
        { flag: 'atmospheric-co2', fromCm1: 2280, toCm1: 2400, maxWidthCm1: Infinity, ...weakInGasCell, reason: 'weak band in the CO2 region of a gas cell (2280–2400 cm⁻¹): taken as air-path residue' },
        { flag: 'atmospheric-co2', fromCm1: 655, toCm1: 680, maxWidthCm1: Infinity, ...weakInGasCell, reason: 'weak line at the CO2 bend (~667 cm⁻¹) of a gas cell: taken as air-path residue' },
      ]
    : [
        {
          flag: 'atmospheric-co2',
          fromCm1: 2280,
          toCm1: 2400,
          maxWidthCm1: Infinity,
          keepRelativeHeight: settings.condensedBandMinRelativeHeight,
          keepWidthCm1: settings.condensedBandMinWidthCm1,
          reason: 'atmospheric CO2 region (2280–2400 cm⁻¹)',
        },
        { flag: 'atmospheric-co2', fromCm1: 655, toCm1: 680, maxWidthCm1: gasLineMaxWidthCm1, reason: 'sharp line at the CO2 bend (~667 cm⁻¹)' },
      ];
  // In a gas cell the sample's own lines are as sharp as water's, so width cannot tell them apart.
  if (!gas) {
    regions.push(
      { flag: 'water-vapour', fromCm1: 1300, toCm1: 1900, maxWidthCm1: gasLineMaxWidthCm1, reason: 'sharp line in the water-vapour region (1300–1900 cm⁻¹)' },
      { flag: 'water-vapour', fromCm1: 3500, toCm1: 3900, maxWidthCm1: gasLineMaxWidthCm1, reason: 'sharp line in the water-vapour region (3500–3900 cm⁻¹)' },
    );
  }
  if (atr) {
    regions.push({ flag: 'atr-diamond', fromCm1: 1900, toCm1: 2300, maxWidthCm1: Infinity, reason: 'diamond ATR crystal absorption (1900–2300 cm⁻¹)' });
  }
  return regions;
}

/** Split peaks into the sample's and those flagged by a region (first matching region wins). */
export function separateFlaggedPeaks(
  peaks: readonly Peak[],
  regions: readonly InterferenceRegion[],
): { peaks: Peak[]; flaggedPeaks: FlaggedPeak[] } {
  const kept: Peak[] = [];
  const flaggedPeaks: FlaggedPeak[] = [];
  for (const peak of peaks) {
    const region = regions.find((r) => peak.x >= r.fromCm1 && peak.x <= r.toCm1 && peak.widthCm1 < r.maxWidthCm1 && !isSampleBand(peak, r));
    if (region) flaggedPeaks.push({ ...peak, flag: region.flag, reason: region.reason });
    else kept.push(peak);
  }
  return { peaks: kept, flaggedPeaks };
}

// A peak strong and broad enough to be the sample's own band despite sitting in the region.
function isSampleBand(peak: Peak, region: InterferenceRegion): boolean {
  if (region.keepRelativeHeight === undefined) return false;
  return peak.relativeHeight >= region.keepRelativeHeight && peak.widthCm1 >= (region.keepWidthCm1 ?? 0);
}
