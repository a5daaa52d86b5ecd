import { K_OVER_HC_CM1_PER_K } from './constants.js';

/** Shape of the molecule's rotor and the band's transition-moment direction. */
export type RotorKind = 'linear' | 'symmetric-top';
/** Parallel (ΔK = 0; Σ–Σ for linear) or perpendicular (ΔK = ±1; Π–Σ for linear) band. */
export type ContourBandType = 'parallel' | 'perpendicular';

/** Molecular parameters of a rotational band, all wavenumbers in cm⁻¹. */
export interface RotorBand {
  readonly rotor: RotorKind;
  readonly band: ContourBandType;
  /** Band centre ν0 (for perpendicular linear bands the constant l² term is absorbed here). */
  readonly bandOriginCm1: number;
  /** Lower-state rotational constant B″. */
  readonly bCm1: number;
  /** Upper-state B′; default B″ (rigid rotor, no band convergence). */
  readonly upperBCm1?: number;
  /** Symmetric top: rotational constant about the figure axis (A prolate, C oblate), lower state. */
  readonly axialCm1?: number;
  /** Symmetric top: the same for the upper state; default the lower value. */
  readonly upperAxialCm1?: number;
  /** Symmetric top, perpendicular band: first-order Coriolis constant ζ of the degenerate upper state. Default 0. */
  readonly zeta?: number;
  /** Relative nuclear-spin weights of even and odd J″ (e.g. ¹²C¹⁶O2: even 1, odd 0). Default 1 and 1. */
  readonly nuclearSpin?: { readonly even: number; readonly odd: number };
}

/** One rotation–vibration line. */
export interface RotationalLine {
  readonly positionCm1: number;
  readonly intensity: number;
  readonly branch: 'P' | 'Q' | 'R';
  readonly lowerJ: number;
  readonly lowerK: number;
}

/**
 * Lines of a rigid-rotor band: positions ν0 + F′(J′,K′) − F″(J″,K″) with F = B·J(J+1) + (A−B)·K²
 * (minus 2Aζ·K′·ΔK for perpendicular bands), intensities Hönl–London factor × nuclear-spin weight
 * × Boltzmann factor exp(−hc·F″/kT) (Herzberg 1945, from memory). Signed K counts the ±K
 * degeneracy. Lines below 1e-6 of the strongest population are left out.
 */
export function rotationalLines(band: RotorBand, temperatureK: number): RotationalLine[] {
  if (!(temperatureK > 0)) throw new RangeError(`temperature must be positive, got ${temperatureK}`);
  if (!(band.bCm1 > 0)) throw new RangeError(`B must be positive, got ${band.bCm1}`);
  const symmetricTop = band.rotor === 'symmetric-top';
  if (symmetricTop && !(band.axialCm1! > 0)) throw new RangeError('a symmetric top needs its axial rotational constant (A or C)');
  const kT = K_OVER_HC_CM1_PER_K * temperatureK;
  const b0 = band.bCm1;
  const b1 = band.upperBCm1 ?? b0;
  const a0 = symmetricTop ? band.axialCm1! : b0;
  const a1 = symmetricTop ? (band.upperAxialCm1 ?? a0) : b1;
  const zeta = band.zeta ?? 0;
  const spin = band.nuclearSpin ?? { even: 1, odd: 1 };
  const lower = (j: number, k: number) => b0 * j * (j + 1) + (a0 - b0) * k * k;
  const upper = (j: number, k: number, dk: number) => b1 * j * (j + 1) + (a1 - b1) * k * k - 2 * a1 * zeta * k * dk;
  // Highest J with a Boltzmann factor above 1e-6 of the peak: B·J² ≈ kT·ln(1e6).
  const jMax = Math.ceil(Math.sqrt((kT * Math.log(1e6)) / b0)) + 2;
  const deltaKs = band.band === 'parallel' ? [0] : [1, -1];
  const lines: RotationalLine[] = [];
  for (let j = 0; j <= jMax; j++) {
    const spinWeight = j % 2 === 0 ? spin.even : spin.odd;
    if (spinWeight === 0) continue;
    const kLimit = symmetricTop ? j : 0;
    for (let k = -kLimit; k <= kLimit; k++) {
      const population = spinWeight * Math.exp(-lower(j, k) / kT);
      if (population < 1e-6) continue;
      for (const dk of deltaKs) {
        const kUpper = k + dk;
        for (const [branch, dj] of [['P', -1], ['Q', 0], ['R', 1]] as const) {
          const jUpper = j + dj;
          if (jUpper < Math.abs(kUpper) || jUpper < 0) continue;
          const strength = honlLondon(branch, j, k, dk, band.band);
          if (!(strength > 0)) continue;
          lines.push({
            positionCm1: band.bandOriginCm1 + upper(jUpper, kUpper, dk) - lower(j, k),
            intensity: strength * population,
            branch,
            lowerJ: j,
            lowerK: k,
          });
        }
      }
    }
  }
  return lines;
}

// Hönl–London factors of a symmetric top (linear molecules are the K = 0 case); relative
// values within one band type (Herzberg 1945, from memory).
function honlLondon(branch: 'P' | 'Q' | 'R', j: number, k: number, dk: number, type: ContourBandType): number {
  if (type === 'parallel') {
    if (branch === 'R') return ((j + 1) ** 2 - k * k) / (j + 1);
    if (branch === 'P') return j === 0 ? 0 : (j * j - k * k) / j;
    return j === 0 ? 0 : ((2 * j + 1) * k * k) / (j * (j + 1));
  }
  const m = dk * k;
  if (branch === 'R') return ((j + 2 + m) * (j + 1 + m)) / (j + 1);
  if (branch === 'P') return j === 0 ? 0 : ((j - 1 - m) * (j - m)) / j;
  return j === 0 ? 0 : ((j + 1 + m) * (j - m) * (2 * j + 1)) / (j * (j + 1));
}
