/** The symmetry elements (axes, planes, centre) that a group's operations belong to, for display. */
import type { Vec3 } from '../types.js';
import { describeOperation } from '../operation-element.js';
import type { StandardOperation } from './group-operations.js';
import { gcd, sameLine } from './vec.js';

/** One symmetry element in the standard frame. */
export interface SymmetryElement {
  readonly kind: 'E' | 'Cn' | 'σ' | 'i' | 'Sn';
  /** n of Cn or Sn; Infinity for the C∞ and S∞ axes of linear molecules. */
  readonly order?: number;
  /** Unit axis of Cn and Sn. */
  readonly axis?: Vec3;
  /** Unit normal of a mirror plane. */
  readonly normal?: Vec3;
  /** Label such as `C3`, `C2′`, `σv`, `σh`, `σd`, `S4`, `i`. */
  readonly label: string;
}

// The catalogue's class label without its count or power: `3C2′` → `C2′`, `2S6⁵` → `S6`.
const elementLabel = (classLabel: string): string => classLabel.replace(/^\d+/, '').replace(/[⁰¹²³⁴⁵⁶⁷⁸⁹]+$/, '');

function generic(kind: SymmetryElement['kind'], order: number | undefined, direction: Vec3 | undefined, axial: boolean): string {
  if (kind === 'σ') return axial && direction && Math.abs(direction[2]) > 0.99 ? 'σh' : axial ? 'σv' : 'σ';
  if (kind === 'Cn') return `C${order}`;
  if (kind === 'Sn') return `S${order}`;
  return kind;
}

/** One entry per distinct axis (with its highest order), plane and centre among the operations. */
export function symmetryElements(operations: readonly StandardOperation[], axial: boolean): SymmetryElement[] {
  const out: SymmetryElement[] = [];
  for (const op of operations) {
    const e = describeOperation(op.matrix);
    const kind = e.kind === 'C' ? 'Cn' : e.kind === 'S' ? 'Sn' : e.kind;
    // Only generating operations (Cn¹-like, power coprime to n) name an axis's order.
    if ((kind === 'Cn' || kind === 'Sn') && gcd(e.power!, e.order!) !== 1) continue;
    const direction = e.axis;
    const existing = out.findIndex((o) => o.kind === kind && (direction === undefined || sameLine(o.axis ?? o.normal!, direction, 1e-4)));
    if (existing >= 0 && (kind !== 'Cn' && kind !== 'Sn' || (out[existing].order ?? 0) >= e.order!)) continue;
    const label = op.classLabel ? elementLabel(op.classLabel) : generic(kind, e.order, direction, axial);
    const element: SymmetryElement =
      kind === 'σ' ? { kind, normal: direction!, label } : kind === 'Cn' || kind === 'Sn' ? { kind, order: e.order!, axis: direction!, label } : { kind, label };
    if (existing >= 0) out[existing] = element;
    else out.push(element);
  }
  return out;
}

/** The elements of a linear molecule along z: C∞, ∞σv and, with a centre, i, σh, S∞ and ∞C2′. */
export function linearElements(centrosymmetric: boolean): SymmetryElement[] {
  const out: SymmetryElement[] = [
    { kind: 'E', label: 'E' },
    { kind: 'Cn', order: Infinity, axis: [0, 0, 1], label: 'C∞' },
    { kind: 'σ', normal: [0, 1, 0], label: 'σv' },
  ];
  if (centrosymmetric) {
    out.push({ kind: 'i', label: 'i' }, { kind: 'σ', normal: [0, 0, 1], label: 'σh' },
      { kind: 'Sn', order: Infinity, axis: [0, 0, 1], label: 'S∞' }, { kind: 'Cn', order: 2, axis: [1, 0, 0], label: 'C2′' });
  }
  return out;
}
