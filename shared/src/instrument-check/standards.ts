import type { ReferenceBand, ReferenceStandard } from './standard.js';

// Positions and tolerances come from the project's reference-value file, §1 (sources and
// confidence tags as given there). The JSON copies under fixtures/standards/ are checked
// against these by a test.

const EP_SOURCE = 'Ph. Eur. 2.2.24 / JP (Suppl. 1 to JP14), read on secondary pages quoting the pharmacopoeias';
const E1840 = 'ASTM E1840-96 (reapproved 2007/2022), Standard Guide for Raman Shift Standards for Spectrometer Calibration';
const HANDHELD_TOLERANCE =
  'common practice: handheld Raman wavenumber tolerances (EP 2.2.48, USP <858>) were not verified; ±2.0 cm⁻¹ chosen, settable';

function irBands(tolerances: Record<number, number>, toleranceSource: string): ReferenceBand[] {
  return [3060.0, 2849.5, 1942.9, 1601.2, 1583.0, 1154.5, 1028.3].map((positionCm1) => ({
    positionCm1,
    positionSource: EP_SOURCE,
    positionConfidence: 'READ-2nd',
    toleranceCm1: tolerances[positionCm1] ?? 1.0,
    toleranceSource,
    toleranceConfidence: 'READ-2nd',
  }));
}

function ramanBands(
  positions: readonly number[],
  sigmas: readonly (number | undefined)[],
  positionSource: string,
  positionConfidence: 'READ-2nd' | 'MEMORY',
): ReferenceBand[] {
  return positions.map((positionCm1, i) => ({
    positionCm1,
    positionSource,
    positionConfidence,
    toleranceCm1: 2.0,
    toleranceSource: HANDHELD_TOLERANCE,
    toleranceConfidence: 'common practice',
    ...(sigmas[i] !== undefined ? { sigmaCm1: sigmas[i] } : {}),
  }));
}

/** The reference standards the instrument check knows, by id. */
export const REFERENCE_STANDARDS: readonly ReferenceStandard[] = [
  {
    id: 'ir-polystyrene-ep-ft',
    name: 'Polystyrene film, mid-IR (FT instruments)',
    technique: 'ir',
    bands: irBands({}, 'Ph. Eur. 5.0 (FT instruments): ±1.0 cm⁻¹ for every band'),
    toleranceBasis: 'published',
    searchWindowCm1: 8,
    notes: [
      'Measure the film in transmission: the 1942.9 cm⁻¹ band lies in the diamond ATR absorption region.',
      'EP resolution test (FT, about 35 µm film): A(2849.5) − A(2870 min) > 0.33 and A(1583) − A(1589 min) > 0.08 (EP 5.0, read).',
    ],
  },
  {
    id: 'ir-polystyrene-ep4-jp',
    name: 'Polystyrene film, mid-IR (EP 4.0 / JP tolerances)',
    technique: 'ir',
    bands: irBands({ 3060.0: 1.5, 2849.5: 1.5, 1942.9: 1.5 }, 'Ph. Eur. 4.0 and JP: ±1.5 cm⁻¹ (3060.0, 2849.5, 1942.9), ±1.0 cm⁻¹ (others)'),
    toleranceBasis: 'published',
    searchWindowCm1: 8,
    notes: ['Measure the film in transmission: the 1942.9 cm⁻¹ band lies in the diamond ATR absorption region.'],
  },
  {
    id: 'raman-polystyrene-astm-e1840',
    name: 'Polystyrene, Raman shift',
    technique: 'raman',
    bands: ramanBands(
      [620.9, 795.8, 1001.4, 1031.8, 1155.3, 1450.5, 1583.1, 1602.3, 2852.4, 2904.5, 3054.3],
      [0.69, 0.78, 0.54, 0.43, 0.56, 0.56, 0.86, 0.73, 0.81, 0.67, 1.07],
      `${E1840}; positions read in h2020charisma/ramanchada2 src/ramanchada2/misc/constants.py (PST_RS_dict); σ from memory of E1840`,
      'READ-2nd',
    ),
    toleranceBasis: 'common practice',
    searchWindowCm1: 8,
    notes: ['The σ values are from memory of ASTM E1840 and are informative only.'],
  },
  {
    id: 'raman-cyclohexane-astm-e1840',
    name: 'Cyclohexane, Raman shift',
    technique: 'raman',
    bands: ramanBands(
      [384.1, 426.3, 801.3, 1028.3, 1157.6, 1266.4, 1444.4, 2664.4, 2852.9, 2923.8, 2938.3],
      [0.78, 0.41, 0.96, 0.45, 0.94, 0.58, 0.3, 0.42, 0.32, 0.36, 0.51],
      `${E1840}, from memory (positions high confidence, σ medium)`,
      'MEMORY',
    ),
    toleranceBasis: 'common practice',
    searchWindowCm1: 8,
    notes: [
      'Band positions depend on temperature (Pelletier, Appl. Spectrosc. 53, 1087 (1999), read); measure near room temperature.',
      'Cyclohexane is highly flammable: keep the laser power low, follow the SDS.',
    ],
  },
  {
    id: 'raman-paracetamol-astm-e1840',
    name: '4-Acetamidophenol (paracetamol), Raman shift',
    technique: 'raman',
    bands: ramanBands(
      [
        213.3, 329.2, 390.9, 465.1, 504.0, 651.6, 710.8, 797.2, 834.5, 857.9, 968.7, 1105.5, 1168.5, 1236.8, 1278.5, 1323.9, 1371.5,
        1515.1, 1561.5, 1648.4, 2931.1, 3064.6, 3102.4, 3326.6,
      ],
      [],
      `${E1840}, from memory (medium confidence)`,
      'MEMORY',
    ),
    toleranceBasis: 'common practice',
    searchWindowCm1: 8,
    notes: ['Positions are from memory of ASTM E1840; confirm against the standard before relying on a failure.'],
  },
];

/** Look a reference standard up by id; throws a RangeError naming the known ids. */
export function referenceStandard(id: string): ReferenceStandard {
  const standard = REFERENCE_STANDARDS.find((s) => s.id === id);
  if (!standard) throw new RangeError(`unknown reference standard "${id}"; known: ${REFERENCE_STANDARDS.map((s) => s.id).join(', ')}`);
  return standard;
}
