import { rotationalLines, type RotationalLine, type RotorBand } from './lines.js';
import { convolveLines, type ProfileOptions } from './profile.js';

/** Options of {@link simulateContour}: the band, its temperature and the instrument. */
export interface ContourOptions extends RotorBand, ProfileOptions {
  readonly temperatureK: number;
}

/** A simulated gas-phase band contour with the lines it was built from. */
export interface SimulatedContour {
  readonly xCm1: Float64Array;
  readonly y: Float64Array;
  readonly lines: readonly RotationalLine[];
}

/** Simulate a rotation–vibration band contour of a linear molecule or symmetric top at temperature T, seen at a given resolution. */
export function simulateContour(options: ContourOptions): SimulatedContour {
  const lines = rotationalLines(options, options.temperatureK);
  return { ...convolveLines(lines, options), lines };
}
