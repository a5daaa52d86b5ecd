/** Reads the geometric element (axis, plane, angle) of an orthogonal 3×3 operation matrix. */
import type { Mat3, Vec3 } from './types.js';
import type { OperationElement } from './group-types.js';
import { det, IDENTITY, INVERSION, maxDiff, normalize, scale, trace } from './mat3.js';

const EPS = 1e-6;

/** Smallest n (≤ 120) with angle = 2π·k/n, and that k. */
export function angleFraction(angle: number): { order: number; power: number } {
  const turns = angle / (2 * Math.PI);
  for (let n = 1; n <= 120; n++) {
    const k = Math.round(turns * n);
    if (Math.abs(turns * n - k) < 1e-6) return { order: n, power: k };
  }
  throw new RangeError(`angle ${angle} is not a rational fraction of a turn`);
}

/** Axis and angle in [0, π] of a proper rotation. */
function axisAngle(r: Mat3): { axis: Vec3; angle: number } {
  const angle = Math.acos(Math.max(-1, Math.min(1, (trace(r) - 1) / 2)));
  const s: Vec3 = [r[7] - r[5], r[2] - r[6], r[3] - r[1]];
  if (Math.hypot(...s) > 1e-4) return { axis: normalize(s), angle };
  // Half turn: R + I = 2aaᵀ; the column with the largest diagonal entry is along a.
  const d = [r[0] + 1, r[4] + 1, r[8] + 1];
  const j = d.indexOf(Math.max(...d));
  const col: Vec3 = [r[j] + (j === 0 ? 1 : 0), r[3 + j] + (j === 1 ? 1 : 0), r[6 + j] + (j === 2 ? 1 : 0)];
  return { axis: normalize(col), angle };
}

/** The element of an operation: E, i, Cn^k about an axis, σ with its normal, or Sn^k about an axis. */
export function describeOperation(r: Mat3): OperationElement {
  if (maxDiff(r, IDENTITY) < EPS) return { kind: 'E' };
  if (maxDiff(r, INVERSION) < EPS) return { kind: 'i' };
  if (det(r) > 0) {
    const { axis, angle } = axisAngle(r);
    return { kind: 'C', ...angleFraction(angle), axis };
  }
  const { axis, angle } = axisAngle(scale(r, -1));
  if (Math.abs(angle - Math.PI) < EPS) return { kind: 'σ', axis };
  // −Rot(a, β) = σ(a)·Rot(a, β + π); report the improper angle in (0, π] by flipping the axis if needed.
  let s = angle + Math.PI;
  let a = axis;
  if (s > Math.PI + EPS) {
    s = 2 * Math.PI - s;
    a = [-axis[0], -axis[1], -axis[2]];
  }
  return { kind: 'S', ...angleFraction(s), axis: a };
}
