/**
 * Irreps of the axial groups whose operations all keep the z axis and act in the xy plane as the cyclic
 * or dihedral group of an nFold polygon (Cn, Cnv, Dn, even-n Dnd, S4, S8). Each irrep is the behaviour
 * of an in-plane angular function of φ: 1, a pseudo-scalar (like Rz), cos mφ, sin mφ or the pair
 * (cos mφ, sin mφ). Characters are evaluated on the operation matrix itself, so they always agree with
 * the catalogue's matrices.
 */
import type { Mat3 } from './types.js';
import type { Complex } from './group-types.js';
import type { IrrepSpec } from './group-spec.js';

/** How an operation acts in the xy plane: a rotation by theta or a reflection across a line at angle alpha. */
type InPlane = { readonly rotation: true; readonly theta: number } | { readonly rotation: false; readonly alpha: number };

function inPlane(op: Mat3): InPlane {
  const detM = op[0] * op[4] - op[1] * op[3];
  if (Math.abs(Math.abs(detM) - 1) > 1e-6 || Math.abs(Math.abs(op[8]) - 1) > 1e-6) {
    throw new RangeError('operation does not keep the z axis: not an axial operation');
  }
  return detM > 0
    ? { rotation: true, theta: Math.atan2(op[3], op[0]) }
    : { rotation: false, alpha: Math.atan2(op[1], op[0]) / 2 };
}

const cis = (a: number): Complex => ({ re: Math.cos(a), im: Math.sin(a) });

/**
 * The irreps of the in-plane nFold group, labelled A/B/E (cyclic) or A1/A2/B1/B2/E (dihedral) in the
 * usual order; E's are numbered when there are several. `reflections` says whether the group has
 * operations acting as in-plane reflections (σv, C2′, σd).
 */
export function axialIrreps(nFold: number, reflections: boolean): IrrepSpec[] {
  const irreps: IrrepSpec[] = [{ label: reflections ? 'A1' : 'A', character: () => 1 }];
  if (reflections) {
    irreps.push({ label: 'A2', character: (op) => (inPlane(op).rotation ? 1 : -1) });
  }
  if (nFold % 2 === 0) {
    const m = nFold / 2;
    // cos mφ keeps its sign under reflections across lines at multiples of π/nFold·2; sin mφ flips.
    const b = (sign: number) => (op: Mat3) => {
      const p = inPlane(op);
      return p.rotation ? Math.cos(m * p.theta) : sign * Math.cos(2 * m * p.alpha);
    };
    if (reflections) {
      irreps.push({ label: 'B1', character: b(1) }, { label: 'B2', character: b(-1) });
    } else {
      irreps.push({ label: 'B', character: b(1) });
    }
  }
  const eCount = Math.ceil(nFold / 2) - 1;
  for (let m = 1; m <= eCount; m++) {
    const label = eCount === 1 ? 'E' : `E${m}`;
    const character = (op: Mat3) => {
      const p = inPlane(op);
      return p.rotation ? 2 * Math.cos(m * p.theta) : 0;
    };
    if (reflections) {
      irreps.push({ label, character });
    } else {
      // Separably degenerate: the pair e^{+imθ}, e^{−imθ} that the real E combines.
      const complex = (op: Mat3): readonly [Complex, Complex] => {
        const p = inPlane(op);
        if (!p.rotation) throw new RangeError('complex pair requested in a group with in-plane reflections');
        return [cis(m * p.theta), cis(-m * p.theta)];
      };
      irreps.push({ label, character, complex });
    }
  }
  return irreps;
}
