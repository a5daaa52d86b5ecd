/**
 * Physical constants of the contour model. k/(hc) follows from the exact SI 2019 values of
 * k, h and c; the P–R constant √(8·k/(hc)) = 2.358024 (reference-value file §4.1, COMPUTED;
 * Herzberg, Infrared and Raman Spectra, 1945, quotes 2.358, from memory).
 */

/** Boltzmann constant over hc, in cm⁻¹ per kelvin. */
export const K_OVER_HC_CM1_PER_K = 0.6950348;

/** Δν(P–R maxima) = PR_SEPARATION_CONSTANT · √(B·T), B in cm⁻¹ and T in K. */
export const PR_SEPARATION_CONSTANT = Math.sqrt(8 * K_OVER_HC_CM1_PER_K);
