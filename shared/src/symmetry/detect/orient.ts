/** Places the centred structure in the standard frame and checks the whole group on it. */
import type { Mat3, Vec3 } from '../types.js';
import { apply, mul } from '../mat3.js';
import { AtomMatcher } from '../atom-matcher.js';
import { polishFrame } from './align.js';

/** The structure in the standard frame with every operation's permutation of the atoms. */
export interface Oriented {
  readonly rotation: Mat3;
  readonly positions: Vec3[];
  readonly permutations: number[][];
  readonly maxDeviation: number;
}

/**
 * Rotates by `frame`; if some operation misses by more than half the tolerance, polishes the frame
 * by the best-fit rotation first. Throws RangeError when the group does not hold within the tolerance.
 */
export function orientAndVerify(centred: readonly Vec3[], kinds: readonly string[], frame: Mat3, operations: readonly Mat3[], name: string, tolerance: number): Oriented {
  let rotation = frame;
  let positions = centred.map((p) => apply(frame, p));
  let match = new AtomMatcher(positions, kinds, tolerance).permutationsFor(operations);
  if (match.permutations && match.maxDeviation > tolerance / 2) {
    rotation = mul(polishFrame(positions, operations, match.permutations), frame);
    positions = centred.map((p) => apply(rotation, p));
    match = new AtomMatcher(positions, kinds, tolerance).permutationsFor(operations);
  }
  if (!match.permutations || match.maxDeviation > tolerance) {
    const miss = match.permutations ? `${match.maxDeviation.toFixed(3)} Å` : `more than ${(3 * tolerance).toFixed(2)} Å`;
    throw new RangeError(
      `the structure is only approximately ${name}: an operation moves an atom ${miss} from its partner (tolerance ${tolerance} Å); check the geometry or change the tolerance`,
    );
  }
  return { rotation, positions, permutations: match.permutations, maxDeviation: match.maxDeviation };
}
