/**
 * Groups derived from a built group G: G × Ci (g/u labels), G × Cs with σh the xy plane (′/″ labels) and
 * the isomorphic image R ↦ det(R)·R (Td from O). Characters are looked up in G, so derived tables are as
 * right as G's and need no typing.
 */
import type { Mat3 } from './types.js';
import type { Complex, PointGroup } from './group-types.js';
import type { IrrepSpec } from './group-spec.js';
import { classIndexOf } from './group-lookup.js';
import { det, reflection, scale, mul } from './mat3.js';

const SIGMA_H = reflection([0, 0, 1]);

type ToBase = (op: Mat3) => { readonly base: Mat3; readonly improper: boolean };

function derived(base: PointGroup, toBase: ToBase, suffixes: readonly [string, string] | null): IrrepSpec[] {
  const variants = suffixes ? [{ suffix: suffixes[0], sign: 1 }, { suffix: suffixes[1], sign: -1 }] : [{ suffix: '', sign: 1 }];
  return variants.flatMap(({ suffix, sign }) =>
    base.irreps.map((irrep): IrrepSpec => {
      const factor = (op: Mat3) => {
        const t = toBase(op);
        return { c: classIndexOf(base, t.base), f: t.improper ? sign : 1 };
      };
      const pair = irrep.complexCharacters;
      const complex = pair
        ? (op: Mat3): readonly [Complex, Complex] => {
            const { c, f } = factor(op);
            return [
              { re: f * pair[0][c].re, im: f * pair[0][c].im },
              { re: f * pair[1][c].re, im: f * pair[1][c].im },
            ];
          }
        : undefined;
      return {
        label: insertSuffix(irrep.label, suffix),
        lambda: irrep.lambda,
        character: (op) => {
          const { c, f } = factor(op);
          return f * irrep.characters[c];
        },
        complex,
      };
    }),
  );
}

/** `A1` + `g` → `A1g`; linear labels keep the sign last: `Σ+` + `g` → `Σg+`. */
function insertSuffix(label: string, suffix: string): string {
  const sign = /[+-]$/.exec(label);
  return sign ? label.slice(0, -1) + suffix + sign[0] : label + suffix;
}

/** Irreps of G × Ci: each irrep of G as g (even under i) then u (odd). */
export function timesInversion(base: PointGroup): IrrepSpec[] {
  return derived(base, (op) => (det(op) > 0 ? { base: op, improper: false } : { base: scale(op, -1), improper: true }), ['g', 'u']);
}

/** Irreps of G × Cs (σh = xy plane): each irrep of G as ′ then ″ (ASCII `'` and `''`). */
export function timesMirror(base: PointGroup): IrrepSpec[] {
  return derived(base, (op) => (det(op) > 0 ? { base: op, improper: false } : { base: mul(SIGMA_H, op), improper: true }), ["'", "''"]);
}

/** Irreps of a group isomorphic to the rotation group G through R ↦ det(R)·R, with G's labels. */
export function viaProperImage(base: PointGroup): IrrepSpec[] {
  return derived(base, (op) => ({ base: det(op) > 0 ? op : scale(op, -1), improper: false }), null);
}
