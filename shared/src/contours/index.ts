/** Gas-phase rotational band contours: simulation, recognition of P/R and P/Q/R shapes, temperature from the P–R separation. */
export { K_OVER_HC_CM1_PER_K, PR_SEPARATION_CONSTANT } from './constants.js';
export { prSeparationCm1, temperatureFromPrSeparation } from './temperature.js';
export { rotationalLines, type RotorBand, type RotorKind, type ContourBandType, type RotationalLine } from './lines.js';
export { convolveLines, type ProfileOptions, type LineShape } from './profile.js';
export { simulateContour, type ContourOptions, type SimulatedContour } from './simulate.js';
export { analyseContour, type ContourAnalysis, type ContourAnalysisOptions } from './recognise.js';
