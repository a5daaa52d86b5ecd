/**
 * Class columns of the axial families in the column order of Cotton, *Chemical Applications of Group
 * Theory*, 3rd ed., Appendix IIA (from memory): rotations about z by increasing angle, then the
 * perpendicular C2 or vertical planes, then (for products with i or σh) the same list multiplied through.
 */
import type { Mat3 } from './types.js';
import type { ClassSpec } from './group-spec.js';
import { improper, mul, reflection, rotation } from './mat3.js';
import { angleFraction } from './operation-element.js';

const Z = [0, 0, 1] as const;
const SUP: Record<string, string> = { 0: '⁰', 1: '¹', 2: '²', 3: '³', 4: '⁴', 5: '⁵', 6: '⁶', 7: '⁷', 8: '⁸', 9: '⁹' };
const sup = (k: number) => (k === 1 ? '' : String(k).replace(/\d/g, (d) => SUP[d]));

/** Rotation by 2πk/n about z. */
const cz = (n: number, k = 1): Mat3 => rotation(Z, (2 * Math.PI * k) / n);

/** The symbol of an operation about z (`C3²`, `S6⁵`, `σh`, `i`); `paired` uses the smaller power of an R, R⁻¹ class. */
function axialSymbol(op: Mat3, paired: boolean): string {
  if (!(op[0] * op[4] - op[1] * op[3] > 0)) throw new RangeError('axialSymbol needs an operation about z');
  // In-plane part is a rotation, so the operation is proper exactly when it keeps +z.
  const proper = op[8] > 0;
  let theta = Math.atan2(op[3], op[0]);
  if (theta < -1e-9) theta += 2 * Math.PI;
  const { order, power } = angleFraction(theta);
  if (proper) {
    if (power === 0) return 'E';
    return `C${order}${sup(paired ? Math.min(power, order - power) : power)}`;
  }
  if (power === 0) return 'σh';
  if (order === 2) return 'i';
  // Sn^k with n odd needs k odd (period 2n); with n even k is odd already.
  const k = power % 2 === 0 ? power + order : power;
  const period = order % 2 === 0 ? order : 2 * order;
  return `S${order}${sup(paired ? Math.min(k, period - k) : k)}`;
}

/** One class per rotation C_n^k, k = 0 … n−1 (abelian Cn). */
export function cyclicClasses(n: number): ClassSpec[] {
  return Array.from({ length: n }, (_, k) => ({ label: axialSymbol(cz(n, k), false), size: 1, representative: cz(n, k) }));
}

/** One class per power of S_{2n}: S2n^k, k = 0 … 2n−1 (S4, S8). */
export function improperCyclicClasses(twoN: number): ClassSpec[] {
  return Array.from({ length: twoN }, (_, k) => {
    const op = k % 2 === 0 ? cz(twoN, k) : improper(Z, (2 * Math.PI * k) / twoN);
    return { label: axialSymbol(op, false), size: 1, representative: op };
  });
}

/** E, then the pair classes 2C_n^k (k ≤ n/2; the half turn alone). */
function rotationPairs(n: number): ClassSpec[] {
  const out: ClassSpec[] = [{ label: 'E', size: 1, representative: cz(n, 0) }];
  for (let k = 1; k <= Math.floor(n / 2); k++) {
    const single = 2 * k === n;
    out.push({ label: `${single ? '' : '2'}${axialSymbol(cz(n, k), true)}`, size: single ? 1 : 2, representative: cz(n, k) });
  }
  return out;
}

/** A direction in the xy plane at angle a from x. */
const inPlane = (a: number) => [Math.cos(a), Math.sin(a), 0] as const;

/** Cnv: E, 2Cn^k, then σv (one contains x: the xz plane) and, for even n, σd. */
export function cnvClasses(n: number): ClassSpec[] {
  const sv = reflection(inPlane(Math.PI / 2));
  const sd = reflection(inPlane(Math.PI / 2 + Math.PI / n));
  if (n === 2) {
    return [...rotationPairs(2), { label: 'σv(xz)', size: 1, representative: sv }, { label: 'σv′(yz)', size: 1, representative: sd }];
  }
  if (n % 2 === 1) return [...rotationPairs(n), { label: `${n}σv`, size: n, representative: sv }];
  return [...rotationPairs(n), { label: `${n / 2}σv`, size: n / 2, representative: sv }, { label: `${n / 2}σd`, size: n / 2, representative: sd }];
}

/** Dn: E, 2Cn^k, then the C2 axes ⟂ z (C2′ along x; for even n, C2″ between them). */
export function dnClasses(n: number): ClassSpec[] {
  const c2x = rotation(inPlane(0), Math.PI);
  const c2b = rotation(inPlane(Math.PI / n), Math.PI);
  if (n === 2) {
    return [
      { label: 'E', size: 1, representative: cz(1, 0) },
      { label: 'C2(z)', size: 1, representative: cz(2) },
      { label: 'C2(y)', size: 1, representative: rotation([0, 1, 0], Math.PI) },
      { label: 'C2(x)', size: 1, representative: c2x },
    ];
  }
  if (n % 2 === 1) return [...rotationPairs(n), { label: `${n}C2`, size: n, representative: c2x }];
  return [...rotationPairs(n), { label: `${n / 2}C2′`, size: n / 2, representative: c2x }, { label: `${n / 2}C2″`, size: n / 2, representative: c2b }];
}

/** Even-n Dnd: E, 2S2n^k (k = 1 … n−1), C2, nC2′ (one along x), nσd (bisecting neighbouring C2′). */
export function dndEvenClasses(n: number): ClassSpec[] {
  const out: ClassSpec[] = [{ label: 'E', size: 1, representative: cz(1, 0) }];
  for (let k = 1; k < n; k++) {
    const op = k % 2 === 0 ? cz(2 * n, k) : improper(Z, (Math.PI * k) / n);
    out.push({ label: `2${axialSymbol(op, true)}`, size: 2, representative: op });
  }
  out.push(
    { label: 'C2', size: 1, representative: cz(2) },
    { label: `${n}C2′`, size: n, representative: rotation(inPlane(0), Math.PI) },
    { label: `${n}σd`, size: n, representative: reflection(inPlane(Math.PI / 2 + Math.PI / (2 * n))) },
  );
  return out;
}

/**
 * The classes of a base group followed by `extra` (i or σh) times each, labelled by their geometry;
 * `planeLabels` names the vertical-plane classes that multiplication produces (σv, σd, σ(xz) …) in order.
 */
export function cosetClasses(base: readonly ClassSpec[], extra: Mat3, planeLabels: readonly string[] = []): ClassSpec[] {
  let plane = 0;
  const coset = base.map((c): ClassSpec => {
    const op = mul(extra, c.representative);
    const aboutZ = Math.abs(Math.abs(op[8]) - 1) < 1e-9 && op[0] * op[4] - op[1] * op[3] > 0;
    const symbol = aboutZ ? axialSymbol(op, c.size === 2) : planeLabels[plane++];
    if (symbol === undefined) throw new RangeError(`no label given for the coset class of ${c.label}`);
    return { label: `${c.size > 1 ? c.size : ''}${symbol}`, size: c.size, representative: op };
  });
  return [...base, ...coset];
}
